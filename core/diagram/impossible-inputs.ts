/**
 * Inputs no aircraft can have, which the concept reader reports as errors
 * naming the field: a drag polar whose least drag is not positive, a ground
 * run whose lift coefficient lifts the aircraft before lift-off speed or
 * takes the weight off the wheels (zero or negative rolling friction), and a
 * requirement met with no power or thrust at all somewhere on the diagram.
 */
import { minimumDragCoefficient, polarOf, type Polar } from '../aero/drag-polar';
import { loadingAxis, type Design } from '../model';
import { requirementBoundaries } from './boundaries';
import { DEFAULT_SAMPLES, plotRange } from './evaluate';
import { sampleWingLoadings } from './sampling';

export interface ImpossibleInput {
  field: string;
  message: string;
}

/** Speed of the take-off boundary's mean forces as a fraction of V_LOF (core/constraints/takeoff-ground-roll.ts). */
const MEAN_ROLL_SPEED_FRACTION = 0.7;

const shown = (x: number): string => String(Number(x.toPrecision(4)));

function polarInputs(design: Design, out: ImpossibleInput[]): void {
  const { aircraft } = design;
  for (const name of Object.keys(aircraft.configurations)) {
    const least = minimumDragCoefficient(polarOf(aircraft, name) as Polar);
    if (!(least > 0)) {
      out.push({
        field: 'aircraft.aero.cdLinear',
        message: `${shown(aircraft.cdLinear)} makes the ${name} polar's least drag C_D0 - K1^2/(4K) = ${shown(least)}, not positive; use a linear term closer to zero`,
      });
      return;
    }
  }
}

function groundRunInputs(design: Design, out: ImpossibleInput[]): void {
  const { aircraft } = design;
  design.requirements.forEach((r, i) => {
    if (!r.enabled || r.kind !== 'takeoff-ground-roll') return;
    const polar = polarOf(aircraft, r.configuration) ?? (polarOf(aircraft, 'clean') as Polar);
    const field = `requirements[${i}].clGroundRun`;
    if (!(r.clGroundRun < polar.clMax)) {
      out.push({ field, message: `${shown(r.clGroundRun)} is at or above the ${r.configuration} C_Lmax ${shown(polar.clMax)} (requirement "${r.id}"): the wing would lift the aircraft before lift-off speed; use a value below C_Lmax` });
      return;
    }
    // Lift over weight at the mean-force speed: qbar C_L,g/(beta w) = (0.7 k_LOF)^2 C_L,g / C_Lmax.
    const k = MEAN_ROLL_SPEED_FRACTION * r.liftoffSpeedFactor;
    const liftOverWeight = (k * k * r.clGroundRun) / polar.clMax;
    if (r.rollingFriction > 0 && !(liftOverWeight < 1)) {
      out.push({
        field,
        message: `${shown(r.clGroundRun)} with lift-off at ${shown(r.liftoffSpeedFactor)} V_s gives lift at or above the weight during the roll, so no wheel load: zero or negative rolling friction (requirement "${r.id}"); use a smaller ground-run C_L`,
      });
    }
  });
}

function requiredLoadingInputs(design: Design, out: ImpossibleInput[]): void {
  const entries = requirementBoundaries(design);
  const range = plotRange(design, entries, []);
  const n = Number.isInteger(design.diagram.samples) && design.diagram.samples >= 2 ? design.diagram.samples : DEFAULT_SAMPLES;
  const ws = sampleWingLoadings(range, n);
  const what = loadingAxis(design.aircraft.propulsion.kind) === 'powerToWeight' ? 'power' : 'thrust';
  for (const { index, requirement, boundary } of entries) {
    if (boundary.type !== 'curve') continue;
    for (const w of ws) {
      const y = boundary.required(w);
      if (Number.isFinite(y) && y <= 0) {
        const byLinearTerm = design.aircraft.cdLinear < 0;
        out.push({
          field: byLinearTerm ? 'aircraft.aero.cdLinear' : `requirements[${index}]`,
          message: `${byLinearTerm ? `${shown(design.aircraft.cdLinear)} makes` : 'makes'} requirement "${requirement.id}" need ${y < 0 ? `negative ${what}` : `no ${what}`} at ${shown(w)} Pa wing loading, ${y < 0 ? 'which no aircraft can' : 'so it sizes nothing'}; ${byLinearTerm ? 'use a linear term closer to zero' : 'check its values'}`,
        });
        break;
      }
    }
  }
}

/** Every impossible input of a resolved design; empty when there is none. */
export function impossibleInputs(design: Design): ImpossibleInput[] {
  const out: ImpossibleInput[] = [];
  polarInputs(design, out);
  groundRunInputs(design, out);
  if (out.length === 0) requiredLoadingInputs(design, out);
  return out;
}

/**
 * Inputs no aircraft can have, which the concept reader reports as errors
 * naming the field: a drag polar whose least drag is not positive, what a
 * requirement's kind refuses in its own inputs (core/requirements/<kind>.ts
 * `refused`: a ground run that lifts the aircraft early), and a requirement
 * met with no power or thrust at all somewhere on the diagram.
 */
import { minimumDragCoefficient, polarOf, type Polar } from '../aero/drag-polar';
import { loadingAxis, type Design } from '../model';
import { requirementKind } from '../requirements';
import { messageNumber } from '../units/message-number';
import { requirementBoundaries } from './boundaries';
import { DEFAULT_SAMPLES, plotRange } from './evaluate';
import { sampleWingLoadings } from './sampling';

export interface ImpossibleInput {
  field: string;
  message: string;
}

function polarInputs(design: Design, out: ImpossibleInput[]): void {
  const { aircraft } = design;
  for (const name of Object.keys(aircraft.configurations)) {
    const least = minimumDragCoefficient(polarOf(aircraft, name) as Polar);
    if (!(least > 0)) {
      out.push({
        field: 'aircraft.aero.cdLinear',
        message: `${messageNumber(aircraft.cdLinear)} makes the ${name} polar's least drag C_D0 - K1^2/(4K) = ${messageNumber(least)}, not positive; use a linear term closer to zero`,
      });
      return;
    }
  }
}

/** What each enabled requirement's kind refuses in its own inputs (core/requirements/<kind>.ts `refused`). */
function kindInputs(design: Design, out: ImpossibleInput[]): void {
  design.requirements.forEach((r, i) => {
    if (!r.enabled) return;
    for (const { field, message } of requirementKind(r.kind).refused?.(r, design.aircraft) ?? []) {
      out.push({ field: field ? `requirements[${i}].${field}` : `requirements[${i}]`, message });
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
          message: `${byLinearTerm ? `${messageNumber(design.aircraft.cdLinear)} makes` : 'makes'} requirement "${requirement.id}" need ${y < 0 ? `negative ${what}` : `no ${what}`} at ${messageNumber(w)} Pa wing loading, ${y < 0 ? 'which no aircraft can' : 'so it sizes nothing'}; ${byLinearTerm ? 'use a linear term closer to zero' : 'check its values'}`,
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
  kindInputs(design, out);
  if (out.length === 0) requiredLoadingInputs(design, out);
  return out;
}

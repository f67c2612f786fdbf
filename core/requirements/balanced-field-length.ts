/**
 * Balanced field length of a multi-engine aircraft: Torenbeek's empirical
 * method as given by Raymer (Aircraft Design: A Conceptual Approach, ch. 17),
 * with the one-engine-out climb gradient at V2 worked out from the concept.
 */
import * as z from 'zod';
import { PROPELLER_TAKEOFF } from '../assumptions/typical-ranges';
import { stallSpeed } from '../aero/speeds';
import { dragCoefficient } from '../aero/drag-polar';
import { RHO0 } from '../atmosphere';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import { fieldLoadingUnit, MOST_FIELD_THRUST_TO_WEIGHT } from '../constraints/field-loading';
import { flightCondition, type FlightCondition } from '../constraints/flight-condition';
import { quantityField } from '../concept/quantity-field';
import { largerRoot } from '../numeric/quadratic';
import { FOOT_M, G0 } from '../units/factors';
import { formatQuantity } from '../units/display';
import type { RequirementCommon } from './common';
import { defineRequirement } from './descriptor';
import { lengthValue, numberValue, plain, speedFactor } from './fields';

export interface BalancedFieldLengthRequirement extends RequirementCommon {
  kind: 'balanced-field-length';
  distanceM: number;
  obstacleHeightM: number;
  /** V2 over the configuration's stall speed. */
  v2SpeedFactor: number;
  /** Mean thrust of the run over static thrust, jets (Raymer: 0.75 (5 + BPR)/(4 + BPR), 0.833 at BPR 5). */
  averageThrustFraction: number;
}

/** Torenbeek's constant term, 655 ft, in metres. */
const CONSTANT_TERM_M = 655 * FOOT_M;
/** Lift-off over stall speed for the mean propeller thrust of the run (as the ground-roll kinds). */
const LIFTOFF_SPEED_FACTOR = 1.1;

/** Minimum second-segment gradient by engine count (14 CFR 25.121(b): 2.4, 2.7, 3.0 %). */
export function minimumSecondSegmentGradient(engines: number): number {
  return engines <= 2 ? 0.024 : engines === 3 ? 0.027 : 0.03;
}

export interface BalancedFieldTerms {
  /** Climb gradient at V2, one engine out. */
  climbGradient: number;
  /** Mean thrust of the run per weight. */
  averageThrustToWeight: number;
  /** Torenbeek's U = 0.01 C_Lmax + 0.02 (flaps in the take-off position). */
  u: number;
  lengthM: number;
}

/**
 * What the terms at one wing loading w are made of: the climb gradient at V2 and the mean thrust of
 * the run are linear in x, and the rest does not depend on x (stall speed, C_L2, the drag term at V2,
 * U, gamma_min, the ground and constant terms); the closed form below reads them as coefficients.
 */
interface FieldCoefficients {
  /** gamma_2 = climbPerX x - dragAtV2. */
  climbPerX: number;
  dragAtV2: number;
  /** T_av/W = runPerX x. */
  runPerX: number;
  u: number;
  minimumGradient: number;
  /** 0.863 (beta w / (rho g0 C_L2) + h_obs). */
  groundTerm: number;
  /** 655 ft / sqrt(sigma). */
  constantTerm: number;
}

function fieldCoefficients(r: BalancedFieldLengthRequirement, c: FlightCondition, engines: number, w: number): FieldCoefficients {
  const { polar, densityKgM3: rho } = c;
  const weightLoading = c.beta * w;
  const vs = stallSpeed(weightLoading, rho, polar.clMax);
  const v2 = r.v2SpeedFactor * vs;
  const cl2 = polar.clMax / (r.v2SpeedFactor * r.v2SpeedFactor);
  const running = (engines - 1) / engines;
  const runSpeed = 0.7 * LIFTOFF_SPEED_FACTOR * vs;
  return {
    climbPerX: running * (c.propeller ? c.propellerEfficiency / v2 : 1),
    dragAtV2: dragCoefficient(polar, cl2) / cl2,
    runPerX: c.propeller ? c.propellerEfficiency / runSpeed : r.averageThrustFraction,
    u: 0.01 * polar.clMax + 0.02,
    minimumGradient: minimumSecondSegmentGradient(engines),
    groundTerm: 0.863 * (weightLoading / (rho * G0 * cl2) + r.obstacleHeightM),
    constantTerm: CONSTANT_TERM_M / Math.sqrt(rho / RHO0),
  };
}

/**
 * BFL = 0.863/(1 + 2.3 dG) (w/(rho g0 C_L2) + h_obs) (1/(T_av/W - U) + 2.7) + 655 ft / sqrt(sigma),
 * dG = gamma_2 - gamma_min; x is T/W (jets) or P/W [m/s] (propellers) of the actual weight at the field.
 */
export function balancedFieldTerms(r: BalancedFieldLengthRequirement, c: FlightCondition, engines: number, w: number, x: number): BalancedFieldTerms {
  const k = fieldCoefficients(r, c, engines, w);
  const climbGradient = k.climbPerX * x - k.dragAtV2;
  const averageThrustToWeight = k.runPerX * x;
  const dG = climbGradient - k.minimumGradient;
  const excess = averageThrustToWeight - k.u;
  // With a climb (gamma_2 > 0) and gamma_min at most 0.03, 1 + 2.3 dG stays above 0.93: the factor never changes sign.
  const lengthM = climbGradient > 0 && excess > 0 ? (k.groundTerm / (1 + 2.3 * dG)) * (1 / excess + 2.7) + k.constantTerm : Infinity;
  return { climbGradient, averageThrustToWeight, u: k.u, lengthM };
}

/**
 * The least x (T/W, or P/W in m/s) whose balanced field length is `distanceM`, in closed form. Where
 * the aircraft climbs after the failure (gamma_2 > 0) and the run has thrust to spare (e = T_av/W - U
 * > 0), the length falls as x grows, and BFL = D is, with h = 1 + 2.3 dG = p + q e,
 *   (D - K) q e^2 + ((D - K) p - 2.7 G) e - G = 0   (G the ground term with 0.863, K the constant term),
 * a quadratic with one positive root. Where that root does not climb, the least x that climbs already
 * gives a shorter field: the climb sets x. NaN where no x gives D (D at or below K).
 */
export function balancedFieldLoading(r: BalancedFieldLengthRequirement, c: FlightCondition, engines: number, w: number): number {
  const k = fieldCoefficients(r, c, engines, w);
  const spare = r.distanceM - k.constantTerm;
  if (!(spare > 0)) return NaN;
  const q = (2.3 * k.climbPerX) / k.runPerX;
  const p = 1 + 2.3 * ((k.climbPerX * k.u) / k.runPerX - k.dragAtV2 - k.minimumGradient);
  const e = largerRoot(spare * q, spare * p - 2.7 * k.groundTerm, -k.groundTerm);
  return Math.max((e + k.u) / k.runPerX, k.dragAtV2 / k.climbPerX);
}

/** The terms at wing loading w with the sea-level loading given (T_SL/W_TO or P_SL/W_TO). */
export function balancedFieldAt(r: BalancedFieldLengthRequirement, aircraft: Aircraft, w: number, loading: number): BalancedFieldTerms {
  const c = flightCondition(r, aircraft);
  return balancedFieldTerms(r, c, aircraft.propulsion.engines, w, (loading * c.alpha) / c.beta);
}

export function balancedFieldLengthBoundary(r: BalancedFieldLengthRequirement, aircraft: Aircraft): BoundaryOf<'balanced-field-length'> {
  const c = flightCondition(r, aircraft);
  const engines = aircraft.propulsion.engines;
  return {
    type: 'curve',
    id: r.id,
    kind: r.kind,
    required(w: number): number {
      if (!(w > 0) || !(c.alpha > 0) || !(engines >= 2)) return NaN;
      const x = balancedFieldLoading(r, c, engines, w);
      return x <= MOST_FIELD_THRUST_TO_WEIGHT * fieldLoadingUnit(c, w) ? (c.beta / c.alpha) * x : NaN;
    },
    speedAt: (w: number): number => (w > 0 ? r.v2SpeedFactor * stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax) : NaN),
  };
}

const shape = {
  distance: quantityField('length', { above: 0 }),
  obstacleHeight: quantityField('length', { from: 0, below: 1000 }).optional(),
  v2SpeedFactor: speedFactor.optional(),
  averageThrustFraction: z.number().gt(0).lte(1.5).optional(),
};

export const balancedFieldLength = defineRequirement<'balanced-field-length', BalancedFieldLengthRequirement, typeof shape>({
  kind: 'balanced-field-length',
  title: 'Balanced field length',
  colour: '#7a3b52', // mulberry
  shape,
  resolve: (r, si) => ({
    distanceM: si(r.distance, 'length', NaN),
    obstacleHeightM: si(r.obstacleHeight, 'length', 35 * FOOT_M),
    v2SpeedFactor: r.v2SpeedFactor ?? 1.2,
    averageThrustFraction: r.averageThrustFraction ?? 0.75 * (10 / 9),
  }),
  drawnAs: 'curve',
  boundary: balancedFieldLengthBoundary,
  speedText: 'the take-off safety speed V2 = k_2 V_s,TO',
  defaultConfiguration: 'takeoff',
  propeller: { default: 0.55, typical: PROPELLER_TAKEOFF },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'distance', title: 'Balanced field length', value: lengthValue(), required: true },
    { key: 'obstacleHeight', title: 'Obstacle height', value: lengthValue(), defaultText: '35 ft' },
    { key: 'v2SpeedFactor', title: 'V2 / stall speed', value: numberValue(), defaultText: '1.2', advanced: true },
    { key: 'averageThrustFraction', title: 'Mean thrust of the run / static thrust (jets)', value: numberValue(), defaultText: '0.833', advanced: true },
  ],
  newRequirement: { distance: '1200 m', obstacleHeight: '35 ft' },
  summary: (r, system) => [`${formatQuantity(r.distanceM, 'length', system)} balanced field over ${formatQuantity(r.obstacleHeightM, 'length', system)}`, `V2 ${plain(r.v2SpeedFactor)} × stall speed`],
  costStep: { field: 'distanceM', conceptField: 'distance', relaxed: 'up' },
  typicalRanges: [],
  issues: (_r, { engines }) =>
    engines < 2
      ? [{ field: '', message: `needs a multi-engine aircraft: a balanced field length assumes one engine fails and the others carry on (aircraft.propulsion.engines is ${engines})` }]
      : [],
  impossible: (_r, aircraft) =>
    aircraft.propulsion.engines >= 2
      ? undefined
      : {
          code: 'single-engine-balanced-field',
          field: '',
          message: `A balanced field length needs a multi-engine aircraft (aircraft.propulsion.engines is ${aircraft.propulsion.engines}).`,
        },
  templates: [],
  methods: `### Balanced field length (\`balanced-field-length\`)

A curve for multi-engine aircraft: the sea-level rated thrust (or power) per take-off weight for which the distance to continue after an engine failure at the decision speed equals the distance to stop, within the field length BFL, by Torenbeek's empirical method:

    BFL = 0.863 / (1 + 2.3 dG) (beta w / (rho g0 C_L2) + h_obs) (1 / (T_av/W - U) + 2.7) + 655 ft / sqrt(sigma)
    dG = gamma_2 - gamma_min,   gamma_2 = (N - 1)/N T/W - C_D/C_L at V2,   C_L2 = C_Lmax,TO / k_2^2
    U = 0.01 C_Lmax,TO + 0.02,   T_av = 0.75 (5 + BPR)/(4 + BPR) T (jets)
    T_SL/W_TO = (beta/alpha) T/W, solved for BFL = the distance in closed form: a quadratic in the excess e = T_av/W - U

- gamma_2: the one-engine-out climb gradient at V2 = k_2 V_s,TO (k_2 1.2 by default), from the configuration's polar, the lapse at the field and the engine count N; gamma_min 0.024, 0.027 and 0.030 for two, three and four or more engines (14 CFR 25.121(b)).
- h_obs: 35 ft by default (14 CFR 25.113). T_av/T: 0.833 by default (BPR 5 in Raymer's formula, from memory); propeller aircraft take T_av = eta_p P / (0.7 V_LOF), V_LOF = 1.1 V_s,TO, eta_p 0.55 by default, and the same efficiency at V2.
- The climb uses the take-off configuration's polar (gear down errs on the long side). Where the aircraft cannot climb after the failure (gamma_2 <= 0) no loading gives a field length and the curve is undefined there. Where the least loading that climbs after the failure already gives a shorter field length (a long field), the curve is that loading: the climb, not the distance, sets it.
- A field at or below the constant term 655 ft / sqrt(sigma) has no loading, nor one needing more than T/W 50 (for propellers P/W 50 V_s,TO / eta_p, in m/s): the curve is undefined there, as for the take-off distance.
- A single-engine aircraft has no balanced field length: the concept is refused, naming the field.
- Source: Torenbeek, *Synthesis of Subsonic Airplane Design*, as given by Raymer, *Aircraft Design: A Conceptual Approach*, ch. 17 (eq. 17.111, from memory).`,
});

/**
 * Take-off distance over an obstacle, all engines operating: ground roll,
 * rotation, transition and climb to the obstacle height (Raymer, Aircraft
 * Design: A Conceptual Approach, ch. 17).
 */
import * as z from 'zod';
import { RUNWAY_SURFACES } from '../assumptions/study-case';
import { CL_GROUND_RUN, PROPELLER_CLIMB, PROPELLER_TAKEOFF, ROLLING_FRICTION } from '../assumptions/typical-ranges';
import { stallSpeed } from '../aero/speeds';
import { dragCoefficient } from '../aero/drag-polar';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import { fieldLoadingUnit, MOST_FIELD_THRUST_TO_WEIGHT } from '../constraints/field-loading';
import { flightCondition, type FlightCondition } from '../constraints/flight-condition';
import { rollDistance } from '../constraints/roll-distance';
import { quantityField } from '../concept/quantity-field';
import { smoothFallingRoot } from '../numeric/false-position';
import { FOOT_M, G0 } from '../units/factors';
import { formatQuantity } from '../units/display';
import type { RequirementCommon } from './common';
import { defineRequirement } from './descriptor';
import { lengthValue, mark, numberValue, plain, runwaySurfaceField, speedFactor } from './fields';
import type { RunwaySurface } from '../assumptions/study-case';

export interface TakeoffDistanceRequirement extends RequirementCommon {
  kind: 'takeoff-distance';
  distanceM: number;
  obstacleHeightM: number;
  rollingFriction: number;
  /** The surface the concept states for the run; only the studies read it (rolling friction's typical band). */
  runwaySurface?: RunwaySurface;
  clGroundRun: number;
  liftoffSpeedFactor: number;
  rotationTimeS: number;
  /** Propeller efficiency in the transition and climb (the common propellerEfficiency is the run's). */
  climbPropellerEfficiency: number;
}

/** Forces of the ground roll taken at 0.7 V_LOF for propeller thrust (as the ground-roll kind). */
const MEAN_ROLL_SPEED_FRACTION = 0.7;
/** Transition speed over stall speed and load factor of the transition arc (Raymer ch. 17, from memory). */
const TRANSITION_SPEED_FACTOR = 1.15;
const TRANSITION_LOAD_FACTOR = 1.2;

export interface TakeoffSegments {
  groundRoll: number;
  rotation: number;
  transition: number;
  climb: number;
}

/**
 * The four segments [m] at wing loading w [Pa] as a function of x, the
 * loading at the field (T/W of the actual weight for jets, P/W [m/s] for
 * propellers). What does not depend on x (the speeds, the ground-run and
 * transition lift and drag, the arc's radius) is worked out once per wing
 * loading. Infinity in a segment that is never completed (no climb, no
 * acceleration).
 */
function segmentsAtLoading(r: TakeoffDistanceRequirement, c: FlightCondition, w: number): (x: number) => TakeoffSegments {
  const { polar, densityKgM3: rho } = c;
  const weightLoading = c.beta * w;
  const vs = stallSpeed(weightLoading, rho, polar.clMax);
  const vLof = r.liftoffSpeedFactor * vs;
  const thrustAt = (x: number, v: number, eta = c.propellerEfficiency): number => (c.propeller ? (eta * x) / v : x);
  const clg = r.clGroundRun;
  const groundDrag = dragCoefficient(polar, clg);
  const rotation = r.rotationTimeS * vLof;
  // Transition arc at V_TR = 1.15 V_s, n = 1.2: R = V_TR^2 / (g0 (n - 1)); climb angle from excess thrust at V_TR.
  const vTr = TRANSITION_SPEED_FACTOR * vs;
  const radius = (vTr * vTr) / (G0 * (TRANSITION_LOAD_FACTOR - 1));
  const clTr = polar.clMax / (TRANSITION_SPEED_FACTOR * TRANSITION_SPEED_FACTOR);
  const dragOverLiftTr = dragCoefficient(polar, clTr) / clTr;
  const h = r.obstacleHeightM;
  return (x: number): TakeoffSegments => {
    const groundRoll = rollDistance({
      thrustToWeight: thrustAt(x, MEAN_ROLL_SPEED_FRACTION * vLof),
      friction: r.rollingFriction,
      densityKgM3: rho,
      wingLoadingPa: weightLoading,
      liftCoefficient: clg,
      dragCoefficient: groundDrag,
      startSpeed: 0,
      endSpeed: vLof,
    });
    const sinGamma = Math.min(1, thrustAt(x, vTr, r.climbPropellerEfficiency) - dragOverLiftTr);
    if (!(sinGamma > 0)) return { groundRoll, rotation, transition: Infinity, climb: Infinity };
    const cosGamma = Math.sqrt(1 - sinGamma * sinGamma);
    const transitionHeight = radius * (1 - cosGamma);
    if (transitionHeight >= h) {
      return { groundRoll, rotation, transition: Math.sqrt(radius * radius - (radius - h) * (radius - h)), climb: 0 };
    }
    return { groundRoll, rotation, transition: radius * sinGamma, climb: ((h - transitionHeight) * cosGamma) / sinGamma };
  };
}

const total = (s: TakeoffSegments): number => s.groundRoll + s.rotation + s.transition + s.climb;

/** Field loading x (see segmentsAtLoading) that takes off over the obstacle in the distance; NaN where none up to a T/W of 50 does. */
function fieldLoadingRequired(r: TakeoffDistanceRequirement, c: FlightCondition, w: number): number {
  const scale = fieldLoadingUnit(c, w);
  const segments = segmentsAtLoading(r, c, w);
  return smoothFallingRoot((x) => total(segments(x)) - r.distanceM, 1e-6 * scale, 0.3 * scale, MOST_FIELD_THRUST_TO_WEIGHT * scale);
}

/** T_SL/W_TO (or P_SL/W_TO) = (beta/alpha) x, x solving S_G + S_R + S_TR + S_C = S_TO. */
export function takeoffDistanceBoundary(r: TakeoffDistanceRequirement, aircraft: Aircraft): BoundaryOf<'takeoff-distance'> {
  const c = flightCondition(r, aircraft);
  return {
    type: 'curve',
    id: r.id,
    kind: r.kind,
    required(w: number): number {
      if (!(w > 0) || !(c.alpha > 0)) return NaN;
      return (c.beta / c.alpha) * fieldLoadingRequired(r, c, w);
    },
    speedAt: (w: number): number => (w > 0 ? r.liftoffSpeedFactor * stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax) : NaN),
  };
}

/** The segments [m] at wing loading w with the given sea-level loading (T_SL/W_TO or P_SL/W_TO). */
export function takeoffDistanceSegments(r: TakeoffDistanceRequirement, aircraft: Aircraft, w: number, loading: number): TakeoffSegments {
  const c = flightCondition(r, aircraft);
  return segmentsAtLoading(r, c, w)((loading * c.alpha) / c.beta);
}

const shape = {
  distance: quantityField('length', { above: 0 }),
  obstacleHeight: quantityField('length', { from: 0, below: 1000 }).optional(),
  rollingFriction: z.number().gte(0).lt(1).optional(),
  runwaySurface: z.enum(RUNWAY_SURFACES).optional(),
  clGroundRun: z.number().gte(0).optional(),
  liftoffSpeedFactor: speedFactor.optional(),
  rotationTime: quantityField('time', { from: 0, below: 60 }).optional(),
  climbPropellerEfficiency: z.number().gt(0).lte(1).optional(),
};

export const takeoffDistance = defineRequirement<'takeoff-distance', TakeoffDistanceRequirement, typeof shape>({
  kind: 'takeoff-distance',
  title: 'Take-off distance',
  colour: '#8a4f1d', // burnt umber
  shape,
  resolve: (r, si) => ({
    distanceM: si(r.distance, 'length', NaN),
    obstacleHeightM: si(r.obstacleHeight, 'length', 50 * FOOT_M),
    rollingFriction: r.rollingFriction ?? 0.04,
    ...(r.runwaySurface !== undefined ? { runwaySurface: r.runwaySurface } : {}),
    clGroundRun: r.clGroundRun ?? 0.5,
    liftoffSpeedFactor: r.liftoffSpeedFactor ?? 1.1,
    rotationTimeS: si(r.rotationTime, 'time', 3),
    climbPropellerEfficiency: r.climbPropellerEfficiency ?? 0.75,
  }),
  drawnAs: 'curve',
  boundary: takeoffDistanceBoundary,
  segments: (r, aircraft, w, loading) => {
    const s = takeoffDistanceSegments(r, aircraft, w, loading);
    return { groundRoll: s.groundRoll, rotation: s.rotation, transition: s.transition, climb: s.climb };
  },
  speedText: 'the lift-off speed k_LOF V_s,TO',
  defaultConfiguration: 'takeoff',
  propeller: { default: 0.55, typical: PROPELLER_TAKEOFF },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'distance', title: 'Take-off distance', value: lengthValue(), required: true },
    { key: 'obstacleHeight', title: 'Obstacle height', value: lengthValue(), defaultText: '50 ft' },
    { key: 'rollingFriction', title: 'Rolling friction', value: numberValue(), defaultText: '0.04', advanced: true, typical: mark(ROLLING_FRICTION) },
    runwaySurfaceField,
    { key: 'clGroundRun', title: 'Lift coefficient in the ground run', value: numberValue(), defaultText: '0.5', advanced: true, typical: mark(CL_GROUND_RUN) },
    { key: 'liftoffSpeedFactor', title: 'Lift-off speed / stall speed', value: numberValue(), defaultText: '1.1', advanced: true },
    { key: 'rotationTime', title: 'Rotation time', value: { type: 'quantity', dimension: 'time', units: { si: 's', us: 's' } }, defaultText: '3 s', advanced: true },
    { key: 'climbPropellerEfficiency', title: 'Propeller efficiency in the climb-out', value: numberValue(), defaultText: '0.75', advanced: true, propellerOnly: true, typical: mark(PROPELLER_CLIMB) },
  ],
  newRequirement: { distance: '600 m', obstacleHeight: '50 ft' },
  summary: (r, system) => [
    `${formatQuantity(r.distanceM, 'length', system)} over ${formatQuantity(r.obstacleHeightM, 'length', system)}`,
    `μ rolling ${plain(r.rollingFriction, 3)}`,
  ],
  costStep: { field: 'distanceM', conceptField: 'distance', relaxed: 'up' },
  typicalRanges: [
    { field: 'rollingFriction', key: 'rollingFriction', title: 'Rolling friction', label: 'Rolling friction', range: ROLLING_FRICTION, bounds: { min: 0, max: 1, openMin: false, openMax: true } },
    { field: 'clGroundRun', key: 'clGroundRun', title: 'Ground-run C_L', label: 'Ground-run CL', range: CL_GROUND_RUN, bounds: { min: 0, max: Infinity, openMin: false, openMax: false } },
  ],
  templates: [],
  methods: `### Take-off distance (\`takeoff-distance\`)

A curve: the sea-level rated thrust (or power) per take-off weight with which all engines take the aircraft from rest over an obstacle of height h_obs within the distance S_TO. The distance is the sum of four segments, and the loading is found by a bracketing root search on that sum (false position, Illinois variant, to a relative width of 1e-10).

    S_TO = S_G + S_R + S_TR + S_C
    S_G  = ln[(K_T + K_A V_LOF^2) / K_T] / (2 g0 K_A),   K_T = T/W - mu,   K_A = rho (mu C_L,g - C_D,g) / (2 beta w)
    S_R  = t_R V_LOF
    R    = V_TR^2 / (g0 (n - 1)),  V_TR = 1.15 V_s,TO,  n = 1.2,   sin(gamma) = T/W - C_D/C_L at V_TR
    h_TR = R (1 - cos gamma);  S_TR = R sin gamma,  S_C = (h_obs - h_TR) / tan gamma
    (when h_TR >= h_obs: S_TR = sqrt(R^2 - (R - h_obs)^2), S_C = 0)
    T_SL/W_TO = (beta/alpha) T/W

- V_LOF = k_LOF V_s,TO, 1.1 by default; t_R: rotation time, 3 s by default (Raymer: about 3 s for large aircraft, 1 s for small; from memory); h_obs 50 ft by default (14 CFR 23 take-off distance; 35 ft is the transport screen height of 14 CFR 25.113).
- mu: rolling friction, 0.04 by default; C_L,g: lift coefficient in the run, 0.5 by default; C_D,g from the configuration's polar.
- Propeller aircraft: thrust T = eta_p P / V at each segment's speed: 0.7 V_LOF with eta_p (0.55 by default) in the run, V_TR with the climb-out efficiency (0.75 by default, as the climb kinds) in the air.
- Thrust is taken constant over the run (no speed lapse); the climb segment uses the transition climb angle; no ground effect, runway slope or wind. No engine-failure allowance: the distance is all engines operating, without the 115 % factor of 14 CFR 25.113 (write the factored distance as the requirement).
- Where no loading up to T/W 50 meets the distance (it is shorter than the rotation alone, or no climb is possible), the curve is undefined.
- The evaluation reports the four segments at the optimum.
- Source: Raymer, *Aircraft Design: A Conceptual Approach*, ch. 17 (ground roll eq. 17.101, transition radius and climb; from memory).`,
});

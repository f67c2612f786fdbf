/**
 * Landing distance over an obstacle: approach at V_app, flare, free roll and
 * braking with aerodynamic lift and drag, at landing mass (Raymer, Aircraft
 * Design: A Conceptual Approach, ch. 17). A field length factor turns it into
 * a factored landing field length.
 */
import * as z from 'zod';
import { BRAKING_FRICTION } from '../assumptions/typical-ranges';
import { stallSpeed } from '../aero/speeds';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import { flightCondition, type FlightCondition } from '../constraints/flight-condition';
import { brakedRoll, brakingLiftCoefficient, largestWingLoading } from '../constraints/landing-ground-roll';
import { quantityField } from '../concept/quantity-field';
import { FOOT_M, G0 } from '../units/factors';
import { formatQuantity } from '../units/display';
import type { RequirementCommon } from './common';
import { defineRequirement } from './descriptor';
import { lengthValue, mark, numberValue, plain, speedFactor } from './fields';

export interface LandingDistanceRequirement extends RequirementCommon {
  kind: 'landing-distance';
  /** The distance, or the field length when a factor is given [m]. */
  distanceM: number;
  obstacleHeightM: number;
  /** Landing distance over field length (0.6 for a factored landing field length); 1 without one. */
  fieldLengthFactor: number;
  approachSpeedFactor: number;
  touchdownSpeedFactor: number;
  approachAngleRad: number;
  brakingFriction: number;
  freeRollTimeS: number;
  clGround: number;
  liftDumping: boolean;
}

/** Approach and touchdown speeds over the landing stall speed when the file gives none (Raymer ch. 17, from memory). */
const APPROACH_SPEED_FACTOR = 1.3;
const TOUCHDOWN_SPEED_FACTOR = 1.15;
/** Load factor of the flare (Raymer ch. 17, from memory). */
const FLARE_LOAD_FACTOR = 1.2;

export interface LandingSegments {
  approach: number;
  flare: number;
  freeRoll: number;
  braking: number;
}

/** The segments [m] at wing loading w [Pa]. */
function segmentsAt(r: LandingDistanceRequirement, c: FlightCondition, w: number): LandingSegments {
  const weightLoading = c.beta * w;
  const vs = stallSpeed(weightLoading, c.densityKgM3, c.polar.clMax);
  const vTouchdown = r.touchdownSpeedFactor * vs;
  // Flare at the mean of approach and touchdown speeds on an arc of load factor 1.2.
  const vFlare = 0.5 * (r.approachSpeedFactor + r.touchdownSpeedFactor) * vs;
  const radius = (vFlare * vFlare) / (G0 * (FLARE_LOAD_FACTOR - 1));
  const gamma = r.approachAngleRad;
  const h = r.obstacleHeightM;
  const flareHeight = radius * (1 - Math.cos(gamma));
  const [approach, flare] =
    flareHeight >= h ? [0, Math.sqrt(radius * radius - (radius - h) * (radius - h))] : [(h - flareHeight) / Math.tan(gamma), radius * Math.sin(gamma)];
  const cl = brakingLiftCoefficient(r.clGround, r.liftDumping) ?? r.clGround;
  const freeRoll = vTouchdown * r.freeRollTimeS;
  const braking = brakedRoll(c, weightLoading, vTouchdown, r.brakingFriction, 0, cl);
  return { approach, flare, freeRoll, braking };
}

const total = (s: LandingSegments): number => s.approach + s.flare + s.freeRoll + s.braking;

export function landingDistanceSegments(r: LandingDistanceRequirement, aircraft: Aircraft, w: number): LandingSegments {
  return segmentsAt(r, flightCondition(r, aircraft), w);
}

/** The landing distance the requirement allows [m]: the distance times the field length factor. */
export const allowedLandingDistance = (r: LandingDistanceRequirement): number => r.distanceM * r.fieldLengthFactor;

/** w <= the largest wing loading whose approach, flare, free roll and braking fit in f S (bracketing root search). */
export function landingDistanceBoundary(r: LandingDistanceRequirement, aircraft: Aircraft): BoundaryOf<'landing-distance'> {
  const c = flightCondition(r, aircraft);
  return {
    type: 'limit',
    id: r.id,
    kind: r.kind,
    wingLoadingMaxPa: largestWingLoading((w) => total(segmentsAt(r, c, w)), allowedLandingDistance(r)),
    speedAt: (w: number): number => (w > 0 ? r.approachSpeedFactor * stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax) : NaN),
  };
}

const shape = {
  distance: quantityField('length', { above: 0 }),
  obstacleHeight: quantityField('length', { from: 0, below: 1000 }).optional(),
  fieldLengthFactor: z.number().gt(0).lte(1).optional(),
  approachSpeedFactor: speedFactor.optional(),
  touchdownSpeedFactor: speedFactor.optional(),
  approachAngle: quantityField('angle', { above: 0, to: 0.2 }).optional(),
  brakingFriction: z.number().gt(0).lte(1).optional(),
  freeRollTime: quantityField('time', { from: 0, below: 60 }).optional(),
  clGround: z.number().gte(0).lte(3).optional(),
  liftDumping: z.boolean().optional(),
};

export const landingDistance = defineRequirement<'landing-distance', LandingDistanceRequirement, typeof shape>({
  kind: 'landing-distance',
  title: 'Landing distance',
  colour: '#4b4e8c', // indigo slate
  shape,
  resolve: (r, si) => ({
    distanceM: si(r.distance, 'length', NaN),
    obstacleHeightM: si(r.obstacleHeight, 'length', 50 * FOOT_M),
    fieldLengthFactor: r.fieldLengthFactor ?? 1,
    approachSpeedFactor: r.approachSpeedFactor ?? APPROACH_SPEED_FACTOR,
    touchdownSpeedFactor: r.touchdownSpeedFactor ?? TOUCHDOWN_SPEED_FACTOR,
    approachAngleRad: si(r.approachAngle, 'angle', (3 * Math.PI) / 180),
    brakingFriction: r.brakingFriction ?? 0.3,
    freeRollTimeS: si(r.freeRollTime, 'time', 2),
    clGround: r.clGround ?? 0.5,
    liftDumping: r.liftDumping ?? false,
  }),
  drawnAs: 'limit',
  boundary: landingDistanceBoundary,
  usesDrag: () => true,
  segments: (r, aircraft, w) => ({ ...landingDistanceSegments(r, aircraft, w) }),
  speedText: 'the approach speed k_app V_s,L at the obstacle',
  defaultConfiguration: 'landing',
  propeller: null,
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'distance', title: 'Landing distance (field length with a factor)', value: lengthValue(), required: true },
    { key: 'obstacleHeight', title: 'Obstacle height', value: lengthValue(), defaultText: '50 ft' },
    { key: 'fieldLengthFactor', title: 'Field length factor', value: numberValue(), defaultText: '1 (unfactored)' },
    { key: 'approachSpeedFactor', title: 'Approach speed / stall speed', value: numberValue(), defaultText: '1.3', advanced: true },
    { key: 'touchdownSpeedFactor', title: 'Touchdown speed / stall speed', value: numberValue(), defaultText: '1.15', advanced: true },
    { key: 'approachAngle', title: 'Approach angle', value: { type: 'quantity', dimension: 'angle', units: { si: 'deg', us: 'deg' } }, defaultText: '3°', advanced: true },
    { key: 'brakingFriction', title: 'Braking friction', value: numberValue(), defaultText: '0.3', advanced: true, typical: mark(BRAKING_FRICTION) },
    { key: 'freeRollTime', title: 'Free-roll time', value: { type: 'quantity', dimension: 'time', units: { si: 's', us: 's' } }, defaultText: '2 s', advanced: true },
    { key: 'clGround', title: 'Lift coefficient in the braking roll', value: numberValue(), defaultText: '0.5', advanced: true },
    { key: 'liftDumping', title: 'Lift dumping', value: { type: 'switch' }, defaultText: 'off', advanced: true },
  ],
  newRequirement: { distance: '600 m', obstacleHeight: '50 ft' },
  summary: (r, system) => [
    r.fieldLengthFactor < 1
      ? `${formatQuantity(r.distanceM, 'length', system)} field length × ${plain(r.fieldLengthFactor)}`
      : `${formatQuantity(r.distanceM, 'length', system)} over ${formatQuantity(r.obstacleHeightM, 'length', system)}`,
    `μ braking ${plain(r.brakingFriction)}`,
  ],
  costStep: { field: 'distanceM', conceptField: 'distance', relaxed: 'up' },
  typicalRanges: [{ field: 'brakingFriction', key: 'brakingFriction', title: 'Braking friction', label: 'Braking friction', range: BRAKING_FRICTION, bounds: { min: 0, max: 1, openMin: true, openMax: false } }],
  // The flare slows the aircraft: a written factor is held against the other's default too.
  issues: (r) => {
    const approach = r.approachSpeedFactor ?? APPROACH_SPEED_FACTOR;
    const touchdown = r.touchdownSpeedFactor ?? TOUCHDOWN_SPEED_FACTOR;
    if (!(touchdown > approach)) return [];
    if (r.touchdownSpeedFactor === undefined) {
      return [{ field: 'approachSpeedFactor', message: `must not be below touchdownSpeedFactor (${touchdown} by default); got ${approach}` }];
    }
    const given = r.approachSpeedFactor === undefined ? `${approach} by default` : `${approach}`;
    return [{ field: 'touchdownSpeedFactor', message: `must not exceed approachSpeedFactor (${given}); got ${touchdown}` }];
  },
  templates: [],
  methods: `### Landing distance (\`landing-distance\`)

A limit: the largest wing loading whose landing from the obstacle height h_obs, at landing mass (beta), fits within the allowed distance f S, f the field length factor (1 by default; 0.6 turns S into a factored landing field length, the landing distance being at most 60 % of it). Four segments, at the field's density:

    S_L = S_A + S_F + S_FR + S_B <= f S
    R = V_F^2 / (g0 (n - 1)),  n = 1.2,  V_F = (V_app + V_TD)/2,  h_F = R (1 - cos gamma_a)
    S_A = (h_obs - h_F) / tan gamma_a,   S_F = R sin gamma_a   (h_F >= h_obs: S_A = 0, S_F = sqrt(R^2 - (R - h_obs)^2))
    S_FR = V_TD t_fr
    S_B = ln[K_T / (K_T + K_A V_TD^2)] / (2 g0 K_A),   K_T = -mu_B,   K_A = rho (mu_B C_L,g - C_D,g) / (2 beta w)
    V_app = k_app V_s,L,   V_TD = k_TD V_s,L

- k_app 1.3 and k_TD 1.15 by default, the flare at their mean (Raymer ch. 17: 1.3, 1.23, 1.15 V_s; from memory); gamma_a 3 degrees by default; h_obs 50 ft by default. A k_TD above k_app, written or by default, is refused: the flare slows the aircraft.
- mu_B: braking friction, 0.3 by default (Raymer Table 17.1, from memory); t_fr: free roll, 2 s by default (Raymer: 1-3 s, from memory).
- C_L,g: lift coefficient in the braking roll, 0.5 by default; \`liftDumping\` makes it 0 (spoilers) while the configuration's drag stays. Idle thrust is taken as zero and reverse thrust is never credited.
- Every segment grows with wing loading, so the limit is found by a bracketing root search. Where even a vanishing wing loading does not fit (the air distance alone exceeds f S), the limit is 0.
- The evaluation reports the four segments at the optimum.
- Source: Raymer, *Aircraft Design: A Conceptual Approach*, ch. 17 (landing analysis, braking roll eq. 17.101; from memory). The 0.6 factor is the operating rule for turbine transports' dry-runway landing field length (14 CFR 121.195(b), from memory).`,
});

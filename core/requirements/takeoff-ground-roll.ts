/**
 * Take-off ground roll: the thrust or power that accelerates the aircraft to
 * lift-off within the distance.
 */
import * as z from 'zod';
import { RUNWAY_SURFACES } from '../assumptions/study-case';
import { CL_GROUND_RUN, PROPELLER_TAKEOFF, ROLLING_FRICTION } from '../assumptions/typical-ranges';
import { polarOf, type Polar } from '../aero/drag-polar';
import type { Aircraft } from '../aircraft';
import { MEAN_ROLL_SPEED_FRACTION, takeoffGroundRollBoundary, type TakeoffGroundRollRequirement } from '../constraints/takeoff-ground-roll';
import { quantityField } from '../concept/quantity-field';
import { formatQuantity } from '../units/display';
import { messageNumber } from '../units/message-number';
import { defineRequirement } from './descriptor';
import { lengthValue, mark, numberValue, plain, runwaySurfaceField, speedFactor } from './fields';

export type { TakeoffGroundRollRequirement };

/**
 * A ground-run lift coefficient at or above C_Lmax lifts the aircraft before lift-off speed; one whose lift at the
 * mean-force speed reaches the weight leaves the wheels no load (zero or negative rolling friction).
 */
function groundRunRefusals(r: TakeoffGroundRollRequirement, aircraft: Aircraft): { field: string; message: string }[] {
  const polar = polarOf(aircraft, r.configuration) ?? (polarOf(aircraft, 'clean') as Polar);
  if (!(r.clGroundRun < polar.clMax)) {
    return [{ field: 'clGroundRun', message: `${messageNumber(r.clGroundRun)} is at or above the ${r.configuration} C_Lmax ${messageNumber(polar.clMax)} (requirement "${r.id}"): the wing would lift the aircraft before lift-off speed; use a value below C_Lmax` }];
  }
  // Lift over weight at the mean-force speed: qbar C_L,g/(beta w) = (0.7 k_LOF)^2 C_L,g / C_Lmax.
  const k = MEAN_ROLL_SPEED_FRACTION * r.liftoffSpeedFactor;
  const liftOverWeight = (k * k * r.clGroundRun) / polar.clMax;
  if (r.rollingFriction > 0 && !(liftOverWeight < 1)) {
    return [
      {
        field: 'clGroundRun',
        message: `${messageNumber(r.clGroundRun)} with lift-off at ${messageNumber(r.liftoffSpeedFactor)} V_s gives lift at or above the weight during the roll, so no wheel load: zero or negative rolling friction (requirement "${r.id}"); use a smaller ground-run C_L`,
      },
    ];
  }
  return [];
}

const shape = {
  distance: quantityField('length', { above: 0 }),
  rollingFriction: z.number().gte(0).lt(1).optional(),
  runwaySurface: z.enum(RUNWAY_SURFACES).optional(),
  clGroundRun: z.number().gte(0).optional(),
  liftoffSpeedFactor: speedFactor.optional(),
};

export const takeoffGroundRoll = defineRequirement<'takeoff-ground-roll', TakeoffGroundRollRequirement, typeof shape>({
  kind: 'takeoff-ground-roll',
  title: 'Take-off ground roll',
  colour: '#b8632b', // kiln orange
  shape,
  resolve: (r, si) => ({
    distanceM: si(r.distance, 'length', NaN),
    rollingFriction: r.rollingFriction ?? 0.04,
    ...(r.runwaySurface !== undefined ? { runwaySurface: r.runwaySurface } : {}),
    clGroundRun: r.clGroundRun ?? 0.5,
    liftoffSpeedFactor: r.liftoffSpeedFactor ?? 1.1,
  }),
  drawnAs: 'curve',
  boundary: takeoffGroundRollBoundary,
  speedText: 'the lift-off speed k_LOF V_s,TO (forces taken at 0.7 of it)',
  defaultConfiguration: 'takeoff',
  propeller: { default: 0.55, typical: PROPELLER_TAKEOFF },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'distance', title: 'Ground roll', value: lengthValue(), required: true },
    { key: 'rollingFriction', title: 'Rolling friction', value: numberValue(), defaultText: '0.04', advanced: true, typical: mark(ROLLING_FRICTION) },
    runwaySurfaceField,
    { key: 'clGroundRun', title: 'Lift coefficient in the ground run', value: numberValue(), defaultText: '0.5', advanced: true, typical: mark(CL_GROUND_RUN) },
    { key: 'liftoffSpeedFactor', title: 'Lift-off speed / stall speed', value: numberValue(), defaultText: '1.1', advanced: true },
  ],
  newRequirement: { distance: '400 m' },
  summary: (r, system) => [
    `${formatQuantity(r.distanceM, 'length', system)} ground roll`,
    `μ rolling ${plain(r.rollingFriction, 3)}`,
    `CL ground run ${plain(r.clGroundRun)}`,
  ],
  costStep: { field: 'distanceM', conceptField: 'distance', relaxed: 'up' },
  typicalRanges: [
    { field: 'rollingFriction', key: 'rollingFriction', title: 'Rolling friction', label: 'Rolling friction', range: ROLLING_FRICTION, bounds: { min: 0, max: 1, openMin: false, openMax: true } },
    { field: 'clGroundRun', key: 'clGroundRun', title: 'Ground-run C_L', label: 'Ground-run CL', range: CL_GROUND_RUN, bounds: { min: 0, max: Infinity, openMin: false, openMax: false } },
  ],
  refused: groundRunRefusals,
  templates: [],
  methods: `### Take-off ground roll (\`takeoff-ground-roll\`)

A curve: the sea-level rated thrust per take-off weight that reaches the lift-off speed within the ground roll S_G, using the mean acceleration of the roll with the forces taken at 0.7 V_LOF.

    T_SL/W_TO = (beta/alpha) [ V_LOF^2 / (2 g0 S_G) + qbar C_D,g / (beta w) + mu (1 - qbar C_L,g / (beta w)) ]
    C_D,g = C_D0,TO + K1 C_L,g + K_TO C_L,g^2,   V_LOF = k_LOF V_s,TO,   qbar = 1/2 rho (0.7 V_LOF)^2

- Propeller aircraft: P_SL/W_TO = (T/W) 0.7 V_LOF / eta_p, with eta_p 0.55 by default (0.5-0.6 typical in the run, common practice).
- k_LOF: lift-off over take-off stall speed, 1.1 by default (Raymer ch. 17; Gudmundsson). mu: rolling friction, 0.04 by default (paved 0.02-0.05, grass 0.05-0.1, soft ground to 0.3; Brandt et al.). C_L,g: lift coefficient in the run, 0.5 by default (0.3-0.8, common practice).
- The stall speed and the dynamic pressure use the field density (pressure altitude and temperature offset). qbar/w is constant, so the jet boundary is a straight line in w.
- No ground effect, no runway slope or wind; the air distance to a screen height is not included. The mean-acceleration form agrees with Raymer's exact constant-thrust form (eq. 17.102, from memory) within about 1 %.
- Source: Raymer, *Aircraft Design: A Conceptual Approach*, ch. 17 (forces at 0.7 V_LOF also Roskam practice).`,
});

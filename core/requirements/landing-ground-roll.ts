/**
 * Landing ground roll: a wing-loading limit from the touchdown speed that
 * stops in the distance.
 */
import { BRAKING_FRICTION } from '../assumptions/typical-ranges';
import { landingGroundRollBoundary, type LandingGroundRollRequirement } from '../constraints/landing-ground-roll';
import { quantityField } from '../concept/quantity-field';
import { formatQuantity } from '../units/display';
import * as z from 'zod';
import { defineRequirement } from './descriptor';
import { lengthValue, mark, numberValue, plain, speedFactor } from './fields';

export type { LandingGroundRollRequirement };

const shape = {
  distance: quantityField('length', { above: 0 }),
  brakingFriction: z.number().gt(0).lte(1).optional(),
  touchdownSpeedFactor: speedFactor.optional(),
  freeRollTime: quantityField('time', { from: 0 }).optional(),
  clGround: z.number().gte(0).lte(3).optional(),
  liftDumping: z.boolean().optional(),
};

export const landingGroundRoll = defineRequirement<'landing-ground-roll', LandingGroundRollRequirement, typeof shape>({
  kind: 'landing-ground-roll',
  title: 'Landing ground roll',
  colour: '#6b5b95', // heather
  shape,
  resolve: (r, si) => ({
    distanceM: si(r.distance, 'length', NaN),
    brakingFriction: r.brakingFriction ?? 0.3,
    touchdownSpeedFactor: r.touchdownSpeedFactor ?? 1.15,
    freeRollTimeS: si(r.freeRollTime, 'time', 0),
    clGround: r.clGround ?? null,
    liftDumping: r.liftDumping ?? false,
  }),
  drawnAs: 'limit',
  boundary: landingGroundRollBoundary,
  usesDrag: (r) => r.clGround !== null || r.liftDumping,
  speedText: 'the touchdown speed, k_TD times the landing stall speed',
  defaultConfiguration: 'landing',
  propeller: null,
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'distance', title: 'Ground roll', value: lengthValue(), required: true },
    { key: 'brakingFriction', title: 'Braking friction', value: numberValue(), defaultText: '0.3', advanced: true, typical: mark(BRAKING_FRICTION) },
    { key: 'touchdownSpeedFactor', title: 'Touchdown speed / stall speed', value: numberValue(), defaultText: '1.15', advanced: true },
    {
      key: 'freeRollTime',
      title: 'Free-roll time',
      value: { type: 'quantity', dimension: 'time', units: { si: 's', us: 's' } },
      defaultText: '0 s',
      advanced: true,
    },
    { key: 'clGround', title: 'Lift coefficient in the braking roll', value: numberValue(), defaultText: 'no aerodynamic terms', advanced: true },
    { key: 'liftDumping', title: 'Lift dumping', value: { type: 'switch' }, defaultText: 'off', advanced: true },
  ],
  newRequirement: { distance: '400 m' },
  summary: (r, system) => [`${formatQuantity(r.distanceM, 'length', system)} ground roll`, `μ braking ${plain(r.brakingFriction)}`],
  costStep: { field: 'distanceM', conceptField: 'distance', relaxed: 'up' },
  typicalRanges: [{ field: 'brakingFriction', key: 'brakingFriction', title: 'Braking friction', label: 'Braking friction', range: BRAKING_FRICTION, bounds: { min: 0, max: 1, openMin: true, openMax: false } }],
  templates: [],
  methods: `### Landing ground roll (\`landing-ground-roll\`)

A limit: the touchdown speed must be low enough to stop within the ground roll S_LG, after a free roll of t_fr seconds and then a constant braking deceleration a = mu_B g0.

    V_TD = -a t_fr + sqrt((a t_fr)^2 + 2 a S_LG)
    w <= 1/2 rho C_Lmax,L (V_TD / k_TD)^2 / beta

- rho: air density at the field's pressure altitude and temperature offset.
- k_TD: touchdown speed over landing stall speed, 1.15 by default (Raymer, *Aircraft Design: A Conceptual Approach*, ch. 17; from memory).
- mu_B: braking friction, 0.3 by default (dry runway 0.3-0.5, wet 0.15-0.3, Raymer Table 17.1; from memory). t_fr: 0 s by default.
- Without \`clGround\` or \`liftDumping\` (as in files written before they existed), aerodynamic lift and drag during the roll are left out. With them, the braking roll takes the aerodynamic lift C_L,g (0 with lift dumping) and the configuration's drag, idle thrust zero, by Raymer's closed form (ch. 17, eq. 17.101, from memory), and the limit is the largest wing loading whose free roll plus braking roll fits (bracketing root search):

      S = V_TD t_fr + ln[K_T / (K_T + K_A V_TD^2)] / (2 g0 K_A),   K_T = -mu_B,   K_A = rho (mu_B C_L,g - C_D,g) / (2 beta w)

- Reverse thrust is never credited; the air distance over the threshold is not included (see \`landing-distance\`).
- Source: uniformly decelerated motion (kinematics), with Raymer's touchdown-speed ratio.`,
});

/**
 * Landing ground roll: a wing-loading limit from the touchdown speed that
 * stops in the distance.
 */
import { BRAKING_FRICTION } from '../assumptions/typical-ranges';
import { landingGroundRollBoundary, type LandingGroundRollRequirement } from '../constraints/landing-ground-roll';
import { quantityField } from '../concept/quantity-field';
import { formatQuantity } from '../units/display';
import { z } from 'zod';
import { defineRequirement } from './descriptor';
import { lengthValue, mark, numberValue, plain, speedFactor } from './fields';

export type { LandingGroundRollRequirement };

const shape = {
  distance: quantityField('length', { above: 0 }),
  brakingFriction: z.number().gt(0).lte(1).optional(),
  touchdownSpeedFactor: speedFactor.optional(),
  freeRollTime: quantityField('time', { from: 0 }).optional(),
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
  }),
  drawnAs: 'limit',
  boundary: landingGroundRollBoundary,
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
- Aerodynamic drag and reverse thrust during the roll are left out, which errs on the long side; the air distance over the threshold is not included.
- Source: uniformly decelerated motion (kinematics), with Raymer's touchdown-speed ratio.`,
});

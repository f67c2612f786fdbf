/**
 * Approach speed: a wing-loading limit from the highest approach speed a
 * programme allows, flown at a factor over the landing-configuration stall
 * speed at landing mass.
 */
// @ts-nocheck

import { RHO0 } from '../atmosphere';
import { stallSpeed } from '../aero/speeds';
import type { Aircraft } from '../aircraft';
import type { BoundaryOf } from '../boundary';
import { flightCondition } from '../constraints/flight-condition';
import { formatQuantity } from '../units/display';
import type { RequirementCommon } from './common';
import { defineRequirement } from './descriptor';
import { numberValue, plain, positiveSpeed, speedFactor, speedValue } from './fields';

export interface ApproachSpeedRequirement extends RequirementCommon {
  kind: 'approach-speed';
  /** Calibrated airspeed [m/s]. */
  speedMps: number;
  /** Approach speed over the configuration's stall speed. */
  speedFactor: number;
}

/** w <= 1/2 rho0 (V_app / k_app)^2 C_Lmax,L / beta (CAS taken as EAS, as the stall kind). */
export function approachSpeedBoundary(r: ApproachSpeedRequirement, aircraft: Aircraft): BoundaryOf<'approach-speed'> {
  const c = flightCondition(r, aircraft);
  const vs = r.speedMps / r.speedFactor;
  return {
    type: 'limit',
    id: r.id,
    kind: r.kind,
    wingLoadingMaxPa: (0.5 * RHO0 * vs * vs * c.polar.clMax) / c.beta,
    speedAt: (w: number): number => (w > 0 ? r.speedFactor * stallSpeed(c.beta * w, RHO0, c.polar.clMax) : NaN),
  };
}

const shape = {
  speed: positiveSpeed,
  speedFactor: speedFactor.optional(),
};

export const approachSpeed = defineRequirement<'approach-speed', ApproachSpeedRequirement, typeof shape>({
  kind: 'approach-speed',
  title: 'Approach speed',
  colour: '#3f7f8c', // slate teal
  shape,
  resolve: (r, si) => ({
    speedMps: si(r.speed, 'speed', NaN),
    speedFactor: r.speedFactor ?? 1.3,
  }),
  drawnAs: 'limit',
  boundary: approachSpeedBoundary,
  speedText: 'the approach speed k_app V_s,L at landing mass',
  defaultConfiguration: 'landing',
  propeller: null,
  atmosphere: { altitude: false, temperature: false },
  editorFields: [
    { key: 'speed', title: 'Approach speed (CAS)', value: speedValue(), required: true },
    { key: 'speedFactor', title: 'Approach speed / stall speed', value: numberValue(), defaultText: '1.3' },
  ],
  newRequirement: { speed: '70 kt', speedFactor: 1.3 },
  summary: (r, system) => [`${formatQuantity(r.speedMps, 'speed', system)} CAS`, `at ${plain(r.speedFactor)} × stall speed`],
  costStep: { field: 'speedMps', conceptField: 'speed', relaxed: 'up' },
  typicalRanges: [],
  templates: [],
  methods: `### Approach speed (\`approach-speed\`)

A limit: the approach speed V_app, flown at k_app times the stall speed of the landing configuration at landing mass (beta = \`massFraction\`), must not exceed the speed the programme allows.

    w <= 1/2 rho0 (V_app / k_app)^2 C_Lmax,L / beta

- V_app: calibrated airspeed, taken as equivalent (as the stall limit), so the field altitude does not matter.
- k_app: 1.3 by default, the small-aircraft rule (V_REF at least 1.3 V_S0, 14 CFR 23.73 before Amendment 23-64, from memory); transports use 1.23 V_SR0 (14 CFR 25.125(b), from memory).
- The characteristic approach speed the evaluation reports beside the design point follows this requirement's factor, configuration and mass when the concept has one (the first enabled one); else 1.3 V_S0 at take-off mass, and it says which.
- Source: Anderson, *Introduction to Flight*, stalling speed, with the approach-speed factors of the rules named.`,
});

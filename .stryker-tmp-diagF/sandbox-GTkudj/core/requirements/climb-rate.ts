/**
 * Rate of climb: a steady climb at a given rate, at a given speed or at the
 * best-rate speed.
 */
// @ts-nocheck

import { PROPELLER_CLIMB } from '../assumptions/typical-ranges';
import { climbRateBoundary, type ClimbRateRequirement } from '../constraints/climb-rate';
import { formatQuantity } from '../units/display';
import { defineRequirement } from './descriptor';
import { numberValue, positiveSpeed, trueAirspeed, rateValue, speedFactor, trueSpeedValue } from './fields';

export type { ClimbRateRequirement };

const shape = {
  rate: positiveSpeed,
  speed: trueAirspeed.optional(),
  minimumSpeedFactor: speedFactor.optional(),
};

export const climbRate = defineRequirement<'climb-rate', ClimbRateRequirement, typeof shape>({
  kind: 'climb-rate',
  title: 'Rate of climb',
  colour: '#a63d4f', // brick
  shape,
  resolve: (r, si) => ({
    rateMps: si(r.rate, 'speed', NaN),
    ...(r.speed !== undefined ? { speedMps: si(r.speed, 'speed', NaN) } : {}),
    minimumSpeedFactor: r.minimumSpeedFactor ?? 1.2,
  }),
  drawnAs: 'curve',
  boundary: climbRateBoundary,
  speedText: 'the given TAS, else the best-rate speed V* but not below k times the stall speed',
  defaultConfiguration: 'clean',
  propeller: { default: 0.75, typical: PROPELLER_CLIMB },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'rate', title: 'Rate of climb', value: rateValue(), required: true },
    { key: 'speed', title: 'Climb speed (TAS)', value: trueSpeedValue(), defaultText: 'best-rate speed', advanced: true },
    { key: 'minimumSpeedFactor', title: 'Least speed / stall speed', value: numberValue(), defaultText: '1.2', advanced: true },
  ],
  newRequirement: { rate: '800 ft/min' },
  summary: (r, system) => [
    `${formatQuantity(r.rateMps, 'climbRate', system)}`,
    r.speedMps === undefined ? 'at the best-rate speed' : `at ${formatQuantity(r.speedMps, 'speed', system)} TAS`,
  ],
  costStep: { field: 'rateMps', conceptField: 'rate', relaxed: 'down' },
  unattainableField: (r) => (r.speedMps !== undefined ? 'speed' : undefined),
  typicalRanges: [],
  templates: [],
  methods: `### Rate of climb (\`climb-rate\`)

A curve: the master equation (section 6.1) with n = 1 and P_s = RC, the required rate of climb, at the given true airspeed or else at the best-rate speed V* (section 6.2), never below k times the stall speed of the configuration (k = 1.2 by default, the climb-speed floor of 14 CFR 23.65 and 23.67).

- Propeller aircraft: eta_p 0.75 by default (0.7-0.8 typical in climb, common practice).
- A steady climb: the flight-path angle is taken as small (lift = weight), which holds for the climb rates of sizing.
- Source: Mattingly, Heiser and Pratt, *Aircraft Engine Design*, constraint analysis.`,
});

/**
 * Ceiling: a small residual rate of climb at the ceiling altitude, at the
 * best-rate speed.
 */
// @ts-nocheck

import { PROPELLER_CLIMB } from '../assumptions/typical-ranges';
import { ceilingBoundary, type CeilingRequirement } from '../constraints/ceiling';
import { quantityField } from '../concept/quantity-field';
import { FOOT_PER_MINUTE_MPS } from '../units/factors';
import { formatQuantity } from '../units/display';
import { defineRequirement } from './descriptor';
import { altitude, lengthValue, numberValue, rateValue, speedFactor } from './fields';

export type { CeilingRequirement };

const shape = {
  altitude,
  rate: quantityField('speed', { from: 0 }).optional(),
  minimumSpeedFactor: speedFactor.optional(),
};

export const ceiling = defineRequirement<'ceiling', CeilingRequirement, typeof shape>({
  kind: 'ceiling',
  title: 'Ceiling',
  colour: '#6e4f36', // walnut
  shape,
  resolve: (r, si) => ({
    // Service ceiling: 100 ft/min (Anderson, Introduction to Flight; Raymer).
    rateMps: si(r.rate, 'speed', 100 * FOOT_PER_MINUTE_MPS),
    minimumSpeedFactor: r.minimumSpeedFactor ?? 1.2,
  }),
  drawnAs: 'curve',
  boundary: ceilingBoundary,
  speedText: 'the best-rate speed V* at the ceiling, not below k times the stall speed',
  defaultConfiguration: 'clean',
  propeller: { default: 0.75, typical: PROPELLER_CLIMB },
  atmosphere: { altitude: false, temperature: true },
  editorFields: [
    { key: 'altitude', title: 'Ceiling (pressure altitude)', value: lengthValue(), required: true },
    { key: 'rate', title: 'Rate of climb there', value: rateValue(), defaultText: '100 ft/min', advanced: true },
    { key: 'minimumSpeedFactor', title: 'Least speed / stall speed', value: numberValue(), defaultText: '1.2', advanced: true },
  ],
  newRequirement: { altitude: '18000 ft' },
  summary: (r, system) => [`${formatQuantity(r.rateMps, 'climbRate', system)} at ${formatQuantity(r.altitudeM, 'altitude', system)}`],
  costStep: { field: 'altitudeM', conceptField: 'altitude', relaxed: 'down' },
  typicalRanges: [],
  templates: [],
  methods: `### Ceiling (\`ceiling\`)

A curve: the rate-of-climb boundary at the ceiling's pressure altitude, with the residual rate of climb there: 100 ft/min (0.508 m/s) by default, the service ceiling (Anderson, *Introduction to Flight*; Raymer). An absolute ceiling is a rate of 0; a jet's cruise ceiling is often taken at 300 ft/min (common practice).

- Speed: the best-rate speed V* (section 6.2), never below k times the clean stall speed (k = 1.2 by default).
- Propeller aircraft: eta_p 0.75 by default.
- Source: Mattingly, Heiser and Pratt, *Aircraft Engine Design*, constraint analysis, with the ceiling definitions of Anderson and Raymer.`,
});

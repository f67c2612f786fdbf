/**
 * Sustained turn: a level coordinated turn at a true airspeed and load factor.
 */
import * as z from 'zod';
import { PROPELLER_CRUISE } from '../assumptions/typical-ranges';
import { sustainedTurnBoundary, type SustainedTurnRequirement } from '../constraints/sustained-turn';
import { quantityField } from '../concept/quantity-field';
import { formatQuantity } from '../units/display';
import { defineRequirement } from './descriptor';
import { numberValue, plain, trueAirspeed, trueSpeedValue } from './fields';

export type { SustainedTurnRequirement };

const shape = {
  speed: trueAirspeed,
  loadFactor: z.number().gte(1).optional(),
  bankAngle: quantityField('angle', { from: 0, below: Math.PI / 2 }).optional(),
};

export const sustainedTurn = defineRequirement<'sustained-turn', SustainedTurnRequirement, typeof shape>({
  kind: 'sustained-turn',
  title: 'Sustained turn',
  colour: '#2a8a9c', // lagoon
  shape,
  resolve: (r, si) => ({
    speedMps: si(r.speed, 'speed', NaN),
    // n = 1/cos(phi) in a level coordinated turn (Anderson, Introduction to Flight, ch. 6, turning flight).
    loadFactor: r.loadFactor ?? 1 / Math.cos(si(r.bankAngle, 'angle', NaN)),
  }),
  drawnAs: 'curve',
  boundary: sustainedTurnBoundary,
  speedText: 'the required turn speed (TAS)',
  defaultConfiguration: 'clean',
  propeller: { default: 0.8, typical: PROPELLER_CRUISE },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'speed', title: 'Turn speed (TAS)', value: trueSpeedValue(), required: true },
    { key: 'loadFactor', title: 'Load factor', value: numberValue(), defaultText: 'from bank angle' },
    {
      key: 'bankAngle',
      title: 'Bank angle',
      value: { type: 'quantity', dimension: 'angle', units: { si: 'deg', us: 'deg' } },
      defaultText: 'from load factor',
      advanced: true,
    },
  ],
  newRequirement: { speed: '120 kt', loadFactor: 2 },
  summary: (r, system) => [`n ${plain(r.loadFactor)} at ${formatQuantity(r.speedMps, 'speed', system)} TAS`],
  costStep: { field: 'loadFactor', conceptField: 'loadFactor', relaxed: 'down', least: { value: 1, note: 'The relaxed load factor is held at 1 (level flight); a turn needs n of 1 or more.' } },
  unattainableField: () => 'speed',
  typicalRanges: [],
  issues: (r) => {
    if ((r.loadFactor === undefined) !== (r.bankAngle === undefined)) return [];
    const what = r.loadFactor === undefined ? 'needs' : 'has both; give only one of';
    return [{ field: '', message: `${what} loadFactor (e.g. 1.5) or bankAngle (e.g. "45 deg")` }];
  },
  templates: [],
  methods: `### Sustained turn (\`sustained-turn\`)

A curve: the master equation (section 6.1) with the turn's load factor n and P_s = 0, at the required true airspeed: a level, coordinated turn that holds its speed and height.

    n = 1 / cos(phi)

- The file gives either the load factor n or the bank angle phi (Anderson, *Introduction to Flight*, ch. 6, turning flight).
- Propeller aircraft: eta_p 0.8 by default.
- Where C_L = n beta w / q exceeds C_Lmax the turn cannot be flown at that wing loading, whatever the thrust: its stall line w = q C_Lmax / (n beta) is drawn as a limit (\`stallLimit\` in the evaluation, a warning says so), and past it the margin is that of a limit, 1 - w/w_stall.
- Source: Mattingly, Heiser and Pratt, *Aircraft Engine Design*, constraint analysis.`,
});

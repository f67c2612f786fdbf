/**
 * Climb gradient: a steady climb at a gradient and a speed tied to the stall
 * speed, possibly with engines inoperative (e.g. the 2.4 % second segment of
 * 14 CFR 25.121(b) for twins).
 */
import * as z from 'zod';
import { PROPELLER_CLIMB } from '../assumptions/typical-ranges';
import { climbGradientBoundary, type ClimbGradientRequirement } from '../constraints/climb-gradient';
import { quantityProblem } from '../concept/quantity-field';
import { defineRequirement, type TemplateRow } from './descriptor';
import { numberValue, percent, plain, speedFactor } from './fields';

export type { ClimbGradientRequirement };

/** sin(gamma) as 0.024 or "2.4 %"; 2.4 bare is caught as 240 %. */
function gradientProblem(input: unknown): string | undefined {
  if (typeof input === 'number' && input >= 1) {
    return `is ${input}, which would mean ${input * 100} %; write ${input / 100} or "${input} %"`;
  }
  return quantityProblem(input, 'fraction', { from: 0, below: 1 });
}
const gradient = z.custom<number | string>((input) => gradientProblem(input) === undefined, {
  error: (issue) => gradientProblem(issue.input) ?? 'is not valid',
});

const shape = {
  gradient,
  enginesInoperative: z.number().int().gte(0).optional(),
  /** Climb speed over stall speed; files before it read `speedFactor` (core/concept/migrate.ts). */
  climbSpeedFactor: speedFactor.optional(),
};

const per = (value: number) => `${value} %`;

/** [engines, 25.121(a), (b), (c), (d)] gradients in per cent. */
const PART_25_121: ReadonlyArray<readonly [number, number, number, number, number]> = [
  [2, 0, 2.4, 1.2, 2.1],
  [3, 0.3, 2.7, 1.5, 2.4],
  [4, 0.5, 3.0, 1.7, 2.7],
];

const PART_23_RULES: TemplateRow[] = [
  ...(['landplane', 'seaplane'] as const).map((type) => ({
    code: 'part-23' as const,
    id: `14cfr-23.65a-${type}`, title: `All-engine take-off climb, ${type}`, source: '14 CFR 23.65(a)',
    note: `Steady gradient ${type === 'landplane' ? '8.3' : '6.7'} % at sea level, maximum continuous power, gear up, take-off flaps, at least 1.2 V_S1 (climbSpeedFactor 1.2).`,
    requirement: { kind: 'climb-gradient', gradient: per(type === 'landplane' ? 8.3 : 6.7), altitude: '0 ft', climbSpeedFactor: 1.2 },
  })),
  {
    code: 'part-23',
    id: '14cfr-23.65b', title: 'All-engine take-off climb, 4 %', source: '14 CFR 23.65(b)',
    note: 'Steady gradient 4 % for turbine airplanes and reciprocating airplanes over 6000 lb; climbSpeedFactor 1.2 stands for the rule\'s climb speed.',
    requirement: { kind: 'climb-gradient', gradient: per(4), altitude: '0 ft', climbSpeedFactor: 1.2 },
  },
  {
    code: 'part-23',
    id: '14cfr-23.67a1', title: 'One engine inoperative climb at 5000 ft, 1.5 %', source: '14 CFR 23.67(a)(1)',
    note: 'Steady gradient 1.5 % at 5000 ft pressure altitude with one engine inoperative, flaps up, at least 1.2 V_S1.',
    engines: 2, configurations: ['clean'],
    requirement: { kind: 'climb-gradient', gradient: per(1.5), altitude: '5000 ft', enginesInoperative: 1, climbSpeedFactor: 1.2 },
  },
  ...([['a', 3.3], ['b', 2.5], ['c', 3.2]] as const).map(([paragraph, value]) => ({
    code: 'part-23' as const,
    id: `14cfr-23.77${paragraph}`, title: `Balked landing climb, ${value} %`, source: `14 CFR 23.77(${paragraph})`,
    note: `Steady gradient ${value} % at sea level, take-off power, landing flaps, at V_REF; climbSpeedFactor 1.3 stands for V_REF (at least 1.3 V_S0, 14 CFR 23.73(c)). See 23.77 for which paragraph applies.`,
    configurations: ['landing'],
    requirement: { kind: 'climb-gradient', gradient: per(value), altitude: '0 ft', climbSpeedFactor: 1.3 },
  })),
  ...([['landplane', 8.3], ['seaplane', 6.7], ['4-percent', 4]] as const).map(([variant, value]) => ({
    code: 'part-23' as const,
    id: `14cfr-23.2120a-${variant}`, title: `All-engine climb, ${value} %`, source: '14 CFR 23.2120(a) (Amendment 23-64)',
    note: `Gradient ${value} %${variant === '4-percent' ? ' for the airplanes 23.2120(a) names' : ` for ${variant}s`}; the conditions (power, configuration, speed) come from the accepted means of compliance; climbSpeedFactor 1.2 is a proxy.`,
    requirement: { kind: 'climb-gradient', gradient: per(value), altitude: '0 ft', climbSpeedFactor: 1.2 },
  })),
  ...([['b1', 1.5, '5000 ft'], ['b2', 1, '400 ft'], ['b3', 2, '400 ft']] as const).map(([paragraph, value, altitude]) => ({
    code: 'part-23' as const,
    id: `14cfr-23.2120${paragraph}`, title: `One engine inoperative climb at ${altitude}, ${value} %`,
    source: `14 CFR 23.2120(${paragraph[0]})(${paragraph[1]}) (Amendment 23-64)`,
    note: `Gradient ${value} % at ${altitude} with one engine inoperative, for the airplanes the paragraph names; climbSpeedFactor 1.2 is a proxy for the climb speed.`,
    engines: 2, configurations: paragraph === 'b1' ? ['clean'] : undefined,
    requirement: { kind: 'climb-gradient', gradient: per(value), altitude, enginesInoperative: 1, climbSpeedFactor: 1.2 },
  })),
];

const PART_25_RULES: TemplateRow[] = [
  ...PART_25_121.flatMap(([engines, a, b, c, d]): TemplateRow[] => [
    {
      code: 'part-25',
      id: `14cfr-25.121a-${engines}eng`, title: `Take-off climb, gear down, one engine out, ${engines} engines`, source: '14 CFR 25.121(a)',
      note: `Gradient ${a === 0 ? 'positive (0 % is the bound)' : `${a} %`} with the critical engine inoperative, gear down, take-off flaps, at V_LOF; climbSpeedFactor 1.2 stands for V_LOF.`,
      engines,
      requirement: { kind: 'climb-gradient', gradient: per(a), altitude: '0 ft', enginesInoperative: 1, climbSpeedFactor: 1.2 },
    },
    {
      code: 'part-25',
      id: `14cfr-25.121b-${engines}eng`, title: `Second segment, one engine out, ${engines} engines`, source: '14 CFR 25.121(b)',
      note: `Gradient ${b} % with the critical engine inoperative, gear up, take-off flaps, at V2; climbSpeedFactor 1.2 stands for V2 (a proxy: V2 is at least 1.13 V_SR, 14 CFR 25.107, from memory).`,
      engines,
      requirement: { kind: 'climb-gradient', gradient: per(b), altitude: '0 ft', enginesInoperative: 1, climbSpeedFactor: 1.2 },
    },
    {
      code: 'part-25',
      id: `14cfr-25.121c-${engines}eng`, title: `Final take-off climb, one engine out, ${engines} engines`, source: '14 CFR 25.121(c); 25.111(c)(3)',
      note: `Gradient ${c} % with the critical engine inoperative, en-route configuration, at the final take-off speed; climbSpeedFactor 1.2 is a proxy for that speed.`,
      engines, configurations: ['clean'],
      requirement: { kind: 'climb-gradient', gradient: per(c), altitude: '0 ft', enginesInoperative: 1, climbSpeedFactor: 1.2 },
    },
    {
      code: 'part-25',
      id: `14cfr-25.121d-${engines}eng`, title: `Approach climb, one engine out, ${engines} engines`, source: '14 CFR 25.121(d)',
      note: `Gradient ${d} % with the critical engine inoperative, approach configuration, at no more than 1.4 V_SR (climbSpeedFactor 1.4, the rule's upper bound).`,
      engines, configurations: ['approach', 'landing'],
      requirement: { kind: 'climb-gradient', gradient: per(d), altitude: '0 ft', enginesInoperative: 1, climbSpeedFactor: 1.4 },
    },
  ]),
  {
    code: 'part-25',
    id: '14cfr-25.119', title: 'Landing climb, all engines, 3.2 %', source: '14 CFR 25.119',
    note: 'Gradient 3.2 % with all engines, landing configuration, at V_REF; climbSpeedFactor 1.23 stands for V_REF (at least 1.23 V_SR0, 14 CFR 25.125, from memory).',
    configurations: ['landing'],
    requirement: { kind: 'climb-gradient', gradient: per(3.2), altitude: '0 ft', climbSpeedFactor: 1.23 },
  },
];

export const climbGradient = defineRequirement<'climb-gradient', ClimbGradientRequirement, typeof shape>({
  kind: 'climb-gradient',
  title: 'Climb gradient',
  colour: '#b98b12', // ochre
  shape,
  resolve: (r, si) => ({
    gradient: si(r.gradient, 'fraction', NaN),
    enginesInoperative: r.enginesInoperative ?? 0,
    speedFactor: r.climbSpeedFactor ?? 1.2,
  }),
  drawnAs: 'curve',
  boundary: climbGradientBoundary,
  speedText: 'k_V times the stall speed of the configuration',
  defaultConfiguration: 'takeoff',
  propeller: { default: 0.75, typical: PROPELLER_CLIMB },
  atmosphere: { altitude: true, temperature: true },
  editorFields: [
    { key: 'gradient', title: 'Climb gradient', value: { type: 'percent' }, required: true },
    {
      key: 'enginesInoperative',
      title: 'Engines inoperative',
      value: numberValue(true),
      defaultText: '0',
      help: "With engines out, name the configuration the rule flies in (for a second segment: take-off flaps, gear up) and give it its own CD0 increment holding the windmilling and trim drag (0.003-0.005 above that configuration's own, common practice); the default take-off configuration has neither.",
    },
    { key: 'climbSpeedFactor', title: 'Climb speed / stall speed', value: numberValue(), defaultText: '1.2', advanced: true },
  ],
  newRequirement: { gradient: '2.4 %' },
  summary: (r) => [
    `gradient ${percent(r.gradient)}`,
    ...(r.enginesInoperative > 0 ? [`${r.enginesInoperative} engine${r.enginesInoperative === 1 ? '' : 's'} out`] : []),
    `at ${plain(r.speedFactor)} × stall speed`,
  ],
  costStep: { field: 'gradient', conceptField: 'gradient', relaxed: 'down' },
  typicalRanges: [],
  issues: (r, { engines }) =>
    (r.enginesInoperative ?? 0) >= engines
      ? [{ field: 'enginesInoperative', message: `must be below the number of engines (aircraft.propulsion.engines is ${engines}; got ${r.enginesInoperative})` }]
      : [],
  impossible: (r, aircraft) =>
    r.enginesInoperative < aircraft.propulsion.engines
      ? undefined
      : {
          code: 'no-engine-left',
          field: 'enginesInoperative',
          message: `${r.enginesInoperative} of ${aircraft.propulsion.engines} engines inoperative leaves none running; the climb gradient cannot be met.`,
        },
  templates: [...PART_23_RULES, ...PART_25_RULES],
  methods: `### Climb gradient (\`climb-gradient\`)

A curve: a steady climb at gradient G = sin(gamma) (0.024 for 2.4 %), at a speed tied to the stall speed of the configuration, possibly with engines inoperative. It is the master equation (section 6.1) with P_s/V = G:

    T_SL/W_TO = f_N (beta/alpha) [ q C_D0 / (beta w) + K1 + K beta w / q + G ],   V = k_V V_s,c
    f_N = N / (N - k) with k of N engines inoperative, else 1

- k_V: climb speed over stall speed, 1.2 by default; with V/V_s fixed, q/w is constant, so the jet boundary is flat and the propeller boundary grows as sqrt(w).
- Engine-out drag (windmilling, trim) is the configuration's CD0 increment (0.003-0.005 typical, common practice); it is not added by itself.
- Which configuration a one-engine-out climb uses: the one the rule flies in, named in the requirement's \`configuration\`. The take-off climb segments (14 CFR 25.121(a) and (b)) fly with take-off flaps, the second segment with the gear up; the final take-off climb flies clean (en-route); the approach climb with approach flaps. Give that configuration its own entry (e.g. \`engine-out\` or \`second-segment\`) whose CD0 increment is the flaps' and gear's plus the windmilling and trim drag, and whose C_Lmax is the flap setting's. Left unnamed, the requirement uses the take-off configuration, which carries no engine-out drag.
- Propeller aircraft: eta_p 0.75 by default. No power or thrust is left when every engine is out; the engine warns instead of drawing.
- Certification gradients (14 CFR 23.65, 23.67, 23.77, 23.2120; 25.119, 25.121) are offered as templates with their rule named; the rule's speed is stood for by k_V.
- Source: Mattingly, Heiser and Pratt, *Aircraft Engine Design*; Raymer, *Aircraft Design: A Conceptual Approach*, ch. 5 (engine-out factor).`,
});

/**
 * Template rows from 14 CFR Part 23 and CS-22 (METHODS.md section 8,
 * confirmed rows only).
 */
import type { TemplateRow } from './templates';

const gradient = (value: number) => `${value} %`;

export const PART_23_ROWS: TemplateRow[] = [
  {
    id: '14cfr-23.49c', title: 'Stall speed, landing configuration, 61 kt CAS', source: '14 CFR 23.49(c) (before Amendment 23-64)',
    note: 'V_SO at most 61 kt CAS for single-engine airplanes, and for twins of 6000 lb or less that do not meet 23.67(a)(1).',
    configurations: ['landing'],
    requirement: { kind: 'stall', speed: '61 kt' },
  },
  ...(['landplane', 'seaplane'] as const).map((type) => ({
    id: `14cfr-23.65a-${type}`, title: `All-engine take-off climb, ${type}`, source: '14 CFR 23.65(a)',
    note: `Steady gradient ${type === 'landplane' ? '8.3' : '6.7'} % at sea level, maximum continuous power, gear up, take-off flaps, at least 1.2 V_S1 (speedFactor 1.2).`,
    requirement: { kind: 'climb-gradient', gradient: gradient(type === 'landplane' ? 8.3 : 6.7), altitude: '0 ft', speedFactor: 1.2 },
  })),
  {
    id: '14cfr-23.65b', title: 'All-engine take-off climb, 4 %', source: '14 CFR 23.65(b)',
    note: 'Steady gradient 4 % for turbine airplanes and reciprocating airplanes over 6000 lb; speedFactor 1.2 stands for the rule\'s climb speed.',
    requirement: { kind: 'climb-gradient', gradient: gradient(4), altitude: '0 ft', speedFactor: 1.2 },
  },
  {
    id: '14cfr-23.67a1', title: 'One engine inoperative climb at 5000 ft, 1.5 %', source: '14 CFR 23.67(a)(1)',
    note: 'Steady gradient 1.5 % at 5000 ft pressure altitude with one engine inoperative, flaps up, at least 1.2 V_S1.',
    engines: 2, configurations: ['clean'],
    requirement: { kind: 'climb-gradient', gradient: gradient(1.5), altitude: '5000 ft', enginesInoperative: 1, speedFactor: 1.2 },
  },
  ...([['a', 3.3], ['b', 2.5], ['c', 3.2]] as const).map(([paragraph, value]) => ({
    id: `14cfr-23.77${paragraph}`, title: `Balked landing climb, ${value} %`, source: `14 CFR 23.77(${paragraph})`,
    note: `Steady gradient ${value} % at sea level, take-off power, landing flaps, at V_REF; speedFactor 1.3 stands for V_REF (at least 1.3 V_S0, 14 CFR 23.73(c)). See 23.77 for which paragraph applies.`,
    configurations: ['landing'],
    requirement: { kind: 'climb-gradient', gradient: gradient(value), altitude: '0 ft', speedFactor: 1.3 },
  })),
  ...([['landplane', 8.3], ['seaplane', 6.7], ['4-percent', 4]] as const).map(([variant, value]) => ({
    id: `14cfr-23.2120a-${variant}`, title: `All-engine climb, ${value} %`, source: '14 CFR 23.2120(a) (Amendment 23-64)',
    note: `Gradient ${value} %${variant === '4-percent' ? ' for the airplanes 23.2120(a) names' : ` for ${variant}s`}; the conditions (power, configuration, speed) come from the accepted means of compliance; speedFactor 1.2 is a proxy.`,
    requirement: { kind: 'climb-gradient', gradient: gradient(value), altitude: '0 ft', speedFactor: 1.2 },
  })),
  ...([['b1', 1.5, '5000 ft'], ['b2', 1, '400 ft'], ['b3', 2, '400 ft']] as const).map(([paragraph, value, altitude]) => ({
    id: `14cfr-23.2120${paragraph}`, title: `One engine inoperative climb at ${altitude}, ${value} %`,
    source: `14 CFR 23.2120(${paragraph[0]})(${paragraph[1]}) (Amendment 23-64)`,
    note: `Gradient ${value} % at ${altitude} with one engine inoperative, for the airplanes the paragraph names; speedFactor 1.2 is a proxy for the climb speed.`,
    engines: 2, configurations: paragraph === 'b1' ? ['clean'] : undefined,
    requirement: { kind: 'climb-gradient', gradient: gradient(value), altitude, enginesInoperative: 1, speedFactor: 1.2 },
  })),
];

export const SAILPLANE_ROWS: TemplateRow[] = [
  {
    id: 'cs-22.49', title: 'Sailplane stall speed, 80 km/h', source: 'EASA CS 22.49',
    note: 'V_S0 at most 80 km/h at maximum weight, landing configuration.',
    configurations: ['landing'],
    requirement: { kind: 'stall', speed: '80 km/h' },
  },
];

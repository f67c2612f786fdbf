/**
 * Template rows from 14 CFR Part 25 (METHODS.md section 8, confirmed rows
 * only).
 */
import type { TemplateRow } from './templates';

const gradient = (value: number) => `${value} %`;

/** [engines, 25.121(a), (b), (c), (d)] gradients in per cent. */
const PART_25_121: ReadonlyArray<readonly [number, number, number, number, number]> = [
  [2, 0, 2.4, 1.2, 2.1],
  [3, 0.3, 2.7, 1.5, 2.4],
  [4, 0.5, 3.0, 1.7, 2.7],
];

export const PART_25_ROWS: TemplateRow[] = [
  ...PART_25_121.flatMap(([engines, a, b, c, d]) => [
    {
      id: `14cfr-25.121a-${engines}eng`, title: `Take-off climb, gear down, one engine out, ${engines} engines`, source: '14 CFR 25.121(a)',
      note: `Gradient ${a === 0 ? 'positive (0 % is the bound)' : `${a} %`} with the critical engine inoperative, gear down, take-off flaps, at V_LOF; speedFactor 1.2 stands for V_LOF.`,
      engines,
      requirement: { kind: 'climb-gradient', gradient: gradient(a), altitude: '0 ft', enginesInoperative: 1, speedFactor: 1.2 },
    },
    {
      id: `14cfr-25.121b-${engines}eng`, title: `Second segment, one engine out, ${engines} engines`, source: '14 CFR 25.121(b)',
      note: `Gradient ${b} % with the critical engine inoperative, gear up, take-off flaps, at V2; speedFactor 1.2 stands for V2 (a proxy: V2 is at least 1.13 V_SR, 14 CFR 25.107, from memory).`,
      engines,
      requirement: { kind: 'climb-gradient', gradient: gradient(b), altitude: '0 ft', enginesInoperative: 1, speedFactor: 1.2 },
    },
    {
      id: `14cfr-25.121c-${engines}eng`, title: `Final take-off climb, one engine out, ${engines} engines`, source: '14 CFR 25.121(c); 25.111(c)(3)',
      note: `Gradient ${c} % with the critical engine inoperative, en-route configuration, at the final take-off speed; speedFactor 1.2 is a proxy for that speed.`,
      engines, configurations: ['clean'],
      requirement: { kind: 'climb-gradient', gradient: gradient(c), altitude: '0 ft', enginesInoperative: 1, speedFactor: 1.2 },
    },
    {
      id: `14cfr-25.121d-${engines}eng`, title: `Approach climb, one engine out, ${engines} engines`, source: '14 CFR 25.121(d)',
      note: `Gradient ${d} % with the critical engine inoperative, approach configuration, at no more than 1.4 V_SR (speedFactor 1.4, the rule's upper bound).`,
      engines, configurations: ['approach', 'landing'],
      requirement: { kind: 'climb-gradient', gradient: gradient(d), altitude: '0 ft', enginesInoperative: 1, speedFactor: 1.4 },
    },
  ]),
  {
    id: '14cfr-25.119', title: 'Landing climb, all engines, 3.2 %', source: '14 CFR 25.119',
    note: 'Gradient 3.2 % with all engines, landing configuration, at V_REF; speedFactor 1.23 stands for V_REF (at least 1.23 V_SR0, 14 CFR 25.125, from memory).',
    configurations: ['landing'],
    requirement: { kind: 'climb-gradient', gradient: gradient(3.2), altitude: '0 ft', speedFactor: 1.23 },
  },
];

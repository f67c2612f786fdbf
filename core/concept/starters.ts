/**
 * Starting concepts by kind of aircraft: what a new, blank concept holds
 * before the engineer types the programme's own numbers. Each has its
 * aircraft's configurations, values inside the typical ranges of the methods
 * reference (core/methods.md, section 9; core/assumptions/typical-ranges.ts),
 * a stall speed and an all-engines climb gradient as placeholders so the
 * diagram has a region to show. Invented starting values, not any aircraft's.
 */
import type { ConceptJson } from './schema';
import { CONCEPT_FORMAT } from './format';

export type AircraftKind = 'single-piston' | 'twin-turboprop' | 'business-jet' | 'small-uav';

export interface ConceptStarter {
  kind: AircraftKind;
  /** What the window's list shows. */
  title: string;
  /** One line on what the starting values are. */
  summary: string;
  /** A fresh concept with `name` set. */
  concept(name: string): ConceptJson;
}

const PLACEHOLDER = 'starting value: replace with the programme requirement';

function starter(
  kind: AircraftKind,
  title: string,
  summary: string,
  body: (name: string) => Omit<ConceptJson, 'format' | 'name'>,
): ConceptStarter {
  return { kind, title, summary, concept: (name) => ({ format: CONCEPT_FORMAT, name, ...structuredClone(body(name)) }) };
}

export const CONCEPT_STARTERS: readonly ConceptStarter[] = [
  starter(
    'single-piston',
    'Single-engine piston',
    'Light aircraft: AR 7.5, CD0 0.030, flapped take-off and landing configurations, one piston engine.',
    () => ({
      aircraft: {
        takeoffMass: '1100 kg',
        aero: {
          // AR 6-8, CD0 0.025-0.035, e about 0.8 for light aircraft (common practice).
          aspectRatio: 7.5,
          cdLinear: 0,
          configurations: {
            clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 },
            takeoff: { cd0Increment: 0.015, oswaldEfficiency: 0.77, clMax: 1.8 },
            landing: { cd0Increment: 0.06, oswaldEfficiency: 0.72, clMax: 2.1 },
          },
        },
        propulsion: { kind: 'piston', engines: 1 },
      },
      requirements: [
        { id: 'stall', kind: 'stall', label: `Stall at most 61 kt in landing flaps (${PLACEHOLDER})`, speed: '61 kt', configuration: 'landing' },
        { id: 'climb', kind: 'climb-gradient', label: `All-engines climb gradient 8.3 % (${PLACEHOLDER})`, gradient: '8.3 %' },
      ],
      diagram: { wingLoading: ['300 N/m^2', '1800 N/m^2'] },
    }),
  ),
  starter(
    'twin-turboprop',
    'Twin turboprop',
    'Commuter or utility twin: AR 9.5, CD0 0.027, take-off, landing and one-engine-out configurations, two turboprops.',
    () => ({
      aircraft: {
        takeoffMass: '5000 kg',
        aero: {
          // AR 9-11 and CD0 0.025-0.035 for turboprop twins (common practice).
          aspectRatio: 9.5,
          cdLinear: 0,
          configurations: {
            clean: { cd0: 0.027, oswaldEfficiency: 0.8, clMax: 1.6 },
            takeoff: { cd0Increment: 0.018, oswaldEfficiency: 0.77, clMax: 2.0 },
            landing: { cd0Increment: 0.065, oswaldEfficiency: 0.72, clMax: 2.5 },
            'engine-out': { cd0Increment: 0.022, oswaldEfficiency: 0.76, clMax: 2.0 },
          },
        },
        propulsion: { kind: 'turboprop', engines: 2, lapseExponent: 0.75 },
      },
      requirements: [
        { id: 'stall', kind: 'stall', label: `Stall at most 80 kt in landing flaps (${PLACEHOLDER})`, speed: '80 kt', configuration: 'landing' },
        { id: 'climb', kind: 'climb-gradient', label: `All-engines climb gradient 8 % (${PLACEHOLDER})`, gradient: '8 %' },
      ],
      diagram: { wingLoading: ['800 N/m^2', '3500 N/m^2'] },
    }),
  ),
  starter(
    'business-jet',
    'Business jet',
    'Twin turbofan: AR 8, CD0 0.020, take-off and landing configurations, two high-bypass turbofans.',
    () => ({
      aircraft: {
        takeoffMass: '9000 kg',
        aero: {
          // CD0 0.018-0.025 for business jets; AR 6-9 (common practice).
          aspectRatio: 8,
          cdLinear: 0,
          configurations: {
            clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 },
            takeoff: { cd0Increment: 0.015, oswaldEfficiency: 0.77, clMax: 1.9 },
            landing: { cd0Increment: 0.06, oswaldEfficiency: 0.72, clMax: 2.3 },
          },
        },
        propulsion: { kind: 'turbofan', engines: 2, lapseModel: 'high-bypass', throttleRatio: 1 },
      },
      requirements: [
        { id: 'stall', kind: 'stall', label: `Stall at most 100 kt in landing flaps (${PLACEHOLDER})`, speed: '100 kt', configuration: 'landing' },
        { id: 'climb', kind: 'climb-gradient', label: `All-engines climb gradient 5 % (${PLACEHOLDER})`, gradient: '5 %' },
      ],
      diagram: { wingLoading: ['1500 N/m^2', '6000 N/m^2'] },
    }),
  ),
  starter(
    'small-uav',
    'Small electric UAV',
    'Fixed-wing survey drone: AR 12, CD0 0.035, clean only, one electric motor.',
    () => ({
      aircraft: {
        takeoffMass: '20 kg',
        aero: {
          // CD0 0.03-0.05 for small UAVs (common practice).
          aspectRatio: 12,
          cdLinear: 0,
          configurations: {
            clean: { cd0: 0.035, oswaldEfficiency: 0.8, clMax: 1.3 },
          },
        },
        propulsion: { kind: 'electric', engines: 1 },
      },
      requirements: [
        { id: 'stall', kind: 'stall', label: `Stall at most 14 m/s (${PLACEHOLDER})`, speed: '14 m/s', configuration: 'clean' },
        { id: 'climb', kind: 'climb-gradient', label: `Climb gradient 10 % (${PLACEHOLDER})`, gradient: '10 %', configuration: 'clean' },
      ],
      diagram: { wingLoading: ['40 N/m^2', '250 N/m^2'] },
    }),
  ),
];

export const AIRCRAFT_KINDS: readonly AircraftKind[] = CONCEPT_STARTERS.map((s) => s.kind);

/** The starter of a kind, or undefined. */
export function conceptStarter(kind: string): ConceptStarter | undefined {
  return CONCEPT_STARTERS.find((s) => s.kind === kind);
}

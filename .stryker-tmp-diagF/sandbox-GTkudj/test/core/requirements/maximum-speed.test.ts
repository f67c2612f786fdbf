/**
 * The maximum-speed boundary against the master equation worked by hand
 * (Mattingly, Heiser and Pratt, Aircraft Engine Design, constraint analysis:
 * T/W = q C_D0/(W/S) + K (W/S)/q in level flight at full thrust).
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { parseConcept, type ConceptJson } from '../../../core/concept';
import { boundaryOf } from '../../../core/constraints';

function topSpeed(speed: string, extra: Record<string, unknown> = {}) {
  const concept = {
    format: 'loftpoint-concept/1',
    aircraft: {
      takeoffMass: '8000 kg',
      aero: { aspectRatio: 8, configurations: { clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 } } },
      propulsion: { kind: 'turbofan', engines: 2, lapseModel: 'density' },
    },
    requirements: [{ id: 'top', kind: 'maximum-speed', speed, ...extra }],
  } as ConceptJson;
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  const boundary = boundaryOf(parsed.design.requirements[0], parsed.design.aircraft);
  if (boundary.type !== 'curve') throw new Error('not a curve');
  return boundary;
}

describe('maximum-speed', () => {
  it('at sea level, 200 m/s TAS, W/S 4000 N/m^2', () => {
    // q = 0.5 x 1.225 x 200^2 = 24,500 Pa; K = 1/(pi x 0.8 x 8) = 0.049736;
    // T/W = 24,500 x 0.02 / 4000 + 0.049736 x 4000 / 24,500 = 0.122500 + 0.008120 = 0.130620 (alpha = 1 at sea level).
    expect(topSpeed('200 m/s').required(4000)).toBeCloseTo(0.13062, 5);
  });

  it('an EAS at 10,000 ft has the sea-level dynamic pressure, divided by the density lapse', () => {
    // sigma = 0.73848 at 10,000 ft (U.S. Standard Atmosphere 1976, from memory); alpha = sigma^1: T/W = 0.130620 / 0.73848 = 0.176877.
    expect(topSpeed('200 m/s', { airspeed: 'EAS', altitude: '10000 ft' }).required(4000)).toBeCloseTo(0.176877, 4);
  });

  it('a Mach number is TAS at the requirement altitude', () => {
    // M0.5 at sea level ISA: 0.5 x 340.29 = 170.15 m/s (U.S. Standard Atmosphere 1976).
    expect(topSpeed('M0.5').speedAt(4000)).toBeCloseTo(170.15, 1);
  });
});

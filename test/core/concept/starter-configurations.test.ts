/**
 * The flap and engine-out configurations of each starting concept go the way
 * the trade knows them to: deflected flaps add lift and profile drag and lower
 * the span efficiency, landing flaps more than take-off flaps; a windmilling or
 * feathered dead engine and the rudder that holds it add drag and lower the
 * span efficiency (common practice; Raymer, Aircraft Design: A Conceptual
 * Approach, on high-lift devices and engine-out drag, from memory). Each value must be written:
 * an empty configuration would silently copy clean's.
 */
import { describe, expect, it } from 'vitest';
import { CONCEPT_STARTERS } from '../../../core';

type Configuration = { cd0?: number; cd0Increment?: number; oswaldEfficiency?: number; clMax?: number };

describe('starting concepts: configurations other than clean', () => {
  const withFlaps = CONCEPT_STARTERS.filter((s) => 'landing' in s.concept('A').aircraft.aero.configurations);

  it('are given by the three kinds that fly with flaps', () => {
    expect(withFlaps.map((s) => s.kind)).toEqual(['single-piston', 'twin-turboprop', 'business-jet']);
  });

  it.each(withFlaps.map((s) => [s.kind, s] as const))('%s: flaps add drag and lift and lower e, landing more than take-off', (_kind, starter) => {
    const configurations = starter.concept('A').aircraft.aero.configurations as Record<string, Configuration>;
    const { clean, takeoff, landing } = configurations;
    for (const flap of [takeoff, landing]) {
      expect(flap.cd0Increment).toBeGreaterThan(0);
      expect(flap.clMax).toBeGreaterThan(clean.clMax!);
      expect(flap.oswaldEfficiency).toBeLessThan(clean.oswaldEfficiency!);
    }
    expect(landing.cd0Increment).toBeGreaterThan(takeoff.cd0Increment!);
    expect(landing.clMax).toBeGreaterThan(takeoff.clMax!);
    expect(landing.oswaldEfficiency).toBeLessThanOrEqual(takeoff.oswaldEfficiency!);
  });

  it('twin turboprop: one engine out adds drag on the take-off flap and lowers e', () => {
    const { clean, takeoff, 'engine-out': out } = CONCEPT_STARTERS.find((s) => s.kind === 'twin-turboprop')!.concept('A').aircraft.aero
      .configurations as Record<string, Configuration>;
    expect(out.cd0Increment).toBeGreaterThan(takeoff.cd0Increment!);
    expect(out.oswaldEfficiency).toBeLessThan(clean.oswaldEfficiency!);
  });
});

/**
 * The closure's top: no take-off mass above 1,000 t (above the heaviest
 * aircraft built, about 640 t; common practice; core/methods.md section 12),
 * and a mission whose payload and crew alone keep it from closing below that
 * top says so, instead of blaming fractions that add to less than 1.
 */
import { describe, expect, it } from 'vitest';
import { HEAVIEST_TAKEOFF_MASS_KG, closeMass, regressionEmptyFraction } from '../../../core/mission';
import { aircraft } from '../helpers/design';
import { cruise, mission } from './helpers';

const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });

describe('the heaviest take-off mass the closure looks at', () => {
  it('is 1,000 t', () => {
    expect(HEAVIEST_TAKEOFF_MASS_KG).toBe(1e6);
  });

  it('a payload of 600 t does not close below 1,000 t, and the message names the payload and crew', () => {
    // At 1,000 t: (600,000 + 90) / 1e6 = 0.60 carried, the twin regression 1.51 x (1e6 / 0.45359237 lb)^-0.10 = 0.35
    // (Raymer, section 3.4; from memory), and the fuel of an 800 km leg about 0.05: just above 1 (1.00 to two places),
    // so no mass up to 1,000 t closes.
    const empty = regressionEmptyFraction(1e6, 'twin-engine-general-aviation', 1);
    expect(empty).toBeCloseTo(1.51 * (1e6 / 0.45359237) ** -0.1, 12);
    const result = closeMass(mission({ payloadKg: 600_000, segments: [cruise(800, 110, 0)] }), twin, 1500);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.field).toBe('mission.payload');
    expect(result.message).toMatch(
      /^payload and crew of 600,090 kg are 0\.60 of even 1,000,000 kg; with the empty-mass fraction 0\.35 \(general aviation, twin engine regression there\) and the fuel fraction 0\.05 they add to 1\.00, so no take-off mass up to 1,000,000 kg closes; carry less$/,
    );
  });

  it('with a given empty fraction the same message leaves the regression out', () => {
    const result = closeMass(mission({ payloadKg: 700_000, emptyMassFraction: 0.3, segments: [cruise(800, 110, 0)] }), twin, 1500);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.field).toBe('mission.payload');
    expect(result.message).toMatch(/^payload and crew of 700,090 kg are 0\.70 of even 1,000,000 kg; with the empty-mass fraction 0\.30 and the fuel fraction 0\.05 they add to 1\.05, so no take-off mass up to 1,000,000 kg closes; carry less$/);
  });

  it('a payload that closes just below the top still closes', () => {
    const result = closeMass(mission({ payloadKg: 500_000, segments: [cruise(800, 110, 0)] }), twin, 1500);
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.takeoffKg).toBeLessThanOrEqual(1e6);
    // The balance of the sizing equation holds at the root (hand identity).
    const balance = 500_090 / result.takeoffKg + result.emptyFraction + result.flown.fuelFraction;
    expect(balance).toBeCloseTo(1, 8);
  });
});

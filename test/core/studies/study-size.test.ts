/**
 * The study's optimum, the range it searches, and the size at take-off mass.
 */
import { describe, expect, it } from 'vitest';
import { plotRangeOf, studyOptimum } from '../../../core/studies';
import { sizeOf } from '../../../core/studies/study-optimum';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { aircraft, cruise, design, stall } from '../helpers/design';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const G0 = 9.80665; // m/s^2, standard gravity (NIST SP 330)
const KT = 1852 / 3600; // m/s, NIST SP 811

/** A stall speed whose limit is w = 1/2 rho0 V^2 CLmax = 950 Pa with the builder's landing CLmax 2.1 (Anderson, stalling speed). */
const V950 = Math.sqrt((2 * 950) / (RHO0 * 2.1));

describe('sizeOf', () => {
  it('gives S = W / w and P = (P/W) W at take-off mass', () => {
    // 750 kg: W = 750 x 9.80665 = 7354.9875 N; at w = 500 Pa, S = 14.709975 m^2; at P/W 0.1 W/N, P = 735.49875 W.
    const d = design({ aircraft: aircraft({ takeoffMassKg: 750 }), requirements: [stall(V950)] });
    const size = sizeOf(d, { wingLoadingPa: 500, loading: 0.1, unbounded: false });
    assertRelative(size.wingAreaM2, 14.709975, 1e-12, 'wing area');
    assertRelative(size.installed, 735.49875, 1e-12, 'installed power');
  });
});

describe('plotRangeOf', () => {
  const stallOnly = design({ requirements: [stall(V950, { id: 'stall' })] });

  it('keeps the concept\'s own range when it is valid', () => {
    expect(plotRangeOf({ ...stallOnly, diagram: { ...stallOnly.diagram, wingLoadingRangePa: [500, 600] } })).toEqual([500, 600]);
  });

  it('shows every boundary when the concept gives none or an unusable one: 1.3 x the limit, a tenth of that, two figures', () => {
    // core/diagram/default-range.ts: upper end 1.3 x the largest limit = 1235 Pa, rounded up to 1300; lower end a
    // tenth, 123.5 Pa, rounded down to 120 (no curve to raise it).
    expect(plotRangeOf(stallOnly)).toEqual([120, 1300]);
    for (const bad of [[0, 1000], [-100, 1000], [1000, 500], [800, 800], [NaN, 1000], [500, NaN], [500, Infinity], [-Infinity, 1000]] as [number, number][]) {
      expect(plotRangeOf({ ...stallOnly, diagram: { ...stallOnly.diagram, wingLoadingRangePa: bad } }), String(bad)).toEqual([120, 1300]);
    }
  });

  it('widens the default range to hold the design point', () => {
    // Design point at 2000 Pa: upper end 1.1 x 2000 = 2200 Pa (default-range.ts), lower end stays 123.5 -> 120.
    expect(plotRangeOf({ ...stallOnly, designPoint: { wingLoadingPa: 2000, loading: 0.1 } })).toEqual([120, 2200]);
  });
});

describe('studyOptimum', () => {
  // Propeller cruise at sea level: P/W = (V/eta)(q CD0/w + K w/q), K = 1/(pi e AR) (Mattingly master equation);
  // d/dw = 0 at w* = q sqrt(CD0/K) (hand derivation). 110 kt, CD0 0.03, e 0.8, AR 7.5: w* = about 1475 Pa.
  const v = 110 * KT;
  const q = 0.5 * RHO0 * v * v;
  const K = 1 / (Math.PI * 0.8 * 7.5);
  const wStar = q * Math.sqrt(0.03 / K);
  const cruiseOnly = (rangePa: [number, number]) =>
    design({ aircraft: aircraft({ clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } }), requirements: [cruise(v, { propellerEfficiency: 0.8 })], rangePa });

  it('finds the least-power wing loading of a cruise curve inside the range', () => {
    const found = studyOptimum(cruiseOnly([200, 3000]));
    assertRelative(found?.wingLoadingPa ?? NaN, wStar, 1e-4, 'w*');
    assertRelative(found?.loading ?? NaN, (v / 0.8) * 2 * Math.sqrt(0.03 * K), 1e-8, 'P/W at w* = (V/eta) 2 sqrt(CD0 K)');
    expect(found?.unbounded).toBe(false);
  });

  it('says so when the optimum is the right edge of a range that stops short of w*', () => {
    const found = studyOptimum(cruiseOnly([200, 400]));
    expect(found?.wingLoadingPa).toBe(400);
    expect(found?.unbounded).toBe(true);
    assertRelative(found?.loading ?? NaN, (v / 0.8) * ((q * 0.03) / 400 + (K * 400) / q), 1e-6, 'P/W at 400 Pa');
    // 1e-6: the engine's sea-level density is p0 / (R T0), 1.2250 to the table's four figures.
  });

  it('is capped by a stall limit below w*, and null when the limit is below the range', () => {
    // Stall at 45 kt in landing flaps: w = 1/2 rho0 (45 kt)^2 2.1, about 703 Pa, below w*.
    const d = { ...cruiseOnly([200, 3000]), requirements: [stall(45 * KNOT_MPS), cruise(v, { propellerEfficiency: 0.8 })] };
    assertRelative(studyOptimum(d)?.wingLoadingPa ?? NaN, 0.5 * RHO0 * (45 * KT) ** 2 * 2.1, 1e-6, 'optimum on the stall limit');
    expect(studyOptimum({ ...d, diagram: { ...d.diagram, wingLoadingRangePa: [800, 3000] } })).toBeNull();
  });
});

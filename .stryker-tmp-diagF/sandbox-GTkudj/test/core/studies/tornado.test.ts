// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { tornado, typicalUncertainty } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { aircraft, cruise, design, stall } from '../helpers/design';
import { DEMO_SLUGS, demo, ranged } from './fixtures';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const KT = 1852 / 3600; // m/s, NIST SP 811

/** A piston single whose optimum sits on the stall limit: the sea-level cruise curve still falls there. */
const STALL_BOUND = design({
  aircraft: aircraft({ kind: 'piston', aspectRatio: 7.5, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } }),
  requirements: [stall(45 * KNOT_MPS, { id: 'stall' }), cruise(110 * KNOT_MPS, { id: 'cruise', propellerEfficiency: 0.8 })],
  rangePa: [200, 1500],
});

const CLMAX = 'aircraft.aero.configurations.landing.clMax';
const CD0 = 'aircraft.aero.configurations.clean.cd0';

describe('tornado', () => {
  it('moves a stall-limited optimum wing loading in proportion to CLmax (elasticity 1)', () => {
    // w = 1/2 rho0 V_s^2 CLmax (Anderson, Introduction to Flight, stalling speed): dw/w = dCLmax/CLmax exactly.
    const params = ranged({ parameters: [{ field: CLMAX, low: 1.9, high: 2.3 }] }, STALL_BOUND);
    const [bar] = tornado(STALL_BOUND, params).bars;
    const { low, high } = bar;
    if (!low.optimum || !high.optimum) throw new Error('both ends should be feasible');
    const elasticity = (high.wingLoadingChangeRelative - low.wingLoadingChangeRelative) / ((2.3 - 1.9) / 2.1);
    expect(elasticity).toBeCloseTo(1, 9);
    assertRelative(high.optimum.wingLoadingPa, 0.5 * RHO0 * (45 * KT) ** 2 * 2.3, 1e-4, 'optimum at CLmax 2.3');
    expect(high.wingLoadingChangePa).toBeGreaterThan(0); // more CLmax, higher stall wing loading
  });

  it('raises the cruise power with CD0 by the master equation at the stall-limited wing loading', () => {
    // Propeller cruise, sea level, alpha = 1 (Gagg-Ferrar at sigma 1), beta = 1:
    // P/W = (V/eta)[q CD0/w + K w/q], K = 1/(pi e AR) (Mattingly master equation; core/methods.md sections 5 and 6).
    const params = ranged({ parameters: [{ field: CD0, low: 0.025, high: 0.035 }] }, STALL_BOUND);
    const result = tornado(STALL_BOUND, params);
    const [bar] = result.bars;
    const v = 110 * KT;
    const q = 0.5 * RHO0 * v * v;
    const w = 0.5 * RHO0 * (45 * KT) ** 2 * 2.1;
    const pw = (cd0: number) => (v / 0.8) * ((q * cd0) / w + w / (Math.PI * 0.8 * 7.5 * q));
    assertRelative(result.nominal?.loading ?? NaN, pw(0.03), 1e-4, 'nominal P/W');
    assertRelative(bar.high.optimum?.loading ?? NaN, pw(0.035), 1e-4, 'P/W at CD0 0.035');
    expect(bar.high.loadingChange).toBeGreaterThan(0); // more CD0, more cruise power
    expect(bar.low.loadingChange).toBeLessThan(0);
    expect(bar.high.wingLoadingChangePa).toBeCloseTo(0, 6); // the stall limit does not move
    expect(result.caution).toMatch(/Preliminary sizing/);
  });

  it('sorts by the largest swing, puts an end with no feasible point first, and an idle assumption last', () => {
    const params = ranged(
      {
        parameters: [
          { field: 'aircraft.aero.configurations.takeoff.clMax', low: 1.6, high: 2.0 }, // no requirement flies in take-off flaps
          { field: CD0, low: 0.025, high: 0.035 },
          { field: CLMAX, low: 0.5, high: 2.3 }, // at 0.5 the stall limit falls below the plotted 200 Pa
          { field: 'requirements.cruise.propellerEfficiency', low: 0.78, high: 0.85 },
        ],
      },
      STALL_BOUND,
    );
    const bars = tornado(STALL_BOUND, params).bars;
    expect(bars.map((b) => b.field)).toEqual([CLMAX, CD0, 'requirements.cruise.propellerEfficiency', 'aircraft.aero.configurations.takeoff.clMax']);
    expect(bars[0].low.optimum).toBeNull();
    expect(bars[0].swing).toBe(Infinity);
    expect(bars[3].swing).toBe(0);
    for (let i = 1; i < bars.length; i++) expect(bars[i - 1].swing).toBeGreaterThanOrEqual(bars[i].swing);
  });

  it('gives finite, ordered bars for every demo over its typical ranges', () => {
    for (const slug of DEMO_SLUGS) {
      const d = demo(slug);
      const result = tornado(d.design, ranged(typicalUncertainty(d.design), d.design, d.concept));
      expect(result.nominal, slug).not.toBeNull();
      const swings = result.bars.map((b) => b.swing);
      expect(swings.every((s) => s >= 0), slug).toBe(true);
      expect([...swings].sort((a, b) => b - a), slug).toEqual(swings);
    }
  });
});

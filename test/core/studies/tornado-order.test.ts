/**
 * The tornado's bars: their swings against the stall-speed relation and the
 * master equation, the three sort orders, and the bars of a design with no
 * feasible nominal point or no power requirement at all.
 */
import { describe, expect, it } from 'vitest';
import type { Design } from '../../../core/model';
import { tornado, type UncertainParameter } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { aircraft, cruise, design, stall } from '../helpers/design';
import { ranged } from './fixtures';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const KT = 1852 / 3600; // m/s, NIST SP 811
const CLMAX = 'aircraft.aero.configurations.landing.clMax';
const CD0 = 'aircraft.aero.configurations.clean.cd0';

/** Piston single, stall 45 kt in landing flaps (builder's CLmax 2.1), cruise 110 kt at eta 0.8, plotted 200-1500 Pa. */
const stallBound = (rangePa: [number, number] = [200, 1500]) =>
  design({
    aircraft: aircraft({ kind: 'piston', aspectRatio: 7.5, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } }),
    requirements: [stall(45 * KNOT_MPS, { id: 'stall' }), cruise(110 * KNOT_MPS, { id: 'cruise', propellerEfficiency: 0.8 })],
    rangePa,
  });

// Stall limit w_s = 1/2 rho0 V_s^2 CLmax (Anderson, Introduction to Flight, stalling speed). Propeller cruise at sea
// level: P/W = (V/eta)(q CD0/w + K w/q), K = 1/(pi e AR) (Mattingly master equation), falling at w_s (its minimum
// is near 1475 Pa), so the optimum sits on the stall limit.
const wStall = (clMax: number) => 0.5 * RHO0 * (45 * KT) ** 2 * clMax;
const V = 110 * KT;
const Q = 0.5 * RHO0 * V * V;
const pw = (w: number, cd0: number) => (V / 0.8) * ((Q * cd0) / w + w / (Math.PI * 0.8 * 7.5 * Q));

describe('tornado swings and sort orders', () => {
  const d = stallBound();
  const params = ranged(
    {
      parameters: [
        { field: CLMAX, low: 2.05, high: 2.15 },
        { field: CD0, low: 0.02, high: 0.04 },
      ],
    },
    d,
  );
  const w0 = wStall(2.1);
  const clMaxWingSwing = (wStall(2.15) - wStall(2.05)) / w0; // = 0.1 / 2.1
  const clMaxLoadingSwing = Math.abs(pw(wStall(2.15), 0.03) - pw(wStall(2.05), 0.03)) / pw(w0, 0.03);
  const cd0LoadingSwing = (pw(w0, 0.04) - pw(w0, 0.02)) / pw(w0, 0.03);

  it('gives each bar its two swings by the closed forms, and the larger as its sort key', () => {
    // The orders below only mean something if the swings differ this way.
    expect(cd0LoadingSwing > clMaxWingSwing && clMaxWingSwing > clMaxLoadingSwing).toBe(true);
    const result = tornado(d, params);
    const clMax = result.bars.find((b) => b.field === CLMAX);
    const cd0 = result.bars.find((b) => b.field === CD0);
    assertRelative(clMax?.wingLoadingSwing ?? NaN, clMaxWingSwing, 1e-6, 'CLmax wing-loading swing');
    assertRelative(clMax?.loadingSwing ?? NaN, clMaxLoadingSwing, 1e-5, 'CLmax loading swing');
    assertRelative(clMax?.swing ?? NaN, clMaxWingSwing, 1e-6, 'CLmax swing, the larger');
    expect(cd0?.wingLoadingSwing).toBeCloseTo(0, 9);
    assertRelative(cd0?.loadingSwing ?? NaN, cd0LoadingSwing, 1e-6, 'CD0 loading swing');
    assertRelative(cd0?.swing ?? NaN, cd0LoadingSwing, 1e-6, 'CD0 swing, the larger');
    // Each end against the nominal optimum.
    assertRelative(cd0?.high.loadingChangeRelative ?? NaN, pw(w0, 0.04) / pw(w0, 0.03) - 1, 1e-6, 'CD0 high end');
    assertRelative(clMax?.low.wingLoadingChangeRelative ?? NaN, 2.05 / 2.1 - 1, 1e-6, 'CLmax low end');
  });

  it('sorts by the larger swing, by the wing-loading swing, or by the loading swing', () => {
    expect(tornado(d, params).bars.map((b) => b.field)).toEqual([CD0, CLMAX]);
    expect(tornado(d, params, 'largest').bars.map((b) => b.field)).toEqual([CD0, CLMAX]);
    expect(tornado(d, params, 'wingLoading').bars.map((b) => b.field)).toEqual([CLMAX, CD0]);
    expect(tornado(d, params, 'loading').bars.map((b) => b.field)).toEqual([CD0, CLMAX]);
    expect(tornado(d, [...params].reverse(), 'wingLoading').bars.map((b) => b.field)).toEqual([CLMAX, CD0]);
  });

  it('names each bar, its nominal value and the loading axis of the propulsion', () => {
    const result = tornado(d, params);
    const clMax = result.bars.find((b) => b.field === CLMAX);
    expect([clMax?.label, clMax?.nominalValue, clMax?.low.value, clMax?.high.value]).toEqual(['CLmax (landing)', 2.1, 2.05, 2.15]);
    expect(result.axis).toBe('powerToWeight');
    expect(result.caution).toMatch(/^Preliminary sizing only: .*certification requirements come from the applicable authority, and final numbers need licensed engineering review\.$/);
    const jet = { ...d, aircraft: aircraft({ kind: 'turbofan', engines: 2 }), requirements: [stall(45 * KNOT_MPS, { id: 'stall' })] };
    expect(tornado(jet, []).axis).toBe('thrustToWeight');
  });
});

describe('tornado without a nominal optimum, or without any power requirement', () => {
  it('leaves every change undefined (NaN) when the nominal point is outside the plotted range', () => {
    // Plotted from 800 Pa: the nominal stall limit w_s(2.1) = 689 Pa is off the plot; CLmax 2.6 gives 853 Pa.
    const d = stallBound([800, 1500]);
    expect(wStall(2.1) < 800 && wStall(2.6) > 800 && wStall(1.9) < 800).toBe(true);
    const result = tornado(d, ranged({ parameters: [{ field: CLMAX, low: 1.9, high: 2.6 }] }, d));
    expect(result.nominal).toBeNull();
    const [bar] = result.bars;
    assertRelative(bar.high.optimum?.wingLoadingPa ?? NaN, wStall(2.6), 1e-6, 'optimum at CLmax 2.6');
    expect(bar.low.optimum).toBeNull();
    const high = bar.high;
    expect([high.wingLoadingChangePa, high.loadingChange, high.wingLoadingChangeRelative, high.loadingChangeRelative].every(Number.isNaN)).toBe(true);
    expect(bar.swing).toBe(Infinity);
  });

  it('puts bars with an end off the plot first and bars of unknown swing last, in the file\'s order', () => {
    // Parameters made by hand, with ranges away from the concept's value, to reach a bar whose two ends are both
    // feasible while the nominal point is not: its swing is unknown (NaN).
    const d = stallBound([800, 1500]);
    const landingClMax = (low: number, high: number): UncertainParameter => ({
      field: `${CLMAX} ${low}-${high}`,
      label: 'CLmax (landing)',
      low,
      nominal: 2.1,
      high,
      distribution: 'uniform',
      apply: (x: Design, value: number) => ({
        ...x,
        aircraft: { ...x.aircraft, configurations: { ...x.aircraft.configurations, landing: { ...x.aircraft.configurations.landing, clMax: value } } },
      }),
    });
    expect(wStall(2.5) > 800).toBe(true); // 821 Pa: both ends of the first and third bars are on the plot
    const bars = tornado(d, [landingClMax(2.5, 2.6), landingClMax(1.9, 2.6), landingClMax(2.55, 2.6)]).bars;
    expect(bars.map((b) => b.field)).toEqual([`${CLMAX} 1.9-2.6`, `${CLMAX} 2.5-2.6`, `${CLMAX} 2.55-2.6`]);
    expect(bars.map((b) => b.swing)).toEqual([Infinity, NaN, NaN]);
  });

  it('sorts a stall-only design by the wing-loading swing: its loading is 0, so a relative loading change is undefined', () => {
    // No curve requirement: the least loading is 0 everywhere and the optimum is the stall limit itself.
    const d = design({ requirements: [stall(45 * KNOT_MPS, { id: 'stall' })], rangePa: [200, 1500] });
    const params = ranged(
      {
        parameters: [
          { field: CD0, low: 0.025, high: 0.035 }, // moves nothing here
          { field: CLMAX, low: 1.9, high: 2.3 },
        ],
      },
      d,
    );
    const result = tornado(d, params);
    expect(result.nominal?.loading).toBe(0);
    expect(result.bars.map((b) => b.field)).toEqual([CLMAX, CD0]);
    const [clMax, cd0] = result.bars;
    assertRelative(clMax.swing, 0.4 / 2.1, 1e-6, 'CLmax swing = its wing-loading swing, (2.3 - 1.9) / 2.1');
    expect(clMax.high.loadingChange).toBe(0);
    expect(clMax.high.loadingChangeRelative).toBeNaN();
    expect(clMax.loadingSwing).toBeNaN();
    expect(cd0.swing).toBe(0);
  });
});

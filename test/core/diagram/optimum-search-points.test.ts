/**
 * Where the optimum search evaluates the envelope (core/methods.md section 7,
 * "How the optimum is searched"): the whole span on the plotted samples, or
 * on 250 even points when there are none; then each of the lowest local
 * minima (at most eight, only those within 1 % of the lowest) again on a
 * fine grid with the fewest points that keep it as fine as a 4000-point grid
 * over the span. That keeps every search a bounded cost (a chance study runs
 * it once per sample) while no valley wider than a 4000-point grid's spacing
 * is missed next to a coarse minimum.
 *
 * The envelopes are written here so that each local minimum and its depth
 * are known in closed form; the test records every wing loading at which the
 * search asks for the envelope.
 */
import { describe, expect, it } from 'vitest';
import { envelopeAt, findOptimum, sampleWingLoadings, type RequiredLoading } from '../../../core/diagram';

const LO = 100;
const HI = 1500;
const SPAN = HI - LO;
/** Spacing of a 4000-point grid over the span: 1400/3999 Pa. */
const FINE = SPAN / 3999;

function recorded(curve: RequiredLoading): { curve: RequiredLoading; asked: number[] } {
  const asked: number[] = [];
  return { asked, curve: (w) => (asked.push(w), curve(w)) };
}

/** The runs of strictly increasing, evenly spaced wing loadings of at least 9 points (the fine grids). */
function evenRuns(asked: readonly number[]): number[][] {
  const runs: number[][] = [];
  let run: number[] = [asked[0]];
  const even = (r: number[], w: number) => r.length < 2 || Math.abs(w - r[r.length - 1] - (r[1] - r[0])) <= 1e-9 * SPAN;
  for (const w of asked.slice(1)) {
    if (w > run[run.length - 1] && even(run, w)) run.push(w);
    else {
      if (run.length >= 9) runs.push(run);
      run = [w];
    }
  }
  if (run.length >= 9) runs.push(run);
  return runs;
}

const spacing = (run: readonly number[]): number => (run[run.length - 1] - run[0]) / (run.length - 1);

describe('findOptimum: the coarse scan', () => {
  it('asks for the envelope first at 250 even points from the low end to the right end of the span', () => {
    const { curve, asked } = recorded((w) => 1 + 0.001 * Math.abs(w - 801));
    findOptimum([curve], Infinity, [LO, HI]);
    const scan = asked.slice(0, 250);
    // The scan's points: LO + k x 1400/249, k = 0..249, the last one HI itself.
    scan.forEach((w, k) => expect(Math.abs(w - (LO + (SPAN * k) / 249))).toBeLessThanOrEqual(1e-9 * HI));
    expect(scan[249]).toBe(HI);
  });

  it('uses the plotted samples instead, asking only for the right end again', () => {
    const curves: RequiredLoading[] = [(w) => 1 + 0.001 * Math.abs(w - 801)];
    const ws = sampleWingLoadings([LO, HI], 201);
    const samples = { wingLoadingsPa: ws, envelope: Float64Array.from(ws, (w) => envelopeAt(curves, w)) };
    const { curve, asked } = recorded(curves[0]);
    findOptimum([curve], Infinity, [LO, HI], samples);
    expect(asked[0]).toBe(HI);
  });
});

describe('findOptimum: the fine grid around a coarse minimum', () => {
  // The valley 1 + 0.001 |w - 801| has its least coarse point at 801 Pa's neighbour; the fine grid spans the
  // two coarse steps around it.
  const valley: RequiredLoading = (w) => 1 + 0.001 * Math.abs(w - 801);

  it('on the 250-point scan: spacing within a 4000-point grid, and one point fewer would not be', () => {
    const { curve, asked } = recorded(valley);
    findOptimum([curve], Infinity, [LO, HI]);
    const fine = evenRuns(asked.slice(250))[0];
    // Two coarse steps, 2 x 1400/249 = 11.245 Pa: 33 steps of 0.3408 Pa (32 would be 0.3514 > 0.3501).
    expect(fine[fine.length - 1] - fine[0]).toBeCloseTo((2 * SPAN) / 249, 9);
    expect(spacing(fine)).toBeLessThanOrEqual(FINE);
    expect((fine[fine.length - 1] - fine[0]) / (fine.length - 2)).toBeGreaterThan(FINE);
  });

  it('on 201 plotted samples: 40 steps of exactly a 4000-point spacing, not more', () => {
    // Two sample steps, 2 x 1400/200 = 14 Pa: 14/40 = 0.35 Pa <= 0.35009 Pa; 39 steps would be 0.359 Pa.
    const ws = sampleWingLoadings([LO, HI], 201);
    const samples = { wingLoadingsPa: ws, envelope: Float64Array.from(ws, valley) };
    const { curve, asked } = recorded(valley);
    findOptimum([curve], Infinity, [LO, HI], samples);
    const fine = evenRuns(asked.slice(1))[0];
    expect(fine.length).toBe(41);
    expect(spacing(fine)).toBeLessThanOrEqual(FINE);
    expect((fine[fine.length - 1] - fine[0]) / (fine.length - 2)).toBeGreaterThan(FINE);
  });
});

describe('findOptimum: which coarse minima are searched again', () => {
  /** Valleys 1 + depth_k + 0.01 |w - c_k| joined by their lower envelope: local minima at c_k of 1 + depth_k. */
  const valleys = (centres: readonly number[], depths: readonly number[]): RequiredLoading => (w) =>
    Math.min(...centres.map((c, k) => 1 + depths[k] + 0.01 * Math.abs(w - c)));
  /** Centres 0.3 Pa right of a coarse point, so each valley's least coarse point is that point. */
  const centre = (k: number) => LO + (SPAN * k) / 249 + 0.3;

  it('only the minima within 1 % of the lowest: a valley 5 % higher is not searched again', () => {
    const { curve, asked } = recorded(valleys([centre(60), centre(180)], [0, 0.05]));
    const found = findOptimum([curve], Infinity, [LO, HI])!;
    const runs = evenRuns(asked.slice(250));
    expect(runs).toHaveLength(1);
    expect(runs[0][0]).toBeLessThan(centre(60));
    expect(runs[0][runs[0].length - 1]).toBeGreaterThan(centre(60));
    expect(found.loading).toBeCloseTo(1, 6);
  });

  it('a valley 0.5 % higher is searched again too', () => {
    const { curve, asked } = recorded(valleys([centre(60), centre(180)], [0, 0.005]));
    findOptimum([curve], Infinity, [LO, HI]);
    expect(evenRuns(asked.slice(250))).toHaveLength(2);
  });

  it('at most eight: of twelve equal valleys, eight are searched again and the tie goes to the largest wing loading', () => {
    const ks = [10, 30, 50, 70, 90, 110, 130, 150, 170, 190, 210, 230];
    const { curve, asked } = recorded(valleys(ks.map(centre), ks.map(() => 0)));
    const found = findOptimum([curve], Infinity, [LO, HI])!;
    expect(evenRuns(asked.slice(250))).toHaveLength(8);
    // The tie rule's sweep over the scan still moves the optimum to the right-most equal valley.
    expect(found.wingLoadingPa).toBeGreaterThan(centre(230) - 1);
    expect(found.loading).toBeCloseTo(1, 6);
  });
});

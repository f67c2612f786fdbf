/**
 * The tally behind a probability map, counted by hand on a 4 x 4 grid.
 * A sample meets a grid point (w, y) when w is at or below every wing-loading
 * limit and y is at or above the envelope E(w) = max_i y_i(w) of its required
 * loadings (the feasible region of a constraint diagram; common practice).
 * Each column stores, per sample, the first grid row at or above E(w); the
 * probability at (w, y_j) is the share of samples whose row is j or lower.
 */
import { describe, expect, it } from 'vitest';
import { columnCounts, countSample, probabilityOf } from '../../../core/studies/column-counts';
import type { Boundary } from '../../../core/model';

const WS = Float64Array.from([100, 200, 300, 400]); // Pa
const YS = Float64Array.from([0, 1, 2, 3]); // evenly spaced loadings; the top row is 3

const curve = (required: (w: number) => number): Boundary => ({ type: 'curve', id: 'c', kind: 'cruise', required, speedAt: () => NaN });
const limit = (wingLoadingMaxPa: number): Boundary => ({ type: 'limit', id: 'l', kind: 'stall', wingLoadingMaxPa });

/**
 * Fixed boundaries: a falling curve 3 - w/100 (2, 1, 0, -1 at the four columns), a flat 0.5 that cannot be met at
 * 400 Pa (NaN there), and limits at 350 and 500 Pa. By hand: the least limit is 350 Pa; the envelope is
 * max(2, 0.5) = 2, max(1, 0.5) = 1, max(0, 0.5) = 0.5, and "cannot be met" (infinite) at 400 Pa.
 */
const FIXED: Boundary[] = [curve((w) => 3 - w / 100), curve((w) => (w === 400 ? NaN : 0.5)), limit(350), limit(500)];

/** Rows counted in column i, slot ny (= 4) meaning "met at no grid row". */
const rows = (counts: Uint32Array, i: number) => Array.from(counts.subarray(i * 5, i * 5 + 5));

describe('columnCounts', () => {
  it('works out the least fixed limit and the envelope of the fixed curves once, an unmeetable curve making it infinite', () => {
    const tally = columnCounts(WS, YS, FIXED);
    expect(tally.fixedCap).toBe(350);
    expect(Array.from(tally.fixedEnvelope)).toEqual([2, 1, 0.5, Infinity]);
    expect(tally.counts).toHaveLength(4 * 5);
    expect(Array.from(tally.counts).every((c) => c === 0)).toBe(true);
  });

  it('has no cap and no envelope without fixed boundaries', () => {
    const tally = columnCounts(WS, YS, []);
    expect(tally.fixedCap).toBe(Infinity);
    expect(Array.from(tally.fixedEnvelope)).toEqual([0, 0, 0, 0]);
  });
});

describe('countSample', () => {
  it('counts each column at the first row at or above its envelope, and nowhere beyond the least limit', () => {
    const tally = columnCounts(WS, YS, FIXED);
    // Sample 1, nothing of its own: envelope 2, 1, 0.5 (rows 2, 1, 1); 400 Pa is beyond the 350 Pa limit.
    // The least envelope is 0.5 at 300 Pa.
    expect(countSample(tally, [], [])).toEqual({ column: 2, loading: 0.5 });
    // Sample 2, its own limit 250 Pa and a flat 2.5: envelope max(2, 2.5) = 2.5 at 100 and 200 Pa (row 3); 300 and
    // 400 Pa are beyond 250 Pa. Equal least envelopes tie to the larger wing loading, 200 Pa.
    expect(countSample(tally, [250, 900], [() => 2.5])).toEqual({ column: 1, loading: 2.5 });
    expect(rows(tally.counts, 0)).toEqual([0, 0, 1, 1, 0]);
    expect(rows(tally.counts, 1)).toEqual([0, 1, 0, 1, 0]);
    expect(rows(tally.counts, 2)).toEqual([0, 1, 0, 0, 1]);
    expect(rows(tally.counts, 3)).toEqual([0, 0, 0, 0, 2]);
  });

  it('meets a loading exactly on the top row, and none above it', () => {
    const tally = columnCounts(WS, YS, []);
    // A flat 3 is met on the top row (3 <= 3) at every column; the last column wins the tie.
    expect(countSample(tally, [], [() => 3])).toEqual({ column: 3, loading: 3 });
    expect(rows(tally.counts, 0)).toEqual([0, 0, 0, 1, 0]);
    // A flat 3 and then a flat 5: the envelope is 5, above the grid, so no column is met and no optimum is on the grid.
    expect(countSample(tally, [], [() => 3, () => 5])).toBeNull();
    expect(rows(tally.counts, 0)).toEqual([0, 0, 0, 1, 1]);
    expect(rows(tally.counts, 3)).toEqual([0, 0, 0, 1, 1]);
  });

  it('takes a curve that cannot be met at a wing loading (NaN) as met at no row there', () => {
    const tally = columnCounts(WS, YS, []);
    const best = countSample(tally, [], [(w) => (w === 200 ? NaN : 1.5)]);
    expect(best).toEqual({ column: 3, loading: 1.5 });
    expect(rows(tally.counts, 1)).toEqual([0, 0, 0, 0, 1]);
    expect(rows(tally.counts, 2)).toEqual([0, 0, 1, 0, 0]); // 1.5 falls between rows 1 and 2: first row at or above is 2
  });

  it('meets a column exactly at a limit, and keeps a fixed envelope above a lower curve of the sample', () => {
    const tally = columnCounts(WS, YS, FIXED);
    // Limit exactly 200 Pa: 100 and 200 Pa are met ("at or below every limit"). The sample's own 0.5 lies below the
    // fixed envelope 2 and 1 there, so the envelope stays 2 and 1 (rows 2 and 1); 300 Pa is beyond the limit.
    expect(countSample(tally, [200], [() => 0.5])).toEqual({ column: 1, loading: 1 });
    expect([0, 1, 2, 3].map((i) => rows(tally.counts, i))).toEqual([
      [0, 0, 1, 0, 0],
      [0, 1, 0, 0, 0],
      [0, 0, 0, 0, 1],
      [0, 0, 0, 0, 1],
    ]);
    // A sample's curves in falling order: the envelope is the larger, 2.5, not the last, 1.
    const own = columnCounts(WS, YS, []);
    expect(countSample(own, [], [() => 2.5, () => 1])).toEqual({ column: 3, loading: 2.5 });
  });

  it('ties a column to the least envelope only on its whole envelope, also at the grid\'s top row', () => {
    // 100 Pa: curves 3 and 0, envelope 3 (the top row). 200 Pa: curves 3 (1 + 5e-10), within the 1e-9 tie band of 3,
    // and 10: envelope 10, no tie. The sample's optimum is 100 Pa at loading 3.
    const first = (w: number) => (w === 100 ? 3 : 3 * (1 + 5e-10));
    const second = (w: number) => (w === 100 ? 0 : 10);
    const tally = columnCounts(WS, YS, [limit(200)]);
    expect(countSample(tally, [], [first, second])).toEqual({ column: 0, loading: 3 });
    expect([rows(tally.counts, 0), rows(tally.counts, 1)]).toEqual([
      [0, 0, 0, 1, 0],
      [0, 0, 0, 0, 1],
    ]);
    // The same with the first curve exactly on the edge of the tie band, 3 + 3 x 1e-9.
    const onEdge = (w: number) => (w === 100 ? 3 : 3 + Math.abs(3) * 1e-9);
    expect(countSample(columnCounts(WS, YS, [limit(200)]), [], [onEdge, second])).toEqual({ column: 0, loading: 3 });
  });

  it('ties a loading of exactly 0 everywhere to the largest wing loading', () => {
    // The relative tie band of 0 is 0 wide: equal zeros still tie.
    expect(countSample(columnCounts(WS, YS, []), [], [() => 0])).toEqual({ column: 3, loading: 0 });
  });

  it('is null when every column lies beyond a limit', () => {
    const tally = columnCounts(WS, YS, [limit(50)]);
    expect(countSample(tally, [], [() => 1])).toBeNull();
    expect([0, 1, 2, 3].map((i) => rows(tally.counts, i)[4])).toEqual([1, 1, 1, 1]);
  });

  it('ties envelopes within a relative 1e-9 to the larger wing loading, keeping the lesser loading', () => {
    const tally = columnCounts(WS, YS, []);
    // 1 at 100 Pa and 1 + 1e-12 at 200 Pa, then rising: a tie (1e-12 < 1e-9 x 1), so 200 Pa with loading 1.
    const nearTie = (w: number) => (w === 100 ? 1 : w === 200 ? 1 + 1e-12 : 2);
    expect(countSample(tally, [], [nearTie])).toEqual({ column: 1, loading: 1 });
    // 1 + 1e-6 is no tie: 100 Pa keeps it.
    const apart = (w: number) => (w === 100 ? 1 : w === 200 ? 1 + 1e-6 : 2);
    expect(countSample(tally, [], [apart])).toEqual({ column: 0, loading: 1 });
  });
});

describe('probabilityOf', () => {
  it('is the share of samples meeting each grid point, row-major by loading', () => {
    const tally = columnCounts(WS, YS, FIXED);
    countSample(tally, [], []); // rows 2, 1, 1, none
    countSample(tally, [250], [() => 2.5]); // rows 3, 3, none, none
    const p = Array.from(probabilityOf(tally, 2));
    // P(ws[i], ys[j]) at j * 4 + i; each column sums its samples' rows upwards over 2 samples.
    const byRow = [0, 1, 2, 3].map((j) => p.slice(j * 4, j * 4 + 4));
    expect(byRow).toEqual([
      [0, 0, 0, 0],
      [0, 0.5, 0.5, 0],
      [0.5, 0.5, 0.5, 0],
      [1, 1, 0.5, 0],
    ]);
  });

  it('is 0, not NaN, everywhere before any sample is counted', () => {
    const p = probabilityOf(columnCounts(WS, YS, FIXED), 0);
    expect(Array.from(p)).toEqual(new Array(16).fill(0));
  });
});

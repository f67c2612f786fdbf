/**
 * Polylines with gaps, clipped to a horizontal band of the diagram. A curve's
 * samples can climb far above the plotted loadings near its low-wing-loading
 * end; clipping in data space keeps path numbers small and tells the label
 * placer which parts of a curve are actually on the plot.
 */
// @ts-nocheck


export type XY = [number, number];

/** A sampled series: null (or a non-finite number) marks a gap. */
export type Samples = ReadonlyArray<readonly [number, number | null]>;

export function isDefinedPoint<P extends readonly [number, number | null]>(point: P): point is P & readonly [number, number] {
  return point[1] !== null && Number.isFinite(point[0]) && Number.isFinite(point[1]);
}

/** The runs of a series that lie inside lo <= y <= hi, with exact crossing points at the band's edges. */
export function clipToBand(samples: Samples, lo: number, hi: number): XY[][] {
  const runs: XY[][] = [];
  let run: XY[] = [];
  const close = () => {
    if (run.length > 1) runs.push(run);
    run = [];
  };
  let previous: readonly [number, number] | null = null;
  for (const point of samples) {
    if (!isDefinedPoint(point)) {
      close();
      previous = null;
      continue;
    }
    if (previous === null) {
      if (point[1] >= lo && point[1] <= hi) run.push([point[0], point[1]]);
      previous = point;
      continue;
    }
    const piece = clipSegment(previous, point, lo, hi);
    if (piece === null) {
      close();
    } else {
      const [a, b] = piece;
      const last = run[run.length - 1];
      if (!last || last[0] !== a[0] || last[1] !== a[1]) {
        close();
        run.push(a);
      }
      run.push(b);
      // Leaving the band through an edge ends this run.
      if (b[0] !== point[0] || b[1] !== point[1]) close();
    }
    previous = point;
  }
  close();
  return runs;
}

/** The part of segment a-b with lo <= y <= hi, or null when it misses the band. */
export function clipSegment(a: readonly [number, number], b: readonly [number, number], lo: number, hi: number): [XY, XY] | null {
  const dy = b[1] - a[1];
  let t0 = 0;
  let t1 = 1;
  if (dy === 0) {
    if (a[1] < lo || a[1] > hi) return null;
  } else {
    const tLo = (lo - a[1]) / dy;
    const tHi = (hi - a[1]) / dy;
    t0 = Math.max(t0, Math.min(tLo, tHi));
    t1 = Math.min(t1, Math.max(tLo, tHi));
    if (t0 > t1) return null;
  }
  return [lerp(a, b, t0), lerp(a, b, t1)];
}

function lerp(a: readonly [number, number], b: readonly [number, number], t: number): XY {
  if (t === 0) return [a[0], a[1]];
  if (t === 1) return [b[0], b[1]];
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

/** Linear interpolation of a sampled series at x; null outside it or next to a gap. */
export function valueAt(samples: Samples, x: number): number | null {
  for (let i = 0; i < samples.length; i += 1) {
    const point = samples[i];
    if (point[0] === x) return isDefinedPoint(point) ? point[1] : null;
    if (point[0] > x) {
      if (i === 0) return null;
      const before = samples[i - 1];
      if (!isDefinedPoint(before) || !isDefinedPoint(point)) return null;
      const t = (x - before[0]) / (point[0] - before[0]);
      return before[1] + (point[1] - before[1]) * t;
    }
  }
  return null;
}

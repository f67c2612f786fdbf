// @ts-nocheck
import { describe, expect, it } from 'vitest';
import {
  boundaryBands,
  defaultProbabilityGrid,
  probabilityFrontier,
  probabilityMap,
  probabilityMapRun,
  sampleParts,
  MONTE_CARLO_BLOCK,
  typicalUncertainty,
  type CurveBand,
  type ProbabilityMap,
} from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { design, stall } from '../helpers/design';
import { demo, densityLapseJet, ranged } from './fixtures';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const V = 45 * KNOT_MPS;
const [A, B] = [1.8, 2.4]; // landing CLmax range; the builder's nominal is 2.1

/** A concept with a stall requirement only: a sample meets wing loading w when its limit is at or above w. */
const STALL_ONLY = design({ requirements: [stall(V, { id: 'stall' })] });
const GRID = { wingLoading: [400, 1000] as [number, number], loading: [0, 10] as [number, number], nx: 61, ny: 5 };

/** The CLmax a wing loading needs: c(w) = 2w/(rho0 V^2) (Anderson, Introduction to Flight, stalling speed). */
const needed = (w: number) => (2 * w) / (RHO0 * V * V);
/** P(CLmax >= c) for CLmax ~ U(a, b): (b - c)/(b - a) clipped to [0, 1] (uniform CDF, standard result). */
const uniformChance = (w: number) => Math.min(1, Math.max(0, (B - needed(w)) / (B - A)));
/** P(CLmax >= c) for a triangular (a, m, b): 1 - F(c) (triangular CDF, standard result). */
function triangularChance(w: number, m: number): number {
  const c = needed(w);
  if (c <= A) return 1;
  if (c >= B) return 0;
  return c <= m ? 1 - (c - A) ** 2 / ((B - A) * (m - A)) : (B - c) ** 2 / ((B - A) * (B - m));
}

function stallMap(seed: number, samples: number, distribution: 'uniform' | 'triangular' = 'uniform'): ProbabilityMap {
  const params = ranged({ parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low: A, high: B, distribution }] }, STALL_ONLY);
  const map = probabilityMap(STALL_ONLY, params, { seed, samples, grid: GRID });
  if (!map) throw new Error('not stopped, so a map is expected');
  return map;
}

/** RMS difference between the map's bottom row and the closed form. */
function rmsError(map: ProbabilityMap): number {
  let sum = 0;
  map.wingLoadings.forEach((w, i) => (sum += (map.probability[i] - uniformChance(w)) ** 2));
  return Math.sqrt(sum / map.wingLoadings.length);
}

describe('probabilityMap', () => {
  it('agrees with the closed form for a stall-only concept with a uniform CLmax range, within 4 standard errors', () => {
    const n = 20000;
    const map = stallMap(20261202, n);
    map.wingLoadings.forEach((w, i) => {
      const p = uniformChance(w);
      const tolerance = 4 * Math.sqrt((p * (1 - p)) / n) + 1 / n;
      for (let row = 0; row < GRID.ny; row++) {
        expect(Math.abs(map.probability[row * GRID.nx + i] - p), `w = ${w}, row ${row}`).toBeLessThanOrEqual(tolerance);
      }
    });
  });

  it('agrees with the closed form for a triangular CLmax range peaking at the nominal value', () => {
    const n = 20000;
    const map = stallMap(5, n, 'triangular');
    map.wingLoadings.forEach((w, i) => {
      const p = triangularChance(w, 2.1);
      expect(Math.abs(map.probability[i] - p), `w = ${w}`).toBeLessThanOrEqual(4 * Math.sqrt((p * (1 - p)) / n) + 1 / n);
    });
  });

  it('reports the chance at the optimum when the concept has no design point', () => {
    // With no curve the optimum is the nominal stall limit, CLmax 2.1: P = (2.4 - 2.1)/(2.4 - 1.8) = 0.5.
    const n = 20000;
    const point = stallMap(9, n).designPoint;
    expect(point?.source).toBe('optimum');
    expect(Math.abs((point?.probability ?? NaN) - 0.5)).toBeLessThan(4 * Math.sqrt(0.25 / n));
    expect(point?.standardError).toBeCloseTo(Math.sqrt(0.25 / n), 3);
    expect(point?.byRequirement).toEqual([{ id: 'stall', probability: point?.probability }]);
  });

  it('gives bit-identical results for the same seed, however the run is chunked, and different ones for another seed', () => {
    const params = ranged({ parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low: A, high: B }] }, STALL_ONLY);
    const run = (seed: number, chunkSize?: number) => probabilityMap(STALL_ONLY, params, { seed, samples: 3000, grid: GRID, chunkSize }) as ProbabilityMap;
    const first = run(42);
    for (const again of [run(42), run(42, 1), run(42, 37), run(42, 3000)]) {
      expect(Buffer.from(again.probability.buffer)).toEqual(Buffer.from(first.probability.buffer));
      expect(again.designPoint).toEqual(first.designPoint);
    }
    expect(Buffer.from(run(43).probability.buffer)).not.toEqual(Buffer.from(first.probability.buffer));
  });

  it('gives bit-identical results from parts run apart and absorbed, however many parts and in whatever order', () => {
    // What several workers do: each runs a range of whole blocks, one run absorbs them all.
    const jet = demo('business-jet');
    const params = ranged(
      {
        parameters: [
          { field: 'aircraft.aero.configurations.clean.cd0', low: 0.018, high: 0.025 },
          { field: 'aircraft.aero.configurations.landing.clMax', low: 2.0, high: 2.5, distribution: 'triangular' },
        ],
      },
      jet.design,
      jet.concept,
    );
    const grid = defaultProbabilityGrid(jet.design, 30, 40);
    const options = { seed: 7, samples: 2300, grid };
    const whole = probabilityMap(jet.design, params, options) as ProbabilityMap;
    const assembled = (ranges: Array<{ first: number; end: number }>) => {
      const total = probabilityMapRun(jet.design, params, options);
      for (const part of ranges) {
        const run = probabilityMapRun(jet.design, params, { ...options, part });
        while (!run.step(333));
        total.absorb(run.part());
      }
      return total.result();
    };
    const splits = [sampleParts(2300, 1), sampleParts(2300, 2), sampleParts(2300, 3), [...sampleParts(2300, 3)].reverse(), [{ first: 0, end: 777 }, { first: 777, end: 2300 }]];
    expect(sampleParts(2300, 3)).toEqual([{ first: 0, end: 1000 }, { first: 1000, end: 1500 }, { first: 1500, end: 2300 }]);
    for (const ranges of splits) {
      const map = assembled(ranges);
      expect(map.samples).toBe(2300);
      expect(Buffer.from(map.probability.buffer)).toEqual(Buffer.from(whole.probability.buffer));
      expect(map.designPoint).toEqual(whole.designPoint);
      expect(map.optimumSpread).toEqual(whole.optimumSpread);
    }
  });

  it('splits samples into parts of whole blocks, never more parts than blocks', () => {
    expect(MONTE_CARLO_BLOCK).toBe(500);
    expect(sampleParts(10000, 2)).toEqual([{ first: 0, end: 5000 }, { first: 5000, end: 10000 }]);
    expect(sampleParts(400, 4)).toEqual([{ first: 0, end: 400 }]);
    expect(sampleParts(1000, 3)).toEqual([{ first: 0, end: 500 }, { first: 500, end: 1000 }]);
  });

  it('converges as 1/sqrt(N): 64 times the samples, about an eighth of the error', () => {
    // Monte Carlo standard error falls as N^-1/2 (central limit theorem). Averaged over 8 seeds.
    const sizes = [250, 1000, 4000, 16000];
    const errors = sizes.map((n) => {
      let sum = 0;
      for (let seed = 1; seed <= 8; seed++) sum += rmsError(stallMap(seed, n));
      return sum / 8;
    });
    for (let i = 1; i < sizes.length; i++) {
      expect(errors[i - 1] / errors[i], `${sizes[i - 1]} -> ${sizes[i]}`).toBeGreaterThan(1.4);
      expect(errors[i - 1] / errors[i], `${sizes[i - 1]} -> ${sizes[i]}`).toBeLessThan(2.9);
    }
    expect(errors[0] / errors[3]).toBeGreaterThan(5);
    expect(errors[0] / errors[3]).toBeLessThan(12);
  });

  it('reports progress between chunks and stops with no result when asked', () => {
    const params = ranged({ parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low: A, high: B }] }, STALL_ONLY);
    const seen: number[] = [];
    probabilityMap(STALL_ONLY, params, { seed: 1, samples: 1200, grid: GRID, chunkSize: 500, onProgress: (done, total) => seen.push(done / total) });
    expect(seen).toEqual([500 / 1200, 1000 / 1200, 1]);
    let checks = 0;
    const stopped = probabilityMap(STALL_ONLY, params, { seed: 1, samples: 1200, grid: GRID, chunkSize: 500, shouldStop: () => ++checks > 2 });
    expect(stopped).toBeNull();
    expect(checks).toBe(3);
  });

  it('never lowers the chance as loading rises, and matches the boundary bands at their edges (business jet)', () => {
    const jet = densityLapseJet();
    const params = ranged(
      {
        parameters: [
          { field: 'aircraft.aero.configurations.clean.cd0', low: 0.018, high: 0.025 },
          { field: 'aircraft.aero.configurations.clean.oswaldEfficiency', low: 0.75, high: 0.85 },
          { field: 'aircraft.aero.configurations.landing.clMax', low: 2.0, high: 2.5 },
          { field: 'aircraft.propulsion.lapseExponent', low: 0.8, high: 1 },
        ],
      },
      jet.design,
      jet.concept,
    );
    const grid = defaultProbabilityGrid(jet.design, 40, 60);
    const map = probabilityMap(jet.design, params, { seed: 3, samples: 2000, grid }) as ProbabilityMap;
    const bands = boundaryBands(jet.design, params, map.wingLoadings);
    const leastLimit = Math.min(...bands.flatMap((b) => (b.type === 'limit' ? [b.limits[0]] : [])));
    const curves = bands.filter((b): b is CurveBand => b.type === 'curve');
    const wrong: string[] = [];
    map.wingLoadings.forEach((w, i) => {
      const upper = Math.max(...curves.map((c) => c.upper[i]));
      const lower = Math.max(...curves.map((c) => c.lower[i]));
      map.loadings.forEach((y, j) => {
        const p = map.probability[j * grid.nx + i];
        if (j > 0 && p < map.probability[(j - 1) * grid.nx + i]) wrong.push(`falls at (${w}, ${y})`);
        if (w < leastLimit && y > upper && p !== 1) wrong.push(`above every band at (${w}, ${y}): ${p}`);
        if (y < lower && p !== 0) wrong.push(`below a band at (${w}, ${y}): ${p}`);
      });
    });
    expect(wrong).toEqual([]);
    const point = map.designPoint;
    expect(point?.source).toBe('design point');
    for (const r of point?.byRequirement ?? []) expect(r.probability).toBeGreaterThanOrEqual(point?.probability ?? 1);
    expect(map.caution).toMatch(/Preliminary sizing/);
  });

  it('draws each contour where the chance first reaches its level', () => {
    const map = stallMap(20261202, 20000);
    // No curve: a reachable column is met from the bottom row up, an unreachable one never.
    const half = probabilityFrontier(map, 0.5);
    map.wingLoadings.forEach((w, i) => expect(half[i]).toBe(map.probability[i] >= 0.5 ? 0 : NaN));
  });

  it('names the bad grid value and the bad sample count', () => {
    const params = ranged({ parameters: [] }, STALL_ONLY);
    expect(() => probabilityMap(STALL_ONLY, params, { seed: 1, samples: 10, grid: { ...GRID, nx: 1 } })).toThrow(/grid\.nx is 1/);
    expect(() => probabilityMap(STALL_ONLY, params, { seed: 1, samples: 10, grid: { ...GRID, wingLoading: [0, 10] } })).toThrow(/grid\.wingLoading/);
    expect(() => probabilityMap(STALL_ONLY, params, { seed: 1, samples: 0, grid: GRID })).toThrow(/samples is 0/);
  });
});

describe('typical ranges in the Monte Carlo', () => {
  it('runs over every typical range of the business jet and keeps every probability in [0, 1]', () => {
    const jet = demo('business-jet');
    const params = ranged(typicalUncertainty(jet.design), jet.design, jet.concept);
    const map = probabilityMap(jet.design, params, { seed: 1, samples: 500, grid: defaultProbabilityGrid(jet.design, 30, 30) }) as ProbabilityMap;
    expect(map.probability.every((p) => p >= 0 && p <= 1)).toBe(true);
    expect(map.optimumSpread?.samplesOnGrid).toBeGreaterThan(0);
    const spread = map.optimumSpread?.wingLoadingPa;
    expect(spread && spread.p5 <= spread.p50 && spread.p50 <= spread.p95).toBe(true);
  });
});

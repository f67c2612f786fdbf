/**
 * The Monte Carlo map counted again by hand, sample by sample, exactly.
 *
 * A stall requirement is a wing-loading limit, w <= 1/2 rho0 V^2 CLmax
 * (Anderson, Introduction to Flight, stalling speed; rho0 = 1.225 kg/m^3,
 * U.S. Standard Atmosphere 1976, Table 1; mass fraction 1). With the landing
 * CLmax ranged, a sample meets wing loading w, at every loading, exactly when
 * w is at or below its own landing limit and the fixed clean limit; no curve
 * means no loading is needed, so each column is met from the bottom row up.
 *
 * The draws are the ones the run promises: samples in blocks of 500, block b
 * drawn from MT19937 keyed [seed, b] (init_by_array), one draw per ranged
 * assumption in the order given, a uniform range read as a + u (b - a) and a
 * triangular one by its inverse CDF (Kotz and van Dorp, Beyond Beta, 2004,
 * ch. 1). The stream is checked against Matsumoto and Nishimura's published
 * mt19937ar output in random.test.ts; here it is drawn again in the test and
 * every figure of the map is counted from the draws:
 * - P(w, y) = (samples meeting w) / N, stored as a 32-bit float;
 * - at the design point, the fraction meeting each requirement and all of
 *   them, with the binomial standard error sqrt(p (1 - p) / N) (standard
 *   result);
 * - the least-loading grid point of a sample is its largest met column
 *   (every met column needs loading 0; ties go to the larger wing loading),
 *   summarised by the mean and the nearest-rank percentiles, the ceil(pN)-th
 *   smallest (NIST/SEMATECH e-Handbook, section 7.2.6.2, common practice).
 */
import { describe, expect, it } from 'vitest';
import { probabilityMap, probabilityMapRun, sampleParts, STUDY_CAUTION, type ProbabilityMap } from '../../../core/studies';
import { mersenneTwisterByArray } from '../../../core/studies/random';
import { KNOT_MPS } from '../../../core/units/factors';
import { design, stall } from '../helpers/design';
import { ranged } from './fixtures';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const V_LANDING = 45 * KNOT_MPS;
const V_CLEAN = 54 * KNOT_MPS;
const CLEAN_CLMAX = 1.5; // the test builder's clean CLmax (test/core/helpers/design.ts)
const [A, B] = [1.8, 2.4]; // landing CLmax range around the builder's 2.1
const limitOf = (v: number, clMax: number) => 0.5 * RHO0 * v * v * clMax; // Anderson, stalling speed
const CLEAN_LIMIT = limitOf(V_CLEAN, CLEAN_CLMAX); // about 709 Pa, inside the grid
const POINT = { wingLoadingPa: 650, loading: 5 };

/**
 * A fixed clean stall first, then a disabled stall that would cut every
 * column (about 306 Pa), then the landing stall that the ranged CLmax moves:
 * the map must skip the disabled one and read the landing one by its place
 * in the concept.
 */
const CONCEPT = design({
  requirements: [
    stall(V_CLEAN, { id: 'clean-stall', configuration: 'clean' }),
    stall(30 * KNOT_MPS, { id: 'switched-off', enabled: false }),
    stall(V_LANDING, { id: 'landing-stall' }),
  ],
  designPoint: POINT,
});
const GRID = { wingLoading: [600, 900] as [number, number], loading: [0, 10] as [number, number], nx: 31, ny: 3 };
const WS = Array.from({ length: 31 }, (_, i) => 600 + 10 * i); // 10 Pa apart, exact in binary
const LANDING_CLMAX = 'aircraft.aero.configurations.landing.clMax';
const ASPECT_RATIO = 'aircraft.aero.aspectRatio'; // moves no stall limit, but takes its draw

type Shape = 'uniform' | 'triangular';
const parametersFor = (distribution: Shape) =>
  ranged({ parameters: [{ field: LANDING_CLMAX, low: A, high: B, distribution }, { field: ASPECT_RATIO, low: 7, high: 8 }] }, CONCEPT);

/** Inverse CDFs written out: uniform a + u(b - a); triangular with mode m (Kotz and van Dorp). */
function clMaxOf(u: number, distribution: Shape): number {
  if (distribution === 'uniform') return A + u * (B - A);
  const m = 2.1;
  return u < (m - A) / (B - A) ? A + Math.sqrt(u * (B - A) * (m - A)) : B - Math.sqrt((1 - u) * (B - A) * (B - m));
}

/** Each sample's landing-stall limit, drawn as the run promises. */
function landingLimits(seed: number, samples: number, distribution: Shape): number[] {
  const out: number[] = [];
  for (let block = 0; out.length < samples; block++) {
    const stream = mersenneTwisterByArray([seed, block]);
    for (let k = 0; k < 500 && out.length < samples; k++) {
      const u = stream.nextUnit(); // landing CLmax
      stream.nextUnit(); // aspect ratio
      out.push(limitOf(V_LANDING, clMaxOf(u, distribution)));
    }
  }
  return out;
}

interface HandCount {
  met: number[]; // per column
  metLanding: number; // at the design point
  optimumW: number[]; // per sample, NaN off the grid
}

function countByHand(limits: readonly number[]): HandCount {
  const met = WS.map((w) => limits.filter((l) => w <= Math.min(l, CLEAN_LIMIT)).length);
  const metLanding = limits.filter((l) => l >= POINT.wingLoadingPa).length;
  const optimumW = limits.map((l) => {
    const columns = WS.filter((w) => w <= Math.min(l, CLEAN_LIMIT));
    return columns.length > 0 ? columns[columns.length - 1] : NaN;
  });
  return { met, metLanding, optimumW };
}

/** Mean and nearest-rank 5th, 50th and 95th percentiles of the finite values. */
function handSpread(values: readonly number[]) {
  const v = values.filter((x) => Number.isFinite(x)).sort((a, b) => a - b);
  const rank = (p: number) => v[Math.ceil(p * v.length) - 1];
  return { mean: v.reduce((s, x) => s + x, 0) / v.length, p5: rank(0.05), p50: rank(0.5), p95: rank(0.95) };
}

function expectMapMatches(map: ProbabilityMap, limits: readonly number[]): void {
  const n = limits.length;
  const hand = countByHand(limits);
  expect(map.samples).toBe(n);
  for (let i = 0; i < WS.length; i++) {
    for (let j = 0; j < GRID.ny; j++) expect(map.probability[j * GRID.nx + i], `column ${i}, row ${j}`).toBe(Math.fround(hand.met[i] / n));
  }
  const p = hand.metLanding / n;
  expect(map.designPoint).toEqual({
    wingLoadingPa: 650,
    loading: 5,
    source: 'design point',
    probability: p,
    standardError: Math.sqrt((p * (1 - p)) / n),
    byRequirement: [
      { id: 'clean-stall', probability: 1 }, // 650 Pa is below the clean limit, about 709 Pa
      { id: 'landing-stall', probability: p },
    ],
  });
  const onGrid = hand.optimumW.filter((w) => w === w);
  expect(map.optimumSpread?.samplesOnGrid).toBe(onGrid.length);
  expect(map.optimumSpread?.resolutionPa).toBe(10); // (900 - 600) / (31 - 1)
  const spread = handSpread(hand.optimumW);
  expect(map.optimumSpread?.wingLoadingPa.p5).toBe(spread.p5);
  expect(map.optimumSpread?.wingLoadingPa.p50).toBe(spread.p50);
  expect(map.optimumSpread?.wingLoadingPa.p95).toBe(spread.p95);
  expect(map.optimumSpread?.wingLoadingPa.mean).toBeCloseTo(spread.mean, 9);
  expect(map.optimumSpread?.loading).toEqual({ mean: 0, p5: 0, p50: 0, p95: 0 });
}

describe('probabilityMap counted by hand', () => {
  it('a uniform landing CLmax over 1600 samples (four blocks, the last one short): every figure exactly', () => {
    const limits = landingLimits(20261202, 1600, 'uniform');
    // The range reaches both sides of the grid's first column and of the design point.
    expect(Math.min(...limits)).toBeLessThan(600);
    expect(Math.max(...limits)).toBeGreaterThan(CLEAN_LIMIT);
    const map = probabilityMap(CONCEPT, parametersFor('uniform'), { seed: 20261202, samples: 1600, grid: GRID }) as ProbabilityMap;
    expectMapMatches(map, limits);
    expect(map.caution).toBe(STUDY_CAUTION);
    expect(map.caution).toMatch(/Preliminary sizing.*applicable authority.*licensed engineering review/);
    expect(map.seed).toBe(20261202);
    expect(Array.from(map.wingLoadings)).toEqual(WS);
    expect(Array.from(map.loadings)).toEqual([0, 5, 10]);
  });

  it('a triangular landing CLmax peaking at the nominal 2.1: every figure exactly', () => {
    const limits = landingLimits(7, 900, 'triangular');
    const map = probabilityMap(CONCEPT, parametersFor('triangular'), { seed: 7, samples: 900, grid: GRID }) as ProbabilityMap;
    expectMapMatches(map, limits);
  });

  it('reports progress every 500 samples unless told otherwise', () => {
    const seen: Array<[number, number]> = [];
    probabilityMap(CONCEPT, parametersFor('uniform'), { seed: 1, samples: 1600, grid: GRID, onProgress: (done, total) => seen.push([done, total]) });
    expect(seen).toEqual([
      [500, 1600],
      [1000, 1600],
      [1500, 1600],
      [1600, 1600],
    ]);
  });

  it('a point given in the options is reported as a design point, on a concept that has none', () => {
    const { designPoint: _none, ...withoutPoint } = CONCEPT;
    const params = ranged({ parameters: [{ field: LANDING_CLMAX, low: A, high: B }, { field: ASPECT_RATIO, low: 7, high: 8 }] }, withoutPoint);
    const map = probabilityMap(withoutPoint, params, { seed: 20261202, samples: 600, grid: GRID, point: POINT }) as ProbabilityMap;
    expectMapMatches(map, landingLimits(20261202, 600, 'uniform'));
  });
});

describe('the point the chance is reported at', () => {
  it('a design point exactly on the nominal stall limit meets it in every sample when nothing is ranged', () => {
    // With no range every sample is the nominal concept; a point on a limit meets it (margin 0).
    // Sea-level density from the standard's own constants, rho0 = P0/(R T0) = 101325/(287.05287 x 288.15)
    // (U.S. Standard Atmosphere 1976), so that the point lies on the limit to rounding, not 1.5e-8 inside it.
    const rho0 = 101325 / (287.05287 * 288.15);
    const onLimit = { wingLoadingPa: 0.5 * rho0 * V_LANDING * V_LANDING * 2.1, loading: 0 };
    const map = probabilityMap(CONCEPT, [], { seed: 1, samples: 20, grid: GRID, point: onLimit }) as ProbabilityMap;
    expect(map.designPoint?.probability).toBe(1);
    expect(map.designPoint?.byRequirement.map((r) => r.probability)).toEqual([1, 1]);
  });

  it('no point at all when the concept has none and no plotted wing loading meets every requirement', () => {
    // Plotted from 1000 Pa, above both stall limits (about 689 and 709 Pa): no optimum to report at.
    const { designPoint: _none, ...rest } = CONCEPT;
    const high = { ...rest, diagram: { ...rest.diagram, wingLoadingRangePa: [1000, 2000] as [number, number] } };
    const map = probabilityMap(high, [], { seed: 1, samples: 20, grid: GRID }) as ProbabilityMap;
    expect(map.designPoint).toBeUndefined();
    expect(map.samples).toBe(20);
  });
});

describe('probabilityMapRun counted by hand', () => {
  const params = parametersFor('uniform');
  const options = { seed: 20261202, samples: 1600, grid: GRID };
  const limits = landingLimits(20261202, 1600, 'uniform');

  it('a part starting inside a block draws on from that block: samples 700 to 1299', () => {
    const run = probabilityMapRun(CONCEPT, params, { ...options, part: { first: 700, end: 1300 } });
    expect(run.total).toBe(600);
    expect(run.step(250)).toBe(false);
    expect(run.done()).toBe(250);
    expect(run.step(10000)).toBe(true);
    expect(run.done()).toBe(600);
    const part = run.part();
    const hand = countByHand(limits.slice(700, 1300));
    expect([part.first, part.end]).toEqual([700, 1300]);
    expect(part.metAll).toBe(hand.metLanding);
    expect(Array.from(part.metEach)).toEqual([600, hand.metLanding]);
    expect(Array.from(part.optimumW)).toEqual(hand.optimumW);
    expect(Array.from(part.optimumY)).toEqual(hand.optimumW.map((w) => (w === w ? 0 : NaN)));
  });

  it('the map of the samples run so far, part way through', () => {
    const run = probabilityMapRun(CONCEPT, params, options);
    run.step(250);
    expectMapMatches(run.result(), limits.slice(0, 250));
  });

  it('parts run apart and absorbed in any order give the map of the whole run, counted by hand', () => {
    const whole = probabilityMapRun(CONCEPT, params, options);
    const ranges = [{ first: 1300, end: 1600 }, { first: 0, end: 700 }, { first: 700, end: 1300 }];
    for (const part of ranges) {
      const run = probabilityMapRun(CONCEPT, params, { ...options, part });
      while (!run.step(200));
      whole.absorb(run.part());
    }
    expect(whole.done()).toBe(1600);
    expectMapMatches(whole.result(), limits);
  });

  it('a part run absorbs the rest of its own range: samples 500 to 1599, counted by hand', () => {
    const run = probabilityMapRun(CONCEPT, params, { ...options, part: { first: 500, end: 1600 } });
    run.step(500); // samples 500 to 999 here
    const rest = probabilityMapRun(CONCEPT, params, { ...options, part: { first: 1000, end: 1600 } });
    rest.step(600);
    run.absorb(rest.part());
    expect(run.done()).toBe(1100);
    expectMapMatches(run.result(), limits.slice(500, 1600));
  });

  it('absorbing only a late part gives the map of those samples, optimum spread included', () => {
    const whole = probabilityMapRun(CONCEPT, params, options);
    const late = probabilityMapRun(CONCEPT, params, { ...options, part: { first: 1300, end: 1600 } });
    late.step(300);
    whole.absorb(late.part());
    expect(whole.done()).toBe(300);
    expectMapMatches(whole.result(), limits.slice(1300, 1600));
  });

  it('before any sample: no chance yet is 0, never NaN, and there is no optimum spread', () => {
    const map = probabilityMapRun(CONCEPT, params, options).result();
    expect(map.samples).toBe(0);
    expect(Array.from(map.probability).every((p) => p === 0)).toBe(true);
    expect(map.designPoint?.probability).toBe(0);
    expect(map.designPoint?.standardError).toBe(0);
    expect(map.designPoint?.byRequirement).toEqual([
      { id: 'clean-stall', probability: 0 },
      { id: 'landing-stall', probability: 0 },
    ]);
    expect(map.optimumSpread).toBeUndefined();
  });

  it('a part is what was counted when it was taken: running on does not change it', () => {
    const run = probabilityMapRun(CONCEPT, params, options);
    run.step(250);
    const part = run.part();
    run.step(500);
    const hand = countByHand(limits.slice(0, 250));
    expect(part.end).toBe(250);
    expect(part.metAll).toBe(hand.metLanding);
    expect(Array.from(part.metEach)).toEqual([250, hand.metLanding]);
    // The optimum spread holds one entry per sample counted, not a slot for every sample of the run.
    expect(Array.from(part.optimumW)).toEqual(hand.optimumW);
    expect(Array.from(part.optimumY)).toEqual(hand.optimumW.map((w) => (w === w ? 0 : NaN)));
    // counts[i (ny + 1) + k] holds the samples whose lowest row met in column i is k; with no curve a column
    // met at all is met from row 0, so k = 0 counts the samples meeting w (at or below both stall limits).
    expect(WS.map((_, i) => part.counts[i * (GRID.ny + 1)])).toEqual(hand.met);
  });

  it('a map is a copy: writing into one leaves the next map of the same run as it was', () => {
    const run = probabilityMapRun(CONCEPT, params, options);
    run.step(100);
    const first = run.result();
    first.wingLoadings[0] = -1;
    first.loadings[0] = -1;
    const second = run.result();
    expect(second.wingLoadings[0]).toBe(600);
    expect(second.loadings[0]).toBe(0);
  });

  it('refuses a part counted for a concept with other requirements', () => {
    const run = probabilityMapRun(CONCEPT, params, options);
    const more = design({ requirements: [...CONCEPT.requirements, stall(40 * KNOT_MPS, { id: 'third' })], designPoint: POINT });
    const other = probabilityMapRun(more, params, { ...options, part: { first: 0, end: 10 } });
    other.step(10);
    expect(() => run.absorb(other.part())).toThrow(new RangeError('the part was counted on another grid or another concept'));
  });

  it('refuses a part counted on another grid', () => {
    const run = probabilityMapRun(CONCEPT, params, options);
    const other = probabilityMapRun(CONCEPT, params, { ...options, grid: { ...GRID, ny: 4 }, part: { first: 0, end: 10 } });
    other.step(10);
    expect(() => run.absorb(other.part())).toThrow(new RangeError('the part was counted on another grid or another concept'));
  });
});

describe('sampleParts: whole blocks of 500, as even as the blocks allow', () => {
  it.each<[number, number, Array<[number, number]>]>([
    // 3 blocks in 2 parts: block edges at round(3/2) = 2 blocks.
    [1500, 2, [[0, 1000], [1000, 1500]]],
    // 2.9 parts is 2 parts.
    [2000, 2.9, [[0, 1000], [1000, 2000]]],
    // 0 parts still gives the whole run as one.
    [10, 0, [[0, 10]]],
    // 5 blocks in 3 parts: edges at round(5/3) = 2 and round(10/3) = 3 blocks; the last block short.
    [2400, 3, [[0, 1000], [1000, 1500], [1500, 2400]]],
  ])('%i samples in %s parts', (samples, parts, expected) => {
    expect(sampleParts(samples, parts)).toEqual(expected.map(([first, end]) => ({ first, end })));
  });
});

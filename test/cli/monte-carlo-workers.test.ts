/**
 * How many threads the report's Monte Carlo uses. The map itself is the same
 * on any number (test/cli/built.test.ts runs 1, 2 and 3 threads).
 */
import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { claimSamples, LEAST_CLAIM, monteCarloWorkers } from '../../app/cli/monte-carlo-workers';

describe('monteCarloWorkers', () => {
  it('takes LOFTPOINT_WORKERS when it is a whole number of 1 or more, up to 16', () => {
    expect(monteCarloWorkers({ LOFTPOINT_WORKERS: '3' }, true)).toBe(3);
    expect(monteCarloWorkers({ LOFTPOINT_WORKERS: '1' }, true)).toBe(1);
    expect(monteCarloWorkers({ LOFTPOINT_WORKERS: '64' }, true)).toBe(16);
  });

  it('otherwise uses the free cores, at least one and never more than the machine has', () => {
    for (const env of [{}, { LOFTPOINT_WORKERS: '0' }, { LOFTPOINT_WORKERS: 'many' }]) {
      const workers = monteCarloWorkers(env, true);
      expect(workers).toBeGreaterThanOrEqual(1);
      expect(workers).toBeLessThanOrEqual(availableParallelism());
    }
  });

  it('runs in one thread from the TypeScript sources, which a worker thread could not load', () => {
    expect(monteCarloWorkers({ LOFTPOINT_WORKERS: '3' }, false)).toBe(1);
  });
});

describe('claimSamples', () => {
  const counter = () => new Int32Array(new SharedArrayBuffer(4));
  const all = (next: Int32Array, samples: number, threads: number) => {
    const out: Array<{ first: number; end: number }> = [];
    for (let c = claimSamples(next, samples, threads); c; c = claimSamples(next, samples, threads)) out.push(c);
    return out;
  };

  it('hands out a quarter of what is left on two threads, at least the least claim, then the rest', () => {
    // By hand, 1,000 samples on two threads: floor(left / 4) each time, never under 100:
    // 1000/4 = 250; 750/4 = 187; 563/4 = 140; 423/4 = 105; 318/4 = 79 -> 100; 218/4 = 54 -> 100; then 100; then the last 18.
    expect(LEAST_CLAIM).toBe(100);
    const sizes = all(counter(), 1000, 2).map((c) => c.end - c.first);
    expect(sizes).toEqual([250, 187, 140, 105, 100, 100, 100, 18]);
  });

  it('covers every sample exactly once, in order, whatever the thread count', () => {
    for (const [samples, threads] of [[1, 2], [99, 3], [10000, 2], [40000, 16]]) {
      const claims = all(counter(), samples, threads);
      expect(claims[0].first).toBe(0);
      for (let k = 1; k < claims.length; k++) expect(claims[k].first).toBe(claims[k - 1].end);
      expect(claims.at(-1)!.end).toBe(samples);
    }
  });

  it('gives nothing once every sample is claimed', () => {
    const next = counter();
    all(next, 500, 2);
    expect(claimSamples(next, 500, 2)).toBeNull();
    expect(Atomics.load(next, 0)).toBe(500);
  });
});

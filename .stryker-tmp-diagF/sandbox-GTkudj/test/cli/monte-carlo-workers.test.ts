/**
 * How many threads the report's Monte Carlo uses. The map itself is the same
 * on any number (test/cli/built.test.ts runs 1, 2 and 3 threads).
 */
// @ts-nocheck

import { availableParallelism } from 'node:os';
import { describe, expect, it } from 'vitest';
import { monteCarloWorkers } from '../../app/cli/monte-carlo-workers';

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

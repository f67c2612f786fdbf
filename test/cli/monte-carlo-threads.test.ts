/**
 * The report's Monte Carlo on a worker thread started from the worker's own
 * built file (as app/build-cli.js builds it): the worker takes part, and the
 * map is bit-for-bit the one core's probabilityMap draws on one thread, the
 * property the report relies on (core/studies/monte-carlo.ts: any split of
 * the samples gives the very counts of one run).
 */
import { mkdtempSync, readdirSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept, probabilityMap } from '../../core';
import { plainParameters, sharedTexts, threadParameters, type ThreadTiming } from '../../app/cli/monte-carlo-claims';
import { startMonteCarloThreads } from '../../app/cli/monte-carlo-workers';
import { studySettings, type StudyInput } from '../../app/report/studies';
// @ts-expect-error plain JavaScript module without types
import { buildMonteCarloThread } from '../../app/build-cli.js';

const root = join(import.meta.dirname, '..', '..');
let dir = '';
let script = '';

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'loftpoint-thread-'));
  const thread = await buildMonteCarloThread(root, dir);
  for (const file of thread.outputFiles) writeFileSync(file.path, file.contents);
  script = join(dir, thread.file);
}, 60_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function businessJet(samples: number, seed: number) {
  const demo = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet')!;
  const parsed = parseConcept(demo.concept);
  if (!parsed.ok) throw new Error('the business-jet demo does not parse');
  const input: StudyInput = { design: parsed.design, concept: demo.concept, evaluation: evaluateDesign(parsed.design), system: 'si', options: { samples, seed } };
  return { input, ...studySettings(input) };
}

describe('the Monte Carlo on a worker thread', () => {
  it('shares the samples with the worker and draws the very map of one thread', async () => {
    // 4,000 samples: this thread's first claim alone is 1,000 samples, far longer than a worker takes to start.
    const { input, seed, samples, grid, parameters } = businessJet(4000, 11);
    const timings: ThreadTiming[] = [];
    const threads = startMonteCarloThreads(2, script);
    expect(threads.threads).toBe(2);
    const map = await threads.run({ seed, samples, grid }, input.design, input.concept, parameters, timings);
    const worker = timings.find((t) => t.thread !== 'main');
    expect(worker?.samples).toBeGreaterThan(0);
    expect(timings.reduce((sum, t) => sum + t.samples, 0)).toBe(4000);
    const one = probabilityMap(input.design, parameters, { seed, samples, grid })!;
    expect(Buffer.from(map.probability.buffer).equals(Buffer.from(one.probability.buffer))).toBe(true);
    expect(map.designPoint).toEqual(one.designPoint);
    expect(map.optimumSpread).toEqual(one.optimumSpread);
    // The worker wrote its code cache beside its file as it ended, for the next run.
    expect(readdirSync(dir).some((name) => name.endsWith('.cache'))).toBe(true);
  }, 60_000);

  it('leaves every sample to this thread when the worker cannot take the run, with the same map', async () => {
    const { input, seed, grid, parameters } = businessJet(1000, 11);
    const threads = startMonteCarloThreads(2, script);
    // The worker is sent a ranged field the design does not have (this thread never reads the field itself).
    const broken = parameters.map((p, i) => (i === 0 ? { ...p, field: 'aircraft.noSuchField' } : p));
    const timings: ThreadTiming[] = [];
    const map = await threads.run({ seed, samples: 1000, grid }, input.design, input.concept, broken, timings);
    expect(timings.map((t) => [t.thread, t.samples])).toEqual([['main', 1000]]);
    const one = probabilityMap(input.design, parameters, { seed, samples: 1000, grid })!;
    expect(Buffer.from(map.probability.buffer).equals(Buffer.from(one.probability.buffer))).toBe(true);
  }, 60_000);

  it('runs everything on this thread when there is no worker file', async () => {
    const { input, seed, grid, parameters } = businessJet(300, 5);
    const threads = startMonteCarloThreads(2, null);
    expect(threads.threads).toBe(1);
    const timings: ThreadTiming[] = [];
    const map = await threads.run({ seed, samples: 300, grid }, input.design, input.concept, parameters, timings);
    expect(map.samples).toBe(300);
    expect(timings).toEqual([]);
  });
});

describe('the ranged assumptions sent to a worker', () => {
  it('cross as plain data and write each value into the same field as the originals', () => {
    const { input, parameters } = businessJet(100, 1);
    const plain = plainParameters(parameters);
    expect(() => structuredClone(plain)).not.toThrow();
    const again = threadParameters(structuredClone(plain), structuredClone(input.design), input.concept);
    parameters.forEach((p, i) => {
      // The high end of its range, well away from the concept's own value.
      const value = p.high;
      expect(JSON.stringify(again[i].apply(input.design, value))).toBe(JSON.stringify(p.apply(input.design, value)));
      expect(JSON.stringify(again[i].apply(input.design, value))).not.toBe(JSON.stringify(input.design));
    });
  });
});

describe('the texts of what a worker receives, made shared copies', () => {
  it('keeps every value, at any depth, and the object itself', () => {
    const looped: Record<string, unknown> = { kind: 'stall', ids: ['cruise', { id: 'ceiling' }], cd0: 0.02, zero: -0, samples: new Float64Array([1.5, Number.NaN]) };
    looped.self = looped;
    const copy = structuredClone(looped);
    expect(sharedTexts(copy)).toBe(copy);
    expect(copy).toEqual(looped);
    expect(Object.is(copy.zero, -0)).toBe(true);
    expect(copy.self).toBe(copy);
  });

  it('leaves a design sent to another thread equal to the one read, so the samples draw the same map', () => {
    const { input, seed, grid, parameters } = businessJet(200, 3);
    const design = sharedTexts(structuredClone(input.design));
    expect(design).toEqual(input.design);
    const ranged = threadParameters(sharedTexts(structuredClone(plainParameters(parameters))), design, sharedTexts(structuredClone(input.concept)));
    const there = probabilityMap(design, ranged, { seed, samples: 200, grid })!;
    const here = probabilityMap(input.design, parameters, { seed, samples: 200, grid })!;
    expect(Buffer.from(there.probability.buffer).equals(Buffer.from(here.probability.buffer))).toBe(true);
    expect(there.designPoint).toEqual(here.designPoint);
  });
});

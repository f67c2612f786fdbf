/**
 * Measured by monte-carlo-cores.js, which bundles this file with esbuild and
 * runs it as plain JavaScript (worker threads load JavaScript, not
 * TypeScript). The report's Monte Carlo of 10,000 samples on the business-jet
 * demo with typical ranges, on 1 and 2 threads, interleaved run by run;
 * medians with spread, and whether the maps are bit-identical.
 */
// @ts-nocheck

import { loadavg, availableParallelism } from 'node:os';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';
import type { StudyInput } from '../../app/report/studies';

const RUNS = Number(process.env.RUNS ?? 7);
const { reportProbabilityMap, monteCarloWorkers } = await import('../../app/cli/monte-carlo-workers');

const demo = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet')!;
const parsed = parseConcept(demo.concept);
if (!parsed.ok) throw new Error('the business-jet demo does not parse');
const input: StudyInput = { design: parsed.design, concept: demo.concept, evaluation: evaluateDesign(parsed.design), system: 'si', options: { samples: 10000, seed: 20261202 } };

function stats(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9) };
}
const fmt = (x: { median: number; p10: number; p90: number }) => `${Math.round(x.median)} ms (${Math.round(x.p10)}-${Math.round(x.p90)})`;

const reference = (await reportProbabilityMap(input, 1)).map!; // warm-up, and the one-thread map
const times: Record<number, number[]> = { 1: [], 2: [] };
const cpu: Record<number, number[]> = { 1: [], 2: [] };
let identical = true;
for (let r = 0; r < RUNS; r++) {
  for (const workers of r % 2 === 0 ? [1, 2] : [2, 1]) {
    const start = performance.now();
    const used = process.cpuUsage(); // every thread of the process
    const { map } = await reportProbabilityMap(input, workers);
    times[workers].push(performance.now() - start);
    const spent = process.cpuUsage(used);
    cpu[workers].push((spent.user + spent.system) / 1000);
    identical &&= Buffer.from(map!.probability.buffer).equals(Buffer.from(reference.probability.buffer)) && JSON.stringify(map!.designPoint) === JSON.stringify(reference.designPoint);
  }
}
const one = stats(times[1]);
const two = stats(times[2]);
console.log(`Monte Carlo, 10,000 samples, business-jet demo, typical ranges; wall time, median (10th-90th percentile) of ${RUNS} interleaved runs`);
console.log(`  cores ${availableParallelism()}; load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}; threads chosen for this load: ${monteCarloWorkers()}`);
console.log(`  1 thread    wall ${fmt(one)}   CPU ${fmt(stats(cpu[1]))}`);
console.log(`  2 threads   wall ${fmt(two)}   CPU ${fmt(stats(cpu[2]))}   speed-up ${(one.median / two.median).toFixed(2)}x`);
console.log(`  maps bit-identical for the seed on 1 and 2 threads: ${identical ? 'yes' : 'NO'}`);
console.log(`Target: at least 1.6x with two free cores (${(one.median / two.median) >= 1.6 ? 'met' : 'not met'} at this load) and identical maps (${identical ? 'met' : 'NOT met'})`);

/**
 * Measured by monte-carlo-cores.js, which bundles this file with esbuild and
 * runs it as plain JavaScript (worker threads load JavaScript, not
 * TypeScript). The report's Monte Carlo of 10,000 samples with typical
 * ranges, on the heaviest demo (utility-twin) and on business-jet, on 1 and
 * 2 threads, interleaved run by run; medians with spread, and whether the
 * maps are bit-identical. MC_SAMPLES=40000 runs longer studies, where a
 * second thread's fixed cost (its start and the compile of its cold code)
 * weighs less.
 */
import { readFileSync } from 'node:fs';
import { loadavg, availableParallelism } from 'node:os';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept } from '../../core';
import type { StudyInput } from '../../app/report/studies';

const RUNS = Number(process.env.RUNS ?? 7);
const SAMPLES = Number(process.env.MC_SAMPLES ?? 10000);
const { reportProbabilityMap, monteCarloWorkers } = await import('../../app/cli/monte-carlo-workers');
type ThreadTiming = import('../../app/cli/monte-carlo-workers').ThreadTiming;

function stats(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number) => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9) };
}
const fmt = (x: { median: number; p10: number; p90: number }) => `${Math.round(x.median)} ms (${Math.round(x.p10)}-${Math.round(x.p90)})`;

/** This thread's own CPU time in ms (Linux); NaN elsewhere. */
function threadCpuMs(): number {
  try {
    return Number(readFileSync('/proc/thread-self/schedstat', 'utf8').split(' ')[0]) / 1e6;
  } catch {
    return NaN;
  }
}

/** One demo's Monte Carlo on 1 and 2 threads, interleaved; prints its figures and answers the medians. */
async function measure(slug: string): Promise<{ slug: string; oneThread: number; speedUp: number; identical: boolean }> {
  const demo = DEMO_CONCEPTS.find((d) => d.slug === slug)!;
  const parsed = parseConcept(demo.concept);
  if (!parsed.ok) throw new Error(`the ${slug} demo does not parse`);
  const input: StudyInput = { design: parsed.design, concept: demo.concept, evaluation: evaluateDesign(parsed.design), system: 'si', options: { samples: SAMPLES, seed: 20261202 } };

  const reference = (await reportProbabilityMap(input, 1)).map!; // warm-up, and the one-thread map
  const times: Record<number, number[]> = { 1: [], 2: [] };
  // Each thread's own CPU time over a run: on a machine busy with other work, wall time says little, but
  // with two free cores each thread would run its CPU time in wall time, side by side. The estimate:
  // one thread's CPU over the larger of the two threads' CPU (the worker's from its very start), or
  // over half the process's CPU when that is larger (V8's helper threads share the two cores).
  const ownCpu: Record<number, number[]> = { 1: [], 2: [] };
  const cpu: Record<number, number[]> = { 1: [], 2: [] };
  let identical = true;
  // Where the two-thread runs spend their time, per run: the worker's start (asked to code loaded), its
  // design and ranges worked out, its CPU before its first claim, each thread's samples and CPU per
  // 1,000 samples once claiming, and how long this thread waits for the worker after its own last claim.
  const breakdown: Record<string, number[]> = {};
  const note = (key: string, value: number) => Number.isFinite(value) && (breakdown[key] ??= []).push(value);
  for (let r = 0; r < RUNS; r++) {
    for (const workers of r % 2 === 0 ? [1, 2] : [2, 1]) {
      const start = performance.now();
      const mainCpu = threadCpuMs();
      const used = process.cpuUsage(); // every thread of the process
      const timings: ThreadTiming[] = [];
      const { map } = await reportProbabilityMap(input, workers, timings);
      const end = performance.timeOrigin + performance.now();
      times[workers].push(performance.now() - start);
      const mainSpent = threadCpuMs() - mainCpu;
      const main = timings.find((t) => t.thread === 'main');
      const workerCpu = timings.filter((t) => t.thread !== 'main').map((t) => t.cpuAtDone);
      // On two cores the process's CPU, helpers included, takes at least half of it in wall time.
      const processCpu = process.cpuUsage(used);
      ownCpu[workers].push(Math.max(mainSpent, ...workerCpu, (processCpu.user + processCpu.system) / 1000 / 2));
      for (const t of timings.filter((t) => t.thread !== 'main')) {
        note('worker: asked to loaded, wall ms', t.loadedAt - t.askedAt);
        note('worker: design and ranges, wall ms', t.readyAt - t.loadedAt);
        note('worker: CPU before its first claim, ms', t.cpuAtReady);
        note('worker: samples run', t.samples);
        note('worker: claims', t.claims);
        note('worker: CPU per 1,000 samples, ms', (1000 * (t.cpuAtDone - t.cpuAtReady)) / t.samples);
        if (main) note('main: waiting for the worker after its last claim, wall ms', end - main.doneAt);
      }
      if (main) {
        note('main: samples run', main.samples);
        note('main: CPU per 1,000 samples, ms', (1000 * (main.cpuAtDone - main.cpuAtReady)) / main.samples);
        // The same run's two threads side by side, under the same load: steadier than either median alone.
        for (const t of timings.filter((t) => t.thread !== 'main')) {
          note('worker over main, CPU per sample, %', (100 * ((t.cpuAtDone - t.cpuAtReady) / t.samples)) / ((main.cpuAtDone - main.cpuAtReady) / main.samples));
        }
      }
      const spent = process.cpuUsage(used);
      cpu[workers].push((spent.user + spent.system) / 1000);
      // What neither thread ran itself: V8's compiler and collector helpers, Node's own threads. On two
      // cores it takes time from the two threads (a worker's code is compiled again in the worker).
      const others = (spent.user + spent.system) / 1000 - mainSpent - workerCpu.reduce((sum, x) => sum + x, 0);
      note(`${workers === 1 ? '1 thread' : '2 threads'}: CPU of the process's other threads, ms`, others);
      identical &&= Buffer.from(map!.probability.buffer).equals(Buffer.from(reference.probability.buffer)) && JSON.stringify(map!.designPoint) === JSON.stringify(reference.designPoint);
    }
  }
  const one = stats(times[1]);
  const two = stats(times[2]);
  console.log(`Monte Carlo, ${SAMPLES.toLocaleString('en-US')} samples, ${slug} demo, typical ranges; wall time, median (10th-90th percentile) of ${RUNS} interleaved runs`);
  console.log(`  cores ${availableParallelism()}; load average ${loadavg().map((x) => x.toFixed(2)).join(' ')}; threads chosen for this load: ${monteCarloWorkers()}`);
  console.log(`  1 thread    wall ${fmt(one)}   CPU ${fmt(stats(cpu[1]))}`);
  console.log(`  2 threads   wall ${fmt(two)}   CPU ${fmt(stats(cpu[2]))}   speed-up ${(one.median / two.median).toFixed(2)}x`);
  const own1 = stats(ownCpu[1]);
  const own2 = stats(ownCpu[2]);
  if (Number.isFinite(own1.median) && Number.isFinite(own2.median)) {
    console.log(`  estimate for two free cores from each thread's own CPU time: 1 thread ${fmt(own1)}, 2 threads (the busier thread, or half the process's CPU when more) ${fmt(own2)}: ${(own1.median / own2.median).toFixed(2)}x (an estimate, not a measurement: it leaves out waits and the worker's start before its first CPU)`);
  }
  console.log('  where the time goes, per run, median (10th-90th percentile):');
  for (const [key, values] of Object.entries(breakdown)) console.log(`    ${key.padEnd(62)} ${fmt(stats(values)).replace(' ms', '')}`);
  console.log(`  maps bit-identical for the seed on 1 and 2 threads: ${identical ? 'yes' : 'NO'}`);
  return { slug, oneThread: one.median, speedUp: one.median / two.median, identical };
}

// The heaviest demo first (its take-off distance is a root search per wing loading and sample), then the
// report's usual example. A second thread's fixed cost is its start and the optimizing compile of its cold
// code, about 130 ms of CPU on V8's helper threads here (measured with --no-concurrent-recompilation): on a
// run of a third of a second that, not the sampling, sets the speed-up.
const results = [];
for (const slug of ['utility-twin', 'business-jet']) results.push(await measure(slug));
for (const r of results) {
  console.log(
    `Target at least 1.6x with two free cores, ${r.slug} (${Math.round(r.oneThread)} ms on one thread): ${r.speedUp.toFixed(2)}x, ${r.speedUp >= 1.6 ? 'met' : 'not met'} at this load; identical maps ${r.identical ? 'met' : 'NOT met'}`,
  );
}

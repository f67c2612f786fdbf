/**
 * Trade-study speed on the business-jet demo with a range on every assumption
 * that may carry one: boundary bands, the tornado and the requirement costs
 * (target under 50 ms each, as for anything redrawn when the concept changes), and the Monte Carlo of 10,000 samples on a 200 x 200 probability
 * grid (target under 1 s on one core). Median of several runs after a warm-up;
 * wall-clock and process CPU time both printed, since the machine may be
 * shared. Measures only: exits 0.
 *
 *   npx tsx test/bench/studies.ts
 */
// @ts-nocheck

import { DEMO_CONCEPTS, parseConcept } from '../../core/concept';
import { sampleWingLoadings } from '../../core/diagram';
import {
  boundaryBands,
  defaultProbabilityGrid,
  plotRangeOf,
  probabilityMap,
  requirementCosts,
  resolveUncertainty,
  tornado,
  typicalUncertainty,
} from '../../core/studies';

const RUNS = Number(process.env.RUNS ?? 7);

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)];
}

function measure(run: () => unknown): { wall: number; cpu: number; first: number } {
  const coldStart = performance.now();
  run(); // the first, cold call (JIT warm-up) is reported apart
  const first = performance.now() - coldStart;
  const wall: number[] = [];
  const cpu: number[] = [];
  for (let i = 0; i < RUNS; i++) {
    const start = performance.now();
    const usage = process.cpuUsage();
    run();
    const used = process.cpuUsage(usage);
    wall.push(performance.now() - start);
    cpu.push((used.user + used.system) / 1000);
  }
  return { wall: median(wall), cpu: median(cpu), first };
}

const demo = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet');
const parsed = demo ? parseConcept(demo.concept) : null;
if (!parsed || !parsed.ok) {
  console.log('business-jet demo not available; nothing measured');
  process.exit(0);
}
const { design, concept } = parsed;
const block = typicalUncertainty(design, { seed: 20261202, samples: 10000 });
// core/methods.md publishes no range for K1; +/-0.01 is a timing choice so that every listed assumption is ranged.
block.parameters.push({ field: 'aircraft.aero.cdLinear', low: -0.01, high: 0.01, distribution: 'uniform' });
const resolved = resolveUncertainty(block, design, concept);
if (!resolved.ok) {
  console.log(`ranges do not resolve: ${JSON.stringify(resolved.issues)}`);
  process.exit(0);
}
const parameters = resolved.parameters;
const wingLoadings = sampleWingLoadings(plotRangeOf(design), design.diagram.samples);
const grid = defaultProbabilityGrid(design, 200, 200);

console.log(`business-jet demo: ${design.requirements.length} requirements, ${parameters.length} ranged assumptions, median of ${RUNS} runs`);
const rows: Array<[string, { wall: number; cpu: number; first: number }, number]> = [
  [`bands (${wingLoadings.length} wing loadings)`, measure(() => boundaryBands(design, parameters, wingLoadings)), 50],
  [`tornado (${parameters.length} assumptions x 2 ends)`, measure(() => tornado(design, parameters)), 50],
  [`requirement costs (${design.requirements.length} x relaxed, tightened)`, measure(() => requirementCosts(design, { step: 0.1 })), 50],
  [
    'Monte Carlo (10,000 samples, 200 x 200 grid)',
    measure(() => probabilityMap(design, parameters, { seed: block.seed, samples: 10000, grid })),
    1000,
  ],
];
for (const [name, { wall, cpu, first }, target] of rows) {
  const verdict = cpu < target ? 'within target' : 'OVER TARGET';
  console.log(
    `  ${name.padEnd(46)} ${wall.toFixed(1).padStart(7)} ms wall ${cpu.toFixed(1).padStart(7)} ms cpu ` +
      `(first call ${first.toFixed(0)} ms)   target < ${target} ms: ${verdict}`,
  );
}
process.exit(0);

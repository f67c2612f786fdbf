/**
 * Engine benchmark, every figure a median with its spread over repeated runs,
 * timed in CPU milliseconds of this process (the machine may be shared):
 *
 *  1. evaluateDesign per demo at 400 samples beside a floor that does the same
 *     work in the same process, interleaved batch by batch with it. The floor
 *     writes flat, in its own code: every curve at every sample into
 *     Float64Array columns, the envelope, the optimum by the same search (the
 *     samples as coarse grid, low local minima refined on a grid as fine as a
 *     4000-point one, golden section, the tie walks), the margin of every
 *     requirement at the optimum and at the design point, and the sizing at
 *     the closed mass. It calls the engine's own functions for the rest, so
 *     both do that work the same way: each boundary's physics at a wing
 *     loading (boundary.required), the plotted range, the mission closure,
 *     the warnings, the speeds, and segments and Mach at the optimum. It
 *     differs from the engine only in how: no [w, y] tuples, no JSON objects.
 *  2. evaluateDesign at 400, 4,000 and 40,000 samples, to show how the cost grows.
 *
 * Run: npx tsx test/bench/engine.ts. Targets: every demo within 1.5x of the
 * floor; 40,000 samples within 100x of 400. The floor's curves, optimum,
 * margins and closed mass are compared with the evaluation's, so the two stay
 * the same computation.
 */
import { PRELIMINARY_CAUTION } from '../../core/caution';
import { DEMO_CONCEPTS, parseConcept } from '../../core/concept';
import { evaluateDesign, requirementBoundaries, sampleWingLoadings, assumptionWarnings, reportedSpeeds, type RequirementBoundary } from '../../core/diagram';
import { plotRange } from '../../core/diagram/evaluate';
import { requirementInputWarnings, unattainableWarnings } from '../../core/diagram/boundary-warnings';
import { designPointWarnings, optimumWarnings, speedWarnings } from '../../core/diagram/diagram-warnings';
import { compressibilityWarnings } from '../../core/diagram/compressibility-warnings';
import { flightMachAt } from '../../core/diagram/flight-mach';
import type { CurveBoundaryJson, Evaluation, WarningJson } from '../../core/evaluation';
import type { Design } from '../../core/model';
import { missionMass } from '../../core/mission/mass';
import { requirementKind } from '../../core/requirements';
import { G0 } from '../../core/units/factors';

const SAMPLES = 400;
const WARMUP = 200;
const ROUNDS = Number(process.env.ROUNDS ?? 101);
const BATCH = 10;
const GOLDEN = (Math.sqrt(5) - 1) / 2;
const TIE = 1e-9;

type Required = (w: number) => number;

/** The envelope at w: the largest requirement, NaN when any cannot be met (as the engine's). */
function envelopeAt(cs: readonly Required[], w: number): number {
  let top = 0;
  for (let j = 0; j < cs.length; j++) {
    const y = cs[j](w);
    if (!Number.isFinite(y)) return NaN;
    if (j === 0 || y > top) top = y;
  }
  return top;
}

const tie = (y: number): number => y + Math.abs(y) * TIE;

/** The largest w in [from, to] with f(w) <= limit, as the engine's tie walk. */
function walkRight(f: Required, from: number, to: number, limit: number): number {
  const probe = Math.min(to, from * (1 + 1e-4));
  if (!(f(probe) <= limit)) return from;
  if (f(to) <= limit) return to;
  let ok = probe;
  let bad = to;
  while (bad - ok > 1e-9 * bad) {
    const mid = 0.5 * (ok + bad);
    if (f(mid) <= limit) ok = mid;
    else bad = mid;
  }
  return ok;
}

/** The optimum by the engine's search (core/diagram/optimum.ts), written flat: [w, y] into `best`. */
function floorOptimum(cs: readonly Required[], ws: Float64Array, envelope: Float64Array, lo: number, right: number, best: Float64Array): void {
  best[0] = NaN;
  best[1] = Infinity;
  if (!(right >= lo)) return;
  const f = (w: number): number => envelopeAt(cs, w);
  if (cs.length === 0) {
    best[0] = right;
    best[1] = 0;
    return;
  }
  if (right === lo) {
    best[0] = lo;
    best[1] = f(lo);
    return;
  }
  let m = 0;
  while (m < ws.length && ws[m] < right) m++;
  const gw = new Float64Array(m + 1);
  const gy = new Float64Array(m + 1);
  gw.set(ws.subarray(0, m));
  gy.set(envelope.subarray(0, m));
  gw[m] = right;
  gy[m] = f(right);
  const lowest = (ys: Float64Array): number => {
    let at = -1;
    for (let i = 0; i < ys.length; i++) if (ys[i] <= Infinity && (at < 0 || ys[i] <= tie(ys[at]))) at = i;
    return at;
  };
  const first = lowest(gy);
  if (first < 0) return;
  const span = right - lo;
  const band = gy[first] + Math.abs(gy[first]) * 1e-2;
  const candidates: number[] = [];
  for (let i = 0; i < gy.length; i++) {
    const y = gy[i];
    if (!(y <= band)) continue;
    if ((i > 0 ? gy[i - 1] : NaN) < y - Math.abs(y) * TIE) continue;
    if ((i < gy.length - 1 ? gy[i + 1] : NaN) <= tie(y)) continue;
    candidates.push(i);
  }
  candidates.sort((p, q) => gy[p] - gy[q]);
  for (const i of candidates.slice(0, 8)) {
    const a = gw[Math.max(0, i - 1)];
    const b = gw[Math.min(gw.length - 1, i + 1)];
    const n = Math.max(9, Math.ceil(((b - a) * 3999) / span) + 1);
    const fw = new Float64Array(n);
    const fy = new Float64Array(n);
    for (let t = 0; t < n; t++) {
      fw[t] = t === n - 1 ? b : a + ((b - a) * t) / (n - 1);
      fy[t] = f(fw[t]);
    }
    const j = lowest(fy);
    let w = fw[j];
    let y = fy[j];
    // Golden section between the neighbours of the lowest fine point.
    let gl = fw[Math.max(0, j - 1)];
    let gh = fw[Math.min(n - 1, j + 1)];
    let c = gh - GOLDEN * (gh - gl);
    let d = gl + GOLDEN * (gh - gl);
    let fc = f(c);
    let fd = f(d);
    if (!(fc <= Infinity)) fc = Infinity;
    if (!(fd <= Infinity)) fd = Infinity;
    while (gh - gl > 1e-7 * gh) {
      if (fc <= fd) {
        gh = d; d = c; fd = fc; c = gh - GOLDEN * (gh - gl); fc = f(c);
        if (!(fc <= Infinity)) fc = Infinity;
      } else {
        gl = c; c = d; fc = fd; d = gl + GOLDEN * (gh - gl); fd = f(d);
        if (!(fd <= Infinity)) fd = Infinity;
      }
    }
    const goldenW = fc <= fd ? c : d;
    const goldenY = fc <= fd ? fc : fd;
    if (goldenY < y) {
      w = goldenW;
      y = goldenY;
    }
    if (j < n - 1) w = walkRight(f, w, fw[j + 1], tie(y));
    if (!(best[1] <= tie(y)) || (y <= tie(best[1]) && w > best[0])) {
      best[0] = w;
      best[1] = y;
    }
  }
  // The tie rule over the whole span: any grid point right of the best that ties with it wins.
  const limit = tie(best[1]);
  for (let i = gw.length - 1; i >= 0 && gw[i] > best[0]; i--) {
    if (gy[i] <= limit) {
      best[0] = i < gw.length - 1 ? walkRight(f, gw[i], gw[i + 1], limit) : gw[i];
      break;
    }
  }
  best[1] = f(best[0]);
}

/** Margins of every requirement at (w, y) into `margins`, in the design's order; answers how many bind. */
function floorMargins(entries: readonly RequirementBoundary[], w: number, y: number, margins: Float64Array): number {
  let active = 0;
  for (let j = 0; j < entries.length; j++) {
    const b = entries[j].boundary;
    if (b.type === 'limit') {
      const limit = b.wingLoadingMaxPa;
      margins[j] = limit > 0 ? 1 - w / limit : -1;
      if (w >= limit * (1 - 1e-3)) active++;
      continue;
    }
    const stall = b.stallLimitPa;
    const required = b.required(w);
    if (stall !== undefined && stall > 0 && w > stall) margins[j] = 1 - w / stall;
    else {
      const margin = y / required - 1;
      margins[j] = !Number.isFinite(required) || !(required > 0) || !Number.isFinite(margin) ? -1 : margin;
    }
    if (required >= y * (1 - 1e-3)) active++;
  }
  return active;
}

interface FloorOut {
  curves: Float64Array[];
  envelope: Float64Array;
  optimum: Float64Array;
  margins: Float64Array;
  pointMargins: Float64Array;
  /** Wing area, installed power or thrust, per engine, closed take-off mass (NaN without a mission). */
  sizing: Float64Array;
  /** Warnings and speeds, kept so the work is not optimised away. */
  extras: unknown[];
}

/** The same work as evaluateDesign: flat where the engine builds objects, the engine's own functions elsewhere. */
function floor(design: Design, out: FloorOut): void {
  const { aircraft } = design;
  const entries = requirementBoundaries(design);
  const warnings: WarningJson[] = [...assumptionWarnings(design), ...requirementInputWarnings(entries, aircraft)];
  const range = plotRange(design, entries, warnings);
  const ws = sampleWingLoadings(range, design.diagram.samples);
  const n = ws.length;
  const required: Required[] = [];
  let cap = Infinity;
  for (const { boundary } of entries) {
    if (boundary.type === 'limit') cap = Math.min(cap, boundary.wingLoadingMaxPa);
    else required.push(boundary.required);
  }
  const { envelope } = out;
  envelope.fill(-Infinity);
  const curveMet = new Map<string, boolean>();
  let j = 0;
  for (const { boundary } of entries) {
    if (boundary.type !== 'curve') continue;
    const y = out.curves[j++];
    let met = false;
    for (let i = 0; i < n; i++) {
      const v = boundary.required(ws[i]);
      y[i] = v;
      if (!Number.isFinite(v)) envelope[i] = NaN;
      else {
        met = true;
        if (v > envelope[i]) envelope[i] = v;
      }
    }
    curveMet.set(boundary.id, met);
  }
  warnings.push(...unattainableWarnings(entries, aircraft, curveMet, range[0]));
  floorOptimum(required, ws, envelope, range[0], Math.min(cap, range[1]), out.optimum);
  const found = Number.isNaN(out.optimum[0]) ? null : { wingLoadingPa: out.optimum[0], loading: out.optimum[1], unbounded: false };
  if (found) {
    floorMargins(entries, found.wingLoadingPa, found.loading, out.margins);
    for (const entry of entries) {
      out.extras.push(entry.boundary.speedAt?.(found.wingLoadingPa), flightMachAt(entry, found.wingLoadingPa));
      out.extras.push(requirementKind(entry.requirement.kind).segments?.(entry.requirement, aircraft, found.wingLoadingPa, found.loading));
    }
  }
  warnings.push(...optimumWarnings(found, range, required.length, entries.length));
  const point = design.designPoint;
  if (point) {
    floorMargins(entries, point.wingLoadingPa, point.loading, out.pointMargins);
    warnings.push(...designPointWarnings(point.wingLoadingPa, range));
  }
  warnings.push(...compressibilityWarnings(entries, design, found?.wingLoadingPa ?? point?.wingLoadingPa ?? 0.5 * (range[0] + range[1])));
  warnings.push(...speedWarnings(design));
  const w = point ? point.wingLoadingPa : found ? out.optimum[0] : 0.5 * (range[0] + range[1]);
  const y = point ? point.loading : out.optimum[1];
  out.extras.push(reportedSpeeds(aircraft, w, design.requirements));
  let massKg = aircraft.takeoffMassKg;
  out.sizing[3] = NaN;
  if (design.mission) {
    const closed = missionMass(design.mission, aircraft, w);
    if (closed.ok) massKg = out.sizing[3] = closed.mass.takeoff;
    out.extras.push(closed);
  }
  const weight = massKg * G0;
  out.sizing[0] = weight / w;
  out.sizing[1] = y * weight;
  out.sizing[2] = out.sizing[1] / aircraft.propulsion.engines;
  out.extras.push(warnings);
  if (out.extras.length > 1000) out.extras.length = 0;
}

/** Median and spread (10th to 90th percentile) of a list. */
function stats(xs: number[]): { median: number; p10: number; p90: number } {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number): number => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9) };
}

/** CPU time of this process [ms]. */
function cpuMs(): number {
  const u = process.cpuUsage();
  return (u.user + u.system) / 1000;
}

/** CPU time of one call [ms] in each of `rounds` rounds, the two functions interleaved batch by batch (order alternating). */
function interleaved(f: () => void, g: () => void, rounds = ROUNDS, batch = BATCH): { f: number[]; g: number[]; ratio: number[] } {
  const tf: number[] = [];
  const tg: number[] = [];
  const ratio: number[] = [];
  const time = (h: () => void): number => {
    const start = cpuMs();
    for (let b = 0; b < batch; b++) h();
    return (cpuMs() - start) / batch;
  };
  for (let r = 0; r < rounds; r++) {
    let a: number;
    let b: number;
    if (r % 2 === 0) {
      a = time(f);
      b = time(g);
    } else {
      b = time(g);
      a = time(f);
    }
    tf.push(a);
    tg.push(b);
    if (b > 0) ratio.push(a / b);
  }
  return { f: tf, g: tg, ratio };
}

const fmt = (x: { median: number; p10: number; p90: number }, d = 3): string => `${x.median.toFixed(d)} (${x.p10.toFixed(d)}-${x.p90.toFixed(d)})`;

function designAt(design: Design, samples: number): Design {
  return { ...design, diagram: { ...design.diagram, samples } };
}

interface Prepared {
  slug: string;
  design: Design;
  evaluation: Evaluation;
  out: FloorOut;
}

function prepare(slug: string, design: Design): Prepared {
  const evaluation = evaluateDesign(design);
  const curves = evaluation.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
  const n = curves[0]?.points.length ?? design.diagram.samples;
  const out: FloorOut = {
    curves: curves.map(() => new Float64Array(n)),
    envelope: new Float64Array(n),
    optimum: new Float64Array(2),
    margins: new Float64Array(evaluation.boundaries.length),
    pointMargins: new Float64Array(evaluation.boundaries.length),
    sizing: new Float64Array(4),
    extras: [],
  };
  return { slug, design, evaluation, out };
}

const relative = (a: number, b: number): number => (a === b ? 0 : Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b)));

/** Largest relative difference between the floor's results and the evaluation's (curves, optimum, margins, closed mass); 1 where one has a value the other lacks. */
function agreement(p: Prepared): { curves: number; optimum: number; margins: number; mass: number } {
  floor(p.design, p.out);
  const { evaluation: e, out } = p;
  let curves = 0;
  e.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b).forEach((curve, j) =>
    curve.points.forEach(([, y], i) => {
      const f = out.curves[j][i];
      curves = Math.max(curves, y === null ? (Number.isFinite(f) ? 1 : 0) : relative(f, y));
    }),
  );
  const opt = e.optimum;
  const optimum = opt ? relative(out.optimum[0], opt.wingLoading) : Number.isNaN(out.optimum[0]) ? 0 : 1;
  let margins = 0;
  opt?.margins.forEach((m, j) => (margins = Math.max(margins, relative(out.margins[j], m.margin))));
  e.designPoint?.margins.forEach((m, j) => (margins = Math.max(margins, relative(out.pointMargins[j], m.margin))));
  const mass = e.mass ? relative(out.sizing[3], e.mass.takeoff) : Number.isNaN(out.sizing[3]) ? 0 : 1;
  return { curves, optimum, margins, mass };
}

const prepared: Prepared[] = [];
for (const demo of DEMO_CONCEPTS) {
  const parsed = parseConcept(demo.concept);
  if (!parsed.ok) {
    console.log(`${demo.slug}: the demo does not parse (${parsed.issues.map((i) => `${i.path}: ${i.message}`).join('; ')})`);
    continue;
  }
  prepared.push(prepare(demo.slug, designAt(parsed.design, SAMPLES)));
}

console.log(`Engine: evaluateDesign against a floor doing the same work, at ${SAMPLES} samples; CPU ms per call, median (10th-90th percentile) of ${ROUNDS} interleaved rounds of ${BATCH}, after ${WARMUP} warm-up calls each`);
console.log('The floor writes the columns, envelope, optimum search, margins and sizing flat; it calls the engine\'s own functions for each boundary\'s physics per wing loading, the plotted range, the mission closure, the warnings, the speeds, and segments and Mach at the optimum.');
console.log(`Node ${process.version}; load average ${(await import('node:os')).loadavg().map((x) => x.toFixed(2)).join(' ')}`);
console.log('');
console.log(`${'demo'.padEnd(14)}${'curves'.padStart(7)}  ${'evaluate ms'.padEnd(24)}${'floor ms'.padEnd(24)}${'ratio'.padEnd(18)}agreement (curves, optimum, margins, mass)`);
let worst = 0;
let disagrees = 0;
for (const p of prepared) {
  const { design, out } = p;
  for (let i = 0; i < WARMUP; i++) {
    evaluateDesign(design);
    floor(design, out);
  }
  const t = interleaved(() => void evaluateDesign(design), () => floor(design, out));
  const a = agreement(p);
  if (Math.max(a.curves, a.optimum, a.margins, a.mass) > 1e-6) disagrees++;
  const ratio = stats(t.ratio);
  worst = Math.max(worst, ratio.median);
  console.log(
    `${p.slug.padEnd(14)}${String(out.curves.length).padStart(7)}  ${fmt(stats(t.f)).padEnd(24)}${fmt(stats(t.g)).padEnd(24)}${fmt(ratio, 2).padEnd(18)}${[a.curves, a.optimum, a.margins, a.mass].map((x) => x.toExponential(1)).join(', ')}`,
  );
}
console.log(`Worst median ratio to the floor: ${worst.toFixed(2)}x; target within 1.5x: ${worst <= 1.5 ? 'met' : 'NOT met'}`);
console.log(disagrees === 0 ? 'The floor agrees with the evaluation within 1e-6 for every demo.' : `The floor DISAGREES with the evaluation (above 1e-6) for ${disagrees} demo(s): the ratio compares different work.`);

// Growth with the sample count: the demo with the most curves at 400, 4,000 and 40,000 samples, each beside its floor.
console.log('');
const COUNTS = [400, 4000, 40000];
const largest = prepared.reduce((big, p) => (p.out.curves.length > big.out.curves.length ? p : big), prepared[0]);
console.log(`Growth: ${largest.slug} (${largest.out.curves.length} curves) at ${COUNTS.join(', ')} samples; CPU ms per call, median (10th-90th percentile), interleaved with the floor`);
const perCount: number[] = [];
for (const count of COUNTS) {
  const p = prepare(largest.slug, designAt(largest.design, count));
  const rounds = Math.max(11, Math.round((ROUNDS * 400) / count));
  const batch = count >= 40000 ? 1 : count >= 4000 ? 2 : BATCH;
  for (let i = 0; i < Math.max(5, WARMUP / (count / 400)); i++) {
    evaluateDesign(p.design);
    floor(p.design, p.out);
  }
  const t = interleaved(() => void evaluateDesign(p.design), () => floor(p.design, p.out), rounds, batch);
  const e = stats(t.f);
  perCount.push(e.median);
  console.log(`  ${String(count).padStart(6)} samples: evaluate ${fmt(e)} ms, floor ${fmt(stats(t.g))} ms, ratio ${fmt(stats(t.ratio), 2)}  (${rounds} rounds of ${batch})`);
}
const growth = perCount[2] / perCount[0];
console.log(`40,000 samples cost ${growth.toFixed(1)}x 400 samples (100x more samples); target within 100x: ${growth <= 100 ? 'met' : 'NOT met'}`);
console.log(`Timings of preliminary-sizing arithmetic. ${PRELIMINARY_CAUTION}`);

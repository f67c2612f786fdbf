/**
 * Engine benchmark, every figure a median with its spread over repeated runs:
 *
 *  1. evaluateDesign per demo at 400 samples beside a hand-written floor that
 *     does the same work in the same process, interleaved batch by batch with
 *     it: every curve at every sample into Float64Array columns, the envelope,
 *     the optimum by the same search (the samples as coarse grid, low local
 *     minima refined on a grid as fine as a 4000-point one, golden section,
 *     the tie walk), the margin of every requirement at the optimum and at the
 *     design point, and the sizing. It differs only in how: flat numbers
 *     instead of boundary objects and closures, no [w, y] tuples, no JSON
 *     objects or warnings. The wing-loading limits (stall, landing) are taken
 *     from the evaluation once, before timing: two divisions per run.
 *  2. evaluateDesign at 400, 4,000 and 40,000 samples, to show how the cost grows.
 *
 * Run: npx tsx test/bench/engine.ts. Targets: every demo within 1.5x of the
 * floor; 40,000 samples within 100x of 400. The floor's curves and optimum are
 * compared with the evaluation's, so the two stay the same computation.
 */
// @ts-nocheck

import { DEMO_CONCEPTS, parseConcept } from '../../core/concept';
import { atmosphere } from '../../core/atmosphere';
import { evaluateDesign } from '../../core/diagram';
import type { CurveBoundaryJson, Evaluation, LimitBoundaryJson } from '../../core/evaluation';
import type { Design, Requirement } from '../../core/model';
import { G0 } from '../../core/units/factors';

const SAMPLES = 400;
const WARMUP = 200;
const ROUNDS = Number(process.env.ROUNDS ?? 101);
const BATCH = 10;
const GOLDEN = (Math.sqrt(5) - 1) / 2;

/** alpha for the floor, written out per kind (core/methods.md section 5). */
function alphaOf(design: Design, r: Requirement): number {
  const p = design.aircraft.propulsion;
  const sigma = atmosphere(r.altitudeM, r.temperatureOffsetK).sigma;
  const gagg = (s: number): number => s - (1 - s) / 7.55;
  const lapse =
    p.kind === 'piston' ? gagg(sigma)
    : p.kind === 'turbocharged-piston' ? (() => { const c = atmosphere(p.criticalAltitudeM ?? 0).sigma; return sigma >= c ? 1 : gagg(sigma / c); })()
    : p.kind === 'electric' ? 1
    : Math.pow(sigma, p.lapseExponent);
  return lapse * r.powerSetting;
}

/** One curve's constants, worked out once per run as the engine's boundaries are. */
interface FloorCurve {
  r: Requirement;
  rho: number;
  alpha: number;
  cd0: number;
  k: number;
  clMax: number;
  cdg: number;
  fN: number;
  nLoad: number;
  rate: number;
}

function floorCurves(design: Design): FloorCurve[] {
  const { aircraft } = design;
  const out: FloorCurve[] = [];
  for (const r of design.requirements) {
    if (!r.enabled || r.kind === 'stall' || r.kind === 'landing-ground-roll') continue;
    const conf = aircraft.configurations[r.configuration] ?? aircraft.configurations.clean;
    const k = 1 / (Math.PI * conf.oswaldEfficiency * aircraft.aspectRatio);
    out.push({
      r,
      rho: atmosphere(r.altitudeM, r.temperatureOffsetK).densityKgM3,
      alpha: alphaOf(design, r),
      cd0: conf.cd0,
      k,
      clMax: conf.clMax,
      cdg: r.kind === 'takeoff-ground-roll' ? conf.cd0 + aircraft.cdLinear * r.clGroundRun + k * r.clGroundRun * r.clGroundRun : 0,
      fN: r.kind === 'climb-gradient' ? aircraft.propulsion.engines / (aircraft.propulsion.engines - r.enginesInoperative) : 1,
      nLoad: r.kind === 'sustained-turn' ? r.loadFactor : 1,
      rate: r.kind === 'climb-rate' || r.kind === 'ceiling' ? r.rateMps : 0,
    });
  }
  return out;
}

/** The loading one curve requires at wing loading w (NaN where it cannot be met). */
function curveAt(c: FloorCurve, w: number, prop: boolean, k1: number): number {
  const { r, rho, alpha, cd0, k, clMax } = c;
  if (r.kind === 'stall' || r.kind === 'landing-ground-roll') return NaN; // limits, never curves
  const b = r.massFraction;
  const eta = r.propellerEfficiency;
  const bw = b * w;
  if (r.kind === 'takeoff-ground-roll') {
    const v = r.liftoffSpeedFactor * Math.sqrt((2 * bw) / (rho * clMax));
    const qm = 0.5 * rho * 0.49 * v * v;
    const t = (b / alpha) * ((v * v) / (2 * G0 * r.distanceM) + (qm * c.cdg) / bw + r.rollingFriction * (1 - (qm * r.clGroundRun) / bw));
    return prop ? (t * 0.7 * v) / eta : t;
  }
  const rate = c.rate;
  let v: number;
  if (r.kind === 'cruise' || r.kind === 'sustained-turn') v = r.speedMps;
  else if (r.kind === 'climb-gradient') v = r.speedFactor * Math.sqrt((2 * bw) / (rho * clMax));
  else if (r.kind === 'climb-rate' && r.speedMps !== undefined) v = r.speedMps;
  else {
    const a4 = (rho * cd0) / (2 * bw);
    const b4 = (2 * k * bw) / rho;
    if (prop) v = Math.sqrt((-k1 + Math.sqrt(k1 * k1 + 12 * a4 * b4)) / (6 * a4));
    else {
      v = Math.max(1.189207115002721 * Math.sqrt(Math.sqrt(b4 / a4)), Math.cbrt(Math.max(rate, 0) / a4));
      for (let it = 0; it < 50; it++) {
        const v3 = v * v * v;
        const step = (2 * a4 * v3 * v - rate * v - 2 * b4) / (8 * a4 * v3 - rate);
        v -= step;
        if (Math.abs(step) <= 1e-12 * v) break;
      }
    }
    v = Math.max(v, ('minimumSpeedFactor' in r ? r.minimumSpeedFactor : 1.2) * Math.sqrt((2 * bw) / (rho * clMax)));
  }
  const q = 0.5 * rho * v * v;
  const cl = (c.nLoad * bw) / q;
  const ps = r.kind === 'climb-gradient' ? r.gradient * v : rate;
  const t = cl > clMax || !(alpha > 0) ? NaN : c.fN * (b / alpha) * ((q * cd0) / bw + k1 * c.nLoad + k * c.nLoad * cl + ps / v);
  return prop ? (t * v) / eta : t;
}

/** The envelope at w: the largest requirement, NaN when any cannot be met (as the engine's). */
function envelopeAt(cs: FloorCurve[], w: number, prop: boolean, k1: number): number {
  let top = 0;
  for (let j = 0; j < cs.length; j++) {
    const y = curveAt(cs[j], w, prop, k1);
    if (!Number.isFinite(y)) return NaN;
    if (j === 0 || y > top) top = y;
  }
  return top;
}

const tie = (y: number): number => y + Math.abs(y) * 1e-9;

/** The optimum by the engine's search (core/diagram/optimum.ts), written flat: [w, y] into `best`. */
function floorOptimum(cs: FloorCurve[], prop: boolean, k1: number, ws: Float64Array, envelope: Float64Array, right: number, best: Float64Array): void {
  const f = (w: number): number => envelopeAt(cs, w, prop, k1);
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
  best[0] = NaN;
  best[1] = Infinity;
  if (first < 0) return;
  const span = right - ws[0];
  const band = gy[first] + Math.abs(gy[first]) * 1e-2;
  const candidates: number[] = [];
  for (let i = 0; i < gy.length; i++) {
    const y = gy[i];
    if (!(y <= band)) continue;
    if ((i > 0 ? gy[i - 1] : NaN) < y - Math.abs(y) * 1e-9) continue;
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
    let lo = fw[Math.max(0, j - 1)];
    let hi = fw[Math.min(n - 1, j + 1)];
    let c = hi - GOLDEN * (hi - lo);
    let d = lo + GOLDEN * (hi - lo);
    let fc = f(c);
    let fd = f(d);
    if (!(fc <= Infinity)) fc = Infinity;
    if (!(fd <= Infinity)) fd = Infinity;
    while (hi - lo > 1e-7 * hi) {
      if (fc <= fd) {
        hi = d; d = c; fd = fc; c = hi - GOLDEN * (hi - lo); fc = f(c);
        if (!(fc <= Infinity)) fc = Infinity;
      } else {
        lo = c; c = d; fc = fd; d = lo + GOLDEN * (hi - lo); fd = f(d);
        if (!(fd <= Infinity)) fd = Infinity;
      }
    }
    const [goldenW, goldenY] = fc <= fd ? [c, fc] : [d, fd];
    if (goldenY < y) [w, y] = [goldenW, goldenY];
    // The tie walk to the right.
    if (j < n - 1) {
      const limit = tie(y);
      const to = fw[j + 1];
      const probe = Math.min(to, w * (1 + 1e-4));
      if (f(probe) <= limit) {
        if (f(to) <= limit) w = to;
        else {
          let ok = probe;
          let bad = to;
          while (bad - ok > 1e-9 * bad) {
            const mid = 0.5 * (ok + bad);
            if (f(mid) <= limit) ok = mid;
            else bad = mid;
          }
          w = ok;
        }
      }
    }
    if (!(best[1] <= tie(y)) || (y <= tie(best[1]) && w > best[0])) {
      best[0] = w;
      best[1] = y;
    }
  }
  best[1] = f(best[0]);
}

/** Margins of every requirement at (w, y) into `margins` (curves, then limits); answers how many bind. */
function floorMargins(cs: FloorCurve[], limits: Float64Array, prop: boolean, k1: number, w: number, y: number, margins: Float64Array): number {
  let active = 0;
  for (let j = 0; j < cs.length; j++) {
    const required = curveAt(cs[j], w, prop, k1);
    margins[j] = !Number.isFinite(required) ? -1 : required <= 0 ? 1 : y / required - 1;
    if (required >= y * (1 - 1e-3)) active++;
  }
  for (let j = 0; j < limits.length; j++) {
    margins[cs.length + j] = limits[j] > 0 ? 1 - w / limits[j] : -1;
    if (w >= limits[j] * (1 - 1e-3)) active++;
  }
  return active;
}

interface FloorOut {
  curves: Float64Array[];
  envelope: Float64Array;
  optimum: Float64Array;
  margins: Float64Array;
  sizing: Float64Array;
}

/** The same work as evaluateDesign, as flat as it can be written. */
function floor(design: Design, ws: Float64Array, limits: Float64Array, rangeMax: number, out: FloorOut): void {
  const { aircraft } = design;
  const prop = aircraft.propulsion.kind !== 'turbofan';
  const k1 = aircraft.cdLinear;
  const cs = floorCurves(design);
  const n = ws.length;
  const { envelope } = out;
  envelope.fill(-Infinity);
  for (let j = 0; j < cs.length; j++) {
    const y = out.curves[j];
    for (let i = 0; i < n; i++) {
      const v = curveAt(cs[j], ws[i], prop, k1);
      y[i] = v;
      if (!Number.isFinite(v)) envelope[i] = NaN;
      else if (v > envelope[i]) envelope[i] = v;
    }
  }
  let cap = Infinity;
  for (let j = 0; j < limits.length; j++) cap = Math.min(cap, limits[j]);
  floorOptimum(cs, prop, k1, ws, envelope, Math.min(cap, rangeMax), out.optimum);
  floorMargins(cs, limits, prop, k1, out.optimum[0], out.optimum[1], out.margins);
  const point = design.designPoint;
  if (point) floorMargins(cs, limits, prop, k1, point.wingLoadingPa, point.loading, out.margins);
  const w = point ? point.wingLoadingPa : out.optimum[0];
  const y = point ? point.loading : out.optimum[1];
  const weight = aircraft.takeoffMassKg * G0;
  out.sizing[0] = weight / w;
  out.sizing[1] = y * weight;
  out.sizing[2] = out.sizing[1] / aircraft.propulsion.engines;
}

/** Median and spread (10th to 90th percentile) of a list. */
function stats(xs: number[]): { median: number; p10: number; p90: number } {
  const s = [...xs].sort((a, b) => a - b);
  const at = (q: number): number => s[Math.min(s.length - 1, Math.floor(q * s.length))];
  return { median: at(0.5), p10: at(0.1), p90: at(0.9) };
}

/** Time of one call [ms] in each of ROUNDS rounds, the two functions interleaved batch by batch (order alternating). */
function interleaved(f: () => void, g: () => void, rounds = ROUNDS, batch = BATCH): { f: number[]; g: number[]; ratio: number[] } {
  const tf: number[] = [];
  const tg: number[] = [];
  const ratio: number[] = [];
  const time = (h: () => void): number => {
    const start = performance.now();
    for (let b = 0; b < batch; b++) h();
    return (performance.now() - start) / batch;
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
    ratio.push(a / b);
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
  ws: Float64Array;
  limits: Float64Array;
  rangeMax: number;
  out: FloorOut;
}

function prepare(slug: string, design: Design): Prepared {
  const evaluation = evaluateDesign(design);
  const curves = evaluation.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
  const limitJson = evaluation.boundaries.filter((b): b is LimitBoundaryJson => 'wingLoadingMax' in b);
  const ws = Float64Array.from(curves[0]?.points.map((p) => p[0]) ?? []);
  const out: FloorOut = {
    curves: curves.map(() => new Float64Array(ws.length)),
    envelope: new Float64Array(ws.length),
    optimum: new Float64Array(2),
    margins: new Float64Array(evaluation.boundaries.length),
    sizing: new Float64Array(3),
  };
  return { slug, design, evaluation, ws, limits: Float64Array.from(limitJson.map((l) => l.wingLoadingMax)), rangeMax: ws[ws.length - 1], out };
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

console.log(`Engine: evaluateDesign against a floor doing the same work, at ${SAMPLES} samples; ms per call, median (10th-90th percentile) of ${ROUNDS} interleaved rounds of ${BATCH}, after ${WARMUP} warm-up calls each`);
console.log(`Node ${process.version}; load average ${(await import('node:os')).loadavg().map((x) => x.toFixed(2)).join(' ')}`);
console.log('');
console.log(`${'demo'.padEnd(14)}${'curves'.padStart(7)}  ${'evaluate ms'.padEnd(24)}${'floor ms'.padEnd(24)}${'ratio'.padEnd(18)}agreement (curves, optimum)`);
let worst = 0;
for (const p of prepared) {
  const { design, ws, limits, rangeMax, out } = p;
  for (let i = 0; i < WARMUP; i++) {
    evaluateDesign(design);
    floor(design, ws, limits, rangeMax, out);
  }
  const t = interleaved(() => void evaluateDesign(design), () => floor(design, ws, limits, rangeMax, out));
  // The floor computes what the engine does: same curves, same optimum.
  let curveAgreement = 0;
  p.evaluation.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b).forEach((curve, j) =>
    curve.points.forEach(([, y], i) => {
      const f = out.curves[j][i];
      if (y === null) curveAgreement = Math.max(curveAgreement, Number.isNaN(f) ? 0 : 1);
      else curveAgreement = Math.max(curveAgreement, Math.abs(f - y) / Math.abs(y));
    }),
  );
  const opt = p.evaluation.optimum;
  const optimumAgreement = opt ? Math.abs(out.optimum[0] - opt.wingLoading) / opt.wingLoading : Number.isNaN(out.optimum[0]) ? 0 : 1;
  const ratio = stats(t.ratio);
  worst = Math.max(worst, ratio.median);
  console.log(
    `${p.slug.padEnd(14)}${String(out.curves.length).padStart(7)}  ${fmt(stats(t.f)).padEnd(24)}${fmt(stats(t.g)).padEnd(24)}${fmt(ratio, 2).padEnd(18)}${curveAgreement.toExponential(1)}, ${optimumAgreement.toExponential(1)}`,
  );
}
console.log(`Worst median ratio to the floor: ${worst.toFixed(2)}x; target within 1.5x: ${worst <= 1.5 ? 'met' : 'NOT met'}`);

// Growth with the sample count: the largest demo at 400, 4,000 and 40,000 samples, each beside its floor.
console.log('');
const COUNTS = [400, 4000, 40000];
const largest = prepared.reduce((big, p) => (p.out.curves.length > big.out.curves.length ? p : big), prepared[0]);
console.log(`Growth: ${largest.slug} (${largest.out.curves.length} curves) at ${COUNTS.join(', ')} samples; ms per call, median (10th-90th percentile), interleaved with the floor`);
const perCount: number[] = [];
for (const count of COUNTS) {
  const p = prepare(largest.slug, designAt(largest.design, count));
  const rounds = Math.max(11, Math.round((ROUNDS * 400) / count));
  const batch = count >= 40000 ? 1 : count >= 4000 ? 2 : BATCH;
  for (let i = 0; i < Math.max(5, WARMUP / (count / 400)); i++) {
    evaluateDesign(p.design);
    floor(p.design, p.ws, p.limits, p.rangeMax, p.out);
  }
  const t = interleaved(() => void evaluateDesign(p.design), () => floor(p.design, p.ws, p.limits, p.rangeMax, p.out), rounds, batch);
  const e = stats(t.f);
  perCount.push(e.median);
  console.log(`  ${String(count).padStart(6)} samples: evaluate ${fmt(e)} ms, floor ${fmt(stats(t.g))} ms, ratio ${fmt(stats(t.ratio), 2)}  (${rounds} rounds of ${batch})`);
}
const growth = perCount[2] / perCount[0];
console.log(`40,000 samples cost ${growth.toFixed(1)}x 400 samples (100x more samples); target within 100x: ${growth <= 100 ? 'met' : 'NOT met'}`);
console.log('Timings of preliminary-sizing arithmetic: certification requirements come from the applicable authority, and final numbers need licensed engineering review.');

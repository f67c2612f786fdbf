/**
 * Engine benchmark: median time of evaluateDesign per demo at 400 samples,
 * beside a hand-written Float64Array floor that evaluates the same formulas
 * (every curve at every sample, then the envelope) with no closures, no
 * objects and no search, in the same run. Run: npx tsx test/bench/engine.ts
 *
 * Targets: under 1 ms median for the largest demo; within 10x of the floor.
 * The floor's curves are also compared with the evaluation's points, so the
 * two stay the same computation.
 */
import { DEMO_CONCEPTS, parseConcept } from '../../core/concept';
import { atmosphere, RHO0 } from '../../core/atmosphere';
import { evaluateDesign } from '../../core/diagram';
import type { CurveBoundaryJson } from '../../core/evaluation';
import type { Design, Requirement } from '../../core/model';
import { G0 } from '../../core/units/factors';

const SAMPLES = 400;
const WARMUP = 300;
const ROUNDS = 201;
const BATCH = 10;

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

/** Every curve at every sample into Float64Arrays, then the envelope: the least work the diagram needs. */
function floor(design: Design, ws: Float64Array, out: Float64Array[], envelope: Float64Array): void {
  const { aircraft } = design;
  const prop = aircraft.propulsion.kind !== 'turbofan';
  const n = ws.length;
  let c = 0;
  for (const r of design.requirements) {
    if (!r.enabled || r.kind === 'stall' || r.kind === 'landing-ground-roll') continue;
    const conf = aircraft.configurations[r.configuration] ?? aircraft.configurations.clean;
    const rho = atmosphere(r.altitudeM, r.temperatureOffsetK).densityKgM3;
    const alpha = alphaOf(design, r);
    const b = r.massFraction;
    const cd0 = conf.cd0;
    const k = 1 / (Math.PI * conf.oswaldEfficiency * aircraft.aspectRatio);
    const k1 = aircraft.cdLinear;
    const clMax = conf.clMax;
    const eta = r.propellerEfficiency;
    const y = out[c++];
    if (r.kind === 'takeoff-ground-roll') {
      const cdg = cd0 + k1 * r.clGroundRun + k * r.clGroundRun * r.clGroundRun;
      for (let i = 0; i < n; i++) {
        const bw = b * ws[i];
        const v = r.liftoffSpeedFactor * Math.sqrt((2 * bw) / (rho * clMax));
        const qm = 0.5 * rho * 0.49 * v * v;
        const t = (b / alpha) * ((v * v) / (2 * G0 * r.distanceM) + (qm * cdg) / bw + r.rollingFriction * (1 - (qm * r.clGroundRun) / bw));
        y[i] = prop ? (t * 0.7 * v) / eta : t;
      }
      continue;
    }
    const fN = r.kind === 'climb-gradient' ? aircraft.propulsion.engines / (aircraft.propulsion.engines - r.enginesInoperative) : 1;
    const nLoad = r.kind === 'sustained-turn' ? r.loadFactor : 1;
    const rate = r.kind === 'climb-rate' || r.kind === 'ceiling' ? r.rateMps : 0;
    for (let i = 0; i < n; i++) {
      const bw = b * ws[i];
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
      const cl = (nLoad * bw) / q;
      const ps = r.kind === 'climb-gradient' ? r.gradient * v : rate;
      const t = cl > clMax || !(alpha > 0) ? NaN : fN * (b / alpha) * ((q * cd0) / bw + k1 * nLoad + k * nLoad * cl + ps / v);
      y[i] = prop ? (t * v) / eta : t;
    }
  }
  envelope.fill(-Infinity);
  for (let j = 0; j < c; j++) {
    const y = out[j];
    for (let i = 0; i < n; i++) if (!(y[i] <= envelope[i])) envelope[i] = y[i];
  }
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

/** Median time of one call [ms], timed in batches so the clock's resolution does not dominate. */
function timeIt(f: () => void): number {
  const times: number[] = [];
  for (let r = 0; r < ROUNDS; r++) {
    const start = performance.now();
    for (let b = 0; b < BATCH; b++) f();
    times.push((performance.now() - start) / BATCH);
  }
  return median(times);
}

interface Row {
  demo: string;
  requirements: number;
  curves: number;
  evaluateMs: number;
  floorMs: number;
  agreement: number;
}

const rows: Row[] = [];
for (const demo of DEMO_CONCEPTS) {
  const parsed = parseConcept(demo.concept);
  if (!parsed.ok) {
    console.log(`${demo.slug}: the demo does not parse (${parsed.issues.map((i) => `${i.path}: ${i.message}`).join('; ')})`);
    continue;
  }
  const design: Design = { ...parsed.design, diagram: { ...parsed.design.diagram, samples: SAMPLES } };
  const evaluation = evaluateDesign(design);
  const curves = evaluation.boundaries.filter((b): b is CurveBoundaryJson => 'points' in b);
  const ws = Float64Array.from(curves[0]?.points.map((p) => p[0]) ?? []);
  const out = curves.map(() => new Float64Array(ws.length));
  const envelope = new Float64Array(ws.length);

  for (let i = 0; i < WARMUP; i++) {
    evaluateDesign(design);
    floor(design, ws, out, envelope);
  }
  // Interleaved, so both see the same machine load.
  const evaluateMs = timeIt(() => void evaluateDesign(design));
  const floorMs = timeIt(() => floor(design, ws, out, envelope));

  let agreement = 0;
  curves.forEach((curve, j) =>
    curve.points.forEach(([, y], i) => {
      const f = out[j][i];
      if (y === null) agreement = Math.max(agreement, Number.isNaN(f) ? 0 : 1);
      else agreement = Math.max(agreement, Math.abs(f - y) / Math.abs(y));
    }),
  );
  rows.push({ demo: demo.slug, requirements: design.requirements.length, curves: curves.length, evaluateMs, floorMs, agreement });
}

const pad = (s: string, n: number): string => s.padEnd(n);
const num = (x: number, d: number): string => x.toFixed(d).padStart(10);
console.log(`Engine: evaluateDesign at ${SAMPLES} samples, median of ${ROUNDS} batches of ${BATCH} (after ${WARMUP} warm-up runs)`);
console.log(`Density at sea level ${RHO0.toFixed(4)} kg/m^3; Node ${process.version}`);
console.log('');
console.log(`${pad('demo', 16)}${pad('reqs', 6)}${pad('curves', 8)}${'evaluate ms'.padStart(12)}${'floor ms'.padStart(10)}${'ratio'.padStart(8)}  curves agree to`);
for (const r of rows) {
  console.log(
    `${pad(r.demo, 16)}${pad(String(r.requirements), 6)}${pad(String(r.curves), 8)}${num(r.evaluateMs, 4).padStart(12)}${num(r.floorMs, 4)}${num(r.evaluateMs / r.floorMs, 1).slice(2).padStart(8)}  ${r.agreement.toExponential(1)}`,
  );
}
const largest = rows.reduce<Row | undefined>((big, r) => (!big || r.requirements * r.curves > big.requirements * big.curves ? r : big), undefined);
const slowest = rows.reduce<Row | undefined>((s, r) => (!s || r.evaluateMs > s.evaluateMs ? r : s), undefined);
const worstRatio = Math.max(...rows.map((r) => r.evaluateMs / r.floorMs));
console.log('');
if (largest) console.log(`Largest demo (${largest.demo}): ${largest.evaluateMs.toFixed(3)} ms median; target under 1 ms: ${largest.evaluateMs < 1 ? 'met' : 'NOT met'}`);
if (slowest) console.log(`Slowest demo (${slowest.demo}): ${slowest.evaluateMs.toFixed(3)} ms median`);
console.log(`Worst ratio to the floor: ${worstRatio.toFixed(1)}x; target within 10x: ${worstRatio <= 10 ? 'met' : 'NOT met'}`);
console.log('The floor draws curves only; evaluateDesign also searches the optimum, margins, speeds, sizing and warnings and builds the JSON.');
console.log('Timings of preliminary-sizing arithmetic: certification requirements come from the applicable authority, and final numbers need licensed engineering review.');

/**
 * The design point of least power or thrust (core/methods.md section 7):
 * w* = argmin E(w) on (w_lo, w_lim], w_lim = min(limits, plot maximum);
 * ties (relative 1e-9) go to the largest wing loading.
 */
// @ts-nocheck
function stryNS_9fa48() {
  var g = typeof globalThis === 'object' && globalThis && globalThis.Math === Math && globalThis || new Function("return this")();
  var ns = g.__stryker__ || (g.__stryker__ = {});
  if (ns.activeMutant === undefined && g.process && g.process.env && g.process.env.__STRYKER_ACTIVE_MUTANT__) {
    ns.activeMutant = g.process.env.__STRYKER_ACTIVE_MUTANT__;
  }
  function retrieveNS() {
    return ns;
  }
  stryNS_9fa48 = retrieveNS;
  return retrieveNS();
}
stryNS_9fa48();
function stryCov_9fa48() {
  var ns = stryNS_9fa48();
  var cov = ns.mutantCoverage || (ns.mutantCoverage = {
    static: {},
    perTest: {}
  });
  function cover() {
    var c = cov.static;
    if (ns.currentTestId) {
      c = cov.perTest[ns.currentTestId] = cov.perTest[ns.currentTestId] || {};
    }
    var a = arguments;
    for (var i = 0; i < a.length; i++) {
      c[a[i]] = (c[a[i]] || 0) + 1;
    }
  }
  stryCov_9fa48 = cover;
  cover.apply(null, arguments);
}
function stryMutAct_9fa48(id) {
  var ns = stryNS_9fa48();
  function isActive(id) {
    if (ns.activeMutant === id) {
      if (ns.hitCount !== void 0 && ++ns.hitCount > ns.hitLimit) {
        throw new Error('Stryker: Hit count limit reached (' + ns.hitCount + ')');
      }
      return true;
    }
    return false;
  }
  stryMutAct_9fa48 = isActive;
  return isActive(id);
}
import { envelopeAt, type RequiredLoading } from './envelope';
import { goldenMinimum, lastWithin, tieBand } from './line-search';

/** core/methods.md section 7 searches a 4000-point grid; every search here is at least that fine near a minimum. */
export const SEARCH_GRID_POINTS = 4000;
/** Points of the coarse grid when the caller has no samples of the envelope to offer. */
export const COARSE_GRID_POINTS = 250;
/** Relative tolerance within which two loadings tie (core/methods.md section 7). */
export const TIE_TOLERANCE = 1e-9;
/** Local minima of the coarse grid within this fraction of the lowest one are all refined. */
const CANDIDATE_BAND = 1e-2;
const MAX_CANDIDATES = 8;
export interface Optimum {
  wingLoadingPa: number;
  loading: number;
  /** True when the optimum sits on the right edge of the plotted range. */
  unbounded: boolean;
}

/** The envelope already evaluated at increasing wing loadings (NaN where it cannot be met). */
export interface EnvelopeSamples {
  wingLoadingsPa: Float64Array;
  envelope: Float64Array;
}
type Envelope = (w: number) => number;
const tieLimit = stryMutAct_9fa48("293") ? () => undefined : (stryCov_9fa48("293"), (() => {
  const tieLimit = (y: number): number => tieBand(y, TIE_TOLERANCE);
  return tieLimit;
})());

/** Index of the lowest finite value (ties to the largest index); -1 if none is finite. */
function lowestIndex(ys: Float64Array): number {
  if (stryMutAct_9fa48("294")) {
    {}
  } else {
    stryCov_9fa48("294");
    let best = stryMutAct_9fa48("295") ? +1 : (stryCov_9fa48("295"), -1);
    for (let i = 0; stryMutAct_9fa48("298") ? i >= ys.length : stryMutAct_9fa48("297") ? i <= ys.length : stryMutAct_9fa48("296") ? false : (stryCov_9fa48("296", "297", "298"), i < ys.length); stryMutAct_9fa48("299") ? i-- : (stryCov_9fa48("299"), i++)) {
      if (stryMutAct_9fa48("300")) {
        {}
      } else {
        stryCov_9fa48("300");
        if (stryMutAct_9fa48("303") ? ys[i] <= Infinity || best < 0 || ys[i] <= tieLimit(ys[best]) : stryMutAct_9fa48("302") ? false : stryMutAct_9fa48("301") ? true : (stryCov_9fa48("301", "302", "303"), (stryMutAct_9fa48("306") ? ys[i] > Infinity : stryMutAct_9fa48("305") ? ys[i] < Infinity : stryMutAct_9fa48("304") ? true : (stryCov_9fa48("304", "305", "306"), ys[i] <= Infinity)) && (stryMutAct_9fa48("308") ? best < 0 && ys[i] <= tieLimit(ys[best]) : stryMutAct_9fa48("307") ? true : (stryCov_9fa48("307", "308"), (stryMutAct_9fa48("311") ? best >= 0 : stryMutAct_9fa48("310") ? best <= 0 : stryMutAct_9fa48("309") ? false : (stryCov_9fa48("309", "310", "311"), best < 0)) || (stryMutAct_9fa48("314") ? ys[i] > tieLimit(ys[best]) : stryMutAct_9fa48("313") ? ys[i] < tieLimit(ys[best]) : stryMutAct_9fa48("312") ? false : (stryCov_9fa48("312", "313", "314"), ys[i] <= tieLimit(ys[best]))))))) best = i;
      }
    }
    return best;
  }
}

/** Indices of the low local minima of a grid, lowest first; a flat run is represented by its last point. */
function candidateMinima(ys: Float64Array, lowest: number): number[] {
  if (stryMutAct_9fa48("315")) {
    {}
  } else {
    stryCov_9fa48("315");
    const band = stryMutAct_9fa48("316") ? lowest - Math.abs(lowest) * CANDIDATE_BAND : (stryCov_9fa48("316"), lowest + (stryMutAct_9fa48("317") ? Math.abs(lowest) / CANDIDATE_BAND : (stryCov_9fa48("317"), Math.abs(lowest) * CANDIDATE_BAND)));
    const out: number[] = stryMutAct_9fa48("318") ? ["Stryker was here"] : (stryCov_9fa48("318"), []);
    for (let i = 0; stryMutAct_9fa48("321") ? i >= ys.length : stryMutAct_9fa48("320") ? i <= ys.length : stryMutAct_9fa48("319") ? false : (stryCov_9fa48("319", "320", "321"), i < ys.length); stryMutAct_9fa48("322") ? i-- : (stryCov_9fa48("322"), i++)) {
      if (stryMutAct_9fa48("323")) {
        {}
      } else {
        stryCov_9fa48("323");
        const y = ys[i];
        if (stryMutAct_9fa48("326") ? false : stryMutAct_9fa48("325") ? true : stryMutAct_9fa48("324") ? y <= band : (stryCov_9fa48("324", "325", "326"), !(stryMutAct_9fa48("330") ? y > band : stryMutAct_9fa48("329") ? y < band : stryMutAct_9fa48("328") ? false : stryMutAct_9fa48("327") ? true : (stryCov_9fa48("327", "328", "329", "330"), y <= band)))) continue;
        const left = (stryMutAct_9fa48("334") ? i <= 0 : stryMutAct_9fa48("333") ? i >= 0 : stryMutAct_9fa48("332") ? false : stryMutAct_9fa48("331") ? true : (stryCov_9fa48("331", "332", "333", "334"), i > 0)) ? ys[stryMutAct_9fa48("335") ? i + 1 : (stryCov_9fa48("335"), i - 1)] : NaN;
        const next = (stryMutAct_9fa48("339") ? i >= ys.length - 1 : stryMutAct_9fa48("338") ? i <= ys.length - 1 : stryMutAct_9fa48("337") ? false : stryMutAct_9fa48("336") ? true : (stryCov_9fa48("336", "337", "338", "339"), i < (stryMutAct_9fa48("340") ? ys.length + 1 : (stryCov_9fa48("340"), ys.length - 1)))) ? ys[stryMutAct_9fa48("341") ? i - 1 : (stryCov_9fa48("341"), i + 1)] : NaN;
        if (stryMutAct_9fa48("345") ? left >= y - Math.abs(y) * TIE_TOLERANCE : stryMutAct_9fa48("344") ? left <= y - Math.abs(y) * TIE_TOLERANCE : stryMutAct_9fa48("343") ? false : stryMutAct_9fa48("342") ? true : (stryCov_9fa48("342", "343", "344", "345"), left < (stryMutAct_9fa48("346") ? y + Math.abs(y) * TIE_TOLERANCE : (stryCov_9fa48("346"), y - (stryMutAct_9fa48("347") ? Math.abs(y) / TIE_TOLERANCE : (stryCov_9fa48("347"), Math.abs(y) * TIE_TOLERANCE)))))) continue; // not a local minimum; NaN neighbours count as higher
        if (stryMutAct_9fa48("351") ? next > tieLimit(y) : stryMutAct_9fa48("350") ? next < tieLimit(y) : stryMutAct_9fa48("349") ? false : stryMutAct_9fa48("348") ? true : (stryCov_9fa48("348", "349", "350", "351"), next <= tieLimit(y))) continue;
        out.push(i);
      }
    }
    return stryMutAct_9fa48("353") ? out.slice(0, MAX_CANDIDATES) : stryMutAct_9fa48("352") ? out.sort((p, q) => ys[p] - ys[q]) : (stryCov_9fa48("352", "353"), out.sort(stryMutAct_9fa48("354") ? () => undefined : (stryCov_9fa48("354"), (p, q) => stryMutAct_9fa48("355") ? ys[p] + ys[q] : (stryCov_9fa48("355"), ys[p] - ys[q]))).slice(0, MAX_CANDIDATES));
  }
}

/**
 * One coarse minimum refined: a fine grid over [a, b] spaced like a
 * 4000-point grid over the span, golden section around its lowest point,
 * then right across any tie.
 */
function refine(f: Envelope, a: number, b: number, span: number): [number, number] {
  if (stryMutAct_9fa48("356")) {
    {}
  } else {
    stryCov_9fa48("356");
    const n = stryMutAct_9fa48("357") ? Math.min(9, Math.ceil((b - a) * (SEARCH_GRID_POINTS - 1) / span) + 1) : (stryCov_9fa48("357"), Math.max(9, stryMutAct_9fa48("358") ? Math.ceil((b - a) * (SEARCH_GRID_POINTS - 1) / span) - 1 : (stryCov_9fa48("358"), Math.ceil(stryMutAct_9fa48("359") ? (b - a) * (SEARCH_GRID_POINTS - 1) * span : (stryCov_9fa48("359"), (stryMutAct_9fa48("360") ? (b - a) / (SEARCH_GRID_POINTS - 1) : (stryCov_9fa48("360"), (stryMutAct_9fa48("361") ? b + a : (stryCov_9fa48("361"), b - a)) * (stryMutAct_9fa48("362") ? SEARCH_GRID_POINTS + 1 : (stryCov_9fa48("362"), SEARCH_GRID_POINTS - 1)))) / span)) + 1)));
    const ws = new Float64Array(n);
    const ys = new Float64Array(n);
    for (let i = 0; stryMutAct_9fa48("365") ? i >= n : stryMutAct_9fa48("364") ? i <= n : stryMutAct_9fa48("363") ? false : (stryCov_9fa48("363", "364", "365"), i < n); stryMutAct_9fa48("366") ? i-- : (stryCov_9fa48("366"), i++)) {
      if (stryMutAct_9fa48("367")) {
        {}
      } else {
        stryCov_9fa48("367");
        ws[i] = (stryMutAct_9fa48("370") ? i !== n - 1 : stryMutAct_9fa48("369") ? false : stryMutAct_9fa48("368") ? true : (stryCov_9fa48("368", "369", "370"), i === (stryMutAct_9fa48("371") ? n + 1 : (stryCov_9fa48("371"), n - 1)))) ? b : stryMutAct_9fa48("372") ? a - (b - a) * i / (n - 1) : (stryCov_9fa48("372"), a + (stryMutAct_9fa48("373") ? (b - a) * i * (n - 1) : (stryCov_9fa48("373"), (stryMutAct_9fa48("374") ? (b - a) / i : (stryCov_9fa48("374"), (stryMutAct_9fa48("375") ? b + a : (stryCov_9fa48("375"), b - a)) * i)) / (stryMutAct_9fa48("376") ? n + 1 : (stryCov_9fa48("376"), n - 1)))));
        ys[i] = f(ws[i]);
      }
    }
    const j = lowestIndex(ys);
    let w = ws[j];
    let y = ys[j];
    const [gw, gy] = goldenMinimum(f, ws[stryMutAct_9fa48("377") ? Math.min(0, j - 1) : (stryCov_9fa48("377"), Math.max(0, stryMutAct_9fa48("378") ? j + 1 : (stryCov_9fa48("378"), j - 1)))], ws[stryMutAct_9fa48("379") ? Math.max(n - 1, j + 1) : (stryCov_9fa48("379"), Math.min(stryMutAct_9fa48("380") ? n + 1 : (stryCov_9fa48("380"), n - 1), stryMutAct_9fa48("381") ? j - 1 : (stryCov_9fa48("381"), j + 1)))]);
    if (stryMutAct_9fa48("385") ? gy >= y : stryMutAct_9fa48("384") ? gy <= y : stryMutAct_9fa48("383") ? false : stryMutAct_9fa48("382") ? true : (stryCov_9fa48("382", "383", "384", "385"), gy < y)) [w, y] = stryMutAct_9fa48("386") ? [] : (stryCov_9fa48("386"), [gw, gy]);
    if (stryMutAct_9fa48("390") ? j >= n - 1 : stryMutAct_9fa48("389") ? j <= n - 1 : stryMutAct_9fa48("388") ? false : stryMutAct_9fa48("387") ? true : (stryCov_9fa48("387", "388", "389", "390"), j < (stryMutAct_9fa48("391") ? n + 1 : (stryCov_9fa48("391"), n - 1)))) w = lastWithin(f, w, ws[stryMutAct_9fa48("392") ? j - 1 : (stryCov_9fa48("392"), j + 1)], tieLimit(y));
    return stryMutAct_9fa48("393") ? [] : (stryCov_9fa48("393"), [w, y]);
  }
}

/** The coarse grid: the caller's samples left of `right`, then `right` itself; else an even grid. */
function coarseGrid(f: Envelope, lo: number, right: number, samples?: EnvelopeSamples): [Float64Array, Float64Array] {
  if (stryMutAct_9fa48("394")) {
    {}
  } else {
    stryCov_9fa48("394");
    if (stryMutAct_9fa48("396") ? false : stryMutAct_9fa48("395") ? true : (stryCov_9fa48("395", "396"), samples)) {
      if (stryMutAct_9fa48("397")) {
        {}
      } else {
        stryCov_9fa48("397");
        let m = 0;
        while (stryMutAct_9fa48("399") ? m < samples.wingLoadingsPa.length || samples.wingLoadingsPa[m] < right : stryMutAct_9fa48("398") ? false : (stryCov_9fa48("398", "399"), (stryMutAct_9fa48("402") ? m >= samples.wingLoadingsPa.length : stryMutAct_9fa48("401") ? m <= samples.wingLoadingsPa.length : stryMutAct_9fa48("400") ? true : (stryCov_9fa48("400", "401", "402"), m < samples.wingLoadingsPa.length)) && (stryMutAct_9fa48("405") ? samples.wingLoadingsPa[m] >= right : stryMutAct_9fa48("404") ? samples.wingLoadingsPa[m] <= right : stryMutAct_9fa48("403") ? true : (stryCov_9fa48("403", "404", "405"), samples.wingLoadingsPa[m] < right)))) stryMutAct_9fa48("406") ? m-- : (stryCov_9fa48("406"), m++);
        const ws = new Float64Array(stryMutAct_9fa48("407") ? m - 1 : (stryCov_9fa48("407"), m + 1));
        const ys = new Float64Array(stryMutAct_9fa48("408") ? m - 1 : (stryCov_9fa48("408"), m + 1));
        ws.set(samples.wingLoadingsPa.subarray(0, m));
        ys.set(samples.envelope.subarray(0, m));
        ws[m] = right;
        ys[m] = f(right);
        return stryMutAct_9fa48("409") ? [] : (stryCov_9fa48("409"), [ws, ys]);
      }
    }
    const ws = new Float64Array(COARSE_GRID_POINTS);
    const ys = new Float64Array(COARSE_GRID_POINTS);
    for (let i = 0; stryMutAct_9fa48("412") ? i >= COARSE_GRID_POINTS : stryMutAct_9fa48("411") ? i <= COARSE_GRID_POINTS : stryMutAct_9fa48("410") ? false : (stryCov_9fa48("410", "411", "412"), i < COARSE_GRID_POINTS); stryMutAct_9fa48("413") ? i-- : (stryCov_9fa48("413"), i++)) {
      if (stryMutAct_9fa48("414")) {
        {}
      } else {
        stryCov_9fa48("414");
        ws[i] = (stryMutAct_9fa48("417") ? i !== COARSE_GRID_POINTS - 1 : stryMutAct_9fa48("416") ? false : stryMutAct_9fa48("415") ? true : (stryCov_9fa48("415", "416", "417"), i === (stryMutAct_9fa48("418") ? COARSE_GRID_POINTS + 1 : (stryCov_9fa48("418"), COARSE_GRID_POINTS - 1)))) ? right : stryMutAct_9fa48("419") ? lo - (right - lo) * i / (COARSE_GRID_POINTS - 1) : (stryCov_9fa48("419"), lo + (stryMutAct_9fa48("420") ? (right - lo) * i * (COARSE_GRID_POINTS - 1) : (stryCov_9fa48("420"), (stryMutAct_9fa48("421") ? (right - lo) / i : (stryCov_9fa48("421"), (stryMutAct_9fa48("422") ? right + lo : (stryCov_9fa48("422"), right - lo)) * i)) / (stryMutAct_9fa48("423") ? COARSE_GRID_POINTS + 1 : (stryCov_9fa48("423"), COARSE_GRID_POINTS - 1)))));
        ys[i] = f(ws[i]);
      }
    }
    return stryMutAct_9fa48("424") ? [] : (stryCov_9fa48("424"), [ws, ys]);
  }
}

/**
 * The optimum over [lo, min(cap, hi)]. A coarse grid (the plotted samples
 * when given, which must start at lo) finds the low local minima; each is
 * searched again on a fine grid as fine as the methods reference's (core/methods.md) 4000-point grid,
 * refined by golden section and moved right across any tie. Null when no
 * wing loading in the span can be met.
 *
 * A dip narrower than the coarse spacing can be missed, where a 4000-point
 * grid over the whole span would find it. Constraint envelopes are maxima of
 * smooth curves: their minima are crossings or broad valleys, never that narrow.
 */
export function findOptimum(required: readonly RequiredLoading[], capPa: number, range: readonly [number, number], samples?: EnvelopeSamples): Optimum | null {
  if (stryMutAct_9fa48("425")) {
    {}
  } else {
    stryCov_9fa48("425");
    const [lo, hi] = range;
    const right = stryMutAct_9fa48("426") ? Math.max(capPa, hi) : (stryCov_9fa48("426"), Math.min(capPa, hi));
    if (stryMutAct_9fa48("429") ? false : stryMutAct_9fa48("428") ? true : stryMutAct_9fa48("427") ? right >= lo : (stryCov_9fa48("427", "428", "429"), !(stryMutAct_9fa48("433") ? right < lo : stryMutAct_9fa48("432") ? right > lo : stryMutAct_9fa48("431") ? false : stryMutAct_9fa48("430") ? true : (stryCov_9fa48("430", "431", "432", "433"), right >= lo)))) return null;
    const f = stryMutAct_9fa48("434") ? () => undefined : (stryCov_9fa48("434"), (() => {
      const f = (w: number): number => envelopeAt(required, w);
      return f;
    })());
    const unbounded = stryMutAct_9fa48("435") ? () => undefined : (stryCov_9fa48("435"), (() => {
      const unbounded = (w: number): boolean => stryMutAct_9fa48("438") ? right === hi || w >= hi * (1 - 1e-6) : stryMutAct_9fa48("437") ? false : stryMutAct_9fa48("436") ? true : (stryCov_9fa48("436", "437", "438"), (stryMutAct_9fa48("440") ? right !== hi : stryMutAct_9fa48("439") ? true : (stryCov_9fa48("439", "440"), right === hi)) && (stryMutAct_9fa48("443") ? w < hi * (1 - 1e-6) : stryMutAct_9fa48("442") ? w > hi * (1 - 1e-6) : stryMutAct_9fa48("441") ? true : (stryCov_9fa48("441", "442", "443"), w >= (stryMutAct_9fa48("444") ? hi / (1 - 1e-6) : (stryCov_9fa48("444"), hi * (stryMutAct_9fa48("445") ? 1 + 1e-6 : (stryCov_9fa48("445"), 1 - 1e-6)))))));
      return unbounded;
    })());
    if (stryMutAct_9fa48("448") ? required.length !== 0 : stryMutAct_9fa48("447") ? false : stryMutAct_9fa48("446") ? true : (stryCov_9fa48("446", "447", "448"), required.length === 0)) return stryMutAct_9fa48("449") ? {} : (stryCov_9fa48("449"), {
      wingLoadingPa: right,
      loading: 0,
      unbounded: unbounded(right)
    });
    if (stryMutAct_9fa48("452") ? right !== lo : stryMutAct_9fa48("451") ? false : stryMutAct_9fa48("450") ? true : (stryCov_9fa48("450", "451", "452"), right === lo)) {
      if (stryMutAct_9fa48("453")) {
        {}
      } else {
        stryCov_9fa48("453");
        const y = f(lo);
        return (stryMutAct_9fa48("457") ? y > Infinity : stryMutAct_9fa48("456") ? y < Infinity : stryMutAct_9fa48("455") ? false : stryMutAct_9fa48("454") ? true : (stryCov_9fa48("454", "455", "456", "457"), y <= Infinity)) ? stryMutAct_9fa48("458") ? {} : (stryCov_9fa48("458"), {
          wingLoadingPa: lo,
          loading: y,
          unbounded: unbounded(lo)
        }) : null;
      }
    }
    const [ws, ys] = coarseGrid(f, lo, right, samples);
    const first = lowestIndex(ys);
    if (stryMutAct_9fa48("462") ? first >= 0 : stryMutAct_9fa48("461") ? first <= 0 : stryMutAct_9fa48("460") ? false : stryMutAct_9fa48("459") ? true : (stryCov_9fa48("459", "460", "461", "462"), first < 0)) return null;
    let bestW = NaN;
    let bestY = Infinity;
    for (const i of candidateMinima(ys, ys[first])) {
      if (stryMutAct_9fa48("463")) {
        {}
      } else {
        stryCov_9fa48("463");
        const [w, y] = refine(f, ws[stryMutAct_9fa48("464") ? Math.min(0, i - 1) : (stryCov_9fa48("464"), Math.max(0, stryMutAct_9fa48("465") ? i + 1 : (stryCov_9fa48("465"), i - 1)))], ws[stryMutAct_9fa48("466") ? Math.max(ws.length - 1, i + 1) : (stryCov_9fa48("466"), Math.min(stryMutAct_9fa48("467") ? ws.length + 1 : (stryCov_9fa48("467"), ws.length - 1), stryMutAct_9fa48("468") ? i - 1 : (stryCov_9fa48("468"), i + 1)))], stryMutAct_9fa48("469") ? right + lo : (stryCov_9fa48("469"), right - lo));
        const lower = stryMutAct_9fa48("470") ? bestY <= tieLimit(y) : (stryCov_9fa48("470"), !(stryMutAct_9fa48("474") ? bestY > tieLimit(y) : stryMutAct_9fa48("473") ? bestY < tieLimit(y) : stryMutAct_9fa48("472") ? false : stryMutAct_9fa48("471") ? true : (stryCov_9fa48("471", "472", "473", "474"), bestY <= tieLimit(y))));
        const tiesFurtherRight = stryMutAct_9fa48("477") ? y <= tieLimit(bestY) || w > bestW : stryMutAct_9fa48("476") ? false : stryMutAct_9fa48("475") ? true : (stryCov_9fa48("475", "476", "477"), (stryMutAct_9fa48("480") ? y > tieLimit(bestY) : stryMutAct_9fa48("479") ? y < tieLimit(bestY) : stryMutAct_9fa48("478") ? true : (stryCov_9fa48("478", "479", "480"), y <= tieLimit(bestY))) && (stryMutAct_9fa48("483") ? w <= bestW : stryMutAct_9fa48("482") ? w >= bestW : stryMutAct_9fa48("481") ? true : (stryCov_9fa48("481", "482", "483"), w > bestW)));
        if (stryMutAct_9fa48("486") ? lower && tiesFurtherRight : stryMutAct_9fa48("485") ? false : stryMutAct_9fa48("484") ? true : (stryCov_9fa48("484", "485", "486"), lower || tiesFurtherRight)) [bestW, bestY] = stryMutAct_9fa48("487") ? [] : (stryCov_9fa48("487"), [w, y]);
      }
    }
    // The tie rule over the whole span: on a flat envelope the grid's rounding
    // wobble makes many local minima, and the one at the largest wing loading
    // need not be among the candidates. Any grid point right of the best that
    // ties with it wins, moved right across the tie.
    const limit = tieLimit(bestY);
    for (let i = stryMutAct_9fa48("488") ? ws.length + 1 : (stryCov_9fa48("488"), ws.length - 1); stryMutAct_9fa48("490") ? i >= 0 || ws[i] > bestW : stryMutAct_9fa48("489") ? false : (stryCov_9fa48("489", "490"), (stryMutAct_9fa48("493") ? i < 0 : stryMutAct_9fa48("492") ? i > 0 : stryMutAct_9fa48("491") ? true : (stryCov_9fa48("491", "492", "493"), i >= 0)) && (stryMutAct_9fa48("496") ? ws[i] <= bestW : stryMutAct_9fa48("495") ? ws[i] >= bestW : stryMutAct_9fa48("494") ? true : (stryCov_9fa48("494", "495", "496"), ws[i] > bestW))); stryMutAct_9fa48("497") ? i++ : (stryCov_9fa48("497"), i--)) {
      if (stryMutAct_9fa48("498")) {
        {}
      } else {
        stryCov_9fa48("498");
        if (stryMutAct_9fa48("502") ? ys[i] > limit : stryMutAct_9fa48("501") ? ys[i] < limit : stryMutAct_9fa48("500") ? false : stryMutAct_9fa48("499") ? true : (stryCov_9fa48("499", "500", "501", "502"), ys[i] <= limit)) {
          if (stryMutAct_9fa48("503")) {
            {}
          } else {
            stryCov_9fa48("503");
            bestW = (stryMutAct_9fa48("507") ? i >= ws.length - 1 : stryMutAct_9fa48("506") ? i <= ws.length - 1 : stryMutAct_9fa48("505") ? false : stryMutAct_9fa48("504") ? true : (stryCov_9fa48("504", "505", "506", "507"), i < (stryMutAct_9fa48("508") ? ws.length + 1 : (stryCov_9fa48("508"), ws.length - 1)))) ? lastWithin(f, ws[i], ws[stryMutAct_9fa48("509") ? i - 1 : (stryCov_9fa48("509"), i + 1)], limit) : ws[i];
            break;
          }
        }
      }
    }
    return stryMutAct_9fa48("510") ? {} : (stryCov_9fa48("510"), {
      wingLoadingPa: bestW,
      loading: f(bestW),
      unbounded: unbounded(bestW)
    });
  }
}
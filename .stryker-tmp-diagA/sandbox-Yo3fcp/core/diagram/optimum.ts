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
const tieLimit = stryMutAct_9fa48("181") ? () => undefined : (stryCov_9fa48("181"), (() => {
  const tieLimit = (y: number): number => tieBand(y, TIE_TOLERANCE);
  return tieLimit;
})());

/** Index of the lowest finite value (ties to the largest index); -1 if none is finite. */
function lowestIndex(ys: Float64Array): number {
  if (stryMutAct_9fa48("182")) {
    {}
  } else {
    stryCov_9fa48("182");
    let best = stryMutAct_9fa48("183") ? +1 : (stryCov_9fa48("183"), -1);
    for (let i = 0; stryMutAct_9fa48("186") ? i >= ys.length : stryMutAct_9fa48("185") ? i <= ys.length : stryMutAct_9fa48("184") ? false : (stryCov_9fa48("184", "185", "186"), i < ys.length); stryMutAct_9fa48("187") ? i-- : (stryCov_9fa48("187"), i++)) {
      if (stryMutAct_9fa48("188")) {
        {}
      } else {
        stryCov_9fa48("188");
        if (stryMutAct_9fa48("191") ? ys[i] <= Infinity || best < 0 || ys[i] <= tieLimit(ys[best]) : stryMutAct_9fa48("190") ? false : stryMutAct_9fa48("189") ? true : (stryCov_9fa48("189", "190", "191"), (stryMutAct_9fa48("194") ? ys[i] > Infinity : stryMutAct_9fa48("193") ? ys[i] < Infinity : stryMutAct_9fa48("192") ? true : (stryCov_9fa48("192", "193", "194"), ys[i] <= Infinity)) && (stryMutAct_9fa48("196") ? best < 0 && ys[i] <= tieLimit(ys[best]) : stryMutAct_9fa48("195") ? true : (stryCov_9fa48("195", "196"), (stryMutAct_9fa48("199") ? best >= 0 : stryMutAct_9fa48("198") ? best <= 0 : stryMutAct_9fa48("197") ? false : (stryCov_9fa48("197", "198", "199"), best < 0)) || (stryMutAct_9fa48("202") ? ys[i] > tieLimit(ys[best]) : stryMutAct_9fa48("201") ? ys[i] < tieLimit(ys[best]) : stryMutAct_9fa48("200") ? false : (stryCov_9fa48("200", "201", "202"), ys[i] <= tieLimit(ys[best]))))))) best = i;
      }
    }
    return best;
  }
}

/** Indices of the low local minima of a grid, lowest first; a flat run is represented by its last point. */
function candidateMinima(ys: Float64Array, lowest: number): number[] {
  if (stryMutAct_9fa48("203")) {
    {}
  } else {
    stryCov_9fa48("203");
    const band = stryMutAct_9fa48("204") ? lowest - Math.abs(lowest) * CANDIDATE_BAND : (stryCov_9fa48("204"), lowest + (stryMutAct_9fa48("205") ? Math.abs(lowest) / CANDIDATE_BAND : (stryCov_9fa48("205"), Math.abs(lowest) * CANDIDATE_BAND)));
    const out: number[] = stryMutAct_9fa48("206") ? ["Stryker was here"] : (stryCov_9fa48("206"), []);
    for (let i = 0; stryMutAct_9fa48("209") ? i >= ys.length : stryMutAct_9fa48("208") ? i <= ys.length : stryMutAct_9fa48("207") ? false : (stryCov_9fa48("207", "208", "209"), i < ys.length); stryMutAct_9fa48("210") ? i-- : (stryCov_9fa48("210"), i++)) {
      if (stryMutAct_9fa48("211")) {
        {}
      } else {
        stryCov_9fa48("211");
        const y = ys[i];
        if (stryMutAct_9fa48("214") ? false : stryMutAct_9fa48("213") ? true : stryMutAct_9fa48("212") ? y <= band : (stryCov_9fa48("212", "213", "214"), !(stryMutAct_9fa48("218") ? y > band : stryMutAct_9fa48("217") ? y < band : stryMutAct_9fa48("216") ? false : stryMutAct_9fa48("215") ? true : (stryCov_9fa48("215", "216", "217", "218"), y <= band)))) continue;
        const left = (stryMutAct_9fa48("222") ? i <= 0 : stryMutAct_9fa48("221") ? i >= 0 : stryMutAct_9fa48("220") ? false : stryMutAct_9fa48("219") ? true : (stryCov_9fa48("219", "220", "221", "222"), i > 0)) ? ys[stryMutAct_9fa48("223") ? i + 1 : (stryCov_9fa48("223"), i - 1)] : NaN;
        const next = (stryMutAct_9fa48("227") ? i >= ys.length - 1 : stryMutAct_9fa48("226") ? i <= ys.length - 1 : stryMutAct_9fa48("225") ? false : stryMutAct_9fa48("224") ? true : (stryCov_9fa48("224", "225", "226", "227"), i < (stryMutAct_9fa48("228") ? ys.length + 1 : (stryCov_9fa48("228"), ys.length - 1)))) ? ys[stryMutAct_9fa48("229") ? i - 1 : (stryCov_9fa48("229"), i + 1)] : NaN;
        if (stryMutAct_9fa48("233") ? left >= y - Math.abs(y) * TIE_TOLERANCE : stryMutAct_9fa48("232") ? left <= y - Math.abs(y) * TIE_TOLERANCE : stryMutAct_9fa48("231") ? false : stryMutAct_9fa48("230") ? true : (stryCov_9fa48("230", "231", "232", "233"), left < (stryMutAct_9fa48("234") ? y + Math.abs(y) * TIE_TOLERANCE : (stryCov_9fa48("234"), y - (stryMutAct_9fa48("235") ? Math.abs(y) / TIE_TOLERANCE : (stryCov_9fa48("235"), Math.abs(y) * TIE_TOLERANCE)))))) continue; // not a local minimum; NaN neighbours count as higher
        if (stryMutAct_9fa48("239") ? next > tieLimit(y) : stryMutAct_9fa48("238") ? next < tieLimit(y) : stryMutAct_9fa48("237") ? false : stryMutAct_9fa48("236") ? true : (stryCov_9fa48("236", "237", "238", "239"), next <= tieLimit(y))) continue;
        out.push(i);
      }
    }
    return stryMutAct_9fa48("241") ? out.slice(0, MAX_CANDIDATES) : stryMutAct_9fa48("240") ? out.sort((p, q) => ys[p] - ys[q]) : (stryCov_9fa48("240", "241"), out.sort(stryMutAct_9fa48("242") ? () => undefined : (stryCov_9fa48("242"), (p, q) => stryMutAct_9fa48("243") ? ys[p] + ys[q] : (stryCov_9fa48("243"), ys[p] - ys[q]))).slice(0, MAX_CANDIDATES));
  }
}

/**
 * One coarse minimum refined: a fine grid over [a, b] spaced like a
 * 4000-point grid over the span, golden section around its lowest point,
 * then right across any tie.
 */
function refine(f: Envelope, a: number, b: number, span: number): [number, number] {
  if (stryMutAct_9fa48("244")) {
    {}
  } else {
    stryCov_9fa48("244");
    const n = stryMutAct_9fa48("245") ? Math.min(9, Math.ceil((b - a) * (SEARCH_GRID_POINTS - 1) / span) + 1) : (stryCov_9fa48("245"), Math.max(9, stryMutAct_9fa48("246") ? Math.ceil((b - a) * (SEARCH_GRID_POINTS - 1) / span) - 1 : (stryCov_9fa48("246"), Math.ceil(stryMutAct_9fa48("247") ? (b - a) * (SEARCH_GRID_POINTS - 1) * span : (stryCov_9fa48("247"), (stryMutAct_9fa48("248") ? (b - a) / (SEARCH_GRID_POINTS - 1) : (stryCov_9fa48("248"), (stryMutAct_9fa48("249") ? b + a : (stryCov_9fa48("249"), b - a)) * (stryMutAct_9fa48("250") ? SEARCH_GRID_POINTS + 1 : (stryCov_9fa48("250"), SEARCH_GRID_POINTS - 1)))) / span)) + 1)));
    const ws = new Float64Array(n);
    const ys = new Float64Array(n);
    for (let i = 0; stryMutAct_9fa48("253") ? i >= n : stryMutAct_9fa48("252") ? i <= n : stryMutAct_9fa48("251") ? false : (stryCov_9fa48("251", "252", "253"), i < n); stryMutAct_9fa48("254") ? i-- : (stryCov_9fa48("254"), i++)) {
      if (stryMutAct_9fa48("255")) {
        {}
      } else {
        stryCov_9fa48("255");
        ws[i] = (stryMutAct_9fa48("258") ? i !== n - 1 : stryMutAct_9fa48("257") ? false : stryMutAct_9fa48("256") ? true : (stryCov_9fa48("256", "257", "258"), i === (stryMutAct_9fa48("259") ? n + 1 : (stryCov_9fa48("259"), n - 1)))) ? b : stryMutAct_9fa48("260") ? a - (b - a) * i / (n - 1) : (stryCov_9fa48("260"), a + (stryMutAct_9fa48("261") ? (b - a) * i * (n - 1) : (stryCov_9fa48("261"), (stryMutAct_9fa48("262") ? (b - a) / i : (stryCov_9fa48("262"), (stryMutAct_9fa48("263") ? b + a : (stryCov_9fa48("263"), b - a)) * i)) / (stryMutAct_9fa48("264") ? n + 1 : (stryCov_9fa48("264"), n - 1)))));
        ys[i] = f(ws[i]);
      }
    }
    const j = lowestIndex(ys);
    let w = ws[j];
    let y = ys[j];
    const [gw, gy] = goldenMinimum(f, ws[stryMutAct_9fa48("265") ? Math.min(0, j - 1) : (stryCov_9fa48("265"), Math.max(0, stryMutAct_9fa48("266") ? j + 1 : (stryCov_9fa48("266"), j - 1)))], ws[stryMutAct_9fa48("267") ? Math.max(n - 1, j + 1) : (stryCov_9fa48("267"), Math.min(stryMutAct_9fa48("268") ? n + 1 : (stryCov_9fa48("268"), n - 1), stryMutAct_9fa48("269") ? j - 1 : (stryCov_9fa48("269"), j + 1)))]);
    if (stryMutAct_9fa48("273") ? gy >= y : stryMutAct_9fa48("272") ? gy <= y : stryMutAct_9fa48("271") ? false : stryMutAct_9fa48("270") ? true : (stryCov_9fa48("270", "271", "272", "273"), gy < y)) [w, y] = stryMutAct_9fa48("274") ? [] : (stryCov_9fa48("274"), [gw, gy]);
    if (stryMutAct_9fa48("278") ? j >= n - 1 : stryMutAct_9fa48("277") ? j <= n - 1 : stryMutAct_9fa48("276") ? false : stryMutAct_9fa48("275") ? true : (stryCov_9fa48("275", "276", "277", "278"), j < (stryMutAct_9fa48("279") ? n + 1 : (stryCov_9fa48("279"), n - 1)))) w = lastWithin(f, w, ws[stryMutAct_9fa48("280") ? j - 1 : (stryCov_9fa48("280"), j + 1)], tieLimit(y));
    return stryMutAct_9fa48("281") ? [] : (stryCov_9fa48("281"), [w, y]);
  }
}

/** The coarse grid: the caller's samples left of `right`, then `right` itself; else an even grid. */
function coarseGrid(f: Envelope, lo: number, right: number, samples?: EnvelopeSamples): [Float64Array, Float64Array] {
  if (stryMutAct_9fa48("282")) {
    {}
  } else {
    stryCov_9fa48("282");
    if (stryMutAct_9fa48("284") ? false : stryMutAct_9fa48("283") ? true : (stryCov_9fa48("283", "284"), samples)) {
      if (stryMutAct_9fa48("285")) {
        {}
      } else {
        stryCov_9fa48("285");
        let m = 0;
        while (stryMutAct_9fa48("287") ? m < samples.wingLoadingsPa.length || samples.wingLoadingsPa[m] < right : stryMutAct_9fa48("286") ? false : (stryCov_9fa48("286", "287"), (stryMutAct_9fa48("290") ? m >= samples.wingLoadingsPa.length : stryMutAct_9fa48("289") ? m <= samples.wingLoadingsPa.length : stryMutAct_9fa48("288") ? true : (stryCov_9fa48("288", "289", "290"), m < samples.wingLoadingsPa.length)) && (stryMutAct_9fa48("293") ? samples.wingLoadingsPa[m] >= right : stryMutAct_9fa48("292") ? samples.wingLoadingsPa[m] <= right : stryMutAct_9fa48("291") ? true : (stryCov_9fa48("291", "292", "293"), samples.wingLoadingsPa[m] < right)))) stryMutAct_9fa48("294") ? m-- : (stryCov_9fa48("294"), m++);
        const ws = new Float64Array(stryMutAct_9fa48("295") ? m - 1 : (stryCov_9fa48("295"), m + 1));
        const ys = new Float64Array(stryMutAct_9fa48("296") ? m - 1 : (stryCov_9fa48("296"), m + 1));
        ws.set(samples.wingLoadingsPa.subarray(0, m));
        ys.set(samples.envelope.subarray(0, m));
        ws[m] = right;
        ys[m] = f(right);
        return stryMutAct_9fa48("297") ? [] : (stryCov_9fa48("297"), [ws, ys]);
      }
    }
    const ws = new Float64Array(COARSE_GRID_POINTS);
    const ys = new Float64Array(COARSE_GRID_POINTS);
    for (let i = 0; stryMutAct_9fa48("300") ? i >= COARSE_GRID_POINTS : stryMutAct_9fa48("299") ? i <= COARSE_GRID_POINTS : stryMutAct_9fa48("298") ? false : (stryCov_9fa48("298", "299", "300"), i < COARSE_GRID_POINTS); stryMutAct_9fa48("301") ? i-- : (stryCov_9fa48("301"), i++)) {
      if (stryMutAct_9fa48("302")) {
        {}
      } else {
        stryCov_9fa48("302");
        ws[i] = (stryMutAct_9fa48("305") ? i !== COARSE_GRID_POINTS - 1 : stryMutAct_9fa48("304") ? false : stryMutAct_9fa48("303") ? true : (stryCov_9fa48("303", "304", "305"), i === (stryMutAct_9fa48("306") ? COARSE_GRID_POINTS + 1 : (stryCov_9fa48("306"), COARSE_GRID_POINTS - 1)))) ? right : stryMutAct_9fa48("307") ? lo - (right - lo) * i / (COARSE_GRID_POINTS - 1) : (stryCov_9fa48("307"), lo + (stryMutAct_9fa48("308") ? (right - lo) * i * (COARSE_GRID_POINTS - 1) : (stryCov_9fa48("308"), (stryMutAct_9fa48("309") ? (right - lo) / i : (stryCov_9fa48("309"), (stryMutAct_9fa48("310") ? right + lo : (stryCov_9fa48("310"), right - lo)) * i)) / (stryMutAct_9fa48("311") ? COARSE_GRID_POINTS + 1 : (stryCov_9fa48("311"), COARSE_GRID_POINTS - 1)))));
        ys[i] = f(ws[i]);
      }
    }
    return stryMutAct_9fa48("312") ? [] : (stryCov_9fa48("312"), [ws, ys]);
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
  if (stryMutAct_9fa48("313")) {
    {}
  } else {
    stryCov_9fa48("313");
    const [lo, hi] = range;
    const right = stryMutAct_9fa48("314") ? Math.max(capPa, hi) : (stryCov_9fa48("314"), Math.min(capPa, hi));
    if (stryMutAct_9fa48("317") ? false : stryMutAct_9fa48("316") ? true : stryMutAct_9fa48("315") ? right >= lo : (stryCov_9fa48("315", "316", "317"), !(stryMutAct_9fa48("321") ? right < lo : stryMutAct_9fa48("320") ? right > lo : stryMutAct_9fa48("319") ? false : stryMutAct_9fa48("318") ? true : (stryCov_9fa48("318", "319", "320", "321"), right >= lo)))) return null;
    const f = stryMutAct_9fa48("322") ? () => undefined : (stryCov_9fa48("322"), (() => {
      const f = (w: number): number => envelopeAt(required, w);
      return f;
    })());
    const unbounded = stryMutAct_9fa48("323") ? () => undefined : (stryCov_9fa48("323"), (() => {
      const unbounded = (w: number): boolean => stryMutAct_9fa48("326") ? right === hi || w >= hi * (1 - 1e-6) : stryMutAct_9fa48("325") ? false : stryMutAct_9fa48("324") ? true : (stryCov_9fa48("324", "325", "326"), (stryMutAct_9fa48("328") ? right !== hi : stryMutAct_9fa48("327") ? true : (stryCov_9fa48("327", "328"), right === hi)) && (stryMutAct_9fa48("331") ? w < hi * (1 - 1e-6) : stryMutAct_9fa48("330") ? w > hi * (1 - 1e-6) : stryMutAct_9fa48("329") ? true : (stryCov_9fa48("329", "330", "331"), w >= (stryMutAct_9fa48("332") ? hi / (1 - 1e-6) : (stryCov_9fa48("332"), hi * (stryMutAct_9fa48("333") ? 1 + 1e-6 : (stryCov_9fa48("333"), 1 - 1e-6)))))));
      return unbounded;
    })());
    if (stryMutAct_9fa48("336") ? required.length !== 0 : stryMutAct_9fa48("335") ? false : stryMutAct_9fa48("334") ? true : (stryCov_9fa48("334", "335", "336"), required.length === 0)) return stryMutAct_9fa48("337") ? {} : (stryCov_9fa48("337"), {
      wingLoadingPa: right,
      loading: 0,
      unbounded: unbounded(right)
    });
    if (stryMutAct_9fa48("340") ? right !== lo : stryMutAct_9fa48("339") ? false : stryMutAct_9fa48("338") ? true : (stryCov_9fa48("338", "339", "340"), right === lo)) {
      if (stryMutAct_9fa48("341")) {
        {}
      } else {
        stryCov_9fa48("341");
        const y = f(lo);
        return (stryMutAct_9fa48("345") ? y > Infinity : stryMutAct_9fa48("344") ? y < Infinity : stryMutAct_9fa48("343") ? false : stryMutAct_9fa48("342") ? true : (stryCov_9fa48("342", "343", "344", "345"), y <= Infinity)) ? stryMutAct_9fa48("346") ? {} : (stryCov_9fa48("346"), {
          wingLoadingPa: lo,
          loading: y,
          unbounded: unbounded(lo)
        }) : null;
      }
    }
    const [ws, ys] = coarseGrid(f, lo, right, samples);
    const first = lowestIndex(ys);
    if (stryMutAct_9fa48("350") ? first >= 0 : stryMutAct_9fa48("349") ? first <= 0 : stryMutAct_9fa48("348") ? false : stryMutAct_9fa48("347") ? true : (stryCov_9fa48("347", "348", "349", "350"), first < 0)) return null;
    let bestW = NaN;
    let bestY = Infinity;
    for (const i of candidateMinima(ys, ys[first])) {
      if (stryMutAct_9fa48("351")) {
        {}
      } else {
        stryCov_9fa48("351");
        const [w, y] = refine(f, ws[stryMutAct_9fa48("352") ? Math.min(0, i - 1) : (stryCov_9fa48("352"), Math.max(0, stryMutAct_9fa48("353") ? i + 1 : (stryCov_9fa48("353"), i - 1)))], ws[stryMutAct_9fa48("354") ? Math.max(ws.length - 1, i + 1) : (stryCov_9fa48("354"), Math.min(stryMutAct_9fa48("355") ? ws.length + 1 : (stryCov_9fa48("355"), ws.length - 1), stryMutAct_9fa48("356") ? i - 1 : (stryCov_9fa48("356"), i + 1)))], stryMutAct_9fa48("357") ? right + lo : (stryCov_9fa48("357"), right - lo));
        const lower = stryMutAct_9fa48("358") ? bestY <= tieLimit(y) : (stryCov_9fa48("358"), !(stryMutAct_9fa48("362") ? bestY > tieLimit(y) : stryMutAct_9fa48("361") ? bestY < tieLimit(y) : stryMutAct_9fa48("360") ? false : stryMutAct_9fa48("359") ? true : (stryCov_9fa48("359", "360", "361", "362"), bestY <= tieLimit(y))));
        const tiesFurtherRight = stryMutAct_9fa48("365") ? y <= tieLimit(bestY) || w > bestW : stryMutAct_9fa48("364") ? false : stryMutAct_9fa48("363") ? true : (stryCov_9fa48("363", "364", "365"), (stryMutAct_9fa48("368") ? y > tieLimit(bestY) : stryMutAct_9fa48("367") ? y < tieLimit(bestY) : stryMutAct_9fa48("366") ? true : (stryCov_9fa48("366", "367", "368"), y <= tieLimit(bestY))) && (stryMutAct_9fa48("371") ? w <= bestW : stryMutAct_9fa48("370") ? w >= bestW : stryMutAct_9fa48("369") ? true : (stryCov_9fa48("369", "370", "371"), w > bestW)));
        if (stryMutAct_9fa48("374") ? lower && tiesFurtherRight : stryMutAct_9fa48("373") ? false : stryMutAct_9fa48("372") ? true : (stryCov_9fa48("372", "373", "374"), lower || tiesFurtherRight)) [bestW, bestY] = stryMutAct_9fa48("375") ? [] : (stryCov_9fa48("375"), [w, y]);
      }
    }
    // The tie rule over the whole span: on a flat envelope the grid's rounding
    // wobble makes many local minima, and the one at the largest wing loading
    // need not be among the candidates. Any grid point right of the best that
    // ties with it wins, moved right across the tie.
    const limit = tieLimit(bestY);
    for (let i = stryMutAct_9fa48("376") ? ws.length + 1 : (stryCov_9fa48("376"), ws.length - 1); stryMutAct_9fa48("378") ? i >= 0 || ws[i] > bestW : stryMutAct_9fa48("377") ? false : (stryCov_9fa48("377", "378"), (stryMutAct_9fa48("381") ? i < 0 : stryMutAct_9fa48("380") ? i > 0 : stryMutAct_9fa48("379") ? true : (stryCov_9fa48("379", "380", "381"), i >= 0)) && (stryMutAct_9fa48("384") ? ws[i] <= bestW : stryMutAct_9fa48("383") ? ws[i] >= bestW : stryMutAct_9fa48("382") ? true : (stryCov_9fa48("382", "383", "384"), ws[i] > bestW))); stryMutAct_9fa48("385") ? i++ : (stryCov_9fa48("385"), i--)) {
      if (stryMutAct_9fa48("386")) {
        {}
      } else {
        stryCov_9fa48("386");
        if (stryMutAct_9fa48("390") ? ys[i] > limit : stryMutAct_9fa48("389") ? ys[i] < limit : stryMutAct_9fa48("388") ? false : stryMutAct_9fa48("387") ? true : (stryCov_9fa48("387", "388", "389", "390"), ys[i] <= limit)) {
          if (stryMutAct_9fa48("391")) {
            {}
          } else {
            stryCov_9fa48("391");
            bestW = (stryMutAct_9fa48("395") ? i >= ws.length - 1 : stryMutAct_9fa48("394") ? i <= ws.length - 1 : stryMutAct_9fa48("393") ? false : stryMutAct_9fa48("392") ? true : (stryCov_9fa48("392", "393", "394", "395"), i < (stryMutAct_9fa48("396") ? ws.length + 1 : (stryCov_9fa48("396"), ws.length - 1)))) ? lastWithin(f, ws[i], ws[stryMutAct_9fa48("397") ? i - 1 : (stryCov_9fa48("397"), i + 1)], limit) : ws[i];
            break;
          }
        }
      }
    }
    return stryMutAct_9fa48("398") ? {} : (stryCov_9fa48("398"), {
      wingLoadingPa: bestW,
      loading: f(bestW),
      unbounded: unbounded(bestW)
    });
  }
}
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
const tieLimit = stryMutAct_9fa48("882") ? () => undefined : (stryCov_9fa48("882"), (() => {
  const tieLimit = (y: number): number => tieBand(y, TIE_TOLERANCE);
  return tieLimit;
})());

/** Index of the lowest finite value (ties to the largest index); -1 if none is finite. */
function lowestIndex(ys: Float64Array): number {
  if (stryMutAct_9fa48("883")) {
    {}
  } else {
    stryCov_9fa48("883");
    let best = stryMutAct_9fa48("884") ? +1 : (stryCov_9fa48("884"), -1);
    for (let i = 0; stryMutAct_9fa48("887") ? i >= ys.length : stryMutAct_9fa48("886") ? i <= ys.length : stryMutAct_9fa48("885") ? false : (stryCov_9fa48("885", "886", "887"), i < ys.length); stryMutAct_9fa48("888") ? i-- : (stryCov_9fa48("888"), i++)) {
      if (stryMutAct_9fa48("889")) {
        {}
      } else {
        stryCov_9fa48("889");
        if (stryMutAct_9fa48("892") ? ys[i] <= Infinity || best < 0 || ys[i] <= tieLimit(ys[best]) : stryMutAct_9fa48("891") ? false : stryMutAct_9fa48("890") ? true : (stryCov_9fa48("890", "891", "892"), (stryMutAct_9fa48("895") ? ys[i] > Infinity : stryMutAct_9fa48("894") ? ys[i] < Infinity : stryMutAct_9fa48("893") ? true : (stryCov_9fa48("893", "894", "895"), ys[i] <= Infinity)) && (stryMutAct_9fa48("897") ? best < 0 && ys[i] <= tieLimit(ys[best]) : stryMutAct_9fa48("896") ? true : (stryCov_9fa48("896", "897"), (stryMutAct_9fa48("900") ? best >= 0 : stryMutAct_9fa48("899") ? best <= 0 : stryMutAct_9fa48("898") ? false : (stryCov_9fa48("898", "899", "900"), best < 0)) || (stryMutAct_9fa48("903") ? ys[i] > tieLimit(ys[best]) : stryMutAct_9fa48("902") ? ys[i] < tieLimit(ys[best]) : stryMutAct_9fa48("901") ? false : (stryCov_9fa48("901", "902", "903"), ys[i] <= tieLimit(ys[best]))))))) best = i;
      }
    }
    return best;
  }
}

/** Indices of the low local minima of a grid, lowest first; a flat run is represented by its last point. */
function candidateMinima(ys: Float64Array, lowest: number): number[] {
  if (stryMutAct_9fa48("904")) {
    {}
  } else {
    stryCov_9fa48("904");
    const band = stryMutAct_9fa48("905") ? lowest - Math.abs(lowest) * CANDIDATE_BAND : (stryCov_9fa48("905"), lowest + (stryMutAct_9fa48("906") ? Math.abs(lowest) / CANDIDATE_BAND : (stryCov_9fa48("906"), Math.abs(lowest) * CANDIDATE_BAND)));
    const out: number[] = stryMutAct_9fa48("907") ? ["Stryker was here"] : (stryCov_9fa48("907"), []);
    for (let i = 0; stryMutAct_9fa48("910") ? i >= ys.length : stryMutAct_9fa48("909") ? i <= ys.length : stryMutAct_9fa48("908") ? false : (stryCov_9fa48("908", "909", "910"), i < ys.length); stryMutAct_9fa48("911") ? i-- : (stryCov_9fa48("911"), i++)) {
      if (stryMutAct_9fa48("912")) {
        {}
      } else {
        stryCov_9fa48("912");
        const y = ys[i];
        if (stryMutAct_9fa48("915") ? false : stryMutAct_9fa48("914") ? true : stryMutAct_9fa48("913") ? y <= band : (stryCov_9fa48("913", "914", "915"), !(stryMutAct_9fa48("919") ? y > band : stryMutAct_9fa48("918") ? y < band : stryMutAct_9fa48("917") ? false : stryMutAct_9fa48("916") ? true : (stryCov_9fa48("916", "917", "918", "919"), y <= band)))) continue;
        const left = (stryMutAct_9fa48("923") ? i <= 0 : stryMutAct_9fa48("922") ? i >= 0 : stryMutAct_9fa48("921") ? false : stryMutAct_9fa48("920") ? true : (stryCov_9fa48("920", "921", "922", "923"), i > 0)) ? ys[stryMutAct_9fa48("924") ? i + 1 : (stryCov_9fa48("924"), i - 1)] : NaN;
        const next = (stryMutAct_9fa48("928") ? i >= ys.length - 1 : stryMutAct_9fa48("927") ? i <= ys.length - 1 : stryMutAct_9fa48("926") ? false : stryMutAct_9fa48("925") ? true : (stryCov_9fa48("925", "926", "927", "928"), i < (stryMutAct_9fa48("929") ? ys.length + 1 : (stryCov_9fa48("929"), ys.length - 1)))) ? ys[stryMutAct_9fa48("930") ? i - 1 : (stryCov_9fa48("930"), i + 1)] : NaN;
        if (stryMutAct_9fa48("934") ? left >= y - Math.abs(y) * TIE_TOLERANCE : stryMutAct_9fa48("933") ? left <= y - Math.abs(y) * TIE_TOLERANCE : stryMutAct_9fa48("932") ? false : stryMutAct_9fa48("931") ? true : (stryCov_9fa48("931", "932", "933", "934"), left < (stryMutAct_9fa48("935") ? y + Math.abs(y) * TIE_TOLERANCE : (stryCov_9fa48("935"), y - (stryMutAct_9fa48("936") ? Math.abs(y) / TIE_TOLERANCE : (stryCov_9fa48("936"), Math.abs(y) * TIE_TOLERANCE)))))) continue; // not a local minimum; NaN neighbours count as higher
        if (stryMutAct_9fa48("940") ? next > tieLimit(y) : stryMutAct_9fa48("939") ? next < tieLimit(y) : stryMutAct_9fa48("938") ? false : stryMutAct_9fa48("937") ? true : (stryCov_9fa48("937", "938", "939", "940"), next <= tieLimit(y))) continue;
        out.push(i);
      }
    }
    return stryMutAct_9fa48("942") ? out.slice(0, MAX_CANDIDATES) : stryMutAct_9fa48("941") ? out.sort((p, q) => ys[p] - ys[q]) : (stryCov_9fa48("941", "942"), out.sort(stryMutAct_9fa48("943") ? () => undefined : (stryCov_9fa48("943"), (p, q) => stryMutAct_9fa48("944") ? ys[p] + ys[q] : (stryCov_9fa48("944"), ys[p] - ys[q]))).slice(0, MAX_CANDIDATES));
  }
}

/**
 * One coarse minimum refined: a fine grid over [a, b] spaced like a
 * 4000-point grid over the span, golden section around its lowest point,
 * then right across any tie.
 */
function refine(f: Envelope, a: number, b: number, span: number): [number, number] {
  if (stryMutAct_9fa48("945")) {
    {}
  } else {
    stryCov_9fa48("945");
    const n = stryMutAct_9fa48("946") ? Math.min(9, Math.ceil((b - a) * (SEARCH_GRID_POINTS - 1) / span) + 1) : (stryCov_9fa48("946"), Math.max(9, stryMutAct_9fa48("947") ? Math.ceil((b - a) * (SEARCH_GRID_POINTS - 1) / span) - 1 : (stryCov_9fa48("947"), Math.ceil(stryMutAct_9fa48("948") ? (b - a) * (SEARCH_GRID_POINTS - 1) * span : (stryCov_9fa48("948"), (stryMutAct_9fa48("949") ? (b - a) / (SEARCH_GRID_POINTS - 1) : (stryCov_9fa48("949"), (stryMutAct_9fa48("950") ? b + a : (stryCov_9fa48("950"), b - a)) * (stryMutAct_9fa48("951") ? SEARCH_GRID_POINTS + 1 : (stryCov_9fa48("951"), SEARCH_GRID_POINTS - 1)))) / span)) + 1)));
    const ws = new Float64Array(n);
    const ys = new Float64Array(n);
    for (let i = 0; stryMutAct_9fa48("954") ? i >= n : stryMutAct_9fa48("953") ? i <= n : stryMutAct_9fa48("952") ? false : (stryCov_9fa48("952", "953", "954"), i < n); stryMutAct_9fa48("955") ? i-- : (stryCov_9fa48("955"), i++)) {
      if (stryMutAct_9fa48("956")) {
        {}
      } else {
        stryCov_9fa48("956");
        ws[i] = (stryMutAct_9fa48("959") ? i !== n - 1 : stryMutAct_9fa48("958") ? false : stryMutAct_9fa48("957") ? true : (stryCov_9fa48("957", "958", "959"), i === (stryMutAct_9fa48("960") ? n + 1 : (stryCov_9fa48("960"), n - 1)))) ? b : stryMutAct_9fa48("961") ? a - (b - a) * i / (n - 1) : (stryCov_9fa48("961"), a + (stryMutAct_9fa48("962") ? (b - a) * i * (n - 1) : (stryCov_9fa48("962"), (stryMutAct_9fa48("963") ? (b - a) / i : (stryCov_9fa48("963"), (stryMutAct_9fa48("964") ? b + a : (stryCov_9fa48("964"), b - a)) * i)) / (stryMutAct_9fa48("965") ? n + 1 : (stryCov_9fa48("965"), n - 1)))));
        ys[i] = f(ws[i]);
      }
    }
    const j = lowestIndex(ys);
    let w = ws[j];
    let y = ys[j];
    const [gw, gy] = goldenMinimum(f, ws[stryMutAct_9fa48("966") ? Math.min(0, j - 1) : (stryCov_9fa48("966"), Math.max(0, stryMutAct_9fa48("967") ? j + 1 : (stryCov_9fa48("967"), j - 1)))], ws[stryMutAct_9fa48("968") ? Math.max(n - 1, j + 1) : (stryCov_9fa48("968"), Math.min(stryMutAct_9fa48("969") ? n + 1 : (stryCov_9fa48("969"), n - 1), stryMutAct_9fa48("970") ? j - 1 : (stryCov_9fa48("970"), j + 1)))]);
    if (stryMutAct_9fa48("974") ? gy >= y : stryMutAct_9fa48("973") ? gy <= y : stryMutAct_9fa48("972") ? false : stryMutAct_9fa48("971") ? true : (stryCov_9fa48("971", "972", "973", "974"), gy < y)) [w, y] = stryMutAct_9fa48("975") ? [] : (stryCov_9fa48("975"), [gw, gy]);
    if (stryMutAct_9fa48("979") ? j >= n - 1 : stryMutAct_9fa48("978") ? j <= n - 1 : stryMutAct_9fa48("977") ? false : stryMutAct_9fa48("976") ? true : (stryCov_9fa48("976", "977", "978", "979"), j < (stryMutAct_9fa48("980") ? n + 1 : (stryCov_9fa48("980"), n - 1)))) w = lastWithin(f, w, ws[stryMutAct_9fa48("981") ? j - 1 : (stryCov_9fa48("981"), j + 1)], tieLimit(y));
    return stryMutAct_9fa48("982") ? [] : (stryCov_9fa48("982"), [w, y]);
  }
}

/** The coarse grid: the caller's samples left of `right`, then `right` itself; else an even grid. */
function coarseGrid(f: Envelope, lo: number, right: number, samples?: EnvelopeSamples): [Float64Array, Float64Array] {
  if (stryMutAct_9fa48("983")) {
    {}
  } else {
    stryCov_9fa48("983");
    if (stryMutAct_9fa48("985") ? false : stryMutAct_9fa48("984") ? true : (stryCov_9fa48("984", "985"), samples)) {
      if (stryMutAct_9fa48("986")) {
        {}
      } else {
        stryCov_9fa48("986");
        let m = 0;
        while (stryMutAct_9fa48("988") ? m < samples.wingLoadingsPa.length || samples.wingLoadingsPa[m] < right : stryMutAct_9fa48("987") ? false : (stryCov_9fa48("987", "988"), (stryMutAct_9fa48("991") ? m >= samples.wingLoadingsPa.length : stryMutAct_9fa48("990") ? m <= samples.wingLoadingsPa.length : stryMutAct_9fa48("989") ? true : (stryCov_9fa48("989", "990", "991"), m < samples.wingLoadingsPa.length)) && (stryMutAct_9fa48("994") ? samples.wingLoadingsPa[m] >= right : stryMutAct_9fa48("993") ? samples.wingLoadingsPa[m] <= right : stryMutAct_9fa48("992") ? true : (stryCov_9fa48("992", "993", "994"), samples.wingLoadingsPa[m] < right)))) stryMutAct_9fa48("995") ? m-- : (stryCov_9fa48("995"), m++);
        const ws = new Float64Array(stryMutAct_9fa48("996") ? m - 1 : (stryCov_9fa48("996"), m + 1));
        const ys = new Float64Array(stryMutAct_9fa48("997") ? m - 1 : (stryCov_9fa48("997"), m + 1));
        ws.set(samples.wingLoadingsPa.subarray(0, m));
        ys.set(samples.envelope.subarray(0, m));
        ws[m] = right;
        ys[m] = f(right);
        return stryMutAct_9fa48("998") ? [] : (stryCov_9fa48("998"), [ws, ys]);
      }
    }
    const ws = new Float64Array(COARSE_GRID_POINTS);
    const ys = new Float64Array(COARSE_GRID_POINTS);
    for (let i = 0; stryMutAct_9fa48("1001") ? i >= COARSE_GRID_POINTS : stryMutAct_9fa48("1000") ? i <= COARSE_GRID_POINTS : stryMutAct_9fa48("999") ? false : (stryCov_9fa48("999", "1000", "1001"), i < COARSE_GRID_POINTS); stryMutAct_9fa48("1002") ? i-- : (stryCov_9fa48("1002"), i++)) {
      if (stryMutAct_9fa48("1003")) {
        {}
      } else {
        stryCov_9fa48("1003");
        ws[i] = (stryMutAct_9fa48("1006") ? i !== COARSE_GRID_POINTS - 1 : stryMutAct_9fa48("1005") ? false : stryMutAct_9fa48("1004") ? true : (stryCov_9fa48("1004", "1005", "1006"), i === (stryMutAct_9fa48("1007") ? COARSE_GRID_POINTS + 1 : (stryCov_9fa48("1007"), COARSE_GRID_POINTS - 1)))) ? right : stryMutAct_9fa48("1008") ? lo - (right - lo) * i / (COARSE_GRID_POINTS - 1) : (stryCov_9fa48("1008"), lo + (stryMutAct_9fa48("1009") ? (right - lo) * i * (COARSE_GRID_POINTS - 1) : (stryCov_9fa48("1009"), (stryMutAct_9fa48("1010") ? (right - lo) / i : (stryCov_9fa48("1010"), (stryMutAct_9fa48("1011") ? right + lo : (stryCov_9fa48("1011"), right - lo)) * i)) / (stryMutAct_9fa48("1012") ? COARSE_GRID_POINTS + 1 : (stryCov_9fa48("1012"), COARSE_GRID_POINTS - 1)))));
        ys[i] = f(ws[i]);
      }
    }
    return stryMutAct_9fa48("1013") ? [] : (stryCov_9fa48("1013"), [ws, ys]);
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
  if (stryMutAct_9fa48("1014")) {
    {}
  } else {
    stryCov_9fa48("1014");
    const [lo, hi] = range;
    const right = stryMutAct_9fa48("1015") ? Math.max(capPa, hi) : (stryCov_9fa48("1015"), Math.min(capPa, hi));
    if (stryMutAct_9fa48("1018") ? false : stryMutAct_9fa48("1017") ? true : stryMutAct_9fa48("1016") ? right >= lo : (stryCov_9fa48("1016", "1017", "1018"), !(stryMutAct_9fa48("1022") ? right < lo : stryMutAct_9fa48("1021") ? right > lo : stryMutAct_9fa48("1020") ? false : stryMutAct_9fa48("1019") ? true : (stryCov_9fa48("1019", "1020", "1021", "1022"), right >= lo)))) return null;
    const f = stryMutAct_9fa48("1023") ? () => undefined : (stryCov_9fa48("1023"), (() => {
      const f = (w: number): number => envelopeAt(required, w);
      return f;
    })());
    const unbounded = stryMutAct_9fa48("1024") ? () => undefined : (stryCov_9fa48("1024"), (() => {
      const unbounded = (w: number): boolean => stryMutAct_9fa48("1027") ? right === hi || w >= hi * (1 - 1e-6) : stryMutAct_9fa48("1026") ? false : stryMutAct_9fa48("1025") ? true : (stryCov_9fa48("1025", "1026", "1027"), (stryMutAct_9fa48("1029") ? right !== hi : stryMutAct_9fa48("1028") ? true : (stryCov_9fa48("1028", "1029"), right === hi)) && (stryMutAct_9fa48("1032") ? w < hi * (1 - 1e-6) : stryMutAct_9fa48("1031") ? w > hi * (1 - 1e-6) : stryMutAct_9fa48("1030") ? true : (stryCov_9fa48("1030", "1031", "1032"), w >= (stryMutAct_9fa48("1033") ? hi / (1 - 1e-6) : (stryCov_9fa48("1033"), hi * (stryMutAct_9fa48("1034") ? 1 + 1e-6 : (stryCov_9fa48("1034"), 1 - 1e-6)))))));
      return unbounded;
    })());
    if (stryMutAct_9fa48("1037") ? required.length !== 0 : stryMutAct_9fa48("1036") ? false : stryMutAct_9fa48("1035") ? true : (stryCov_9fa48("1035", "1036", "1037"), required.length === 0)) return stryMutAct_9fa48("1038") ? {} : (stryCov_9fa48("1038"), {
      wingLoadingPa: right,
      loading: 0,
      unbounded: unbounded(right)
    });
    if (stryMutAct_9fa48("1041") ? right !== lo : stryMutAct_9fa48("1040") ? false : stryMutAct_9fa48("1039") ? true : (stryCov_9fa48("1039", "1040", "1041"), right === lo)) {
      if (stryMutAct_9fa48("1042")) {
        {}
      } else {
        stryCov_9fa48("1042");
        const y = f(lo);
        return (stryMutAct_9fa48("1046") ? y > Infinity : stryMutAct_9fa48("1045") ? y < Infinity : stryMutAct_9fa48("1044") ? false : stryMutAct_9fa48("1043") ? true : (stryCov_9fa48("1043", "1044", "1045", "1046"), y <= Infinity)) ? stryMutAct_9fa48("1047") ? {} : (stryCov_9fa48("1047"), {
          wingLoadingPa: lo,
          loading: y,
          unbounded: unbounded(lo)
        }) : null;
      }
    }
    const [ws, ys] = coarseGrid(f, lo, right, samples);
    const first = lowestIndex(ys);
    if (stryMutAct_9fa48("1051") ? first >= 0 : stryMutAct_9fa48("1050") ? first <= 0 : stryMutAct_9fa48("1049") ? false : stryMutAct_9fa48("1048") ? true : (stryCov_9fa48("1048", "1049", "1050", "1051"), first < 0)) return null;
    let bestW = NaN;
    let bestY = Infinity;
    for (const i of candidateMinima(ys, ys[first])) {
      if (stryMutAct_9fa48("1052")) {
        {}
      } else {
        stryCov_9fa48("1052");
        const [w, y] = refine(f, ws[stryMutAct_9fa48("1053") ? Math.min(0, i - 1) : (stryCov_9fa48("1053"), Math.max(0, stryMutAct_9fa48("1054") ? i + 1 : (stryCov_9fa48("1054"), i - 1)))], ws[stryMutAct_9fa48("1055") ? Math.max(ws.length - 1, i + 1) : (stryCov_9fa48("1055"), Math.min(stryMutAct_9fa48("1056") ? ws.length + 1 : (stryCov_9fa48("1056"), ws.length - 1), stryMutAct_9fa48("1057") ? i - 1 : (stryCov_9fa48("1057"), i + 1)))], stryMutAct_9fa48("1058") ? right + lo : (stryCov_9fa48("1058"), right - lo));
        const lower = stryMutAct_9fa48("1059") ? bestY <= tieLimit(y) : (stryCov_9fa48("1059"), !(stryMutAct_9fa48("1063") ? bestY > tieLimit(y) : stryMutAct_9fa48("1062") ? bestY < tieLimit(y) : stryMutAct_9fa48("1061") ? false : stryMutAct_9fa48("1060") ? true : (stryCov_9fa48("1060", "1061", "1062", "1063"), bestY <= tieLimit(y))));
        const tiesFurtherRight = stryMutAct_9fa48("1066") ? y <= tieLimit(bestY) || w > bestW : stryMutAct_9fa48("1065") ? false : stryMutAct_9fa48("1064") ? true : (stryCov_9fa48("1064", "1065", "1066"), (stryMutAct_9fa48("1069") ? y > tieLimit(bestY) : stryMutAct_9fa48("1068") ? y < tieLimit(bestY) : stryMutAct_9fa48("1067") ? true : (stryCov_9fa48("1067", "1068", "1069"), y <= tieLimit(bestY))) && (stryMutAct_9fa48("1072") ? w <= bestW : stryMutAct_9fa48("1071") ? w >= bestW : stryMutAct_9fa48("1070") ? true : (stryCov_9fa48("1070", "1071", "1072"), w > bestW)));
        if (stryMutAct_9fa48("1075") ? lower && tiesFurtherRight : stryMutAct_9fa48("1074") ? false : stryMutAct_9fa48("1073") ? true : (stryCov_9fa48("1073", "1074", "1075"), lower || tiesFurtherRight)) [bestW, bestY] = stryMutAct_9fa48("1076") ? [] : (stryCov_9fa48("1076"), [w, y]);
      }
    }
    // The tie rule over the whole span: on a flat envelope the grid's rounding
    // wobble makes many local minima, and the one at the largest wing loading
    // need not be among the candidates. Any grid point right of the best that
    // ties with it wins, moved right across the tie.
    const limit = tieLimit(bestY);
    for (let i = stryMutAct_9fa48("1077") ? ws.length + 1 : (stryCov_9fa48("1077"), ws.length - 1); stryMutAct_9fa48("1079") ? i >= 0 || ws[i] > bestW : stryMutAct_9fa48("1078") ? false : (stryCov_9fa48("1078", "1079"), (stryMutAct_9fa48("1082") ? i < 0 : stryMutAct_9fa48("1081") ? i > 0 : stryMutAct_9fa48("1080") ? true : (stryCov_9fa48("1080", "1081", "1082"), i >= 0)) && (stryMutAct_9fa48("1085") ? ws[i] <= bestW : stryMutAct_9fa48("1084") ? ws[i] >= bestW : stryMutAct_9fa48("1083") ? true : (stryCov_9fa48("1083", "1084", "1085"), ws[i] > bestW))); stryMutAct_9fa48("1086") ? i++ : (stryCov_9fa48("1086"), i--)) {
      if (stryMutAct_9fa48("1087")) {
        {}
      } else {
        stryCov_9fa48("1087");
        if (stryMutAct_9fa48("1091") ? ys[i] > limit : stryMutAct_9fa48("1090") ? ys[i] < limit : stryMutAct_9fa48("1089") ? false : stryMutAct_9fa48("1088") ? true : (stryCov_9fa48("1088", "1089", "1090", "1091"), ys[i] <= limit)) {
          if (stryMutAct_9fa48("1092")) {
            {}
          } else {
            stryCov_9fa48("1092");
            bestW = (stryMutAct_9fa48("1096") ? i >= ws.length - 1 : stryMutAct_9fa48("1095") ? i <= ws.length - 1 : stryMutAct_9fa48("1094") ? false : stryMutAct_9fa48("1093") ? true : (stryCov_9fa48("1093", "1094", "1095", "1096"), i < (stryMutAct_9fa48("1097") ? ws.length + 1 : (stryCov_9fa48("1097"), ws.length - 1)))) ? lastWithin(f, ws[i], ws[stryMutAct_9fa48("1098") ? i - 1 : (stryCov_9fa48("1098"), i + 1)], limit) : ws[i];
            break;
          }
        }
      }
    }
    return stryMutAct_9fa48("1099") ? {} : (stryCov_9fa48("1099"), {
      wingLoadingPa: bestW,
      loading: f(bestW),
      unbounded: unbounded(bestW)
    });
  }
}
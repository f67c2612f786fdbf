/**
 * The envelope of the curves, E(w) = max_i y_i(w), and the wing-loading cap
 * of the limits (core/methods.md section 7).
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
import type { Boundary } from '../model';
export type CurveBoundary = Extract<Boundary, {
  type: 'curve';
}>;
export type LimitBoundary = Extract<Boundary, {
  type: 'limit';
}>;
/** Required loading at a wing loading; NaN where it cannot be met. */
export type RequiredLoading = (wingLoadingPa: number) => number;

/** E(w) = max_i y_i(w) (core/methods.md section 7); NaN where any curve cannot be met; 0 with no curves. */
export function envelopeAt(required: readonly RequiredLoading[], wingLoadingPa: number): number {
  if (stryMutAct_9fa48("422")) {
    {}
  } else {
    stryCov_9fa48("422");
    let top = 0;
    for (let i = 0; stryMutAct_9fa48("425") ? i >= required.length : stryMutAct_9fa48("424") ? i <= required.length : stryMutAct_9fa48("423") ? false : (stryCov_9fa48("423", "424", "425"), i < required.length); stryMutAct_9fa48("426") ? i-- : (stryCov_9fa48("426"), i++)) {
      if (stryMutAct_9fa48("427")) {
        {}
      } else {
        stryCov_9fa48("427");
        const y = required[i](wingLoadingPa);
        if (stryMutAct_9fa48("430") ? false : stryMutAct_9fa48("429") ? true : stryMutAct_9fa48("428") ? Number.isFinite(y) : (stryCov_9fa48("428", "429", "430"), !Number.isFinite(y))) return NaN;
        if (stryMutAct_9fa48("433") ? i === 0 && y > top : stryMutAct_9fa48("432") ? false : stryMutAct_9fa48("431") ? true : (stryCov_9fa48("431", "432", "433"), (stryMutAct_9fa48("435") ? i !== 0 : stryMutAct_9fa48("434") ? false : (stryCov_9fa48("434", "435"), i === 0)) || (stryMutAct_9fa48("438") ? y <= top : stryMutAct_9fa48("437") ? y >= top : stryMutAct_9fa48("436") ? false : (stryCov_9fa48("436", "437", "438"), y > top)))) top = y;
      }
    }
    return top;
  }
}

/** The largest of the curves that can be met at w, ignoring those that cannot; NaN when none can. */
export function definedEnvelopeAt(required: readonly RequiredLoading[], wingLoadingPa: number): number {
  if (stryMutAct_9fa48("439")) {
    {}
  } else {
    stryCov_9fa48("439");
    let top = NaN;
    for (let i = 0; stryMutAct_9fa48("442") ? i >= required.length : stryMutAct_9fa48("441") ? i <= required.length : stryMutAct_9fa48("440") ? false : (stryCov_9fa48("440", "441", "442"), i < required.length); stryMutAct_9fa48("443") ? i-- : (stryCov_9fa48("443"), i++)) {
      if (stryMutAct_9fa48("444")) {
        {}
      } else {
        stryCov_9fa48("444");
        const y = required[i](wingLoadingPa);
        if (stryMutAct_9fa48("447") ? Number.isFinite(y) || !(y <= top) : stryMutAct_9fa48("446") ? false : stryMutAct_9fa48("445") ? true : (stryCov_9fa48("445", "446", "447"), Number.isFinite(y) && (stryMutAct_9fa48("448") ? y <= top : (stryCov_9fa48("448"), !(stryMutAct_9fa48("452") ? y > top : stryMutAct_9fa48("451") ? y < top : stryMutAct_9fa48("450") ? false : stryMutAct_9fa48("449") ? true : (stryCov_9fa48("449", "450", "451", "452"), y <= top)))))) top = y;
      }
    }
    return top;
  }
}

/** The smallest wing-loading limit; Infinity with none. */
export function wingLoadingCap(limits: readonly LimitBoundary[]): number {
  if (stryMutAct_9fa48("453")) {
    {}
  } else {
    stryCov_9fa48("453");
    let cap = Infinity;
    for (const limit of limits) if (stryMutAct_9fa48("457") ? limit.wingLoadingMaxPa >= cap : stryMutAct_9fa48("456") ? limit.wingLoadingMaxPa <= cap : stryMutAct_9fa48("455") ? false : stryMutAct_9fa48("454") ? true : (stryCov_9fa48("454", "455", "456", "457"), limit.wingLoadingMaxPa < cap)) cap = limit.wingLoadingMaxPa;
    return cap;
  }
}
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
  if (stryMutAct_9fa48("8")) {
    {}
  } else {
    stryCov_9fa48("8");
    let top = 0;
    for (let i = 0; stryMutAct_9fa48("11") ? i >= required.length : stryMutAct_9fa48("10") ? i <= required.length : stryMutAct_9fa48("9") ? false : (stryCov_9fa48("9", "10", "11"), i < required.length); stryMutAct_9fa48("12") ? i-- : (stryCov_9fa48("12"), i++)) {
      if (stryMutAct_9fa48("13")) {
        {}
      } else {
        stryCov_9fa48("13");
        const y = required[i](wingLoadingPa);
        if (stryMutAct_9fa48("16") ? false : stryMutAct_9fa48("15") ? true : stryMutAct_9fa48("14") ? Number.isFinite(y) : (stryCov_9fa48("14", "15", "16"), !Number.isFinite(y))) return NaN;
        if (stryMutAct_9fa48("19") ? i === 0 && y > top : stryMutAct_9fa48("18") ? false : stryMutAct_9fa48("17") ? true : (stryCov_9fa48("17", "18", "19"), (stryMutAct_9fa48("21") ? i !== 0 : stryMutAct_9fa48("20") ? false : (stryCov_9fa48("20", "21"), i === 0)) || (stryMutAct_9fa48("24") ? y <= top : stryMutAct_9fa48("23") ? y >= top : stryMutAct_9fa48("22") ? false : (stryCov_9fa48("22", "23", "24"), y > top)))) top = y;
      }
    }
    return top;
  }
}

/** The largest of the curves that can be met at w, ignoring those that cannot; NaN when none can. */
export function definedEnvelopeAt(required: readonly RequiredLoading[], wingLoadingPa: number): number {
  if (stryMutAct_9fa48("25")) {
    {}
  } else {
    stryCov_9fa48("25");
    let top = NaN;
    for (let i = 0; stryMutAct_9fa48("28") ? i >= required.length : stryMutAct_9fa48("27") ? i <= required.length : stryMutAct_9fa48("26") ? false : (stryCov_9fa48("26", "27", "28"), i < required.length); stryMutAct_9fa48("29") ? i-- : (stryCov_9fa48("29"), i++)) {
      if (stryMutAct_9fa48("30")) {
        {}
      } else {
        stryCov_9fa48("30");
        const y = required[i](wingLoadingPa);
        if (stryMutAct_9fa48("33") ? Number.isFinite(y) || !(y <= top) : stryMutAct_9fa48("32") ? false : stryMutAct_9fa48("31") ? true : (stryCov_9fa48("31", "32", "33"), Number.isFinite(y) && (stryMutAct_9fa48("34") ? y <= top : (stryCov_9fa48("34"), !(stryMutAct_9fa48("38") ? y > top : stryMutAct_9fa48("37") ? y < top : stryMutAct_9fa48("36") ? false : stryMutAct_9fa48("35") ? true : (stryCov_9fa48("35", "36", "37", "38"), y <= top)))))) top = y;
      }
    }
    return top;
  }
}

/** The smallest wing-loading limit; Infinity with none. */
export function wingLoadingCap(limits: readonly LimitBoundary[]): number {
  if (stryMutAct_9fa48("39")) {
    {}
  } else {
    stryCov_9fa48("39");
    let cap = Infinity;
    for (const limit of limits) if (stryMutAct_9fa48("43") ? limit.wingLoadingMaxPa >= cap : stryMutAct_9fa48("42") ? limit.wingLoadingMaxPa <= cap : stryMutAct_9fa48("41") ? false : stryMutAct_9fa48("40") ? true : (stryCov_9fa48("40", "41", "42", "43"), limit.wingLoadingMaxPa < cap)) cap = limit.wingLoadingMaxPa;
    return cap;
  }
}
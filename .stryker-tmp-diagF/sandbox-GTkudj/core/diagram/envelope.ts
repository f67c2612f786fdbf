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
  if (stryMutAct_9fa48("120")) {
    {}
  } else {
    stryCov_9fa48("120");
    let top = 0;
    for (let i = 0; stryMutAct_9fa48("123") ? i >= required.length : stryMutAct_9fa48("122") ? i <= required.length : stryMutAct_9fa48("121") ? false : (stryCov_9fa48("121", "122", "123"), i < required.length); stryMutAct_9fa48("124") ? i-- : (stryCov_9fa48("124"), i++)) {
      if (stryMutAct_9fa48("125")) {
        {}
      } else {
        stryCov_9fa48("125");
        const y = required[i](wingLoadingPa);
        if (stryMutAct_9fa48("128") ? false : stryMutAct_9fa48("127") ? true : stryMutAct_9fa48("126") ? Number.isFinite(y) : (stryCov_9fa48("126", "127", "128"), !Number.isFinite(y))) return NaN;
        if (stryMutAct_9fa48("131") ? i === 0 && y > top : stryMutAct_9fa48("130") ? false : stryMutAct_9fa48("129") ? true : (stryCov_9fa48("129", "130", "131"), (stryMutAct_9fa48("133") ? i !== 0 : stryMutAct_9fa48("132") ? false : (stryCov_9fa48("132", "133"), i === 0)) || (stryMutAct_9fa48("136") ? y <= top : stryMutAct_9fa48("135") ? y >= top : stryMutAct_9fa48("134") ? false : (stryCov_9fa48("134", "135", "136"), y > top)))) top = y;
      }
    }
    return top;
  }
}

/** The largest of the curves that can be met at w, ignoring those that cannot; NaN when none can. */
export function definedEnvelopeAt(required: readonly RequiredLoading[], wingLoadingPa: number): number {
  if (stryMutAct_9fa48("137")) {
    {}
  } else {
    stryCov_9fa48("137");
    let top = NaN;
    for (let i = 0; stryMutAct_9fa48("140") ? i >= required.length : stryMutAct_9fa48("139") ? i <= required.length : stryMutAct_9fa48("138") ? false : (stryCov_9fa48("138", "139", "140"), i < required.length); stryMutAct_9fa48("141") ? i-- : (stryCov_9fa48("141"), i++)) {
      if (stryMutAct_9fa48("142")) {
        {}
      } else {
        stryCov_9fa48("142");
        const y = required[i](wingLoadingPa);
        if (stryMutAct_9fa48("145") ? Number.isFinite(y) || !(y <= top) : stryMutAct_9fa48("144") ? false : stryMutAct_9fa48("143") ? true : (stryCov_9fa48("143", "144", "145"), Number.isFinite(y) && (stryMutAct_9fa48("146") ? y <= top : (stryCov_9fa48("146"), !(stryMutAct_9fa48("150") ? y > top : stryMutAct_9fa48("149") ? y < top : stryMutAct_9fa48("148") ? false : stryMutAct_9fa48("147") ? true : (stryCov_9fa48("147", "148", "149", "150"), y <= top)))))) top = y;
      }
    }
    return top;
  }
}

/** The smallest wing-loading limit; Infinity with none. */
export function wingLoadingCap(limits: readonly LimitBoundary[]): number {
  if (stryMutAct_9fa48("151")) {
    {}
  } else {
    stryCov_9fa48("151");
    let cap = Infinity;
    for (const limit of limits) if (stryMutAct_9fa48("155") ? limit.wingLoadingMaxPa >= cap : stryMutAct_9fa48("154") ? limit.wingLoadingMaxPa <= cap : stryMutAct_9fa48("153") ? false : stryMutAct_9fa48("152") ? true : (stryCov_9fa48("152", "153", "154", "155"), limit.wingLoadingMaxPa < cap)) cap = limit.wingLoadingMaxPa;
    return cap;
  }
}
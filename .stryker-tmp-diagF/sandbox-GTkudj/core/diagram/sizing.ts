/**
 * A point of the diagram turned into wing area and installed power or thrust
 * at take-off mass (core/methods.md section 7).
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
import type { Aircraft, LoadingAxis } from '../model';
import type { SizingJson } from '../evaluation';
import { G0 } from '../units/factors';

/** S = W_TO/w; P_SL or T_SL = y W_TO, all engines, and per engine; W_TO = m g0. */
export function sizingAt(aircraft: Aircraft, axis: LoadingAxis, wingLoadingPa: number, loading: number): SizingJson {
  if (stryMutAct_9fa48("583")) {
    {}
  } else {
    stryCov_9fa48("583");
    const takeoffWeight = stryMutAct_9fa48("584") ? aircraft.takeoffMassKg / G0 : (stryCov_9fa48("584"), aircraft.takeoffMassKg * G0);
    const installed = stryMutAct_9fa48("585") ? loading / takeoffWeight : (stryCov_9fa48("585"), loading * takeoffWeight);
    const key = (stryMutAct_9fa48("588") ? axis !== 'thrustToWeight' : stryMutAct_9fa48("587") ? false : stryMutAct_9fa48("586") ? true : (stryCov_9fa48("586", "587", "588"), axis === (stryMutAct_9fa48("589") ? "" : (stryCov_9fa48("589"), 'thrustToWeight')))) ? stryMutAct_9fa48("590") ? "" : (stryCov_9fa48("590"), 'thrust') : stryMutAct_9fa48("591") ? "" : (stryCov_9fa48("591"), 'power');
    return stryMutAct_9fa48("592") ? {} : (stryCov_9fa48("592"), {
      wingArea: stryMutAct_9fa48("593") ? takeoffWeight * wingLoadingPa : (stryCov_9fa48("593"), takeoffWeight / wingLoadingPa),
      [key]: installed,
      perEngine: stryMutAct_9fa48("594") ? installed * aircraft.propulsion.engines : (stryCov_9fa48("594"), installed / aircraft.propulsion.engines),
      takeoffWeight
    });
  }
}
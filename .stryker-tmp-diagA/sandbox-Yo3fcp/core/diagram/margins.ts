/**
 * How far a point on the diagram is from each requirement (core/methods.md
 * section 7). Positive means met.
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
import type { Boundary, Design, DesignPoint } from '../model';
import type { MarginJson } from '../evaluation';
import { requirementBoundaries, type RequirementBoundary } from './boundaries';

/** Margins within this of zero still count as met, so the optimum itself is feasible. */
export const FEASIBLE_TOLERANCE = 1e-9;

/**
 * Limit: 1 - w/w_lim. Curve: y/y_i(w) - 1, which is -1 where the curve cannot
 * be met at any loading. A non-positive required loading is no requirement an
 * aircraft can have (the concept reader rejects the inputs that give one), so
 * it counts as not met (-1) rather than as met by any margin.
 */
export function marginOf(boundary: Boundary, wingLoadingPa: number, loading: number): number {
  if (stryMutAct_9fa48("128")) {
    {}
  } else {
    stryCov_9fa48("128");
    if (stryMutAct_9fa48("131") ? boundary.type !== 'limit' : stryMutAct_9fa48("130") ? false : stryMutAct_9fa48("129") ? true : (stryCov_9fa48("129", "130", "131"), boundary.type === (stryMutAct_9fa48("132") ? "" : (stryCov_9fa48("132"), 'limit')))) {
      if (stryMutAct_9fa48("133")) {
        {}
      } else {
        stryCov_9fa48("133");
        const limit = boundary.wingLoadingMaxPa;
        return (stryMutAct_9fa48("137") ? limit <= 0 : stryMutAct_9fa48("136") ? limit >= 0 : stryMutAct_9fa48("135") ? false : stryMutAct_9fa48("134") ? true : (stryCov_9fa48("134", "135", "136", "137"), limit > 0)) ? stryMutAct_9fa48("138") ? 1 + wingLoadingPa / limit : (stryCov_9fa48("138"), 1 - (stryMutAct_9fa48("139") ? wingLoadingPa * limit : (stryCov_9fa48("139"), wingLoadingPa / limit))) : stryMutAct_9fa48("140") ? +1 : (stryCov_9fa48("140"), -1);
      }
    }
    // Past a curve's stall line it is a limit: 1 - w/w_stall, not "no thrust can meet it".
    const stall = boundary.stallLimitPa;
    if (stryMutAct_9fa48("143") ? stall !== undefined && stall > 0 || wingLoadingPa > stall : stryMutAct_9fa48("142") ? false : stryMutAct_9fa48("141") ? true : (stryCov_9fa48("141", "142", "143"), (stryMutAct_9fa48("145") ? stall !== undefined || stall > 0 : stryMutAct_9fa48("144") ? true : (stryCov_9fa48("144", "145"), (stryMutAct_9fa48("147") ? stall === undefined : stryMutAct_9fa48("146") ? true : (stryCov_9fa48("146", "147"), stall !== undefined)) && (stryMutAct_9fa48("150") ? stall <= 0 : stryMutAct_9fa48("149") ? stall >= 0 : stryMutAct_9fa48("148") ? true : (stryCov_9fa48("148", "149", "150"), stall > 0)))) && (stryMutAct_9fa48("153") ? wingLoadingPa <= stall : stryMutAct_9fa48("152") ? wingLoadingPa >= stall : stryMutAct_9fa48("151") ? true : (stryCov_9fa48("151", "152", "153"), wingLoadingPa > stall)))) return stryMutAct_9fa48("154") ? 1 + wingLoadingPa / stall : (stryCov_9fa48("154"), 1 - (stryMutAct_9fa48("155") ? wingLoadingPa * stall : (stryCov_9fa48("155"), wingLoadingPa / stall)));
    const required = boundary.required(wingLoadingPa);
    if (stryMutAct_9fa48("158") ? !Number.isFinite(required) && !(required > 0) : stryMutAct_9fa48("157") ? false : stryMutAct_9fa48("156") ? true : (stryCov_9fa48("156", "157", "158"), (stryMutAct_9fa48("159") ? Number.isFinite(required) : (stryCov_9fa48("159"), !Number.isFinite(required))) || (stryMutAct_9fa48("160") ? required > 0 : (stryCov_9fa48("160"), !(stryMutAct_9fa48("164") ? required <= 0 : stryMutAct_9fa48("163") ? required >= 0 : stryMutAct_9fa48("162") ? false : stryMutAct_9fa48("161") ? true : (stryCov_9fa48("161", "162", "163", "164"), required > 0)))))) return stryMutAct_9fa48("165") ? +1 : (stryCov_9fa48("165"), -1);
    const margin = stryMutAct_9fa48("166") ? loading / required + 1 : (stryCov_9fa48("166"), (stryMutAct_9fa48("167") ? loading * required : (stryCov_9fa48("167"), loading / required)) - 1);
    return Number.isFinite(margin) ? margin : stryMutAct_9fa48("168") ? +1 : (stryCov_9fa48("168"), -1);
  }
}
export function marginsFor(entries: readonly RequirementBoundary[], wingLoadingPa: number, loading: number): MarginJson[] {
  if (stryMutAct_9fa48("169")) {
    {}
  } else {
    stryCov_9fa48("169");
    return entries.map(stryMutAct_9fa48("170") ? () => undefined : (stryCov_9fa48("170"), ({
      boundary
    }) => stryMutAct_9fa48("171") ? {} : (stryCov_9fa48("171"), {
      id: boundary.id,
      margin: marginOf(boundary, wingLoadingPa, loading)
    })));
  }
}

/** True when every margin is met (within FEASIBLE_TOLERANCE). */
export function allMet(margins: readonly MarginJson[]): boolean {
  if (stryMutAct_9fa48("172")) {
    {}
  } else {
    stryCov_9fa48("172");
    return stryMutAct_9fa48("173") ? margins.some(m => m.margin >= -FEASIBLE_TOLERANCE) : (stryCov_9fa48("173"), margins.every(stryMutAct_9fa48("174") ? () => undefined : (stryCov_9fa48("174"), m => stryMutAct_9fa48("178") ? m.margin < -FEASIBLE_TOLERANCE : stryMutAct_9fa48("177") ? m.margin > -FEASIBLE_TOLERANCE : stryMutAct_9fa48("176") ? false : stryMutAct_9fa48("175") ? true : (stryCov_9fa48("175", "176", "177", "178"), m.margin >= (stryMutAct_9fa48("179") ? +FEASIBLE_TOLERANCE : (stryCov_9fa48("179"), -FEASIBLE_TOLERANCE))))));
  }
}

/** The margin of every enabled requirement at a point of the diagram. */
export function marginsAt(design: Design, point: DesignPoint): MarginJson[] {
  if (stryMutAct_9fa48("180")) {
    {}
  } else {
    stryCov_9fa48("180");
    return marginsFor(requirementBoundaries(design), point.wingLoadingPa, point.loading);
  }
}
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
  if (stryMutAct_9fa48("829")) {
    {}
  } else {
    stryCov_9fa48("829");
    if (stryMutAct_9fa48("832") ? boundary.type !== 'limit' : stryMutAct_9fa48("831") ? false : stryMutAct_9fa48("830") ? true : (stryCov_9fa48("830", "831", "832"), boundary.type === (stryMutAct_9fa48("833") ? "" : (stryCov_9fa48("833"), 'limit')))) {
      if (stryMutAct_9fa48("834")) {
        {}
      } else {
        stryCov_9fa48("834");
        const limit = boundary.wingLoadingMaxPa;
        return (stryMutAct_9fa48("838") ? limit <= 0 : stryMutAct_9fa48("837") ? limit >= 0 : stryMutAct_9fa48("836") ? false : stryMutAct_9fa48("835") ? true : (stryCov_9fa48("835", "836", "837", "838"), limit > 0)) ? stryMutAct_9fa48("839") ? 1 + wingLoadingPa / limit : (stryCov_9fa48("839"), 1 - (stryMutAct_9fa48("840") ? wingLoadingPa * limit : (stryCov_9fa48("840"), wingLoadingPa / limit))) : stryMutAct_9fa48("841") ? +1 : (stryCov_9fa48("841"), -1);
      }
    }
    // Past a curve's stall line it is a limit: 1 - w/w_stall, not "no thrust can meet it".
    const stall = boundary.stallLimitPa;
    if (stryMutAct_9fa48("844") ? stall !== undefined && stall > 0 || wingLoadingPa > stall : stryMutAct_9fa48("843") ? false : stryMutAct_9fa48("842") ? true : (stryCov_9fa48("842", "843", "844"), (stryMutAct_9fa48("846") ? stall !== undefined || stall > 0 : stryMutAct_9fa48("845") ? true : (stryCov_9fa48("845", "846"), (stryMutAct_9fa48("848") ? stall === undefined : stryMutAct_9fa48("847") ? true : (stryCov_9fa48("847", "848"), stall !== undefined)) && (stryMutAct_9fa48("851") ? stall <= 0 : stryMutAct_9fa48("850") ? stall >= 0 : stryMutAct_9fa48("849") ? true : (stryCov_9fa48("849", "850", "851"), stall > 0)))) && (stryMutAct_9fa48("854") ? wingLoadingPa <= stall : stryMutAct_9fa48("853") ? wingLoadingPa >= stall : stryMutAct_9fa48("852") ? true : (stryCov_9fa48("852", "853", "854"), wingLoadingPa > stall)))) return stryMutAct_9fa48("855") ? 1 + wingLoadingPa / stall : (stryCov_9fa48("855"), 1 - (stryMutAct_9fa48("856") ? wingLoadingPa * stall : (stryCov_9fa48("856"), wingLoadingPa / stall)));
    const required = boundary.required(wingLoadingPa);
    if (stryMutAct_9fa48("859") ? !Number.isFinite(required) && !(required > 0) : stryMutAct_9fa48("858") ? false : stryMutAct_9fa48("857") ? true : (stryCov_9fa48("857", "858", "859"), (stryMutAct_9fa48("860") ? Number.isFinite(required) : (stryCov_9fa48("860"), !Number.isFinite(required))) || (stryMutAct_9fa48("861") ? required > 0 : (stryCov_9fa48("861"), !(stryMutAct_9fa48("865") ? required <= 0 : stryMutAct_9fa48("864") ? required >= 0 : stryMutAct_9fa48("863") ? false : stryMutAct_9fa48("862") ? true : (stryCov_9fa48("862", "863", "864", "865"), required > 0)))))) return stryMutAct_9fa48("866") ? +1 : (stryCov_9fa48("866"), -1);
    const margin = stryMutAct_9fa48("867") ? loading / required + 1 : (stryCov_9fa48("867"), (stryMutAct_9fa48("868") ? loading * required : (stryCov_9fa48("868"), loading / required)) - 1);
    return Number.isFinite(margin) ? margin : stryMutAct_9fa48("869") ? +1 : (stryCov_9fa48("869"), -1);
  }
}
export function marginsFor(entries: readonly RequirementBoundary[], wingLoadingPa: number, loading: number): MarginJson[] {
  if (stryMutAct_9fa48("870")) {
    {}
  } else {
    stryCov_9fa48("870");
    return entries.map(stryMutAct_9fa48("871") ? () => undefined : (stryCov_9fa48("871"), ({
      boundary
    }) => stryMutAct_9fa48("872") ? {} : (stryCov_9fa48("872"), {
      id: boundary.id,
      margin: marginOf(boundary, wingLoadingPa, loading)
    })));
  }
}

/** True when every margin is met (within FEASIBLE_TOLERANCE). */
export function allMet(margins: readonly MarginJson[]): boolean {
  if (stryMutAct_9fa48("873")) {
    {}
  } else {
    stryCov_9fa48("873");
    return stryMutAct_9fa48("874") ? margins.some(m => m.margin >= -FEASIBLE_TOLERANCE) : (stryCov_9fa48("874"), margins.every(stryMutAct_9fa48("875") ? () => undefined : (stryCov_9fa48("875"), m => stryMutAct_9fa48("879") ? m.margin < -FEASIBLE_TOLERANCE : stryMutAct_9fa48("878") ? m.margin > -FEASIBLE_TOLERANCE : stryMutAct_9fa48("877") ? false : stryMutAct_9fa48("876") ? true : (stryCov_9fa48("876", "877", "878", "879"), m.margin >= (stryMutAct_9fa48("880") ? +FEASIBLE_TOLERANCE : (stryCov_9fa48("880"), -FEASIBLE_TOLERANCE))))));
  }
}

/** The margin of every enabled requirement at a point of the diagram. */
export function marginsAt(design: Design, point: DesignPoint): MarginJson[] {
  if (stryMutAct_9fa48("881")) {
    {}
  } else {
    stryCov_9fa48("881");
    return marginsFor(requirementBoundaries(design), point.wingLoadingPa, point.loading);
  }
}
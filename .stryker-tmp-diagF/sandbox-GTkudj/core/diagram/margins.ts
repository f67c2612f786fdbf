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
  if (stryMutAct_9fa48("240")) {
    {}
  } else {
    stryCov_9fa48("240");
    if (stryMutAct_9fa48("243") ? boundary.type !== 'limit' : stryMutAct_9fa48("242") ? false : stryMutAct_9fa48("241") ? true : (stryCov_9fa48("241", "242", "243"), boundary.type === (stryMutAct_9fa48("244") ? "" : (stryCov_9fa48("244"), 'limit')))) {
      if (stryMutAct_9fa48("245")) {
        {}
      } else {
        stryCov_9fa48("245");
        const limit = boundary.wingLoadingMaxPa;
        return (stryMutAct_9fa48("249") ? limit <= 0 : stryMutAct_9fa48("248") ? limit >= 0 : stryMutAct_9fa48("247") ? false : stryMutAct_9fa48("246") ? true : (stryCov_9fa48("246", "247", "248", "249"), limit > 0)) ? stryMutAct_9fa48("250") ? 1 + wingLoadingPa / limit : (stryCov_9fa48("250"), 1 - (stryMutAct_9fa48("251") ? wingLoadingPa * limit : (stryCov_9fa48("251"), wingLoadingPa / limit))) : stryMutAct_9fa48("252") ? +1 : (stryCov_9fa48("252"), -1);
      }
    }
    // Past a curve's stall line it is a limit: 1 - w/w_stall, not "no thrust can meet it".
    const stall = boundary.stallLimitPa;
    if (stryMutAct_9fa48("255") ? stall !== undefined && stall > 0 || wingLoadingPa > stall : stryMutAct_9fa48("254") ? false : stryMutAct_9fa48("253") ? true : (stryCov_9fa48("253", "254", "255"), (stryMutAct_9fa48("257") ? stall !== undefined || stall > 0 : stryMutAct_9fa48("256") ? true : (stryCov_9fa48("256", "257"), (stryMutAct_9fa48("259") ? stall === undefined : stryMutAct_9fa48("258") ? true : (stryCov_9fa48("258", "259"), stall !== undefined)) && (stryMutAct_9fa48("262") ? stall <= 0 : stryMutAct_9fa48("261") ? stall >= 0 : stryMutAct_9fa48("260") ? true : (stryCov_9fa48("260", "261", "262"), stall > 0)))) && (stryMutAct_9fa48("265") ? wingLoadingPa <= stall : stryMutAct_9fa48("264") ? wingLoadingPa >= stall : stryMutAct_9fa48("263") ? true : (stryCov_9fa48("263", "264", "265"), wingLoadingPa > stall)))) return stryMutAct_9fa48("266") ? 1 + wingLoadingPa / stall : (stryCov_9fa48("266"), 1 - (stryMutAct_9fa48("267") ? wingLoadingPa * stall : (stryCov_9fa48("267"), wingLoadingPa / stall)));
    const required = boundary.required(wingLoadingPa);
    if (stryMutAct_9fa48("270") ? !Number.isFinite(required) && !(required > 0) : stryMutAct_9fa48("269") ? false : stryMutAct_9fa48("268") ? true : (stryCov_9fa48("268", "269", "270"), (stryMutAct_9fa48("271") ? Number.isFinite(required) : (stryCov_9fa48("271"), !Number.isFinite(required))) || (stryMutAct_9fa48("272") ? required > 0 : (stryCov_9fa48("272"), !(stryMutAct_9fa48("276") ? required <= 0 : stryMutAct_9fa48("275") ? required >= 0 : stryMutAct_9fa48("274") ? false : stryMutAct_9fa48("273") ? true : (stryCov_9fa48("273", "274", "275", "276"), required > 0)))))) return stryMutAct_9fa48("277") ? +1 : (stryCov_9fa48("277"), -1);
    const margin = stryMutAct_9fa48("278") ? loading / required + 1 : (stryCov_9fa48("278"), (stryMutAct_9fa48("279") ? loading * required : (stryCov_9fa48("279"), loading / required)) - 1);
    return Number.isFinite(margin) ? margin : stryMutAct_9fa48("280") ? +1 : (stryCov_9fa48("280"), -1);
  }
}
export function marginsFor(entries: readonly RequirementBoundary[], wingLoadingPa: number, loading: number): MarginJson[] {
  if (stryMutAct_9fa48("281")) {
    {}
  } else {
    stryCov_9fa48("281");
    return entries.map(stryMutAct_9fa48("282") ? () => undefined : (stryCov_9fa48("282"), ({
      boundary
    }) => stryMutAct_9fa48("283") ? {} : (stryCov_9fa48("283"), {
      id: boundary.id,
      margin: marginOf(boundary, wingLoadingPa, loading)
    })));
  }
}

/** True when every margin is met (within FEASIBLE_TOLERANCE). */
export function allMet(margins: readonly MarginJson[]): boolean {
  if (stryMutAct_9fa48("284")) {
    {}
  } else {
    stryCov_9fa48("284");
    return stryMutAct_9fa48("285") ? margins.some(m => m.margin >= -FEASIBLE_TOLERANCE) : (stryCov_9fa48("285"), margins.every(stryMutAct_9fa48("286") ? () => undefined : (stryCov_9fa48("286"), m => stryMutAct_9fa48("290") ? m.margin < -FEASIBLE_TOLERANCE : stryMutAct_9fa48("289") ? m.margin > -FEASIBLE_TOLERANCE : stryMutAct_9fa48("288") ? false : stryMutAct_9fa48("287") ? true : (stryCov_9fa48("287", "288", "289", "290"), m.margin >= (stryMutAct_9fa48("291") ? +FEASIBLE_TOLERANCE : (stryCov_9fa48("291"), -FEASIBLE_TOLERANCE))))));
  }
}

/** The margin of every enabled requirement at a point of the diagram. */
export function marginsAt(design: Design, point: DesignPoint): MarginJson[] {
  if (stryMutAct_9fa48("292")) {
    {}
  } else {
    stryCov_9fa48("292");
    return marginsFor(requirementBoundaries(design), point.wingLoadingPa, point.loading);
  }
}
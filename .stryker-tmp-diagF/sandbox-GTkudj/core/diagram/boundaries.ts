/**
 * The enabled requirements of a design, each with its boundary.
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
import { boundaryOf } from '../constraints';
import type { Boundary, Design, Requirement } from '../model';
export interface RequirementBoundary {
  /** Index in design.requirements (for field paths such as `requirements[2].speed`). */
  index: number;
  requirement: Requirement;
  boundary: Boundary;
}

/** Every enabled requirement with its boundary, in the design's order. */
export function requirementBoundaries(design: Design): RequirementBoundary[] {
  if (stryMutAct_9fa48("0")) {
    {}
  } else {
    stryCov_9fa48("0");
    const out: RequirementBoundary[] = stryMutAct_9fa48("1") ? ["Stryker was here"] : (stryCov_9fa48("1"), []);
    design.requirements.forEach((requirement, index) => {
      if (stryMutAct_9fa48("2")) {
        {}
      } else {
        stryCov_9fa48("2");
        if (stryMutAct_9fa48("4") ? false : stryMutAct_9fa48("3") ? true : (stryCov_9fa48("3", "4"), requirement.enabled)) out.push(stryMutAct_9fa48("5") ? {} : (stryCov_9fa48("5"), {
          index,
          requirement,
          boundary: boundaryOf(requirement, design.aircraft)
        }));
      }
    });
    return out;
  }
}

/** The boundaries of the enabled requirements, in the design's order. */
export function boundariesOf(design: Design): Boundary[] {
  if (stryMutAct_9fa48("6")) {
    {}
  } else {
    stryCov_9fa48("6");
    return requirementBoundaries(design).map(stryMutAct_9fa48("7") ? () => undefined : (stryCov_9fa48("7"), entry => entry.boundary));
  }
}
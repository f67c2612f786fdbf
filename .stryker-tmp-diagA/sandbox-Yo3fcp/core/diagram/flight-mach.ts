/**
 * The flight Mach number of a requirement at a wing loading: its true
 * airspeed over the speed of sound at its altitude and temperature offset.
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
import { atmosphere } from '../atmosphere';
import type { RequirementCommon } from '../requirements/common';
import type { Boundary } from '../model';

/** M = V / a, a = sqrt(gamma R T) (U.S. Standard Atmosphere 1976); undefined where the boundary has no speed there. */
export function flightMachAt(entry: {
  requirement: RequirementCommon;
  boundary: Boundary;
}, wingLoadingPa: number): number | undefined {
  if (stryMutAct_9fa48("44")) {
    {}
  } else {
    stryCov_9fa48("44");
    const {
      requirement,
      boundary
    } = entry;
    const speed = stryMutAct_9fa48("45") ? boundary.speedAt(wingLoadingPa) : (stryCov_9fa48("45"), boundary.speedAt?.(wingLoadingPa));
    if (stryMutAct_9fa48("48") ? (speed === undefined || !Number.isFinite(speed)) && !(speed > 0) : stryMutAct_9fa48("47") ? false : stryMutAct_9fa48("46") ? true : (stryCov_9fa48("46", "47", "48"), (stryMutAct_9fa48("50") ? speed === undefined && !Number.isFinite(speed) : stryMutAct_9fa48("49") ? false : (stryCov_9fa48("49", "50"), (stryMutAct_9fa48("52") ? speed !== undefined : stryMutAct_9fa48("51") ? false : (stryCov_9fa48("51", "52"), speed === undefined)) || (stryMutAct_9fa48("53") ? Number.isFinite(speed) : (stryCov_9fa48("53"), !Number.isFinite(speed))))) || (stryMutAct_9fa48("54") ? speed > 0 : (stryCov_9fa48("54"), !(stryMutAct_9fa48("58") ? speed <= 0 : stryMutAct_9fa48("57") ? speed >= 0 : stryMutAct_9fa48("56") ? false : stryMutAct_9fa48("55") ? true : (stryCov_9fa48("55", "56", "57", "58"), speed > 0)))))) return undefined;
    return stryMutAct_9fa48("59") ? speed * atmosphere(requirement.altitudeM, requirement.temperatureOffsetK).speedOfSoundMps : (stryCov_9fa48("59"), speed / atmosphere(requirement.altitudeM, requirement.temperatureOffsetK).speedOfSoundMps);
  }
}
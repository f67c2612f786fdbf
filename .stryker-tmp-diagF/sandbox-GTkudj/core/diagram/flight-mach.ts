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
  if (stryMutAct_9fa48("156")) {
    {}
  } else {
    stryCov_9fa48("156");
    const {
      requirement,
      boundary
    } = entry;
    const speed = stryMutAct_9fa48("157") ? boundary.speedAt(wingLoadingPa) : (stryCov_9fa48("157"), boundary.speedAt?.(wingLoadingPa));
    if (stryMutAct_9fa48("160") ? (speed === undefined || !Number.isFinite(speed)) && !(speed > 0) : stryMutAct_9fa48("159") ? false : stryMutAct_9fa48("158") ? true : (stryCov_9fa48("158", "159", "160"), (stryMutAct_9fa48("162") ? speed === undefined && !Number.isFinite(speed) : stryMutAct_9fa48("161") ? false : (stryCov_9fa48("161", "162"), (stryMutAct_9fa48("164") ? speed !== undefined : stryMutAct_9fa48("163") ? false : (stryCov_9fa48("163", "164"), speed === undefined)) || (stryMutAct_9fa48("165") ? Number.isFinite(speed) : (stryCov_9fa48("165"), !Number.isFinite(speed))))) || (stryMutAct_9fa48("166") ? speed > 0 : (stryCov_9fa48("166"), !(stryMutAct_9fa48("170") ? speed <= 0 : stryMutAct_9fa48("169") ? speed >= 0 : stryMutAct_9fa48("168") ? false : stryMutAct_9fa48("167") ? true : (stryCov_9fa48("167", "168", "169", "170"), speed > 0)))))) return undefined;
    return stryMutAct_9fa48("171") ? speed * atmosphere(requirement.altitudeM, requirement.temperatureOffsetK).speedOfSoundMps : (stryCov_9fa48("171"), speed / atmosphere(requirement.altitudeM, requirement.temperatureOffsetK).speedOfSoundMps);
  }
}
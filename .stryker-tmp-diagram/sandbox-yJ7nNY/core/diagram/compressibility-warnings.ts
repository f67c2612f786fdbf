/**
 * Warnings about flight Mach numbers the methods do not cover: above 0.6
 * without the wing's compressibility data, and above 1 at all.
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
import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import type { RequirementBoundary } from './boundaries';
import { flightMachAt } from './flight-mach';

/** Where compressibility drag starts to matter on a subsonic wing (common practice). */
export const COMPRESSIBILITY_MACH = 0.6;

/** One warning per requirement flown faster than the methods cover, at the given wing loading. */
export function compressibilityWarnings(entries: readonly RequirementBoundary[], design: Design, wingLoadingPa: number): WarningJson[] {
  if (stryMutAct_9fa48("186")) {
    {}
  } else {
    stryCov_9fa48("186");
    const out: WarningJson[] = stryMutAct_9fa48("187") ? ["Stryker was here"] : (stryCov_9fa48("187"), []);
    const modelled = stryMutAct_9fa48("190") ? design.aircraft.compressibility === undefined : stryMutAct_9fa48("189") ? false : stryMutAct_9fa48("188") ? true : (stryCov_9fa48("188", "189", "190"), design.aircraft.compressibility !== undefined);
    for (const entry of entries) {
      if (stryMutAct_9fa48("191")) {
        {}
      } else {
        stryCov_9fa48("191");
        const mach = flightMachAt(entry, wingLoadingPa);
        if (stryMutAct_9fa48("194") ? mach !== undefined : stryMutAct_9fa48("193") ? false : stryMutAct_9fa48("192") ? true : (stryCov_9fa48("192", "193", "194"), mach === undefined)) continue;
        const field = stryMutAct_9fa48("195") ? `` : (stryCov_9fa48("195"), `requirements[${entry.index}]`);
        const shown = mach.toFixed(2);
        if (stryMutAct_9fa48("199") ? mach <= 1 : stryMutAct_9fa48("198") ? mach >= 1 : stryMutAct_9fa48("197") ? false : stryMutAct_9fa48("196") ? true : (stryCov_9fa48("196", "197", "198", "199"), mach > 1)) {
          if (stryMutAct_9fa48("200")) {
            {}
          } else {
            stryCov_9fa48("200");
            out.push(stryMutAct_9fa48("201") ? {} : (stryCov_9fa48("201"), {
              code: stryMutAct_9fa48("202") ? "" : (stryCov_9fa48("202"), 'supersonic'),
              field,
              severity: stryMutAct_9fa48("203") ? "" : (stryCov_9fa48("203"), 'error'),
              message: stryMutAct_9fa48("204") ? `` : (stryCov_9fa48("204"), `Requirement "${entry.requirement.id}" flies at Mach ${shown}, above Mach 1: the drag polar and lapse models are subsonic, so this boundary cannot be trusted; check the speed.`)
            }));
          }
        } else if (stryMutAct_9fa48("207") ? mach > COMPRESSIBILITY_MACH || !modelled : stryMutAct_9fa48("206") ? false : stryMutAct_9fa48("205") ? true : (stryCov_9fa48("205", "206", "207"), (stryMutAct_9fa48("210") ? mach <= COMPRESSIBILITY_MACH : stryMutAct_9fa48("209") ? mach >= COMPRESSIBILITY_MACH : stryMutAct_9fa48("208") ? true : (stryCov_9fa48("208", "209", "210"), mach > COMPRESSIBILITY_MACH)) && (stryMutAct_9fa48("211") ? modelled : (stryCov_9fa48("211"), !modelled)))) {
          if (stryMutAct_9fa48("212")) {
            {}
          } else {
            stryCov_9fa48("212");
            out.push(stryMutAct_9fa48("213") ? {} : (stryCov_9fa48("213"), {
              code: stryMutAct_9fa48("214") ? "" : (stryCov_9fa48("214"), 'compressibility-not-modelled'),
              field,
              message: stryMutAct_9fa48("215") ? `` : (stryCov_9fa48("215"), `Requirement "${entry.requirement.id}" flies at Mach ${shown}: compressibility (wave drag) is not modelled; give aircraft.aero thicknessRatio, quarterChordSweep and kornFactor to include it.`)
            }));
          }
        }
      }
    }
    return out;
  }
}
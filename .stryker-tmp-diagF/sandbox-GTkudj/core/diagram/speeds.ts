/**
 * Speeds reported beside the design point: sea level ISA, take-off mass,
 * equivalent airspeeds (core/methods.md section 7).
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
import { characteristicSpeeds, stallSpeed } from '../aero/speeds';
import { polarOf, type Polar } from '../aero/drag-polar';
import { RHO0 } from '../atmosphere';
import type { Aircraft, Requirement } from '../model';
import type { SpeedsJson } from '../evaluation';

/** V_app = 1.3 V_s in the landing configuration (14 CFR 23.73). */
export const APPROACH_SPEED_FACTOR = 1.3;

/**
 * The characteristic approach speed and the words saying how it was taken:
 * the first enabled approach-speed requirement's factor, configuration and
 * landing mass, else 1.3 V_S0 at take-off mass (the small-aircraft rule).
 */
export function characteristicApproach(aircraft: Aircraft, wingLoadingPa: number, requirements: readonly Requirement[] = stryMutAct_9fa48("595") ? ["Stryker was here"] : (stryCov_9fa48("595"), [])): {
  speed: number;
  basis: string;
} {
  if (stryMutAct_9fa48("596")) {
    {}
  } else {
    stryCov_9fa48("596");
    const clean = polarOf(aircraft, 'clean') as Polar;
    const given = requirements.find(stryMutAct_9fa48("597") ? () => undefined : (stryCov_9fa48("597"), r => stryMutAct_9fa48("600") ? r.enabled || r.kind === 'approach-speed' : stryMutAct_9fa48("599") ? false : stryMutAct_9fa48("598") ? true : (stryCov_9fa48("598", "599", "600"), r.enabled && (stryMutAct_9fa48("602") ? r.kind !== 'approach-speed' : stryMutAct_9fa48("601") ? true : (stryCov_9fa48("601", "602"), r.kind === (stryMutAct_9fa48("603") ? "" : (stryCov_9fa48("603"), 'approach-speed')))))));
    if (stryMutAct_9fa48("606") ? given || given.kind === 'approach-speed' : stryMutAct_9fa48("605") ? false : stryMutAct_9fa48("604") ? true : (stryCov_9fa48("604", "605", "606"), given && (stryMutAct_9fa48("608") ? given.kind !== 'approach-speed' : stryMutAct_9fa48("607") ? true : (stryCov_9fa48("607", "608"), given.kind === (stryMutAct_9fa48("609") ? "" : (stryCov_9fa48("609"), 'approach-speed')))))) {
      if (stryMutAct_9fa48("610")) {
        {}
      } else {
        stryCov_9fa48("610");
        const polar = stryMutAct_9fa48("611") ? polarOf(aircraft, given.configuration) && clean : (stryCov_9fa48("611"), polarOf(aircraft, given.configuration) ?? clean);
        const k = Number(given.speedFactor.toFixed(3));
        const mass = Number((stryMutAct_9fa48("612") ? given.massFraction / 100 : (stryCov_9fa48("612"), given.massFraction * 100)).toFixed(1));
        return stryMutAct_9fa48("613") ? {} : (stryCov_9fa48("613"), {
          speed: stryMutAct_9fa48("614") ? given.speedFactor / stallSpeed(given.massFraction * wingLoadingPa, RHO0, polar.clMax) : (stryCov_9fa48("614"), given.speedFactor * stallSpeed(stryMutAct_9fa48("615") ? given.massFraction / wingLoadingPa : (stryCov_9fa48("615"), given.massFraction * wingLoadingPa), RHO0, polar.clMax)),
          basis: stryMutAct_9fa48("616") ? `` : (stryCov_9fa48("616"), `${k} × ${given.configuration} stall speed at ${mass} % of take-off mass (requirement "${given.id}")`)
        });
      }
    }
    const landing = stryMutAct_9fa48("617") ? polarOf(aircraft, 'landing') && clean : (stryCov_9fa48("617"), polarOf(aircraft, stryMutAct_9fa48("618") ? "" : (stryCov_9fa48("618"), 'landing')) ?? clean);
    return stryMutAct_9fa48("619") ? {} : (stryCov_9fa48("619"), {
      speed: stryMutAct_9fa48("620") ? APPROACH_SPEED_FACTOR / stallSpeed(wingLoadingPa, RHO0, landing.clMax) : (stryCov_9fa48("620"), APPROACH_SPEED_FACTOR * stallSpeed(wingLoadingPa, RHO0, landing.clMax)),
      basis: stryMutAct_9fa48("621") ? "" : (stryCov_9fa48("621"), '1.3 × landing stall speed at take-off mass (small-aircraft rule, 14 CFR 23.73)')
    });
  }
}

/** Clean stall, minimum-drag and minimum-power speeds, approach speed and each configuration's stall speed. */
export function reportedSpeeds(aircraft: Aircraft, wingLoadingPa: number, requirements: readonly Requirement[] = stryMutAct_9fa48("622") ? ["Stryker was here"] : (stryCov_9fa48("622"), [])): SpeedsJson {
  if (stryMutAct_9fa48("623")) {
    {}
  } else {
    stryCov_9fa48("623");
    const clean = polarOf(aircraft, 'clean') as Polar;
    // Keyed by configuration names as written: no prototype, so any name is just a name.
    const stallByConfiguration: Record<string, number> = Object.create(null);
    for (const [name, configuration] of Object.entries(aircraft.configurations)) {
      if (stryMutAct_9fa48("624")) {
        {}
      } else {
        stryCov_9fa48("624");
        stallByConfiguration[name] = stallSpeed(wingLoadingPa, RHO0, configuration.clMax);
      }
    }
    return stryMutAct_9fa48("625") ? {} : (stryCov_9fa48("625"), {
      ...characteristicSpeeds(clean, wingLoadingPa, RHO0),
      ...(() => {
        if (stryMutAct_9fa48("626")) {
          {}
        } else {
          stryCov_9fa48("626");
          const a = characteristicApproach(aircraft, wingLoadingPa, requirements);
          return stryMutAct_9fa48("627") ? {} : (stryCov_9fa48("627"), {
            approach: a.speed,
            approachBasis: a.basis
          });
        }
      })(),
      stallByConfiguration
    });
  }
}
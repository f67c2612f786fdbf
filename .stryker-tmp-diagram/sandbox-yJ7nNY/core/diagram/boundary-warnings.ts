/**
 * Requirements that no point of the diagram can meet, each with the field to
 * look at and the reason.
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
import { polarOf } from '../aero/drag-polar';
import type { WarningJson } from '../evaluation';
import type { Aircraft, Requirement } from '../model';
import { availableFraction } from '../propulsion/available-fraction';
import { round } from './assumption-warnings';
import { requirementKind } from '../requirements';
import type { RequirementBoundary } from './boundaries';

/** Why a requirement's curve cannot be met anywhere, when the inputs alone say so. */
function knownCause(requirement: Requirement, aircraft: Aircraft, path: string): WarningJson | undefined {
  if (stryMutAct_9fa48("113")) {
    {}
  } else {
    stryCov_9fa48("113");
    const descriptor = requirementKind(requirement.kind);
    const own = stryMutAct_9fa48("114") ? descriptor.impossible(requirement, aircraft) : (stryCov_9fa48("114"), descriptor.impossible?.(requirement, aircraft));
    if (stryMutAct_9fa48("116") ? false : stryMutAct_9fa48("115") ? true : (stryCov_9fa48("115", "116"), own)) return stryMutAct_9fa48("117") ? {} : (stryCov_9fa48("117"), {
      code: own.code,
      field: own.field ? stryMutAct_9fa48("118") ? `` : (stryCov_9fa48("118"), `${path}.${own.field}`) : path,
      message: own.message
    });
    const alpha = availableFraction(aircraft.propulsion, requirement.altitudeM, requirement.temperatureOffsetK, requirement.powerSetting);
    if (stryMutAct_9fa48("121") ? descriptor.drawnAs === 'curve' || !(alpha > 0) : stryMutAct_9fa48("120") ? false : stryMutAct_9fa48("119") ? true : (stryCov_9fa48("119", "120", "121"), (stryMutAct_9fa48("123") ? descriptor.drawnAs !== 'curve' : stryMutAct_9fa48("122") ? true : (stryCov_9fa48("122", "123"), descriptor.drawnAs === (stryMutAct_9fa48("124") ? "" : (stryCov_9fa48("124"), 'curve')))) && (stryMutAct_9fa48("125") ? alpha > 0 : (stryCov_9fa48("125"), !(stryMutAct_9fa48("129") ? alpha <= 0 : stryMutAct_9fa48("128") ? alpha >= 0 : stryMutAct_9fa48("127") ? false : stryMutAct_9fa48("126") ? true : (stryCov_9fa48("126", "127", "128", "129"), alpha > 0)))))) {
      if (stryMutAct_9fa48("130")) {
        {}
      } else {
        stryCov_9fa48("130");
        const field = (stryMutAct_9fa48("134") ? requirement.powerSetting <= 0 : stryMutAct_9fa48("133") ? requirement.powerSetting >= 0 : stryMutAct_9fa48("132") ? false : stryMutAct_9fa48("131") ? true : (stryCov_9fa48("131", "132", "133", "134"), requirement.powerSetting > 0)) ? stryMutAct_9fa48("135") ? `` : (stryCov_9fa48("135"), `${path}.altitude`) : stryMutAct_9fa48("136") ? `` : (stryCov_9fa48("136"), `${path}.powerSetting`);
        return stryMutAct_9fa48("137") ? {} : (stryCov_9fa48("137"), {
          code: stryMutAct_9fa48("138") ? "" : (stryCov_9fa48("138"), 'no-power-available'),
          field,
          message: stryMutAct_9fa48("139") ? `` : (stryCov_9fa48("139"), `No ${aircraft.propulsion.kind} power or thrust is left at this altitude and power setting (lapse x setting = ${round(alpha)}).`)
        });
      }
    }
    return undefined;
  }
}

/** Warnings about the requirements themselves, before anything is sampled. */
export function requirementInputWarnings(entries: readonly RequirementBoundary[], aircraft: Aircraft): WarningJson[] {
  if (stryMutAct_9fa48("140")) {
    {}
  } else {
    stryCov_9fa48("140");
    const out: WarningJson[] = stryMutAct_9fa48("141") ? ["Stryker was here"] : (stryCov_9fa48("141"), []);
    for (const {
      index,
      requirement
    } of entries) {
      if (stryMutAct_9fa48("142")) {
        {}
      } else {
        stryCov_9fa48("142");
        const path = stryMutAct_9fa48("143") ? `` : (stryCov_9fa48("143"), `requirements[${index}]`);
        if (stryMutAct_9fa48("146") ? polarOf(aircraft, requirement.configuration) !== undefined : stryMutAct_9fa48("145") ? false : stryMutAct_9fa48("144") ? true : (stryCov_9fa48("144", "145", "146"), polarOf(aircraft, requirement.configuration) === undefined)) {
          if (stryMutAct_9fa48("147")) {
            {}
          } else {
            stryCov_9fa48("147");
            out.push(stryMutAct_9fa48("148") ? {} : (stryCov_9fa48("148"), {
              code: stryMutAct_9fa48("149") ? "" : (stryCov_9fa48("149"), 'configuration-missing'),
              field: stryMutAct_9fa48("150") ? `` : (stryCov_9fa48("150"), `${path}.configuration`),
              message: stryMutAct_9fa48("151") ? `` : (stryCov_9fa48("151"), `Configuration "${requirement.configuration}" is not defined under aircraft.aero.configurations; the clean configuration is used.`)
            }));
          }
        }
        const cause = knownCause(requirement, aircraft, path);
        if (stryMutAct_9fa48("153") ? false : stryMutAct_9fa48("152") ? true : (stryCov_9fa48("152", "153"), cause)) out.push(cause);
      }
    }
    return out;
  }
}

/**
 * Requirements that no plotted wing loading can meet: a curve that is
 * unattainable at every sample, or a limit left of the plotted range.
 */
export function unattainableWarnings(entries: readonly RequirementBoundary[], aircraft: Aircraft, curveMet: ReadonlyMap<string, boolean>, rangeLoPa: number): WarningJson[] {
  if (stryMutAct_9fa48("154")) {
    {}
  } else {
    stryCov_9fa48("154");
    const out: WarningJson[] = stryMutAct_9fa48("155") ? ["Stryker was here"] : (stryCov_9fa48("155"), []);
    for (const {
      index,
      requirement,
      boundary
    } of entries) {
      if (stryMutAct_9fa48("156")) {
        {}
      } else {
        stryCov_9fa48("156");
        const path = stryMutAct_9fa48("157") ? `` : (stryCov_9fa48("157"), `requirements[${index}]`);
        if (stryMutAct_9fa48("160") ? boundary.type !== 'limit' : stryMutAct_9fa48("159") ? false : stryMutAct_9fa48("158") ? true : (stryCov_9fa48("158", "159", "160"), boundary.type === (stryMutAct_9fa48("161") ? "" : (stryCov_9fa48("161"), 'limit')))) {
          if (stryMutAct_9fa48("162")) {
            {}
          } else {
            stryCov_9fa48("162");
            if (stryMutAct_9fa48("166") ? boundary.wingLoadingMaxPa >= rangeLoPa : stryMutAct_9fa48("165") ? boundary.wingLoadingMaxPa <= rangeLoPa : stryMutAct_9fa48("164") ? false : stryMutAct_9fa48("163") ? true : (stryCov_9fa48("163", "164", "165", "166"), boundary.wingLoadingMaxPa < rangeLoPa)) {
              if (stryMutAct_9fa48("167")) {
                {}
              } else {
                stryCov_9fa48("167");
                out.push(stryMutAct_9fa48("168") ? {} : (stryCov_9fa48("168"), {
                  code: stryMutAct_9fa48("169") ? "" : (stryCov_9fa48("169"), 'limit-below-range'),
                  field: path,
                  message: stryMutAct_9fa48("170") ? `` : (stryCov_9fa48("170"), `Requirement "${requirement.id}" allows at most ${round(boundary.wingLoadingMaxPa)} N/m^2 of wing loading, left of the plotted range (from ${round(rangeLoPa)} N/m^2).`)
                }));
              }
            }
            continue;
          }
        }
        if (stryMutAct_9fa48("173") ? curveMet.get(boundary.id) !== false && knownCause(requirement, aircraft, path) : stryMutAct_9fa48("172") ? false : stryMutAct_9fa48("171") ? true : (stryCov_9fa48("171", "172", "173"), (stryMutAct_9fa48("175") ? curveMet.get(boundary.id) === false : stryMutAct_9fa48("174") ? false : (stryCov_9fa48("174", "175"), curveMet.get(boundary.id) !== (stryMutAct_9fa48("176") ? true : (stryCov_9fa48("176"), false)))) || knownCause(requirement, aircraft, path))) continue;
        const speedField = stryMutAct_9fa48("177") ? requirementKind(requirement.kind).unattainableField(requirement) : (stryCov_9fa48("177"), requirementKind(requirement.kind).unattainableField?.(requirement));
        const bySpeed = stryMutAct_9fa48("180") ? speedField === undefined : stryMutAct_9fa48("179") ? false : stryMutAct_9fa48("178") ? true : (stryCov_9fa48("178", "179", "180"), speedField !== undefined);
        out.push(stryMutAct_9fa48("181") ? {} : (stryCov_9fa48("181"), {
          code: stryMutAct_9fa48("182") ? "" : (stryCov_9fa48("182"), 'requirement-unattainable'),
          field: bySpeed ? stryMutAct_9fa48("183") ? `` : (stryCov_9fa48("183"), `${path}.${speedField}`) : path,
          message: bySpeed ? stryMutAct_9fa48("184") ? `` : (stryCov_9fa48("184"), `Requirement "${requirement.id}": the speed is below the stall speed of the ${requirement.configuration} configuration at every plotted wing loading (C_L needed above C_Lmax).`) : stryMutAct_9fa48("185") ? `` : (stryCov_9fa48("185"), `Requirement "${requirement.id}" cannot be met at any plotted wing loading.`)
        }));
      }
    }
    return out;
  }
}
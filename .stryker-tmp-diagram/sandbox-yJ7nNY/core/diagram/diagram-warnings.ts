/**
 * Warnings about the diagram as a whole: where the optimum fell, the design
 * point, and characteristic speeds that cannot be flown.
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
import { polarOf, type Polar } from '../aero/drag-polar';
import { minimumDragLiftCoefficient, minimumPowerLiftCoefficient } from '../aero/lift-coefficients';
import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import { PSF_PA } from '../units/factors';
import { round } from './assumption-warnings';
import type { Optimum } from './optimum';

/** An optimum on an edge of the plot, none at all, or nothing that sets power. */
export function optimumWarnings(found: Optimum | null, range: readonly [number, number], curveCount: number, requirementCount: number): WarningJson[] {
  if (stryMutAct_9fa48("328")) {
    {}
  } else {
    stryCov_9fa48("328");
    if (stryMutAct_9fa48("331") ? requirementCount !== 0 : stryMutAct_9fa48("330") ? false : stryMutAct_9fa48("329") ? true : (stryCov_9fa48("329", "330", "331"), requirementCount === 0)) {
      if (stryMutAct_9fa48("332")) {
        {}
      } else {
        stryCov_9fa48("332");
        return stryMutAct_9fa48("333") ? [] : (stryCov_9fa48("333"), [stryMutAct_9fa48("334") ? {} : (stryCov_9fa48("334"), {
          code: stryMutAct_9fa48("335") ? "" : (stryCov_9fa48("335"), 'no-requirements'),
          field: stryMutAct_9fa48("336") ? "" : (stryCov_9fa48("336"), 'requirements'),
          message: stryMutAct_9fa48("337") ? "" : (stryCov_9fa48("337"), 'No requirement is enabled, so there is no optimum; enable or add a requirement.')
        })]);
      }
    }
    if (stryMutAct_9fa48("340") ? false : stryMutAct_9fa48("339") ? true : stryMutAct_9fa48("338") ? found : (stryCov_9fa48("338", "339", "340"), !found)) {
      if (stryMutAct_9fa48("341")) {
        {}
      } else {
        stryCov_9fa48("341");
        return stryMutAct_9fa48("342") ? [] : (stryCov_9fa48("342"), [stryMutAct_9fa48("343") ? {} : (stryCov_9fa48("343"), {
          code: stryMutAct_9fa48("344") ? "" : (stryCov_9fa48("344"), 'no-feasible-point'),
          field: stryMutAct_9fa48("345") ? "" : (stryCov_9fa48("345"), 'requirements'),
          message: stryMutAct_9fa48("346") ? "" : (stryCov_9fa48("346"), 'No plotted wing loading meets every enabled requirement; see the requirements flagged above, or widen the range.')
        })]);
      }
    }
    const out: WarningJson[] = stryMutAct_9fa48("347") ? ["Stryker was here"] : (stryCov_9fa48("347"), []);
    if (stryMutAct_9fa48("349") ? false : stryMutAct_9fa48("348") ? true : (stryCov_9fa48("348", "349"), found.unbounded)) {
      if (stryMutAct_9fa48("350")) {
        {}
      } else {
        stryCov_9fa48("350");
        out.push(stryMutAct_9fa48("351") ? {} : (stryCov_9fa48("351"), {
          code: stryMutAct_9fa48("352") ? "" : (stryCov_9fa48("352"), 'optimum-at-edge'),
          field: stryMutAct_9fa48("353") ? "" : (stryCov_9fa48("353"), 'diagram.wingLoading'),
          message: stryMutAct_9fa48("354") ? "" : (stryCov_9fa48("354"), 'The least power sits on the right edge of the plotted range: no requirement caps wing loading there. Widen the range or add a stall or landing requirement.')
        }));
      }
    } else if (stryMutAct_9fa48("357") ? curveCount > 0 || found.wingLoadingPa <= range[0] * (1 + 1e-6) : stryMutAct_9fa48("356") ? false : stryMutAct_9fa48("355") ? true : (stryCov_9fa48("355", "356", "357"), (stryMutAct_9fa48("360") ? curveCount <= 0 : stryMutAct_9fa48("359") ? curveCount >= 0 : stryMutAct_9fa48("358") ? true : (stryCov_9fa48("358", "359", "360"), curveCount > 0)) && (stryMutAct_9fa48("363") ? found.wingLoadingPa > range[0] * (1 + 1e-6) : stryMutAct_9fa48("362") ? found.wingLoadingPa < range[0] * (1 + 1e-6) : stryMutAct_9fa48("361") ? true : (stryCov_9fa48("361", "362", "363"), found.wingLoadingPa <= (stryMutAct_9fa48("364") ? range[0] / (1 + 1e-6) : (stryCov_9fa48("364"), range[0] * (stryMutAct_9fa48("365") ? 1 - 1e-6 : (stryCov_9fa48("365"), 1 + 1e-6)))))))) {
      if (stryMutAct_9fa48("366")) {
        {}
      } else {
        stryCov_9fa48("366");
        out.push(stryMutAct_9fa48("367") ? {} : (stryCov_9fa48("367"), {
          code: stryMutAct_9fa48("368") ? "" : (stryCov_9fa48("368"), 'optimum-at-edge'),
          field: stryMutAct_9fa48("369") ? "" : (stryCov_9fa48("369"), 'diagram.wingLoading'),
          message: stryMutAct_9fa48("370") ? "" : (stryCov_9fa48("370"), 'The least power sits on the left edge of the plotted range; widen the range to lower wing loadings.')
        }));
      }
    }
    if (stryMutAct_9fa48("373") ? curveCount !== 0 : stryMutAct_9fa48("372") ? false : stryMutAct_9fa48("371") ? true : (stryCov_9fa48("371", "372", "373"), curveCount === 0)) {
      if (stryMutAct_9fa48("374")) {
        {}
      } else {
        stryCov_9fa48("374");
        out.push(stryMutAct_9fa48("375") ? {} : (stryCov_9fa48("375"), {
          code: stryMutAct_9fa48("376") ? "" : (stryCov_9fa48("376"), 'no-power-requirement'),
          field: stryMutAct_9fa48("377") ? "" : (stryCov_9fa48("377"), 'requirements'),
          message: stryMutAct_9fa48("378") ? "" : (stryCov_9fa48("378"), 'No enabled requirement sets power or thrust; installed power is reported as zero.')
        }));
      }
    }
    return out;
  }
}
export function designPointWarnings(wingLoadingPa: number, range: readonly [number, number]): WarningJson[] {
  if (stryMutAct_9fa48("379")) {
    {}
  } else {
    stryCov_9fa48("379");
    const out: WarningJson[] = stryMutAct_9fa48("380") ? ["Stryker was here"] : (stryCov_9fa48("380"), []);
    if (stryMutAct_9fa48("383") ? wingLoadingPa < range[0] && wingLoadingPa > range[1] : stryMutAct_9fa48("382") ? false : stryMutAct_9fa48("381") ? true : (stryCov_9fa48("381", "382", "383"), (stryMutAct_9fa48("386") ? wingLoadingPa >= range[0] : stryMutAct_9fa48("385") ? wingLoadingPa <= range[0] : stryMutAct_9fa48("384") ? false : (stryCov_9fa48("384", "385", "386"), wingLoadingPa < range[0])) || (stryMutAct_9fa48("389") ? wingLoadingPa <= range[1] : stryMutAct_9fa48("388") ? wingLoadingPa >= range[1] : stryMutAct_9fa48("387") ? false : (stryCov_9fa48("387", "388", "389"), wingLoadingPa > range[1])))) {
      if (stryMutAct_9fa48("390")) {
        {}
      } else {
        stryCov_9fa48("390");
        out.push(stryMutAct_9fa48("391") ? {} : (stryCov_9fa48("391"), {
          code: stryMutAct_9fa48("392") ? "" : (stryCov_9fa48("392"), 'design-point-outside-range'),
          field: stryMutAct_9fa48("393") ? "" : (stryCov_9fa48("393"), 'designPoint.wingLoading'),
          message: stryMutAct_9fa48("394") ? `` : (stryCov_9fa48("394"), `The design point's wing loading ${round(wingLoadingPa)} N/m^2 is outside the plotted range.`)
        }));
      }
    }
    if (stryMutAct_9fa48("397") ? wingLoadingPa < PSF_PA && wingLoadingPa > 150 * PSF_PA : stryMutAct_9fa48("396") ? false : stryMutAct_9fa48("395") ? true : (stryCov_9fa48("395", "396", "397"), (stryMutAct_9fa48("400") ? wingLoadingPa >= PSF_PA : stryMutAct_9fa48("399") ? wingLoadingPa <= PSF_PA : stryMutAct_9fa48("398") ? false : (stryCov_9fa48("398", "399", "400"), wingLoadingPa < PSF_PA)) || (stryMutAct_9fa48("403") ? wingLoadingPa <= 150 * PSF_PA : stryMutAct_9fa48("402") ? wingLoadingPa >= 150 * PSF_PA : stryMutAct_9fa48("401") ? false : (stryCov_9fa48("401", "402", "403"), wingLoadingPa > (stryMutAct_9fa48("404") ? 150 / PSF_PA : (stryCov_9fa48("404"), 150 * PSF_PA)))))) {
      if (stryMutAct_9fa48("405")) {
        {}
      } else {
        stryCov_9fa48("405");
        out.push(stryMutAct_9fa48("406") ? {} : (stryCov_9fa48("406"), {
          code: stryMutAct_9fa48("407") ? "" : (stryCov_9fa48("407"), 'assumption-outside-typical-range'),
          field: stryMutAct_9fa48("408") ? "" : (stryCov_9fa48("408"), 'designPoint.wingLoading'),
          message: stryMutAct_9fa48("409") ? `` : (stryCov_9fa48("409"), `Wing loading ${round(wingLoadingPa)} N/m^2 is outside the typical 1-150 psf (48-7200 N/m^2) (common practice).`)
        }));
      }
    }
    return out;
  }
}
export function speedWarnings(design: Design): WarningJson[] {
  if (stryMutAct_9fa48("410")) {
    {}
  } else {
    stryCov_9fa48("410");
    const clean = polarOf(design.aircraft, 'clean') as Polar;
    const out: WarningJson[] = stryMutAct_9fa48("411") ? ["Stryker was here"] : (stryCov_9fa48("411"), []);
    for (const [name, cl] of [['minimum-drag', minimumDragLiftCoefficient(clean)], ['minimum-power', minimumPowerLiftCoefficient(clean)]] as const) {
      if (stryMutAct_9fa48("412")) {
        {}
      } else {
        stryCov_9fa48("412");
        if (stryMutAct_9fa48("416") ? cl <= clean.clMax : stryMutAct_9fa48("415") ? cl >= clean.clMax : stryMutAct_9fa48("414") ? false : stryMutAct_9fa48("413") ? true : (stryCov_9fa48("413", "414", "415", "416"), cl > clean.clMax)) {
          if (stryMutAct_9fa48("417")) {
            {}
          } else {
            stryCov_9fa48("417");
            out.push(stryMutAct_9fa48("418") ? {} : (stryCov_9fa48("418"), {
              code: stryMutAct_9fa48("419") ? "" : (stryCov_9fa48("419"), 'speed-below-stall'),
              field: stryMutAct_9fa48("420") ? "" : (stryCov_9fa48("420"), 'aircraft.aero.configurations.clean.clMax'),
              message: stryMutAct_9fa48("421") ? `` : (stryCov_9fa48("421"), `The ${name} speed needs C_L ${round(cl)}, above the clean C_Lmax ${round(clean.clMax)}: it is below the stall speed and shown for reference only.`)
            }));
          }
        }
      }
    }
    return out;
  }
}
/**
 * Assumptions outside their typical ranges (core/assumptions/typical-ranges.ts
 * and each requirement kind's own; methods reference, section 9): hints for
 * the engineer, never errors.
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
import { minimumDragCoefficient, polarOf, type Polar } from '../aero/drag-polar';
import { configurationRole } from '../assumptions/configuration-role';
import type { TypicalRange } from '../assumptions/typical-range';
import { ASPECT_RATIO, CD0_CLEAN, CLMAX, OSWALD } from '../assumptions/typical-ranges';
import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import { propulsionKind } from '../propulsion/kinds';
import { requirementKind } from '../requirements';
function check(out: WarningJson[], field: string, what: string, value: number, range: TypicalRange): void {
  if (stryMutAct_9fa48("0")) {
    {}
  } else {
    stryCov_9fa48("0");
    if (stryMutAct_9fa48("3") ? value >= range.low || value <= range.high : stryMutAct_9fa48("2") ? false : stryMutAct_9fa48("1") ? true : (stryCov_9fa48("1", "2", "3"), (stryMutAct_9fa48("6") ? value < range.low : stryMutAct_9fa48("5") ? value > range.low : stryMutAct_9fa48("4") ? true : (stryCov_9fa48("4", "5", "6"), value >= range.low)) && (stryMutAct_9fa48("9") ? value > range.high : stryMutAct_9fa48("8") ? value < range.high : stryMutAct_9fa48("7") ? true : (stryCov_9fa48("7", "8", "9"), value <= range.high)))) return;
    out.push(stryMutAct_9fa48("10") ? {} : (stryCov_9fa48("10"), {
      code: stryMutAct_9fa48("11") ? "" : (stryCov_9fa48("11"), 'assumption-outside-typical-range'),
      field,
      message: stryMutAct_9fa48("12") ? `` : (stryCov_9fa48("12"), `${what} ${round(value)} is outside the typical range: ${range.text}.`)
    }));
  }
}
export function round(x: number): string {
  if (stryMutAct_9fa48("13")) {
    {}
  } else {
    stryCov_9fa48("13");
    return Number.isFinite(x) ? String(Number(x.toPrecision(4))) : String(x);
  }
}
function configurationWarnings(design: Design, out: WarningJson[]): void {
  if (stryMutAct_9fa48("14")) {
    {}
  } else {
    stryCov_9fa48("14");
    const {
      aircraft
    } = design;
    const clean = aircraft.configurations.clean;
    const aero = stryMutAct_9fa48("15") ? "" : (stryCov_9fa48("15"), 'aircraft.aero');
    check(out, stryMutAct_9fa48("16") ? `` : (stryCov_9fa48("16"), `${aero}.aspectRatio`), stryMutAct_9fa48("17") ? "" : (stryCov_9fa48("17"), 'Aspect ratio'), aircraft.aspectRatio, ASPECT_RATIO);
    check(out, stryMutAct_9fa48("18") ? `` : (stryCov_9fa48("18"), `${aero}.configurations.clean.cd0`), stryMutAct_9fa48("19") ? "" : (stryCov_9fa48("19"), 'Clean C_D0'), clean.cd0, CD0_CLEAN);
    for (const [name, configuration] of Object.entries(aircraft.configurations)) {
      if (stryMutAct_9fa48("20")) {
        {}
      } else {
        stryCov_9fa48("20");
        const path = stryMutAct_9fa48("21") ? `` : (stryCov_9fa48("21"), `${aero}.configurations.${name}`);
        const role = configurationRole(name);
        if (stryMutAct_9fa48("24") ? name === 'clean' && configuration.oswaldEfficiency !== clean.oswaldEfficiency : stryMutAct_9fa48("23") ? false : stryMutAct_9fa48("22") ? true : (stryCov_9fa48("22", "23", "24"), (stryMutAct_9fa48("26") ? name !== 'clean' : stryMutAct_9fa48("25") ? false : (stryCov_9fa48("25", "26"), name === (stryMutAct_9fa48("27") ? "" : (stryCov_9fa48("27"), 'clean')))) || (stryMutAct_9fa48("29") ? configuration.oswaldEfficiency === clean.oswaldEfficiency : stryMutAct_9fa48("28") ? false : (stryCov_9fa48("28", "29"), configuration.oswaldEfficiency !== clean.oswaldEfficiency)))) {
          if (stryMutAct_9fa48("30")) {
            {}
          } else {
            stryCov_9fa48("30");
            check(out, stryMutAct_9fa48("31") ? `` : (stryCov_9fa48("31"), `${path}.oswaldEfficiency`), stryMutAct_9fa48("32") ? `` : (stryCov_9fa48("32"), `Oswald efficiency (${name})`), configuration.oswaldEfficiency, OSWALD[role]);
          }
        }
        const clMaxRange = CLMAX[role];
        if (stryMutAct_9fa48("35") ? clMaxRange || name === 'clean' || configuration.clMax !== clean.clMax : stryMutAct_9fa48("34") ? false : stryMutAct_9fa48("33") ? true : (stryCov_9fa48("33", "34", "35"), clMaxRange && (stryMutAct_9fa48("37") ? name === 'clean' && configuration.clMax !== clean.clMax : stryMutAct_9fa48("36") ? true : (stryCov_9fa48("36", "37"), (stryMutAct_9fa48("39") ? name !== 'clean' : stryMutAct_9fa48("38") ? false : (stryCov_9fa48("38", "39"), name === (stryMutAct_9fa48("40") ? "" : (stryCov_9fa48("40"), 'clean')))) || (stryMutAct_9fa48("42") ? configuration.clMax === clean.clMax : stryMutAct_9fa48("41") ? false : (stryCov_9fa48("41", "42"), configuration.clMax !== clean.clMax)))))) {
          if (stryMutAct_9fa48("43")) {
            {}
          } else {
            stryCov_9fa48("43");
            check(out, stryMutAct_9fa48("44") ? `` : (stryCov_9fa48("44"), `${path}.clMax`), stryMutAct_9fa48("45") ? `` : (stryCov_9fa48("45"), `C_Lmax (${name})`), configuration.clMax, clMaxRange);
          }
        }
        if (stryMutAct_9fa48("49") ? configuration.cd0 >= clean.cd0 : stryMutAct_9fa48("48") ? configuration.cd0 <= clean.cd0 : stryMutAct_9fa48("47") ? false : stryMutAct_9fa48("46") ? true : (stryCov_9fa48("46", "47", "48", "49"), configuration.cd0 < clean.cd0)) {
          if (stryMutAct_9fa48("50")) {
            {}
          } else {
            stryCov_9fa48("50");
            out.push(stryMutAct_9fa48("51") ? {} : (stryCov_9fa48("51"), {
              code: stryMutAct_9fa48("52") ? "" : (stryCov_9fa48("52"), 'assumption-outside-typical-range'),
              field: stryMutAct_9fa48("53") ? `` : (stryCov_9fa48("53"), `${path}.cd0Increment`),
              message: stryMutAct_9fa48("54") ? `` : (stryCov_9fa48("54"), `The ${name} configuration has less zero-lift drag than clean; flaps and gear add drag (Roskam, Airplane Design I, Table 3.6).`)
            }));
          }
        }
        const polar = polarOf(aircraft, name) as Polar;
        if (stryMutAct_9fa48("57") ? false : stryMutAct_9fa48("56") ? true : stryMutAct_9fa48("55") ? minimumDragCoefficient(polar) > 0 : (stryCov_9fa48("55", "56", "57"), !(stryMutAct_9fa48("61") ? minimumDragCoefficient(polar) <= 0 : stryMutAct_9fa48("60") ? minimumDragCoefficient(polar) >= 0 : stryMutAct_9fa48("59") ? false : stryMutAct_9fa48("58") ? true : (stryCov_9fa48("58", "59", "60", "61"), minimumDragCoefficient(polar) > 0)))) {
          if (stryMutAct_9fa48("62")) {
            {}
          } else {
            stryCov_9fa48("62");
            out.push(stryMutAct_9fa48("63") ? {} : (stryCov_9fa48("63"), {
              code: stryMutAct_9fa48("64") ? "" : (stryCov_9fa48("64"), 'drag-polar-not-positive'),
              field: stryMutAct_9fa48("65") ? `` : (stryCov_9fa48("65"), `${aero}.cdLinear`),
              message: stryMutAct_9fa48("66") ? `` : (stryCov_9fa48("66"), `With C_D linear term ${round(aircraft.cdLinear)} the ${name} polar reaches zero or negative drag; check cdLinear and the Oswald efficiency.`)
            }));
          }
        }
      }
    }
  }
}
function requirementAssumptionWarnings(design: Design, out: WarningJson[]): void {
  if (stryMutAct_9fa48("67")) {
    {}
  } else {
    stryCov_9fa48("67");
    const propeller = propulsionKind(design.aircraft.propulsion.kind).propeller;
    design.requirements.forEach((requirement, index) => {
      if (stryMutAct_9fa48("68")) {
        {}
      } else {
        stryCov_9fa48("68");
        if (stryMutAct_9fa48("71") ? false : stryMutAct_9fa48("70") ? true : stryMutAct_9fa48("69") ? requirement.enabled : (stryCov_9fa48("69", "70", "71"), !requirement.enabled)) return;
        const path = stryMutAct_9fa48("72") ? `` : (stryCov_9fa48("72"), `requirements[${index}]`);
        const descriptor = requirementKind(requirement.kind);
        if (stryMutAct_9fa48("75") ? propeller || descriptor.propeller : stryMutAct_9fa48("74") ? false : stryMutAct_9fa48("73") ? true : (stryCov_9fa48("73", "74", "75"), propeller && descriptor.propeller)) {
          if (stryMutAct_9fa48("76")) {
            {}
          } else {
            stryCov_9fa48("76");
            check(out, stryMutAct_9fa48("77") ? `` : (stryCov_9fa48("77"), `${path}.propellerEfficiency`), stryMutAct_9fa48("78") ? "" : (stryCov_9fa48("78"), 'Propeller efficiency'), requirement.propellerEfficiency, descriptor.propeller.typical);
          }
        }
        for (const {
          field,
          key,
          title,
          range
        } of descriptor.typicalRanges) {
          if (stryMutAct_9fa48("79")) {
            {}
          } else {
            stryCov_9fa48("79");
            check(out, stryMutAct_9fa48("80") ? `` : (stryCov_9fa48("80"), `${path}.${key}`), title, (requirement as unknown as Record<string, number>)[field], range);
          }
        }
        if (stryMutAct_9fa48("84") ? requirement.massFraction <= 1 : stryMutAct_9fa48("83") ? requirement.massFraction >= 1 : stryMutAct_9fa48("82") ? false : stryMutAct_9fa48("81") ? true : (stryCov_9fa48("81", "82", "83", "84"), requirement.massFraction > 1)) {
          if (stryMutAct_9fa48("85")) {
            {}
          } else {
            stryCov_9fa48("85");
            out.push(stryMutAct_9fa48("86") ? {} : (stryCov_9fa48("86"), {
              code: stryMutAct_9fa48("87") ? "" : (stryCov_9fa48("87"), 'assumption-outside-typical-range'),
              field: stryMutAct_9fa48("88") ? `` : (stryCov_9fa48("88"), `${path}.massFraction`),
              message: stryMutAct_9fa48("89") ? `` : (stryCov_9fa48("89"), `Mass fraction ${round(requirement.massFraction)} is above take-off mass.`)
            }));
          }
        }
        if (stryMutAct_9fa48("93") ? requirement.powerSetting <= 1 : stryMutAct_9fa48("92") ? requirement.powerSetting >= 1 : stryMutAct_9fa48("91") ? false : stryMutAct_9fa48("90") ? true : (stryCov_9fa48("90", "91", "92", "93"), requirement.powerSetting > 1)) {
          if (stryMutAct_9fa48("94")) {
            {}
          } else {
            stryCov_9fa48("94");
            out.push(stryMutAct_9fa48("95") ? {} : (stryCov_9fa48("95"), {
              code: stryMutAct_9fa48("96") ? "" : (stryCov_9fa48("96"), 'assumption-outside-typical-range'),
              field: stryMutAct_9fa48("97") ? `` : (stryCov_9fa48("97"), `${path}.powerSetting`),
              message: stryMutAct_9fa48("98") ? `` : (stryCov_9fa48("98"), `Power setting ${round(requirement.powerSetting)} is above rated power or thrust.`)
            }));
          }
        }
      }
    });
  }
}

/** Every assumption of the design outside its typical range. */
export function assumptionWarnings(design: Design): WarningJson[] {
  if (stryMutAct_9fa48("99")) {
    {}
  } else {
    stryCov_9fa48("99");
    const out: WarningJson[] = stryMutAct_9fa48("100") ? ["Stryker was here"] : (stryCov_9fa48("100"), []);
    configurationWarnings(design, out);
    const {
      propulsion
    } = design.aircraft;
    const exponent = propulsionKind(propulsion.kind).lapseExponent;
    if (stryMutAct_9fa48("102") ? false : stryMutAct_9fa48("101") ? true : (stryCov_9fa48("101", "102"), exponent)) check(out, stryMutAct_9fa48("103") ? "" : (stryCov_9fa48("103"), 'aircraft.propulsion.lapseExponent'), stryMutAct_9fa48("104") ? "" : (stryCov_9fa48("104"), 'Lapse exponent'), propulsion.lapseExponent, exponent.typical);
    requirementAssumptionWarnings(design, out);
    return out;
  }
}
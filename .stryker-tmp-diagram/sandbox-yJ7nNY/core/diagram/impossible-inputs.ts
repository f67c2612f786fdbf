/**
 * Inputs no aircraft can have, which the concept reader reports as errors
 * naming the field: a drag polar whose least drag is not positive, a ground
 * run whose lift coefficient lifts the aircraft before lift-off speed or
 * takes the weight off the wheels (negative rolling friction), and a
 * requirement met with no power or thrust at all somewhere on the diagram.
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
import { loadingAxis, type Design } from '../model';
import { requirementBoundaries } from './boundaries';
import { DEFAULT_SAMPLES, plotRange } from './evaluate';
import { sampleWingLoadings } from './sampling';
export interface ImpossibleInput {
  field: string;
  message: string;
}

/** Speed of the take-off boundary's mean forces as a fraction of V_LOF (core/constraints/takeoff-ground-roll.ts). */
const MEAN_ROLL_SPEED_FRACTION = 0.7;
const shown = stryMutAct_9fa48("658") ? () => undefined : (stryCov_9fa48("658"), (() => {
  const shown = (x: number): string => String(Number(x.toPrecision(4)));
  return shown;
})());
function polarInputs(design: Design, out: ImpossibleInput[]): void {
  if (stryMutAct_9fa48("659")) {
    {}
  } else {
    stryCov_9fa48("659");
    const {
      aircraft
    } = design;
    for (const name of Object.keys(aircraft.configurations)) {
      if (stryMutAct_9fa48("660")) {
        {}
      } else {
        stryCov_9fa48("660");
        const least = minimumDragCoefficient(polarOf(aircraft, name) as Polar);
        if (stryMutAct_9fa48("663") ? false : stryMutAct_9fa48("662") ? true : stryMutAct_9fa48("661") ? least > 0 : (stryCov_9fa48("661", "662", "663"), !(stryMutAct_9fa48("667") ? least <= 0 : stryMutAct_9fa48("666") ? least >= 0 : stryMutAct_9fa48("665") ? false : stryMutAct_9fa48("664") ? true : (stryCov_9fa48("664", "665", "666", "667"), least > 0)))) {
          if (stryMutAct_9fa48("668")) {
            {}
          } else {
            stryCov_9fa48("668");
            out.push(stryMutAct_9fa48("669") ? {} : (stryCov_9fa48("669"), {
              field: stryMutAct_9fa48("670") ? "" : (stryCov_9fa48("670"), 'aircraft.aero.cdLinear'),
              message: stryMutAct_9fa48("671") ? `` : (stryCov_9fa48("671"), `${shown(aircraft.cdLinear)} makes the ${name} polar's least drag C_D0 - K1^2/(4K) = ${shown(least)}, not positive; use a linear term closer to zero`)
            }));
            return;
          }
        }
      }
    }
  }
}
function groundRunInputs(design: Design, out: ImpossibleInput[]): void {
  if (stryMutAct_9fa48("672")) {
    {}
  } else {
    stryCov_9fa48("672");
    const {
      aircraft
    } = design;
    design.requirements.forEach((r, i) => {
      if (stryMutAct_9fa48("673")) {
        {}
      } else {
        stryCov_9fa48("673");
        if (stryMutAct_9fa48("676") ? !r.enabled && r.kind !== 'takeoff-ground-roll' : stryMutAct_9fa48("675") ? false : stryMutAct_9fa48("674") ? true : (stryCov_9fa48("674", "675", "676"), (stryMutAct_9fa48("677") ? r.enabled : (stryCov_9fa48("677"), !r.enabled)) || (stryMutAct_9fa48("679") ? r.kind === 'takeoff-ground-roll' : stryMutAct_9fa48("678") ? false : (stryCov_9fa48("678", "679"), r.kind !== (stryMutAct_9fa48("680") ? "" : (stryCov_9fa48("680"), 'takeoff-ground-roll')))))) return;
        const polar = stryMutAct_9fa48("681") ? polarOf(aircraft, r.configuration) && polarOf(aircraft, 'clean') as Polar : (stryCov_9fa48("681"), polarOf(aircraft, r.configuration) ?? polarOf(aircraft, 'clean') as Polar);
        const field = stryMutAct_9fa48("682") ? `` : (stryCov_9fa48("682"), `requirements[${i}].clGroundRun`);
        if (stryMutAct_9fa48("685") ? false : stryMutAct_9fa48("684") ? true : stryMutAct_9fa48("683") ? r.clGroundRun < polar.clMax : (stryCov_9fa48("683", "684", "685"), !(stryMutAct_9fa48("689") ? r.clGroundRun >= polar.clMax : stryMutAct_9fa48("688") ? r.clGroundRun <= polar.clMax : stryMutAct_9fa48("687") ? false : stryMutAct_9fa48("686") ? true : (stryCov_9fa48("686", "687", "688", "689"), r.clGroundRun < polar.clMax)))) {
          if (stryMutAct_9fa48("690")) {
            {}
          } else {
            stryCov_9fa48("690");
            out.push(stryMutAct_9fa48("691") ? {} : (stryCov_9fa48("691"), {
              field,
              message: stryMutAct_9fa48("692") ? `` : (stryCov_9fa48("692"), `${shown(r.clGroundRun)} is at or above the ${r.configuration} C_Lmax ${shown(polar.clMax)} (requirement "${r.id}"): the wing would lift the aircraft before lift-off speed; use a value below C_Lmax`)
            }));
            return;
          }
        }
        // Lift over weight at the mean-force speed: qbar C_L,g/(beta w) = (0.7 k_LOF)^2 C_L,g / C_Lmax.
        const k = stryMutAct_9fa48("693") ? MEAN_ROLL_SPEED_FRACTION / r.liftoffSpeedFactor : (stryCov_9fa48("693"), MEAN_ROLL_SPEED_FRACTION * r.liftoffSpeedFactor);
        const liftOverWeight = stryMutAct_9fa48("694") ? k * k * r.clGroundRun * polar.clMax : (stryCov_9fa48("694"), (stryMutAct_9fa48("695") ? k * k / r.clGroundRun : (stryCov_9fa48("695"), (stryMutAct_9fa48("696") ? k / k : (stryCov_9fa48("696"), k * k)) * r.clGroundRun)) / polar.clMax);
        if (stryMutAct_9fa48("699") ? r.rollingFriction > 0 || !(liftOverWeight < 1) : stryMutAct_9fa48("698") ? false : stryMutAct_9fa48("697") ? true : (stryCov_9fa48("697", "698", "699"), (stryMutAct_9fa48("702") ? r.rollingFriction <= 0 : stryMutAct_9fa48("701") ? r.rollingFriction >= 0 : stryMutAct_9fa48("700") ? true : (stryCov_9fa48("700", "701", "702"), r.rollingFriction > 0)) && (stryMutAct_9fa48("703") ? liftOverWeight < 1 : (stryCov_9fa48("703"), !(stryMutAct_9fa48("707") ? liftOverWeight >= 1 : stryMutAct_9fa48("706") ? liftOverWeight <= 1 : stryMutAct_9fa48("705") ? false : stryMutAct_9fa48("704") ? true : (stryCov_9fa48("704", "705", "706", "707"), liftOverWeight < 1)))))) {
          if (stryMutAct_9fa48("708")) {
            {}
          } else {
            stryCov_9fa48("708");
            out.push(stryMutAct_9fa48("709") ? {} : (stryCov_9fa48("709"), {
              field,
              message: stryMutAct_9fa48("710") ? `` : (stryCov_9fa48("710"), `${shown(r.clGroundRun)} with lift-off at ${shown(r.liftoffSpeedFactor)} V_s gives lift above the weight during the roll, so negative rolling friction (requirement "${r.id}"); use a smaller ground-run C_L`)
            }));
          }
        }
      }
    });
  }
}
function requiredLoadingInputs(design: Design, out: ImpossibleInput[]): void {
  if (stryMutAct_9fa48("711")) {
    {}
  } else {
    stryCov_9fa48("711");
    const entries = requirementBoundaries(design);
    const range = plotRange(design, entries, stryMutAct_9fa48("712") ? ["Stryker was here"] : (stryCov_9fa48("712"), []));
    const n = (stryMutAct_9fa48("715") ? Number.isInteger(design.diagram.samples) || design.diagram.samples >= 2 : stryMutAct_9fa48("714") ? false : stryMutAct_9fa48("713") ? true : (stryCov_9fa48("713", "714", "715"), Number.isInteger(design.diagram.samples) && (stryMutAct_9fa48("718") ? design.diagram.samples < 2 : stryMutAct_9fa48("717") ? design.diagram.samples > 2 : stryMutAct_9fa48("716") ? true : (stryCov_9fa48("716", "717", "718"), design.diagram.samples >= 2)))) ? design.diagram.samples : DEFAULT_SAMPLES;
    const ws = sampleWingLoadings(range, n);
    const what = (stryMutAct_9fa48("721") ? loadingAxis(design.aircraft.propulsion.kind) !== 'powerToWeight' : stryMutAct_9fa48("720") ? false : stryMutAct_9fa48("719") ? true : (stryCov_9fa48("719", "720", "721"), loadingAxis(design.aircraft.propulsion.kind) === (stryMutAct_9fa48("722") ? "" : (stryCov_9fa48("722"), 'powerToWeight')))) ? stryMutAct_9fa48("723") ? "" : (stryCov_9fa48("723"), 'power') : stryMutAct_9fa48("724") ? "" : (stryCov_9fa48("724"), 'thrust');
    for (const {
      index,
      requirement,
      boundary
    } of entries) {
      if (stryMutAct_9fa48("725")) {
        {}
      } else {
        stryCov_9fa48("725");
        if (stryMutAct_9fa48("728") ? boundary.type === 'curve' : stryMutAct_9fa48("727") ? false : stryMutAct_9fa48("726") ? true : (stryCov_9fa48("726", "727", "728"), boundary.type !== (stryMutAct_9fa48("729") ? "" : (stryCov_9fa48("729"), 'curve')))) continue;
        for (const w of ws) {
          if (stryMutAct_9fa48("730")) {
            {}
          } else {
            stryCov_9fa48("730");
            const y = boundary.required(w);
            if (stryMutAct_9fa48("733") ? Number.isFinite(y) || y <= 0 : stryMutAct_9fa48("732") ? false : stryMutAct_9fa48("731") ? true : (stryCov_9fa48("731", "732", "733"), Number.isFinite(y) && (stryMutAct_9fa48("736") ? y > 0 : stryMutAct_9fa48("735") ? y < 0 : stryMutAct_9fa48("734") ? true : (stryCov_9fa48("734", "735", "736"), y <= 0)))) {
              if (stryMutAct_9fa48("737")) {
                {}
              } else {
                stryCov_9fa48("737");
                const byLinearTerm = stryMutAct_9fa48("741") ? design.aircraft.cdLinear >= 0 : stryMutAct_9fa48("740") ? design.aircraft.cdLinear <= 0 : stryMutAct_9fa48("739") ? false : stryMutAct_9fa48("738") ? true : (stryCov_9fa48("738", "739", "740", "741"), design.aircraft.cdLinear < 0);
                out.push(stryMutAct_9fa48("742") ? {} : (stryCov_9fa48("742"), {
                  field: byLinearTerm ? stryMutAct_9fa48("743") ? "" : (stryCov_9fa48("743"), 'aircraft.aero.cdLinear') : stryMutAct_9fa48("744") ? `` : (stryCov_9fa48("744"), `requirements[${index}]`),
                  message: stryMutAct_9fa48("745") ? `` : (stryCov_9fa48("745"), `${byLinearTerm ? stryMutAct_9fa48("746") ? `` : (stryCov_9fa48("746"), `${shown(design.aircraft.cdLinear)} makes`) : stryMutAct_9fa48("747") ? "" : (stryCov_9fa48("747"), 'makes')} requirement "${requirement.id}" need ${(stryMutAct_9fa48("751") ? y >= 0 : stryMutAct_9fa48("750") ? y <= 0 : stryMutAct_9fa48("749") ? false : stryMutAct_9fa48("748") ? true : (stryCov_9fa48("748", "749", "750", "751"), y < 0)) ? stryMutAct_9fa48("752") ? "" : (stryCov_9fa48("752"), 'negative') : stryMutAct_9fa48("753") ? "" : (stryCov_9fa48("753"), 'no')} ${what} at ${shown(w)} Pa wing loading, which no aircraft can; ${byLinearTerm ? stryMutAct_9fa48("754") ? "" : (stryCov_9fa48("754"), 'use a linear term closer to zero') : stryMutAct_9fa48("755") ? "" : (stryCov_9fa48("755"), 'check its values')}`)
                }));
                break;
              }
            }
          }
        }
      }
    }
  }
}

/** Every impossible input of a resolved design; empty when there is none. */
export function impossibleInputs(design: Design): ImpossibleInput[] {
  if (stryMutAct_9fa48("756")) {
    {}
  } else {
    stryCov_9fa48("756");
    const out: ImpossibleInput[] = stryMutAct_9fa48("757") ? ["Stryker was here"] : (stryCov_9fa48("757"), []);
    polarInputs(design, out);
    groundRunInputs(design, out);
    if (stryMutAct_9fa48("760") ? out.length !== 0 : stryMutAct_9fa48("759") ? false : stryMutAct_9fa48("758") ? true : (stryCov_9fa48("758", "759", "760"), out.length === 0)) requiredLoadingInputs(design, out);
    return out;
  }
}
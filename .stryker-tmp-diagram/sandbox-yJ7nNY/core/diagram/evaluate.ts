/**
 * A whole design evaluated: boundaries sampled over the plotted range, the
 * optimum, margins, speeds, sizing and warnings, as the JSON of DESIGN.md
 * ("The evaluation", format `loftpoint-evaluation/1`).
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
import { EVALUATION_FORMAT, type BoundaryJson, type DesignPointJson, type Evaluation, type MarginJson, type OptimumJson, type WarningJson } from '../evaluation';
import { requirementKind } from '../requirements';
import { loadingAxis, type Design, type DesignPoint, type LoadingAxis } from '../model';
import { assumptionWarnings } from './assumption-warnings';
import { requirementBoundaries, type RequirementBoundary } from './boundaries';
import { requirementInputWarnings, unattainableWarnings } from './boundary-warnings';
import { defaultWingLoadingRange } from './default-range';
import { designPointWarnings, optimumWarnings, speedWarnings } from './diagram-warnings';
import { wingLoadingCap, type CurveBoundary, type LimitBoundary } from './envelope';
import { allMet, marginOf, marginsFor } from './margins';
import { findOptimum } from './optimum';
import { flightMachAt } from './flight-mach';
import { compressibilityWarnings } from './compressibility-warnings';
import { sampleWingLoadings } from './sampling';
import { sizingAt } from './sizing';
import { reportedSpeeds } from './speeds';

/** Relative distance within which a requirement counts as active at the optimum (core/methods.md section 7). */
export const ACTIVE_TOLERANCE = 1e-3;
export const DEFAULT_SAMPLES = 201;
export function plotRange(design: Design, entries: readonly RequirementBoundary[], warnings: WarningJson[]): [number, number] {
  if (stryMutAct_9fa48("458")) {
    {}
  } else {
    stryCov_9fa48("458");
    const given = design.diagram.wingLoadingRangePa;
    if (stryMutAct_9fa48("461") ? given && Number.isFinite(given[0]) && Number.isFinite(given[1]) && given[0] > 0 || given[1] > given[0] : stryMutAct_9fa48("460") ? false : stryMutAct_9fa48("459") ? true : (stryCov_9fa48("459", "460", "461"), (stryMutAct_9fa48("463") ? given && Number.isFinite(given[0]) && Number.isFinite(given[1]) || given[0] > 0 : stryMutAct_9fa48("462") ? true : (stryCov_9fa48("462", "463"), (stryMutAct_9fa48("465") ? given && Number.isFinite(given[0]) || Number.isFinite(given[1]) : stryMutAct_9fa48("464") ? true : (stryCov_9fa48("464", "465"), (stryMutAct_9fa48("467") ? given || Number.isFinite(given[0]) : stryMutAct_9fa48("466") ? true : (stryCov_9fa48("466", "467"), given && Number.isFinite(given[0]))) && Number.isFinite(given[1]))) && (stryMutAct_9fa48("470") ? given[0] <= 0 : stryMutAct_9fa48("469") ? given[0] >= 0 : stryMutAct_9fa48("468") ? true : (stryCov_9fa48("468", "469", "470"), given[0] > 0)))) && (stryMutAct_9fa48("473") ? given[1] <= given[0] : stryMutAct_9fa48("472") ? given[1] >= given[0] : stryMutAct_9fa48("471") ? true : (stryCov_9fa48("471", "472", "473"), given[1] > given[0])))) {
      if (stryMutAct_9fa48("474")) {
        {}
      } else {
        stryCov_9fa48("474");
        return stryMutAct_9fa48("475") ? [] : (stryCov_9fa48("475"), [given[0], given[1]]);
      }
    }
    if (stryMutAct_9fa48("477") ? false : stryMutAct_9fa48("476") ? true : (stryCov_9fa48("476", "477"), given)) {
      if (stryMutAct_9fa48("478")) {
        {}
      } else {
        stryCov_9fa48("478");
        warnings.push(stryMutAct_9fa48("479") ? {} : (stryCov_9fa48("479"), {
          code: stryMutAct_9fa48("480") ? "" : (stryCov_9fa48("480"), 'range-invalid'),
          field: stryMutAct_9fa48("481") ? "" : (stryCov_9fa48("481"), 'diagram.wingLoading'),
          message: stryMutAct_9fa48("482") ? "" : (stryCov_9fa48("482"), 'The wing-loading range needs two positive values, the first smaller; a range that shows every boundary is used.')
        }));
      }
    }
    const curves = entries.flatMap(stryMutAct_9fa48("483") ? () => undefined : (stryCov_9fa48("483"), ({
      boundary
    }) => (stryMutAct_9fa48("486") ? boundary.type !== 'curve' : stryMutAct_9fa48("485") ? false : stryMutAct_9fa48("484") ? true : (stryCov_9fa48("484", "485", "486"), boundary.type === (stryMutAct_9fa48("487") ? "" : (stryCov_9fa48("487"), 'curve')))) ? stryMutAct_9fa48("488") ? [] : (stryCov_9fa48("488"), [boundary.required]) : stryMutAct_9fa48("489") ? ["Stryker was here"] : (stryCov_9fa48("489"), [])));
    const limits = entries.flatMap(stryMutAct_9fa48("490") ? () => undefined : (stryCov_9fa48("490"), ({
      boundary
    }) => (stryMutAct_9fa48("493") ? boundary.type !== 'limit' : stryMutAct_9fa48("492") ? false : stryMutAct_9fa48("491") ? true : (stryCov_9fa48("491", "492", "493"), boundary.type === (stryMutAct_9fa48("494") ? "" : (stryCov_9fa48("494"), 'limit')))) ? stryMutAct_9fa48("495") ? [] : (stryCov_9fa48("495"), [boundary.wingLoadingMaxPa]) : stryMutAct_9fa48("496") ? ["Stryker was here"] : (stryCov_9fa48("496"), [])));
    return defaultWingLoadingRange(curves, limits, stryMutAct_9fa48("497") ? design.designPoint.wingLoadingPa : (stryCov_9fa48("497"), design.designPoint?.wingLoadingPa));
  }
}
function sampleCount(design: Design, warnings: WarningJson[]): number {
  if (stryMutAct_9fa48("498")) {
    {}
  } else {
    stryCov_9fa48("498");
    const n = design.diagram.samples;
    if (stryMutAct_9fa48("501") ? Number.isInteger(n) || n >= 2 : stryMutAct_9fa48("500") ? false : stryMutAct_9fa48("499") ? true : (stryCov_9fa48("499", "500", "501"), Number.isInteger(n) && (stryMutAct_9fa48("504") ? n < 2 : stryMutAct_9fa48("503") ? n > 2 : stryMutAct_9fa48("502") ? true : (stryCov_9fa48("502", "503", "504"), n >= 2)))) return n;
    warnings.push(stryMutAct_9fa48("505") ? {} : (stryCov_9fa48("505"), {
      code: stryMutAct_9fa48("506") ? "" : (stryCov_9fa48("506"), 'samples-invalid'),
      field: stryMutAct_9fa48("507") ? "" : (stryCov_9fa48("507"), 'diagram.samples'),
      message: stryMutAct_9fa48("508") ? `` : (stryCov_9fa48("508"), `Samples must be a whole number of at least 2; ${DEFAULT_SAMPLES} are used.`)
    }));
    return DEFAULT_SAMPLES;
  }
}
function pointJson(axis: LoadingAxis, wingLoading: number, loading: number): {
  wingLoading: number;
} & Partial<Record<LoadingAxis, number>> {
  if (stryMutAct_9fa48("509")) {
    {}
  } else {
    stryCov_9fa48("509");
    return stryMutAct_9fa48("510") ? {} : (stryCov_9fa48("510"), {
      wingLoading,
      [axis]: loading
    });
  }
}

/** Margins at the optimum and the requirements that bind there. */
function atOptimum(entries: readonly RequirementBoundary[], w: number, y: number): {
  active: string[];
  margins: MarginJson[];
} {
  if (stryMutAct_9fa48("511")) {
    {}
  } else {
    stryCov_9fa48("511");
    const active: string[] = stryMutAct_9fa48("512") ? ["Stryker was here"] : (stryCov_9fa48("512"), []);
    const margins: MarginJson[] = stryMutAct_9fa48("513") ? ["Stryker was here"] : (stryCov_9fa48("513"), []);
    for (const {
      boundary
    } of entries) {
      if (stryMutAct_9fa48("514")) {
        {}
      } else {
        stryCov_9fa48("514");
        const margin = marginOf(boundary, w, y);
        margins.push(stryMutAct_9fa48("515") ? {} : (stryCov_9fa48("515"), {
          id: boundary.id,
          margin
        }));
        const binds = (stryMutAct_9fa48("518") ? boundary.type !== 'limit' : stryMutAct_9fa48("517") ? false : stryMutAct_9fa48("516") ? true : (stryCov_9fa48("516", "517", "518"), boundary.type === (stryMutAct_9fa48("519") ? "" : (stryCov_9fa48("519"), 'limit')))) ? stryMutAct_9fa48("523") ? w < boundary.wingLoadingMaxPa * (1 - ACTIVE_TOLERANCE) : stryMutAct_9fa48("522") ? w > boundary.wingLoadingMaxPa * (1 - ACTIVE_TOLERANCE) : stryMutAct_9fa48("521") ? false : stryMutAct_9fa48("520") ? true : (stryCov_9fa48("520", "521", "522", "523"), w >= (stryMutAct_9fa48("524") ? boundary.wingLoadingMaxPa / (1 - ACTIVE_TOLERANCE) : (stryCov_9fa48("524"), boundary.wingLoadingMaxPa * (stryMutAct_9fa48("525") ? 1 + ACTIVE_TOLERANCE : (stryCov_9fa48("525"), 1 - ACTIVE_TOLERANCE))))) : stryMutAct_9fa48("529") ? boundary.required(w) < y * (1 - ACTIVE_TOLERANCE) : stryMutAct_9fa48("528") ? boundary.required(w) > y * (1 - ACTIVE_TOLERANCE) : stryMutAct_9fa48("527") ? false : stryMutAct_9fa48("526") ? true : (stryCov_9fa48("526", "527", "528", "529"), boundary.required(w) >= (stryMutAct_9fa48("530") ? y / (1 - ACTIVE_TOLERANCE) : (stryCov_9fa48("530"), y * (stryMutAct_9fa48("531") ? 1 + ACTIVE_TOLERANCE : (stryCov_9fa48("531"), 1 - ACTIVE_TOLERANCE)))));
        if (stryMutAct_9fa48("533") ? false : stryMutAct_9fa48("532") ? true : (stryCov_9fa48("532", "533"), binds)) active.push(boundary.id);
      }
    }
    return stryMutAct_9fa48("534") ? {} : (stryCov_9fa48("534"), {
      active,
      margins
    });
  }
}

/** Speed and segments of one boundary at the optimum; only finite numbers are written. */
function boundaryAtOptimum({
  requirement,
  boundary
}: RequirementBoundary, aircraft: Design['aircraft'], w: number, y: number) {
  if (stryMutAct_9fa48("535")) {
    {}
  } else {
    stryCov_9fa48("535");
    const speed = stryMutAct_9fa48("536") ? boundary.speedAt(w) : (stryCov_9fa48("536"), boundary.speedAt?.(w));
    const segments = stryMutAct_9fa48("537") ? requirementKind(requirement.kind).segments(requirement, aircraft, w, y) : (stryCov_9fa48("537"), requirementKind(requirement.kind).segments?.(requirement, aircraft, w, y));
    const finiteSegments = (stryMutAct_9fa48("540") ? segments || Object.values(segments).every(Number.isFinite) : stryMutAct_9fa48("539") ? false : stryMutAct_9fa48("538") ? true : (stryCov_9fa48("538", "539", "540"), segments && (stryMutAct_9fa48("541") ? Object.values(segments).some(Number.isFinite) : (stryCov_9fa48("541"), Object.values(segments).every(Number.isFinite))))) ? segments : undefined;
    return stryMutAct_9fa48("542") ? {} : (stryCov_9fa48("542"), {
      ...((stryMutAct_9fa48("545") ? speed !== undefined || Number.isFinite(speed) : stryMutAct_9fa48("544") ? false : stryMutAct_9fa48("543") ? true : (stryCov_9fa48("543", "544", "545"), (stryMutAct_9fa48("547") ? speed === undefined : stryMutAct_9fa48("546") ? true : (stryCov_9fa48("546", "547"), speed !== undefined)) && Number.isFinite(speed))) ? stryMutAct_9fa48("548") ? {} : (stryCov_9fa48("548"), {
        speedAtOptimum: speed
      }) : {}),
      ...(finiteSegments ? stryMutAct_9fa48("549") ? {} : (stryCov_9fa48("549"), {
        segmentsAtOptimum: finiteSegments
      }) : {})
    });
  }
}
function designPointJson(entries: readonly RequirementBoundary[], axis: LoadingAxis, point: DesignPoint): DesignPointJson {
  if (stryMutAct_9fa48("550")) {
    {}
  } else {
    stryCov_9fa48("550");
    const margins = marginsFor(entries, point.wingLoadingPa, point.loading);
    return stryMutAct_9fa48("551") ? {} : (stryCov_9fa48("551"), {
      ...pointJson(axis, point.wingLoadingPa, point.loading),
      feasible: allMet(margins),
      margins
    });
  }
}

/** The evaluation of a design (DESIGN.md, "The evaluation"). */
export function evaluateDesign(design: Design): Evaluation {
  if (stryMutAct_9fa48("552")) {
    {}
  } else {
    stryCov_9fa48("552");
    const {
      aircraft
    } = design;
    const axis = loadingAxis(aircraft.propulsion.kind);
    const entries = requirementBoundaries(design);
    const warnings: WarningJson[] = stryMutAct_9fa48("553") ? [] : (stryCov_9fa48("553"), [...(stryMutAct_9fa48("554") ? (design as Design & {
      warnings?: WarningJson[];
    }).warnings && [] : (stryCov_9fa48("554"), (design as Design & {
      warnings?: WarningJson[];
    }).warnings ?? (stryMutAct_9fa48("555") ? ["Stryker was here"] : (stryCov_9fa48("555"), [])))), ...assumptionWarnings(design), ...requirementInputWarnings(entries, aircraft)]);
    const range = plotRange(design, entries, warnings);
    const ws = sampleWingLoadings(range, sampleCount(design, warnings));
    const curves: CurveBoundary[] = stryMutAct_9fa48("556") ? ["Stryker was here"] : (stryCov_9fa48("556"), []);
    const limits: LimitBoundary[] = stryMutAct_9fa48("557") ? ["Stryker was here"] : (stryCov_9fa48("557"), []);
    const curveMet = new Map<string, boolean>();
    const envelope = new Float64Array(ws.length).fill(stryMutAct_9fa48("558") ? +Infinity : (stryCov_9fa48("558"), -Infinity));
    const boundaries: BoundaryJson[] = entries.map(({
      requirement,
      boundary
    }) => {
      if (stryMutAct_9fa48("559")) {
        {}
      } else {
        stryCov_9fa48("559");
        const head = stryMutAct_9fa48("560") ? {} : (stryCov_9fa48("560"), {
          id: boundary.id,
          kind: boundary.kind,
          ...((stryMutAct_9fa48("563") ? requirement.label !== undefined : stryMutAct_9fa48("562") ? false : stryMutAct_9fa48("561") ? true : (stryCov_9fa48("561", "562", "563"), requirement.label === undefined)) ? {} : stryMutAct_9fa48("564") ? {} : (stryCov_9fa48("564"), {
            label: requirement.label
          }))
        });
        if (stryMutAct_9fa48("567") ? boundary.type !== 'limit' : stryMutAct_9fa48("566") ? false : stryMutAct_9fa48("565") ? true : (stryCov_9fa48("565", "566", "567"), boundary.type === (stryMutAct_9fa48("568") ? "" : (stryCov_9fa48("568"), 'limit')))) {
          if (stryMutAct_9fa48("569")) {
            {}
          } else {
            stryCov_9fa48("569");
            limits.push(boundary);
            return stryMutAct_9fa48("570") ? {} : (stryCov_9fa48("570"), {
              ...head,
              wingLoadingMax: boundary.wingLoadingMaxPa
            });
          }
        }
        curves.push(boundary);
        const points: Array<[number, number | null]> = stryMutAct_9fa48("571") ? new Array() : (stryCov_9fa48("571"), new Array(ws.length));
        let met = stryMutAct_9fa48("572") ? true : (stryCov_9fa48("572"), false);
        for (let i = 0; stryMutAct_9fa48("575") ? i >= ws.length : stryMutAct_9fa48("574") ? i <= ws.length : stryMutAct_9fa48("573") ? false : (stryCov_9fa48("573", "574", "575"), i < ws.length); stryMutAct_9fa48("576") ? i-- : (stryCov_9fa48("576"), i++)) {
          if (stryMutAct_9fa48("577")) {
            {}
          } else {
            stryCov_9fa48("577");
            const y = boundary.required(ws[i]);
            const finite = Number.isFinite(y);
            stryMutAct_9fa48("578") ? met &&= finite : (stryCov_9fa48("578"), met ||= finite);
            points[i] = stryMutAct_9fa48("579") ? [] : (stryCov_9fa48("579"), [ws[i], finite ? y : null]);
            if (stryMutAct_9fa48("582") ? false : stryMutAct_9fa48("581") ? true : stryMutAct_9fa48("580") ? finite : (stryCov_9fa48("580", "581", "582"), !finite)) envelope[i] = NaN;else if (stryMutAct_9fa48("586") ? y <= envelope[i] : stryMutAct_9fa48("585") ? y >= envelope[i] : stryMutAct_9fa48("584") ? false : stryMutAct_9fa48("583") ? true : (stryCov_9fa48("583", "584", "585", "586"), y > envelope[i])) envelope[i] = y; // NaN stays NaN
          }
        }
        curveMet.set(boundary.id, met);
        const stall = boundary.stallLimitPa;
        if (stryMutAct_9fa48("589") ? stall !== undefined && Number.isFinite(stall) || stall < range[1] : stryMutAct_9fa48("588") ? false : stryMutAct_9fa48("587") ? true : (stryCov_9fa48("587", "588", "589"), (stryMutAct_9fa48("591") ? stall !== undefined || Number.isFinite(stall) : stryMutAct_9fa48("590") ? true : (stryCov_9fa48("590", "591"), (stryMutAct_9fa48("593") ? stall === undefined : stryMutAct_9fa48("592") ? true : (stryCov_9fa48("592", "593"), stall !== undefined)) && Number.isFinite(stall))) && (stryMutAct_9fa48("596") ? stall >= range[1] : stryMutAct_9fa48("595") ? stall <= range[1] : stryMutAct_9fa48("594") ? true : (stryCov_9fa48("594", "595", "596"), stall < range[1])))) {
          if (stryMutAct_9fa48("597")) {
            {}
          } else {
            stryCov_9fa48("597");
            warnings.push(stryMutAct_9fa48("598") ? {} : (stryCov_9fa48("598"), {
              code: stryMutAct_9fa48("599") ? "" : (stryCov_9fa48("599"), 'turn-stalls'),
              field: stryMutAct_9fa48("600") ? `` : (stryCov_9fa48("600"), `requirements[${stryMutAct_9fa48("601") ? entries.find(e => e.boundary === boundary)?.index && 0 : (stryCov_9fa48("601"), (stryMutAct_9fa48("602") ? entries.find(e => e.boundary === boundary).index : (stryCov_9fa48("602"), entries.find(stryMutAct_9fa48("603") ? () => undefined : (stryCov_9fa48("603"), e => stryMutAct_9fa48("606") ? e.boundary !== boundary : stryMutAct_9fa48("605") ? false : stryMutAct_9fa48("604") ? true : (stryCov_9fa48("604", "605", "606"), e.boundary === boundary)))?.index)) ?? 0)}]`),
              message: stryMutAct_9fa48("607") ? `` : (stryCov_9fa48("607"), `Requirement "${boundary.id}" cannot be flown above a wing loading of ${Math.round(stall)} N/m^2: the lift coefficient it needs there is above C_Lmax. Its stall line is drawn as a limit.`)
            }));
            return stryMutAct_9fa48("608") ? {} : (stryCov_9fa48("608"), {
              ...head,
              points,
              stallLimit: stall
            });
          }
        }
        return stryMutAct_9fa48("609") ? {} : (stryCov_9fa48("609"), {
          ...head,
          points
        });
      }
    });
    warnings.push(...unattainableWarnings(entries, aircraft, curveMet, range[0]));
    const found = (stryMutAct_9fa48("613") ? entries.length <= 0 : stryMutAct_9fa48("612") ? entries.length >= 0 : stryMutAct_9fa48("611") ? false : stryMutAct_9fa48("610") ? true : (stryCov_9fa48("610", "611", "612", "613"), entries.length > 0)) ? findOptimum(curves.map(stryMutAct_9fa48("614") ? () => undefined : (stryCov_9fa48("614"), c => c.required)), wingLoadingCap(limits), range, stryMutAct_9fa48("615") ? {} : (stryCov_9fa48("615"), {
      wingLoadingsPa: ws,
      envelope
    })) : null;
    let optimum: OptimumJson | null = null;
    if (stryMutAct_9fa48("617") ? false : stryMutAct_9fa48("616") ? true : (stryCov_9fa48("616", "617"), found)) {
      if (stryMutAct_9fa48("618")) {
        {}
      } else {
        stryCov_9fa48("618");
        const {
          wingLoadingPa: w,
          loading: y
        } = found;
        optimum = stryMutAct_9fa48("619") ? {} : (stryCov_9fa48("619"), {
          ...pointJson(axis, w, y),
          ...atOptimum(entries, w, y),
          ...(found.unbounded ? stryMutAct_9fa48("620") ? {} : (stryCov_9fa48("620"), {
            unbounded: stryMutAct_9fa48("621") ? false : (stryCov_9fa48("621"), true)
          }) : {})
        });
        entries.forEach((entry, i) => {
          if (stryMutAct_9fa48("622")) {
            {}
          } else {
            stryCov_9fa48("622");
            Object.assign(boundaries[i], boundaryAtOptimum(entry, aircraft, w, y));
            const mach = flightMachAt(entry, w);
            if (stryMutAct_9fa48("625") ? mach === undefined : stryMutAct_9fa48("624") ? false : stryMutAct_9fa48("623") ? true : (stryCov_9fa48("623", "624", "625"), mach !== undefined)) boundaries[i].machAtOptimum = mach;
          }
        });
      }
    }
    warnings.push(...optimumWarnings(found, range, curves.length, entries.length));
    const point = design.designPoint;
    const designPoint = point ? designPointJson(entries, axis, point) : undefined;
    if (stryMutAct_9fa48("627") ? false : stryMutAct_9fa48("626") ? true : (stryCov_9fa48("626", "627"), point)) warnings.push(...designPointWarnings(point.wingLoadingPa, range));
    warnings.push(...compressibilityWarnings(entries, design, stryMutAct_9fa48("628") ? (found?.wingLoadingPa ?? point?.wingLoadingPa) && 0.5 * (range[0] + range[1]) : (stryCov_9fa48("628"), (stryMutAct_9fa48("629") ? found?.wingLoadingPa && point?.wingLoadingPa : (stryCov_9fa48("629"), (stryMutAct_9fa48("630") ? found.wingLoadingPa : (stryCov_9fa48("630"), found?.wingLoadingPa)) ?? (stryMutAct_9fa48("631") ? point.wingLoadingPa : (stryCov_9fa48("631"), point?.wingLoadingPa)))) ?? (stryMutAct_9fa48("632") ? 0.5 / (range[0] + range[1]) : (stryCov_9fa48("632"), 0.5 * (stryMutAct_9fa48("633") ? range[0] - range[1] : (stryCov_9fa48("633"), range[0] + range[1])))))));
    const sized = point ? stryMutAct_9fa48("634") ? {} : (stryCov_9fa48("634"), {
      w: point.wingLoadingPa,
      y: point.loading
    }) : found ? stryMutAct_9fa48("635") ? {} : (stryCov_9fa48("635"), {
      w: found.wingLoadingPa,
      y: found.loading
    }) : null;
    warnings.push(...speedWarnings(design));
    return stryMutAct_9fa48("636") ? {} : (stryCov_9fa48("636"), {
      format: EVALUATION_FORMAT,
      axis,
      boundaries,
      optimum,
      ...(designPoint ? stryMutAct_9fa48("637") ? {} : (stryCov_9fa48("637"), {
        designPoint
      }) : {}),
      // At the design point, else the optimum; with neither, mid-range so the speeds stay defined.
      speeds: reportedSpeeds(aircraft, stryMutAct_9fa48("638") ? sized?.w && 0.5 * (range[0] + range[1]) : (stryCov_9fa48("638"), (stryMutAct_9fa48("639") ? sized.w : (stryCov_9fa48("639"), sized?.w)) ?? (stryMutAct_9fa48("640") ? 0.5 / (range[0] + range[1]) : (stryCov_9fa48("640"), 0.5 * (stryMutAct_9fa48("641") ? range[0] - range[1] : (stryCov_9fa48("641"), range[0] + range[1]))))), design.requirements),
      sizing: sized ? sizingAt(aircraft, axis, sized.w, sized.y) : null,
      warnings
    });
  }
}
/**
 * What the diagram says at one wing loading, for a hover read-out.
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
import type { Design, RequirementKind } from '../model';
import { requirementBoundaries } from './boundaries';
export type ReadOutEntry = {
  type: 'limit';
  id: string;
  kind: RequirementKind;
  label?: string;
  wingLoadingMax: number;
  exceeded: boolean;
} | {
  type: 'curve';
  id: string;
  kind: RequirementKind;
  label?: string;
  /** Required loading, null where no power or thrust can meet it. */
  required: number | null;
  /** Speed the requirement uses there (TAS), null where undefined. */
  speed: number | null;
};
export interface ReadOut {
  wingLoading: number;
  /** The highest required loading, null where some requirement cannot be met. */
  envelope: number | null;
  /**
   * The requirement that decides this wing loading: the tightest limit it
   * exceeds, else a curve that cannot be met there, else the curve needing
   * the most power or thrust; null with no enabled requirement.
   */
  binding: string | null;
  entries: ReadOutEntry[];
}
const finiteOrNull = stryMutAct_9fa48("511") ? () => undefined : (stryCov_9fa48("511"), (() => {
  const finiteOrNull = (x: number): number | null => Number.isFinite(x) ? x : null;
  return finiteOrNull;
})());

/** Each enabled requirement's value at a wing loading, and which one binds. */
export function readAt(design: Design, wingLoadingPa: number): ReadOut {
  if (stryMutAct_9fa48("512")) {
    {}
  } else {
    stryCov_9fa48("512");
    const entries: ReadOutEntry[] = stryMutAct_9fa48("513") ? ["Stryker was here"] : (stryCov_9fa48("513"), []);
    let tightestLimit: {
      id: string;
      at: number;
    } | undefined;
    let unmet: string | undefined;
    let top: {
      id: string;
      y: number;
    } | undefined;
    for (const {
      requirement,
      boundary
    } of requirementBoundaries(design)) {
      if (stryMutAct_9fa48("514")) {
        {}
      } else {
        stryCov_9fa48("514");
        const label = (stryMutAct_9fa48("517") ? requirement.label !== undefined : stryMutAct_9fa48("516") ? false : stryMutAct_9fa48("515") ? true : (stryCov_9fa48("515", "516", "517"), requirement.label === undefined)) ? {} : stryMutAct_9fa48("518") ? {} : (stryCov_9fa48("518"), {
          label: requirement.label
        });
        if (stryMutAct_9fa48("521") ? boundary.type !== 'limit' : stryMutAct_9fa48("520") ? false : stryMutAct_9fa48("519") ? true : (stryCov_9fa48("519", "520", "521"), boundary.type === (stryMutAct_9fa48("522") ? "" : (stryCov_9fa48("522"), 'limit')))) {
          if (stryMutAct_9fa48("523")) {
            {}
          } else {
            stryCov_9fa48("523");
            const exceeded = stryMutAct_9fa48("527") ? wingLoadingPa <= boundary.wingLoadingMaxPa : stryMutAct_9fa48("526") ? wingLoadingPa >= boundary.wingLoadingMaxPa : stryMutAct_9fa48("525") ? false : stryMutAct_9fa48("524") ? true : (stryCov_9fa48("524", "525", "526", "527"), wingLoadingPa > boundary.wingLoadingMaxPa);
            entries.push(stryMutAct_9fa48("528") ? {} : (stryCov_9fa48("528"), {
              type: stryMutAct_9fa48("529") ? "" : (stryCov_9fa48("529"), 'limit'),
              id: boundary.id,
              kind: boundary.kind,
              ...label,
              wingLoadingMax: boundary.wingLoadingMaxPa,
              exceeded
            }));
            if (stryMutAct_9fa48("532") ? exceeded || !tightestLimit || boundary.wingLoadingMaxPa < tightestLimit.at : stryMutAct_9fa48("531") ? false : stryMutAct_9fa48("530") ? true : (stryCov_9fa48("530", "531", "532"), exceeded && (stryMutAct_9fa48("534") ? !tightestLimit && boundary.wingLoadingMaxPa < tightestLimit.at : stryMutAct_9fa48("533") ? true : (stryCov_9fa48("533", "534"), (stryMutAct_9fa48("535") ? tightestLimit : (stryCov_9fa48("535"), !tightestLimit)) || (stryMutAct_9fa48("538") ? boundary.wingLoadingMaxPa >= tightestLimit.at : stryMutAct_9fa48("537") ? boundary.wingLoadingMaxPa <= tightestLimit.at : stryMutAct_9fa48("536") ? false : (stryCov_9fa48("536", "537", "538"), boundary.wingLoadingMaxPa < tightestLimit.at)))))) {
              if (stryMutAct_9fa48("539")) {
                {}
              } else {
                stryCov_9fa48("539");
                tightestLimit = stryMutAct_9fa48("540") ? {} : (stryCov_9fa48("540"), {
                  id: boundary.id,
                  at: boundary.wingLoadingMaxPa
                });
              }
            }
            continue;
          }
        }
        const y = boundary.required(wingLoadingPa);
        entries.push(stryMutAct_9fa48("541") ? {} : (stryCov_9fa48("541"), {
          type: stryMutAct_9fa48("542") ? "" : (stryCov_9fa48("542"), 'curve'),
          id: boundary.id,
          kind: boundary.kind,
          ...label,
          required: finiteOrNull(y),
          speed: finiteOrNull(boundary.speedAt(wingLoadingPa))
        }));
        if (stryMutAct_9fa48("545") ? false : stryMutAct_9fa48("544") ? true : stryMutAct_9fa48("543") ? Number.isFinite(y) : (stryCov_9fa48("543", "544", "545"), !Number.isFinite(y))) stryMutAct_9fa48("546") ? unmet &&= boundary.id : (stryCov_9fa48("546"), unmet ??= boundary.id);else if (stryMutAct_9fa48("549") ? !top && y > top.y : stryMutAct_9fa48("548") ? false : stryMutAct_9fa48("547") ? true : (stryCov_9fa48("547", "548", "549"), (stryMutAct_9fa48("550") ? top : (stryCov_9fa48("550"), !top)) || (stryMutAct_9fa48("553") ? y <= top.y : stryMutAct_9fa48("552") ? y >= top.y : stryMutAct_9fa48("551") ? false : (stryCov_9fa48("551", "552", "553"), y > top.y)))) top = stryMutAct_9fa48("554") ? {} : (stryCov_9fa48("554"), {
          id: boundary.id,
          y
        });
      }
    }
    return stryMutAct_9fa48("555") ? {} : (stryCov_9fa48("555"), {
      wingLoading: wingLoadingPa,
      envelope: (stryMutAct_9fa48("558") ? unmet === undefined : stryMutAct_9fa48("557") ? false : stryMutAct_9fa48("556") ? true : (stryCov_9fa48("556", "557", "558"), unmet !== undefined)) ? null : stryMutAct_9fa48("559") ? top?.y && (entries.length > 0 ? 0 : null) : (stryCov_9fa48("559"), (stryMutAct_9fa48("560") ? top.y : (stryCov_9fa48("560"), top?.y)) ?? ((stryMutAct_9fa48("564") ? entries.length <= 0 : stryMutAct_9fa48("563") ? entries.length >= 0 : stryMutAct_9fa48("562") ? false : stryMutAct_9fa48("561") ? true : (stryCov_9fa48("561", "562", "563", "564"), entries.length > 0)) ? 0 : null)),
      binding: stryMutAct_9fa48("565") ? (tightestLimit?.id ?? unmet ?? top?.id) && null : (stryCov_9fa48("565"), (stryMutAct_9fa48("566") ? (tightestLimit?.id ?? unmet) && top?.id : (stryCov_9fa48("566"), (stryMutAct_9fa48("567") ? tightestLimit?.id && unmet : (stryCov_9fa48("567"), (stryMutAct_9fa48("568") ? tightestLimit.id : (stryCov_9fa48("568"), tightestLimit?.id)) ?? unmet)) ?? (stryMutAct_9fa48("569") ? top.id : (stryCov_9fa48("569"), top?.id)))) ?? null),
      entries
    });
  }
}
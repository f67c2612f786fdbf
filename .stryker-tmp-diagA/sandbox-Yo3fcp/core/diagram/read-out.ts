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
const finiteOrNull = stryMutAct_9fa48("399") ? () => undefined : (stryCov_9fa48("399"), (() => {
  const finiteOrNull = (x: number): number | null => Number.isFinite(x) ? x : null;
  return finiteOrNull;
})());

/** Each enabled requirement's value at a wing loading, and which one binds. */
export function readAt(design: Design, wingLoadingPa: number): ReadOut {
  if (stryMutAct_9fa48("400")) {
    {}
  } else {
    stryCov_9fa48("400");
    const entries: ReadOutEntry[] = stryMutAct_9fa48("401") ? ["Stryker was here"] : (stryCov_9fa48("401"), []);
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
      if (stryMutAct_9fa48("402")) {
        {}
      } else {
        stryCov_9fa48("402");
        const label = (stryMutAct_9fa48("405") ? requirement.label !== undefined : stryMutAct_9fa48("404") ? false : stryMutAct_9fa48("403") ? true : (stryCov_9fa48("403", "404", "405"), requirement.label === undefined)) ? {} : stryMutAct_9fa48("406") ? {} : (stryCov_9fa48("406"), {
          label: requirement.label
        });
        if (stryMutAct_9fa48("409") ? boundary.type !== 'limit' : stryMutAct_9fa48("408") ? false : stryMutAct_9fa48("407") ? true : (stryCov_9fa48("407", "408", "409"), boundary.type === (stryMutAct_9fa48("410") ? "" : (stryCov_9fa48("410"), 'limit')))) {
          if (stryMutAct_9fa48("411")) {
            {}
          } else {
            stryCov_9fa48("411");
            const exceeded = stryMutAct_9fa48("415") ? wingLoadingPa <= boundary.wingLoadingMaxPa : stryMutAct_9fa48("414") ? wingLoadingPa >= boundary.wingLoadingMaxPa : stryMutAct_9fa48("413") ? false : stryMutAct_9fa48("412") ? true : (stryCov_9fa48("412", "413", "414", "415"), wingLoadingPa > boundary.wingLoadingMaxPa);
            entries.push(stryMutAct_9fa48("416") ? {} : (stryCov_9fa48("416"), {
              type: stryMutAct_9fa48("417") ? "" : (stryCov_9fa48("417"), 'limit'),
              id: boundary.id,
              kind: boundary.kind,
              ...label,
              wingLoadingMax: boundary.wingLoadingMaxPa,
              exceeded
            }));
            if (stryMutAct_9fa48("420") ? exceeded || !tightestLimit || boundary.wingLoadingMaxPa < tightestLimit.at : stryMutAct_9fa48("419") ? false : stryMutAct_9fa48("418") ? true : (stryCov_9fa48("418", "419", "420"), exceeded && (stryMutAct_9fa48("422") ? !tightestLimit && boundary.wingLoadingMaxPa < tightestLimit.at : stryMutAct_9fa48("421") ? true : (stryCov_9fa48("421", "422"), (stryMutAct_9fa48("423") ? tightestLimit : (stryCov_9fa48("423"), !tightestLimit)) || (stryMutAct_9fa48("426") ? boundary.wingLoadingMaxPa >= tightestLimit.at : stryMutAct_9fa48("425") ? boundary.wingLoadingMaxPa <= tightestLimit.at : stryMutAct_9fa48("424") ? false : (stryCov_9fa48("424", "425", "426"), boundary.wingLoadingMaxPa < tightestLimit.at)))))) {
              if (stryMutAct_9fa48("427")) {
                {}
              } else {
                stryCov_9fa48("427");
                tightestLimit = stryMutAct_9fa48("428") ? {} : (stryCov_9fa48("428"), {
                  id: boundary.id,
                  at: boundary.wingLoadingMaxPa
                });
              }
            }
            continue;
          }
        }
        const y = boundary.required(wingLoadingPa);
        entries.push(stryMutAct_9fa48("429") ? {} : (stryCov_9fa48("429"), {
          type: stryMutAct_9fa48("430") ? "" : (stryCov_9fa48("430"), 'curve'),
          id: boundary.id,
          kind: boundary.kind,
          ...label,
          required: finiteOrNull(y),
          speed: finiteOrNull(boundary.speedAt(wingLoadingPa))
        }));
        if (stryMutAct_9fa48("433") ? false : stryMutAct_9fa48("432") ? true : stryMutAct_9fa48("431") ? Number.isFinite(y) : (stryCov_9fa48("431", "432", "433"), !Number.isFinite(y))) stryMutAct_9fa48("434") ? unmet &&= boundary.id : (stryCov_9fa48("434"), unmet ??= boundary.id);else if (stryMutAct_9fa48("437") ? !top && y > top.y : stryMutAct_9fa48("436") ? false : stryMutAct_9fa48("435") ? true : (stryCov_9fa48("435", "436", "437"), (stryMutAct_9fa48("438") ? top : (stryCov_9fa48("438"), !top)) || (stryMutAct_9fa48("441") ? y <= top.y : stryMutAct_9fa48("440") ? y >= top.y : stryMutAct_9fa48("439") ? false : (stryCov_9fa48("439", "440", "441"), y > top.y)))) top = stryMutAct_9fa48("442") ? {} : (stryCov_9fa48("442"), {
          id: boundary.id,
          y
        });
      }
    }
    return stryMutAct_9fa48("443") ? {} : (stryCov_9fa48("443"), {
      wingLoading: wingLoadingPa,
      envelope: (stryMutAct_9fa48("446") ? unmet === undefined : stryMutAct_9fa48("445") ? false : stryMutAct_9fa48("444") ? true : (stryCov_9fa48("444", "445", "446"), unmet !== undefined)) ? null : stryMutAct_9fa48("447") ? top?.y && (entries.length > 0 ? 0 : null) : (stryCov_9fa48("447"), (stryMutAct_9fa48("448") ? top.y : (stryCov_9fa48("448"), top?.y)) ?? ((stryMutAct_9fa48("452") ? entries.length <= 0 : stryMutAct_9fa48("451") ? entries.length >= 0 : stryMutAct_9fa48("450") ? false : stryMutAct_9fa48("449") ? true : (stryCov_9fa48("449", "450", "451", "452"), entries.length > 0)) ? 0 : null)),
      binding: stryMutAct_9fa48("453") ? (tightestLimit?.id ?? unmet ?? top?.id) && null : (stryCov_9fa48("453"), (stryMutAct_9fa48("454") ? (tightestLimit?.id ?? unmet) && top?.id : (stryCov_9fa48("454"), (stryMutAct_9fa48("455") ? tightestLimit?.id && unmet : (stryCov_9fa48("455"), (stryMutAct_9fa48("456") ? tightestLimit.id : (stryCov_9fa48("456"), tightestLimit?.id)) ?? unmet)) ?? (stryMutAct_9fa48("457") ? top.id : (stryCov_9fa48("457"), top?.id)))) ?? null),
      entries
    });
  }
}
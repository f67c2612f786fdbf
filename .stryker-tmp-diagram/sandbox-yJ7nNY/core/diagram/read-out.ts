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
const finiteOrNull = stryMutAct_9fa48("1100") ? () => undefined : (stryCov_9fa48("1100"), (() => {
  const finiteOrNull = (x: number): number | null => Number.isFinite(x) ? x : null;
  return finiteOrNull;
})());

/** Each enabled requirement's value at a wing loading, and which one binds. */
export function readAt(design: Design, wingLoadingPa: number): ReadOut {
  if (stryMutAct_9fa48("1101")) {
    {}
  } else {
    stryCov_9fa48("1101");
    const entries: ReadOutEntry[] = stryMutAct_9fa48("1102") ? ["Stryker was here"] : (stryCov_9fa48("1102"), []);
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
      if (stryMutAct_9fa48("1103")) {
        {}
      } else {
        stryCov_9fa48("1103");
        const label = (stryMutAct_9fa48("1106") ? requirement.label !== undefined : stryMutAct_9fa48("1105") ? false : stryMutAct_9fa48("1104") ? true : (stryCov_9fa48("1104", "1105", "1106"), requirement.label === undefined)) ? {} : stryMutAct_9fa48("1107") ? {} : (stryCov_9fa48("1107"), {
          label: requirement.label
        });
        if (stryMutAct_9fa48("1110") ? boundary.type !== 'limit' : stryMutAct_9fa48("1109") ? false : stryMutAct_9fa48("1108") ? true : (stryCov_9fa48("1108", "1109", "1110"), boundary.type === (stryMutAct_9fa48("1111") ? "" : (stryCov_9fa48("1111"), 'limit')))) {
          if (stryMutAct_9fa48("1112")) {
            {}
          } else {
            stryCov_9fa48("1112");
            const exceeded = stryMutAct_9fa48("1116") ? wingLoadingPa <= boundary.wingLoadingMaxPa : stryMutAct_9fa48("1115") ? wingLoadingPa >= boundary.wingLoadingMaxPa : stryMutAct_9fa48("1114") ? false : stryMutAct_9fa48("1113") ? true : (stryCov_9fa48("1113", "1114", "1115", "1116"), wingLoadingPa > boundary.wingLoadingMaxPa);
            entries.push(stryMutAct_9fa48("1117") ? {} : (stryCov_9fa48("1117"), {
              type: stryMutAct_9fa48("1118") ? "" : (stryCov_9fa48("1118"), 'limit'),
              id: boundary.id,
              kind: boundary.kind,
              ...label,
              wingLoadingMax: boundary.wingLoadingMaxPa,
              exceeded
            }));
            if (stryMutAct_9fa48("1121") ? exceeded || !tightestLimit || boundary.wingLoadingMaxPa < tightestLimit.at : stryMutAct_9fa48("1120") ? false : stryMutAct_9fa48("1119") ? true : (stryCov_9fa48("1119", "1120", "1121"), exceeded && (stryMutAct_9fa48("1123") ? !tightestLimit && boundary.wingLoadingMaxPa < tightestLimit.at : stryMutAct_9fa48("1122") ? true : (stryCov_9fa48("1122", "1123"), (stryMutAct_9fa48("1124") ? tightestLimit : (stryCov_9fa48("1124"), !tightestLimit)) || (stryMutAct_9fa48("1127") ? boundary.wingLoadingMaxPa >= tightestLimit.at : stryMutAct_9fa48("1126") ? boundary.wingLoadingMaxPa <= tightestLimit.at : stryMutAct_9fa48("1125") ? false : (stryCov_9fa48("1125", "1126", "1127"), boundary.wingLoadingMaxPa < tightestLimit.at)))))) {
              if (stryMutAct_9fa48("1128")) {
                {}
              } else {
                stryCov_9fa48("1128");
                tightestLimit = stryMutAct_9fa48("1129") ? {} : (stryCov_9fa48("1129"), {
                  id: boundary.id,
                  at: boundary.wingLoadingMaxPa
                });
              }
            }
            continue;
          }
        }
        const y = boundary.required(wingLoadingPa);
        entries.push(stryMutAct_9fa48("1130") ? {} : (stryCov_9fa48("1130"), {
          type: stryMutAct_9fa48("1131") ? "" : (stryCov_9fa48("1131"), 'curve'),
          id: boundary.id,
          kind: boundary.kind,
          ...label,
          required: finiteOrNull(y),
          speed: finiteOrNull(boundary.speedAt(wingLoadingPa))
        }));
        if (stryMutAct_9fa48("1134") ? false : stryMutAct_9fa48("1133") ? true : stryMutAct_9fa48("1132") ? Number.isFinite(y) : (stryCov_9fa48("1132", "1133", "1134"), !Number.isFinite(y))) stryMutAct_9fa48("1135") ? unmet &&= boundary.id : (stryCov_9fa48("1135"), unmet ??= boundary.id);else if (stryMutAct_9fa48("1138") ? !top && y > top.y : stryMutAct_9fa48("1137") ? false : stryMutAct_9fa48("1136") ? true : (stryCov_9fa48("1136", "1137", "1138"), (stryMutAct_9fa48("1139") ? top : (stryCov_9fa48("1139"), !top)) || (stryMutAct_9fa48("1142") ? y <= top.y : stryMutAct_9fa48("1141") ? y >= top.y : stryMutAct_9fa48("1140") ? false : (stryCov_9fa48("1140", "1141", "1142"), y > top.y)))) top = stryMutAct_9fa48("1143") ? {} : (stryCov_9fa48("1143"), {
          id: boundary.id,
          y
        });
      }
    }
    return stryMutAct_9fa48("1144") ? {} : (stryCov_9fa48("1144"), {
      wingLoading: wingLoadingPa,
      envelope: (stryMutAct_9fa48("1147") ? unmet === undefined : stryMutAct_9fa48("1146") ? false : stryMutAct_9fa48("1145") ? true : (stryCov_9fa48("1145", "1146", "1147"), unmet !== undefined)) ? null : stryMutAct_9fa48("1148") ? top?.y && (entries.length > 0 ? 0 : null) : (stryCov_9fa48("1148"), (stryMutAct_9fa48("1149") ? top.y : (stryCov_9fa48("1149"), top?.y)) ?? ((stryMutAct_9fa48("1153") ? entries.length <= 0 : stryMutAct_9fa48("1152") ? entries.length >= 0 : stryMutAct_9fa48("1151") ? false : stryMutAct_9fa48("1150") ? true : (stryCov_9fa48("1150", "1151", "1152", "1153"), entries.length > 0)) ? 0 : null)),
      binding: stryMutAct_9fa48("1154") ? (tightestLimit?.id ?? unmet ?? top?.id) && null : (stryCov_9fa48("1154"), (stryMutAct_9fa48("1155") ? (tightestLimit?.id ?? unmet) && top?.id : (stryCov_9fa48("1155"), (stryMutAct_9fa48("1156") ? tightestLimit?.id && unmet : (stryCov_9fa48("1156"), (stryMutAct_9fa48("1157") ? tightestLimit.id : (stryCov_9fa48("1157"), tightestLimit?.id)) ?? unmet)) ?? (stryMutAct_9fa48("1158") ? top.id : (stryCov_9fa48("1158"), top?.id)))) ?? null),
      entries
    });
  }
}
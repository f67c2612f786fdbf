/**
 * Comparing two versions: requirements matched by id (added, removed, changed
 * field by field), assumptions under `aircraft`, the other concept fields, and
 * how the optimum, the design point, each margin and the sizing moved.
 */
// @ts-nocheck

import type {
  EvaluationSummary,
  FieldChange,
  LoadingPoint,
  MarginChange,
  MarginValue,
  PointMove,
  RequirementChange,
  RequirementRef,
  VersionComparison,
  VersionDetail,
} from './contract';
import { fieldChanges } from './field-diff';

type Json = Record<string, unknown>;

function asObject(value: unknown): Json {
  return typeof value === 'object' && value !== null && !Array.isArray(value) ? (value as Json) : {};
}

function requirementsById(concept: Json): Map<string, Json> {
  const list = Array.isArray(concept.requirements) ? concept.requirements : [];
  const byId = new Map<string, Json>();
  list.forEach((item, index) => {
    const requirement = asObject(item);
    byId.set(typeof requirement.id === 'string' ? requirement.id : `#${index}`, requirement);
  });
  return byId;
}

function ref(id: string, requirement: Json): RequirementRef {
  return {
    id,
    kind: String(requirement.kind ?? ''),
    ...(typeof requirement.label === 'string' ? { label: requirement.label } : {}),
    requirement: structuredClone(requirement),
  };
}

function compareRequirements(a: Json, b: Json): VersionComparison['requirements'] {
  const before = requirementsById(a);
  const after = requirementsById(b);
  const added: RequirementRef[] = [];
  const removed: RequirementRef[] = [];
  const changed: RequirementChange[] = [];
  for (const [id, requirement] of after) {
    const old = before.get(id);
    if (!old) {
      added.push(ref(id, requirement));
      continue;
    }
    const fields = fieldChanges(old, requirement);
    if (fields.length > 0) {
      const label = requirement.label ?? old.label;
      changed.push({ id, kind: String(requirement.kind ?? old.kind ?? ''), ...(typeof label === 'string' ? { label } : {}), fields });
    }
  }
  for (const [id, requirement] of before) if (!after.has(id)) removed.push(ref(id, requirement));
  return { added, removed, changed };
}

function delta(before: number | null, after: number | null): number | null {
  return before === null || after === null ? null : after - before;
}

function move(before: LoadingPoint | null, after: LoadingPoint | null, sameAxis: boolean): PointMove {
  const point = (p: LoadingPoint | null): LoadingPoint | null => (p ? { wingLoading: p.wingLoading, loading: p.loading } : null);
  return {
    before: point(before),
    after: point(after),
    // Power and thrust loadings are different quantities: no delta across a change of axis.
    delta:
      before && after && sameAxis
        ? { wingLoading: after.wingLoading - before.wingLoading, loading: after.loading - before.loading }
        : null,
  };
}

function marginChanges(before: readonly MarginValue[] | undefined, after: readonly MarginValue[] | undefined): MarginChange[] {
  const old = new Map((before ?? []).map((entry) => [entry.id, entry.margin]));
  const now = new Map((after ?? []).map((entry) => [entry.id, entry.margin]));
  const ids = [...now.keys(), ...[...old.keys()].filter((id) => !now.has(id))];
  return ids.map((id) => {
    const b = old.get(id) ?? null;
    const a = now.get(id) ?? null;
    return { id, before: b, after: a, delta: delta(b, a) };
  });
}

function installed(summary: EvaluationSummary): number | null {
  return summary.sizing?.power ?? summary.sizing?.thrust ?? null;
}

export function compareVersions(a: VersionDetail, b: VersionDetail): VersionComparison {
  const conceptA = asObject(a.concept);
  const conceptB = asObject(b.concept);
  const sa = a.summary;
  const sb = b.summary;
  const sameAxis = sa.axis === sb.axis;
  const otherKeys = [...new Set([...Object.keys(conceptA), ...Object.keys(conceptB)])].filter(
    (key) => key !== 'aircraft' && key !== 'requirements',
  );
  const other: FieldChange[] = otherKeys.flatMap((key) => fieldChanges(conceptA[key], conceptB[key], key));
  const optimumMove = move(sa.optimum, sb.optimum, sameAxis);
  const designMove = move(sa.designPoint, sb.designPoint, sameAxis);
  const areaBefore = sa.sizing?.wingArea ?? null;
  const areaAfter = sb.sizing?.wingArea ?? null;
  const installedBefore = installed(sa);
  const installedAfter = installed(sb);
  const versionRef = (v: VersionDetail) => ({ number: v.number, conceptName: v.conceptName, createdAt: v.createdAt, author: v.author });
  return {
    format: 'loftpoint-comparison/1',
    a: versionRef(a),
    b: versionRef(b),
    axis: { before: sa.axis, after: sb.axis },
    requirements: compareRequirements(conceptA, conceptB),
    assumptions: fieldChanges(conceptA.aircraft, conceptB.aircraft, 'aircraft'),
    other,
    optimum: { ...optimumMove, activeBefore: [...(sa.optimum?.active ?? [])], activeAfter: [...(sb.optimum?.active ?? [])] },
    designPoint: designMove,
    margins: {
      optimum: marginChanges(sa.optimum?.margins, sb.optimum?.margins),
      designPoint: marginChanges(sa.designPoint?.margins, sb.designPoint?.margins),
    },
    sizing: {
      wingArea: { id: 'wingArea', before: areaBefore, after: areaAfter, delta: delta(areaBefore, areaAfter) },
      installed: {
        id: sb.sizing?.thrust !== undefined ? 'thrust' : 'power',
        before: installedBefore,
        after: installedAfter,
        delta: sameAxis ? delta(installedBefore, installedAfter) : null,
      },
    },
  };
}

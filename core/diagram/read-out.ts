/**
 * What the diagram says at one wing loading, for a hover read-out.
 */
import type { Design, RequirementKind } from '../model';
import { requirementBoundaries } from './boundaries';

export type ReadOutEntry =
  | { type: 'limit'; id: string; kind: RequirementKind; label?: string; wingLoadingMax: number; exceeded: boolean }
  | {
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

const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null);

/** Each enabled requirement's value at a wing loading, and which one binds. */
export function readAt(design: Design, wingLoadingPa: number): ReadOut {
  const entries: ReadOutEntry[] = [];
  let tightestLimit: { id: string; at: number } | undefined;
  let unmet: string | undefined;
  let top: { id: string; y: number } | undefined;
  for (const { requirement, boundary } of requirementBoundaries(design)) {
    const label = requirement.label === undefined ? {} : { label: requirement.label };
    if (boundary.type === 'limit') {
      const exceeded = wingLoadingPa > boundary.wingLoadingMaxPa;
      entries.push({ type: 'limit', id: boundary.id, kind: boundary.kind, ...label, wingLoadingMax: boundary.wingLoadingMaxPa, exceeded });
      if (exceeded && (!tightestLimit || boundary.wingLoadingMaxPa < tightestLimit.at)) {
        tightestLimit = { id: boundary.id, at: boundary.wingLoadingMaxPa };
      }
      continue;
    }
    const y = boundary.required(wingLoadingPa);
    entries.push({ type: 'curve', id: boundary.id, kind: boundary.kind, ...label, required: finiteOrNull(y), speed: finiteOrNull(boundary.speedAt(wingLoadingPa)) });
    if (!Number.isFinite(y)) unmet ??= boundary.id;
    else if (!top || y > top.y) top = { id: boundary.id, y };
  }
  return {
    wingLoading: wingLoadingPa,
    envelope: unmet !== undefined ? null : (top?.y ?? (entries.length > 0 ? 0 : null)),
    binding: tightestLimit?.id ?? unmet ?? top?.id ?? null,
    entries,
  };
}

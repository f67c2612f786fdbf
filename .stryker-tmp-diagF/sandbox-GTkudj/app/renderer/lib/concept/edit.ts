/**
 * Immutable edits of a concept document (the JSON as written): each returns
 * a new document and leaves the old one untouched, so every step can be
 * undone and a saved version is never changed by editing.
 */
// @ts-nocheck

import { NEW_REQUIREMENT } from './fields';
import type { RequirementKind } from '../../../../core';

export type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
export type ConceptDocument = { [key: string]: Json };
export type PathKey = string | number;

function isRecord(value: unknown): value is { [key: string]: Json } {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

/** The value at a path, or undefined. */
export function getIn(document: unknown, path: readonly PathKey[]): Json | undefined {
  let node: unknown = document;
  for (const key of path) {
    if (Array.isArray(node) && typeof key === 'number') node = node[key];
    else if (isRecord(node) && typeof key === 'string') node = Object.hasOwn(node, key) ? node[key] : undefined;
    else return undefined;
  }
  return node as Json | undefined;
}

/** A copy with the value at `path` replaced; `undefined` removes the key. Missing objects on the way are created. */
export function setIn<T extends Json>(document: T, path: readonly PathKey[], value: Json | undefined): T {
  if (path.length === 0) return (value ?? null) as T;
  const [key, ...rest] = path;
  if (Array.isArray(document) && typeof key === 'number') {
    const copy = [...document];
    if (rest.length === 0 && value === undefined) copy.splice(key, 1);
    else copy[key] = setIn((copy[key] ?? {}) as Json, rest, value);
    return copy as T;
  }
  const record: { [key: string]: Json } = isRecord(document) ? { ...document } : {};
  const name = String(key);
  if (rest.length === 0) {
    if (value === undefined) delete record[name];
    else record[name] = value;
  } else {
    record[name] = setIn((record[name] ?? (typeof rest[0] === 'number' ? [] : {})) as Json, rest, value);
  }
  return record as T;
}

export function requirementsOf(document: ConceptDocument): Array<{ [key: string]: Json }> {
  const list = document.requirements;
  return Array.isArray(list) ? list.filter(isRecord) : [];
}

/** An id not yet used: "cruise", then "cruise-2", "cruise-3"... */
export function freshRequirementId(document: ConceptDocument, kind: string): string {
  const taken = new Set(requirementsOf(document).map((requirement) => String(requirement.id)));
  if (!taken.has(kind)) return kind;
  for (let n = 2; ; n += 1) if (!taken.has(`${kind}-${n}`)) return `${kind}-${n}`;
}

export function addRequirement(document: ConceptDocument, kind: RequirementKind): { document: ConceptDocument; id: string } {
  const id = freshRequirementId(document, kind);
  const requirement: { [key: string]: Json } = { id, kind, ...NEW_REQUIREMENT[kind] };
  return { document: { ...document, requirements: [...requirementsOf(document), requirement] }, id };
}

/** Removes the requirement and any ranges on its own assumptions (`requirements.ID.…`), which would otherwise point at nothing. */
export function removeRequirement(document: ConceptDocument, index: number): ConceptDocument {
  const requirements = requirementsOf(document);
  const id = requirements[index]?.id;
  const next: ConceptDocument = { ...document, requirements: requirements.filter((_, i) => i !== index) };
  const uncertainty = document.uncertainty;
  if (typeof id !== 'string' || !isRecord(uncertainty) || !Array.isArray(uncertainty.parameters)) return next;
  const prefix = `requirements.${id}.`;
  const parameters = uncertainty.parameters.filter((parameter) => !(isRecord(parameter) && typeof parameter.field === 'string' && parameter.field.startsWith(prefix)));
  return parameters.length === uncertainty.parameters.length ? next : { ...next, uncertainty: { ...uncertainty, parameters } };
}

/** `enabled` is left out when true, as the file's default. */
export function setRequirementEnabled(document: ConceptDocument, index: number, enabled: boolean): ConceptDocument {
  return setIn(document, ['requirements', index, 'enabled'], enabled ? undefined : false);
}

/** `value` rounded to `digits` significant digits, towards `direction` (-1 down, 1 up, 0 nearest). */
export function roundSignificant(value: number, digits: number, direction: -1 | 0 | 1 = 0): number {
  if (!Number.isFinite(value) || value === 0) return value;
  const step = 10 ** (Math.floor(Math.log10(Math.abs(value))) - digits + 1);
  const round = direction < 0 ? Math.floor : direction > 0 ? Math.ceil : Math.round;
  return Number((round(value / step) * step).toPrecision(digits));
}

/**
 * The design point written in the file's units, SI. `onFeasibleSide` rounds
 * the wing loading down and the loading up, so a point snapped onto the
 * optimum stays on the feasible side of the boundaries it sits on.
 */
export function setDesignPoint(
  document: ConceptDocument,
  point: { wingLoadingPa: number; loading: number } | null,
  axis: 'powerToWeight' | 'thrustToWeight',
  onFeasibleSide = false,
): ConceptDocument {
  if (point === null) return setIn(document, ['designPoint'], undefined);
  const digits = onFeasibleSide ? 7 : 6;
  const w = roundSignificant(point.wingLoadingPa, digits, onFeasibleSide ? -1 : 0);
  const y = roundSignificant(point.loading, digits - 1, onFeasibleSide ? 1 : 0);
  const wingLoading = `${w} N/m^2`;
  const loading = axis === 'thrustToWeight' ? y : `${y} W/N`;
  return { ...document, designPoint: { wingLoading, [axis]: loading } };
}

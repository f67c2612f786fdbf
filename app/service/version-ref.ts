/**
 * How a user names a stored version: `N`, the project-wide number every
 * script has used (`--version 3`), or `CONCEPT@N` (also `CONCEPT@vN`), the
 * N-th version of that concept as the version lists show it (v1, v2, ...).
 * A concept name may itself hold "@": the last one separates the number.
 */
import type { VersionSummary } from '../shared/contract';

export type VersionName = { kind: 'project'; number: number } | { kind: 'concept'; concept: string; version: number };

/** The reference written in `text`, or what is wrong with it (one phrase). */
export function parseVersionRef(text: string): VersionName | { error: string } {
  const trimmed = text.trim();
  if (/^\d+$/.test(trimmed) && Number(trimmed) >= 1) return { kind: 'project', number: Number(trimmed) };
  const at = trimmed.lastIndexOf('@');
  if (at > 0) {
    const concept = trimmed.slice(0, at).trim();
    const number = trimmed.slice(at + 1).trim().replace(/^v/i, '');
    if (concept !== '' && /^\d+$/.test(number) && Number(number) >= 1) return { kind: 'concept', concept, version: Number(number) };
  }
  return { error: `"${text}" is not a version: give a project-wide number (1, 2, 3, ...) or CONCEPT@N for a concept's N-th version (e.g. "Trainer@2")` };
}

/** The project-wide number of a concept reference among that concept's versions (as listVersions gives them), or why not. */
export function conceptVersionNumber(ref: Extract<VersionName, { kind: 'concept' }>, versions: readonly VersionSummary[]): number | { error: string } {
  const own = versions.filter((v) => v.conceptName === ref.concept);
  if (own.length === 0) return { error: `the project has no concept named "${ref.concept}"` };
  const found = own.find((v) => v.conceptVersion === ref.version);
  if (!found) return { error: `"${ref.concept}" has versions v1 to v${own.length}, not v${ref.version}` };
  return found.number;
}

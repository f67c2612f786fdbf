/**
 * Why the mission gives no take-off mass, in the engine's own words (the
 * evaluation's `mission-not-closed` warning names the mission and the
 * fraction that fails), or null when it closes. A problem in the mission
 * block that stops the concept from reading shows with its field.
 */
import type { WarningJson } from '../../../../core';
import type { Issue } from '../state/workspace.svelte';

/** The evaluation's warning code for a mission whose mass does not close. */
export const NOT_CLOSED = 'mission-not-closed';

const DRAWN = /^the diagram could not be drawn: /;

export function missionProblem(issues: readonly Issue[], warnings: readonly WarningJson[]): string | null {
  for (const issue of issues) {
    const message = issue.message.replace(DRAWN, '');
    if (issue.path.startsWith('mission')) return `${issue.path} ${message}`;
    if (/^mission\b/.test(message)) return message;
  }
  return warnings.find((warning) => warning.code === NOT_CLOSED)?.message ?? null;
}

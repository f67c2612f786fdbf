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

/** The engine's message as a sentence the panels show: "The mission does not close: empty-mass fraction 0.95 plus …". */
export function notClosedText(message: string): string {
  return `The mission does not close: ${message.replace(/^mission:\s*/, '')}`;
}

export function missionProblem(issues: readonly Issue[], warnings: readonly WarningJson[]): string | null {
  for (const issue of issues) {
    const message = issue.message.replace(DRAWN, '');
    if (issue.path.startsWith('mission')) return `${issue.path} ${message}`;
    if (/^mission\b/.test(message)) return message;
  }
  const warning = warnings.find((entry) => entry.code === NOT_CLOSED);
  return warning ? notClosedText(warning.message) : null;
}

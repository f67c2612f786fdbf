/**
 * Why the mission gives no take-off mass, in the engine's own words (the
 * message names the mission and the fraction that fails), or null when it
 * closes. A concept-level problem in the mission block shows with its field.
 */
import type { Issue } from '../state/workspace.svelte';

const DRAWN = /^the diagram could not be drawn: /;

export function missionProblem(issues: readonly Issue[], warnings: ReadonlyArray<{ field: string; message: string }>): string | null {
  for (const issue of issues) {
    const message = issue.message.replace(DRAWN, '');
    if (issue.path.startsWith('mission')) return `${issue.path} ${message}`;
    if (/^mission\b/.test(message)) return message;
  }
  const warning = warnings.find((entry) => entry.field === 'mission' && /clos/.test(entry.message));
  return warning ? warning.message : null;
}

/**
 * The concept file's format name and the shape of a problem found in one.
 */
// @ts-nocheck


/** The format string this build writes, and the newest it reads. */
export const CONCEPT_FORMAT = 'loftpoint-concept/1';

/**
 * One problem in a concept file. `path` reads like
 * `aircraft.aero.configurations.clean.oswaldEfficiency` or
 * `requirements[1].speed` ('' for the document as a whole).
 */
export interface ConceptIssue {
  path: string;
  message: string;
}

const PLAIN_KEY = /^[A-Za-z_][A-Za-z0-9_-]*$/;

/** ['requirements', 1, 'speed'] -> 'requirements[1].speed'. */
export function fieldPath(path: readonly PropertyKey[]): string {
  let text = '';
  for (const key of path) {
    if (typeof key === 'number') text += `[${key}]`;
    else if (typeof key === 'string' && PLAIN_KEY.test(key)) text += text === '' ? key : `.${key}`;
    else text += `[${JSON.stringify(String(key))}]`;
  }
  return text;
}

/** One line for a person: `requirements[1].speed: is a bare number ...`. */
export function formatIssue(issue: ConceptIssue): string {
  return issue.path === '' ? issue.message : `${issue.path}: ${issue.message}`;
}

/**
 * Zod's findings turned into messages an engineer can act on:
 * `requirements[1].speed: is a bare number (45); write it with a unit ...`.
 * Zod's own JSON never reaches a person.
 */
import type { z } from 'zod';
import { PROPULSION_KINDS, REQUIREMENT_KINDS } from '../model';
import { fieldPath, type ConceptIssue } from './format';
import { MISSION_SEGMENT_KINDS } from './mission-schema';
import { fieldsAt, kindsWithField } from './fields';
import { closestName } from './suggest';
import { shortened } from '../shortened';

type ZodIssue = z.core.$ZodIssue;

/** A written value as it stands in the file: an object or list as JSON, never "[object Object]". */
const show = (value: unknown): string => shortened(JSON.stringify(value) ?? String(value));

function kindOf(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'a list';
  if (typeof value === 'object') return 'an object';
  if (typeof value === 'string') return `a string (${shortened(JSON.stringify(value))})`;
  return `${typeof value === 'number' ? 'a number' : typeof value === 'boolean' ? 'true/false' : typeof value} (${String(value)})`;
}

const EXPECTED: Record<string, string> = {
  number: 'a plain number',
  int: 'a whole number',
  string: 'text in double quotes',
  boolean: 'true or false',
  object: 'an object { ... }',
  array: 'a list [ ... ]',
  tuple: 'a list [ ... ]',
};

function unknownField(path: readonly PropertyKey[], key: string, document: unknown): string {
  const here = fieldsAt(path, document);
  const inConfiguration = path.length === 4 && path[2] === 'configurations';
  if (inConfiguration && path[3] !== 'clean' && key === 'cd0') {
    return 'unknown field; a configuration other than clean gives cd0Increment, which is added to clean\'s cd0';
  }
  const guess = here && closestName(key, here);
  if (guess) return `unknown field; did you mean "${guess}"?`;
  if (path[0] === 'requirements' && path.length === 2) {
    const owners = kindsWithField(key);
    if (owners.length) return `unknown field for this kind of requirement; "${key}" belongs to ${owners.join(', ')}`;
  }
  return here ? `unknown field; fields here: ${here.join(', ')}` : 'unknown field';
}

/** The kinds a `kind` field may take where it stands, and what they are called. */
function kindsAt(path: readonly PropertyKey[]): { what: string; kinds: readonly string[] } {
  if (path[0] === 'mission' && path[1] === 'segments') return { what: 'mission segment kind', kinds: MISSION_SEGMENT_KINDS };
  if (path[0] === 'mission' && path[1] === 'energy') return { what: 'energy kind', kinds: ['fuel', 'battery'] };
  return { what: 'requirement kind', kinds: REQUIREMENT_KINDS };
}

function discriminatorMessage(issue: Extract<ZodIssue, { code: 'invalid_union' }>, path: readonly PropertyKey[]): string {
  const written = (issue.input as Record<string, unknown> | undefined)?.kind;
  const { what, kinds } = kindsAt(path);
  const expected = kinds.join(', ');
  if (written === undefined) return `is required; one of ${expected}`;
  const guess = typeof written === 'string' ? closestName(written, kinds) : undefined;
  return `unknown ${what} ${show(written)}; expected one of ${expected}${guess ? ` (did you mean "${guess}"?)` : ''}`;
}

function limitMessage(issue: Extract<ZodIssue, { code: 'too_small' | 'too_big' }>, path: readonly PropertyKey[]): string {
  const small = issue.code === 'too_small';
  const bound = Number(small ? issue.minimum : (issue as { maximum: number }).maximum);
  if (issue.origin === 'array') {
    if (path.length === 1 && path[0] === 'requirements') return 'must list at least one requirement';
    if (path.join('/') === 'diagram/wingLoading') return 'must be two values [low, high], e.g. ["200 N/m^2", "1500 N/m^2"]';
    return `must have ${small ? 'at least' : 'at most'} ${bound} ${bound === 1 ? 'entry' : 'entries'}`;
  }
  if (issue.origin === 'string') return 'must not be empty';
  const words = small ? (issue.inclusive ? 'at least' : 'greater than') : issue.inclusive ? 'at most' : 'less than';
  return `must be ${words} ${bound} (got ${show(issue.input)})`;
}

function invalidType(issue: Extract<ZodIssue, { code: 'invalid_type' }>): string {
  const want = EXPECTED[issue.expected] ?? issue.expected;
  if (issue.input === undefined) return `is required (${want})`;
  if (issue.expected === 'int' && typeof issue.input === 'number') return `must be a whole number (got ${issue.input})`;
  if (issue.expected === 'number' && typeof issue.input === 'string' && issue.input.trim() !== '' && Number.isFinite(Number(issue.input))) {
    return `must be a plain number, not text; write ${issue.input.trim()} without quotes`;
  }
  return `must be ${want} (got ${kindOf(issue.input)})`;
}

function messageFor(issue: ZodIssue, path: readonly PropertyKey[]): string {
  switch (issue.code) {
    case 'invalid_type':
      return invalidType(issue);
    case 'too_small':
    case 'too_big':
      return limitMessage(issue, path);
    case 'invalid_union':
      return issue.discriminator === 'kind' ? discriminatorMessage(issue, path) : 'does not match any accepted form';
    case 'invalid_value': {
      const isPropulsion = path.join('/') === 'aircraft/propulsion/kind';
      if (isPropulsion && issue.input === undefined) return `is missing; give the propulsion kind, one of ${issue.values.map((v) => String(v)).join(', ')}`;
      const guess = isPropulsion && typeof issue.input === 'string' ? closestName(issue.input, PROPULSION_KINDS) : undefined;
      const what = isPropulsion ? `unknown propulsion kind ${show(issue.input)}; expected` : `must be`;
      return `${what} one of ${issue.values.map((v) => String(v)).join(', ')}${guess ? ` (did you mean "${guess}"?)` : isPropulsion ? '' : ` (got ${show(issue.input)})`}`;
    }
    default:
      return issue.message;
  }
}

/** The id of the requirement a path points into, for naming it in the message. */
function requirementId(path: readonly PropertyKey[], document: unknown): string | undefined {
  if (path[0] !== 'requirements' || typeof path[1] !== 'number' || path.length < 3) return undefined;
  const list = (document as { requirements?: unknown }).requirements;
  const id = Array.isArray(list) ? (list[path[1]] as { id?: unknown } | undefined)?.id : undefined;
  return typeof id === 'string' && id !== '' && path[2] !== 'id' ? id : undefined;
}

/**
 * One issue per offending field, in document order, first finding per field
 * kept; except that an unknown field whose nearest known name is missing comes
 * just before that missing field, since the slip explains it.
 */
export function translateIssues(issues: readonly ZodIssue[], document: unknown): ConceptIssue[] {
  const result: ConceptIssue[] = [];
  /** Unknown fields by the path of the known field they were probably meant to be. */
  const meantFor = new Map<string, ConceptIssue[]>();
  const seen = new Set<string>();
  const add = (path: readonly PropertyKey[], message: string, meant?: string) => {
    const text = fieldPath(path);
    if (seen.has(text)) return;
    seen.add(text);
    const id = requirementId(path, document);
    const entry = { path: text, message: id ? `${message} (requirement "${id}")` : message };
    result.push(entry);
    if (meant !== undefined) meantFor.set(meant, [...(meantFor.get(meant) ?? []), entry]);
  };
  for (const issue of issues) {
    if (issue.code === 'unrecognized_keys') {
      const here = fieldsAt(issue.path, document);
      for (const key of issue.keys) {
        const guess = here && closestName(key, here);
        add([...issue.path, key], unknownField(issue.path, key, document), guess ? fieldPath([...issue.path, guess]) : undefined);
      }
    } else add(issue.path, messageFor(issue, issue.path));
  }
  if (meantFor.size === 0) return result;
  const moved = new Set([...meantFor.entries()].filter(([path]) => seen.has(path)).flatMap(([, entries]) => entries));
  return result.flatMap((entry) => (moved.has(entry) ? [] : [...(meantFor.get(entry.path)?.filter((u) => moved.has(u)) ?? []), entry]));
}

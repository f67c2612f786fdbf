/**
 * Reading a concept: migrate to the current format, check every field,
 * check the rules that join fields, then resolve to the SI design model.
 * Never throws; every problem comes back as an issue with a field path.
 */
import type { WarningJson } from '../evaluation';
import type { Design } from '../model';
import { checkConcept } from './checks';
import { fieldPath, type ConceptIssue } from './format';
import { translateIssues } from './issues';
import { parseJsonText } from './json-text';
import { migrateConcept } from './migrate';
import { resolveConcept } from './resolve';
import { impossibleInputs } from '../diagram/impossible-inputs';
import { conceptSchema, type ConceptJson } from './schema';
import { LARGEST_MAGNITUDE, SMALLEST_MAGNITUDE, outOfRange } from '../units/quantity';
import { resolveUncertainty, type UncertainParameter } from '../studies/uncertainty-schema';

/** The concept's `uncertainty` block resolved against its design. */
export interface ConceptUncertainty {
  seed: number;
  samples: number;
  parameters: UncertainParameter[];
}

export type ParsedConcept =
  | { ok: true; concept: ConceptJson; design: Design; warnings: WarningJson[]; uncertainty?: ConceptUncertainty }
  | { ok: false; issues: ConceptIssue[] };

/**
 * Check and resolve a concept document. `concept` in the result is the
 * document as written (after any format migration), with no defaults filled
 * in, so saving it back keeps the user's text.
 */
/**
 * Plain numbers too large or too small to compute with (the limits of
 * parseQuantity), named by field before the schema looks at them: squares and
 * products of them would overflow to Infinity.
 */
function extremeNumbers(document: unknown): ConceptIssue[] {
  const issues: ConceptIssue[] = [];
  const stack: Array<{ value: unknown; path: PropertyKey[] }> = [{ value: document, path: [] }];
  while (stack.length > 0 && issues.length < 10) {
    const { value, path } = stack.pop()!;
    if (typeof value === 'number' && Number.isFinite(value) && outOfRange(value)) {
      const size = Math.abs(value) > 1 ? 'large' : 'small';
      issues.push({ path: fieldPath(path), message: `${value} is too ${size} a number to compute with (magnitudes from ${SMALLEST_MAGNITUDE} to ${LARGEST_MAGNITUDE}); write a realistic value` });
    } else if (Array.isArray(value)) {
      for (let i = value.length - 1; i >= 0; i--) stack.push({ value: value[i], path: [...path, i] });
    } else if (value !== null && typeof value === 'object') {
      for (const key of Object.keys(value).reverse()) stack.push({ value: (value as Record<string, unknown>)[key], path: [...path, key] });
    }
  }
  return issues;
}

export function parseConcept(input: unknown): ParsedConcept {
  try {
    const migrated = migrateConcept(input);
    if (!migrated.ok) return migrated;
    const extreme = extremeNumbers(migrated.concept);
    if (extreme.length) return { ok: false, issues: extreme };
    // Without zod's compiled fast path: building it costs more than a whole reading of a concept
    // (a one-shot command reads one), and a checked concept and its issues are the same either way.
    const checked = conceptSchema.safeParse(migrated.concept, { reportInput: true, jitless: true });
    if (!checked.success) return { ok: false, issues: translateIssues(checked.error.issues, migrated.concept) };
    const issues = checkConcept(checked.data);
    if (issues.length) return { ok: false, issues };
    const { design, warnings } = resolveConcept(checked.data);
    const impossible = impossibleInputs(design);
    if (impossible.length) return { ok: false, issues: impossible.map(({ field, message }) => ({ path: field, message })) };
    // A copy of what was written keeps its key order and leaves the caller's object alone.
    const concept = structuredClone(migrated.concept) as ConceptJson;
    // Every note from reading (migration, then resolution) travels with the design, so the evaluation carries each once.
    const readingWarnings = [...migrated.warnings, ...warnings];
    const result = { ok: true as const, concept, design: { ...design, warnings: [...readingWarnings] }, warnings: readingWarnings };
    if (checked.data.uncertainty === undefined) return result;
    const uncertainty = resolveUncertainty(checked.data.uncertainty, design, checked.data);
    if (!uncertainty.ok) return { ok: false, issues: uncertainty.issues };
    const { seed, samples, parameters } = uncertainty;
    return { ...result, uncertainty: { seed, samples, parameters } };
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    return { ok: false, issues: [{ path: '', message: `the concept could not be read: ${reason}` }] };
  }
}

/** Parse concept JSON text; malformed JSON comes back as an issue with its line and column. */
export function parseConceptText(text: string, source?: string): ParsedConcept {
  const json = parseJsonText(text);
  if (!json.ok) {
    const where = `line ${json.line}, column ${json.column}${source ? ` of ${source}` : ''}`;
    if (json.path) return { ok: false, issues: [{ path: fieldPath(json.path), message: `${json.reason} (${where})` }] };
    return { ok: false, issues: [{ path: '', message: `not valid JSON at ${where}: ${json.reason}` }] };
  }
  return parseConcept(json.value);
}

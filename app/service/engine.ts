/**
 * The service's use of core: check a concept, evaluate it, and the demo
 * concepts. Evaluation failures on a valid concept never cost the user a save.
 */
import { DEMO_CONCEPTS, evaluateDesign, loadingAxis, parseConcept, parseConceptText, type ParsedConcept } from '../../core';
import type { ConceptIssue, EvaluationSummary } from './contract';
import { demoChecksText, matchingDemoChecks, ownDemoChecksFile, readDemoChecks } from './demo-checks';
import { ServiceFailure } from './failure';
import { failedSummary, summarise } from './summary';

export interface CheckedConcept {
  /** The concept's `name` field, when it has one. */
  name: string | undefined;
  summary: EvaluationSummary;
  warnings: string[];
}

function warningLine(warning: unknown): string {
  if (typeof warning === 'string') return warning;
  if (warning && typeof warning === 'object') {
    const { field, path, message } = warning as { field?: unknown; path?: unknown; message?: unknown };
    const where = typeof field === 'string' && field ? field : typeof path === 'string' && path ? path : '';
    const text = typeof message === 'string' ? message : JSON.stringify(warning);
    return where ? `${where}: ${text}` : text;
  }
  return String(warning);
}

/** Validates and evaluates a concept object; throws 'invalid-concept' listing every schema issue. */
export function checkAndEvaluate(concept: unknown, source: string): CheckedConcept {
  return finish(parseConcept(concept), source);
}

/** The same for concept JSON text (malformed JSON is reported with its line and column). */
export function checkAndEvaluateText(text: string, source: string): CheckedConcept {
  return finish(parseConceptText(text, source), source);
}

function finish(parsed: ParsedConcept, source: string): CheckedConcept {
  if (!parsed.ok) throw invalidConcept(parsed.issues, source);
  let summary: EvaluationSummary;
  try {
    summary = summarise(evaluateDesign(parsed.design));
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    summary = failedSummary(loadingAxis(parsed.design.aircraft.propulsion.kind), `the diagram could not be evaluated: ${message}`);
  }
  const name = (parsed.concept as { name?: unknown }).name;
  return {
    name: typeof name === 'string' && name.trim() !== '' ? name.trim() : undefined,
    summary,
    warnings: (parsed.warnings as readonly unknown[]).map(warningLine),
  };
}

function invalidConcept(issues: readonly ConceptIssue[], source: string): ServiceFailure {
  const first = issues[0];
  const firstLine = first ? (first.path ? `${first.path}: ${first.message}` : first.message) : 'is not a valid concept';
  const more = issues.length > 1 ? ` (and ${issues.length - 1} more issue${issues.length > 2 ? 's' : ''})` : '';
  return new ServiceFailure('invalid-concept', `${source}: ${firstLine}${more}; nothing was saved`, {
    issues: issues.map((issue) => ({ path: issue.path, message: issue.message })),
    ...(first?.path ? { field: first.path } : {}),
  });
}

export interface DemoConcept {
  title: string;
  summary: string;
  concept: unknown;
}

export function demoConcepts(): DemoConcept[] {
  return DEMO_CONCEPTS.map((demo: DemoConcept) => ({ title: demo.title, summary: demo.summary, concept: demo.concept }));
}

/** Each demo concept's check and evaluation, by its concept object: the demos are constants and the engine is pure. */
const checkedDemos = new WeakMap<object, CheckedConcept>();
let recordedRead = false;

/**
 * The checks the build recorded beside the single file this runs from (app/service/demo-checks.ts),
 * taken once per process for the demos they still match.
 */
function takeRecordedChecks(): void {
  if (recordedRead) return;
  recordedRead = true;
  const text = readDemoChecks(ownDemoChecksFile());
  if (text === null) return;
  for (const [demo, checked] of matchingDemoChecks(text, DEMO_CONCEPTS as readonly DemoConcept[])) checkedDemos.set(demo.concept as object, checked);
}

/** The text of the file the build keeps beside its single file: every demo checked and evaluated now. */
export function freshDemoChecksText(): string {
  return demoChecksText(demoConcepts(), (demo) => checkAndEvaluate(demo.concept, `demo concept "${demo.title}"`));
}

/** A demo concept checked and evaluated, once per process (a demo the engine refuses throws every time). */
export function checkedDemo(demo: DemoConcept): CheckedConcept {
  const key = demo.concept && typeof demo.concept === 'object' ? demo.concept : null;
  takeRecordedChecks();
  const known = key ? checkedDemos.get(key) : undefined;
  if (known) return known;
  const checked = checkAndEvaluate(demo.concept, `demo concept "${demo.title}"`);
  if (key) checkedDemos.set(key, checked);
  return checked;
}

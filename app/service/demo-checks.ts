/**
 * The demo concepts' checks and evaluations, worked out once when the
 * command line is built ahead (app/build-cli.js) and kept beside its
 * single file: a new project with the demo concepts (browser mode's first
 * start) then writes the file without evaluating them again, about 140 ms of
 * CPU less while the browser loads the page.
 *
 * The results depend only on the demo concepts and the engine, both inside
 * the built file, whose name is its content's hash: a file of results
 * belongs to that one build. Each result is also tied to its concept's text,
 * and a result whose concept differs, or a file that cannot be read, is
 * simply not used: the demo is then checked and evaluated as before.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import type { EvaluationSummary } from './contract';

/** A demo as the build records it: its title and its concept. */
export interface RecordableDemo {
  title: string;
  concept: unknown;
}

/** A demo's check as recorded: what the service's check of a concept gives (app/service/engine.ts). */
export interface DemoCheck {
  name: string | undefined;
  summary: EvaluationSummary;
  warnings: string[];
}

/** The file of results beside the single-file build `bundle`. */
export function demoChecksFile(bundle: string): string {
  return `${bundle}.demo-checks.json`;
}

interface RecordedCheck {
  title: string;
  /** The concept as JSON text, exactly as the build saw it. */
  concept: string;
  checked: DemoCheck;
}

/** The text of the results file: each demo's concept and its check, in order. */
export function demoChecksText<D extends RecordableDemo>(demos: readonly D[], check: (demo: D) => DemoCheck): string {
  const recorded: RecordedCheck[] = demos.map((demo) => ({ title: demo.title, concept: JSON.stringify(demo.concept), checked: check(demo) }));
  return `${JSON.stringify({ demoChecks: recorded })}\n`;
}

function isChecked(value: unknown): value is DemoCheck {
  if (!value || typeof value !== 'object') return false;
  const { name, summary, warnings } = value as Record<string, unknown>;
  return (name === undefined || typeof name === 'string') && !!summary && typeof summary === 'object' && Array.isArray(warnings) && warnings.every((w) => typeof w === 'string');
}

/**
 * The recorded checks in `text` that still belong to `demos` (same title and concept text), by
 * demo; an unreadable text gives none.
 */
export function matchingDemoChecks<D extends RecordableDemo>(text: string, demos: readonly D[]): Map<D, DemoCheck> {
  const matched = new Map<D, DemoCheck>();
  let recorded: unknown;
  try {
    recorded = (JSON.parse(text) as { demoChecks?: unknown }).demoChecks;
  } catch {
    return matched;
  }
  if (!Array.isArray(recorded)) return matched;
  for (const demo of demos) {
    const entry = recorded.find((r: Partial<RecordedCheck> | null) => r?.title === demo.title);
    if (entry && entry.concept === JSON.stringify(demo.concept) && isChecked(entry.checked)) matched.set(demo, entry.checked);
  }
  return matched;
}

/**
 * The file of results for the code running now: only a single-file build has one (there
 * `import.meta.url` names that file, app/build-cli.js); null from the split build or the sources.
 */
export function ownDemoChecksFile(moduleUrl: string = import.meta.url): string | null {
  return moduleUrl.startsWith('file:') && moduleUrl.endsWith('.cjs') ? demoChecksFile(fileURLToPath(moduleUrl)) : null;
}

/** The text of `file`, or null when there is none to read. */
export function readDemoChecks(file: string | null): string | null {
  if (file === null) return null;
  try {
    return readFileSync(file, 'utf8');
  } catch {
    return null;
  }
}

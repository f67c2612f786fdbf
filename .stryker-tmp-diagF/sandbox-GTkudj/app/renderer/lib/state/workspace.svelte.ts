/**
 * The concept being worked on: its document (with undo and redo), the
 * design it resolves to, and the evaluation the page draws. Every edit and
 * every drag recomputes here, in the page; the service is only for saving.
 */
// @ts-nocheck

import { evaluateDesign, parseConcept, type Design, type Evaluation, type LoadingAxis } from '../../../../core';
import { setDesignPoint, type ConceptDocument } from '../concept/edit';
import { History } from './history.svelte';
import { pointReporter, type PointReport } from './point-report';

export interface Issue {
  path: string;
  message: string;
}

export interface SiPoint {
  wingLoadingPa: number;
  loading: number;
}

type Computed =
  | { ok: true; design: Design; evaluation: Evaluation; warnings: Evaluation['warnings'] }
  | { ok: false; issues: Issue[] };

function compute(document: ConceptDocument): Computed {
  const parsed = parseConcept(document);
  if (!parsed.ok) return { ok: false, issues: parsed.issues.map((issue) => ({ path: issue.path, message: issue.message })) };
  try {
    const evaluation = evaluateDesign(parsed.design);
    return { ok: true, design: parsed.design, evaluation, warnings: evaluation.warnings };
  } catch (error) {
    return { ok: false, issues: [{ path: '', message: `the diagram could not be drawn: ${error instanceof Error ? error.message : String(error)}` }] };
  }
}

export class Workspace {
  readonly #history = new History<ConceptDocument>({});
  /** Where the design point is while it is being dragged; null otherwise. */
  #dragPoint = $state.raw<SiPoint | null>(null);
  #lastGood: Extract<Computed, { ok: true }> | null = null;

  /** Shown but not editable: a saved version being looked at. */
  readOnly = $state(false);

  constructor(initial: ConceptDocument) {
    this.#history.reset(initial);
  }

  get document(): ConceptDocument {
    return this.#history.current;
  }

  // Recomputed only when the document changes; a drag does not touch it.
  readonly #computed = $derived(compute(this.#history.current));

  /** The last design that resolved, so a concept-level problem never blanks the diagram. */
  readonly current = $derived.by(() => {
    const computed = this.#computed;
    if (computed.ok) this.#lastGood = computed;
    return computed.ok ? computed : this.#lastGood;
  });

  /** Problems that stop the document from resolving (empty when it does). */
  readonly issues = $derived(this.#computed.ok ? [] : this.#computed.issues);

  readonly axis: LoadingAxis = $derived(this.current?.evaluation.axis ?? 'powerToWeight');

  /** The design point in SI: the dragged one, else the document's. */
  readonly point = $derived.by((): SiPoint | null => {
    if (this.#dragPoint) return this.#dragPoint;
    const point = this.current?.design.designPoint;
    return point ? { wingLoadingPa: point.wingLoadingPa, loading: point.loading } : null;
  });

  readonly dragging = $derived(this.#dragPoint !== null);

  /** Margins, sizing and speeds at the design point (the optimum when there is none). */
  // Built once per resolved design; each drag step then reads one point.
  readonly #reporter = $derived(this.current ? pointReporter(this.current.design, this.current.evaluation) : null);

  readonly report: PointReport | null = $derived(this.#reporter ? this.#reporter(this.point) : null);

  get canUndo(): boolean {
    return this.#history.canUndo && !this.readOnly;
  }

  get canRedo(): boolean {
    return this.#history.canRedo && !this.readOnly;
  }

  /** Records an edit. Edits with the same key in quick succession are one undo step. */
  edit(next: ConceptDocument, coalesceKey?: string): void {
    if (this.readOnly) return;
    this.#history.push(next, coalesceKey);
  }

  /** Checks a candidate document without recording it: the issues it would have. */
  check(candidate: ConceptDocument): Issue[] {
    const parsed = parseConcept(candidate);
    return parsed.ok ? [] : parsed.issues.map((issue) => ({ path: issue.path, message: issue.message }));
  }

  undo(): void {
    if (!this.readOnly) this.#history.undo();
  }

  redo(): void {
    if (!this.readOnly) this.#history.redo();
  }

  /** Replaces the whole document and forgets the undo steps (another version was opened). */
  load(document: ConceptDocument, readOnly: boolean): void {
    this.#dragPoint = null;
    this.#lastGood = null;
    this.readOnly = readOnly;
    this.#history.reset(document);
  }

  dragTo(point: SiPoint): void {
    if (!this.readOnly) this.#dragPoint = point;
  }

  /** Ends a drag: the point where it was let go becomes one undo step. */
  commitDrag(): void {
    const point = this.#dragPoint;
    this.#dragPoint = null;
    if (point) this.movePoint(point);
  }

  cancelDrag(): void {
    this.#dragPoint = null;
  }

  movePoint(point: SiPoint, coalesceKey?: string, onFeasibleSide = false): void {
    if (this.readOnly || !(point.wingLoadingPa > 0) || !(point.loading > 0)) return;
    this.edit(setDesignPoint(this.document, point, this.axis, onFeasibleSide), coalesceKey);
  }

  snapToOptimum(): void {
    const optimum = this.current?.evaluation.optimum;
    const loading = optimum ? optimum[this.axis] : undefined;
    if (optimum && typeof loading === 'number') this.movePoint({ wingLoadingPa: optimum.wingLoading, loading }, undefined, true);
  }
}

/**
 * The ranges studies of the window: whether the boundary bands and the
 * probability contours are shown, the bands of the current concept, and the
 * chance study with whether its result still matches the concept.
 *
 * The bands are computed in the page (core `boundaryBands`, a few tens of
 * milliseconds) whenever the concept changes; a drag of the design point
 * changes nothing here until it is let go.
 */
import { boundaryBands, type BoundaryBand, type Design, type Evaluation, type UnitSystem } from '../../../../core';
import { diagramGrid } from '../../../chart/study-grid';
import { columnsOf } from '../../../../core/diagram/curve-columns';
import type { Workspace } from '../state/workspace.svelte';
import { ProbabilityStudy, type StudyWorker } from './probability.svelte';
import { pointKey, studyKey, studyParameters, type StudyParameters } from './study-parameters';

/** The wing loadings a band is drawn at: the evaluation's own samples, so bands and lines match. */
export function bandWingLoadings(evaluation: Evaluation): number[] {
  // The engine's column when this evaluation was made here (not one passed through reactive state or a worker).
  const columns = columnsOf(evaluation);
  if (columns && columns.curves.length > 0 && columns.wingLoadingsPa.length > 1) return Array.from(columns.wingLoadingsPa);
  for (const boundary of evaluation.boundaries) {
    if ('points' in boundary && boundary.points.length > 1) return boundary.points.map(([w]) => w);
  }
  return [];
}

export type WindowBands = { ok: true; whose: 'concept' | 'typical'; bands: BoundaryBand[] } | { ok: false; path: string; message: string };

function bandsOf(document: Record<string, unknown>, design: Design, evaluation: Evaluation): WindowBands {
  const ranges = studyParameters(document, design);
  if (!ranges.ok) return ranges;
  return { ok: true, whose: ranges.whose, bands: boundaryBands(design, ranges.parameters, bandWingLoadings(evaluation)) };
}

export class WindowStudies {
  showBands = $state(false);
  /** The boundaries banded, by requirement id; null: every boundary. */
  bandedIds = $state.raw<readonly string[] | null>(null);
  showContours = $state(true);
  readonly probability: ProbabilityStudy;
  readonly #workspace: Workspace;
  readonly #conceptName: () => string | null;

  /** `conceptName` names the project's concept being shown, so a result is only drawn on its own concept. */
  constructor(workspace: Workspace, createWorker: () => StudyWorker, conceptName: () => string | null = () => null) {
    this.#workspace = workspace;
    this.#conceptName = conceptName;
    this.probability = new ProbabilityStudy(createWorker);
  }

  /** The last finished result, while the concept it ran on is the one shown. */
  readonly result = $derived.by(() => {
    const result = this.probability.result;
    return result && result.concept === this.#conceptName() ? result : null;
  });

  /** The ranges the studies use for the document as it stands. */
  readonly parameters: StudyParameters | null = $derived.by(() => {
    const current = this.#workspace.current;
    if (!current || this.#workspace.issues.length > 0) return null;
    return studyParameters(this.#workspace.document, current.design);
  });

  /** Bands of the current concept while they are shown; null when hidden or the concept has a problem. */
  readonly bands: WindowBands | null = $derived.by(() => {
    if (!this.showBands) return null;
    const current = this.#workspace.current;
    if (!current || this.#workspace.issues.length > 0) return null;
    return bandsOf(this.#workspace.document, current.design, current.evaluation);
  });

  readonly #key = $derived.by(() => studyKey(this.#workspace.document));
  readonly #pointKey = $derived.by(() => pointKey(this.#workspace.document));

  /** The last result no longer matches the concept (its contours are drawn greyed). */
  readonly stale = $derived.by(() => this.result !== null && this.result.key !== this.#key);

  /** The design point (or the concept) has changed since the design-point numbers were computed. */
  readonly pointStale = $derived.by(() => this.stale || (this.result !== null && this.result.pointKey !== this.#pointKey));

  /** Why a run cannot start now; null when it can. */
  readonly blocked: string | null = $derived.by(() => {
    if (!this.#workspace.current || this.#workspace.issues.length > 0) return 'The concept has problems to fix first.';
    const ranges = this.parameters;
    if (ranges && !ranges.ok) return `${ranges.path}: ${ranges.message}`;
    if (ranges && ranges.parameters.length === 0) return 'No assumption is ranged.';
    return null;
  });

  /** Runs the chance study on the diagram's own grid (the whole plotted range, whatever the zoom). */
  run(system: UnitSystem): void {
    const current = this.#workspace.current;
    if (!current || this.blocked) return;
    const grid = diagramGrid(current.evaluation, { system, powerLoading: true });
    const document = this.#workspace.document;
    this.probability.run(document, grid, { concept: this.#conceptName(), key: studyKey(document), pointKey: pointKey(document) });
  }
}

/**
 * Messages between the window and the worker that runs the chance study
 * (the seeded Monte Carlo of core `probabilityMapRun`). Everything in them is
 * plain data that the structured clone carries; the map's arrays are
 * transferred, not copied.
 */
import type { ProbabilityGrid, ProbabilityMap, ProbabilityPart } from '../../../../core';

export type StudyRequest =
  /**
   * Runs the study of this concept document on this grid; a run already going is dropped. `threads`:
   * how many threads it may use in all, the study's own included (the cores the window sees); when
   * absent, the worker's own count.
   */
  | { type: 'run'; id: number; concept: unknown; grid: ProbabilityGrid; threads?: number }
  /** Stops run `id` at the next pause between chunks of samples. */
  | { type: 'cancel'; id: number }
  /**
   * Starts the helper threads a run of `threads` threads would use, so that the first run finds them
   * loaded (sent when the Ranges panel opens); a run going on is not touched.
   */
  | { type: 'prepare'; threads?: number };

export interface StudyOutcome {
  map: ProbabilityMap;
  /** Whose ranges were sampled: the concept's own, or the typical ones because it gives none. */
  whose: 'concept' | 'typical';
  /** How many assumptions were ranged. */
  ranged: number;
  elapsedMs: number;
}

export type StudyReply =
  | { type: 'progress'; id: number; done: number; total: number }
  | { type: 'done'; id: number; outcome: StudyOutcome }
  | { type: 'cancelled'; id: number; done: number; total: number }
  /** The message names the field when the concept is the problem. */
  | { type: 'failed'; id: number; message: string };

/** To a helper thread: run samples [first, end) of the study of this concept on this grid. */
export interface PartRequest {
  concept: unknown;
  grid: ProbabilityGrid;
  part: { first: number; end: number };
}

export type PartReply =
  | { type: 'progress'; done: number }
  | { type: 'part'; part: ProbabilityPart }
  | { type: 'failed'; message: string };

/**
 * How the sensitivity panels are set: which quantity of the optimum the
 * tornado shows, and the step by which each requirement is relaxed and
 * tightened. Kept for the page's life, so switching tabs loses nothing.
 */
// @ts-nocheck

import type { TornadoMeasure } from '../studies/tornado-chart';

const DEFAULT_COST_STEP = 0.1;

export class StudySettings {
  measure = $state<TornadoMeasure>('wingLoading');
  /** The step as a fraction (0.1 for 10 %); only ever a valid one. */
  costStep = $state(DEFAULT_COST_STEP);
}

export const studySettings = new StudySettings();

// @ts-nocheck
import type { ConceptJson } from '../schema';

/** A ready-made concept to start from: invented scenarios, not real aircraft. */
export interface DemoConcept {
  slug: string;
  title: string;
  summary: string;
  concept: ConceptJson;
}

/** Ends every demo summary: the rules named in a demo's labels are context, not a compliance finding. */
export const DEMO_CAUTION =
  'An invented example for preliminary sizing: certification requirements come from the applicable authority, ' +
  'and final numbers need licensed engineering review.';

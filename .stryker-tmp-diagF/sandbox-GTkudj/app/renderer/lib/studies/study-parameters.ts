/**
 * The ranges the window's bands and chance study use: the concept's own
 * `uncertainty` block when it ranges anything, else the published typical
 * ranges (core `typicalUncertainty`), and which of the two it is, so the
 * screen can say so, as the review report does.
 */
// @ts-nocheck

import {
  DEFAULT_STUDY_SAMPLES,
  DEFAULT_STUDY_SEED,
  resolveUncertainty,
  typicalUncertainty,
  type Design,
  type UncertainParameter,
} from '../../../../core';

export type StudyParameters =
  | { ok: true; whose: 'concept' | 'typical'; parameters: UncertainParameter[]; seed: number; samples: number }
  | { ok: false; path: string; message: string };

/** Resolves the document's block against its design; `document` is the concept JSON the design came from. */
export function studyParameters(document: { uncertainty?: unknown }, design: Design): StudyParameters {
  const block = document.uncertainty;
  let seed = DEFAULT_STUDY_SEED;
  let samples = DEFAULT_STUDY_SAMPLES;
  if (block !== undefined) {
    const own = resolveUncertainty(block, design, document);
    if (!own.ok) {
      const first = own.issues[0];
      return { ok: false, path: first?.path ?? 'uncertainty', message: first?.message ?? 'the ranges cannot be used' };
    }
    if (own.parameters.length > 0) return { ok: true, whose: 'concept', parameters: own.parameters, seed: own.seed, samples: own.samples };
    seed = own.seed;
    samples = own.samples;
  }
  const typical = resolveUncertainty(typicalUncertainty(design), design, document);
  return { ok: true, whose: 'typical', parameters: typical.ok ? typical.parameters : [], seed, samples };
}

/**
 * What a study's result depends on, as text: the whole concept but its name
 * and its design point. A result whose key differs from the document's is
 * out of date.
 */
export function studyKey(document: Record<string, unknown>): string {
  const { name: _name, designPoint: _point, ...rest } = document;
  return JSON.stringify(rest);
}

/** What the design-point numbers also depend on: the point itself. */
export function pointKey(document: Record<string, unknown>): string {
  return JSON.stringify(document.designPoint ?? null);
}

/**
 * Edits of a concept's `uncertainty` block (the ranges on its assumptions,
 * the seed and the sample count of the chance study). Like every edit of the
 * document, each returns a new document and leaves the old one untouched, so
 * the workspace can undo it and a saved version never changes.
 */
// @ts-nocheck

import { typicalRange, type Design, type Distribution } from '../../../../core';
import { getIn, setIn, type ConceptDocument, type Json } from '../concept/edit';
import { rangeEntries } from './range-rows';

type Entry = { [key: string]: Json };

function entriesOf(document: ConceptDocument): Json[] {
  const list = getIn(document, ['uncertainty', 'parameters']);
  return Array.isArray(list) ? list : [];
}

/** A value of one range entry (low, high or distribution); uniform is the file's default and left out. */
export function setRangeValue(document: ConceptDocument, index: number, key: 'low' | 'high' | 'distribution', value: number | Distribution): ConceptDocument {
  if (key === 'distribution' && value === 'uniform') return setIn(document, ['uncertainty', 'parameters', index, 'distribution'], undefined);
  return setIn(document, ['uncertainty', 'parameters', index, key], value);
}

/** Ranges one more assumption (appended, so the indices of the others stay). */
export function includeRange(document: ConceptDocument, field: string, low: number, high: number, distribution: Distribution = 'uniform'): ConceptDocument {
  const entry: Entry = { field, low, high };
  if (distribution !== 'uniform') entry.distribution = distribution;
  return setIn(document, ['uncertainty', 'parameters'], [...entriesOf(document), entry]);
}

/** Stops ranging the entry at `index`. */
export function excludeRange(document: ConceptDocument, index: number): ConceptDocument {
  return setIn(document, ['uncertainty', 'parameters'], entriesOf(document).filter((_, i) => i !== index));
}

/** Every range removed; the seed and sample count stay. */
export function clearRanges(document: ConceptDocument): ConceptDocument {
  return setIn(document, ['uncertainty', 'parameters'], []);
}

/**
 * The published typical range (core `typicalRange`) on every assumption that
 * has one: an assumption already ranged gets the typical ends and keeps its
 * distribution; one with no published range (K1) keeps what it has.
 */
export function fillTypicalRanges(document: ConceptDocument, design: Design, fields: readonly string[]): ConceptDocument {
  const kept = entriesOf(document);
  const written = rangeEntries(document);
  const next: Json[] = [...kept];
  for (const field of fields) {
    const typical = typicalRange(field, design);
    if (!typical) continue;
    const at = written.findIndex((entry) => entry.field === field);
    if (at >= 0) {
      next[at] = { ...(kept[at] as Entry), low: typical.low, high: typical.high };
    } else {
      next.push({ field, low: typical.low, high: typical.high });
    }
  }
  return setIn(document, ['uncertainty', 'parameters'], next);
}

/** The seed or the sample count; undefined removes it, so the default applies. */
export function setStudyNumber(document: ConceptDocument, key: 'seed' | 'samples', value: number | undefined): ConceptDocument {
  return setIn(document, ['uncertainty', key], value);
}

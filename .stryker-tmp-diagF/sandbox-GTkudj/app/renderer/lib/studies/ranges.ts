/**
 * The ranges a study used, for the screen to list: the parameters the
 * window's studies take (`studyParameters`: the concept's own ranges, else
 * the typical ones) with, for typical ranges, their published source.
 */
// @ts-nocheck

import { typicalRange, type Design, type UncertainParameter } from '../../../../core';
import { studyParameters } from './study-parameters';

export interface StudyRange {
  field: string;
  label: string;
  low: number;
  nominal: number;
  high: number;
  /** Where a typical range comes from; absent for the concept's own. */
  source?: string;
  /** A typical range widened to contain the concept's own value. */
  widened?: boolean;
}

export type StudyRanges =
  | { ok: true; whose: 'concept' | 'typical'; parameters: UncertainParameter[]; ranges: StudyRange[] }
  | { ok: false; path: string; message: string };

export function studyRanges(document: { uncertainty?: unknown }, design: Design): StudyRanges {
  const found = studyParameters(document, design);
  if (!found.ok) return found;
  const ranges = found.parameters.map((p): StudyRange => {
    const typical = found.whose === 'typical' ? typicalRange(p.field, design) : null;
    return {
      field: p.field,
      label: p.label,
      low: p.low,
      nominal: p.nominal,
      high: p.high,
      ...(typical ? { source: typical.source, widened: typical.widened } : {}),
    };
  });
  return { ok: true, whose: found.whose, parameters: found.parameters, ranges };
}

/**
 * The hover read-out: at the wing loading under the pointer, each
 * requirement's value in the diagram's own quantity and which one binds.
 */
// @ts-nocheck

import { readAt, toDisplay, type Design, type LoadingAxis, type UnitSystem } from '../../../../core';
import { kindColour, shorten } from '../../../chart';
import { powerLoadingFactor } from './geometry';
import { plotName } from '../concept/names';

export interface ReadoutRow {
  id: string;
  label: string;
  colour: string;
  /** 'limit': `value` is the largest wing loading allowed; 'curve': the loading required. Display units; null where it cannot be met. */
  type: 'limit' | 'curve';
  value: number | null;
  binds: boolean;
  /** A limit the wing loading is beyond. */
  exceeded: boolean;
}

export interface Readout {
  /** Display units. */
  wingLoading: number;
  rows: ReadoutRow[];
  binding: string | null;
}

export function readoutAt(design: Design, wingLoadingPa: number, axis: LoadingAxis, system: UnitSystem, powerLoading: boolean): Readout {
  const read = readAt(design, wingLoadingPa);
  const loading = (value: number | null): number | null => {
    if (value === null) return null;
    const shown = toDisplay(value, axis, system);
    if (!powerLoading) return shown;
    return shown > 0 ? powerLoadingFactor(system) / shown : null;
  };
  return {
    wingLoading: toDisplay(wingLoadingPa, 'wingLoading', system),
    binding: read.binding,
    rows: read.entries.map((entry) => ({
      id: entry.id,
      label: shorten(plotName(entry), 30),
      colour: kindColour(entry.kind),
      type: entry.type,
      value: entry.type === 'limit' ? toDisplay(entry.wingLoadingMax, 'wingLoading', system) : loading(entry.required),
      binds: entry.id === read.binding,
      exceeded: entry.type === 'limit' && entry.exceeded,
    })),
  };
}

/**
 * The tornado chart's data: core `tornado` (SI changes of the optimum with
 * each assumption at each end of its range) turned into display units, one
 * row per assumption in the core's order (largest swing first).
 */
// @ts-nocheck

import type { LoadingAxis } from '../../core/model';
import type { Tornado, TornadoEnd } from '../../core/studies/tornado';
import { toDisplay, type UnitSystem } from '../../core/units/display';

export interface TornadoSide {
  /** The assumption's value at this end. */
  value: number;
  /** False when no plotted wing loading meets every requirement at this end. */
  feasible: boolean;
  /** Change of the optimum's wing loading and loading, display units; NaN when not feasible. */
  wingLoading: number;
  loading: number;
}

export interface TornadoRow {
  field: string;
  label: string;
  nominal: number;
  low: TornadoSide;
  high: TornadoSide;
  /** The core's sort key (larger relative swing of the two); Infinity when an end has no feasible point. */
  swing: number;
}

export interface TornadoData {
  axis: LoadingAxis;
  system: UnitSystem;
  /** The nominal optimum, display units; null when nothing is feasible. */
  nominal: { wingLoading: number; loading: number } | null;
  rows: TornadoRow[];
}

function side(end: TornadoEnd, axis: LoadingAxis, system: UnitSystem): TornadoSide {
  return {
    value: end.value,
    feasible: end.optimum !== null,
    wingLoading: toDisplay(end.wingLoadingChangePa, 'wingLoading', system),
    loading: toDisplay(end.loadingChange, axis, system),
  };
}

export function tornadoData(tornado: Tornado, system: UnitSystem): TornadoData {
  const { axis, nominal } = tornado;
  return {
    axis,
    system,
    nominal: nominal ? { wingLoading: toDisplay(nominal.wingLoadingPa, 'wingLoading', system), loading: toDisplay(nominal.loading, axis, system) } : null,
    rows: tornado.bars.map((bar) => ({
      field: bar.field,
      label: bar.label,
      nominal: bar.nominalValue,
      low: side(bar.low, axis, system),
      high: side(bar.high, axis, system),
      swing: bar.swing,
    })),
  };
}

/** An assumption's own number as written: at most four significant digits, never "NaN". */
export function plainNumber(value: number): string {
  if (!Number.isFinite(value)) return '—';
  return String(Number(value.toPrecision(4)));
}

/**
 * The window's tornado chart for one quantity of the optimum (its wing
 * loading, or its power- or thrust-to-weight): the report's tornado data
 * (app/chart/tornado-data) in display units, sorted by the swing of that
 * quantity, largest first, with the text for each number. Assumptions that
 * move it by less than the digits shown are listed apart.
 */
// @ts-nocheck

import type { LoadingAxis } from '../../../../core/model';
import type { Tornado, TornadoBar, TornadoEnd } from '../../../../core/studies/tornado';
import { displayUnit, formatQuantity, type DisplayQuantity, type UnitSystem } from '../../../../core/units/display';
import { signedChange } from '../../../chart/change-text';
import { plainNumber, tornadoData, type TornadoSide } from '../../../chart/tornado-data';

export type TornadoMeasure = 'wingLoading' | 'loading';

export interface TornadoChartEnd {
  /** The assumption's value at this end, as written. */
  value: string;
  feasible: boolean;
  /** Change of the optimum against the nominal, display units; NaN when nothing is feasible at this end. */
  change: number;
  /** "+12 N/m²", "−0.0021 hp/lb", "0"; "nothing feasible" when no point meets every requirement. */
  changeText: string;
  /** The optimum's value at this end with its unit, "—" when nothing is feasible. */
  optimumText: string;
}

export interface TornadoChartRow {
  field: string;
  label: string;
  /** "0.7 to 0.95, nominal 0.79". */
  range: string;
  low: TornadoChartEnd;
  high: TornadoChartEnd;
  /** High end minus low end, display units, as text ("—" when an end has no feasible point). */
  swingText: string;
  /** The sort key: relative swing of this quantity; Infinity when an end has no feasible point. */
  swing: number;
}

export interface TornadoChart {
  measure: TornadoMeasure;
  quantity: DisplayQuantity;
  /** "N/m²", "hp/lb", "" for thrust-to-weight. */
  unit: string;
  /** "Optimum wing loading", "Optimum power-to-weight". */
  title: string;
  /** The nominal optimum's value, "—" when nothing is feasible. */
  nominalText: string;
  /** Largest swing first; only the rows that move this quantity. */
  rows: TornadoChartRow[];
  /** Labels of the assumptions that move it by less than the digits shown. */
  quiet: string[];
  /** The largest size of change drawn (display units), at least a tiny positive number. */
  extent: number;
}

function quantityOf(measure: TornadoMeasure, axis: LoadingAxis): DisplayQuantity {
  return measure === 'wingLoading' ? 'wingLoading' : axis;
}

function withUnit(text: string, unit: string): string {
  return unit && text !== '—' && text !== '0' ? `${text} ${unit}` : text;
}

function endOf(end: TornadoEnd, side: TornadoSide, measure: TornadoMeasure, quantity: DisplayQuantity, system: UnitSystem): TornadoChartEnd {
  const { unit } = displayUnit(quantity, system);
  const change = side.feasible ? side[measure] : NaN;
  const si = end.optimum ? (measure === 'wingLoading' ? end.optimum.wingLoadingPa : end.optimum.loading) : NaN;
  return {
    value: plainNumber(side.value),
    feasible: side.feasible,
    change,
    changeText: side.feasible ? withUnit(signedChange(change, quantity, system), unit) : 'nothing feasible',
    optimumText: formatQuantity(si, quantity, system),
  };
}

function swingOf(bar: TornadoBar, measure: TornadoMeasure): number {
  return measure === 'wingLoading' ? bar.wingLoadingSwing : bar.loadingSwing;
}

/** Larger first; NaN last; a stable sort keeps the core's order among equals. */
const descending = (a: number, b: number) => (Number.isNaN(a) ? 1 : Number.isNaN(b) ? -1 : a === b ? 0 : b - a);

export function tornadoChart(tornado: Tornado, measure: TornadoMeasure, system: UnitSystem): TornadoChart {
  const data = tornadoData(tornado, system);
  const quantity = quantityOf(measure, tornado.axis);
  const { unit } = displayUnit(quantity, system);
  const all = tornado.bars.map((bar, i): TornadoChartRow => {
    const row = data.rows[i];
    const low = endOf(bar.low, row.low, measure, quantity, system);
    const high = endOf(bar.high, row.high, measure, quantity, system);
    const feasible = low.feasible && high.feasible;
    return {
      field: bar.field,
      label: bar.label,
      range: `${plainNumber(bar.low.value)} to ${plainNumber(bar.high.value)}, nominal ${plainNumber(bar.nominalValue)}`,
      low,
      high,
      swingText: feasible ? withUnit(signedChange(high.change - low.change, quantity, system), unit) : '—',
      swing: swingOf(bar, measure),
    };
  });
  const moves = (row: TornadoChartRow) => !(row.low.changeText === '0' && row.high.changeText === '0');
  const rows = all.filter(moves).sort((a, b) => descending(a.swing, b.swing));
  const sizes = rows.flatMap((row) => [row.low.change, row.high.change]).filter(Number.isFinite).map(Math.abs);
  const nominalSi = tornado.nominal ? (measure === 'wingLoading' ? tornado.nominal.wingLoadingPa : tornado.nominal.loading) : NaN;
  return {
    measure,
    quantity,
    unit,
    title: measure === 'wingLoading' ? 'Optimum wing loading' : tornado.axis === 'thrustToWeight' ? 'Optimum thrust-to-weight' : 'Optimum power-to-weight',
    nominalText: formatQuantity(nominalSi, quantity, system),
    rows,
    quiet: all.filter((row) => !moves(row)).map((row) => row.label),
    extent: Math.max(1e-12, ...sizes),
  };
}

/**
 * What moves the design point: the optimum with each assumption at the low
 * and at the high end of its range, the others nominal (a one-at-a-time
 * sensitivity, drawn as a tornado chart), largest swing first.
 */
import { loadingAxis, type Design, type LoadingAxis } from '../model';
import { optimumOf, type StudyOptimum } from './study-optimum';
import type { UncertainParameter } from './uncertainty-schema';
import { STUDY_CAUTION } from './caution';

/** Optimum moved by one end of a range, against the nominal optimum. */
export interface TornadoEnd {
  value: number;
  /** Null when no plotted wing loading meets every requirement at this end. */
  optimum: StudyOptimum | null;
  /** Optimum minus nominal optimum [Pa]; NaN when either is missing. */
  wingLoadingChangePa: number;
  /** In W/N or T/W; NaN when either is missing. */
  loadingChange: number;
  /** Changes over the nominal values. */
  wingLoadingChangeRelative: number;
  loadingChangeRelative: number;
}

export interface TornadoBar {
  field: string;
  label: string;
  nominalValue: number;
  low: TornadoEnd;
  high: TornadoEnd;
  /** |high - low| of the relative wing-loading change, of the relative loading change. */
  wingLoadingSwing: number;
  loadingSwing: number;
  /**
   * The sort key: the larger of the two swings; Infinity when an end has no
   * feasible point. A swing that is undefined (NaN: no nominal optimum, or a
   * nominal loading of 0 with no power requirement) is left out; NaN when both are.
   */
  swing: number;
}

export interface Tornado {
  caution: string;
  axis: LoadingAxis;
  nominal: StudyOptimum | null;
  bars: TornadoBar[];
}

export type TornadoOrder = 'largest' | 'wingLoading' | 'loading';

function endOf(design: Design, parameter: UncertainParameter, value: number, nominal: StudyOptimum | null): TornadoEnd {
  const optimum = optimumOf(parameter.apply(design, value));
  const dw = optimum && nominal ? optimum.wingLoadingPa - nominal.wingLoadingPa : NaN;
  const dy = optimum && nominal ? optimum.loading - nominal.loading : NaN;
  return {
    value,
    optimum,
    wingLoadingChangePa: dw,
    loadingChange: dy,
    wingLoadingChangeRelative: nominal ? dw / nominal.wingLoadingPa : NaN,
    loadingChangeRelative: nominal && nominal.loading !== 0 ? dy / nominal.loading : NaN,
  };
}

function swingOf(low: TornadoEnd, high: TornadoEnd, key: 'wingLoadingChangeRelative' | 'loadingChangeRelative'): number {
  if (!low.optimum || !high.optimum) return Infinity;
  return Math.abs(high[key] - low[key]);
}

/** Sort key with NaN last. */
const descending = (a: number, b: number) => (Number.isNaN(a) ? 1 : Number.isNaN(b) ? -1 : b - a);

/**
 * The tornado of a design over its ranged assumptions. `order` picks the
 * sort: by the larger of the two swings (default), or by one of them.
 */
export function tornado(design: Design, parameters: readonly UncertainParameter[], order: TornadoOrder = 'largest'): Tornado {
  const nominal = optimumOf(design);
  const bars = parameters.map((parameter): TornadoBar => {
    const low = endOf(design, parameter, parameter.low, nominal);
    const high = endOf(design, parameter, parameter.high, nominal);
    const wingLoadingSwing = swingOf(low, high, 'wingLoadingChangeRelative');
    const loadingSwing = swingOf(low, high, 'loadingChangeRelative');
    return {
      field: parameter.field,
      label: parameter.label,
      nominalValue: parameter.nominal,
      low,
      high,
      wingLoadingSwing,
      loadingSwing,
      // The loading swing alone can be undefined (a nominal loading of 0); without a nominal optimum both are.
      swing: Number.isNaN(loadingSwing) ? wingLoadingSwing : Math.max(wingLoadingSwing, loadingSwing),
    };
  });
  const key = { largest: 'swing', wingLoading: 'wingLoadingSwing', loading: 'loadingSwing' }[order] as 'swing';
  // A stable sort keeps the file's order among equal swings.
  bars.sort((a, b) => descending(a[key], b[key]));
  return { caution: STUDY_CAUTION, axis: loadingAxis(design.aircraft.propulsion.kind), nominal, bars };
}

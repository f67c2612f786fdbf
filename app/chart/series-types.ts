/**
 * The diagram's plot series and chart data types, in display units (made by
 * data.ts, read by every drawing step).
 */
import type { LoadingAxis } from '../../core/model';
import type { UnitSystem } from '../../core/units/display';

export interface SeriesCommon {
  id: string;
  kind: string;
  /** The requirement's label, else its id. */
  label: string;
  /** What the plot writes beside the boundary: the label when it is short, else the id. */
  plotLabel: string;
  /** The requirement kind in words. */
  kindTitle: string;
  colour: string;
  /** SVG dash pattern; '' for a solid line. */
  dash: string;
  /** Binds at the optimum. */
  binding: boolean;
}

export interface CurveSeries extends SeriesCommon {
  type: 'curve';
  /** [wing loading, required loading or null], display units, in sample order. */
  points: Array<[number, number | null]>;
}

export interface LimitSeries extends SeriesCommon {
  type: 'limit';
  /** Largest wing loading the requirement allows, display units. */
  wingLoading: number;
}

export type BoundarySeries = CurveSeries | LimitSeries;

export interface MarkedPoint {
  wingLoading: number;
  loading: number;
}

export interface OverlaySeries {
  name: string;
  curves: CurveSeries[];
  limits: LimitSeries[];
  optimum: MarkedPoint | null;
}

export interface ChartData {
  title: string;
  system: UnitSystem;
  axis: LoadingAxis;
  /** Display unit strings; '' for the dimensionless thrust-to-weight. */
  units: { wingLoading: string; loading: string };
  curves: CurveSeries[];
  limits: LimitSeries[];
  /** Every boundary, curves and limits together, in the concept's order. */
  boundaries: BoundarySeries[];
  optimum: (MarkedPoint & { unbounded: boolean; active: string[] }) | null;
  designPoint: (MarkedPoint & { feasible: boolean }) | null;
  /** The evaluated wing-loading range, display units. */
  wingLoadingRange: [number, number];
  /** Largest wing loading every limit allows, never beyond the range. */
  wingLoadingLimit: number;
  /** Upper envelope of the curves at each sample; null where some curve cannot be met. */
  envelope: Array<[number, number | null]>;
  overlays: OverlaySeries[];
  /** Other concepts' region outlines and optima, each in its own colour. */
  alternatives: AlternativeSeries[];
}

/** Another concept drawn over the diagram (app/chart/alternatives.ts builds it). */
export interface AlternativeSeries {
  name: string;
  colour: string;
  /** False when the alternative's diagram has the other vertical axis (thrust against power): listed, not drawn. */
  drawn: boolean;
  /** The alternative's own boundaries and envelope, not inverted: its region is worked out from them for each view. */
  source: Pick<ChartData, 'system' | 'axis' | 'curves' | 'limits' | 'envelope' | 'wingLoadingRange' | 'wingLoadingLimit'> | null;
  /** Its optimum as plotted (inverted with the rest in the power-loading view). */
  optimum: MarkedPoint | null;
}

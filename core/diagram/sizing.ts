/**
 * A point of the diagram turned into wing area and installed power or thrust
 * at take-off mass (core/methods.md section 7).
 */
import type { Aircraft, LoadingAxis } from '../model';
import type { SizingJson } from '../evaluation';
import { G0 } from '../units/factors';

/** S = W_TO/w; P_SL or T_SL = y W_TO, all engines, and per engine; W_TO = m g0. */
export function sizingAt(aircraft: Aircraft, axis: LoadingAxis, wingLoadingPa: number, loading: number): SizingJson {
  const takeoffWeight = aircraft.takeoffMassKg * G0;
  const installed = loading * takeoffWeight;
  const key = axis === 'thrustToWeight' ? 'thrust' : 'power';
  return {
    wingArea: takeoffWeight / wingLoadingPa,
    [key]: installed,
    perEngine: installed / aircraft.propulsion.engines,
    takeoffWeight,
  };
}

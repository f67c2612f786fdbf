/**
 * A point of the diagram turned into wing area and installed power or thrust
 * at take-off mass (core/methods.md section 7).
 */
import type { Aircraft, LoadingAxis } from '../model';
import type { SizingJson } from '../evaluation';
import { G0 } from '../units/factors';

/**
 * S = W_TO/w; P_SL or T_SL = y W_TO, all engines, and per engine; W_TO = m g0.
 * Span b = sqrt(AR S) and mean (geometric) chord c = S/b, from AR = b^2/S
 * (Anderson, Introduction to Flight, definition of aspect ratio).
 */
export function sizingAt(aircraft: Aircraft, axis: LoadingAxis, wingLoadingPa: number, loading: number): SizingJson {
  const takeoffWeight = aircraft.takeoffMassKg * G0;
  const installed = loading * takeoffWeight;
  const key = axis === 'thrustToWeight' ? 'thrust' : 'power';
  const wingArea = takeoffWeight / wingLoadingPa;
  const span = Math.sqrt(aircraft.aspectRatio * wingArea);
  return {
    wingArea,
    span,
    meanChord: wingArea / span,
    [key]: installed,
    perEngine: installed / aircraft.propulsion.engines,
    takeoffWeight,
  };
}

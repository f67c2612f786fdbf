/**
 * The loading of a field-length kind at the field: T/W of the actual weight
 * for jets, P/W [m/s] for propellers, where thrust at speed V is eta_p P / V.
 * Its unit at a wing loading is the loading that gives a T/W of 1 at the
 * take-off stall speed: 1 for jets, V_s,TO / eta_p for propellers. A field
 * length that needs more than MOST_FIELD_THRUST_TO_WEIGHT of these units is
 * out of reach: the curve is undefined there.
 */
import { stallSpeed } from '../aero/speeds';
import type { FlightCondition } from './flight-condition';

export const MOST_FIELD_THRUST_TO_WEIGHT = 50;

/** The field loading that stands for a T/W of 1 at wing loading w [Pa]. */
export function fieldLoadingUnit(c: FlightCondition, w: number): number {
  return c.propeller ? stallSpeed(c.beta * w, c.densityKgM3, c.polar.clMax) / c.propellerEfficiency : 1;
}

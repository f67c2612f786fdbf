/**
 * The master equation of constraint analysis (Mattingly, Aircraft Engine
 * Design; core/methods.md section 6), per unit take-off weight and sea-level rating.
 */
// @ts-nocheck

import { shaftPowerLoading } from '../propulsion/propeller';
import type { FlightCondition } from './flight-condition';

/**
 * T_SL/W_TO = (beta/alpha)[q C_D0/(beta w) + K1 n + K n^2 beta w/q + P_s/V] (Mattingly);
 * C_D0 includes the wave-drag increment above the critical Mach where the wing's compressibility is given.
 * NaN where no thrust can meet it: C_L above the configuration's C_Lmax, no
 * available thrust (alpha <= 0; alpha at the flight speed, for a Mach-aware lapse), or a non-positive wing loading or speed.
 */
export function thrustLoadingRequired(
  c: FlightCondition,
  wingLoadingPa: number,
  speedMps: number,
  loadFactor: number,
  specificExcessPowerMps: number,
): number {
  const alpha = c.alphaAt(speedMps);
  if (!(wingLoadingPa > 0) || !(speedMps > 0) || !(alpha > 0)) return NaN;
  const weightLoading = c.beta * wingLoadingPa;
  const q = 0.5 * c.densityKgM3 * speedMps * speedMps;
  const cl = (loadFactor * weightLoading) / q;
  if (!(cl <= c.polar.clMax)) return NaN;
  const p = c.polar;
  return (
    (c.beta / alpha) *
    ((q * (p.cd0 + c.waveDragAt(cl, speedMps))) / weightLoading + p.k1 * loadFactor + p.k * loadFactor * cl + specificExcessPowerMps / speedMps)
  );
}

/** The master equation in the diagram's loading: T/W for jets, shaft P/W = (T/W) V/eta_p for propellers. */
export function loadingRequired(
  c: FlightCondition,
  wingLoadingPa: number,
  speedMps: number,
  loadFactor: number,
  specificExcessPowerMps: number,
): number {
  const thrust = thrustLoadingRequired(c, wingLoadingPa, speedMps, loadFactor, specificExcessPowerMps);
  return c.propeller ? shaftPowerLoading(thrust, speedMps, c.propellerEfficiency) : thrust;
}

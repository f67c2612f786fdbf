/**
 * Installed-thrust lapse of turbine engines with flight Mach number and the
 * air (Mattingly, Heiser and Pratt, Aircraft Engine Design, 2nd ed., AIAA
 * 2002, section 2.3.2, eq. 2.54; coefficients from memory). alpha is the
 * fraction of sea-level static rated thrust, before throttle.
 */
import { P0, T0 } from '../atmosphere';

/** The Mach-aware lapse models, and `density` for sigma^m. */
export const LAPSE_MODELS = ['high-bypass', 'low-bypass-mixed', 'turbojet', 'density'] as const;
export type LapseModel = (typeof LAPSE_MODELS)[number];
export type TurbineLapseModel = Exclude<LapseModel, 'density'>;

/** Default throttle ratio: the theta0 break at the sea-level standard day (no flat rating; conservative, from memory). */
export const DEFAULT_THROTTLE_RATIO = 1;

/** The air an engine sees in flight. */
export interface FlightAir {
  temperatureK: number;
  pressurePa: number;
  mach: number;
}

/** theta0 = theta (1 + 0.2 M^2), delta0 = delta (1 + 0.2 M^2)^3.5: total temperature and pressure ratios, gamma = 1.4 (isentropic flow). */
export function totalRatios(air: FlightAir): { theta0: number; delta0: number } {
  const stagnation = 1 + 0.2 * air.mach * air.mach;
  // stagnation^3.5 as s^3 sqrt(s): the same to a unit in the last place, several times cheaper than Math.pow.
  const cubed = stagnation * stagnation * stagnation;
  return { theta0: (air.temperatureK / T0) * stagnation, delta0: (air.pressurePa / P0) * cubed * Math.sqrt(stagnation) };
}

/** alpha of a model at a flight condition and throttle ratio TR; never below 0. */
export function turbineLapse(model: TurbineLapseModel, air: FlightAir, throttleRatio: number): number {
  const { theta0, delta0 } = totalRatios(air);
  const m = Math.max(0, air.mach);
  const over = Math.max(0, theta0 - throttleRatio); // 0 up to the theta0 break
  let alpha: number;
  switch (model) {
    case 'high-bypass':
      // alpha = delta0 [1 - 0.49 sqrt(M0) - 3 (theta0 - TR)/(1.5 + M0)] (eq. 2.54a; the last term only above TR).
      alpha = delta0 * (1 - 0.49 * Math.sqrt(m) - (3 * over) / (1.5 + m));
      break;
    case 'low-bypass-mixed':
      // Maximum thrust: alpha = delta0 [1 - 3.5 (theta0 - TR)/theta0] (eq. 2.54b).
      alpha = delta0 * (1 - (3.5 * over) / theta0);
      break;
    case 'turbojet':
      // Maximum thrust: alpha = delta0 [1 - 0.3 (theta0 - 1) - 0.1 sqrt(M0) - 1.5 (theta0 - TR)/theta0] (eq. 2.54c).
      alpha = delta0 * (1 - 0.3 * (theta0 - 1) - 0.1 * Math.sqrt(m) - (1.5 * over) / theta0);
      break;
  }
  return Number.isFinite(alpha) ? Math.max(0, alpha) : NaN;
}

/**
 * The resolved aircraft: aerodynamics and propulsion in SI, as the engine
 * computes with them.
 */
// @ts-nocheck

import { propulsionKind, type PropulsionKind } from './propulsion/kinds';
import type { LapseModel } from './propulsion/turbine-lapse';
import type { WingCompressibility } from './aero/compressibility';

export type { PropulsionKind };

/** Which loading the diagram's vertical axis shows. */
export type LoadingAxis = 'powerToWeight' | 'thrustToWeight';

/** One aerodynamic configuration with absolute values (clean's cd0 plus the increment). */
export interface ConfigurationPolar {
  cd0: number;
  oswaldEfficiency: number;
  clMax: number;
}

export interface Propulsion {
  kind: PropulsionKind;
  engines: number;
  /** m in sigma^m; used by the kinds with a lapse exponent. */
  lapseExponent: number;
  /** Pressure altitude up to which a turbocharged piston holds rated power [m]. */
  criticalAltitudeM?: number;
  /** Mach-aware turbine lapse, or `density` (sigma^m); absent: density. */
  lapseModel?: LapseModel;
  /** Throttle ratio TR: theta0 where a Mach-aware turbine lapse breaks (1 = sea-level standard day). */
  throttleRatio?: number;
}

export interface Aircraft {
  takeoffMassKg: number;
  aspectRatio: number;
  /** K1 in C_D = C_D0 + K1 C_L + K C_L^2. */
  cdLinear: number;
  /** Always has `clean`; other names as the concept defines them. */
  configurations: Record<string, ConfigurationPolar>;
  propulsion: Propulsion;
  /** Wing thickness, sweep and Korn factor; absent: compressibility drag is not modelled. */
  compressibility?: WingCompressibility;
}

export function loadingAxis(kind: PropulsionKind): LoadingAxis {
  return propulsionKind(kind).propeller ? 'powerToWeight' : 'thrustToWeight';
}

/**
 * Compressibility drag of a wing: the drag-divergence and critical Mach
 * numbers by the Korn equation with a technology factor, and the wave-drag
 * increment above the critical Mach by Lock's fourth-power law.
 */
// @ts-nocheck


/** The wing's section thickness, sweep and airfoil technology (SI: sweep in radians). */
export interface WingCompressibility {
  /** t/c of the wing sections. */
  thicknessRatio: number;
  /** Quarter-chord sweep [rad]. */
  quarterChordSweepRad: number;
  /** Korn's technology factor kappa_A: about 0.87 for conventional sections, 0.95 for supercritical (from memory). */
  kornFactor: number;
}

/**
 * M_dd = kappa_A / cos L - (t/c) / cos^2 L - C_L / (10 cos^3 L): the Korn equation with simple
 * sweep theory (Korn; extended to swept wings by Mason, as given in his configuration-aerodynamics notes; from memory).
 */
export function dragDivergenceMach(wing: WingCompressibility, liftCoefficient: number): number {
  const c = Math.cos(wing.quarterChordSweepRad);
  return wing.kornFactor / c - wing.thicknessRatio / (c * c) - liftCoefficient / (10 * c * c * c);
}

/** M_crit = M_dd - (0.1/80)^(1/3): where Lock's law gives dC_D/dM = 0.1 at M_dd (from memory, the same source). */
export function criticalMach(wing: WingCompressibility, liftCoefficient: number): number {
  return dragDivergenceMach(wing, liftCoefficient) - Math.cbrt(0.1 / 80);
}

/** Delta C_D,wave = 20 (M - M_crit)^4 above M_crit, else 0 (Lock's fourth-power law; from memory). */
export function waveDragIncrement(wing: WingCompressibility, liftCoefficient: number, mach: number): number {
  const over = mach - criticalMach(wing, liftCoefficient);
  return over > 0 ? 20 * over ** 4 : 0;
}

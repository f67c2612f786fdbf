/**
 * Lapse of rated sea-level power or thrust with air density, one model per
 * propulsion kind (core/methods.md section 5). sigma = rho/rho0 includes any ISA
 * temperature offset.
 */
// @ts-nocheck


/** alpha = sigma - (1 - sigma)/7.55 = 1.132 sigma - 0.132 (Gagg and Ferrar, NACA 1934, as given by Gudmundsson; from memory). */
export function pistonLapse(sigma: number): number {
  return sigma - (1 - sigma) / 7.55;
}

/** Full power down to the critical density ratio, then Gagg-Ferrar of sigma/sigma_crit (common practice). */
export function turbochargedPistonLapse(sigma: number, criticalSigma: number): number {
  return sigma >= criticalSigma ? 1 : pistonLapse(sigma / criticalSigma);
}

/** alpha = sigma^m, m about 0.75 (common practice, 0.7-0.9). */
export function turbopropLapse(sigma: number, exponent: number): number {
  return Math.pow(sigma, exponent);
}

/** alpha = sigma^m, m about 1: thrust proportional to density (Anderson, from memory; common range 0.6-1). */
export function turbofanLapse(sigma: number, exponent: number): number {
  return Math.pow(sigma, exponent);
}

/** Electric motors keep their rated power with altitude. */
export function electricLapse(): number {
  return 1;
}

/**
 * Exact unit factors to SI, from NIST SP 811 (2008), Appendix B.
 * Standard gravity g0 is exact by definition (CGPM 1901).
 */
// @ts-nocheck

export const G0 = 9.80665;

export const FOOT_M = 0.3048;
export const POUND_KG = 0.45359237;
export const POUND_FORCE_N = POUND_KG * G0; // 4.4482216152605 N
export const KNOT_MPS = 1852 / 3600;
export const NAUTICAL_MILE_M = 1852;
export const MILE_PER_HOUR_MPS = 0.44704;
export const FOOT_PER_MINUTE_MPS = FOOT_M / 60; // 0.00508
export const HORSEPOWER_W = 550 * FOOT_M * POUND_FORCE_N; // 745.69987158227022 W
export const METRIC_HORSEPOWER_W = 735.49875;
export const PSF_PA = POUND_FORCE_N / (FOOT_M * FOOT_M); // 47.880258980335843 Pa
export const RANKINE_K = 5 / 9;

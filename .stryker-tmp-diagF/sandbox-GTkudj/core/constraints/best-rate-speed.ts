/**
 * The speed that minimises the loading a climb requirement needs
 * (core/methods.md section 6), floored at a multiple of the stall speed.
 * With a = rho C_D0/(2 beta w) and b = 2 K beta w/rho:
 */
// @ts-nocheck

import { stallSpeed } from '../aero/speeds';
import type { FlightCondition } from './flight-condition';

const FOURTH_ROOT_OF_2 = Math.pow(2, 0.25);

/** Propeller, eta constant: 3aV^4 + K1 V^2 - b = 0, V*^2 = [-K1 + sqrt(K1^2 + 12ab)]/(6a) = V_mp^2 (core/methods.md section 6). */
export function propellerBestRateSpeed(a: number, b: number, k1: number): number {
  return Math.sqrt((-k1 + Math.sqrt(k1 * k1 + 12 * a * b)) / (6 * a));
}

/**
 * Jet: the positive root of 2aV^4 - RC V - 2b = 0 by Newton's method
 * (core/methods.md section 6). The iteration starts from V_md moved right to
 * max(2^(1/4) V_md, (RC/a)^(1/3)), where the quartic is already positive, so
 * Newton on the convex quartic descends to the root without overshoot.
 */
export function jetBestRateSpeed(a: number, b: number, rateMps: number): number {
  const minimumDragSpeed = Math.sqrt(Math.sqrt(b / a));
  let v = Math.max(FOURTH_ROOT_OF_2 * minimumDragSpeed, Math.cbrt(Math.max(rateMps, 0) / a));
  for (let i = 0; i < 50; i++) {
    const v3 = v * v * v;
    const step = (2 * a * v3 * v - rateMps * v - 2 * b) / (8 * a * v3 - rateMps);
    v -= step;
    if (Math.abs(step) <= 1e-12 * v) break;
  }
  return v;
}

/**
 * V = max(V*, k V_s,c): the best-rate speed, no slower than k times the
 * stall speed of the condition's configuration (14 CFR 23.65/23.67 climb-speed
 * minimum, k = 1.2). TAS at the condition's density.
 */
export function bestRateSpeed(
  c: FlightCondition,
  wingLoadingPa: number,
  rateMps: number,
  minimumSpeedFactor: number,
): number {
  const weightLoading = c.beta * wingLoadingPa;
  const a = (c.densityKgM3 * c.polar.cd0) / (2 * weightLoading);
  const b = (2 * c.polar.k * weightLoading) / c.densityKgM3;
  const best = c.propeller ? propellerBestRateSpeed(a, b, c.polar.k1) : jetBestRateSpeed(a, b, rateMps);
  return Math.max(best, minimumSpeedFactor * stallSpeed(weightLoading, c.densityKgM3, c.polar.clMax));
}

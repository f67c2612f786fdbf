/**
 * Propeller-driven kinds size shaft power, not thrust.
 */
// @ts-nocheck

import { propulsionKind, type PropulsionKind } from './kinds';

/** True for kinds whose diagram axis is shaft power per weight. */
export function isPropellerDriven(kind: PropulsionKind): boolean {
  return propulsionKind(kind).propeller;
}

/** P/W = (T/W) V / eta_p [W/N], thrust power over propeller efficiency (Anderson, Introduction to Flight, power available). */
export function shaftPowerLoading(thrustLoading: number, speedMps: number, propellerEfficiency: number): number {
  return (thrustLoading * speedMps) / propellerEfficiency;
}

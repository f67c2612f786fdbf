/**
 * Mass fractions (end over start) of cruise and loiter by the Breguet range
 * and endurance equations (Raymer, Aircraft Design: A Conceptual Approach,
 * section 3.4 and chapter 17; from memory). Jets: c is the thrust specific
 * fuel consumption as weight flow per thrust [1/s]. Propellers: the
 * equivalent c = BSFC g V / eta_p, with BSFC in kg/J.
 */
import { G0 } from '../units/factors';

/** Jet cruise: R = (V / c) (L/D) ln(W_i/W_f), so W_f/W_i = exp(-R c / (V L/D)). */
export function jetCruiseFraction(rangeM: number, speedMps: number, tsfcPerS: number, liftToDrag: number): number {
  return Math.exp((-rangeM * tsfcPerS) / (speedMps * liftToDrag));
}

/** Jet loiter: E = (1/c) (L/D) ln(W_i/W_f), so W_f/W_i = exp(-E c / (L/D)). */
export function jetLoiterFraction(enduranceS: number, tsfcPerS: number, liftToDrag: number): number {
  return Math.exp((-enduranceS * tsfcPerS) / liftToDrag);
}

/** Propeller cruise: R = (eta_p / (BSFC g)) (L/D) ln(W_i/W_f), so W_f/W_i = exp(-R BSFC g / (eta_p L/D)). */
export function propellerCruiseFraction(rangeM: number, bsfcKgPerJ: number, propellerEfficiency: number, liftToDrag: number): number {
  return Math.exp((-rangeM * bsfcKgPerJ * G0) / (propellerEfficiency * liftToDrag));
}

/** Propeller loiter: E = (eta_p / (BSFC g V)) (L/D) ln(W_i/W_f), so W_f/W_i = exp(-E V BSFC g / (eta_p L/D)). */
export function propellerLoiterFraction(
  enduranceS: number,
  speedMps: number,
  bsfcKgPerJ: number,
  propellerEfficiency: number,
  liftToDrag: number,
): number {
  return Math.exp((-enduranceS * speedMps * bsfcKgPerJ * G0) / (propellerEfficiency * liftToDrag));
}

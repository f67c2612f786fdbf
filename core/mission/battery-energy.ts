/**
 * Battery energy of a segment per unit take-off weight [J/N]. A battery does
 * not burn off, so the mass is the take-off mass all the way: level flight
 * needs thrust D = W / (L/D) over the distance, a climb the potential energy
 * W dh, each drawn through the drive efficiency (work = force x distance,
 * energy = work / efficiency; common practice).
 */

/** E/W_0 = distance / ((L/D) eta_drive) for level flight. */
export function levelFlightEnergyPerWeight(distanceM: number, liftToDrag: number, driveEfficiency: number): number {
  return distanceM / (liftToDrag * driveEfficiency);
}

/** E/W_0 = dh / eta_drive for a climb through dh (the drag of the climb is left to the cruise that follows). */
export function climbEnergyPerWeight(heightGainM: number, driveEfficiency: number): number {
  return Math.max(0, heightGainM) / driveEfficiency;
}

/** Battery mass over take-off mass: m_b / m_0 = (E/W_0) g / (e* u), e* the pack's specific energy, u its usable fraction. */
export function batteryMassFraction(energyPerWeight: number, g: number, specificEnergyJPerKg: number, usableFraction: number): number {
  return (energyPerWeight * g) / (specificEnergyJPerKg * usableFraction);
}

/**
 * The flight Mach number of a requirement at a wing loading: its true
 * airspeed over the speed of sound at its altitude and temperature offset.
 */
import { atmosphere } from '../atmosphere';
import type { RequirementCommon } from '../requirements/common';
import type { Boundary } from '../model';

/** M = V / a, a = sqrt(gamma R T) (U.S. Standard Atmosphere 1976); undefined where the boundary has no speed there. */
export function flightMachAt(entry: { requirement: RequirementCommon; boundary: Boundary }, wingLoadingPa: number): number | undefined {
  const { requirement, boundary } = entry;
  const speed = boundary.speedAt?.(wingLoadingPa);
  if (speed === undefined || !Number.isFinite(speed) || !(speed > 0)) return undefined;
  return speed / atmosphere(requirement.altitudeM, requirement.temperatureOffsetK).speedOfSoundMps;
}

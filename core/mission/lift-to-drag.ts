/**
 * The lift-to-drag ratio a mission segment flies at: the concept's own clean
 * polar (core/aero/drag-polar.ts) at the segment's speed and air, with the
 * lift coefficient of its mass on the sized wing, C_L = (m/m_0)(W_0/S)/q,
 * plus the wave drag above the critical Mach where the concept describes its
 * wing (core/aero/compressibility.ts).
 */
import { waveDragIncrement } from '../aero/compressibility';
import { dragCoefficient, polarOf } from '../aero/drag-polar';
import type { Aircraft } from '../aircraft';
import { atmosphere } from '../atmosphere';
import type { FlightCondition } from './mission';

export interface SegmentAerodynamics {
  liftToDrag: number;
  liftCoefficient: number;
  clMax: number;
}

/** L/D = C_L / C_D at the take-off wing loading [N/m^2] times the mass ratio m/m_0, in level flight. */
export function segmentLiftToDrag(
  aircraft: Aircraft,
  takeoffWingLoadingPa: number,
  massRatio: number,
  condition: FlightCondition,
): SegmentAerodynamics {
  const air = atmosphere(condition.altitudeM, condition.temperatureOffsetK);
  const q = 0.5 * air.densityKgM3 * condition.speedMps * condition.speedMps;
  const liftCoefficient = (massRatio * takeoffWingLoadingPa) / q;
  const polar = polarOf(aircraft, 'clean')!;
  const wave = aircraft.compressibility ? waveDragIncrement(aircraft.compressibility, liftCoefficient, condition.speedMps / air.speedOfSoundMps) : 0;
  const drag = dragCoefficient(polar, liftCoefficient) + wave;
  return { liftToDrag: liftCoefficient / drag, liftCoefficient, clMax: polar.clMax };
}

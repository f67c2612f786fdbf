/** Missions for the mission tests, in SI, built as the concept resolver builds them. */
import type { Mission, MissionEnergy, MissionSegment } from '../../../core/mission/mission';

export const KNOT = 1852 / 3600; // NIST SP 811
export const FOOT = 0.3048; // NIST SP 811

export const propellerFuel = (bsfcKgPerKWh = 0.26, propellerEfficiency = 0.8): MissionEnergy => ({
  kind: 'fuel',
  engine: 'propeller',
  bsfcKgPerJ: bsfcKgPerKWh / 3.6e6,
  propellerEfficiency,
});

export const jetFuel = (tsfcPerHour = 0.7): MissionEnergy => ({ kind: 'fuel', engine: 'jet', tsfcPerS: tsfcPerHour / 3600 });

export const cruise = (rangeKm: number, speedKt = 110, altitudeFt = 6000): MissionSegment => ({
  kind: 'cruise',
  rangeM: rangeKm * 1000,
  speedMps: speedKt * KNOT,
  altitudeM: altitudeFt * FOOT,
  temperatureOffsetK: 0,
});

export const loiter = (minutes: number, speedKt = 80, altitudeFt = 3000): MissionSegment => ({
  kind: 'loiter',
  enduranceS: minutes * 60,
  speedMps: speedKt * KNOT,
  altitudeM: altitudeFt * FOOT,
  temperatureOffsetK: 0,
});

export function mission(o: Partial<Mission> = {}): Mission {
  return {
    payloadKg: 400,
    crewKg: 90,
    segments: [
      { kind: 'takeoff-climb', fraction: 0.97 * 0.985 },
      cruise(800),
      loiter(45),
      { kind: 'descent-landing', fraction: 0.995 },
      { kind: 'reserve', by: 'endurance', enduranceS: 1800, speedMps: 80 * KNOT, altitudeM: 3000 * FOOT, temperatureOffsetK: 0 },
    ],
    energy: propellerFuel(),
    aircraftClass: 'twin-engine-general-aviation',
    technologyFactor: 1,
    liftToDragScale: 1,
    startingMassKg: 2000,
    takeoffMassGiven: true,
    ...o,
  };
}

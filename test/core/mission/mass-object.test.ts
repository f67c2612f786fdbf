/**
 * The evaluation's `mass` object in SI: the breakdown adds up, each segment's
 * fuel and energy in kilograms and joules, nulls where a segment has no such
 * number, and the design resized to the closed mass. Hand derivations from the
 * flown fractions (core/methods.md section 12).
 */
import { describe, expect, it } from 'vitest';
import { atClosedMass, closeMass, missionMass } from '../../../core/mission';
import { aircraft } from '../helpers/design';
import { cruise, loiter, mission } from './helpers';

const G0 = 9.80665; // exact (CGPM 1901)

const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });

describe('the mass object of a fuel mission', () => {
  const m = mission({ segments: [{ kind: 'takeoff-climb', fraction: 0.955 }, cruise(600, 110, 0), loiter(30), { kind: 'reserve', by: 'fraction', fraction: 0.06 }] });
  /** Worked out inside each test, where a changed engine is seen. */
  function both() {
    const result = missionMass(m, twin, 1500);
    if (!result.ok) throw new Error(result.message);
    const closed = closeMass(m, twin, 1500);
    if (!closed.ok) throw new Error(closed.message);
    return { mass: result.mass, closed };
  }

  it('breaks the take-off mass into empty, fuel, payload and crew', () => {
    const { mass, closed } = both();
    expect(mass.takeoff).toBe(closed.takeoffKg);
    expect(mass.empty).toBeCloseTo(closed.emptyFraction * closed.takeoffKg, 9);
    expect(mass.fuel).toBeCloseTo(closed.flown.fuelFraction * closed.takeoffKg, 9);
    expect(mass.battery).toBe(0);
    expect(mass.payload).toBe(400);
    expect(mass.crew).toBe(90);
    expect(mass.emptyFraction).toBe(closed.emptyFraction);
    expect(mass.iterations).toBe(closed.iterations);
    expect(mass.iterations).toBeGreaterThan(2);
    expect(mass.empty + mass.fuel + mass.payload + mass.crew).toBeCloseTo(mass.takeoff, 6);
  });

  it('gives each segment its fuel in kg, and nulls where it has no flight condition', () => {
    const { mass } = both();
    const [takeoff, leg, hold, reserve] = mass.segments;
    expect(takeoff).toEqual({ kind: 'takeoff-climb', massFraction: 0.955, fuel: expect.any(Number), energy: null, liftToDrag: null, speed: null, altitude: null });
    expect(takeoff.fuel).toBeCloseTo(0.045 * mass.takeoff, 9);
    expect(leg.fuel).toBeCloseTo(0.955 * (1 - leg.massFraction!) * mass.takeoff, 9);
    expect(leg.speed).toBeCloseTo(110 * (1852 / 3600), 12);
    expect(leg.altitude).toBe(0);
    expect(hold.liftToDrag).toBeGreaterThan(0);
    expect(reserve.massFraction).toBeNull();
    expect(reserve.energy).toBeNull();
    // Segments and reserve add to the fuel (hand: the reserve is 6 % of what the rest burn).
    const sum = mass.segments.reduce((total, s) => total + s.fuel!, 0);
    expect(sum).toBeCloseTo(mass.fuel, 6);
  });

  it('resizes the design to the closed mass, and leaves a design without one as it is', () => {
    const { mass } = both();
    const design = { name: 'x', aircraft: twin };
    const resized = atClosedMass(design, { mass });
    expect(resized.aircraft.takeoffMassKg).toBe(mass.takeoff);
    expect(resized.aircraft.aspectRatio).toBe(8);
    expect(resized.name).toBe('x');
    expect(design.aircraft.takeoffMassKg).not.toBe(mass.takeoff);
    expect(atClosedMass(design, {})).toBe(design);
  });
});

describe('the mass object of a battery mission', () => {
  it('gives each segment its energy in joules: E/W_0 x m_0 x g0', () => {
    const drone = aircraft({ kind: 'electric', aspectRatio: 10, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.4 } });
    const m = mission({
      payloadKg: 2,
      crewKg: 0,
      emptyMassFraction: 0.5,
      segments: [{ kind: 'takeoff-climb', fraction: 0.95 }, { kind: 'cruise', rangeM: 30_000, speedMps: 25, altitudeM: 200, temperatureOffsetK: 0 }],
      energy: { kind: 'battery', specificEnergyJPerKg: 200 * 3600, usableFraction: 0.8, driveEfficiency: 0.8 },
    });
    const result = missionMass(m, drone, 300);
    if (!result.ok) throw new Error(result.message);
    const { mass } = result;
    // The climb to 200 m through 0.8: 250 J/N, times the take-off weight (hand).
    expect(mass.segments[0].energy).toBeCloseTo(250 * mass.takeoff * G0, 6);
    expect(mass.segments[0].fuel).toBeNull();
    expect(mass.segments[0].massFraction).toBe(1);
    // Every joule drawn comes from the pack: m_b = E / (e* u) (hand).
    const drawn = mass.segments.reduce((total, s) => total + s.energy!, 0);
    expect(mass.battery).toBeCloseTo(drawn / (200 * 3600 * 0.8), 9);
    expect(mass.fuel).toBe(0);
  });
});

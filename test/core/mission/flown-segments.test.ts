/**
 * The mission flown segment by segment: a battery aircraft's climbs, descents
 * and reserves, and the one-line messages of segments that cannot be flown.
 * Check values are hand derivations written here (work = force x distance,
 * divided by the drive efficiency; common practice) and the standard atmosphere's
 * closed form for the troposphere (U.S. Standard Atmosphere 1976).
 */
import { describe, expect, it } from 'vitest';
import { closeMass, flyMission } from '../../../core/mission';
import type { Mission, MissionSegment } from '../../../core/mission/mission';
import { aircraft } from '../helpers/design';
import { FOOT, KNOT, cruise, loiter, mission } from './helpers';

const G0 = 9.80665; // exact (CGPM 1901)

/** ISA density in the troposphere: T = 288.15 - 0.0065 h, rho = 1.225 (T/288.15)^(g0/(R L) - 1), R = 287.05287 (USSA 1976). */
function isaDensity(h: number): number {
  const t = 288.15 - 0.0065 * h;
  return 1.225 * (t / 288.15) ** (G0 / (287.05287 * 0.0065) - 1);
}

const drone = aircraft({ kind: 'electric', aspectRatio: 10, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.4 } });
const battery = { kind: 'battery' as const, specificEnergyJPerKg: 200 * 3600, usableFraction: 0.8, driveEfficiency: 0.8 };
const level = (altitudeM: number, rangeM = 20_000): MissionSegment => ({ kind: 'cruise', rangeM, speedMps: 25, altitudeM, temperatureOffsetK: 0 });

function flown(m: Mission) {
  const result = flyMission(m, drone, 300);
  if (!result.ok) throw new Error(result.message);
  return result.flown;
}

describe('a battery aircraft, segment by segment', () => {
  it('climbs to the next flown altitude, climbs again between legs, and glides down for nothing', () => {
    const f = flown(
      mission({
        emptyMassFraction: 0.5,
        energy: battery,
        segments: [
          { kind: 'takeoff-climb', fraction: 0.95 },
          level(300),
          { kind: 'climb', fraction: 0.985 },
          { kind: 'reserve', by: 'fraction', fraction: 0.1 },
          level(700),
          { kind: 'descent-landing', fraction: 0.995 },
          { kind: 'climb', fraction: 0.985 },
        ],
      }),
    );
    const energy = f.segments.map((s) => s.energyPerWeight);
    // Climbs: 300 m / 0.8 = 375 J/N; then 700 - 300 = 400 m / 0.8 = 500 J/N, past the reserve to the next flown leg.
    expect(energy[0]).toBeCloseTo(375, 9);
    expect(energy[2]).toBeCloseTo(500, 9);
    // Descent and landing draw nothing; a climb with no flown leg after it climbs to the ground: nothing.
    expect(energy[5]).toBe(0);
    expect(energy[6]).toBe(0);
    // Level legs: 20 km / (L/D x 0.8), L/D from the polar at the take-off C_L (batteries do not burn off).
    for (const [i, h] of [[1, 300], [4, 700]] as const) {
      const cl = 300 / (0.5 * isaDensity(h) * 25 * 25);
      const ld = cl / (0.03 + (cl * cl) / (Math.PI * 0.8 * 10));
      expect(f.segments[i].liftToDrag).toBeCloseTo(ld, 6);
      expect(energy[i]).toBeCloseTo(20_000 / (ld * 0.8), 3);
    }
    // The reserve is 10 % of everything the other segments draw.
    const drawn = [0, 1, 2, 4, 5, 6].reduce((sum, i) => sum + energy[i]!, 0);
    expect(energy[3]).toBeCloseTo(0.1 * drawn, 9);
    // m_b/m_0 = (E/W_0) g / (e* u), with the reserve (hand).
    expect(f.batteryFraction).toBeCloseTo((1.1 * drawn * G0) / (200 * 3600 * 0.8), 12);
    expect(f.fuelFraction).toBe(0);
    for (const s of f.segments) {
      expect(s.fuelShare).toBeNull();
      if (s !== f.segments[3]) expect(s.massFraction).toBe(1);
    }
    expect(f.segments[3].massFraction).toBeNull();
  });
});

describe('a battery aircraft that lands and flies on', () => {
  it('climbs again from the ground after a landing, to the next leg\'s altitude', () => {
    const f = flown(
      mission({
        emptyMassFraction: 0.5,
        energy: battery,
        segments: [level(300), { kind: 'descent-landing', fraction: 0.995 }, { kind: 'takeoff-climb', fraction: 0.955 }, level(700)],
      }),
    );
    // Landing draws nothing and ends at the ground; the next climb is 700 m / 0.8 = 875 J/N (hand).
    expect(f.segments[1].energyPerWeight).toBe(0);
    expect(f.segments[2].energyPerWeight).toBeCloseTo(875, 9);
  });

  it('a descent and landing draws nothing, also from a leg below sea level', () => {
    // Altitudes from -1000 m are accepted (a field below sea level; an invented case).
    const f = flown(mission({ emptyMassFraction: 0.5, energy: battery, segments: [level(-300), { kind: 'descent-landing', fraction: 0.995 }] }));
    expect(f.segments[1].energyPerWeight).toBe(0);
  });
});

describe('a fuel mission, segment by segment', () => {
  it('fraction segments burn their share of the mass they start with; a fraction reserve keeps its share of what was burnt', () => {
    const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const result = flyMission(
      mission({
        segments: [
          { kind: 'takeoff-climb', fraction: 0.955 },
          cruise(500, 110, 0),
          { kind: 'descent-landing', fraction: 0.995 },
          { kind: 'reserve', by: 'fraction', fraction: 0.06 },
        ],
      }),
      twin,
      1500,
    );
    if (!result.ok) throw new Error(result.message);
    const [takeoff, leg, landing, reserve] = result.flown.segments;
    expect(takeoff.fuelShare).toBeCloseTo(0.045, 12);
    const legFraction = leg.massFraction!;
    expect(leg.fuelShare).toBeCloseTo(0.955 * (1 - legFraction), 12);
    expect(landing.fuelShare).toBeCloseTo(0.955 * legFraction * 0.005, 12);
    const burnt = 1 - 0.955 * legFraction * 0.995;
    expect(reserve.fuelShare).toBeCloseTo(0.06 * burnt, 12);
    expect(result.flown.fuelFraction).toBeCloseTo(1.06 * burnt, 12);
    expect(result.flown.batteryFraction).toBe(0);
    for (const s of [takeoff, landing, reserve]) expect([s.liftToDrag, s.speedMps, s.altitudeM, s.energyPerWeight]).toEqual([null, null, null, null]);
    expect(leg.speedMps).toBeCloseTo(110 * KNOT, 12);
    expect(leg.altitudeM).toBe(0);
  });
});

describe('segments that cannot be flown', () => {
  const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });

  it('a loiter below the stall of the sized wing names its speed, height and lift coefficient', () => {
    // C_L = (m/m_0)(W/S) / q at 40 kt and 3,000 ft after a take-off fraction of 0.955:
    // 0.955 x 1500 / (0.5 rho(914.4 m) (40 kt)^2), by hand from the ISA closed form.
    const cl = (0.955 * 1500) / (0.5 * isaDensity(3000 * FOOT) * (40 * KNOT) ** 2);
    const result = closeMass(mission({ segments: [{ kind: 'takeoff-climb', fraction: 0.955 }, loiter(30, 40, 3000), cruise(300)] }), twin, 1500);
    expect(result).toEqual({
      ok: false,
      field: 'mission.segments[1]',
      message: `the loiter at 40 kt and 3,000 ft needs a lift coefficient of ${cl.toFixed(2)} on the sized wing, above the clean C_Lmax of 1.50; fly it faster or lower`,
    });
  });

  it('a segment flown just below C_Lmax is still flown', () => {
    // The speed where C_L = 1.5 at sea level for 1500 N/m^2: V = sqrt(2 x 1500 / (1.225 x 1.5)) (hand); flown 1e-4 lighter (the engine's sea-level density is 1.225 to six figures).
    const v = Math.sqrt((2 * 1500) / (1.225 * 1.5));
    const at = closeMass(mission({ segments: [{ kind: 'loiter', enduranceS: 600, speedMps: v, altitudeM: 0, temperatureOffsetK: 0 }] }), twin, 1500 * (1 - 1e-4));
    expect(at.ok).toBe(true);
  });

  it('a polar with no positive lift-to-drag ratio there is named', () => {
    // No wing loading, no lift: L/D = 0 / C_D0 = 0.
    const result = closeMass(mission({ segments: [cruise(300, 110, 0)] }), twin, 0);
    expect(result).toEqual({ ok: false, field: 'mission.segments[0]', message: "the cruise at 110 kt gives no positive lift-to-drag ratio on the concept's polar" });
  });
});

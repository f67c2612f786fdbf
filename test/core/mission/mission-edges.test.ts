/**
 * Mission details the other mission tests leave open: the wave drag in a
 * segment's lift-to-drag ratio, reserves flown for a time, a battery loiter,
 * the lift-to-drag scale in the first pass, each leg's own range driver, a
 * driver whose step does not close, the growth factor of the regression, and
 * the whole messages of a mission whose energy alone outweighs it. Check
 * values are hand derivations written here.
 */
import { describe, expect, it } from 'vitest';
import { closeMass, flyMission, missionMass, segmentLiftToDrag } from '../../../core/mission';
import type { Mission, MissionSegment } from '../../../core/mission/mission';
import { aircraft } from '../helpers/design';
import { KNOT, cruise, jetFuel, mission, propellerFuel } from './helpers';

const G0 = 9.80665; // exact (CGPM 1901)
const LB = 0.45359237; // kg (NIST SP 811)
const RHO0 = 1.225; // kg/m^3, sea level (U.S. Standard Atmosphere 1976)
const A0 = 340.294; // m/s, sea level (U.S. Standard Atmosphere 1976)

const drone = aircraft({ kind: 'electric', aspectRatio: 10, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.4 } });
const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });
const battery = { kind: 'battery' as const, specificEnergyJPerKg: 200 * 3600, usableFraction: 0.8, driveEfficiency: 0.8 };
const seaLevel = (rangeM: number): MissionSegment => ({ kind: 'cruise', rangeM, speedMps: 25, altitudeM: 0, temperatureOffsetK: 0 });

/** L/D of the drone's polar at sea level and 25 m/s for a wing loading w (hand). */
function droneLd(w: number): number {
  const cl = w / (0.5 * RHO0 * 25 * 25);
  return cl / (0.03 + (cl * cl) / (Math.PI * 0.8 * 10));
}

describe('segment lift-to-drag ratio with the wave drag', () => {
  it('adds Lock\'s 20 (M - M_crit)^4 above the Korn critical Mach (core/methods.md section 3.1)', () => {
    const wing = { thicknessRatio: 0.12, quarterChordSweepRad: 0, kornFactor: 0.87 };
    const jet = { ...aircraft({ kind: 'turbofan', aspectRatio: 8, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 } }), compressibility: wing };
    const v = 0.72 * A0;
    const at = segmentLiftToDrag(jet, 3000, 0.9, { speedMps: v, altitudeM: 0, temperatureOffsetK: 0 });
    // Hand: C_L = 0.9 x 3000 / (0.5 x 1.225 x v^2); M_crit = 0.87 - 0.12 - C_L/10 - (0.1/80)^(1/3) (no sweep);
    // C_D = 0.02 + C_L^2 / (pi 0.8 8) + 20 (0.72 - M_crit)^4.
    const cl = (0.9 * 3000) / (0.5 * RHO0 * v * v);
    const mCrit = 0.87 - 0.12 - cl / 10 - Math.cbrt(0.1 / 80);
    const wave = 20 * (0.72 - mCrit) ** 4;
    expect(wave).toBeGreaterThan(1e-3);
    expect(at.liftCoefficient).toBeCloseTo(cl, 5);
    expect(at.liftToDrag).toBeCloseTo(cl / (0.02 + (cl * cl) / (Math.PI * 0.8 * 8) + wave), 4);
    expect(at.clMax).toBe(1.5);
  });
});

describe('segments flown in less common ways', () => {
  it('a reserve flown for a time is a loiter: its fuel from Breguet at its own speed and height', () => {
    const result = flyMission(
      mission({ segments: [{ kind: 'reserve', by: 'endurance', enduranceS: 1800, speedMps: 80 * KNOT, altitudeM: 0, temperatureOffsetK: 0 }] }),
      twin,
      1500,
    );
    if (!result.ok) throw new Error(result.message);
    const [reserve] = result.flown.segments;
    expect(reserve.speedMps).toBeCloseTo(80 * KNOT, 12);
    expect(reserve.altitudeM).toBe(0);
    // Propeller loiter fraction exp(-E V BSFC g / (eta L/D)) at the segment's own L/D (Raymer, section 3.4; from memory).
    const f = Math.exp((-1800 * 80 * KNOT * (0.26 / 3.6e6) * G0) / (0.8 * reserve.liftToDrag!));
    expect(reserve.massFraction).toBeCloseTo(f, 12);
    expect(result.flown.fuelFraction).toBeCloseTo(1 - f, 12);
  });

  it('a battery loiter draws its speed x endurance over L/D through the drive', () => {
    const result = flyMission(
      mission({ emptyMassFraction: 0.5, energy: battery, segments: [{ kind: 'loiter', enduranceS: 600, speedMps: 25, altitudeM: 0, temperatureOffsetK: 0 }] }),
      drone,
      300,
    );
    if (!result.ok) throw new Error(result.message);
    // 25 m/s x 600 s = 15 km; E/W_0 = 15,000 / (L/D x 0.8) (hand).
    expect(result.flown.segments[0].energyPerWeight).toBeCloseTo(15_000 / (droneLd(300) * 0.8), 3);
  });

  it('the lift-to-drag scale applies to the first pass too, which sets the mean mass', () => {
    const m = mission({ segments: [cruise(800, 110, 0)], energy: propellerFuel(0.26, 0.8), liftToDragScale: 1.25 });
    const result = flyMission(m, twin, 1500);
    if (!result.ok) throw new Error(result.message);
    const q = 0.5 * RHO0 * (110 * KNOT) ** 2;
    const ldAt = (ratio: number) => {
      const cl = (ratio * 1500) / q;
      return cl / (0.028 + (cl * cl) / (Math.PI * 0.8 * 8));
    };
    // Hand: first pass at 1.25 L/D(start), L/D at the mean mass times 1.25, then the Breguet fraction at it.
    const breguet = (ld: number) => Math.exp((-800e3 * (0.26 / 3.6e6) * G0) / (0.8 * ld));
    const ld = 1.25 * ldAt((1 + breguet(1.25 * ldAt(1))) / 2);
    expect(result.flown.segments[0].liftToDrag).toBeCloseTo(ld, 6);
    expect(result.flown.segments[0].massFraction).toBeCloseTo(breguet(ld), 9);
  });
});

describe('drivers of a mission with two legs, and inputs whose step does not close', () => {
  // m_b/m_0 per metre of level flight at 300 N/m^2 (batteries do not burn off): G0 / (L/D x 0.8 x 200 Wh/kg x 0.8).
  const perMetre = G0 / (droneLd(300) * 0.8 * 200 * 3600 * 0.8);
  const central = (m0: (f: number) => number) => (m0(1.01) - m0(0.99)) / (0.02 * m0(1));

  it('each leg\'s range driver steps that leg alone', () => {
    const m = mission({ payloadKg: 2, crewKg: 0, emptyMassFraction: 0.5, energy: battery, segments: [seaLevel(20_000), seaLevel(40_000)] });
    const result = missionMass(m, drone, 300);
    if (!result.ok) throw new Error(result.message);
    const b1 = 20_000 * perMetre;
    const b2 = 40_000 * perMetre;
    const of = (field: string) => result.mass.drivers.find((d) => d.field === field)!.elasticity;
    // m_0 = carried / (1 - e - b1 - b2): the hand central differences of each leg.
    expect(of('mission.segments[0].range')).toBeCloseTo(central((f) => 1 / (1 - 0.5 - b1 * f - b2)), 6);
    expect(of('mission.segments[1].range')).toBeCloseTo(central((f) => 1 / (1 - 0.5 - b1 - b2 * f)), 6);
  });

  it('leaves out a driver whose 1 % step no longer closes', () => {
    // e = 0.905 with 60 km: e + b = 0.994 closes, 1.01 e + b = 1.003 does not (hand, b = 0.0887).
    const b = 60_000 * perMetre;
    expect(0.905 + b).toBeLessThan(1);
    expect(1.01 * 0.905 + b).toBeGreaterThan(1);
    const result = missionMass(mission({ payloadKg: 2, crewKg: 0, emptyMassFraction: 0.905, energy: battery, segments: [seaLevel(60_000)] }), drone, 300);
    if (!result.ok) throw new Error(result.message);
    expect(result.mass.drivers.map((d) => d.field)).toEqual(['mission.payload', 'mission.segments[0].range', 'mission.energy.specificEnergy', 'mission.liftToDrag']);
  });

  it('the growth factor of the regression: 1 / (C/m_0 - c W_e/W_0) by implicit differentiation, also with payload equal to crew', () => {
    // 1 = C/m + A (m/lb)^c + F at the root; d/dC: 0 = 1/m - (C/m^2) dm/dC + c (W_e/W_0)/m dm/dC, so
    // dm/dC = 1 / (C/m - c W_e/W_0) (hand). Twin general aviation: c = -0.10 (Raymer, section 3.4; from memory).
    const m = mission({ payloadKg: 245, crewKg: 245, segments: [cruise(800, 110, 0)] });
    const result = missionMass(m, twin, 1500);
    if (!result.ok) throw new Error(result.message);
    const { takeoff, emptyFraction, growthFactor } = result.mass;
    expect(emptyFraction).toBeCloseTo(1.51 * (takeoff / LB) ** -0.1, 12);
    expect(growthFactor).toBeCloseTo(1 / (490 / takeoff + 0.1 * emptyFraction), 4);
  });
});

describe('a mission whose energy alone is the whole take-off mass', () => {
  it('a fuel mission: the fuel fraction, and advice on fuel consumption', () => {
    // A 90,000 km leg at 0.7 1/h leaves f = exp(-R c / (V L/D)) near 0, and a 20 % reserve makes the fuel
    // fraction 1.2 (1 - f), above 1 (hand; an invented case).
    const jet = aircraft({ kind: 'turbofan', aspectRatio: 8, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const m: Mission = mission({
      segments: [cruise(90_000, 350, 30000), { kind: 'reserve', by: 'fraction', fraction: 0.2 }],
      energy: jetFuel(0.7),
      aircraftClass: 'jet-transport',
    });
    const result = closeMass(m, jet, 4000);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.field).toBe('mission.segments');
    expect(result.message).toMatch(
      /^the fuel fraction 1\.\d\d alone is the whole take-off mass or more; shorten the mission, carry less, or improve the lift-to-drag ratio, the fuel consumption or the empty fraction$/,
    );
  });

  it('a battery mission: the battery fraction, and advice on the pack', () => {
    const result = closeMass(mission({ emptyMassFraction: 0.5, energy: { ...battery, specificEnergyJPerKg: 50 * 3600 }, segments: [seaLevel(2_000_000)] }), drone, 300);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.field).toBe('mission.segments');
    expect(result.message).toMatch(
      /^the battery fraction \d+\.\d\d alone is the whole take-off mass or more; shorten the mission, carry less, or improve the lift-to-drag ratio, the pack or the empty fraction$/,
    );
  });

  it('fractions that add to 1 or more at the starting mass give the battery advice for a battery aircraft', () => {
    const result = closeMass(mission({ emptyMassFraction: 0.95, energy: battery, segments: [seaLevel(60_000)] }), drone, 300);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.message).toMatch(/^empty-mass fraction 0\.95 plus battery fraction 0\.09 add to 1\.04 and leave nothing for payload and crew; shorten the mission, carry less, or improve the lift-to-drag ratio, the pack or the empty fraction$/);
  });
});

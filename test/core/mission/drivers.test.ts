/**
 * The mass drivers (elasticity of the take-off mass to each input) and the
 * class a mission gets when it names none. The battery aircraft with a fixed
 * empty fraction closes in closed form, m_0 = (m_payload + m_crew) / (1 -
 * W_e/W_0 - m_b/m_0) with m_b/m_0 proportional to range / (e* L/D) (core/methods.md
 * section 12; work = force x distance, common practice), so each central
 * difference of the drivers can be worked by hand from it.
 */
import { describe, expect, it } from 'vitest';
import { DRIVER_STEP, defaultAircraftClass, massDrivers, missionMass } from '../../../core/mission';
import type { Mission } from '../../../core/mission/mission';
import { aircraft } from '../helpers/design';
import { cruise, jetFuel, loiter, mission, propellerFuel } from './helpers';

const G0 = 9.80665; // exact (CGPM 1901)

// Polar C_D = 0.03 + C_L^2/(pi 0.8 10), take-off wing loading 300 N/m^2, 60 km at 25 m/s at sea level
// (ISA density 1.225 kg/m^3, U.S. Standard Atmosphere 1976): by hand, L/D = 14.3962 and
// m_b/m_0 = 60,000 / (14.3962 x 0.8) x 9.80665 / (720,000 x 0.8) = 0.0886974 (as in closure.test.ts).
const drone = aircraft({ kind: 'electric', aspectRatio: 10, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.4 } });
const q = 0.5 * 1.225 * 25 * 25;
const cl = 300 / q;
const ld = cl / (0.03 + (cl * cl) / (Math.PI * 0.8 * 10));
const b = ((60_000 / (ld * 0.8)) * G0) / (200 * 3600 * 0.8);
const e = 0.5;
const electric: Mission = mission({
  payloadKg: 2,
  crewKg: 0.5,
  emptyMassFraction: e,
  segments: [{ kind: 'cruise', rangeM: 60_000, speedMps: 25, altitudeM: 0, temperatureOffsetK: 0 }],
  energy: { kind: 'battery', specificEnergyJPerKg: 200 * 3600, usableFraction: 0.8, driveEfficiency: 0.8 },
});

/** The central difference with 1 % steps of m_0(x) = carried / (1 - e(x) - b(x)), relative to m_0 (hand). */
function central(m0: (factor: number) => number): number {
  return (m0(1.01) - m0(0.99)) / (2 * 0.01 * m0(1));
}

/** The drone's mass object; worked out inside each test, where a changed engine is seen. */
function electricMass() {
  const result = missionMass(electric, drone, 300);
  if (!result.ok) throw new Error(result.message);
  return result.mass;
}

describe('mass drivers of a battery aircraft, against the closed form', () => {
  const byField = { get: (field: string) => electricMass().drivers.find((d) => d.field === field) };

  it('steps every input by 1 %', () => {
    expect(DRIVER_STEP).toBe(0.01);
  });

  it('lists the inputs in reading order, each with its field and name', () => {
    expect(electricMass().drivers.map((d) => [d.field, d.name])).toEqual([
      ['mission.payload', 'payload'],
      ['mission.segments[0].range', 'cruise range'],
      ['mission.energy.specificEnergy', 'pack specific energy'],
      ['mission.liftToDrag', 'lift-to-drag ratio, every segment'],
      ['mission.emptyMassFraction', 'empty-mass fraction'],
    ]);
  });

  it('payload: m_0 is linear in payload + crew, so the elasticity is payload / (payload + crew) = 0.8', () => {
    expect(byField.get('mission.payload')!.elasticity).toBeCloseTo(2 / 2.5, 9);
  });

  it('range: m_b/m_0 scales with the range', () => {
    const hand = central((f) => 1 / (1 - e - b * f));
    // And close to the derivative b / (1 - e - b) = 0.2158 (hand).
    expect(hand).toBeCloseTo(b / (1 - e - b), 4);
    expect(byField.get('mission.segments[0].range')!.elasticity).toBeCloseTo(hand, 7);
  });

  it('pack specific energy and lift-to-drag ratio: m_b/m_0 scales with their inverse', () => {
    const hand = central((f) => 1 / (1 - e - b / f));
    expect(hand).toBeCloseTo(-b / (1 - e - b), 4);
    expect(byField.get('mission.energy.specificEnergy')!.elasticity).toBeCloseTo(hand, 7);
    expect(byField.get('mission.liftToDrag')!.elasticity).toBeCloseTo(hand, 7);
  });

  it('empty-mass fraction: e / (1 - e - b) to first order', () => {
    const hand = central((f) => 1 / (1 - e * f - b));
    expect(hand).toBeCloseTo(e / (1 - e - b), 3);
    expect(byField.get('mission.emptyMassFraction')!.elasticity).toBeCloseTo(hand, 7);
  });

  it('gives the same elasticities when asked at the closed mass directly', () => {
    const mass = electricMass();
    expect(massDrivers(electric, drone, 300, mass.takeoff)).toEqual(mass.drivers);
  });

  it('leaves the drivers out when asked to', () => {
    const without = missionMass(electric, drone, 300, { drivers: false });
    expect(without.ok && without.mass.drivers).toEqual([]);
  });
});

describe('mass drivers of fuel missions: names and directions', () => {
  const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });

  it('a propeller mission with the regression: bsfc, the loiter endurance and the technology factor', () => {
    const result = missionMass(mission({ segments: [cruise(800, 110, 0), loiter(45)], energy: propellerFuel() }), twin, 1500);
    if (!result.ok) throw new Error(result.message);
    const fields = result.mass.drivers.map((d) => [d.field, d.name]);
    expect(fields).toEqual([
      ['mission.payload', 'payload'],
      ['mission.segments[0].range', 'cruise range'],
      ['mission.segments[1].endurance', 'loiter endurance'],
      ['mission.energy.bsfc', 'brake specific fuel consumption'],
      ['mission.liftToDrag', 'lift-to-drag ratio, every segment'],
      ['mission.technologyFactor', 'empty-mass fraction (technology factor)'],
    ]);
    const of = (field: string) => result.mass.drivers.find((d) => d.field === field)!.elasticity;
    // More range, endurance, fuel burn, payload or empty mass raise m_0; a better L/D lowers it (Breguet; common practice).
    for (const field of ['mission.payload', 'mission.segments[0].range', 'mission.segments[1].endurance', 'mission.energy.bsfc', 'mission.technologyFactor']) {
      expect(of(field)).toBeGreaterThan(0);
    }
    expect(of('mission.liftToDrag')).toBeLessThan(0);
    // In Breguet, range and fuel consumption enter only as their product R x BSFC: the same elasticity (hand).
    // Here the loiter also burns with BSFC, so BSFC moves m_0 more than the range alone.
    expect(of('mission.energy.bsfc')).toBeGreaterThan(of('mission.segments[0].range'));
  });

  it('a jet mission names its tsfc; a mission with no payload has no payload driver', () => {
    const jet = aircraft({ kind: 'turbofan', aspectRatio: 8, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const result = missionMass(
      mission({ payloadKg: 0, crewKg: 200, segments: [cruise(2000, 350, 30000)], energy: jetFuel(0.7), aircraftClass: 'jet-transport' }),
      jet,
      4000,
    );
    if (!result.ok) throw new Error(result.message);
    expect(result.mass.drivers.map((d) => [d.field, d.name])).toEqual([
      ['mission.segments[0].range', 'cruise range'],
      ['mission.energy.tsfc', 'thrust specific fuel consumption'],
      ['mission.liftToDrag', 'lift-to-drag ratio, every segment'],
      ['mission.technologyFactor', 'empty-mass fraction (technology factor)'],
    ]);
    // Range and TSFC enter the jet cruise fraction only as R c (Breguet), and so does the first pass that sets
    // the mean mass the L/D is read at: the same elasticity (hand).
    const of = (field: string) => result.mass.drivers.find((d) => d.field === field)!.elasticity;
    expect(of('mission.energy.tsfc')).toBeCloseTo(of('mission.segments[0].range'), 9);
  });
});

describe('segments given by a fraction have no driver', () => {
  it('only the flown legs are stepped', () => {
    const twin = aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, clean: { cd0: 0.028, oswaldEfficiency: 0.8, clMax: 1.5 } });
    const m = mission({
      segments: [
        { kind: 'takeoff-climb', fraction: 0.955 },
        cruise(500, 110, 0),
        { kind: 'descent-landing', fraction: 0.995 },
        { kind: 'reserve', by: 'fraction', fraction: 0.06 },
      ],
    });
    const result = missionMass(m, twin, 1500);
    if (!result.ok) throw new Error(result.message);
    expect(result.mass.drivers.map((d) => d.field)).toEqual([
      'mission.payload',
      'mission.segments[1].range',
      'mission.energy.bsfc',
      'mission.liftToDrag',
      'mission.technologyFactor',
    ]);
  });
});

describe('the class of a mission that names none (core/methods.md section 12)', () => {
  it('turbofan: jet transport; turboprop: twin turboprop; other kinds: general aviation by engine count', () => {
    expect(defaultAircraftClass('turbofan', 2)).toBe('jet-transport');
    expect(defaultAircraftClass('turboprop', 2)).toBe('twin-turboprop');
    expect(defaultAircraftClass('piston', 1)).toBe('single-engine-general-aviation');
    expect(defaultAircraftClass('piston', 2)).toBe('twin-engine-general-aviation');
    expect(defaultAircraftClass('electric', 1)).toBe('single-engine-general-aviation');
  });
});

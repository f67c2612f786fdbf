/**
 * Each requirement kind read from a concept file with only the fields it must
 * have: the defaults its descriptor fills in, against the values and sources
 * of core/methods.md, and the fields it resolves from what is written.
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import type { Requirement } from '../../../core/model';
import { assertRelative } from '../helpers/asserts';

const FOOT = 0.3048; // m, international foot (NIST SP 811, exact)
const KNOT = 1852 / 3600; // m/s, international knot (NIST SP 811, exact)

/** A twin jet with the three usual configurations, so every kind's default configuration exists. */
function resolved(requirement: Record<string, unknown>, propulsion: Record<string, unknown> = { kind: 'turbofan', engines: 2 }): Requirement {
  const parsed = parseConcept({
    format: 'loftpoint-concept/1',
    aircraft: {
      takeoffMass: '20000 kg',
      aero: {
        aspectRatio: 9,
        configurations: {
          clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.4 },
          takeoff: { cd0Increment: 0.015, clMax: 1.9 },
          landing: { cd0Increment: 0.06, clMax: 2.4 },
        },
      },
      propulsion,
    },
    requirements: [{ id: 'r', ...requirement }],
  });
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.design.requirements[0]!;
}

describe('requirement defaults, as core/methods.md states them', () => {
  it('balanced field length: 35 ft screen, V2 1.2 V_s, mean thrust 0.75 (5 + BPR)/(4 + BPR) at BPR 5', () => {
    const r = resolved({ kind: 'balanced-field-length', distance: '1500 m' });
    expect(r).toMatchObject({ kind: 'balanced-field-length', distanceM: 1500, v2SpeedFactor: 1.2, configuration: 'takeoff' });
    if (r.kind !== 'balanced-field-length') throw new Error('kind');
    assertRelative(r.obstacleHeightM, 35 * FOOT, 1e-12, 'screen height (14 CFR 25.113: 35 ft)');
    // Raymer, Aircraft Design, ch. 17 (from memory): T_av = 0.75 T (5 + BPR)/(4 + BPR); BPR 5 gives 0.75 * 10/9.
    assertRelative(r.averageThrustFraction, (0.75 * (5 + 5)) / (4 + 5), 1e-12, 'mean thrust fraction');
    expect(r.propellerEfficiency).toBe(0.55); // take-off run 0.5-0.6 (common practice)
  });

  it('balanced field length keeps what the file gives', () => {
    const r = resolved({ kind: 'balanced-field-length', distance: '5000 ft', obstacleHeight: '50 ft', v2SpeedFactor: 1.13, averageThrustFraction: 0.9 });
    expect(r).toMatchObject({ v2SpeedFactor: 1.13, averageThrustFraction: 0.9 });
    if (r.kind !== 'balanced-field-length') throw new Error('kind');
    assertRelative(r.distanceM, 5000 * FOOT, 1e-12);
    assertRelative(r.obstacleHeightM, 50 * FOOT, 1e-12);
  });

  it('landing distance: 50 ft screen, k_app 1.3, k_TD 1.15, 3 degrees, mu_B 0.3, 2 s free roll, C_L 0.5, unfactored', () => {
    const r = resolved({ kind: 'landing-distance', distance: '900 m' });
    if (r.kind !== 'landing-distance') throw new Error('kind');
    // Raymer ch. 17 (from memory): approach 1.3 V_s, touchdown 1.15 V_s, 3 degree approach, dry braking 0.3, 1-3 s free roll.
    expect(r).toMatchObject({
      distanceM: 900,
      fieldLengthFactor: 1,
      approachSpeedFactor: 1.3,
      touchdownSpeedFactor: 1.15,
      brakingFriction: 0.3,
      freeRollTimeS: 2,
      clGround: 0.5,
      liftDumping: false,
      configuration: 'landing',
    });
    assertRelative(r.obstacleHeightM, 50 * FOOT, 1e-12, 'screen height 50 ft');
    assertRelative(r.approachAngleRad, 3 * (Math.PI / 180), 1e-12, '3 degrees');
  });

  it('landing distance keeps what the file gives', () => {
    const r = resolved({
      kind: 'landing-distance', distance: '1500 m', obstacleHeight: '15 m', fieldLengthFactor: 0.6, approachSpeedFactor: 1.23,
      touchdownSpeedFactor: 1.1, approachAngle: '2.5 deg', brakingFriction: 0.4, freeRollTime: '3 s', clGround: 0.2, liftDumping: true,
    });
    expect(r).toMatchObject({ obstacleHeightM: 15, fieldLengthFactor: 0.6, approachSpeedFactor: 1.23, touchdownSpeedFactor: 1.1, brakingFriction: 0.4, freeRollTimeS: 3, clGround: 0.2, liftDumping: true });
    if (r.kind !== 'landing-distance') throw new Error('kind');
    assertRelative(r.approachAngleRad, 2.5 * (Math.PI / 180), 1e-12);
  });

  it('take-off distance: 50 ft screen, mu 0.04, C_L 0.5, k_LOF 1.1, 3 s rotation, climb-out eta_p 0.75', () => {
    const r = resolved({ kind: 'takeoff-distance', distance: '1200 m' });
    if (r.kind !== 'takeoff-distance') throw new Error('kind');
    // Brandt et al. (paved 0.02-0.05); Raymer ch. 17, from memory (1.1 V_s lift-off, about 3 s rotation for large aircraft).
    expect(r).toMatchObject({ distanceM: 1200, rollingFriction: 0.04, clGroundRun: 0.5, liftoffSpeedFactor: 1.1, rotationTimeS: 3, climbPropellerEfficiency: 0.75 });
    expect('runwaySurface' in r).toBe(false);
    assertRelative(r.obstacleHeightM, 50 * FOOT, 1e-12, 'screen height 50 ft');
  });

  it('take-off distance keeps what the file gives, the runway surface too', () => {
    const r = resolved({
      kind: 'takeoff-distance', distance: '800 m', obstacleHeight: '35 ft', rollingFriction: 0.08, runwaySurface: 'grass', clGroundRun: 0.7,
      liftoffSpeedFactor: 1.15, rotationTime: '1 s', climbPropellerEfficiency: 0.7,
    });
    expect(r).toMatchObject({ rollingFriction: 0.08, runwaySurface: 'grass', clGroundRun: 0.7, liftoffSpeedFactor: 1.15, rotationTimeS: 1, climbPropellerEfficiency: 0.7 });
    if (r.kind !== 'takeoff-distance') throw new Error('kind');
    assertRelative(r.obstacleHeightM, 35 * FOOT, 1e-12);
  });

  it('take-off ground roll: mu 0.04, C_L 0.5, k_LOF 1.1, and the runway surface only when written', () => {
    const bare = resolved({ kind: 'takeoff-ground-roll', distance: '400 m' });
    expect(bare).toMatchObject({ distanceM: 400, rollingFriction: 0.04, clGroundRun: 0.5, liftoffSpeedFactor: 1.1 });
    expect('runwaySurface' in bare).toBe(false);
    const given = resolved({ kind: 'takeoff-ground-roll', distance: '400 m', runwaySurface: 'soft', rollingFriction: 0.2, clGroundRun: 0.4, liftoffSpeedFactor: 1.2 });
    expect(given).toMatchObject({ runwaySurface: 'soft', rollingFriction: 0.2, clGroundRun: 0.4, liftoffSpeedFactor: 1.2 });
  });

  it('landing ground roll: mu_B 0.3, k_TD 1.15, no free roll, no aerodynamic terms unless written', () => {
    // Raymer Table 17.1 and ch. 17 (from memory): dry braking 0.3, touchdown 1.15 V_s.
    expect(resolved({ kind: 'landing-ground-roll', distance: '500 m' })).toMatchObject({
      distanceM: 500, brakingFriction: 0.3, touchdownSpeedFactor: 1.15, freeRollTimeS: 0, clGround: null, liftDumping: false,
    });
    expect(resolved({ kind: 'landing-ground-roll', distance: '500 m', brakingFriction: 0.45, touchdownSpeedFactor: 1.2, freeRollTime: '2 s', clGround: 0.3, liftDumping: true })).toMatchObject({
      brakingFriction: 0.45, touchdownSpeedFactor: 1.2, freeRollTimeS: 2, clGround: 0.3, liftDumping: true,
    });
  });

  it('stall speed: the calibrated speed as written, in the landing configuration', () => {
    const r = resolved({ kind: 'stall', speed: '61 kt' });
    expect(r).toMatchObject({ kind: 'stall', configuration: 'landing' });
    if (r.kind !== 'stall') throw new Error('kind');
    // 61 kt CAS: 14 CFR 23.49(c) before Amendment 23-64.
    assertRelative(r.speedMps, 61 * KNOT, 1e-12);
  });

  it('approach speed: 1.3 times the landing stall speed unless written', () => {
    // 14 CFR 23.73 before Amendment 23-64: V_REF at least 1.3 V_S0 (from memory).
    const r = resolved({ kind: 'approach-speed', speed: '120 kt' });
    expect(r).toMatchObject({ speedFactor: 1.3, configuration: 'landing' });
    if (r.kind !== 'approach-speed') throw new Error('kind');
    assertRelative(r.speedMps, 120 * KNOT, 1e-12);
    expect(resolved({ kind: 'approach-speed', speed: '120 kt', approachSpeedFactor: 1.23 })).toMatchObject({ speedFactor: 1.23 });
  });

  it('climb gradient: all engines, 1.2 V_s, in the take-off configuration, as 0.024 or "2.4 %"', () => {
    expect(resolved({ kind: 'climb-gradient', gradient: '2.4 %' })).toMatchObject({ gradient: 0.024, enginesInoperative: 0, speedFactor: 1.2, configuration: 'takeoff', propellerEfficiency: 0.75 });
    expect(resolved({ kind: 'climb-gradient', gradient: 0.03, enginesInoperative: 1, climbSpeedFactor: 1.3 })).toMatchObject({ gradient: 0.03, enginesInoperative: 1, speedFactor: 1.3 });
  });

  it('ceiling: 100 ft/min at the ceiling (service ceiling), at least 1.2 V_s', () => {
    const r = resolved({ kind: 'ceiling', altitude: '35000 ft' });
    if (r.kind !== 'ceiling') throw new Error('kind');
    // Service ceiling: 100 ft/min residual rate of climb (Anderson, Introduction to Flight); 1 ft/min = 0.00508 m/s (NIST SP 811).
    assertRelative(r.rateMps, 0.508, 1e-12, 'service ceiling rate');
    assertRelative(r.altitudeM, 35000 * FOOT, 1e-12);
    expect(r.minimumSpeedFactor).toBe(1.2);
    expect(resolved({ kind: 'ceiling', altitude: '35000 ft', rate: '300 ft/min', minimumSpeedFactor: 1.3 })).toMatchObject({ minimumSpeedFactor: 1.3 });
  });

  it('rate of climb: the best-rate speed unless a speed is written, at least 1.2 V_s', () => {
    const bare = resolved({ kind: 'climb-rate', rate: '1000 ft/min' });
    expect(bare).toMatchObject({ minimumSpeedFactor: 1.2 });
    expect('speedMps' in bare).toBe(false);
    const given = resolved({ kind: 'climb-rate', rate: '1000 ft/min', speed: '150 kt', minimumSpeedFactor: 1.3 });
    if (given.kind !== 'climb-rate') throw new Error('kind');
    assertRelative(given.speedMps!, 150 * KNOT, 1e-12);
    assertRelative(given.rateMps, 1000 * 0.00508, 1e-12);
    expect(given.minimumSpeedFactor).toBe(1.3);
  });

  it('sustained turn: n = 1/cos(phi) from a bank angle, or the load factor as written', () => {
    // Anderson, Introduction to Flight, ch. 6: a 60 degree level turn pulls n = 2.
    const banked = resolved({ kind: 'sustained-turn', speed: '150 kt', bankAngle: '60 deg' });
    if (banked.kind !== 'sustained-turn') throw new Error('kind');
    assertRelative(banked.loadFactor, 2, 1e-12, 'n at 60 degrees of bank');
    assertRelative(banked.speedMps, 150 * KNOT, 1e-12);
    expect(resolved({ kind: 'sustained-turn', speed: '150 kt', loadFactor: 3 })).toMatchObject({ loadFactor: 3, propellerEfficiency: 0.8 });
  });

  it('cruise and maximum speed: a Mach number becomes TAS with the speed of sound at the altitude (ISA)', () => {
    // ISA (ICAO Doc 7488 / ISO 2533): T = 288.15 - 0.0065 h; a = sqrt(1.4 * 287.05287 * T).
    const h = 30000 * FOOT;
    const a = Math.sqrt(1.4 * 287.05287 * (288.15 - 0.0065 * h));
    const cruise = resolved({ kind: 'cruise', speed: 'M0.78', altitude: '30000 ft' });
    if (cruise.kind !== 'cruise') throw new Error('kind');
    assertRelative(cruise.speedMps, 0.78 * a, 1e-6, 'cruise TAS');
    const top = resolved({ kind: 'maximum-speed', speed: 'M0.8', altitude: '30000 ft' });
    expect(top).toMatchObject({ mach: 0.8, equivalent: false });
    if (top.kind !== 'maximum-speed') throw new Error('kind');
    assertRelative(top.speedMps, 0.8 * a, 1e-6, 'top speed TAS');
  });

  it('maximum speed: TAS by default, EAS when the file says so, and a Mach number is neither', () => {
    const tas = resolved({ kind: 'maximum-speed', speed: '250 kt', altitude: '10000 ft' });
    expect(tas).toMatchObject({ equivalent: false });
    expect('mach' in tas).toBe(false);
    const eas = resolved({ kind: 'maximum-speed', speed: '250 kt', airspeed: 'EAS', altitude: '10000 ft' });
    expect(eas).toMatchObject({ equivalent: true });
    expect('mach' in eas).toBe(false);
    if (eas.kind !== 'maximum-speed') throw new Error('kind');
    assertRelative(eas.speedMps, 250 * KNOT, 1e-12, 'kept as written, EAS');
    const mach = resolved({ kind: 'maximum-speed', speed: 'M0.6', airspeed: 'EAS', altitude: '10000 ft' });
    expect(mach).toMatchObject({ equivalent: false, mach: 0.6 });
  });
});

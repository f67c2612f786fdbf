import { describe, expect, it } from 'vitest';
import { formatIssue, parseConcept } from '../../../core/concept';
import { balancedFieldAt, balancedFieldLengthBoundary } from '../../../core/requirements/balanced-field-length';
import { takeoffDistanceBoundary } from '../../../core/requirements/takeoff-distance';
import { dragCoefficient, polarOf, type Polar } from '../../../core/aero/drag-polar';
import { aircraft, balancedField, takeoffDistance } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from '../constraints/curve';
import { conceptWith } from '../concept/fixture';

const twin = (engines = 2) =>
  aircraft({ kind: 'turbofan', engines, aspectRatio: 8.6, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.85 } } });

/**
 * Torenbeek's balanced field length in Raymer's customary units (Aircraft Design: A Conceptual
 * Approach, ch. 17, eq. 17.111, from memory): feet, lb/ft^2, slug/ft^3, g = 32.174 ft/s^2.
 */
function bflFeet(p: { wPsf: number; rhoSlug: number; cl2: number; hFt: number; tavW: number; u: number; dG: number; sigma: number }): number {
  return (0.863 / (1 + 2.3 * p.dG)) * (p.wPsf / (p.rhoSlug * 32.174 * p.cl2) + p.hFt) * (1 / (p.tavW - p.u) + 2.7) + 655 / Math.sqrt(p.sigma);
}

describe('balanced field length (Torenbeek, as given by Raymer)', () => {
  it('matches the formula as printed in customary units (within 0.01 %)', () => {
    // Sea level ISA: rho 0.0023769 slug/ft^3 (US Standard Atmosphere 1976); 1 lb/ft^2 = 47.880 Pa.
    const ac = twin();
    const polar = polarOf(ac, 'takeoff') as Polar;
    const w = 3400;
    const loading = 0.32;
    const t = balancedFieldAt(balancedField(1200), ac, w, loading);
    const cl2 = 1.85 / 1.44;
    const gamma2 = 0.5 * loading - dragCoefficient(polar, cl2) / cl2;
    assertRelative(t.climbGradient, gamma2, 1e-12);
    const feet = bflFeet({ wPsf: w / 47.880259, rhoSlug: 0.0023769, cl2, hFt: 35, tavW: 0.75 * (10 / 9) * loading, u: 0.01 * 1.85 + 0.02, dG: gamma2 - 0.024, sigma: 1 });
    assertRelative(t.lengthM, feet * 0.3048, 1e-4);
  });

  it('matches the formula as printed for a propeller twin, thrust from power at V2 and over the run (within 0.01 %)', () => {
    // Propeller aircraft (core/methods.md): T = eta_p P / V at V2 = 1.2 V_s,TO, and over the run
    // T_av = eta_p P / (0.7 V_LOF), V_LOF = 1.1 V_s,TO, eta_p 0.55. Sea level ISA as above; stall speed
    // V_s = sqrt(2 (W/S) / (rho C_Lmax)).
    const ac = aircraft({ kind: 'turboprop', engines: 2, aspectRatio: 9, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } });
    const polar = polarOf(ac, 'takeoff') as Polar;
    const w = 2200;
    const powerLoading = 30; // P/W, W/N = m/s: enough to climb on one engine (gamma_2 about 0.06)
    const t = balancedFieldAt(balancedField(1100), ac, w, powerLoading);
    const vsFps = Math.sqrt((2 * (w / 47.880259)) / (0.0023769 * 1.9));
    const powerFtPerS = powerLoading / 0.3048;
    const cl2 = 1.9 / 1.44;
    const gamma2 = (0.5 * 0.55 * powerFtPerS) / (1.2 * vsFps) - dragCoefficient(polar, cl2) / cl2;
    assertRelative(t.climbGradient, gamma2, 1e-4);
    expect(gamma2).toBeGreaterThan(0.03);
    const tavW = (0.55 * powerFtPerS) / (0.7 * 1.1 * vsFps);
    assertRelative(t.averageThrustToWeight, tavW, 1e-4);
    const feet = bflFeet({ wPsf: w / 47.880259, rhoSlug: 0.0023769, cl2, hFt: 35, tavW, u: 0.01 * 1.9 + 0.02, dG: gamma2 - 0.024, sigma: 1 });
    assertRelative(t.lengthM, feet * 0.3048, 1e-4);
  });

  it('is at or above the all-engines take-off distance over 35 ft for the same aircraft', () => {
    // An engine failure can only lengthen the field: the loading for a BFL of D is at least the all-engines one for D.
    for (const engines of [2, 3, 4]) {
      const ac = twin(engines);
      for (const w of [2500, 3500, 5000]) {
        for (const d of [1200, 1800, 2500]) {
          const bfl = curveOf(balancedFieldLengthBoundary(balancedField(d), ac)).required(w);
          const aeo = curveOf(takeoffDistanceBoundary(takeoffDistance(d, { obstacleHeightM: 35 * 0.3048, rollingFriction: 0.02 }), ac)).required(w);
          expect(bfl, `${engines} engines, w ${w}, ${d} m`).toBeGreaterThanOrEqual(aeo);
        }
      }
    }
  });

  it('gives the distance it was solved for at the required loading', () => {
    const ac = twin();
    const y = curveOf(balancedFieldLengthBoundary(balancedField(1500), ac)).required(3500);
    assertRelative(balancedFieldAt(balancedField(1500), ac, 3500, y).lengthM, 1500, 1e-6);
  });

  it('gives the distance it was solved for wherever the distance sets the loading (jets and propellers, 2 to 4 engines)', () => {
    // The curve's loading put back into the formula as printed (balancedFieldAt) gives the distance again,
    // and a loading 0.1 % lower gives a longer field: it is the least loading for that distance.
    const prop = (engines: number) =>
      aircraft({ kind: 'turboprop', engines, aspectRatio: 9, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } });
    let checked = 0;
    for (const ac of [twin(2), twin(3), twin(4), prop(2), prop(4)]) {
      for (const d of [900, 1200, 1600, 2200]) {
        for (const w of [1500, 2500, 3500, 5000]) {
          const r = balancedField(d);
          const y = curveOf(balancedFieldLengthBoundary(r, ac)).required(w);
          const at = balancedFieldAt(r, ac, w, y);
          if (Math.abs(at.climbGradient) < 1e-9) continue; // the climb sets this one (next test)
          assertRelative(at.lengthM, d, 1e-9);
          expect(balancedFieldAt(r, ac, w, y * 0.999).lengthM).toBeGreaterThan(d);
          checked++;
        }
      }
    }
    expect(checked).toBeGreaterThan(40);
  });

  it('on a long field, is the least loading that climbs after the failure: gamma_2 = 0 at V2', () => {
    // gamma_2 = (N - 1)/N T/W - C_D/C_L at V2 (the methods' definition); at sea level ISA alpha = beta = 1 for
    // the jet, so the curve is T/W = N/(N - 1) C_D/C_L at C_L2 = C_Lmax/1.2^2, and the field there is shorter.
    for (const engines of [2, 4]) {
      const ac = twin(engines);
      const polar = polarOf(ac, 'takeoff') as Polar;
      const cl2 = 1.85 / 1.44;
      const climbs = (engines / (engines - 1)) * (dragCoefficient(polar, cl2) / cl2);
      const r = balancedField(6000);
      const y = curveOf(balancedFieldLengthBoundary(r, ac)).required(3500);
      assertRelative(y, climbs, 1e-12);
      expect(balancedFieldAt(r, ac, 3500, y * (1 + 1e-9)).lengthM).toBeLessThan(6000);
    }
  });

  it('has no loading for a field at or below the 655 ft constant term, nor one needing T/W above 50', () => {
    // 655 ft = 199.64 m at sea level (Torenbeek's constant term): no thrust makes the field shorter.
    const ac = twin();
    const curve = (d: number) => curveOf(balancedFieldLengthBoundary(balancedField(d), ac));
    expect(curve(199).required(3500)).toBeNaN();
    expect(curve(199.6).required(3500)).toBeNaN();
    // Just above it the loading is finite but beyond any aircraft; the curve leaves it out (as the take-off distance does).
    expect(curve(200).required(3500)).toBeNaN();
    expect(curve(230).required(500)).toBeGreaterThan(1);
    expect(curve(230).required(500)).toBeLessThan(50);
  });

  it('demands more when higher, hotter, shorter or heavier', () => {
    const ac = twin();
    const at = (extra: Parameters<typeof balancedField>[1], d = 1500, w = 3500) => curveOf(balancedFieldLengthBoundary(balancedField(d, extra), ac)).required(w);
    const base = at({});
    expect(at({ altitudeM: 1500 })).toBeGreaterThan(base);
    expect(at({ temperatureOffsetK: 20 })).toBeGreaterThan(base);
    expect(at({}, 1300)).toBeGreaterThan(base);
    expect(at({}, 1500, 3900)).toBeGreaterThan(base);
  });

  it('refuses a single-engine concept, naming the field', () => {
    const parsed = parseConcept(conceptWith([{ id: 'bfl', kind: 'balanced-field-length', distance: '1200 m' }]));
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues).toHaveLength(1);
    expect(formatIssue(parsed.issues[0])).toMatch(/^requirements\[0\]: needs a multi-engine aircraft.*aircraft\.propulsion\.engines is 1/);
  });
});

/**
 * The requirement kinds at the edges of their formulas: a climb or an excess
 * thrust of exactly zero, Mach 0.4 exactly, loadings near the documented cap
 * of the root searches (a thrust-to-weight of 50), and sea-level loadings
 * turned into field loadings at altitude and part mass.
 *
 * Sea-level ISA density 1.225 kg/m^3, 1000 m ISA density 1.11164 kg/m^3
 * (ISO 2533 table); g0 = 9.80665 m/s^2; drag C_D = C_D0 + C_L^2 / (pi e A).
 */
import { describe, expect, it } from 'vitest';
import { formatIssue, parseConcept } from '../../../core/concept';
import { atmosphere } from '../../../core/atmosphere';
import { dragCoefficient, polarOf, type Polar } from '../../../core/aero/drag-polar';
import { requirementKind } from '../../../core/requirements';
import { balancedFieldAt, balancedFieldLengthBoundary } from '../../../core/requirements/balanced-field-length';
import { takeoffDistanceBoundary, takeoffDistanceSegments } from '../../../core/requirements/takeoff-distance';
import { aircraft, balancedField, cruise, takeoffDistance } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from '../constraints/curve';
import { conceptWith } from '../concept/fixture';

const RHO = 1.225;
const G = 9.80665;

const jet = (engines = 2) => aircraft({ kind: 'turbofan', engines, aspectRatio: 8, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } });
const piston = () => aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } });
const total = (s: { groundRoll: number; rotation: number; transition: number; climb: number }) => s.groundRoll + s.rotation + s.transition + s.climb;

describe('zero climb and zero excess thrust', () => {
  const polar = () => polarOf(jet(), 'takeoff') as Polar;

  it('gives a balanced field length only with a climb after the failure: none at a gradient of exactly zero', () => {
    // core/methods.md: where gamma_2 <= 0 no loading gives a field length. Half of T/W = 2 C_D/C_L at V2 leaves exactly 0.
    const cl2 = polar().clMax / (1.2 * 1.2);
    const tw = 2 * (dragCoefficient(polar(), cl2) / cl2);
    const t = balancedFieldAt(balancedField(2000), jet(), 4000, tw);
    expect(t.climbGradient).toBe(0);
    expect(t.lengthM).toBe(Infinity);
  });

  it('gives a balanced field length only with a mean thrust above the U term: none at exactly U', () => {
    // U = 0.01 C_Lmax + 0.02 (Torenbeek as given by Raymer); T/W 1 with a mean-thrust fraction of U leaves no excess.
    const u = 0.01 * 1.9 + 0.02;
    const t = balancedFieldAt(balancedField(2000, { averageThrustFraction: u }), jet(), 4000, 1);
    expect(t.climbGradient).toBeGreaterThan(0);
    expect(t.averageThrustToWeight - t.u).toBe(0);
    expect(t.lengthM).toBe(Infinity);
  });

  it('never clears the screen when the thrust just balances the drag at the transition speed', () => {
    // sin(gamma) = T/W - C_D/C_L at 1.15 V_s = 0: no climb, so the transition never ends.
    const clTr = polar().clMax / (1.15 * 1.15);
    const tw = dragCoefficient(polar(), clTr) / clTr;
    const s = takeoffDistanceSegments(takeoffDistance(1500), jet(), 4000, tw);
    expect(s.transition).toBe(Infinity);
    expect(s.climb).toBe(Infinity);
  });
});

describe('the cap of the root searches: a thrust-to-weight of 50', () => {
  it('solves a take-off that needs a mean-run T/W of 25 from a propeller', () => {
    // No screen, no rotation: only the ground roll. P/W giving T/W 25 at 0.7 V_LOF with eta_p 0.55.
    const w = 1500;
    const vs = Math.sqrt((2 * w) / (RHO * 1.9));
    const pw = (25 * 0.7 * 1.1 * vs) / 0.55;
    const shape = takeoffDistance(1, { obstacleHeightM: 0, rotationTimeS: 0 });
    const distance = total(takeoffDistanceSegments(shape, piston(), w, pw));
    const r = takeoffDistance(distance, { obstacleHeightM: 0, rotationTimeS: 0 });
    assertRelative(curveOf(takeoffDistanceBoundary(r, piston())).required(w), pw, 1e-6);
  });

  it('solves a balanced field length that needs a mean-run T/W of 25 from a propeller', () => {
    const w = 1500;
    const vs = Math.sqrt((2 * w) / (RHO * 1.9));
    const pw = (25 * 0.7 * 1.1 * vs) / 0.55;
    const distance = balancedFieldAt(balancedField(1), piston(), w, pw).lengthM;
    expect(Number.isFinite(distance)).toBe(true);
    assertRelative(curveOf(balancedFieldLengthBoundary(balancedField(distance), piston())).required(w), pw, 1e-6);
  });
});

describe('sea-level loading and field loading', () => {
  it('rolls a jet at 1000 m and 90 % mass with T/W = (T_SL/W_TO) sigma / beta', () => {
    // This jet's thrust lapses as sigma^1; sigma = 1.11164 / 1.225 at 1000 m (ISO 2533).
    const rho = 1.11164;
    const r = takeoffDistance(1500, { altitudeM: 1000, massFraction: 0.9 });
    const w = 4000;
    const s = takeoffDistanceSegments(r, jet(), w, 0.3);
    const tw = (0.3 * (rho / RHO)) / 0.9;
    const wl = 0.9 * w;
    const vLof = 1.1 * Math.sqrt((2 * wl) / (rho * 1.9));
    const cl = 0.5;
    const cd = 0.05 + (cl * cl) / (Math.PI * 0.76 * 8);
    const kt = tw - 0.04;
    const ka = (rho * (0.04 * cl - cd)) / (2 * wl);
    // Raymer ch. 17 (from memory): S_G = ln[(K_T + K_A V^2)/K_T] / (2 g0 K_A).
    assertRelative(s.groundRoll, Math.log((kt + ka * vLof * vLof) / kt) / (2 * G * ka), 1e-4, 'ground roll at the field');
    // The boundary's loading, turned back, takes off in the distance.
    const y = curveOf(takeoffDistanceBoundary(r, jet())).required(w);
    assertRelative(total(takeoffDistanceSegments(r, jet(), w, y)), 1500, 1e-6);
  });

  it('draws no take-off distance at a vanishing wing loading, jet or propeller', () => {
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(1500), jet())).required(0)).toBeNaN();
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(1500), piston())).required(0)).toBeNaN();
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(1500), jet())).required(-100)).toBeNaN();
  });
});

describe('texts at their edges', () => {
  it('reads a cruise at exactly Mach 0.4 as a Mach number', () => {
    // ISA at 3000 m (ISO 2533): T = 268.65 K, a = sqrt(1.4 * 287.05287 * T) = 328.58 m/s; 0.4 a = 131.4 m/s.
    const a = atmosphere(3000, 0).speedOfSoundMps;
    assertRelative(a, Math.sqrt(1.4 * 287.05287 * 268.65), 1e-9, 'speed of sound at 3000 m');
    const r = cruise(0.4 * a, { altitudeM: 3000 });
    expect(r.speedMps / a).toBe(0.4);
    // eslint-disable-next-line @typescript-eslint/no-explicit-any
    expect((requirementKind('cruise') as any).summary(r, 'si')).toEqual(['M0.40 (131.4 m/s TAS)']);
  });

  it('reads a gradient written as bare text as text to be a fraction below 1', () => {
    // Only a JSON number is taken for a per-cent slip ("2.4" as text is checked as a fraction).
    const parsed = parseConcept(conceptWith([{ id: 'r', kind: 'climb-gradient', gradient: '2.4' }]));
    expect(parsed.ok ? [] : parsed.issues.map(formatIssue)).toEqual(['requirements[0].gradient: must be less than 1 (got "2.4") (requirement "r")']);
  });
});

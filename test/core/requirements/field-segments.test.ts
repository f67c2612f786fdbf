/**
 * The segments of the field-performance kinds worked out by hand at one wing
 * loading and one loading, step by step as Raymer (Aircraft Design: A
 * Conceptual Approach, ch. 17, from memory) and Torenbeek (as Raymer gives
 * him) write them, and compared with what the engine reports.
 *
 * Sea-level ISA density 1.225 kg/m^3 (ISO 2533); g0 = 9.80665 m/s^2 (CGPM
 * 1901, exact). Drag C_D = C_D0 + C_L^2 / (pi e A) with no linear term
 * (Anderson, Introduction to Flight).
 */
import { describe, expect, it } from 'vitest';
import { requirementKind } from '../../../core/requirements';
import { takeoffDistanceBoundary, takeoffDistanceSegments } from '../../../core/requirements/takeoff-distance';
import { landingDistanceBoundary, landingDistanceSegments } from '../../../core/requirements/landing-distance';
import { approachSpeedBoundary } from '../../../core/requirements/approach-speed';
import { balancedFieldAt, balancedFieldLengthBoundary, minimumSecondSegmentGradient } from '../../../core/requirements/balanced-field-length';
import { aircraft, approachSpeed, balancedField, landingDistance, takeoffDistance } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from '../constraints/curve';

const RHO = 1.225;
const G = 9.80665;
const FOOT = 0.3048;

/** Take-off flaps: C_D0 0.05, e 0.76, C_Lmax 1.9, A 8. Landing flaps: C_D0 0.09, e 0.7, C_Lmax 2.25. */
const jet = (engines = 2) =>
  aircraft({
    kind: 'turbofan',
    engines,
    aspectRatio: 8,
    increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 }, landing: { cd0Increment: 0.06, oswaldEfficiency: 0.7, clMax: 2.25 } },
  });
const piston = () => aircraft({ kind: 'piston', engines: 2, aspectRatio: 8, increments: { takeoff: { cd0Increment: 0.02, oswaldEfficiency: 0.76, clMax: 1.9 } } });
const cdTakeoff = (cl: number) => 0.05 + (cl * cl) / (Math.PI * 0.76 * 8);
const cdLanding = (cl: number) => 0.09 + (cl * cl) / (Math.PI * 0.7 * 8);

/** Raymer's constant-thrust ground roll: ln[(K_T + K_A V^2)/K_T] / (2 g0 K_A). */
function groundRoll(tw: number, mu: number, w: number, cl: number, cd: number, v: number): number {
  const kt = tw - mu;
  const ka = (RHO * (mu * cl - cd)) / (2 * w);
  return Math.log((kt + ka * v * v) / kt) / (2 * G * ka);
}

describe('take-off distance segments, by hand (jet, sea level)', () => {
  const w = 4000;
  const vs = Math.sqrt((2 * w) / (RHO * 1.9));
  const vLof = 1.1 * vs;
  const vTr = 1.15 * vs;
  const radius = (vTr * vTr) / (G * 0.2);
  const clTr = 1.9 / (1.15 * 1.15);

  it('climbs to 50 ft after the transition when the climb is shallow', () => {
    const tw = 0.15;
    const s = takeoffDistanceSegments(takeoffDistance(1500), jet(), w, tw);
    assertRelative(s.groundRoll, groundRoll(tw, 0.04, w, 0.5, cdTakeoff(0.5), vLof), 1e-6, 'ground roll');
    assertRelative(s.rotation, 3 * vLof, 1e-6, 'rotation');
    const sin = tw - cdTakeoff(clTr) / clTr;
    const cos = Math.sqrt(1 - sin * sin);
    const hTr = radius * (1 - cos);
    expect(hTr).toBeLessThan(50 * FOOT);
    assertRelative(s.transition, radius * sin, 1e-6, 'transition arc');
    assertRelative(s.climb, (50 * FOOT - hTr) / (sin / cos), 1e-6, 'climb to the screen');
  });

  it('clears the screen within the transition arc when the climb is steep', () => {
    const tw = 0.3;
    const s = takeoffDistanceSegments(takeoffDistance(1500), jet(), w, tw);
    const sin = tw - cdTakeoff(clTr) / clTr;
    expect(radius * (1 - Math.sqrt(1 - sin * sin))).toBeGreaterThan(50 * FOOT);
    const h = 50 * FOOT;
    assertRelative(s.transition, Math.sqrt(radius * radius - (radius - h) * (radius - h)), 1e-6, 'arc to the screen');
    expect(s.climb).toBe(0);
  });

  it('never reaches the screen when the thrust cannot climb at the transition speed', () => {
    // C_D/C_L at 1.15 V_s is 0.108 here: T/W 0.1 leaves no excess.
    const s = takeoffDistanceSegments(takeoffDistance(1500), jet(), w, 0.1);
    expect(s.transition).toBe(Infinity);
    expect(s.climb).toBe(Infinity);
    assertRelative(s.groundRoll, groundRoll(0.1, 0.04, w, 0.5, cdTakeoff(0.5), vLof), 1e-6);
  });

  it('turns the sea-level loading into the field loading with beta / alpha', () => {
    // Half the mass at the same loading doubles T/W at the field: T/W = (T_SL/W_TO) alpha / beta with alpha = 1 at sea level.
    const half = takeoffDistanceSegments(takeoffDistance(1500, { massFraction: 0.5 }), jet(), w, 0.075);
    const vsHalf = Math.sqrt((2 * 0.5 * w) / (RHO * 1.9));
    assertRelative(half.groundRoll, groundRoll(0.15, 0.04, 0.5 * w, 0.5, cdTakeoff(0.5), 1.1 * vsHalf), 1e-6);
  });

  it('takes a propeller\'s thrust as eta P / V: at 0.7 V_LOF in the run, with the climb-out efficiency in the air', () => {
    const pw = 20; // P/W [W/N = m/s]
    const s = takeoffDistanceSegments(takeoffDistance(800), piston(), w, pw);
    const twRun = (0.55 * pw) / (0.7 * vLof);
    assertRelative(s.groundRoll, groundRoll(twRun, 0.04, w, 0.5, cdTakeoff(0.5), vLof), 1e-6, 'ground roll');
    const sin = (0.75 * pw) / vTr - cdTakeoff(clTr) / clTr;
    const cos = Math.sqrt(1 - sin * sin);
    const hTr = radius * (1 - cos);
    const h = 50 * FOOT;
    if (hTr >= h) assertRelative(s.transition, Math.sqrt(radius * radius - (radius - h) * (radius - h)), 1e-6);
    else assertRelative(s.climb, (h - hTr) / (sin / cos), 1e-6, 'climb');
  });

  it('solves a propeller aircraft\'s power, and flies the boundary at the lift-off speed', () => {
    const r = takeoffDistance(800);
    const boundary = curveOf(takeoffDistanceBoundary(r, piston()));
    const pw = boundary.required(w);
    expect(Number.isFinite(pw)).toBe(true);
    const s = takeoffDistanceSegments(r, piston(), w, pw);
    assertRelative(s.groundRoll + s.rotation + s.transition + s.climb, 800, 1e-6);
    assertRelative(boundary.speedAt(w), vLof, 1e-6, 'lift-off speed');
    expect(boundary.required(0)).toBeNaN();
    expect(boundary.speedAt(0)).toBeNaN();
    // No power available (power setting 0): no loading meets the distance.
    expect(curveOf(takeoffDistanceBoundary(takeoffDistance(800, { powerSetting: 0 }), piston())).required(w)).toBeNaN();
  });

  it('lists the four segments for the read-out', () => {
    const s = requirementKind('takeoff-distance').segments!(takeoffDistance(1500), jet(), w, 0.15);
    expect(Object.keys(s)).toEqual(['groundRoll', 'rotation', 'transition', 'climb']);
    assertRelative(s.rotation!, 3 * vLof, 1e-6);
  });
});

describe('landing distance segments, by hand (jet, sea level)', () => {
  const w = 3000;
  const vs = Math.sqrt((2 * w) / (RHO * 2.25));
  const vTd = 1.15 * vs;
  const vF = ((1.3 + 1.15) / 2) * vs;
  const radius = (vF * vF) / (G * 0.2);

  it('approaches at 3 degrees to the flare height, flares, rolls free for 2 s and brakes', () => {
    const s = landingDistanceSegments(landingDistance(1000), jet(), w);
    const gamma = (3 * Math.PI) / 180;
    const hF = radius * (1 - Math.cos(gamma));
    expect(hF).toBeLessThan(50 * FOOT);
    assertRelative(s.approach, (50 * FOOT - hF) / Math.tan(gamma), 1e-6, 'approach');
    assertRelative(s.flare, radius * Math.sin(gamma), 1e-6, 'flare');
    assertRelative(s.freeRoll, 2 * vTd, 1e-6, 'free roll');
    // Braking with C_L 0.5: S_B = ln[K_T / (K_T + K_A V^2)] / (2 g0 K_A), K_T = -mu, K_A = rho (mu C_L - C_D) / (2 w).
    const ka = (RHO * (0.3 * 0.5 - cdLanding(0.5))) / (2 * w);
    assertRelative(s.braking, Math.log(-0.3 / (-0.3 + ka * vTd * vTd)) / (2 * G * ka), 1e-6, 'braking');
  });

  it('flares from the screen itself when the flare height is above it, and brakes without lift when it is dumped', () => {
    const gamma = 0.2; // rad, the steepest approach the file takes
    const h = 1;
    const s = landingDistanceSegments(landingDistance(1000, { approachAngleRad: gamma, obstacleHeightM: h, liftDumping: true }), jet(), w);
    expect(radius * (1 - Math.cos(gamma))).toBeGreaterThan(h);
    expect(s.approach).toBe(0);
    assertRelative(s.flare, Math.sqrt(radius * radius - (radius - h) * (radius - h)), 1e-6, 'flare from the screen');
    const ka = (RHO * (0 - cdLanding(0))) / (2 * w);
    assertRelative(s.braking, Math.log(-0.3 / (-0.3 + ka * vTd * vTd)) / (2 * G * ka), 1e-6, 'braking without lift');
  });

  it('flies the limit at the approach speed, and lists its segments for the read-out', () => {
    const r = landingDistance(1000);
    const boundary = landingDistanceBoundary(r, jet());
    if (boundary.type !== 'limit') throw new Error('a limit');
    assertRelative(boundary.speedAt!(w), 1.3 * vs, 1e-6, 'approach speed');
    expect(boundary.speedAt!(0)).toBeNaN();
    const s = requirementKind('landing-distance').segments!(r, jet(), w, 0);
    expect(Object.keys(s)).toEqual(['approach', 'flare', 'freeRoll', 'braking']);
    assertRelative(s.freeRoll!, 2 * vTd, 1e-6);
  });
});

describe('approach speed limit, by hand', () => {
  it('flies k_app times the landing stall speed at landing mass', () => {
    // V = k sqrt(2 beta w / (rho0 C_Lmax)) with beta 0.85, k 1.23 (14 CFR 25.125(b), from memory).
    const boundary = approachSpeedBoundary(approachSpeed(65, { speedFactor: 1.23, massFraction: 0.85 }), jet());
    assertRelative(boundary.speedAt!(3000), 1.23 * Math.sqrt((2 * 0.85 * 3000) / (RHO * 2.25)), 1e-6);
    expect(boundary.speedAt!(0)).toBeNaN();
    expect(boundary.speedAt!(-1)).toBeNaN();
  });
});

describe('balanced field length terms, by hand (Torenbeek as given by Raymer)', () => {
  it('asks 2.4, 2.7 and 3.0 % of the second segment of two, three and four or more engines (14 CFR 25.121(b))', () => {
    expect([2, 3, 4, 5].map(minimumSecondSegmentGradient)).toEqual([0.024, 0.027, 0.03, 0.03]);
  });

  it('works at the field density and mass with a three-engine jet', () => {
    // 1000 m ISA: rho 1.1117 kg/m^3, sigma 0.9075 (ISO 2533 table). beta 0.9; sea-level T/W 0.3.
    const r = balancedField(2000, { altitudeM: 1000, massFraction: 0.9 });
    const ac = jet(3);
    const w = 5000;
    const boundary = curveOf(balancedFieldLengthBoundary(r, ac));
    const t = balancedFieldAt(r, ac, w, 0.3);
    const rho = 1.11164;
    // Field T/W of the actual weight: (T_SL/W_TO) alpha / beta, alpha the jet's lapse there (sigma^1 for this aircraft).
    const alpha = rho / RHO;
    const x = (0.3 * alpha) / 0.9;
    const cl2 = 1.9 / 1.44;
    const gamma2 = (2 / 3) * x - cdTakeoff(cl2) / cl2;
    assertRelative(t.climbGradient, gamma2, 1e-4, 'climb gradient at V2, one of three engines out');
    assertRelative(t.averageThrustToWeight, 0.75 * (10 / 9) * x, 1e-4, 'mean thrust of the run');
    assertRelative(t.u, 0.01 * 1.9 + 0.02, 1e-12, 'U');
    const length =
      (0.863 / (1 + 2.3 * (gamma2 - 0.027))) * ((0.9 * w) / (rho * G * cl2) + 35 * FOOT) * (1 / (0.75 * (10 / 9) * x - 0.039) + 2.7) + (655 * FOOT) / Math.sqrt(rho / RHO);
    assertRelative(t.lengthM, length, 1e-4, 'balanced field length');
    // V2 = 1.2 V_s at the field's density and the actual weight.
    assertRelative(boundary.speedAt(w), 1.2 * Math.sqrt((2 * 0.9 * w) / (rho * 1.9)), 1e-4, 'V2');
    expect(boundary.speedAt(0)).toBeNaN();
  });

  it('has no length where the aircraft cannot climb after the failure or cannot accelerate', () => {
    const ac = jet();
    // C_D/C_L at 1.2 V_s is 0.103: half of T/W 0.2 does not climb.
    const noClimb = balancedFieldAt(balancedField(2000), ac, 4000, 0.2);
    expect(noClimb.climbGradient).toBeLessThan(0);
    expect(noClimb.lengthM).toBe(Infinity);
    // A mean thrust below the U term cannot accelerate: T_av/W = 0.833 T/W < U = 0.039 needs a T/W under 0.047, which cannot climb either;
    // a mean-thrust fraction of 0.1 keeps the climb and loses the run.
    const noRun = balancedFieldAt(balancedField(2000, { averageThrustFraction: 0.1 }), ac, 4000, 0.35);
    expect(noRun.climbGradient).toBeGreaterThan(0);
    expect(noRun.averageThrustToWeight - noRun.u).toBeLessThan(0);
    expect(noRun.lengthM).toBe(Infinity);
  });

  it('takes a propeller\'s mean thrust at 0.7 V_LOF and its climb thrust at V2, and solves its power', () => {
    // 600 m: a length the formula reaches with a positive one-engine-out climb (at 1200 m the least power that climbs at all already does better).
    const r = balancedField(600);
    const ac = piston();
    const w = 1500;
    const pw = 15;
    const vs = Math.sqrt((2 * w) / (RHO * 1.9));
    const t = balancedFieldAt(r, ac, w, pw);
    const cl2 = 1.9 / 1.44;
    assertRelative(t.climbGradient, 0.5 * ((0.55 * pw) / (1.2 * vs)) - cdTakeoff(cl2) / cl2, 1e-6, 'climb gradient at V2');
    assertRelative(t.averageThrustToWeight, (0.55 * pw) / (0.7 * 1.1 * vs), 1e-6, 'mean thrust of the run');
    const boundary = curveOf(balancedFieldLengthBoundary(r, ac));
    const needed = boundary.required(w);
    expect(Number.isFinite(needed)).toBe(true);
    assertRelative(balancedFieldAt(r, ac, w, needed).lengthM, 600, 1e-6);
  });

  it('on a long field, asks the least loading that climbs after the failure, whose field length is shorter', () => {
    // core/methods.md: the climb, not the distance, sets the curve there. Piston twin at 1500 Pa, 1200 m:
    // the length is finite only from gamma_2 > 0, and there it is already under 1200 m.
    const r = balancedField(1200);
    const ac = piston();
    const w = 1500;
    const needed = curveOf(balancedFieldLengthBoundary(r, ac)).required(w);
    const vs = Math.sqrt((2 * w) / (RHO * 1.9));
    const cl2 = 1.9 / 1.44;
    // gamma_2 = 0: half the thrust at V2 equals the drag over lift there.
    const zeroClimb = (2 * (cdTakeoff(cl2) / cl2) * 1.2 * vs) / 0.55;
    assertRelative(needed, zeroClimb, 1e-6, 'power for a level flight path one engine out');
    expect(balancedFieldAt(r, ac, w, needed * 1.001).lengthM).toBeLessThan(1200);
    expect(balancedFieldAt(r, ac, w, needed * 0.999).lengthM).toBe(Infinity);
  });

  it('draws nothing for a single engine, a vanishing wing loading or no thrust', () => {
    expect(curveOf(balancedFieldLengthBoundary(balancedField(1500), jet(1))).required(4000)).toBeNaN();
    expect(curveOf(balancedFieldLengthBoundary(balancedField(1500), jet())).required(0)).toBeNaN();
    expect(curveOf(balancedFieldLengthBoundary(balancedField(1500, { powerSetting: 0 }), jet())).required(4000)).toBeNaN();
  });
});

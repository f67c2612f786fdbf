/**
 * The small parts of the diagram, each against a hand derivation written
 * beside it: the envelope and the wing-loading cap, margins (core/methods.md
 * section 7), sizing (S = W/w, P = y W), the hover read-out, the flight Mach
 * number and the reported approach speed.
 */
import { describe, expect, it } from 'vitest';
import { RHO0 } from '../../../core/atmosphere';
import { definedEnvelopeAt, envelopeAt, wingLoadingCap, type LimitBoundary } from '../../../core/diagram/envelope';
import { allMet, FEASIBLE_TOLERANCE, marginOf } from '../../../core/diagram/margins';
import { sizingAt } from '../../../core/diagram/sizing';
import { readAt } from '../../../core/diagram/read-out';
import { boundariesOf } from '../../../core/diagram/boundaries';
import { flightMachAt } from '../../../core/diagram/flight-mach';
import { characteristicApproach, reportedSpeeds } from '../../../core/diagram/speeds';
import type { Boundary } from '../../../core/model';
import { G0 } from '../../../core/units/factors';
import { aircraft, approachSpeed, cruise, design, stall } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

const constant = (y: number) => () => y;

function limit(id: string, wingLoadingMaxPa: number): LimitBoundary {
  return { type: 'limit', id, kind: 'stall', wingLoadingMaxPa };
}

function curve(id: string, required: (w: number) => number, extra: { stallLimitPa?: number; speed?: number } = {}): Boundary {
  return {
    type: 'curve',
    id,
    kind: 'cruise',
    required,
    speedAt: () => extra.speed ?? NaN,
    ...(extra.stallLimitPa === undefined ? {} : { stallLimitPa: extra.stallLimitPa }),
  };
}

describe('envelopeAt and definedEnvelopeAt', () => {
  it('is the largest required loading, 0 with no curves', () => {
    expect(envelopeAt([constant(1), constant(3), constant(2)], 500)).toBe(3);
    expect(envelopeAt([], 500)).toBe(0);
  });

  it('keeps the largest of negative loadings rather than 0 (the first curve starts the maximum)', () => {
    // max(-5, -2) = -2: the envelope is a maximum of the curves, not of the curves and 0.
    expect(envelopeAt([constant(-5), constant(-2)], 500)).toBe(-2);
    expect(envelopeAt([constant(-2), constant(-5)], 500)).toBe(-2);
  });

  it('is NaN where any curve cannot be met (NaN or infinite)', () => {
    expect(envelopeAt([constant(1), constant(NaN), constant(2)], 500)).toBeNaN();
    expect(envelopeAt([constant(1), constant(Infinity)], 500)).toBeNaN();
  });

  it('passes the wing loading to each curve', () => {
    expect(envelopeAt([(w) => w / 100, (w) => 2000 / w], 400)).toBe(5);
    expect(envelopeAt([(w) => w / 100, (w) => 2000 / w], 1000)).toBe(10);
  });

  it('definedEnvelopeAt skips the curves that cannot be met and is NaN when none can', () => {
    expect(definedEnvelopeAt([constant(NaN), constant(2), constant(Infinity), constant(5), constant(4)], 500)).toBe(5);
    expect(definedEnvelopeAt([constant(-3), constant(-1)], 500)).toBe(-1);
    expect(definedEnvelopeAt([constant(NaN), constant(Infinity)], 500)).toBeNaN();
    expect(definedEnvelopeAt([], 500)).toBeNaN();
    expect(definedEnvelopeAt([(w) => w / 100], 700)).toBe(7);
  });

  it('wingLoadingCap is the smallest limit, Infinity with none', () => {
    expect(wingLoadingCap([limit('a', 900), limit('b', 700), limit('c', 800)])).toBe(700);
    expect(wingLoadingCap([])).toBe(Infinity);
  });
});

describe('marginOf and allMet (core/methods.md section 7)', () => {
  it('limit: 1 - w/w_lim; -1 for a non-positive limit', () => {
    // 1 - 800/1000 = 0.2; 1 - 1200/1000 = -0.2 (hand derivation)
    assertRelative(marginOf(limit('s', 1000), 800, 5), 0.2, 1e-12);
    assertRelative(marginOf(limit('s', 1000), 1200, 5), -0.2, 1e-12);
    expect(marginOf(limit('s', 0), 800, 5)).toBe(-1);
    expect(marginOf(limit('s', -100), 800, 5)).toBe(-1);
  });

  it('curve: y/y_req - 1', () => {
    // 0.15/0.1 - 1 = 0.5; 0.05/0.1 - 1 = -0.5 (hand derivation)
    assertRelative(marginOf(curve('c', constant(0.1)), 800, 0.15), 0.5, 1e-12);
    assertRelative(marginOf(curve('c', constant(0.1)), 800, 0.05), -0.5, 1e-12);
    // The curve is read at the wing loading given: y_req = w/10000 = 0.08 at 800 Pa, 0.12/0.08 - 1 = 0.5.
    assertRelative(marginOf(curve('c', (w) => w / 10000), 800, 0.12), 0.5, 1e-12);
  });

  it('curve: -1 where it cannot be met, needs no loading at all, or the ratio is not finite', () => {
    expect(marginOf(curve('c', constant(NaN)), 800, 0.1)).toBe(-1);
    expect(marginOf(curve('c', constant(Infinity)), 800, 0.1)).toBe(-1);
    expect(marginOf(curve('c', constant(0)), 800, 0.1)).toBe(-1);
    expect(marginOf(curve('c', constant(-0.1)), 800, 0.1)).toBe(-1);
    expect(marginOf(curve('c', constant(1e-310)), 800, 1e10)).toBe(-1);
  });

  it('past a curve stall line the margin is the limit margin 1 - w/w_stall', () => {
    // stall line 1000 Pa: at 1250 Pa the margin is 1 - 1.25 = -0.25, whatever the loading (hand derivation).
    const c = curve('turn', constant(0.1), { stallLimitPa: 1000 });
    assertRelative(marginOf(c, 1250, 100), -0.25, 1e-12);
    // At the stall line itself and left of it, the curve decides: 0.2/0.1 - 1 = 1.
    assertRelative(marginOf(c, 1000, 0.2), 1, 1e-12);
    assertRelative(marginOf(c, 800, 0.2), 1, 1e-12);
  });

  it('ignores a stall line that is not positive', () => {
    const c = curve('turn', constant(0.1), { stallLimitPa: 0 });
    assertRelative(marginOf(c, 800, 0.2), 1, 1e-12);
  });

  it('allMet accepts margins down to -FEASIBLE_TOLERANCE and no lower', () => {
    expect(FEASIBLE_TOLERANCE).toBe(1e-9); // core/methods.md section 7
    expect(allMet([{ id: 'a', margin: 0.3 }, { id: 'b', margin: -1e-9 }])).toBe(true);
    expect(allMet([{ id: 'a', margin: 0.3 }, { id: 'b', margin: -2e-9 }])).toBe(false);
    expect(allMet([])).toBe(true);
  });
});

describe('sizingAt', () => {
  it('S = W_TO/w, P = y W_TO, per engine P/n, W_TO = m g0 (g0 = 9.80665 m/s^2, CGPM 1901)', () => {
    const a = aircraft({ takeoffMassKg: 1000, engines: 2 });
    const s = sizingAt(a, 'powerToWeight', 500, 20);
    // W = 1000 x 9.80665 = 9806.65 N; S = 9806.65/500 = 19.6133 m^2; P = 20 x 9806.65 = 196133 W; 98066.5 W each.
    assertRelative(s.takeoffWeight!, 9806.65, 1e-12);
    assertRelative(s.wingArea, 19.6133, 1e-12);
    assertRelative(s.power!, 196133, 1e-12);
    assertRelative(s.perEngine!, 98066.5, 1e-12);
    expect(s).not.toHaveProperty('thrust');
    expect(G0).toBe(9.80665);
  });

  it('names the installed value thrust on the thrust axis', () => {
    const s = sizingAt(aircraft({ takeoffMassKg: 1000, engines: 4, kind: 'turbofan' }), 'thrustToWeight', 4000, 0.3);
    // T = 0.3 x 9806.65 = 2941.995 N; 735.49875 N each of four.
    assertRelative(s.thrust!, 2941.995, 1e-12);
    assertRelative(s.perEngine!, 735.49875, 1e-12);
    expect(s).not.toHaveProperty('power');
  });
});

describe('readAt', () => {
  it('binds the tightest of the exceeded limits, not the first', () => {
    // Stall limits from w = 1/2 rho V^2 C_Lmax (landing C_Lmax 2.1, rho0 1.225 kg/m^3):
    // 25 m/s -> 803.9 Pa, 20 m/s -> 514.5 Pa. At 900 Pa both are exceeded; the tighter is 20 m/s.
    const d = design({ requirements: [stall(25, { id: 'loose' }), stall(20, { id: 'tight' }), stall(40, { id: 'far' })], rangePa: [100, 2000] });
    const read = readAt(d, 900);
    expect(read.binding).toBe('tight');
    expect(read.entries.map((e) => (e.type === 'limit' ? e.exceeded : null))).toEqual([true, true, false]);
    assertRelative((read.entries[0] as { wingLoadingMax: number }).wingLoadingMax, 0.5 * RHO0 * 625 * 2.1, 1e-12);
    // Reordered, the same limit binds.
    expect(readAt(design({ requirements: [stall(20, { id: 'tight' }), stall(25, { id: 'loose' })], rangePa: [100, 2000] }), 900).binding).toBe('tight');
  });

  it('a limit exactly at the wing loading is not exceeded', () => {
    const w = 0.5 * RHO0 * 625 * 2.1;
    const read = readAt(design({ requirements: [stall(25)], rangePa: [100, 2000] }), w);
    expect(read.entries[0]).toMatchObject({ exceeded: false });
    expect(read.binding).toBeNull();
  });

  it('copies the label and gives envelope 0 with limits only, null with nothing enabled', () => {
    const d = design({ requirements: [stall(25, { label: 'Stall at 25 m/s' })], rangePa: [100, 2000] });
    const read = readAt(d, 300);
    expect(read.entries[0]).toMatchObject({ type: 'limit', id: 'stall', kind: 'stall', label: 'Stall at 25 m/s' });
    expect(read.envelope).toBe(0);
    const none = readAt(design({ requirements: [stall(25, { enabled: false })], rangePa: [100, 2000] }), 300);
    expect(none.envelope).toBeNull();
    expect(none.binding).toBeNull();
    expect(none.entries).toEqual([]);
    expect(readAt(design({ requirements: [stall(25)], rangePa: [100, 2000] }), 300).entries[0]).not.toHaveProperty('label');
  });

  it('binds the first curve that cannot be met over a curve that can, and over later unmet curves', () => {
    // 30 m/s cruise stalls above 1/2 x 1.225 x 900 x 1.5 = 826.9 Pa; 80 m/s is met there.
    const d = design({ requirements: [cruise(80, { id: 'fast' }), cruise(30, { id: 'slow' }), cruise(31, { id: 'slow2' })], rangePa: [100, 3000] });
    const read = readAt(d, 1000);
    expect(read.binding).toBe('slow');
    expect(read.envelope).toBeNull();
    expect(read.entries[0]).toMatchObject({ id: 'fast', speed: 80 });
    expect((read.entries[0] as { required: number | null }).required).toBeGreaterThan(0);
  });

  it('binds the curve needing most, the later one on a tie-free pair in either order', () => {
    // At sea level and 500 Pa, cruise at 80 m/s needs more power than at 40 m/s (parasite drag ~ V^3).
    const a = readAt(design({ requirements: [cruise(40, { id: 'slow' }), cruise(80, { id: 'fast' })], rangePa: [100, 3000] }), 500);
    const b = readAt(design({ requirements: [cruise(80, { id: 'fast' }), cruise(40, { id: 'slow' })], rangePa: [100, 3000] }), 500);
    expect(a.binding).toBe('fast');
    expect(b.binding).toBe('fast');
    const fast = a.entries.find((e) => e.id === 'fast') as { required: number };
    expect(a.envelope).toBe(fast.required);
  });
});

describe('flightMachAt', () => {
  it('is V / a with a = 340.294 m/s at sea level ISA (U.S. Standard Atmosphere 1976, Table I)', () => {
    const entry = { requirement: cruise(170), boundary: curve('c', constant(1), { speed: 170 }) };
    assertRelative(flightMachAt(entry, 500)!, 170 / 340.294, 2e-6);
  });

  it('uses the altitude and offset: a = 295.07 m/s at 11 km ISA (U.S. Standard Atmosphere 1976, Table I)', () => {
    const entry = { requirement: cruise(200, { altitudeM: 11000 }), boundary: curve('c', constant(1), { speed: 200 }) };
    assertRelative(flightMachAt(entry, 500)!, 200 / 295.07, 1e-4);
    // ISA+15 K at sea level: a = sqrt(1.4 x 287.05287 x 303.15) = 349.04 m/s (hand derivation).
    const hot = { requirement: cruise(200, { temperatureOffsetK: 15 }), boundary: curve('c', constant(1), { speed: 200 }) };
    assertRelative(flightMachAt(hot, 500)!, 200 / Math.sqrt(1.4 * 287.05287 * 303.15), 1e-6);
  });

  it('is undefined without a positive finite speed', () => {
    const at = (speed: number) => flightMachAt({ requirement: cruise(1), boundary: curve('c', constant(1), { speed }) }, 500);
    expect(at(NaN)).toBeUndefined();
    expect(at(0)).toBeUndefined();
    expect(at(-5)).toBeUndefined();
    expect(at(Infinity)).toBeUndefined();
    expect(flightMachAt({ requirement: stall(20), boundary: limit('s', 500) }, 500)).toBeUndefined();
  });

  it('reads the speed at the wing loading asked', () => {
    const b: Boundary = { type: 'curve', id: 'c', kind: 'cruise', required: constant(1), speedAt: (w) => w / 10 };
    assertRelative(flightMachAt({ requirement: cruise(1), boundary: b }, 1701.47)!, 170.147 / 340.294, 2e-6);
  });
});

describe('reported approach speed', () => {
  it('without an approach requirement: 1.3 x the landing stall speed at take-off mass (14 CFR 23.73)', () => {
    const a = aircraft(); // landing C_Lmax 2.1; rho0 = 1.225 kg/m^3 to 1e-8 (U.S. Standard Atmosphere 1976)
    // V_s0 = sqrt(2 x 800/(1.225 x 2.1)) = 24.94 m/s; 1.3 V_s0 = 32.42 m/s (hand derivation).
    const got = characteristicApproach(a, 800);
    assertRelative(got.speed, 1.3 * Math.sqrt((2 * 800) / (1.225 * 2.1)), 1e-7);
    expect(got.basis).toBe('1.3 × landing stall speed at take-off mass (small-aircraft rule, 14 CFR 23.73)');
  });

  it('falls back to the clean C_Lmax when there is no landing configuration', () => {
    const a = aircraft({ increments: {} }); // clean C_Lmax 1.5
    assertRelative(characteristicApproach(a, 800).speed, 1.3 * Math.sqrt((2 * 800) / (1.225 * 1.5)), 1e-7);
  });

  it("takes the first enabled approach requirement's factor, configuration and mass fraction", () => {
    const a = aircraft();
    const r = [
      approachSpeed(40, { id: 'off', enabled: false, speedFactor: 1.5 }),
      approachSpeed(40, { id: 'vref', speedFactor: 1.23, massFraction: 0.85, configuration: 'takeoff' }),
      approachSpeed(40, { id: 'later', speedFactor: 1.4 }),
    ];
    // 1.23 x sqrt(2 x 0.85 x 800/(1.225 x 1.8)) with the take-off C_Lmax 1.8 (hand derivation).
    const got = characteristicApproach(a, 800, r);
    assertRelative(got.speed, 1.23 * Math.sqrt((2 * 0.85 * 800) / (1.225 * 1.8)), 1e-7);
    expect(got.basis).toBe('1.23 × takeoff stall speed at 85 % of take-off mass (requirement "vref")');
  });

  it('an approach requirement naming a missing configuration uses the clean C_Lmax', () => {
    const got = characteristicApproach(aircraft(), 800, [approachSpeed(40, { configuration: 'flaps-40', speedFactor: 1.3 })]);
    assertRelative(got.speed, 1.3 * Math.sqrt((2 * 800) / (1.225 * 1.5)), 1e-7);
  });

  it('reportedSpeeds gives the clean speeds, the approach and a stall speed per configuration', () => {
    const s = reportedSpeeds(aircraft(), 800);
    // V_s = sqrt(2 w/(rho C_Lmax)): clean 1.5, take-off 1.8, landing 2.1 (hand derivation).
    assertRelative(s.stall, Math.sqrt(1600 / (1.225 * 1.5)), 1e-7);
    assertRelative(s.stallByConfiguration!.takeoff, Math.sqrt(1600 / (1.225 * 1.8)), 1e-7);
    assertRelative(s.stallByConfiguration!.landing, Math.sqrt(1600 / (1.225 * 2.1)), 1e-7);
    assertRelative(s.approach!, 1.3 * Math.sqrt(1600 / (1.225 * 2.1)), 1e-7);
    expect(s.approachBasis).toMatch(/small-aircraft rule/);
    expect(Object.getPrototypeOf(s.stallByConfiguration)).toBeNull();
    const own = reportedSpeeds(aircraft(), 800, [approachSpeed(40, { speedFactor: 1.2, massFraction: 1, configuration: 'landing' })]);
    assertRelative(own.approach!, 1.2 * Math.sqrt(1600 / (1.225 * 2.1)), 1e-7);
  });

describe('ties in the read-out and the approach requirement among others', () => {
  it('of two equal limits both exceeded, the first binds; of two equal curves, the first', () => {
    const limits = design({ requirements: [stall(20, { id: 'first' }), stall(20, { id: 'second' })], rangePa: [100, 2000] });
    expect(readAt(limits, 900).binding).toBe('first');
    const curves = design({ requirements: [cruise(60, { id: 'first' }), cruise(60, { id: 'second' })], rangePa: [100, 2000] });
    expect(readAt(curves, 500).binding).toBe('first');
  });

  it('finds the approach requirement behind requirements of other kinds', () => {
    // 1.23 x sqrt(2 x 800/(1.225 x 2.1)) with the landing C_Lmax 2.1 (hand derivation).
    const got = characteristicApproach(aircraft(), 800, [cruise(60), approachSpeed(40, { speedFactor: 1.23 })]);
    assertRelative(got.speed, 1.23 * Math.sqrt((2 * 800) / (1.225 * 2.1)), 1e-7);
  });

  it('boundariesOf gives the enabled boundaries in order', () => {
    const d = design({ requirements: [stall(20, { id: 'a' }), cruise(60, { id: 'off', enabled: false }), cruise(60, { id: 'b' })], rangePa: [100, 2000] });
    expect(boundariesOf(d).map((b) => [b.id, b.type])).toEqual([
      ['a', 'limit'],
      ['b', 'curve'],
    ]);
  });
});
});

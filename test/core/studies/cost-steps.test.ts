/**
 * What each requirement costs: the stepped values, the cases with and without
 * a nominal optimum, the notes and the refused steps, word for word.
 */
import { describe, expect, it } from 'vitest';
import { requirementCosts } from '../../../core/studies';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { aircraft, climbGradient, cruise, design, stall, sustainedTurn } from '../helpers/design';

const RHO0 = 1.225; // kg/m^3, U.S. Standard Atmosphere 1976, Table 1
const G0 = 9.80665; // m/s^2, standard gravity (NIST SP 330)
const KT = 1852 / 3600; // m/s, NIST SP 811
const WEIGHT = 750 * G0; // N, the builder's 750 kg

/** Piston single, stall 45 kt in landing flaps (builder's CLmax 2.1), cruise 110 kt at eta 0.8. */
const stallBound = (rangePa: [number, number] = [200, 1500]) =>
  design({
    aircraft: aircraft({ kind: 'piston', aspectRatio: 7.5, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } }),
    requirements: [stall(45 * KNOT_MPS, { id: 'stall', label: 'Stall in landing flaps' }), cruise(110 * KNOT_MPS, { id: 'cruise', propellerEfficiency: 0.8 })],
    rangePa,
  });

// Stall limit w_s = 1/2 rho0 V_s^2 CLmax (Anderson, Introduction to Flight, stalling speed); propeller cruise at sea
// level P/W = (V/eta)(q CD0/w + K w/q), K = 1/(pi e AR) (Mattingly master equation), falling at w_s.
const wStall = (vs: number) => 0.5 * RHO0 * vs * vs * 2.1;
const V = 110 * KT;
const Q = 0.5 * RHO0 * V * V;
const pw = (w: number) => (V / 0.8) * ((Q * 0.03) / w + w / (Math.PI * 0.8 * 7.5 * Q));

describe('requirementCosts: the stepped cases', () => {
  it('steps only the requirement it prices: a faster stall speed moves the optimum along the unchanged cruise curve', () => {
    const { costs, nominal, axis, step } = requirementCosts(stallBound());
    expect([axis, step]).toEqual(['powerToWeight', 0.1]); // 0.1 when no step is given
    const vs = 45 * KT;
    assertRelative(nominal?.wingAreaM2 ?? NaN, WEIGHT / wStall(vs), 1e-6, 'nominal S = W / w_s');
    assertRelative(nominal?.installed ?? NaN, pw(wStall(vs)) * WEIGHT, 1e-6, 'nominal P = (P/W) W');
    const cost = costs.find((c) => c.id === 'stall');
    const relaxed = cost?.relaxed;
    assertRelative(relaxed?.optimum?.loading ?? NaN, pw(wStall(1.1 * vs)), 1e-6, 'P/W at the relaxed stall limit, cruise at 110 kt');
    assertRelative(relaxed?.wingAreaM2 ?? NaN, WEIGHT / wStall(1.1 * vs), 1e-6, 'relaxed S');
    assertRelative(relaxed?.installed ?? NaN, pw(wStall(1.1 * vs)) * WEIGHT, 1e-6, 'relaxed P');
    assertRelative(relaxed?.loadingChange ?? NaN, pw(wStall(1.1 * vs)) - pw(wStall(vs)), 1e-5, 'relaxed change of P/W');
    assertRelative(relaxed?.loadingChangeRelative ?? NaN, pw(wStall(1.1 * vs)) / pw(wStall(vs)) - 1, 1e-5, 'relaxed relative change');
    assertRelative(relaxed?.wingAreaChangeM2 ?? NaN, WEIGHT / wStall(1.1 * vs) - WEIGHT / wStall(vs), 1e-6, 'relaxed change of S');
    assertRelative(relaxed?.installedChange ?? NaN, (pw(wStall(1.1 * vs)) - pw(wStall(vs))) * WEIGHT, 1e-5, 'relaxed change of P');
    assertRelative(cost?.tightened.value ?? NaN, 0.9 * vs, 1e-12, 'tightened stall speed');
    expect(cost?.nominalValue).toBe(45 * KNOT_MPS);
    expect([cost?.label, cost?.conceptField, cost?.kind]).toEqual(['Stall in landing flaps', 'speed', 'stall']);
    expect('label' in (costs.find((c) => c.id === 'cruise') ?? {})).toBe(false);
  });

  it('gives the changes as undefined (NaN) when the nominal point is off the plot, and sizes an end that is on it', () => {
    // Plotted from 800 Pa: w_s(45 kt) = 689 Pa is off it; 10 % faster gives 1.21 x 689 = 834 Pa, on it; 10 % slower is off.
    const vs = 45 * KT;
    expect(wStall(vs) < 800 && wStall(1.1 * vs) > 800).toBe(true);
    const { costs, nominal } = requirementCosts(stallBound([800, 1500]));
    expect(nominal).toBeNull();
    const cost = costs.find((c) => c.id === 'stall');
    const relaxed = cost?.relaxed;
    assertRelative(relaxed?.wingAreaM2 ?? NaN, WEIGHT / wStall(1.1 * vs), 1e-6, 'relaxed S');
    const changes = [relaxed?.loadingChange, relaxed?.loadingChangeRelative, relaxed?.wingAreaChangeM2, relaxed?.wingAreaChangeRelative, relaxed?.installedChange];
    expect(changes.every(Number.isNaN)).toBe(true);
    const tightened = cost?.tightened;
    expect(tightened?.optimum).toBeNull();
    expect([tightened?.wingAreaM2, tightened?.installed, tightened?.wingAreaChangeM2].every(Number.isNaN)).toBe(true);
  });

  it('leaves the relative loading change undefined where the nominal loading is 0 (no power requirement)', () => {
    const d = design({ requirements: [stall(45 * KNOT_MPS, { id: 'stall' })], rangePa: [200, 1500] });
    const [cost] = requirementCosts(d).costs;
    expect(cost.relaxed.loadingChange).toBe(0);
    expect(cost.relaxed.loadingChangeRelative).toBeNaN();
    assertRelative(cost.relaxed.wingAreaChangeRelative, 1 / 1.21 - 1, 1e-9, 'S x 1/1.1^2');
  });

  it('prices only the enabled requirements', () => {
    const d = stallBound();
    const withOff = { ...d, requirements: [...d.requirements, stall(30 * KNOT_MPS, { id: 'off', enabled: false })] };
    expect(requirementCosts(withOff).costs.map((c) => c.id)).toEqual(['stall', 'cruise']);
  });

  it('gives a jet\'s costs in thrust to weight', () => {
    const d = design({ aircraft: aircraft({ kind: 'turbofan', engines: 2 }), requirements: [stall(60 * KNOT_MPS)], rangePa: [500, 3000] });
    expect(requirementCosts(d).axis).toBe('thrustToWeight');
  });
});

describe('requirementCosts: floors, notes and refused steps', () => {
  const turnDesign = (loadFactor: number) =>
    design({
      aircraft: aircraft({ kind: 'turbofan', engines: 2 }),
      requirements: [stall(60 * KNOT_MPS), sustainedTurn(120 * KNOT_MPS, loadFactor, { id: 'turn' }), climbGradient(0, { id: 'flat', enginesInoperative: 1 })],
      rangePa: [500, 3000],
    });

  it('holds a relaxed load factor at 1 with its note, and notes a zero gradient, word for word', () => {
    const { costs } = requirementCosts(turnDesign(1.05), { step: 0.1 });
    const turn = costs.find((c) => c.id === 'turn');
    expect(turn?.relaxed.value).toBe(1);
    assertRelative(turn?.tightened.value ?? NaN, 1.155, 1e-12, 'tightened n = 1.05 x 1.1');
    expect(turn?.notes).toEqual(['The relaxed load factor is held at 1 (level flight); a turn needs n of 1 or more.']);
    expect(costs.find((c) => c.id === 'flat')?.notes).toEqual(['The gradient is 0, so a relative step leaves it unchanged.']);
    expect(costs.find((c) => c.kind === 'stall')?.notes).toEqual([]);
  });

  it('adds no note when the relaxed load factor comes to exactly 1', () => {
    // n = 2 relaxed by half: 2 x (1 - 0.5) = 1, nothing held.
    const turn = requirementCosts(turnDesign(2), { step: 0.5 }).costs.find((c) => c.id === 'turn');
    expect([turn?.relaxed.value, turn?.tightened.value, turn?.notes]).toEqual([1, 3, []]);
  });

  it('refuses a step outside (0, 1) in one line naming it', () => {
    const d = turnDesign(1.5);
    for (const step of [0, 1, -0.1, 1.5, NaN]) {
      expect(() => requirementCosts(d, { step }), String(step)).toThrow(new RangeError(`step is ${step}; give a fraction between 0 and 1, e.g. 0.1 for 10 %`));
    }
    expect(requirementCosts(d, { step: 0.99 }).step).toBe(0.99);
    expect(requirementCosts(d, { step: 0.001 }).step).toBe(0.001);
    expect(requirementCosts(d).step).toBe(0.1);
  });
});

// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { requirementCosts } from '../../../core/studies';
import { REQUIREMENT_DESCRIPTORS } from '../../../core/requirements';
import { KNOT_MPS } from '../../../core/units/factors';
import { assertRelative } from '../helpers/asserts';
import { aircraft, climbGradient, cruise, design, stall, sustainedTurn } from '../helpers/design';
import { DEMO_SLUGS, demo } from './fixtures';

/** A piston single whose optimum sits on the stall limit (the cruise curve still falls there). */
const STALL_BOUND = design({
  aircraft: aircraft({ kind: 'piston', aspectRatio: 7.5, clean: { cd0: 0.03, oswaldEfficiency: 0.8, clMax: 1.5 } }),
  requirements: [stall(45 * KNOT_MPS, { id: 'stall' }), cruise(110 * KNOT_MPS, { id: 'cruise', propellerEfficiency: 0.8 })],
  rangePa: [200, 1500],
});

describe('requirementCosts', () => {
  it('prices a 10 % stall-speed step as the square of the speed ratio in wing area', () => {
    // w = 1/2 rho0 V_s^2 CLmax (Anderson, Introduction to Flight, stalling speed), S = W/w:
    // V x 1.1 gives S x 1/1.21, V x 0.9 gives S x 1/0.81.
    const { costs, nominal } = requirementCosts(STALL_BOUND, { step: 0.1 });
    const cost = costs.find((c) => c.id === 'stall');
    expect(cost?.steppedField).toBe('speedMps');
    expect(cost?.relaxedDirection).toBe('up');
    assertRelative(cost?.relaxed.value ?? NaN, 1.1 * 45 * KNOT_MPS, 1e-12, 'relaxed speed');
    assertRelative(1 + (cost?.relaxed.wingAreaChangeRelative ?? NaN), 1 / 1.21, 1e-9, 'relaxed area ratio');
    assertRelative(1 + (cost?.tightened.wingAreaChangeRelative ?? NaN), 1 / 0.81, 1e-9, 'tightened area ratio');
    expect(cost?.relaxed.loadingChange).toBeLessThan(0); // the falling cruise curve is met further right
    expect(nominal?.wingAreaM2).toBeGreaterThan(0);
  });

  it('moves a horizontal jet climb-gradient boundary by f_N x dG', () => {
    // Jet climb gradient at V = k V_s: T/W = f_N (beta/alpha)[(k^2/CLmax) CD0 + K CLmax/k^2 + G], independent of w
    // (core/methods.md section 6, from Mattingly's master equation); f_N = 2 for one of two engines out; sea level, alpha = 1.
    const d = design({
      aircraft: aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 7.5 }),
      requirements: [stall(60 * KNOT_MPS, { id: 'stall' }), climbGradient(0.024, { id: 'oei', enginesInoperative: 1 })],
      rangePa: [500, 3000],
    });
    const { costs, nominal } = requirementCosts(d, { step: 0.1 });
    // The builder's take-off configuration: CD0 0.03 + 0.015, e 0.76, CLmax 1.8.
    const k = 1 / (Math.PI * 0.76 * 7.5);
    const tw = (g: number) => 2 * ((1.44 / 1.8) * 0.045 + (k * 1.8) / 1.44 + g);
    assertRelative(nominal?.loading ?? NaN, tw(0.024), 1e-9, 'nominal T/W');
    const oei = costs.find((c) => c.id === 'oei');
    expect([oei?.steppedField, oei?.relaxedDirection]).toEqual(['gradient', 'down']);
    assertRelative(oei?.relaxed.loadingChange ?? NaN, -2 * 0.0024, 1e-6, 'relaxed change');
    assertRelative(oei?.tightened.loadingChange ?? NaN, 2 * 0.0024, 1e-6, 'tightened change');
    assertRelative(oei?.relaxed.installedChange ?? NaN, -2 * 0.0024 * 750 * 9.80665, 1e-6, 'relaxed thrust [N]');
  });

  it('never charges more for relaxing, nor less for tightening, any requirement of any demo', () => {
    for (const slug of DEMO_SLUGS) {
      const { costs, nominal } = requirementCosts(demo(slug).design, { step: 0.1 });
      // Within the optimum search's own precision (golden section to 1e-7 in wing loading, core/diagram/optimum.ts).
      const y = 1e-6 * (nominal?.loading ?? NaN);
      for (const cost of costs) {
        expect(cost.relaxed.loadingChange, `${slug} ${cost.id} relaxed`).toBeLessThanOrEqual(y);
        if (cost.tightened.optimum) expect(cost.tightened.loadingChange, `${slug} ${cost.id} tightened`).toBeGreaterThanOrEqual(-y);
      }
    }
  });

  it('steps the value each kind is known by, in the direction that relaxes it', () => {
    const directions = Object.fromEntries(REQUIREMENT_DESCRIPTORS.map((d) => [d.kind, `${d.costStep.conceptField} ${d.costStep.relaxed}`]));
    expect(directions).toEqual({
      stall: 'speed up',
      'landing-ground-roll': 'distance up',
      'takeoff-ground-roll': 'distance up',
      cruise: 'speed down',
      'climb-rate': 'rate down',
      'climb-gradient': 'gradient down',
      ceiling: 'altitude down',
      'sustained-turn': 'loadFactor down',
      'takeoff-distance': 'distance up',
      'balanced-field-length': 'distance up',
      'landing-distance': 'distance up',
      'approach-speed': 'speed up',
      'maximum-speed': 'speed down',
    });
  });

  it('holds a relaxed turn at n = 1, notes a zero gradient, and names a bad step', () => {
    const d = design({
      aircraft: aircraft({ kind: 'turbofan', engines: 2 }),
      requirements: [stall(60 * KNOT_MPS), sustainedTurn(120 * KNOT_MPS, 1.05, { id: 'turn' }), climbGradient(0, { id: 'flat', enginesInoperative: 1 })],
      rangePa: [500, 3000],
    });
    const { costs, caution } = requirementCosts(d, { step: 0.1 });
    const turn = costs.find((c) => c.id === 'turn');
    expect(turn?.relaxed.value).toBe(1);
    expect(turn?.notes.join(' ')).toMatch(/held at 1/);
    expect(costs.find((c) => c.id === 'flat')?.notes.join(' ')).toMatch(/is 0/);
    expect(caution).toMatch(/licensed engineering review/);
    expect(() => requirementCosts(d, { step: 1.5 })).toThrow(/step is 1.5/);
  });
});

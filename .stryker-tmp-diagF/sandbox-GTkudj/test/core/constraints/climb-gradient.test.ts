// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { engineOutFactor } from '../../../core/constraints';
import { climbGradientBoundary } from '../../../core/constraints/climb-gradient';
import { aircraft, climbGradient } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';
import { curveOf } from './curve';

const increments = { takeoff: { cd0Increment: 0.025, oswaldEfficiency: 0.76, clMax: 1.9 } };
const twinJet = aircraft({ kind: 'turbofan', engines: 2, aspectRatio: 8.5, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 }, increments });
const twinProp = aircraft({ kind: 'electric', engines: 2, aspectRatio: 8.5, clean: { cd0: 0.02, oswaldEfficiency: 0.8, clMax: 1.5 }, increments });

describe('engineOutFactor', () => {
  const table: Array<[number, number, number]> = [
    // N/(N - k) (core/methods.md section 6): all thrust must come from the engines still running.
    [2, 1, 2],
    [3, 1, 1.5],
    [4, 1, 4 / 3],
    [4, 2, 2],
    [2, 0, 1],
  ];
  for (const [n, k, factor] of table) {
    it(`is ${factor} with ${k} of ${n} engines out`, () => assertRelative(engineOutFactor(n, k), factor, 1e-15));
  }

  it('is NaN when no engine is left', () => {
    expect(engineOutFactor(2, 2)).toBeNaN();
    expect(engineOutFactor(1, 1)).toBeNaN();
  });
});

describe('climbGradientBoundary', () => {
  it('needs T/W = f_N (C_D/C_L + G) for the 2.4 % second segment of a twin', () => {
    // 2.4 % for twins (14 CFR 25.121(b), confirmed); climb T = D + W sin(gamma) (Anderson, Introduction to Flight);
    // at 1.2 V_s, C_L = C_Lmax/1.44 = 1.9/1.44; K = 1/(pi 0.76 8.5); C_D0 = 0.045; f_N = 2.
    const curve = curveOf(climbGradientBoundary(climbGradient(0.024, { enginesInoperative: 1 }), twinJet));
    const cl = 1.9 / 1.44;
    const cd = 0.045 + (cl * cl) / (Math.PI * 0.76 * 8.5);
    assertRelative(curve.required(3000), 2 * (cd / cl + 0.024), 1e-12);
  });

  it('is horizontal for a jet', () => {
    // With V/V_s fixed, the jet boundary does not depend on w (core/methods.md section 6).
    const curve = curveOf(climbGradientBoundary(climbGradient(0.024, { enginesInoperative: 1 }), twinJet));
    assertRelative(curve.required(6000), curve.required(1000), 1e-12);
  });

  it('grows as sqrt(w) for a propeller', () => {
    // P/W = (T/W) V / eta with V proportional to sqrt(w) (core/methods.md section 6).
    const curve = curveOf(climbGradientBoundary(climbGradient(0.015, { enginesInoperative: 1 }), twinProp));
    assertRelative(curve.required(4000) / curve.required(1000), 2, 1e-12);
  });

  it('doubles with one of two engines out, compared with all running', () => {
    const out = curveOf(climbGradientBoundary(climbGradient(0.024, { enginesInoperative: 1 }), twinJet)).required(3000);
    const all = curveOf(climbGradientBoundary(climbGradient(0.024), twinJet)).required(3000);
    assertRelative(out, 2 * all, 1e-12);
  });

  it('cannot be met at any wing loading with every engine out', () => {
    const curve = curveOf(climbGradientBoundary(climbGradient(0.024, { enginesInoperative: 2 }), twinJet));
    for (const w of [500, 3000, 8000]) expect(curve.required(w)).toBeNaN();
  });

  it('flies at k_V V_s of its configuration', () => {
    const curve = curveOf(climbGradientBoundary(climbGradient(0.024, { speedFactor: 1.3 }), twinJet));
    assertRelative(curve.speedAt(3000), 1.3 * Math.sqrt((2 * 3000) / (1.225 * 1.9)), 1e-7); // rho0 1.2250 (USSA 1976)
  });
});

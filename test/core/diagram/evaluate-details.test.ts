/**
 * Details of the evaluation a user reads: the words of its own warnings, keys
 * present only when they carry a value, the Mach number at the optimum, the
 * turn's stall line exactly on the right edge, and required loadings that are
 * not positive refused with the field and the wing loading.
 */
import { describe, expect, it } from 'vitest';
import { evaluateDesign, impossibleInputs } from '../../../core/diagram';
import { compressibilityWarnings } from '../../../core/diagram/compressibility-warnings';
import { requirementBoundaries } from '../../../core/diagram/boundaries';
import { atmosphere } from '../../../core/atmosphere';
import { aircraft, climbGradient, cruise, design, stall, sustainedTurn, takeoffRoll } from '../helpers/design';
import { assertRelative } from '../helpers/asserts';

describe('evaluateDesign: its own warnings, word for word', () => {
  it('an unusable range and sample count', () => {
    const e = evaluateDesign(design({ requirements: [stall(25), cruise(60)], rangePa: [900, 300], samples: 1 }));
    expect(e.warnings.filter((w) => w.code === 'range-invalid' || w.code === 'samples-invalid')).toEqual([
      { code: 'range-invalid', field: 'diagram.wingLoading', message: 'The wing-loading range needs two positive values, the first smaller; a range that shows every boundary is used.' },
      { code: 'samples-invalid', field: 'diagram.samples', message: 'Samples must be a whole number of at least 2; 201 are used.' },
    ]);
  });

  it('a design point left of the plotted range', () => {
    const e = evaluateDesign(design({ requirements: [stall(25), cruise(60)], rangePa: [300, 900], designPoint: { wingLoadingPa: 250, loading: 10 } }));
    expect(e.warnings.filter((w) => w.code === 'design-point-outside-range')).toEqual([
      { code: 'design-point-outside-range', field: 'designPoint.wingLoading', message: "The design point's wing loading 250 N/m^2 is outside the plotted range." },
    ]);
  });
});

describe('evaluateDesign: what each boundary carries', () => {
  it('has no label key for a requirement without one', () => {
    const e = evaluateDesign(design({ requirements: [stall(25), cruise(60)], rangePa: [300, 900] }));
    for (const b of e.boundaries) expect(Object.keys(b)).not.toContain('label');
  });

  it('gives a cruise its flight Mach number at the optimum, V/a with a = 340.29 m/s at sea level (U.S. Standard Atmosphere 1976)', () => {
    const e = evaluateDesign(design({ requirements: [stall(25), cruise(60)], rangePa: [300, 900] }));
    assertRelative(e.boundaries[1].machAtOptimum as number, 60 / 340.294, 1e-5);
  });

  it('neither draws a turn\'s stall line nor warns when it falls exactly on the right edge', () => {
    // The stall line is drawn only left of the right edge (w_stall = q C_Lmax/(n beta), 1531.25 Pa here, see
    // evaluate-rules.test.ts); with the range ending on it, it is the edge itself.
    const turn = (hi: number) => evaluateDesign(design({ requirements: [stall(40, { configuration: 'clean' }), sustainedTurn(50, 1.5)], rangePa: [200, hi], samples: 11 }));
    const at = (turn(2000).boundaries[1] as { stallLimit: number }).stallLimit;
    assertRelative(at, 1531.25, 1e-6);
    const e = turn(at);
    expect(e.boundaries[1]).not.toHaveProperty('stallLimit');
    expect(e.warnings.map((w) => w.code)).not.toContain('turn-stalls');
  });
});

describe('compressibility at exactly Mach 0.6', () => {
  it('is quiet: only above 0.6 is it flagged', () => {
    const a0 = atmosphere(0).speedOfSoundMps;
    const d = design({ aircraft: aircraft({ kind: 'turbofan' }), requirements: [cruise(0.6 * a0)], rangePa: [100, 2000] });
    expect(compressibilityWarnings(requirementBoundaries(d), d, 1000)).toEqual([]);
  });
});

describe('impossibleInputs: a requirement met with negative power', () => {
  // A climb gradient G at a speed tied to the stall speed flies at a fixed C_L, so T/W = C_D/C_L + G at every
  // wing loading (master equation with P_s/V = G, core/methods.md); with the take-off polar C_D/C_L is near 0.1,
  // so G = -0.2 needs negative power everywhere, the first plotted sample (100 Pa) included.
  it('names the requirement when its own values are to blame', () => {
    expect(impossibleInputs(design({ requirements: [climbGradient(-0.2)], rangePa: [100, 2000] }))).toEqual([
      { field: 'requirements[0]', message: 'makes requirement "gradient" need negative power at 100 Pa wing loading, which no aircraft can; check its values' },
    ]);
  });

  it('names the linear drag term when there is one, and says thrust for a jet', () => {
    // K1 = -0.01 keeps the least drag positive: 0.03 - 0.0001/(4 x 0.05305) = 0.0295 (hand derivation).
    const jet = { ...aircraft({ kind: 'turbofan' }), cdLinear: -0.01 };
    expect(impossibleInputs(design({ aircraft: jet, requirements: [climbGradient(-0.2)], rangePa: [100, 2000] }))).toEqual([
      { field: 'aircraft.aero.cdLinear', message: '-0.01 makes requirement "gradient" need negative thrust at 100 Pa wing loading, which no aircraft can; use a linear term closer to zero' },
    ]);
  });

  it('does not refuse lift above weight in a ground run without rolling friction (no friction to turn negative)', () => {
    // (0.7 k_LOF)^2 C_L,g / C_Lmax = (0.7 x 1.6)^2 x 1.5/1.8 = 1.045 > 1, but mu = 0.
    expect(impossibleInputs(design({ requirements: [takeoffRoll(300, { rollingFriction: 0, clGroundRun: 1.5, liftoffSpeedFactor: 1.6 })], rangePa: [100, 2000] }))).toEqual([]);
  });
});

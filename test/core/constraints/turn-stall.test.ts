/**
 * A sustained turn that stalls: past the wing loading where the lift
 * coefficient it needs reaches C_Lmax, the turn is a limit, not a curve
 * with no value. C_L = n W/(q S) (Anderson, Introduction to Flight, turning flight).
 */
import { describe, expect, it } from 'vitest';
import { parseConcept, type ConceptJson } from '../../../core/concept';
import { evaluateDesign } from '../../../core/diagram';

const concept = {
  format: 'loftpoint-concept/1',
  aircraft: {
    takeoffMass: '1000 kg',
    aero: { aspectRatio: 8, configurations: { clean: { cd0: 0.025, oswaldEfficiency: 0.8, clMax: 1.5 } } },
    propulsion: { kind: 'piston', engines: 1 },
  },
  requirements: [{ id: 'turn', kind: 'sustained-turn', speed: '60 m/s', loadFactor: 2 }],
  diagram: { wingLoading: ['500 N/m^2', '3000 N/m^2'] },
  designPoint: { wingLoading: '2000 N/m^2', powerToWeight: '30 W/N' },
} as ConceptJson;

/** Evaluated inside each test, so that mutation testing (per-test coverage) sees the code it runs. */
function evaluated() {
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return evaluateDesign(parsed.design);
}

describe('a sustained turn that stalls', () => {

  it('draws its stall line at w = q C_Lmax / n', () => {
    // q = 0.5 x 1.225 x 60^2 = 2205 Pa; w = 2205 x 1.5 / 2 = 1653.75 N/m^2.
    const evaluation = evaluated();
    const turn = evaluation.boundaries.find((b) => b.id === 'turn') as { stallLimit?: number };
    expect(turn.stallLimit).toBeCloseTo(1653.75, 3); // rho0 = 1.2250 kg/m^3 (USSA 1976)
    expect(evaluation.warnings.find((w) => w.code === 'turn-stalls')?.message).toMatch(/"turn" cannot be flown above a wing loading of 1654 N\/m\^2/);
  });

  it('gives a limit margin past it, not -100 %', () => {
    // 1 - 2000/1653.75 = -0.209373.
    const evaluation = evaluated();
    expect(evaluation.designPoint?.margins[0].margin).toBeCloseTo(-0.209373, 5);
    // The optimum sits at or below the stall line.
    expect(evaluation.optimum?.wingLoading ?? Infinity).toBeLessThanOrEqual(1653.75 * (1 + 1e-9));
  });
});

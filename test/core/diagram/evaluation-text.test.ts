import { describe, expect, it } from 'vitest';
import { columnsOf, evaluateDesign, evaluationJsonText } from '../../../core/diagram';
import type { CurveBoundaryJson } from '../../../core/evaluation';
import { DEMO_DESIGNS } from '../helpers/demo-designs';
import { cruise, design, stall, sustainedTurn } from '../helpers/design';

// The reference is ECMAScript's own JSON serializer (JSON.stringify with two-space indentation).
describe('the evaluation as JSON text from the columns', () => {
  it('is the text JSON.stringify writes, byte for byte, for every demo', () => {
    for (const d of DEMO_DESIGNS) {
      const e = evaluateDesign(d);
      expect(columnsOf(e)).toBeDefined(); // written from the columns, not by JSON.stringify itself
      expect(evaluationJsonText(e)).toBe(JSON.stringify(e, null, 2));
    }
  });

  it('writes null in a curve gap, as JSON.stringify does, and keeps limits and labels where they were', () => {
    // A 50 m/s cruise stalls above 2297 N/m^2 (C_Lmax 1.5, sea level): a gap at the right of the range.
    const d = design({ requirements: [stall(30, { label: 'Stall "landing", 30 m/s' }), cruise(50, { label: 'points' })], rangePa: [500, 4000], samples: 36 });
    const e = evaluateDesign(d);
    const text = evaluationJsonText(e);
    expect(text).toBe(JSON.stringify(e, null, 2));
    expect(text).toContain('null');
    expect(JSON.parse(text)).toEqual(JSON.parse(JSON.stringify(e)));
  });

  it('keeps a turn\'s stall line after its points', () => {
    // A 2 g turn at 60 m/s, C_Lmax 1.5: C_L = n w/q exceeds C_Lmax above w = 0.5 x 1.225 x 60^2 x 1.5 / 2 = 1654 N/m^2.
    const e = evaluateDesign(design({ requirements: [sustainedTurn(60, 2)], rangePa: [300, 3000], samples: 10 }));
    expect(e.boundaries[0]).toHaveProperty('stallLimit');
    expect(columnsOf(e)).toBeDefined();
    expect(evaluationJsonText(e)).toBe(JSON.stringify(e, null, 2));
  });

  it('writes points replaced after the evaluation, not the engine\'s columns', () => {
    const e = evaluateDesign(DEMO_DESIGNS[0]);
    const curve = e.boundaries.find((b): b is CurveBoundaryJson => 'points' in b)!;
    curve.points = [[100, 1], [200, null]];
    const text = evaluationJsonText(e);
    expect(text).toBe(JSON.stringify(e, null, 2));
    expect((JSON.parse(text).boundaries as CurveBoundaryJson[]).find((b) => b.id === curve.id)!.points).toEqual([[100, 1], [200, null]]);
  });

  it('writes an evaluation read back from JSON as JSON.stringify does', () => {
    const back = JSON.parse(JSON.stringify(evaluateDesign(DEMO_DESIGNS[1])));
    expect(evaluationJsonText(back)).toBe(JSON.stringify(back, null, 2));
  });
});

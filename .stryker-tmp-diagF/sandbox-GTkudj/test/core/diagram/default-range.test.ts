// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept } from '../../../core/concept';
import { boundariesOf, defaultWingLoadingRange, evaluateDesign } from '../../../core/diagram';
import type { Design } from '../../../core/model';
import { DEMO_DESIGNS } from '../helpers/demo-designs';
import { design, climbGradient, aircraft } from '../helpers/design';

function withoutRange(d: Design): Design {
  return { ...d, diagram: { samples: d.diagram.samples } };
}

function rangeOf(d: Design): [number, number] {
  const curve = evaluateDesign(d).boundaries.find((b) => 'points' in b);
  if (!curve || !('points' in curve)) throw new Error('no curve');
  return [curve.points[0][0], curve.points[curve.points.length - 1][0]];
}

const demos: Array<[string, Design]> = [
  ...DEMO_CONCEPTS.map((demo): [string, Design] => {
    const parsed = parseConcept(demo.concept);
    if (!parsed.ok) throw new Error(`demo ${demo.slug} does not parse`);
    return [demo.slug, parsed.design];
  }),
  ...DEMO_DESIGNS.map((d): [string, Design] => [d.name, d]),
];

describe('default wing-loading range', () => {
  for (const [name, d] of demos) {
    it(`is finite, positive and shows every limit with headroom for ${name}`, () => {
      const [lo, hi] = rangeOf(withoutRange(d));
      expect(Number.isFinite(lo) && Number.isFinite(hi)).toBe(true);
      expect(lo).toBeGreaterThan(0);
      expect(hi).toBeGreaterThan(lo);
      for (const b of boundariesOf(d)) if (b.type === 'limit') expect(hi).toBeGreaterThanOrEqual(1.3 * b.wingLoadingMaxPa);
      const optimum = evaluateDesign(withoutRange(d)).optimum;
      expect(optimum).not.toBeNull();
      expect(optimum!.unbounded).toBeUndefined();
      expect(optimum!.wingLoading).toBeGreaterThan(lo);
    });
  }

  it('widens to keep the design point inside', () => {
    const [lo, hi] = defaultWingLoadingRange([(w) => 1000 / w], [800], 5000);
    expect(lo).toBeLessThan(5000);
    expect(hi).toBeGreaterThan(5000);
  });

  it('is finite with no limit and only a horizontal curve', () => {
    const jet = aircraft({ kind: 'turbofan', engines: 2 });
    const [lo, hi] = rangeOf(design({ aircraft: jet, requirements: [climbGradient(0.024, { enginesInoperative: 1 })] }));
    expect(lo).toBeGreaterThan(0);
    expect(Number.isFinite(hi)).toBe(true);
  });

  it('is finite when nothing can be met anywhere', () => {
    const [lo, hi] = defaultWingLoadingRange([() => NaN], []);
    expect(lo).toBeGreaterThan(0);
    expect(Number.isFinite(hi)).toBe(true);
  });
});

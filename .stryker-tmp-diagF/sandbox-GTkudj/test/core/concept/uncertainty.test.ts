// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept } from '../../../core';

const trainer = DEMO_CONCEPTS.find((demo) => demo.slug === 'trainer')!.concept;

describe('parseConcept with an uncertainty block', () => {
  it('resolves ranged assumptions against the design and keeps the seed and sample count', () => {
    const parsed = parseConcept({
      ...trainer,
      uncertainty: {
        seed: 7,
        samples: 2000,
        parameters: [{ field: 'aircraft.aero.configurations.clean.oswaldEfficiency', low: 0.72, high: 0.86, distribution: 'triangular' }],
      },
    });
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(parsed.uncertainty?.seed).toBe(7);
    expect(parsed.uncertainty?.samples).toBe(2000);
    const [e] = parsed.uncertainty!.parameters;
    expect(e.nominal).toBe(parsed.design.aircraft.configurations.clean.oswaldEfficiency);
    expect(e.apply(parsed.design, 0.75).aircraft.configurations.clean.oswaldEfficiency).toBe(0.75);
    // The concept is returned as written, block included.
    expect((parsed.concept as { uncertainty?: unknown }).uncertainty).toBeDefined();
  });

  it('names the parameter entry when a range does not contain the concept value', () => {
    const parsed = parseConcept({
      ...trainer,
      uncertainty: { parameters: [{ field: 'aircraft.aero.aspectRatio', low: 20, high: 25 }] },
    });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues[0].path).toBe('uncertainty.parameters[0].low');
  });

  it('rejects an unknown field inside the block, like everywhere else in the file', () => {
    const parsed = parseConcept({ ...trainer, uncertainty: { sead: 3 } });
    expect(parsed.ok).toBe(false);
    if (parsed.ok) return;
    expect(parsed.issues.map((issue) => issue.path).join(' ')).toContain('uncertainty');
  });

  it('leaves a concept without the block exactly as before', () => {
    const parsed = parseConcept(trainer);
    expect(parsed.ok && parsed.uncertainty).toBe(undefined);
  });
});

/**
 * Real designs for the study-chart tests: the invented demo concepts, with
 * an uncertainty block of core/methods.md typical ranges (core typicalUncertainty)
 * or one written for the test.
 */
// @ts-nocheck

import { DEMO_CONCEPTS, evaluateDesign, parseConcept, typicalUncertainty, type ConceptJson, type Design, type Evaluation, type UncertainParameter } from '../../core';

export interface Studied {
  concept: ConceptJson;
  design: Design;
  evaluation: Evaluation;
  parameters: UncertainParameter[];
  seed: number;
  samples: number;
}

export function demoConcept(slug: string): ConceptJson {
  const demo = DEMO_CONCEPTS.find((candidate) => candidate.slug === slug);
  if (!demo) throw new Error(`no demo ${slug}`);
  return structuredClone(demo.concept) as ConceptJson;
}

/** Parse a concept that must be valid, with its uncertainty block resolved. */
export function studied(concept: unknown): Studied {
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(`fixture does not parse: ${JSON.stringify(parsed.issues)}`);
  const u = parsed.uncertainty;
  return {
    concept: parsed.concept,
    design: parsed.design,
    evaluation: evaluateDesign(parsed.design),
    parameters: u?.parameters ?? [],
    seed: u?.seed ?? 1,
    samples: u?.samples ?? 10000,
  };
}

/** A demo with every assumption that has a core/methods.md typical range ranged over it. */
export function withTypicalRanges(slug: string, options: { samples?: number; seed?: number } = {}): ConceptJson {
  const concept = demoConcept(slug);
  const base = parseConcept(concept);
  if (!base.ok) throw new Error(`demo ${slug} does not parse`);
  return { ...concept, uncertainty: typicalUncertainty(base.design, options) };
}

/** The trainer demo cut down to its stall and cruise requirements, with the landing CLmax ranged uniformly over [low, high]. */
export function stallAndCruise(low: number, high: number, samples = 20000): ConceptJson {
  const concept = demoConcept('trainer');
  return {
    ...concept,
    requirements: concept.requirements.filter((r) => r.id === 'stall' || r.id === 'cruise'),
    uncertainty: { seed: 20261202, samples, parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low, high }] },
  };
}

/**
 * Demo concepts resolved for the trade-study tests, and ranged assumptions
 * ready to use.
 */
// @ts-nocheck

import { expect } from 'vitest';
import { DEMO_CONCEPTS, parseConcept } from '../../../core/concept';
import type { ConceptJson } from '../../../core/concept';
import type { Design } from '../../../core/model';
import { resolveUncertainty, type UncertainParameter } from '../../../core/studies';

export interface Demo {
  slug: string;
  concept: ConceptJson;
  design: Design;
}

export function demo(slug: string): Demo {
  const found = DEMO_CONCEPTS.find((d) => d.slug === slug);
  if (!found) throw new Error(`no demo ${slug}`);
  const parsed = parseConcept(found.concept);
  if (!parsed.ok) throw new Error(`demo ${slug} does not parse: ${JSON.stringify(parsed.issues)}`);
  return { slug, concept: parsed.concept, design: parsed.design };
}

/** The business jet with thrust in proportion to density (lapse exponent 1), for studies that range the exponent. */
export function densityLapseJet(): Demo {
  const found = DEMO_CONCEPTS.find((d) => d.slug === 'business-jet');
  if (!found) throw new Error('no business-jet demo');
  const concept = structuredClone(found.concept) as ConceptJson;
  concept.aircraft.propulsion = { kind: 'turbofan', engines: 2, lapseModel: 'density', lapseExponent: 1 };
  const parsed = parseConcept(concept);
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return { slug: 'business-jet', concept: parsed.concept, design: parsed.design };
}

export const DEMO_SLUGS = DEMO_CONCEPTS.map((d) => d.slug);

/** Resolve a block that must be valid; fails the test with the issues otherwise. */
export function ranged(block: unknown, design: Design, concept?: unknown): UncertainParameter[] {
  const result = resolveUncertainty(block, design, concept);
  if (!result.ok) expect.fail(`uncertainty issues: ${JSON.stringify(result.issues)}`);
  return result.parameters;
}

/** A deep copy that throws on any write, to prove a function leaves its input alone. */
export function frozen<T>(value: T): T {
  const copy = structuredClone(value);
  const freeze = (v: unknown): void => {
    if (v && typeof v === 'object') {
      Object.freeze(v);
      for (const inner of Object.values(v)) freeze(inner);
    }
  };
  freeze(copy);
  return copy;
}

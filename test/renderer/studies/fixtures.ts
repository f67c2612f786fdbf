/**
 * Concept documents for the window's study tests: a demo as the window holds
 * it (plain JSON), and a stall-only concept whose chance has a closed form.
 */
import { DEMO_CONCEPTS, parseConcept, type Design } from '../../../core';
import type { ConceptDocument } from '../../../app/renderer/lib/concept/edit';

export function demoDocument(slug: string): ConceptDocument {
  const found = DEMO_CONCEPTS.find((demo) => demo.slug === slug);
  if (!found) throw new Error(`no demo ${slug}`);
  return structuredClone(found.concept) as unknown as ConceptDocument;
}

export function designOf(document: ConceptDocument): Design {
  const parsed = parseConcept(document);
  if (!parsed.ok) throw new Error(`concept does not parse: ${JSON.stringify(parsed.issues)}`);
  return parsed.design;
}

/**
 * Stall at 45 kt CAS in landing flaps as the only requirement, the landing
 * CLmax ranged uniformly over [low, high] (nominal 2.05), the design point at
 * `wingLoading` N/m^2.
 */
export function stallOnly(wingLoading: number, low = 1.6, high = 2.8, samples = 20000): ConceptDocument {
  // Without the demo's mission: it flies the cruise requirement, which this concept leaves out.
  const { mission: _mission, ...document } = demoDocument('trainer');
  const requirements = (document.requirements as Array<{ id: string }>).filter((r) => r.id === 'stall');
  // No mission: the take-off mass is the written one, and no segment names a requirement left out here.
  delete document.mission;
  return {
    ...document,
    requirements,
    designPoint: { wingLoading: `${wingLoading} N/m^2`, powerToWeight: '20 W/N' },
    uncertainty: { seed: 20261202, samples, parameters: [{ field: 'aircraft.aero.configurations.landing.clMax', low, high }] },
  };
}

/**
 * Requirements from published rules in the window
 * (app/renderer/lib/studies/rule-templates.ts). Reference values from the
 * rule text: 14 CFR 23.65(a) asks a steady climb gradient of 8.3 % for
 * landplanes at sea level; 14 CFR 23.67(a)(1) and 25.121 are one engine
 * inoperative rules, so they cannot apply to a single-engine airplane
 * (common practice); the 25.121(b) second-segment gradient is 2.4 % for two
 * engines.
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { APPLICABILITY_NOTE, DEMO_CONCEPTS, REQUIREMENT_TEMPLATES, evaluateDesign, parseConcept } from '../../core';
import type { ConceptDocument } from '../../app/renderer/lib/concept/edit';
import { enginesOf, insertRule, ruleBooks } from '../../app/renderer/lib/studies/rule-templates';

function demo(slug: string): ConceptDocument {
  return structuredClone(DEMO_CONCEPTS.find((entry) => entry.slug === slug)!.concept) as unknown as ConceptDocument;
}

const template = (id: string) => REQUIREMENT_TEMPLATES.find((entry) => entry.id === id)!;
const choices = (document: ConceptDocument) => ruleBooks(document).flatMap((book) => book.templates);

describe('ruleBooks', () => {
  it('groups every template by rule book, in the core order', () => {
    const books = ruleBooks(demo('trainer'));
    expect(books.map((book) => book.title)).toEqual(['14 CFR Part 23', '14 CFR Part 25', 'EASA CS-22 (sailplanes)']);
    expect(books.flatMap((book) => book.templates.map((choice) => choice.template.id)).sort()).toEqual(REQUIREMENT_TEMPLATES.map((t) => t.id).sort());
  });

  it('offers a single-engine concept no engine-out rule', () => {
    const trainer = demo('trainer');
    expect(enginesOf(trainer)).toBe(1);
    const fitting = choices(trainer).filter((choice) => choice.fits);
    expect(fitting.map((choice) => choice.template.source)).toContain('14 CFR 23.65(a)');
    for (const choice of fitting) expect(Number(choice.template.requirement.enginesInoperative ?? 0)).toBe(0);
    const oei = choices(trainer).find((choice) => choice.template.id === '14cfr-23.67a1')!;
    expect(oei.fits).toBe(false);
    expect(oei.why).toMatch(/engine-out rule; the concept has 1 engine$/);
  });

  it('offers a twin the 25.121 rows written for two engines only', () => {
    const twin = demo('utility-twin');
    expect(enginesOf(twin)).toBe(2);
    const rows = choices(twin).filter((choice) => choice.template.source === '14 CFR 25.121(b)');
    expect(rows.filter((choice) => choice.fits).map((choice) => choice.template.engines)).toEqual([2]);
    expect(rows.find((choice) => choice.template.engines === 3)!.why).toBe('written for 3 engines; the concept has 2');
  });
});

describe('insertRule', () => {
  it('adds the rule as an ordinary requirement that names its source and carries the applicability note', () => {
    const trainer = demo('trainer');
    const before = JSON.stringify(trainer);
    const made = insertRule(trainer, template('14cfr-23.65a-landplane'));
    expect(made.ok).toBe(true);
    if (!made.ok) return;
    expect(JSON.stringify(trainer)).toBe(before);
    const requirements = made.document.requirements as ConceptDocument[];
    expect(requirements).toHaveLength((trainer.requirements as unknown[]).length + 1);
    const added = requirements.at(-1)!;
    expect(added).toMatchObject({ id: made.id, kind: 'climb-gradient', gradient: '8.3 %', altitude: '0 ft', source: '14 CFR 23.65(a)' });
    expect(String(added.label)).toMatch(/^14 CFR 23\.65\(a\): /);
    expect(String(added.note)).toContain(APPLICABILITY_NOTE);

    // It resolves, and the diagram draws a boundary for it.
    const parsed = parseConcept(made.document);
    expect(parsed.ok).toBe(true);
    if (!parsed.ok) return;
    expect(evaluateDesign(parsed.design).boundaries.map((boundary) => boundary.id)).toContain(made.id);
  });

  it('gives a second insertion of the same rule its own id', () => {
    const first = insertRule(demo('trainer'), template('14cfr-23.65a-landplane'));
    if (!first.ok) throw new Error(first.message);
    const second = insertRule(first.document, template('14cfr-23.65a-landplane'));
    expect(second).toMatchObject({ ok: true, id: `${first.id}-2` });
  });

  it('uses the configuration the rule means, and says what to define when the concept lacks it', () => {
    const twin = demo('utility-twin');
    const made = insertRule(twin, template('14cfr-25.121b-2eng'));
    if (!made.ok) throw new Error(made.message);
    const added = (made.document.requirements as ConceptDocument[]).at(-1)!;
    expect(added).toMatchObject({ gradient: '2.4 %', enginesInoperative: 1 });

    const approach = insertRule(demo('trainer'), template('14cfr-23.77a'));
    if (!approach.ok) throw new Error(approach.message);
    expect((approach.document.requirements as ConceptDocument[]).at(-1)!.configuration).toBe('landing');
  });

  it('refuses an engine-out rule on a single, naming the field', () => {
    const made = insertRule(demo('trainer'), template('14cfr-23.67a1'));
    expect(made.ok).toBe(false);
    if (!made.ok) expect(made.message).toMatch(/engine-out rule; the concept has 1 engine \(aircraft\.propulsion\.engines\)/);
  });
});

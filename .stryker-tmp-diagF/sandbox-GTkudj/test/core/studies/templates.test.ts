// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConcept, type ConceptJson } from '../../../core/concept';
import { REQUIREMENT_TEMPLATES, templateRequirement, type RequirementTemplate } from '../../../core/studies';

const conceptOf = (slug: string): ConceptJson => structuredClone((DEMO_CONCEPTS.find((d) => d.slug === slug) as { concept: ConceptJson }).concept);
const bySource = (source: string) => REQUIREMENT_TEMPLATES.filter((t) => t.source.startsWith(source));
const gradients = (source: string) => bySource(source).map((t) => t.requirement.gradient);

/** A demo concept with the template added as its rules would insert it, and the parse result. */
function insert(template: RequirementTemplate, slug: string, engines?: number) {
  const concept = conceptOf(slug);
  if (engines !== undefined) concept.aircraft.propulsion.engines = engines;
  const inserted = templateRequirement(template, {
    configurations: Object.keys(concept.aircraft.aero.configurations),
    requirementIds: concept.requirements.map((r) => r.id),
    engines: concept.aircraft.propulsion.engines ?? 1,
  });
  if (!inserted.ok) throw new Error(`${template.id}: ${inserted.message}`);
  concept.requirements.push(inserted.requirement as ConceptJson['requirements'][number]);
  return { inserted, parsed: parseConcept(concept) };
}

describe('REQUIREMENT_TEMPLATES', () => {
  it('carries the gradients of 14 CFR 25.121 for two, three and four engines', () => {
    // 14 CFR 25.121(a)-(d) (core/methods.md section 8, confirmed): (a) >0 / 0.3 / 0.5 %; (b) 2.4 / 2.7 / 3.0 %;
    // (c) 1.2 / 1.5 / 1.7 %; (d) 2.1 / 2.4 / 2.7 %.
    expect(gradients('14 CFR 25.121(a)')).toEqual(['0 %', '0.3 %', '0.5 %']);
    expect(gradients('14 CFR 25.121(b)')).toEqual(['2.4 %', '2.7 %', '3 %']);
    expect(gradients('14 CFR 25.121(c)')).toEqual(['1.2 %', '1.5 %', '1.7 %']);
    expect(gradients('14 CFR 25.121(d)')).toEqual(['2.1 %', '2.4 %', '2.7 %']);
    expect(bySource('14 CFR 25.121(b)').map((t) => [t.engines, t.requirement.enginesInoperative, t.requirement.speedFactor])).toEqual([
      [2, 1, 1.2],
      [3, 1, 1.2],
      [4, 1, 1.2],
    ]);
    // 14 CFR 25.119: landing climb 3.2 % with all engines.
    expect(gradients('14 CFR 25.119')).toEqual(['3.2 %']);
  });

  it('carries the Part 23 gradients and stall speeds of core/methods.md section 8', () => {
    // 14 CFR 23.65(a) 8.3 % landplane / 6.7 % seaplane; 23.65(b) 4 %; 23.67(a)(1) 1.5 % at 5000 ft;
    // 23.77(a)-(c) 3.3 / 2.5 / 3.2 %; 23.2120(a) 8.3 / 6.7 / 4 %, (b)(1) 1.5 % at 5000 ft, (b)(2) 1 %, (b)(3) 2 % at 400 ft;
    // 23.49(c) V_SO 61 kt CAS; CS 22.49 sailplane V_S0 80 km/h. All confirmed rows.
    expect(gradients('14 CFR 23.65(a)')).toEqual(['8.3 %', '6.7 %']);
    expect(gradients('14 CFR 23.65(b)')).toEqual(['4 %']);
    expect(bySource('14 CFR 23.67(a)(1)').map((t) => [t.requirement.gradient, t.requirement.altitude])).toEqual([['1.5 %', '5000 ft']]);
    expect(gradients('14 CFR 23.77')).toEqual(['3.3 %', '2.5 %', '3.2 %']);
    expect(gradients('14 CFR 23.2120(a)')).toEqual(['8.3 %', '6.7 %', '4 %']);
    expect(bySource('14 CFR 23.2120(b)').map((t) => [t.requirement.gradient, t.requirement.altitude])).toEqual([
      ['1.5 %', '5000 ft'],
      ['1 %', '400 ft'],
      ['2 %', '400 ft'],
    ]);
    expect(bySource('14 CFR 23.49(c)').map((t) => t.requirement.speed)).toEqual(['61 kt']);
    expect(bySource('EASA CS 22.49').map((t) => t.requirement.speed)).toEqual(['80 km/h']);
  });

  it('takes only confirmed rows, each with its source, a unique id and the applicability note', () => {
    const ids = REQUIREMENT_TEMPLATES.map((t) => t.id);
    expect(new Set(ids).size).toBe(ids.length);
    for (const t of REQUIREMENT_TEMPLATES) {
      expect(t.status).toBe('confirmed');
      expect(t.note).toMatch(/certification basis/);
      expect(t.note).toMatch(/applicable authority/);
      expect(String(t.requirement.label)).toContain(t.source);
      // Rows core/methods.md marks from memory or secondary: CS-VLA 49, light-sport and MOSAIC stall speeds, 23.2110.
      expect(t.source).not.toMatch(/CS-VLA|MOSAIC|F2245|23\.2110|1\.1\b/);
    }
  });

  it('parses as loftpoint-concept/1 requirements once inserted into a demo concept', () => {
    for (const template of REQUIREMENT_TEMPLATES) {
      const engines = template.engines ?? 1;
      const slug = engines === 1 && template.requirement.kind === 'stall' ? 'trainer' : template.source.includes('25.') ? 'business-jet' : 'utility-twin';
      const { parsed } = insert(template, slug, template.engines);
      expect(parsed.ok ? [] : parsed.issues, template.id).toEqual([]);
      if (!parsed.ok) continue;
      const added = parsed.design.requirements[parsed.design.requirements.length - 1];
      expect(added.kind).toBe(template.requirement.kind);
      if (added.kind === 'climb-gradient') {
        const percent = Number.parseFloat(String(template.requirement.gradient));
        expect(added.gradient).toBeCloseTo(percent / 100, 12);
      }
    }
  });
});

describe('templateRequirement', () => {
  const secondSegment = REQUIREMENT_TEMPLATES.find((t) => t.id === '14cfr-25.121b-2eng') as RequirementTemplate;
  const balked = REQUIREMENT_TEMPLATES.find((t) => t.id === '14cfr-23.77a') as RequirementTemplate;

  it('refuses an engine-out rule for a single-engine concept, naming the field', () => {
    const result = templateRequirement(secondSegment, { configurations: ['clean'], requirementIds: [], engines: 1 });
    expect(result).toEqual({ ok: false, message: expect.stringMatching(/aircraft\.propulsion\.engines/) });
  });

  it('gives the requirement an id the concept does not use yet', () => {
    const result = templateRequirement(secondSegment, { configurations: ['clean'], requirementIds: ['14cfr-25.121b-2eng', '14cfr-25.121b-2eng-2'], engines: 2 });
    expect(result.ok && result.requirement.id).toBe('14cfr-25.121b-2eng-3');
  });

  it('flies in the configuration the rule means, or says which to define', () => {
    const withLanding = templateRequirement(balked, { configurations: ['clean', 'landing'], requirementIds: [], engines: 1 });
    expect(withLanding.ok && withLanding.requirement.configuration).toBe('landing');
    const without = templateRequirement(balked, { configurations: ['clean'], requirementIds: [], engines: 1 });
    expect(without.ok && without.requirement.configuration).toBe(undefined);
    expect(without.ok && without.notes.join(' ')).toMatch(/define aircraft\.aero\.configurations\.landing/);
  });

  it('notes a 25.121 row written for another engine count', () => {
    const result = templateRequirement(secondSegment, { configurations: ['clean'], requirementIds: [], engines: 3 });
    expect(result.ok && result.notes.join(' ')).toMatch(/for 2 engines; the concept has 3/);
  });
});

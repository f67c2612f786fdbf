/**
 * Speed factors are named after their speed. Files written with the older
 * bare `speedFactor` (approach-speed and climb-gradient requirements) read as
 * before, with no warning, and give the same evaluation as the new names.
 */
import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, evaluateDesign, parseConcept, renameOlderFields, type ConceptDocument } from '../../../core';

const jet = () => structuredClone(DEMO_CONCEPTS.find((d) => d.slug === 'business-jet')!.concept) as unknown as ConceptDocument & { requirements: Record<string, unknown>[] };

/** The jet with its approach and second-segment factors under the given names. */
function jetWith(approachKey: string, climbKey: string) {
  const c = jet();
  for (const r of c.requirements) {
    delete r.approachSpeedFactor;
    if (r.kind === 'approach-speed') r[approachKey] = 1.25;
    if (r.kind === 'climb-gradient') r[climbKey] = 1.25;
  }
  return c;
}

describe('older speed-factor names', () => {
  it('read as the new names, with the same evaluation and no warning', () => {
    const older = parseConcept(jetWith('speedFactor', 'speedFactor'));
    const newer = parseConcept(jetWith('approachSpeedFactor', 'climbSpeedFactor'));
    if (!older.ok || !newer.ok) throw new Error('both must read');
    expect(older.warnings).toEqual(newer.warnings);
    expect(older.warnings.map((w) => w.code)).not.toContain('format-migrated');
    expect(evaluateDesign(older.design)).toEqual(evaluateDesign(newer.design));
    // 1.25 rather than the defaults (1.3 approach, 1.2 climb, core/methods.md section 6.3) shows the old value was read.
    const approach = older.design.requirements.find((r) => r.kind === 'approach-speed') as { speedFactor: number };
    const climb = older.design.requirements.find((r) => r.kind === 'climb-gradient') as { speedFactor: number };
    expect([approach.speedFactor, climb.speedFactor]).toEqual([1.25, 1.25]);
    // What is written back carries the new names only.
    const written = older.concept.requirements.filter((r) => r.kind === 'approach-speed' || r.kind === 'climb-gradient');
    for (const r of written) expect(Object.keys(r)).not.toContain('speedFactor');
    expect(written.find((r) => r.kind === 'approach-speed')).toHaveProperty('approachSpeedFactor', 1.25);
  });

  it('refuses a requirement that gives both names, naming the older field', () => {
    const c = jetWith('speedFactor', 'climbSpeedFactor');
    const approach = c.requirements.findIndex((r) => r.kind === 'approach-speed');
    c.requirements[approach]!.approachSpeedFactor = 1.3;
    const result = parseConcept(c);
    expect(result.ok ? [] : result.issues).toEqual([
      { path: `requirements[${approach}].speedFactor`, message: 'is the older name of approachSpeedFactor, which is also given; keep only approachSpeedFactor' },
    ]);
  });

  it('leaves other kinds alone: speedFactor on a cruise requirement is still an unknown field', () => {
    const c = jet();
    const cruise = c.requirements.findIndex((r) => r.kind === 'cruise');
    c.requirements[cruise]!.speedFactor = 1.2;
    const result = parseConcept(c);
    expect(result.ok ? [] : result.issues.map((i) => i.path)).toEqual([`requirements[${cruise}].speedFactor`]);
    expect(renameOlderFields(c)).toEqual({ ok: true, concept: c });
  });
});

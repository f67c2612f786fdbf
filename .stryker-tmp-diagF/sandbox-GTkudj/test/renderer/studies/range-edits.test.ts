// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { parseConcept, rangeableFields } from '../../../core';
import { clearRanges, excludeRange, fillTypicalRanges, includeRange, setRangeValue, setStudyNumber } from '../../../app/renderer/lib/studies/range-edits';
import { rangeEntries, rangeGroups } from '../../../app/renderer/lib/studies/range-rows';
import { removeRequirement, type ConceptDocument } from '../../../app/renderer/lib/concept/edit';
import { demoDocument, designOf } from './fixtures';

function issuesOf(document: ConceptDocument) {
  const parsed = parseConcept(document);
  return parsed.ok ? [] : parsed.issues;
}

describe('the Ranges panel rows', () => {
  it('lists every rangeable assumption once, grouped as the Assumptions panel groups them', () => {
    const document = demoDocument('trainer');
    const design = designOf(document);
    const groups = rangeGroups(design, document);
    expect(groups.flatMap((group) => group.rows.map((row) => row.field)).sort()).toEqual([...rangeableFields(design)].sort());
    expect(groups.slice(0, 4).map((group) => group.title)).toEqual(['Aerodynamics', 'Clean', 'Take-off flaps', 'Landing flaps']);
    // A piston engine's lapse follows Gagg-Ferrar, not sigma^m: there is no lapse exponent to range (core/methods.md section 5).
    expect(groups.some((group) => group.title === 'Propulsion')).toBe(false);
    const aspect = groups[0].rows.find((row) => row.field === 'aircraft.aero.aspectRatio');
    // core/methods.md section 9: aspect ratio 6-8 for general aviation (common practice).
    expect(aspect?.typical).toMatchObject({ low: 6, high: 8, widened: false });
    expect(aspect?.typical?.source).toContain('methods reference, section 9');
    expect(aspect?.index).toBe(-1);
    // core/methods.md publishes no range for the linear drag term K1.
    expect(groups[0].rows.find((row) => row.field === 'aircraft.aero.cdLinear')?.typical).toBeNull();
  });

  it('shows a turbofan concept on the density lapse its lapse exponent with the published turbofan range, and one on the Mach-aware lapse none', () => {
    expect(rangeGroups(designOf(demoDocument('business-jet')), demoDocument('business-jet')).flatMap((g) => g.rows).some((r) => r.field === 'aircraft.propulsion.lapseExponent')).toBe(false);
    const document = demoDocument('business-jet');
    (document as unknown as { aircraft: { propulsion: Record<string, unknown> } }).aircraft.propulsion = { kind: 'turbofan', engines: 2, lapseModel: 'density', lapseExponent: 1 };
    const rows = rangeGroups(designOf(document), document).flatMap((group) => group.rows);
    const lapse = rows.find((row) => row.field === 'aircraft.propulsion.lapseExponent');
    // core/methods.md section 5: turbofan lapse exponent 0.6-1 (common range).
    expect(lapse?.typical).toMatchObject({ low: 0.6, high: 1 });
    // A jet uses no propeller: no requirement offers a propeller efficiency.
    expect(rows.some((row) => row.field.endsWith('.propellerEfficiency'))).toBe(false);
  });
});

describe('edits of the uncertainty block', () => {
  it('fills the published typical range on every assumption that has one, and the concept still reads', () => {
    const document = demoDocument('trainer');
    const design = designOf(document);
    const filled = fillTypicalRanges(document, design, rangeableFields(design));
    expect(issuesOf(filled)).toEqual([]);
    const entries = rangeEntries(filled);
    const withTypical = rangeGroups(design, document).flatMap((group) => group.rows).filter((row) => row.typical !== null);
    expect(entries.map((entry) => entry.field)).toEqual(withTypical.map((row) => row.field));
    expect(entries.find((entry) => entry.field === 'aircraft.aero.aspectRatio')).toMatchObject({ low: 6, high: 8 });
    // The input document is left as it was, so the edit can be undone.
    expect(document.uncertainty).toBeUndefined();
  });

  it('keeps a chosen distribution and a range of the engineer own where nothing is published', () => {
    const document = demoDocument('trainer');
    const design = designOf(document);
    let edited = includeRange(document, 'aircraft.aero.cdLinear', -0.005, 0.005);
    edited = includeRange(edited, 'aircraft.aero.aspectRatio', 7, 7.6, 'triangular');
    const filled = fillTypicalRanges(edited, design, rangeableFields(design));
    const entries = rangeEntries(filled);
    expect(entries[0]).toEqual({ field: 'aircraft.aero.cdLinear', low: -0.005, high: 0.005, distribution: undefined });
    expect(entries[1]).toEqual({ field: 'aircraft.aero.aspectRatio', low: 6, high: 8, distribution: 'triangular' });
  });

  it('includes and excludes a range, leaving the others in place', () => {
    const document = demoDocument('trainer');
    const one = includeRange(document, 'aircraft.aero.aspectRatio', 6, 8);
    const two = includeRange(one, 'aircraft.aero.configurations.clean.oswaldEfficiency', 0.7, 0.95);
    const back = excludeRange(two, 0);
    expect(rangeEntries(back).map((entry) => entry.field)).toEqual(['aircraft.aero.configurations.clean.oswaldEfficiency']);
    expect(rangeEntries(clearRanges(two))).toEqual([]);
  });

  it('writes uniform, the file default, by leaving the distribution out', () => {
    const document = includeRange(demoDocument('trainer'), 'aircraft.aero.aspectRatio', 6, 8, 'triangular');
    const uniform = setRangeValue(document, 0, 'distribution', 'uniform');
    expect((uniform.uncertainty as { parameters: object[] }).parameters[0]).toEqual({ field: 'aircraft.aero.aspectRatio', low: 6, high: 8 });
  });

  it('gets the schema message with the field path for a range that leaves out the concept value', () => {
    // The trainer's own aspect ratio is 7.4; a low end of 7.9 leaves it outside the range.
    const document = setRangeValue(includeRange(demoDocument('trainer'), 'aircraft.aero.aspectRatio', 6, 8), 0, 'low', 7.9);
    const issues = issuesOf(document);
    expect(issues[0].path).toBe('uncertainty.parameters[0].low');
    expect(issues[0].message).toContain("above the concept's value 7.4");
  });

  it('gets the schema message for too few samples, and drops the value again on undefined', () => {
    const document = demoDocument('trainer');
    const few = setStudyNumber(document, 'samples', 50);
    expect(issuesOf(few)[0]).toMatchObject({ path: 'uncertainty.samples' });
    expect(setStudyNumber(few, 'samples', undefined).uncertainty).toEqual({});
  });

  it('names a range whose requirement is gone (a file written elsewhere), so the panel can offer to drop it', () => {
    const document = includeRange(demoDocument('trainer'), 'requirements.cruise.propellerEfficiency', 0.75, 0.85);
    // Removing the requirement in the window takes its ranges with it; a file edited by hand can still hold one.
    expect(issuesOf(removeRequirement(document, (document.requirements as Array<{ id: string }>).findIndex((r) => r.id === 'cruise')))).toEqual([]);
    const stray = { ...document, requirements: (document.requirements as Array<{ id: string }>).filter((r) => r.id !== 'cruise') };
    expect(issuesOf(stray)[0]).toMatchObject({ path: 'uncertainty.parameters[0].field' });
    expect(issuesOf(stray)[0].message).toContain('no requirement has the id "cruise"');
    expect(issuesOf(excludeRange(stray, 0))).toEqual([]);
  });
});

/**
 * Messages for hostile or careless input stay true and short: deep nesting
 * is called deep nesting, a missing propulsion kind is called missing, and a
 * huge bad value is cut with an ellipsis rather than repeated. (Common
 * practice for one-line error messages; the concept format's propulsion kinds
 * are listed in the schema.)
 */
// @ts-nocheck

import { describe, expect, it } from 'vitest';
import { DEMO_CONCEPTS, parseConceptText } from '../../../core';

function issuesOf(text: string) {
  const parsed = parseConceptText(text);
  expect(parsed.ok).toBe(false);
  return parsed.ok ? [] : parsed.issues;
}

const trainer = () => structuredClone(DEMO_CONCEPTS[0].concept) as any;

describe('messages for hostile input', () => {
  it('says JSON nested 5,000 levels deep is nested too deep (not a stack overflow)', () => {
    const deep = `${'['.repeat(5000)}${']'.repeat(5000)}`;
    const [issue] = issuesOf(`{"format": "loftpoint-concept/1", "name": ${deep}}`);
    expect(issue.message).toMatch(/nested more than \d+ levels deep/);
    expect(issue.message).not.toMatch(/call stack/i);
  });

  it('still reads a concept nested a sensible few levels', () => {
    expect(parseConceptText(JSON.stringify(trainer())).ok).toBe(true);
  });

  it('says a missing propulsion kind is missing, not "unknown propulsion kind undefined"', () => {
    const concept = trainer();
    delete concept.aircraft.propulsion.kind;
    const issues = issuesOf(JSON.stringify(concept));
    const issue = issues.find((entry) => entry.path === 'aircraft.propulsion.kind');
    expect(issue?.message).toMatch(/^is missing; give the propulsion kind, one of /);
    expect(issue?.message).not.toContain('undefined');
  });

  it('cuts a 100 KB bad value with an ellipsis', () => {
    const concept = trainer();
    concept.aircraft.takeoffMass = `750 ${'x'.repeat(100_000)}`;
    concept.aircraft.propulsion.kind = 'y'.repeat(100_000);
    const issues = issuesOf(JSON.stringify(concept));
    expect(issues.length).toBeGreaterThan(0);
    for (const issue of issues) {
      expect(issue.message.length, issue.path).toBeLessThan(600);
    }
    expect(issues.find((entry) => entry.path === 'aircraft.takeoffMass')?.message).toMatch(/…/);
    expect(issues.find((entry) => entry.path === 'aircraft.propulsion.kind')?.message).toMatch(/…/);
  });
});

describe('plain numbers too large to compute with', () => {
  it('refuses an aspect ratio of -1.34e154 (its square overflows double precision, max about 1.8e308), naming the field', () => {
    expect((-1.3407807929942597e154) ** 2).toBe(Infinity);
    const concept = trainer();
    concept.aircraft.aero.aspectRatio = -1.3407807929942597e154;
    const issues = issuesOf(JSON.stringify(concept));
    expect(issues[0].path).toBe('aircraft.aero.aspectRatio');
    expect(issues[0].message).toMatch(/too large a number to compute with/);
  });
});

describe('a misspelt field', () => {
  it('is reported before the missing field it was meant to be, with the nearest known name', () => {
    // "aspectRatoi" is two transposed letters from "aspectRatio" (edit distance 2, Levenshtein 1966).
    const concept = trainer();
    concept.aircraft.aero.aspectRatoi = concept.aircraft.aero.aspectRatio;
    delete concept.aircraft.aero.aspectRatio;
    const issues = issuesOf(JSON.stringify(concept));
    expect(issues.map((i) => i.path)).toEqual(['aircraft.aero.aspectRatoi', 'aircraft.aero.aspectRatio']);
    expect(issues[0].message).toMatch(/did you mean "aspectRatio"\?/);
    expect(issues[1].message).toMatch(/is required/);
  });

  it('keeps document order for an unknown field with no missing partner', () => {
    const concept = trainer();
    concept.aircraft.aero.aspectRatoi = 8;
    concept.requirements[0].speeed = '40 kt';
    const paths = issuesOf(JSON.stringify(concept)).map((i) => i.path);
    expect(paths).toEqual(['aircraft.aero.aspectRatoi', 'requirements[0].speeed']);
  });
});

// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { parseConceptText } from '../../../core/concept';
import { EXAMPLE_TEXT } from './fixture';

function onlyIssue(text: string, source?: string) {
  const parsed = parseConceptText(text, source);
  expect(parsed.ok).toBe(false);
  if (parsed.ok) throw new Error('expected an issue');
  expect(parsed.issues).toHaveLength(1);
  return parsed.issues[0];
}

// Line and column count from 1; a column is a character position in its line.
const MALFORMED: Array<[what: string, text: string, line: number, column: number, reason: RegExp]> = [
  ['a trailing comma', '{\n  "format": "loftpoint-concept/1",\n}', 3, 1, /trailing commas are not allowed/],
  ['a missing comma', '{\n  "name": "a"\n  "format": "x"\n}', 3, 3, /expected "," or "}" after the value of "name"/],
  ['a comment', '{\n  // trainer\n  "name": "a"\n}', 2, 3, /comments are not allowed in JSON/],
  ['single quotes', "{ 'name': 'a' }", 1, 3, /double quotes, not single quotes/],
  ['an unquoted name', '{ name: "a" }', 1, 3, /property names must be in double quotes/],
  ['an unquoted value', '{ "speed": 45 kt }', 1, 15, /expected "," or "}"/],
  ['a bare word', '{ "speed": fast }', 1, 12, /text values must be in double quotes/],
  ['a leading zero', '{ "samples": 0131 }', 1, 14, /not a valid JSON number/],
  ['a line break in a string', '{ "name": "two\nlines" }', 1, 15, /line break/],
  ['an unclosed string', '{ "name": "open }', 1, 11, /never closed/],
  ['text that stops early', '{ "requirements": [ 1, 2', 1, 25, /ends too early/],
  ['text after the document', '{ }\n{ }', 2, 1, /more text after the end/],
  ['no text at all', '   \n ', 2, 2, /the text is empty/],
  ['a bad escape', '{ "name": "a\\qb" }', 1, 13, /escape/],
];

describe('parseConceptText: malformed JSON', () => {
  it.each(MALFORMED)('%s is reported at its line and column', (_what, text, line, column, reason) => {
    const issue = onlyIssue(text, 'trainer.json');
    expect(issue.path).toBe('');
    expect(issue.message).toContain(`not valid JSON at line ${line}, column ${column} of trainer.json: `);
    expect(issue.message).toMatch(reason);
  });

  it('agrees with JSON.parse about what is malformed', () => {
    for (const [, text] of MALFORMED) expect(() => JSON.parse(text)).toThrow();
  });

  it('leaves out the source when none is given', () => {
    expect(onlyIssue('{,}').message).toMatch(/^not valid JSON at line 1, column 2: /);
  });

  it('counts lines in a concept file with Windows line endings', () => {
    const text = EXAMPLE_TEXT.replace(/\n/g, '\r\n').replace('"aspectRatio": 7.5,', '"aspectRatio": 7.5,,');
    const issue = onlyIssue(text);
    // "aspectRatio" is on line 7 of the DESIGN.md example; the second comma is at column 26.
    expect(issue.message).toMatch(/line 7, column 26/);
  });

  it('refuses a key written twice, naming its path, instead of keeping the last', () => {
    const text = EXAMPLE_TEXT.replace('"speed": "45 kt",', '"speed": "45 kt", "speed": "54 kt",');
    const issue = onlyIssue(text, 'trainer.json');
    expect(issue.path).toBe('requirements[0].speed');
    expect(issue.message).toMatch(/^"speed" appears twice in the same object; keep one \(line 18, column \d+ of trainer\.json\)$/);
  });
});

describe('parseConceptText: good text', () => {
  it('reads the DESIGN.md example, with or without a byte-order mark', () => {
    const plain = parseConceptText(EXAMPLE_TEXT);
    const marked = parseConceptText(`\uFEFF${EXAMPLE_TEXT}`);
    expect(plain.ok).toBe(true);
    expect(marked).toEqual(plain);
  });

  it('reads text that JSON.parse reads: escapes, exponents, nesting, whitespace', () => {
    const text = EXAMPLE_TEXT.replace('"Example trainer"', '"Example \\"trainer\\" \\u00e9\\n"').replace('"cdLinear": 0', '"cdLinear": -1.5e-3');
    const parsed = parseConceptText(text);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    expect(parsed.concept).toEqual(JSON.parse(text));
    expect(parsed.design.name).toBe('Example "trainer" é');
    expect(parsed.design.aircraft.cdLinear).toBe(-0.0015);
  });

  it('passes field problems through with their paths', () => {
    const parsed = parseConceptText(EXAMPLE_TEXT.replace('"750 kg"', '750'));
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues[0].path).toBe('aircraft.takeoffMass');
  });
});

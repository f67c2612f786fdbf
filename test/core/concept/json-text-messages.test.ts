/**
 * The exact one-line message for each kind of malformed concept text, and the
 * place it points at. What is malformed follows the JSON grammar (ECMA-404,
 * 2nd edition, 2017; RFC 8259): no trailing commas, no comments, strings in
 * double quotes with the escapes \" \\ \/ \b \f \n \r \t \uXXXX, no control
 * characters inside strings, numbers without a leading + or leading zeros.
 * Columns are counted by hand from 1 in each comment.
 */
import { describe, expect, it } from 'vitest';
import { parseConceptText } from '../../../core/concept';
import { EXAMPLE_TEXT } from './fixture';

function onlyIssue(text: string) {
  const parsed = parseConceptText(text);
  if (parsed.ok) throw new Error('expected an issue');
  expect(parsed.issues).toHaveLength(1);
  return parsed.issues[0];
}

const message = (text: string) => onlyIssue(text).message;

/** What a well-formed document that is not a concept is told: it is read as JSON, then refused as a concept. */
const NOT_AN_OBJECT = 'a concept must be a JSON object { "format": "loftpoint-concept/1", ... }';

describe('malformed text: exact messages and places', () => {
  it.each([
    // { "a": 1, }   the "}" is the 11th character.
    ['{ "a": 1, }', 'not valid JSON at line 1, column 11: a comma before "}" (trailing commas are not allowed in JSON)'],
    // [1, ]   the "]" is the 5th.
    ['[1, ]', 'not valid JSON at line 1, column 5: a comma before "]" (trailing commas are not allowed in JSON)'],
    // {"a":1 "b":2}   the second quote-mark starts at 8.
    ['{"a":1 "b":2}', 'not valid JSON at line 1, column 8: expected "," or "}" after the value of "a", but found "\\""'],
    ['{"a" 1}', 'not valid JSON at line 1, column 6: expected ":" after "a", but found "1"'],
    ['[1 2]', 'not valid JSON at line 1, column 4: expected "," or "]" in a list, but found "2"'],
    ['{"a":', 'not valid JSON at line 1, column 6: expected a value, but the text ends too early'],
    ['{"a": }', 'not valid JSON at line 1, column 7: expected a value, but found "}"'],
    ['{"a": 1', 'not valid JSON at line 1, column 8: expected "," or "}" after the value of "a", but the text ends too early'],
    ['[1', 'not valid JSON at line 1, column 3: expected "," or "]" in a list, but the text ends too early'],
    ['{', 'not valid JSON at line 1, column 2: expected a property name in double quotes, but the text ends too early'],
    ['{ /* note */ }', 'not valid JSON at line 1, column 3: expected a property name in double quotes, but comments are not allowed in JSON'],
    ['{"a": 1 // note\n}', 'not valid JSON at line 1, column 9: expected "," or "}" after the value of "a", but comments are not allowed in JSON'],
    // A lone slash is not a comment.
    ['{ / }', 'not valid JSON at line 1, column 3: expected a property name in double quotes, but found "/"'],
    ['{ 1: 2 }', 'not valid JSON at line 1, column 3: expected a property name in double quotes, but found "1"'],
    ["{ 'a': 1 }", 'not valid JSON at line 1, column 3: property names must be in double quotes, not single quotes'],
    ['{ _a: 1 }', 'not valid JSON at line 1, column 3: property names must be in double quotes'],
    ["{\"a\": 'x'}", 'not valid JSON at line 1, column 7: text must be in double quotes, not single quotes'],
    ['{"a": truex}', 'not valid JSON at line 1, column 7: text values must be in double quotes, e.g. "45 kt"'],
    ['{"a": nul}', 'not valid JSON at line 1, column 7: text values must be in double quotes, e.g. "45 kt"'],
    ['{"a": +1}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    ['{"a": .5}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    ['{"a": 1.}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    ['{"a": 1e}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    ['{"a": -}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    ['{"a": 12a}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    ['{"a": @}', 'not valid JSON at line 1, column 7: expected a value, but found "@"'],
    // A slash after another character is not a comment.
    ['{"a": 1 x/}', 'not valid JSON at line 1, column 9: expected "," or "}" after the value of "a", but found "x"'],
    // A minus must be followed by a digit, not by something else and then a number.
    ['{"a": -@1}', 'not valid JSON at line 1, column 7: not a valid JSON number (no leading +, leading zeros, or bare dots)'],
    // \q is no escape even when four hexadecimal digits follow it.
    ['{"a": "\\q0123"}', 'not valid JSON at line 1, column 8: a backslash in a string must start an escape such as \\" or \\\\'],
    // The tab inside the string is the 8th character.
    ['{"a": "x\ty"}', 'not valid JSON at line 1, column 9: a line break or control character inside a string; write it as \\n'],
    ['{"a": "x\u001fy"}', 'not valid JSON at line 1, column 9: a line break or control character inside a string; write it as \\n'],
    ['{"a": "x\\qy"}', 'not valid JSON at line 1, column 9: a backslash in a string must start an escape such as \\" or \\\\'],
    ['{"a": "x\\u00g1"}', 'not valid JSON at line 1, column 9: a backslash in a string must start an escape such as \\" or \\\\'],
    ['{"a": "x\\', 'not valid JSON at line 1, column 9: a backslash in a string must start an escape such as \\" or \\\\'],
    ['{"a": "open', 'not valid JSON at line 1, column 7: this string is never closed with "'],
    ['{} []', 'not valid JSON at line 1, column 4: more text after the end of the JSON document'],
    ['', 'not valid JSON at line 1, column 1: the text is empty; a concept is a JSON object { ... }'],
    [' \t\r\n ', 'not valid JSON at line 2, column 2: the text is empty; a concept is a JSON object { ... }'],
    ['\uFEFF', 'not valid JSON at line 1, column 1: the text is empty; a concept is a JSON object { ... }'],
  ])('%j', (text, expected) => {
    expect(() => JSON.parse(text.replace(/^\uFEFF/, ''))).toThrow();
    expect(onlyIssue(text)).toEqual({ path: '', message: expected });
  });

  it('counts lines and columns after line breaks', () => {
    // Line 3 is `  "b": ,`; the comma is its 8th character.
    expect(message('{\n  "a": 1,\n  "b": ,\n}')).toBe('not valid JSON at line 3, column 8: expected a value, but found ","');
  });
});

describe('well-formed text that is not a concept reaches the concept checks', () => {
  it.each([
    ['1'],
    ['-0.5e+3'],
    ['1e5'],
    ['2E10'],
    ['1e-10'],
    ['true'],
    ['null'],
    ['"text"'],
    ['[]'],
    ['[1, "a", true, null, {}]'],
    [' \t\r\n[ 1 ,\t2 ]\r\n'],
  ])('%j is JSON, so it is refused only as a concept', (text) => {
    expect(() => JSON.parse(text)).not.toThrow();
    expect(onlyIssue(text)).toEqual({ path: '', message: NOT_AN_OBJECT });
  });

  it('reads every escape JSON allows inside a string', () => {
    const text = EXAMPLE_TEXT.replace('"Example trainer"', '"a\\"b\\\\c\\/d\\be\\ff\\ng\\rh\\ti\\u0041 j"');
    const parsed = parseConceptText(text);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    expect(parsed.concept.name).toBe('a"b\\c/d\be\ff\ng\rh\ti\u0041 j');
  });

  it('reads a space and other characters from 0x20 up inside a string', () => {
    const text = EXAMPLE_TEXT.replace('"Example trainer"', '" !~é"');
    const parsed = parseConceptText(text);
    if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
    expect(parsed.concept.name).toBe(' !~é');
  });

  it('reads a document without a format as JSON and asks for the format', () => {
    expect(onlyIssue('{"a": {"b": [1, {"c": "d"}]}, "e": {"b": 2}}')).toEqual({
      path: 'format',
      message: 'is missing; this build reads loftpoint-concept/1 (add "format": "loftpoint-concept/1")',
    });
  });
});

describe('a key written twice', () => {
  it('names the path of the second one, through lists and objects', () => {
    const text = '{"format": "loftpoint-concept/1", "requirements": [{"id": "a"}, {"id": "b", "x": [1, 2], "id": "c"}]}';
    // The second "id" of the second requirement starts at the 90th character.
    expect(onlyIssue(text)).toEqual({
      path: 'requirements[1].id',
      message: '"id" appears twice in the same object; keep one (line 1, column 90)',
    });
  });

  it('is allowed once in each of two objects', () => {
    expect(onlyIssue('{"a": {"id": 1}, "b": {"id": 1}}').path).toBe('format');
  });
});

describe('nesting', () => {
  const head = '{"format": "loftpoint-concept/1", "name": ';

  it('reads 256 levels (the object and 255 lists) and refuses 257 at the 257th opening', () => {
    const ok = parseConceptText(`${head}${'['.repeat(255)}${']'.repeat(255)}}`);
    expect(ok.ok).toBe(false);
    if (!ok.ok) expect(ok.issues[0].path).toBe('name');
    const deep = `${head}${'['.repeat(256)}${']'.repeat(256)}}`;
    // The 256th "[" is the 257th opening: its column is head's length plus 256.
    expect(onlyIssue(deep)).toEqual({
      path: '',
      message: `not valid JSON at line 1, column ${head.length + 256}: objects and lists are nested more than 256 levels deep; a concept needs only a few levels`,
    });
  });

  it.each([
    ['empty lists', '[]'],
    ['lists', '[1]'],
    ['empty objects', '{}'],
    ['objects', '{"a": 1}'],
  ])('counts 300 %s side by side as one level', (_what, item) => {
    const parsed = parseConceptText(`${head}[${Array(300).fill(item).join(', ')}]}`);
    expect(parsed.ok).toBe(false);
    if (!parsed.ok) expect(parsed.issues[0].path).toBe('name');
  });
});

/**
 * JSON text with the place of the first mistake (line and column) and a
 * plain description, the same on every JavaScript engine. Also refuses a
 * key written twice in one object, which JSON.parse would quietly resolve
 * by keeping the last.
 */

type JsonText =
  | { ok: true; value: unknown }
  | { ok: false; line: number; column: number; reason: string; path?: PropertyKey[] };

class Mistake {
  constructor(
    readonly at: number,
    readonly reason: string,
    readonly path?: PropertyKey[],
  ) {}
}

function describeAt(text: string, i: number): string {
  if (i >= text.length) return 'the text ends too early';
  const c = text[i];
  if (c === '/' && (text[i + 1] === '/' || text[i + 1] === '*')) return 'comments are not allowed in JSON';
  return `unexpected ${JSON.stringify(c)}`;
}

/** How deep objects and lists may nest; a concept needs fewer than ten levels. */
export const MAX_NESTING = 256;

/** Check the text's grammar; throws a Mistake at the first error. */
function scan(text: string): void {
  let i = 0;
  let depth = 0;
  const enter = () => {
    if (++depth > MAX_NESTING) fail(i, `objects and lists are nested more than ${MAX_NESTING} levels deep; a concept needs only a few levels`);
  };
  const path: PropertyKey[] = [];
  const fail = (at: number, reason: string, where?: PropertyKey[]): never => {
    throw new Mistake(at, reason, where);
  };
  const space = () => {
    while (i < text.length && ' \t\n\r'.includes(text[i])) i++;
  };
  const expect = (what: string): never => fail(i, `expected ${what}, but ${describeAt(text, i).replace(/^unexpected /, 'found ')}`);
  const string = (): string => {
    const start = i++;
    while (i < text.length && text[i] !== '"') {
      const c = text.charCodeAt(i);
      if (c < 0x20) fail(i, 'a line break or control character inside a string; write it as \\n');
      if (text[i] === '\\') {
        const e = text[i + 1];
        if (e === 'u' && /^[0-9a-fA-F]{4}$/.test(text.slice(i + 2, i + 6))) i += 6;
        else if (e !== undefined && '"\\/bfnrt'.includes(e)) i += 2;
        else fail(i, 'a backslash in a string must start an escape such as \\" or \\\\');
      } else i++;
    }
    if (i >= text.length) fail(start, 'this string is never closed with "');
    i++;
    return JSON.parse(text.slice(start, i)) as string;
  };
  const value = (): void => {
    space();
    const c = text[i];
    if (c === '{') return object();
    if (c === '[') return array();
    if (c === '"') return void string();
    const literal = /^(?:true|false|null|-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?)/.exec(text.slice(i, i + 400));
    if (literal && !/[\w.]/.test(text[i + literal[0].length] ?? '')) {
      i += literal[0].length;
      return;
    }
    if (c === "'") fail(i, 'text must be in double quotes, not single quotes');
    if (/[\d.+-]/.test(c ?? '')) fail(i, 'not a valid JSON number (no leading +, leading zeros, or bare dots)');
    if (/[A-Za-z]/.test(c ?? '')) fail(i, 'text values must be in double quotes, e.g. "45 kt"');
    expect('a value');
  };
  const object = (): void => {
    enter();
    i++;
    const keys = new Set<string>();
    space();
    if (text[i] === '}') return void (depth--, i++);
    for (;;) {
      space();
      if (text[i] === '}') fail(i, 'a comma before "}" (trailing commas are not allowed in JSON)');
      if (text[i] !== '"') {
        if (text[i] === "'") fail(i, 'property names must be in double quotes, not single quotes');
        if (/[A-Za-z_]/.test(text[i] ?? '')) fail(i, 'property names must be in double quotes');
        expect('a property name in double quotes');
      }
      const keyAt = i;
      const key = string();
      if (keys.has(key)) fail(keyAt, `"${key}" appears twice in the same object; keep one`, [...path, key]);
      keys.add(key);
      space();
      if (text[i] !== ':') expect(`":" after "${key}"`);
      i++;
      path.push(key);
      value();
      path.pop();
      space();
      if (text[i] === ',') i++;
      else if (text[i] === '}') return void (depth--, i++);
      else expect(`"," or "}" after the value of "${key}"`);
    }
  };
  const array = (): void => {
    enter();
    i++;
    space();
    if (text[i] === ']') return void (depth--, i++);
    for (let n = 0; ; n++) {
      space();
      if (text[i] === ']') fail(i, 'a comma before "]" (trailing commas are not allowed in JSON)');
      path.push(n);
      value();
      path.pop();
      space();
      if (text[i] === ',') i++;
      else if (text[i] === ']') return void (depth--, i++);
      else expect('"," or "]" in a list');
    }
  };
  space();
  if (i >= text.length) fail(i, 'the text is empty; a concept is a JSON object { ... }');
  value();
  space();
  if (i < text.length) fail(i, 'more text after the end of the JSON document');
}

function place(text: string, at: number): { line: number; column: number } {
  const before = text.slice(0, at);
  const line = before.split('\n').length;
  return { line, column: at - before.lastIndexOf('\n') };
}

/** Parse JSON text; a leading byte-order mark is allowed. */
export function parseJsonText(input: string): JsonText {
  const text = input.charCodeAt(0) === 0xfeff ? input.slice(1) : input;
  try {
    scan(text);
    return { ok: true, value: JSON.parse(text) };
  } catch (error) {
    if (error instanceof Mistake) {
      return { ok: false, ...place(text, error.at), reason: error.reason, ...(error.path ? { path: error.path } : {}) };
    }
    const reason = error instanceof Error ? error.message : String(error);
    return { ok: false, line: 1, column: 1, reason };
  }
}

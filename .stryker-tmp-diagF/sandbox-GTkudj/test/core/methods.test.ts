/**
 * The methods reference (core/methods.md) holds a section for every
 * requirement kind and propulsion kind, written from their descriptors, and
 * numbered sections a reader can cite. Run with LOFTPOINT_WRITE_METHODS=1 to
 * rewrite the generated blocks after changing a descriptor.
 */
// @ts-nocheck

import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { generatedMethodsBlocks } from '../../core/methods-generated';
import { PROPULSION_DESCRIPTORS } from '../../core/propulsion/kinds';
import { REQUIREMENT_DESCRIPTORS } from '../../core/requirements';

const FILE = resolve(__dirname, '../../core/methods.md');

function withBlocks(text: string, blocks: Record<string, string>): string {
  let out = text;
  for (const [name, body] of Object.entries(blocks)) {
    const pattern = new RegExp(`(<!-- generated:${name} -->\\n)[\\s\\S]*?(<!-- end generated:${name} -->)`);
    expect(pattern.test(out), `markers of the generated block "${name}"`).toBe(true);
    out = out.replace(pattern, (_, open: string, close: string) => `${open}${body}\n${close}`);
  }
  return out;
}

describe('the methods reference', () => {
  const blocks = generatedMethodsBlocks();
  let text = readFileSync(FILE, 'utf8');
  if (process.env.LOFTPOINT_WRITE_METHODS === '1') {
    text = withBlocks(text, blocks);
    writeFileSync(FILE, text);
  }

  it('matches the descriptors and the typical-range table (LOFTPOINT_WRITE_METHODS=1 rewrites it)', () => {
    expect(text).toBe(withBlocks(text, blocks));
  });

  it('has a section for every requirement kind and every propulsion kind', () => {
    for (const d of REQUIREMENT_DESCRIPTORS) {
      expect(d.methods.startsWith('### '), d.kind).toBe(true);
      expect(text, d.kind).toContain(`(\`${d.kind}\`)`);
      // Each kind names its published source.
      expect(d.methods, d.kind).toMatch(/Source: /);
    }
    for (const d of PROPULSION_DESCRIPTORS) expect(text, d.kind).toContain(d.methods);
  });

  it('numbers its sections 1 to 11 in order, so the report and the window can cite them', () => {
    const numbers = [...text.matchAll(/^## (\d+)\. /gm)].map((m) => Number(m[1]));
    expect(numbers).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11]);
  });

  it('carries the caution', () => {
    expect(text).toMatch(/Certification requirements come from the applicable authority/);
    expect(text).toMatch(/licensed engineering review/);
  });
});

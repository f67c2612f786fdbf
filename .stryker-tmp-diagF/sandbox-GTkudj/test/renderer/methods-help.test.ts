/**
 * The window's Help shows the methods reference (core/methods.md) block by
 * block: every numbered section a heading, equations kept as written, and no
 * marker or Markdown syntax left in the text a reader sees.
 */
// @ts-nocheck

import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { methodsBlocks } from '../../app/renderer/lib/help/methods-blocks';

const text = readFileSync(resolve(__dirname, '../../core/methods.md'), 'utf8');

describe('methods help', () => {
  const blocks = methodsBlocks(text);

  it('has a heading for every numbered section and every requirement kind', () => {
    const headings = blocks.flatMap((b) => (b.type === 'heading' ? [b.text] : []));
    for (let n = 1; n <= 11; n++) expect(headings.some((h) => h.startsWith(`${n}. `)), `section ${n}`).toBe(true);
    expect(headings).toContain('6.3.3 Take-off ground roll (takeoff-ground-roll)');
  });

  it('keeps the master equation as written (Mattingly, Heiser and Pratt, Aircraft Engine Design)', () => {
    expect(blocks.some((b) => b.type === 'equation' && b.text.startsWith('T_SL/W_TO = (beta/alpha) [ q C_D0/(beta w)'))).toBe(true);
  });

  it('keeps the caution as one quote', () => {
    const quotes = blocks.filter((b) => b.type === 'quote');
    expect(quotes).toHaveLength(1);
    expect(quotes[0].type === 'quote' && quotes[0].text).toMatch(/^Preliminary sizing only\..*licensed engineering review\.$/);
  });

  it('leaves no markers or Markdown emphasis in what it shows', () => {
    for (const b of blocks) {
      const shown = b.type === 'row' ? b.cells.join(' ') : b.text;
      expect(shown).not.toMatch(/<!--|\*\*|`/);
    }
  });
});

/**
 * Every typical range says where it comes from: its text, the window's note
 * and each published band name a source, or "common practice" / "from
 * memory" where there is no published one (the project's rule for check
 * values and defaults alike).
 */
import { describe, expect, it } from 'vitest';
import type { TypicalRange } from '../../../core/assumptions/typical-range';
import { band } from '../../../core/assumptions/typical-range';
import * as table from '../../../core/assumptions/typical-ranges';

const SOURCE = /common practice|from memory|Roskam|Raymer|Brandt|Table \d/;

function rangesOf(): Array<[string, TypicalRange]> {
  const out: Array<[string, TypicalRange]> = [];
  for (const [name, value] of Object.entries(table)) {
    if (value && typeof value === 'object' && 'low' in value) out.push([name, value as TypicalRange]);
    else if (value && typeof value === 'object') {
      for (const [role, range] of Object.entries(value as Record<string, TypicalRange | null>)) if (range) out.push([`${name}.${role}`, range]);
    }
  }
  return out;
}

describe('the typical-range table names its sources', () => {
  const ranges = rangesOf();

  it('holds every range of section 9 of the methods reference', () => {
    // Aspect ratio, clean CD0, three propeller rows, rolling and braking friction, ground-run CL,
    // and Oswald, CD0 increment and CLmax by role (CLmax has no "other" row): 8 + 4 + 4 + 3.
    expect(ranges.length).toBe(19);
  });

  for (const [name, range] of rangesOf()) {
    describe(name, () => {
      it('has low <= high', () => {
        expect(range.low).toBeLessThanOrEqual(range.high);
      });

      if (name === 'CD0_INCREMENT.clean') {
        it('is the reference itself: zero, no note, no band', () => {
          expect([range.low, range.high, range.note, range.bands]).toEqual([0, 0, '', []]);
          expect(range.text).toMatch(/clean is the reference/);
        });
        return;
      }

      it('names a source in its text and carries a note for the window', () => {
        expect(range.text).toMatch(SOURCE);
        expect(range.note.length).toBeGreaterThan(2);
      });

      it('starts the studies from at least one published band, each with its source and inside the bounds', () => {
        expect(range.bands.length).toBeGreaterThan(0);
        for (const b of range.bands) {
          expect(b.source).toMatch(SOURCE);
          expect(b.low).toBeLessThan(b.high);
          expect(b.low).toBeGreaterThanOrEqual(range.low);
          expect(b.high).toBeLessThanOrEqual(range.high);
        }
      });
    });
  }

  it('band() keeps what it is given', () => {
    expect(band(0.5, 0.6, 'take-off run (common practice)')).toEqual({ low: 0.5, high: 0.6, source: 'take-off run (common practice)' });
  });
});

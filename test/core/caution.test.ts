/**
 * The one caution every screen, report and human-readable output carries:
 * that this is preliminary sizing, that certification requirements come from
 * the applicable authority, and that final numbers need licensed engineering
 * review (the product's safety rule; common practice for design tools).
 */
import { describe, expect, it } from 'vitest';
import { PRELIMINARY_CAUTION } from '../../core/caution';

describe('PRELIMINARY_CAUTION', () => {
  it('says all three things, in one sentence', () => {
    expect(PRELIMINARY_CAUTION).toMatch(/^Preliminary sizing only: /);
    expect(PRELIMINARY_CAUTION).toContain('certification requirements come from the applicable authority');
    expect(PRELIMINARY_CAUTION).toContain('final numbers need licensed engineering review');
    expect(PRELIMINARY_CAUTION.endsWith('.')).toBe(true);
    expect(PRELIMINARY_CAUTION).not.toContain('\n');
  });
});

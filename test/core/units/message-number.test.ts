/** Numbers in error and warning lines: four significant figures, rounded half away from zero as written by hand. */
import { describe, expect, it } from 'vitest';
import { messageNumber } from '../../../core/units/message-number';

describe('messageNumber', () => {
  it('keeps four significant figures and drops trailing zeros', () => {
    expect(messageNumber(1234.5678)).toBe('1235');
    expect(messageNumber(0.000123456)).toBe('0.0001235');
    expect(messageNumber(0.04)).toBe('0.04');
    expect(messageNumber(1.96)).toBe('1.96');
    expect(messageNumber(-0.1)).toBe('-0.1');
  });

  it('writes non-finite values as they are', () => {
    expect(messageNumber(NaN)).toBe('NaN');
    expect(messageNumber(Infinity)).toBe('Infinity');
  });
});

/**
 * Two small helpers every message and chart leans on: a long written value
 * cut for a one-line message, and which loading the diagram's vertical axis
 * shows for each propulsion kind.
 */
import { describe, expect, it } from 'vitest';
import { loadingAxis } from '../../core/aircraft';
import { shortened } from '../../core/shortened';

describe('shortened', () => {
  it('leaves text of up to 60 characters as written', () => {
    const sixty = 'a'.repeat(60);
    expect(shortened(sixty)).toBe(sixty);
    expect(shortened('45 kt')).toBe('45 kt');
  });

  it('cuts longer text to 59 characters, an ellipsis and its length', () => {
    expect(shortened('b'.repeat(61))).toBe(`${'b'.repeat(59)}… (61 characters)`);
    // The length is written with thousands separators, as the messages write numbers.
    expect(shortened('c'.repeat(100_000))).toBe(`${'c'.repeat(59)}… (100,000 characters)`);
  });

  it('takes its limit as a second argument', () => {
    expect(shortened('abcdef', 6)).toBe('abcdef');
    expect(shortened('abcdefg', 6)).toBe('abcde… (7 characters)');
  });

  it('counts characters, not UTF-16 code units, and never splits one', () => {
    // U+2708 (airplane) is one code unit; U+1F6E9 (small airplane) is a surrogate pair (The Unicode Standard, ch. 3.9).
    const pairs = '\u{1F6E9}'.repeat(61);
    expect(pairs.length).toBe(122);
    expect(shortened(pairs)).toBe(`${'\u{1F6E9}'.repeat(59)}… (61 characters)`);
    expect(shortened('\u{1F6E9}'.repeat(60))).toBe('\u{1F6E9}'.repeat(60));
  });
});

describe('loadingAxis', () => {
  it('shows power-to-weight for propeller kinds and thrust-to-weight for the turbofan (common practice)', () => {
    for (const kind of ['piston', 'turbocharged-piston', 'turboprop', 'electric'] as const) expect(loadingAxis(kind)).toBe('powerToWeight');
    expect(loadingAxis('turbofan')).toBe('thrustToWeight');
  });
});

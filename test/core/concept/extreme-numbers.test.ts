/**
 * Plain numbers a concept may not hold, named by field with the whole message,
 * and a concept that cannot be read at all comes back as one issue, never as
 * a thrown error. The limits are the unit parser's: magnitudes from 1e-60 to
 * 1e60 (core/units/quantity.ts). Double precision holds magnitudes from about
 * 4.9e-324 to 1.8e308 (IEEE 754 binary64; ECMAScript 2024 §21.1.2.7-8), so
 * squares and products of numbers past those limits overflow or vanish:
 * (1e200)^2 is Infinity and (1e-200)^2 is 0.
 */
import { describe, expect, it } from 'vitest';
import { parseConcept } from '../../../core/concept';
import { exampleConcept } from './fixture';

// The limits as JavaScript writes the numbers (String(1e60) is "1e+60", ECMAScript Number::toString).
const LIMITS = '(magnitudes from 1e-60 to 1e+60)';

describe('plain numbers too large or too small to compute with', () => {
  it('names a large aspect ratio and a small oswald efficiency, each with its own word', () => {
    expect(1e200 ** 2).toBe(Infinity);
    expect(1e-200 ** 2).toBe(0);
    const concept = exampleConcept();
    concept.aircraft.aero.aspectRatio = 1e200;
    concept.aircraft.aero.configurations.clean.oswaldEfficiency = 1e-200;
    expect(parseConcept(concept)).toEqual({
      ok: false,
      issues: [
        { path: 'aircraft.aero.aspectRatio', message: `1e+200 is too large a number to compute with ${LIMITS}; write a realistic value` },
        { path: 'aircraft.aero.configurations.clean.oswaldEfficiency', message: `1e-200 is too small a number to compute with ${LIMITS}; write a realistic value` },
      ],
    });
  });

  it('looks inside lists: a mass fraction of a requirement, and negative magnitudes', () => {
    const concept = exampleConcept();
    concept.requirements[1].massFraction = -1e-70;
    concept.requirements[1].powerSetting = -1e70;
    expect(parseConcept(concept)).toEqual({
      ok: false,
      issues: [
        { path: 'requirements[1].massFraction', message: `-1e-70 is too small a number to compute with ${LIMITS}; write a realistic value` },
        { path: 'requirements[1].powerSetting', message: `-1e+70 is too large a number to compute with ${LIMITS}; write a realistic value` },
      ],
    });
  });
});

describe('a concept that cannot be read at all', () => {
  it('comes back as one issue with the reason, whether an error or a bare value was thrown', () => {
    // An object whose fields cannot be read (a getter that fails), as a broken caller might hand over.
    const failing = Object.defineProperty({}, 'format', {
      enumerable: true,
      get() {
        throw new Error('the field could not be fetched');
      },
    });
    expect(parseConcept(failing)).toEqual({ ok: false, issues: [{ path: '', message: 'the concept could not be read: the field could not be fetched' }] });
    const bare = Object.defineProperty({}, 'format', {
      enumerable: true,
      get() {
        throw 'no access';
      },
    });
    expect(parseConcept(bare)).toEqual({ ok: false, issues: [{ path: '', message: 'the concept could not be read: no access' }] });
  });
});

describe('values the number check leaves to the field check', () => {
  it('a number not finite, as a program may hand over (JSON has none), is named by the field check', () => {
    const concept = exampleConcept();
    concept.aircraft.aero.aspectRatio = Infinity;
    concept.aircraft.aero.configurations.clean.cd0 = NaN;
    expect(parseConcept(concept)).toEqual({
      ok: false,
      issues: [
        { path: 'aircraft.aero.aspectRatio', message: 'must be a plain number (got a number (Infinity))' },
        { path: 'aircraft.aero.configurations.clean.cd0', message: 'must be a plain number (got a number (NaN))' },
      ],
    });
  });

  it('a huge number written in quotes is text, named as such', () => {
    const concept = exampleConcept();
    concept.aircraft.aero.aspectRatio = '1e70';
    expect(parseConcept(concept)).toEqual({
      ok: false,
      issues: [{ path: 'aircraft.aero.aspectRatio', message: 'must be a plain number, not text; write 1e70 without quotes' }],
    });
  });
});

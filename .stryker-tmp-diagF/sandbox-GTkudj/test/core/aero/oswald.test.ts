// @ts-nocheck
import { describe, expect, it } from 'vitest';
import { oswaldEstimate, oswaldStraightWing, oswaldSweptWing } from '../../../core/aero/oswald';
import { assertInDelta } from '../helpers/asserts';

describe('oswaldStraightWing', () => {
  it('gives 0.811 at aspect ratio 8', () => {
    // Raymer, Aircraft Design: A Conceptual Approach, 4th ed., eq. 12.48 (from memory): AR 8 -> 0.811, as core/methods.md section 3 quotes.
    assertInDelta(oswaldStraightWing(8), 0.811, 5e-4);
  });

  it('falls as aspect ratio grows, staying within the 0.7-0.95 typical band for light-aircraft ratios', () => {
    // Typical e 0.7-0.95 (core/methods.md section 9, common practice) for AR 6-10.
    let previous = Infinity;
    for (const ar of [6, 7, 8, 9, 10]) {
      const e = oswaldStraightWing(ar);
      expect(e).toBeLessThan(previous);
      expect(e).toBeGreaterThan(0.7);
      expect(e).toBeLessThan(0.95);
      previous = e;
    }
  });
});

describe('oswaldEstimate', () => {
  it('uses the straight-wing form up to 30 deg of leading-edge sweep and the swept form beyond', () => {
    // Raymer 4th ed. section 12.6: eq. 12.49 applies for leading-edge sweep above 30 deg (from memory).
    const deg = Math.PI / 180;
    expect(oswaldEstimate(8, 30 * deg)).toBe(oswaldStraightWing(8));
    expect(oswaldEstimate(8, 35 * deg)).toBe(oswaldSweptWing(8, 35 * deg));
  });

  it('gives less efficiency with more sweep in the swept form', () => {
    // (cos L_LE)^0.15 in Raymer eq. 12.49 (from memory) falls with sweep.
    const deg = Math.PI / 180;
    expect(oswaldSweptWing(8, 45 * deg)).toBeLessThan(oswaldSweptWing(8, 35 * deg));
  });
});

describe('oswaldSweptWing', () => {
  it('gives 0.5459 at AR 8 and 35 deg, 0.3753 at AR 10 and 40 deg (Raymer eq. 12.49 worked by hand)', () => {
    // e = 4.61(1 - 0.045 AR^0.68)(cos L_LE)^0.15 - 3.1 (Raymer 4th ed., eq. 12.49, from memory). By hand:
    // AR 8: 8^0.68 = 4.1125, 1 - 0.18506 = 0.81494, cos 35 deg^0.15 = 0.97052; 4.61 x 0.81494 x 0.97052 - 3.1 = 0.5461.
    const deg = Math.PI / 180;
    assertInDelta(oswaldSweptWing(8, 35 * deg), 0.5461, 5e-4);
    // AR 10: 10^0.68 = 4.7863, 1 - 0.21538 = 0.78462, cos 40 deg^0.15 = 0.96081; 4.61 x 0.78462 x 0.96085 - 3.1 = 0.3753.
    assertInDelta(oswaldSweptWing(10, 40 * deg), 0.3753, 5e-4);
  });
});

/**
 * fallingRoot at the edges of its contract: the widening never looks past
 * maxHigh, and a bracket on negative x (where a relative width cannot be
 * met) ends after its 200 halvings. Check values are hand derivations.
 */
import { describe, expect, it } from 'vitest';
import { fallingRoot } from '../../../core/numeric/bracket-root';
import { assertRelative } from '../helpers/asserts';

describe('fallingRoot edges', () => {
  it('never widens past maxHigh, also when doubling the upper end would jump over it', () => {
    // 3 - x is zero at 3; from high 2 the next upper end is min(2.5, 4) = 2.5, where f is still
    // positive: no zero below maxHigh, so NaN, not the zero at 3 beyond it (hand derivation).
    expect(fallingRoot((v) => 3 - v, 0.5, 2, 2.5)).toBeNaN();
    // With maxHigh 4 the zero at 3 is inside and found.
    assertRelative(fallingRoot((v) => 3 - v, 0.5, 2, 4), 3, 1e-9, 'root');
  });

  it('finds a zero at negative x in a bracket that already holds it', () => {
    // -1 - x is zero at x = -1 (hand derivation). On [-4, -0.5] the stop at 1e-10 of the upper end
    // (a negative width bound) never applies, so the 200 halvings end the search: width 3.5 / 2^200.
    const x = fallingRoot((v) => -1 - v, -4, -0.5, 8);
    expect(x).toBeCloseTo(-1, 12);
  });
});

/**
 * The random stream against CPython's random module, an independent
 * implementation of MT19937: random.Random(n) seeds by init_by_array over
 * the 32-bit words of n, lowest first, and random() is genrand_res53
 * ((a >> 5) * 2^26 + (b >> 6)) / 2^53 of the reference mt19937ar.c
 * (Matsumoto and Nishimura, 2002). Values printed by Python 3.11.7 with the
 * command beside each. And the exact messages for a bad seed or key.
 */
import { describe, expect, it } from 'vitest';
import { mersenneTwister, mersenneTwisterByArray, triangularQuantile } from '../../../core/studies/random';

describe('mersenneTwisterByArray against CPython', () => {
  it('gives the doubles of random.random() for the key [20261202, 1], to the last bit', () => {
    // python3 -c "import random; r = random.Random((1 << 32) | 20261202); print([repr(r.random()) for _ in range(3)])"
    const stream = mersenneTwisterByArray([20261202, 1]);
    expect([stream.nextUnit(), stream.nextUnit(), stream.nextUnit()]).toEqual([0.4589912159060725, 0.7519057635294689, 0.07900873643733941]);
  });

  it('takes a key longer than the 624-word state: 700 words', () => {
    // words = [(i * 2654435761) % 2**32 for i in range(700)]; n = sum(w << 32 * i for i, w in enumerate(words))
    // python3: r = random.Random(n); print([r.getrandbits(32) for _ in range(3)])
    const words = Array.from({ length: 700 }, (_, i) => Number((BigInt(i) * 2654435761n) % 2n ** 32n));
    const stream = mersenneTwisterByArray(words);
    expect([stream.nextUint32(), stream.nextUint32(), stream.nextUint32()]).toEqual([1179226133, 532799835, 517808143]);
  });

  it('takes a key of one word', () => {
    // python3 -c "import random; r = random.Random(5); print([r.getrandbits(32) for _ in range(2)])"
    const stream = mersenneTwisterByArray([5]);
    expect([stream.nextUint32(), stream.nextUint32()]).toEqual([2675342405, 1097127993]);
  });
});

describe('bad seeds and keys: one line naming the value', () => {
  it.each<[string, () => unknown, string]>([
    ['a negative seed', () => mersenneTwister(-1), 'seed is -1; give a whole number from 0 to 4294967295'],
    ['a seed of 2^32', () => mersenneTwister(2 ** 32), 'seed is 4294967296; give a whole number from 0 to 4294967295'],
    ['a fractional seed', () => mersenneTwister(0.5), 'seed is 0.5; give a whole number from 0 to 4294967295'],
    ['an empty key', () => mersenneTwisterByArray([]), 'the key is empty; give at least one whole number'],
    ['a key word of 2^32', () => mersenneTwisterByArray([1, 2, 2 ** 32]), 'key[2] is 4294967296; give a whole number from 0 to 4294967295'],
  ])('%s', (_what, make, message) => {
    expect(make).toThrow(new RangeError(message));
  });

  it('accepts the ends: seed 0 and 2^32 - 1, key words 0 and 2^32 - 1', () => {
    // MT19937 is seeded by one 32-bit word (Matsumoto and Nishimura, 1998).
    expect(() => mersenneTwister(0)).not.toThrow();
    expect(() => mersenneTwister(4294967295)).not.toThrow();
    expect(() => mersenneTwisterByArray([0, 4294967295])).not.toThrow();
  });
});

describe('triangularQuantile at its split', () => {
  it('gives the mode at u = (c - a)/(b - a), from either branch of the inverse CDF', () => {
    // F(c) = (c - a)/(b - a) (Kotz and van Dorp, Beyond Beta, 2004, ch. 1): the quantile there is c.
    expect(triangularQuantile(0.25, 0, 1, 4)).toBe(1);
    expect(triangularQuantile(0.5, 2, 3, 4)).toBe(3);
  });
});

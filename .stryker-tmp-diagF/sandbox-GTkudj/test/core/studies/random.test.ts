// @ts-nocheck
import { mersenne } from 'pure-rand/generator/mersenne';
import { describe, expect, it } from 'vitest';
import { mersenneTwister, mersenneTwisterByArray, quantile, triangularQuantile, uniformQuantile } from '../../../core/studies/random';

/** Mean and (population) variance of n draws. */
function moments(draw: () => number, n: number): { mean: number; variance: number } {
  let sum = 0;
  let squares = 0;
  for (let i = 0; i < n; i++) {
    const x = draw();
    sum += x;
    squares += x * x;
  }
  const mean = sum / n;
  return { mean, variance: squares / n - mean * mean };
}

describe('mersenneTwisterByArray', () => {
  it('gives the published first outputs of mt19937ar.c seeded by init_by_array({0x123, 0x234, 0x345, 0x456})', () => {
    // mt19937ar.out, Matsumoto and Nishimura's reference output for mt19937ar.c (2002); the same
    // ten values come from CPython's random.Random(0x456_00000345_00000234_00000123).getrandbits(32),
    // which seeds MT19937 with init_by_array over the seed's 32-bit words.
    const stream = mersenneTwisterByArray([0x123, 0x234, 0x345, 0x456]);
    const first = Array.from({ length: 10 }, () => stream.nextUint32());
    expect(first).toEqual([1067595299, 955945823, 477289528, 4107218783, 4228976476, 3344332714, 3355579695, 227628506, 810200273, 2591290167]);
  });

  it('gives what CPython gives for a two-word key, as the Monte Carlo blocks use', () => {
    // python3 -c "import random; r = random.Random((1 << 32) | 20261202); print([r.getrandbits(32) for _ in range(3)])"
    const stream = mersenneTwisterByArray([20261202, 1]);
    expect([stream.nextUint32(), stream.nextUint32(), stream.nextUint32()]).toEqual([1971352272, 733883290, 3229410682]);
  });

  it('refuses an empty key or a word outside 32 bits', () => {
    expect(() => mersenneTwisterByArray([])).toThrow(/empty/);
    expect(() => mersenneTwisterByArray([1, -1])).toThrow(/key\[1\]/);
  });
});

describe('mersenneTwister', () => {
  it('gives the 10000th output the C++ standard requires of mt19937 seeded 5489', () => {
    // ISO/IEC 14882 [rand.predef]: "the 10000th consecutive invocation of a default-constructed
    // object of type mt19937 shall produce the value 4123659995"; the default seed is 5489.
    const stream = mersenneTwister(5489);
    let value = 0;
    for (let i = 0; i < 10000; i++) value = stream.nextUint32();
    expect(value).toBe(4123659995);
  });

  it('gives the first output of the reference mt19937ar code for seed 5489', () => {
    // Matsumoto and Nishimura's mt19937ar.c, init_genrand(5489): first genrand_int32() is 3499211612 (from memory).
    expect(mersenneTwister(5489).nextUint32()).toBe(3499211612);
  });

  it('matches the Mersenne Twister of the pure-rand library from npm for several seeds', () => {
    // pure-rand (npm, installed with fast-check) implements MT19937 independently of this code.
    for (const seed of [0, 1, 42, 20261202, 4294967295]) {
      const ours = mersenneTwister(seed);
      const theirs = mersenne(seed);
      const a = Array.from({ length: 2000 }, () => ours.nextUint32());
      const b = Array.from({ length: 2000 }, () => theirs.next() >>> 0);
      expect(a).toEqual(b);
    }
  });

  it('gives doubles in [0, 1) with the moments of U(0, 1)', () => {
    // U(0,1): mean 1/2, variance 1/12 (standard result). 200 000 draws: standard error of the mean 0.00065.
    const stream = mersenneTwister(7);
    let outside = 0;
    const { mean, variance } = moments(() => {
      const u = stream.nextUnit();
      if (!(u >= 0 && u < 1)) outside++;
      return u;
    }, 200000);
    expect(outside).toBe(0);
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * Math.sqrt(1 / 12 / 200000));
    expect(Math.abs(variance - 1 / 12)).toBeLessThan(0.001);
  });

  it('rejects a seed that is not a whole number from 0 to 2^32 - 1, naming it', () => {
    expect(() => mersenneTwister(-1)).toThrow(/seed is -1/);
    expect(() => mersenneTwister(1.5)).toThrow(/seed is 1.5/);
    expect(() => mersenneTwister(2 ** 32)).toThrow(RangeError);
  });
});

describe('uniformQuantile', () => {
  it('has the mean (a+b)/2 and variance (b-a)^2/12 of the uniform distribution', () => {
    // Uniform distribution on [a, b]: mean (a+b)/2, variance (b-a)^2/12 (standard result).
    const [a, b] = [0.72, 0.88];
    const stream = mersenneTwister(11);
    const { mean, variance } = moments(() => uniformQuantile(stream.nextUnit(), a, b), 100000);
    expect(Math.abs(mean - (a + b) / 2)).toBeLessThan(4 * Math.sqrt((b - a) ** 2 / 12 / 100000));
    expect(Math.abs(variance / ((b - a) ** 2 / 12) - 1)).toBeLessThan(0.02);
  });
});

describe('triangularQuantile', () => {
  it('has the mean (a+b+c)/3 and variance (a^2+b^2+c^2-ab-ac-bc)/18 of the triangular distribution', () => {
    // Triangular distribution with minimum a, mode c, maximum b: mean (a+b+c)/3,
    // variance (a^2+b^2+c^2-ab-ac-bc)/18 (standard results; Kotz and van Dorp, Beyond Beta, 2004).
    for (const [a, c, b] of [
      [0.7, 0.8, 0.95],
      [1.2, 1.2, 1.5],
      [6, 8, 8],
    ]) {
      const stream = mersenneTwister(3);
      const n = 100000;
      const { mean, variance } = moments(() => triangularQuantile(stream.nextUnit(), a, c, b), n);
      const expectedVariance = (a * a + b * b + c * c - a * b - a * c - b * c) / 18;
      expect(Math.abs(mean - (a + b + c) / 3)).toBeLessThan(4 * Math.sqrt(expectedVariance / n));
      expect(Math.abs(variance / expectedVariance - 1)).toBeLessThan(0.03);
    }
  });

  it('puts (c-a)/(b-a) of the mass below the mode', () => {
    // Triangular CDF at the mode: F(c) = (c-a)/(b-a) (standard result).
    const [a, c, b] = [0.7, 0.8, 0.95];
    const stream = mersenneTwister(5);
    const n = 100000;
    let below = 0;
    for (let i = 0; i < n; i++) if (triangularQuantile(stream.nextUnit(), a, c, b) <= c) below++;
    const p = (c - a) / (b - a);
    expect(Math.abs(below / n - p)).toBeLessThan(4 * Math.sqrt((p * (1 - p)) / n));
  });

  it('maps 0 and 1 to the ends and stays inside them', () => {
    expect(triangularQuantile(0, 1, 2, 4)).toBe(1);
    expect(triangularQuantile(1, 1, 2, 4)).toBe(4);
    expect(quantile(0.5, 'uniform', 1, 2, 4)).toBe(2.5);
  });
});

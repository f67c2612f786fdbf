/**
 * Seeded, reproducible random numbers for the trade studies: the Mersenne
 * Twister MT19937 and inverse-CDF sampling of the uniform and triangular
 * distributions. The same seed gives the same stream on every platform.
 */

const N = 624;
const M = 397;
const UPPER = 0x80000000;
const LOWER = 0x7fffffff;
const MATRIX_A = 0x9908b0df;

/** A stream of 32-bit unsigned integers and doubles in [0, 1). */
export interface RandomStream {
  nextUint32(): number;
  /** Uniform on [0, 1) with 53-bit resolution. */
  nextUnit(): number;
}

function checkedWord(value: number, what: string): number {
  if (!Number.isInteger(value) || value < 0 || value > 0xffffffff) {
    throw new RangeError(`${what} is ${value}; give a whole number from 0 to 4294967295`);
  }
  return value >>> 0;
}

/** init_genrand: mt[i] = 1812433253 * (mt[i-1] ^ (mt[i-1] >> 30)) + i (Matsumoto and Nishimura, 2002 revision). */
function initialState(seed: number): Uint32Array {
  const state = new Uint32Array(N);
  state[0] = seed >>> 0;
  for (let i = 1; i < N; i++) {
    const previous = state[i - 1] ^ (state[i - 1] >>> 30);
    state[i] = (Math.imul(1812433253, previous) + i) >>> 0;
  }
  return state;
}

/** MT19937 (Matsumoto and Nishimura, ACM TOMACS 8(1), 1998), seeded by init_genrand. */
export function mersenneTwister(seed: number): RandomStream {
  return streamFrom(initialState(checkedWord(seed, 'seed')));
}

/**
 * MT19937 seeded by init_by_array (mt19937ar.c, 2002): a key of several
 * 32-bit words sets the whole state, so keys [seed, 0], [seed, 1], ... give
 * streams as unrelated as different seeds, never sharing a state.
 */
export function mersenneTwisterByArray(key: readonly number[]): RandomStream {
  if (key.length === 0) throw new RangeError('the key is empty; give at least one whole number');
  const words = key.map((value, i) => checkedWord(value, `key[${i}]`));
  const state = initialState(19650218);
  let i = 1;
  let j = 0;
  for (let k = Math.max(N, words.length); k > 0; k--) {
    const previous = state[i - 1] ^ (state[i - 1] >>> 30);
    state[i] = ((state[i] ^ Math.imul(previous, 1664525)) + words[j] + j) >>> 0;
    i++;
    j++;
    if (i >= N) {
      state[0] = state[N - 1];
      i = 1;
    }
    if (j >= words.length) j = 0;
  }
  for (let k = N - 1; k > 0; k--) {
    const previous = state[i - 1] ^ (state[i - 1] >>> 30);
    state[i] = ((state[i] ^ Math.imul(previous, 1566083941)) - i) >>> 0;
    i++;
    if (i >= N) {
      state[0] = state[N - 1];
      i = 1;
    }
  }
  state[0] = 0x80000000; // MSB is 1, assuring a non-zero initial state
  return streamFrom(state);
}

/**
 * The generator itself: one class, so every stream shares its methods and
 * their compiled code (a stream of closures made new for each stream leaves
 * the optimised sampling loop calling a function it has not seen at every
 * new block, and V8 compiles that loop again).
 */
class TwisterStream implements RandomStream {
  private readonly state: Uint32Array;
  private index = N;

  constructor(state: Uint32Array) {
    this.state = state;
  }

  private twist(): void {
    const state = this.state;
    for (let i = 0; i < N; i++) {
      const y = (state[i] & UPPER) | (state[(i + 1) % N] & LOWER);
      state[i] = state[(i + M) % N] ^ (y >>> 1) ^ (y & 1 ? MATRIX_A : 0);
    }
    this.index = 0;
  }

  nextUint32(): number {
    if (this.index >= N) this.twist();
    let y = this.state[this.index++];
    // Tempering (Matsumoto and Nishimura 1998, eq. 2.2-2.5).
    y ^= y >>> 11;
    y ^= (y << 7) & 0x9d2c5680;
    y ^= (y << 15) & 0xefc60000;
    y ^= y >>> 18;
    return y >>> 0;
  }

  nextUnit(): number {
    // genrand_res53 of the reference implementation: 27 + 26 bits over 2^53.
    const a = this.nextUint32() >>> 5;
    const b = this.nextUint32() >>> 6;
    return (a * 67108864 + b) / 9007199254740992;
  }
}

function streamFrom(state: Uint32Array): RandomStream {
  return new TwisterStream(state);
}

export type Distribution = 'uniform' | 'triangular';

/** Inverse CDF of the uniform distribution on [low, high]. */
export function uniformQuantile(u: number, low: number, high: number): number {
  return low + u * (high - low);
}

/**
 * Inverse CDF of the triangular distribution on [low, high] with its mode at
 * `mode` (Kotz and van Dorp, Beyond Beta, 2004, ch. 1; standard result).
 */
export function triangularQuantile(u: number, low: number, mode: number, high: number): number {
  const width = high - low;
  if (width <= 0) return low;
  const split = (mode - low) / width;
  if (u < split) return low + Math.sqrt(u * width * (mode - low));
  return high - Math.sqrt((1 - u) * width * (high - mode));
}

/** One draw of a ranged value: uniform, or triangular peaking at the nominal value. */
export function quantile(u: number, distribution: Distribution, low: number, nominal: number, high: number): number {
  return distribution === 'triangular' ? triangularQuantile(u, low, nominal, high) : uniformQuantile(u, low, high);
}

import { FemInputError } from '../errors';

const MASK64 = (1n << 64n) - 1n;

/**
 * SplitMix64 (G. L. Steele, D. Lea, C. H. Flood, "Fast splittable pseudorandom number
 * generators", OOPSLA 2014; the constants of S. Vigna's splitmix64.c): a 64-bit generator used
 * here only to expand a seed into the xoshiro state, as Blackman and Vigna recommend.
 * Returns the stream's next() as unsigned 64-bit BigInts.
 */
export function splitMix64(seed: bigint): () => bigint {
  let x = seed & MASK64;
  return () => {
    x = (x + 0x9e3779b97f4a7c15n) & MASK64;
    let z = x;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
    return z ^ (z >> 31n);
  };
}

const rotl = (x: number, k: number) => ((x << k) | (x >>> (32 - k))) >>> 0;

/**
 * xoshiro128** 1.1 (D. Blackman, S. Vigna, "Scrambled linear pseudorandom number generators",
 * ACM Trans. Math. Softw. 47(4):36, 2021): 128-bit state, period 2^128 − 1. `state` is four
 * unsigned 32-bit words, not all zero; it is copied. Returns next() as an unsigned 32-bit integer.
 */
export function xoshiro128ss(state: readonly number[]): () => number {
  const s = Uint32Array.from(state);
  if (s.length !== 4 || s.every((w) => w === 0)) {
    throw new FemInputError('state', 'state must be four 32-bit words, not all zero');
  }
  return () => {
    const result = Math.imul(rotl(Math.imul(s[1], 5) >>> 0, 7), 9) >>> 0;
    const t = (s[1] << 9) >>> 0;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11);
    return result;
  };
}

/** A seeded random stream: uniforms strictly inside (0, 1) and standard normal variates. */
export interface RandomStream {
  /** (k + ½)/2³² from a 32-bit draw k: never 0 or 1, so logarithms stay finite */
  uniform(): number;
  /** standard normal N(0, 1) */
  normal(): number;
}

/**
 * The random stream of a seed (a safe integer ≥ 0): xoshiro128** seeded from two SplitMix64
 * outputs; normals by the Box–Muller transform (G. E. P. Box, M. E. Muller, Ann. Math. Stat.
 * 29:610, 1958), both of each pair used. The same seed always gives the same stream.
 * @throws FemInputError('seed') for a seed that is not a safe integer ≥ 0
 */
export function randomStream(seed: number): RandomStream {
  if (!Number.isSafeInteger(seed) || seed < 0) {
    throw new FemInputError('seed', 'seed must be a whole number from 0 to 2^53 − 1');
  }
  const mix = splitMix64(BigInt(seed));
  const words = [mix(), mix()].flatMap((w) => [Number(w & 0xffffffffn), Number(w >> 32n)]);
  const next = xoshiro128ss(words.every((w) => w === 0) ? [1, 0, 0, 0] : words);
  const uniform = () => (next() + 0.5) / 4294967296;
  let spare: number | null = null;
  const normal = () => {
    if (spare !== null) {
      const z = spare;
      spare = null;
      return z;
    }
    const rho = Math.sqrt(-2 * Math.log(uniform()));
    const theta = 2 * Math.PI * uniform();
    spare = rho * Math.sin(theta);
    return rho * Math.cos(theta);
  };
  return { uniform, normal };
}

/** Seeded random streams for tolerance studies: one stream per Monte Carlo run, normal deviates by Box–Muller. */
import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { SynthInputError } from './synth-input-error.js';

/** A source of standard normal deviates and uniform numbers in [0, 1). */
export type RandomStream = { normal: () => number; uniform: () => number };

const MASK_64 = (1n << 64n) - 1n;
/** Weyl increment of SplitMix64, 2^64 / golden ratio, odd (Steele, Lea & Flood, OOPSLA 2014). */
const GOLDEN_GAMMA = 0x9e3779b97f4a7c15n;

/** SplitMix64 output function: a bijection of 64-bit words with full avalanche (Steele, Lea & Flood, OOPSLA 2014). */
const mix64 = (word: bigint): bigint => {
  let z = word & MASK_64;
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK_64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK_64;
  return z ^ (z >> 31n);
};

/** Word `k` (from 1) of the SplitMix64 sequence started at `start`, reached without stepping through the others. */
const splitMixWord = (start: bigint, k: bigint): bigint => mix64(start + k * GOLDEN_GAMMA);

const high32 = (word: bigint): number => Number(BigInt.asIntN(32, word >> 32n));
const low32 = (word: bigint): number => Number(BigInt.asIntN(32, word));

/**
 * The stream of run `runIndex` of a study seeded with `seed`; it depends on these two numbers only, so a run draws
 * the same errors whichever chunk or thread computes it. The generator is xoroshiro128+ (Blackman & Vigna,
 * "Scrambled linear pseudorandom number generators", ACM TOMS 47, 2021); the 128-bit state of run r is words
 * 2r + 1 and 2r + 2 of the SplitMix64 sequence started at the seed (filling a xoroshiro state from SplitMix64 is
 * common practice). The SplitMix64 output function is a bijection and the counters differ, so the two words are
 * never both zero and different runs start from different states; any run's stream is made in constant time,
 * without stepping through the runs before it. Seeds are taken modulo 2^64.
 * Normal deviates by the Box–Muller transform (Box & Muller, Ann. Math. Statist. 29, 1958).
 * @throws SynthInputError when `seed` is not an integer or `runIndex` is not a non-negative safe integer.
 */
export function randomStream(seed: number, runIndex = 0): RandomStream {
  if (!Number.isInteger(seed)) throw new SynthInputError(`synth: seed must be an integer, got ${seed}`);
  if (!(Number.isSafeInteger(runIndex) && runIndex >= 0)) throw new SynthInputError(`synth: runIndex must be a non-negative integer, got ${runIndex}`);
  const start = BigInt.asUintN(64, BigInt(seed));
  const s0 = splitMixWord(start, 2n * BigInt(runIndex) + 1n);
  const s1 = splitMixWord(start, 2n * BigInt(runIndex) + 2n);
  // pure-rand keeps each 64-bit word as two signed 32-bit halves, ordered [s0 high, s0 low, s1 high, s1 low].
  const rng = xoroshiro128plusFromState([high32(s0), low32(s0), high32(s1), low32(s1)]);
  let spare: number | null = null;
  const uniform = (): number => uniformFloat64(rng);
  const normal = (): number => {
    if (spare !== null) {
      const value = spare;
      spare = null;
      return value;
    }
    const u1 = 1 - uniform();
    const u2 = uniform();
    const radius = Math.sqrt(-2 * Math.log(u1));
    spare = radius * Math.sin(2 * Math.PI * u2);
    return radius * Math.cos(2 * Math.PI * u2);
  };
  return { normal, uniform };
}

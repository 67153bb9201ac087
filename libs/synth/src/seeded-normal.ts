/** Seeded random streams for tolerance studies: independent chunks, normal deviates by Box–Muller. */
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';

/** A source of standard normal deviates and uniform numbers in [0, 1). */
export type RandomStream = { normal: () => number; uniform: () => number };

/**
 * The stream of chunk `chunkIndex` of a study seeded with `seed`: the xoroshiro128+ generator jumped
 * `chunkIndex` times (each jump is 2^64 steps, so chunks never overlap; Blackman & Vigna 2018).
 * Normal deviates by the Box–Muller transform (Box & Muller, Ann. Math. Statist. 29, 1958).
 */
export function randomStream(seed: number, chunkIndex = 0): RandomStream {
  const rng = xoroshiro128plus(seed);
  for (let k = 0; k < chunkIndex; k++) rng.jump();
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

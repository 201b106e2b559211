import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';

/** Name of the scheme below, recorded in shard files so that only compatible shards merge. */
export const MEMBER_STREAM_SCHEME = 'xoroshiro128plus(seed), member i after i + 1 jumps of 2^64';

/**
 * The random streams of consecutive ensemble members, from `start` on. Member i's generator is
 * pure-rand's xoroshiro128+ seeded with `seed` and advanced by i + 1 jumps (each jump moves 2^64
 * draws ahead, so the streams never overlap; Blackman & Vigna 2018, "Scrambled linear pseudorandom
 * number generators"). A member's draws therefore depend only on (seed, i), whichever shard or
 * worker runs it. Reaching member i costs i + 1 jumps (about 1 µs each).
 *
 * @param seed integer in [0, 2^32)
 * @param start index of the first member
 * @returns a function giving the next member's generator on each call
 * @example
 * const next = memberGenerators(7, 0);
 * const first = next(); // member 0
 * const second = next(); // member 1
 */
export function memberGenerators(seed: number, start: number): () => RandomGenerator {
  const base = xoroshiro128plus(seed);
  // The seeded state itself is not used: the first jump mixes it (its first outputs echo the seed).
  for (let i = 0; i <= start; i++) base.jump();
  return () => {
    const member = base.clone();
    base.jump();
    return member;
  };
}

import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';

/** Name of the scheme below, recorded in shard files so that only compatible shards merge. */
export const MEMBER_STREAM_SCHEME = 'xoroshiro128plus started from fmix32 hashes of (seed, i), scheme v2';

/**
 * The 128-bit starting state of member `i`'s generator: four 32-bit words, word w =
 * fmix32(fmix32(fmix32(seed ^ W_w) ^ lo) ^ hi) with lo and hi the low and high 32 bits of i and W_w
 * a fixed odd constant per word. fmix32 is the finalizer of Austin Appleby's MurmurHash3 (public
 * domain; an invertible mix in which every input bit affects every output bit), so for one seed each
 * word is a one-to-one function of i: no two members below 2^32 share any state word, and
 * neighbouring members start from unrelated states. Seeding a generator from a hash of (seed,
 * stream index) is common practice for parallel streams (no source); it costs a few multiplications
 * per member, so reaching member i takes no time whatever i is.
 *
 * @param seed integer in [0, 2^32)
 * @param i member index, integer in [0, 2^53)
 * @returns the state in pure-rand's order for xoroshiro128plusFromState
 * @example memberState(7, 0).length // 4
 */
export function memberState(seed: number, i: number): number[] {
  const lo = i >>> 0;
  const hi = Math.floor(i / 2 ** 32) >>> 0;
  const state = WORD_KEYS.map((key) => fmix32(fmix32(fmix32(seed ^ key) ^ lo) ^ hi));
  // xoroshiro128+ must not start from the all-zero state (probability 2^-128; guarded all the same).
  if (!state.some((w) => w !== 0)) state[0] = 1;
  return state;
}

/** One odd constant per state word (the first four odd multiples of the golden-ratio constant 0x9e3779b9). */
const WORD_KEYS = [0x9e3779b9, Math.imul(0x9e3779b9, 3), Math.imul(0x9e3779b9, 5), Math.imul(0x9e3779b9, 7)];

/** MurmurHash3's 32-bit finalizer (Appleby, public domain), on signed 32-bit integers. */
function fmix32(h: number): number {
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h | 0;
}

/**
 * The random streams of consecutive ensemble members, from `start` on. Member i's generator is
 * pure-rand's xoroshiro128+ (Blackman & Vigna 2018, "Scrambled linear pseudorandom number
 * generators") started from {@link memberState}(seed, i), so a member's draws depend only on
 * (seed, i), whichever shard or thread runs it.
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
  let i = start;
  return () => xoroshiro128plusFromState(memberState(seed, i++));
}

/**
 * Streams kept for bootstraps over the members, far above any member index, so that a bootstrap
 * never repeats a member's draws: one per use, so that two bootstraps of one seed are independent.
 */
export const BOOTSTRAP_STREAMS = { budgetSpread: Number.MAX_SAFE_INTEGER, categoryAgreement: Number.MAX_SAFE_INTEGER - 1 } as const;

/**
 * Uniform numbers in [0, 1) from stream `stream` of `seed` (xoroshiro128+ from memberState), for a
 * bootstrap over the members; the same seed and stream give the same numbers on any machine.
 *
 * @param seed integer in [0, 2^32)
 * @param stream one of BOOTSTRAP_STREAMS
 * @example const random = bootstrapUniforms(1, BOOTSTRAP_STREAMS.budgetSpread); random() // in [0, 1)
 */
export function bootstrapUniforms(seed: number, stream: number): () => number {
  const rng = xoroshiro128plusFromState(memberState(seed, stream));
  return () => uniformFloat64(rng);
}

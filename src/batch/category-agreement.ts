import { BOOTSTRAP_STREAMS, bootstrapUniforms } from '../ensemble/member-generators.js';
import { categoryEvidence, warmingCategory } from './warming-category.js';

/** Bootstrap resamples behind category_agreement: 200 give a share near 0.9 to about +-0.02 (sqrt(0.9 x 0.1 / 200)). */
export const CATEGORY_RESAMPLES = 200;

/** Agreement below which a scenario's category is marked uncertain ("C1?"): a rerun would move it about once in ten or more. */
export const UNCERTAIN_AGREEMENT = 0.9;

/**
 * How stable a scenario's AR6 WG3 category is under the sampling of its members, by the bootstrap
 * (Efron 1979): the members are drawn with replacement (each draw keeps a member's peak and 2100
 * warming together), the category is found again on each resample with warmingCategory and
 * categoryEvidence, and the share of resamples giving `code` is returned. A scenario whose deciding
 * share of members sits on a category's boundary gets about 0.5; one far from every boundary gets 1.
 * The members themselves are not rerun.
 *
 * @param peakK each member's peak warming over 2001-2100, K
 * @param warming2100K each member's warming in 2100, K, or undefined when the run ends earlier
 * @param code the category of all the members (as warmingCategory gives it)
 * @param resamples number of bootstrap resamples
 * @param random uniform numbers in [0, 1), injected so the agreement is reproducible
 * @returns the share of resamples whose category is `code`, 0 to 1
 * @example categoryAgreement(Float64Array.of(2.6, 2.7, 2.8), undefined, 'C6', 200, Math.random) // 1
 */
export function categoryAgreement(
  peakK: ArrayLike<number>,
  warming2100K: ArrayLike<number> | undefined,
  code: string,
  resamples: number,
  random: () => number,
): number {
  const n = peakK.length;
  const peak = new Float64Array(n);
  const end = warming2100K ? new Float64Array(n) : undefined;
  let same = 0;
  for (let b = 0; b < resamples; b++) {
    for (let i = 0; i < n; i++) {
      const j = Math.floor(random() * n);
      peak[i] = peakK[j];
      if (end) end[i] = warming2100K![j];
    }
    if (warmingCategory(categoryEvidence(peak, end)).code === code) same++;
  }
  return same / resamples;
}

/**
 * The uniform numbers of a batch's category bootstrap (bootstrapUniforms, its own stream of `seed`).
 * Every scenario of a batch starts the same stream, so its agreement depends only on its members and
 * the seed, whichever shard or thread assesses it (as the members do).
 *
 * @param seed the batch's seed, integer in [0, 2^32)
 */
export function categoryBootstrapRandom(seed: number): () => number {
  return bootstrapUniforms(seed, BOOTSTRAP_STREAMS.categoryAgreement);
}

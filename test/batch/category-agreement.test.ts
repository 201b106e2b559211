// The bootstrap agreement of a warming category, on constructed members whose deciding share of
// members is known: resampling n members with replacement makes the number above a level
// Binomial(n, share) (Efron 1979; the bootstrap of a proportion), so the agreement on a boundary is
// a binomial tail computed here exactly, and far from every boundary it is 1.
import { describe, expect, it } from 'vitest';
import { categoryAgreement, categoryBootstrapRandom, CATEGORY_RESAMPLES } from '../../src/batch/category-agreement.js';
import { categoryEvidence, warmingCategory } from '../../src/batch/warming-category.js';

/** n members, the first `above` with value `high`, the others `low`. */
const split = (n: number, above: number, high: number, low: number) => Float64Array.from({ length: n }, (_, i) => (i < above ? high : low));

/** P(lo <= X <= hi) for X ~ Binomial(n, p), summed from the probability mass function (in logs, exact to rounding). */
function binomialBetween(n: number, p: number, lo: number, hi: number): number {
  let logC = 0; // log C(n, k), built up from k = 0
  let sum = 0;
  for (let k = 0; k <= n; k++) {
    if (k > 0) logC += Math.log(n - k + 1) - Math.log(k);
    if (k >= lo && k <= hi) sum += Math.exp(logC + k * Math.log(p) + (n - k) * Math.log(1 - p));
  }
  return sum;
}

/** Four standard errors of a share estimated from `resamples` draws (binomial). */
const tolerance = (p: number, resamples: number) => 4 * Math.sqrt((p * (1 - p)) / resamples);

describe('categoryAgreement (bootstrap of the members)', () => {
  it('exactly half the members above 2 K (the C4/C5 boundary) agrees about half the time: P(X >= 50), X ~ Bin(100, 0.5)', () => {
    const peak = split(100, 50, 2.2, 1.8);
    expect(warmingCategory(categoryEvidence(peak)).code).toBe('C5');
    // C5 again whenever at least half the resampled members peak above 2 K (binomial symmetry: 0.5 + P(X = 50) / 2).
    const expected = binomialBetween(100, 0.5, 50, 100);
    expect(expected).toBeCloseTo(0.5 + 0.0796 / 2, 3); // P(X = 50) = C(100, 50) / 2^100 = 0.0796
    const resamples = 4000;
    const agreement = categoryAgreement(peak, undefined, 'C5', resamples, categoryBootstrapRandom(1));
    expect(Math.abs(agreement - expected)).toBeLessThan(tolerance(expected, resamples));
  });

  it('a peak above 1.5 K for exactly 67 % of members (the C1/C2 line) keeps C1 with P(X <= 67), X ~ Bin(100, 0.67)', () => {
    const peak = split(100, 67, 1.6, 1.4);
    const end = split(100, 0, 0, 1.2); // every member back to 1.2 K in 2100: the 2100 condition always holds
    expect(warmingCategory(categoryEvidence(peak, end)).code).toBe('C1');
    const expected = binomialBetween(100, 0.67, 0, 67);
    const resamples = 4000;
    const agreement = categoryAgreement(peak, end, 'C1', resamples, categoryBootstrapRandom(3));
    expect(Math.abs(agreement - expected)).toBeLessThan(tolerance(expected, resamples));
  });

  it('with the batch\'s 200 resamples a boundary case still reads well below 0.9', () => {
    const agreement = categoryAgreement(split(600, 300, 2.2, 1.8), undefined, 'C5', CATEGORY_RESAMPLES, categoryBootstrapRandom(1));
    const expected = binomialBetween(600, 0.5, 300, 600); // 0.516
    expect(Math.abs(agreement - expected)).toBeLessThan(tolerance(expected, CATEGORY_RESAMPLES));
    expect(agreement).toBeLessThan(0.9);
  });

  it('members far from every boundary agree on every resample: 1', () => {
    // Peaks spread over 2.6-2.9 K: below 3 K for every member, above 2.5 K for every member: C6 whatever the draw.
    const peak = Float64Array.from({ length: 600 }, (_, i) => 2.6 + (0.3 * i) / 600);
    const end = Float64Array.from(peak, (p) => p - 0.1);
    expect(warmingCategory(categoryEvidence(peak, end)).code).toBe('C6');
    expect(categoryAgreement(peak, end, 'C6', CATEGORY_RESAMPLES, categoryBootstrapRandom(1))).toBe(1);
    // And none agree with a category the members are not in.
    expect(categoryAgreement(peak, end, 'C5', CATEGORY_RESAMPLES, categoryBootstrapRandom(1))).toBe(0);
  });

  it('is deterministic for a seed and moves with the seed', () => {
    const peak = split(600, 300, 2.2, 1.8);
    const a = categoryAgreement(peak, undefined, 'C5', CATEGORY_RESAMPLES, categoryBootstrapRandom(7));
    expect(categoryAgreement(peak, undefined, 'C5', CATEGORY_RESAMPLES, categoryBootstrapRandom(7))).toBe(a);
    const others = [8, 9, 10].map((seed) => categoryAgreement(peak, undefined, 'C5', CATEGORY_RESAMPLES, categoryBootstrapRandom(seed)));
    expect(others.some((b) => b !== a)).toBe(true);
    // A multiple of 1 / 200.
    expect(Number.isInteger(a * CATEGORY_RESAMPLES)).toBe(true);
  });
});

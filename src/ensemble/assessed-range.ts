import { normalQuantile } from './normal-quantile.js';

/**
 * A distribution stated the way IPCC AR6 states an assessed quantity: a best estimate (taken as
 * the median), a "likely" range (17th-83rd percentiles) and a "very likely" range (5th-95th
 * percentiles). Values are in the quantity's own unit.
 */
export interface AssessedRange {
  /** 5th percentile: lower end of the very likely range. */
  p05: number;
  /** 17th percentile: lower end of the likely range. */
  p17: number;
  /** Median (the best estimate). */
  p50: number;
  /** 83rd percentile: upper end of the likely range. */
  p83: number;
  /** 95th percentile: upper end of the very likely range. */
  p95: number;
}

/** Normal score of the 83rd percentile, Phi^-1(0.83) ≈ 0.9542. */
export const LIKELY_Z = normalQuantile(0.83);
/** Normal score of the 95th percentile, Phi^-1(0.95) ≈ 1.6449. */
export const VERY_LIKELY_Z = normalQuantile(0.95);

/**
 * The value of an assessed quantity at normal score z: the quantile function through the five
 * assessed percentiles, linear in the normal score between them (so that Z ~ N(0, 1) gives a
 * distribution with exactly those percentiles, and a normal one when the five values are those of
 * a normal), continued beyond the very likely range with the slope of the outer segment. A skewed
 * range such as ECS 2 / 2.5 / 3 / 4 / 5 K gives a right-skewed distribution without choosing a
 * parametric family.
 *
 * @param range the five percentiles
 * @param z standard normal score
 * @returns the quantity, in the unit of `range`
 * @example assessedQuantile({ p05: 2, p17: 2.5, p50: 3, p83: 4, p95: 5 }, 0) // 3
 */
export function assessedQuantile(range: AssessedRange, z: number): number {
  if (z < 0) {
    if (z >= -LIKELY_Z) return range.p50 + (range.p50 - range.p17) * (z / LIKELY_Z);
    return range.p17 + (range.p17 - range.p05) * ((z + LIKELY_Z) / (VERY_LIKELY_Z - LIKELY_Z));
  }
  if (z <= LIKELY_Z) return range.p50 + (range.p83 - range.p50) * (z / LIKELY_Z);
  return range.p83 + (range.p95 - range.p83) * ((z - LIKELY_Z) / (VERY_LIKELY_Z - LIKELY_Z));
}

/**
 * The assessed range of a normal distribution given its mean and the half-width of its 5-95 %
 * range (the way AR6 writes "3.93 ± 0.47").
 * @example normalRange(1, 0.1).p95 // 1.1
 */
export function normalRange(mean: number, veryLikelyHalfWidth: number): AssessedRange {
  const likely = (veryLikelyHalfWidth * LIKELY_Z) / VERY_LIKELY_Z;
  return { p05: mean - veryLikelyHalfWidth, p17: mean - likely, p50: mean, p83: mean + likely, p95: mean + veryLikelyHalfWidth };
}

/**
 * A range with no spread: every member takes `value`.
 * @example pointRange(3).p95 // 3
 */
export function pointRange(value: number): AssessedRange {
  return { p05: value, p17: value, p50: value, p83: value, p95: value };
}

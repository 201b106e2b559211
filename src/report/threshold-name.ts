import { isAr6Baseline } from './threshold-baseline-note.js';

/**
 * How a report names a warming threshold: `1.5 K` on the 1850-1900 baseline (an IPCC AR6 global
 * warming level), `1.5 K above the 1995-2014 mean` on any other, so that it cannot be misread as
 * the AR6 level.
 *
 * @param levelK the threshold, K above the baseline mean
 * @param baseline the baseline period of the warming, inclusive years
 * @example
 * thresholdName(1.5, [1850, 1900]) // '1.5 K'
 * thresholdName(2, [1995, 2014]) // '2 K above the 1995-2014 mean'
 */
export function thresholdName(levelK: number, baseline: readonly [number, number]): string {
  return isAr6Baseline(baseline) ? `${levelK} K` : `${levelK} K above the ${baseline[0]}-${baseline[1]} mean`;
}

import { AR6_BASELINE as AR6_REFERENCE_PERIOD, isAr6Baseline } from '../metrics/warming-levels.js';

/** Reference period of the IPCC AR6 global warming levels, from metrics/warming-levels.ts (one home). */
export { AR6_REFERENCE_PERIOD, isAr6Baseline };

/**
 * The note an output carries when its warming, and so its thresholds, are relative to a baseline
 * other than 1850-1900: thresholds stay relative to the baseline in use, and this says that they
 * are then not the IPCC AR6 global warming levels. Shared by every command that names thresholds.
 *
 * @param baseline the baseline period of the warming, inclusive years
 * @returns the note (one sentence, no final full stop, like the other notes), or undefined for the
 *   1850-1900 baseline, where thresholds are AR6 levels
 * @example
 * thresholdBaselineNote([1850, 1900]) // undefined
 * thresholdBaselineNote([1995, 2014])
 * // 'IPCC AR6 global warming levels (1.5 K, 2 K) are relative to 1850-1900; with the 1995-2014
 * //  baseline the thresholds here are read against the 1995-2014 mean, so they are not AR6 levels;
 * //  use the default baseline (1850-1900) to compare with AR6 levels'
 */
export function thresholdBaselineNote(baseline: readonly [number, number]): string | undefined {
  if (isAr6Baseline(baseline)) return undefined;
  const period = `${baseline[0]}-${baseline[1]}`;
  const reference = AR6_REFERENCE_PERIOD.join('-');
  return (
    `IPCC AR6 global warming levels (1.5 K, 2 K) are relative to ${reference}; with the ${period} baseline the thresholds here ` +
    `are read against the ${period} mean, so they are not AR6 levels; use the default baseline (${reference}) to compare with AR6 levels`
  );
}

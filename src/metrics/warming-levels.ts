import { ConfigError } from '../errors.js';

/**
 * The one home of warmcast's warming-level conventions (DESIGN.md "Conventions"): the baseline
 * warming is measured from, the 20-year window a level is judged on, and where that window sits
 * around the year it is labelled with. Every command (run, compare, ensemble, and what builds on
 * them) takes these from here; crossingPeriod, runningMean and the ensemble's exceedance counting
 * use the same window.
 */

/**
 * Reference period of the IPCC AR6 global warming levels (1.5 K, 2 K), inclusive years: warming is
 * relative to the 1850-1900 mean unless `--baseline` says otherwise (IPCC AR6 WG1 SPM A.1.2).
 */
export const AR6_BASELINE: readonly [number, number] = [1850, 1900];

/**
 * The averaging window of a warming level: a level is reached in the middle year of the first
 * 20-year period whose mean exceeds it (IPCC AR6 WG1 Cross-Chapter Box 2.3; chapter 4, 4.3.4).
 * An even window has no middle year: year y stands for the mean of y-9 .. y+10, the earlier of the
 * two middle years (see crossingPeriod for why), so 2030 stands for 2021-2040.
 */
export const WARMING_LEVEL_WINDOW = { years: 20, before: 9, after: 10 } as const;

/** Whether warming relative to `baseline` is on the footing of the AR6 warming levels. */
export function isAr6Baseline(baseline: readonly [number, number]): boolean {
  return baseline[0] === AR6_BASELINE[0] && baseline[1] === AR6_BASELINE[1];
}

/**
 * The last year a crossing can be labelled with in data ending in `lastYear`: the labelled year of
 * the last complete 20-year window. A level first exceeded later cannot be seen yet; a run to 2100
 * shows crossings up to 2090.
 *
 * @param lastYear last year of the data
 * @example lastVisibleYear(2100) // 2090
 */
export function lastVisibleYear(lastYear: number): number {
  return lastYear - WARMING_LEVEL_WINDOW.after;
}

/**
 * The first complete 20-year window of data starting in `firstYear`, as inclusive years.
 * @example firstWindow(1750) // [1750, 1769]
 */
export function firstWindow(firstYear: number): [number, number] {
  return [firstYear, firstYear + WARMING_LEVEL_WINDOW.years - 1];
}

/**
 * Subtracts the mean over the baseline years (inclusive) from a series: warming relative to the
 * baseline period, in the series' unit (K).
 *
 * @param years consecutive integer years, ascending
 * @param values one value per year
 * @param baseline inclusive years
 * @param name what the series is, for the error message
 * @returns a new series
 * @throws ConfigError when the series does not cover the whole baseline
 * @example rebase(Float64Array.of(1850, 1851, 1852), Float64Array.of(0.1, 0.2, 0.3), [1850, 1851]) // [-0.05, 0.05, 0.15]
 */
export function rebase(years: ArrayLike<number>, values: Float64Array, baseline: readonly [number, number], name = 'pathway'): Float64Array {
  const [from, to] = baseline;
  const first = years[0];
  const last = years[years.length - 1];
  if (!(from <= to) || from < first || to > last) {
    throw new ConfigError(
      `baseline ${from}-${to} must lie within the years of ${name}, ${first}-${last}; give --baseline with years the run covers`,
      'baseline',
    );
  }
  let sum = 0;
  for (let y = from; y <= to; y++) sum += values[y - first];
  const mean = sum / (to - from + 1);
  return values.map((v) => v - mean);
}

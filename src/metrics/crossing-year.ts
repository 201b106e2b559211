import { WARMING_LEVEL_WINDOW } from './warming-levels.js';
import { runningMean } from './running-mean.js';

/** The first averaging period whose mean exceeds a warming level. */
export interface CrossingPeriod {
  /** The year the level counts as reached: the middle year of the period (earlier of two for an even window). */
  year: number;
  /** First year of the period. */
  firstYear: number;
  /** Last year of the period. */
  lastYear: number;
  /** Mean over the period, in the series' unit (K for warming). */
  mean: number;
  /**
   * True when the very first complete period of the data already exceeds the level: it was then
   * reached in `year` or earlier, and the data cannot say when.
   */
  atStart: boolean;
}

/**
 * The first `window`-year period whose mean exceeds `threshold`, following the IPCC AR6 WG1
 * convention that a global warming level is reached in the middle year of the first 20-year period
 * whose mean global surface temperature change is above the level (AR6 WG1 Cross-Chapter Box 2.3
 * and chapter 4, section 4.3.4; Table 4.5 gives crossings as 20-year periods).
 *
 * "Exceeds" is strict: a period whose mean equals the level does not count. A single year, or a few,
 * above the level do not count either; only the period mean matters.
 *
 * The middle of an even window: a 20-year period s..s+19 is centred on s + 9.5 (AR6 Table 4.5 reports
 * 2025-2044 as centred on 2034.5). We give the earlier middle year, s + 9. On a linear trend that is
 * the whole year nearest the moment the trend itself passes the level (the first exceeding period
 * has its centre within the year after that moment), so the reported year does not lag the trend.
 *
 * @param years consecutive integer years, ascending
 * @param values annual values, e.g. warming in K relative to 1850-1900
 * @param threshold the level, in the unit of `values` (e.g. 1.5 K)
 * @param window period length in years, default 20 (the AR6 convention)
 * @returns the period, or undefined when no complete period within the data exceeds the level
 * @throws ConfigError when `window` is not a positive integer
 * @example
 * // Warming rising 0.02 K per year from 1.0 K in 2010: the trend passes 1.5 K in 2035.
 * const years = Float64Array.from({ length: 91 }, (_, i) => 2010 + i);
 * const warming = years.map((y) => 1.0 + 0.02 * (y - 2010));
 * crossingPeriod(years, warming, 1.5) // { year: 2035, firstYear: 2026, lastYear: 2045, mean: ≈1.51, atStart: false }
 */
export function crossingPeriod(years: Float64Array, values: ArrayLike<number>, threshold: number, window: number = WARMING_LEVEL_WINDOW.years): CrossingPeriod | undefined {
  const means = runningMean(values, window, 'centred');
  const before = Math.floor((window - 1) / 2);
  for (let i = before; i < means.length; i++) {
    if (means[i] > threshold) {
      return { year: years[i], firstYear: years[i - before], lastYear: years[i - before + window - 1], mean: means[i], atStart: i === before };
    }
  }
  return undefined;
}

/**
 * The year a level counts as reached under the AR6 20-year-mean rule: the middle year of the first
 * `window`-year period whose mean exceeds `threshold` (see {@link crossingPeriod} for the rule and
 * how the middle of an even window is chosen).
 *
 * @param years consecutive integer years, ascending
 * @param values annual values (K for warming)
 * @param threshold the level, in the unit of `values`
 * @param window period length in years, default 20
 * @returns the year, or undefined when the level is not crossed within the data
 * @throws ConfigError when `window` is not a positive integer
 * @example
 * const years = Float64Array.from({ length: 91 }, (_, i) => 2010 + i);
 * crossingYear(years, years.map((y) => 1.0 + 0.02 * (y - 2010)), 1.5) // 2035
 * crossingYear(years, years.map((y) => 1.0 + 0.02 * (y - 2010)), 3.0) // undefined
 */
export function crossingYear(years: Float64Array, values: ArrayLike<number>, threshold: number, window: number = WARMING_LEVEL_WINDOW.years): number | undefined {
  return crossingPeriod(years, values, threshold, window)?.year;
}

/**
 * The last year a crossing can be labelled with in data ending in `lastYear`: the middle year (as
 * {@link crossingPeriod} labels it) of the last complete `window`-year period. A level first
 * exceeded later cannot be seen yet; with 20-year periods, data to 2100 show crossings up to 2090.
 *
 * @param lastYear last year of the data
 * @param window period length in years, default 20
 * @example lastCrossingYear(2100) // 2090
 */
export function lastCrossingYear(lastYear: number, window: number = WARMING_LEVEL_WINDOW.years): number {
  return lastYear - (window - 1 - Math.floor((window - 1) / 2));
}

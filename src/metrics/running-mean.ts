import { ConfigError } from '../errors.js';

/**
 * Where a running-mean window sits relative to the year it is reported at.
 *
 * - `centred`: an odd window of w years covers (w - 1) / 2 years on each side; an even window has
 *   no middle year, so it covers w / 2 - 1 years before and w / 2 years after. For the 20-year window
 *   that is Y-9..Y+10: the value at Y is the mean of the period whose two middle years are Y and Y+1,
 *   reported at the earlier of them (see {@link crossingPeriod} for why).
 * - `trailing`: the w years ending at Y, Y-w+1..Y.
 */
export type WindowAlignment = 'centred' | 'trailing';

/**
 * Running mean of `values` over windows of `window` consecutive entries, one result per entry: the
 * arithmetic mean of the window placed at that entry as `alignment` says. Entries whose window
 * runs past either end of the data are NaN (the mean is never taken over a partial window), and a
 * NaN inside a window makes that mean NaN. Each window is summed afresh, so no rounding drift
 * accumulates along the series.
 *
 * @param values annual values (any unit; the means have the same unit)
 * @param window number of years in each window, a positive integer
 * @param alignment `centred` (default) or `trailing`
 * @returns a new Float64Array, same length as `values`
 * @throws ConfigError when `window` is not a positive integer
 * @example
 * runningMean([1, 2, 3, 4, 5], 3) // Float64Array [NaN, 2, 3, 4, NaN]
 * runningMean([1, 2, 3, 4], 2) // Float64Array [1.5, 2.5, 3.5, NaN] (even window: the later middle year is Y+1)
 * runningMean([1, 2, 3, 4], 2, 'trailing') // Float64Array [NaN, 1.5, 2.5, 3.5]
 */
export function runningMean(values: ArrayLike<number>, window: number, alignment: WindowAlignment = 'centred'): Float64Array {
  if (!Number.isInteger(window) || window < 1) {
    throw new ConfigError(`the running-mean window must be a positive whole number of years, not ${window}`, 'window');
  }
  const n = values.length;
  const out = new Float64Array(n).fill(NaN);
  const before = alignment === 'trailing' ? window - 1 : Math.floor((window - 1) / 2);
  for (let i = before; i + window - before - 1 < n; i++) {
    let sum = 0;
    for (let k = i - before; k < i - before + window; k++) sum += values[k];
    out[i] = sum / window;
  }
  return out;
}

import { ConfigError } from '../errors.js';

/**
 * The default milestone years of a comparison: every `step` years on round multiples of `step`,
 * from the first multiple at or after `firstFutureYear` to `lastYear` (2030, 2040, ... for a
 * 10-year step), the years planning documents quote. `lastYear` is included only when it falls on
 * the grid.
 *
 * @param firstFutureYear first year of the projection that is not history
 * @param lastYear last year of the projection
 * @param step spacing in years, a positive integer (default 10)
 * @returns ascending whole years; empty when no multiple of `step` falls in the span
 * @throws ConfigError when `step` is not a positive integer
 * @example
 * milestoneYears(2024, 2100) // [2030, 2040, 2050, 2060, 2070, 2080, 2090, 2100]
 * milestoneYears(2030, 2075, 20) // [2040, 2060]
 */
export function milestoneYears(firstFutureYear: number, lastYear: number, step = 10): number[] {
  if (!Number.isInteger(step) || step < 1) {
    throw new ConfigError(`the milestone step must be a positive whole number of years, not ${step}`, 'step');
  }
  const out: number[] = [];
  for (let y = Math.ceil(firstFutureYear / step) * step; y <= lastYear; y += step) out.push(y);
  return out;
}

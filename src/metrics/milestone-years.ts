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

/** Which rows a human table shows: `--years` (exactly these) or `--every` (a step), else the default. */
export interface YearChoice {
  years?: readonly number[];
  every?: number;
}

/**
 * The milestone years a human table (Markdown, HTML, terminal) shows for data covering
 * `first`..`last` whose future starts in `firstFuture`: the years given (within the data), else
 * every `every` years on round multiples from `firstFuture`, else by default every 10 years up to
 * 2100 and every 25 after it, with the last year added when it is off that grid (a planner quotes
 * 2030, 2050, 2100; beyond 2100 a coarser step keeps the table short). CSV, JSON and xlsx keep
 * every year.
 *
 * @example reportYears(2025, 2150, 2025) // [2030, 2040, ..., 2100, 2125, 2150]
 * @example reportYears(2025, 2150, 2025, { every: 25 }) // [2025, 2050, 2075, 2100, 2125, 2150]
 */
export function reportYears(first: number, last: number, firstFuture: number, choice: YearChoice = {}): number[] {
  if (choice.years) return [...new Set(choice.years)].filter((y) => y >= first && y <= last).sort((a, b) => a - b);
  const start = Math.max(first, Math.min(firstFuture, last));
  if (choice.every !== undefined) return milestoneYears(start, last, choice.every);
  const out = milestoneYears(start, Math.min(last, 2100), 10);
  for (let y = 2125; y <= last; y += 25) if (y > (out.at(-1) ?? -Infinity)) out.push(y);
  if (out.at(-1) !== last) out.push(last);
  return out;
}

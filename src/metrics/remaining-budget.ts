import { ConfigError } from '../errors.js';
import { runningMean } from './running-mean.js';

/** The AR6 warming-level window, years. */
const WARMING_LEVEL_WINDOW_YEARS = 20;

/**
 * One ensemble member as the budget search sees it: the warming it shows for a given future of net
 * CO2 emissions, everything else (its parameters, the history, the non-CO2 path) held fixed.
 */
export interface BudgetMember {
  /**
   * Runs the member with net CO2 emissions `futureCo2Gtco2` (calendar-year totals, Gt CO2, one per
   * year from the budget's first year to the run's last) and returns its warming, K above the
   * baseline, one value per year of the whole run (`years` of {@link RemainingBudgetOptions}).
   * With `co2Only`, also the part of that warming due to CO2 alone (for the zero-emissions
   * commitment); members that cannot split it return undefined there.
   */
  warming(futureCo2Gtco2: Float64Array): { warmingK: Float64Array; co2WarmingK?: Float64Array };
}

/** Options of {@link remainingBudget}. */
export interface RemainingBudgetOptions {
  /** Consecutive integer years of the members' runs (history included). */
  years: Float64Array;
  /** First calendar year counted in the budget (counted from 1 January of it). */
  fromYear: number;
  /** Net CO2 emission rate at the start of `fromYear`, Gt CO2 yr-1 (the straight line starts here); > 0. */
  currentRateGtco2: number;
  /** Warming limits, K. */
  limits: number[];
  /** Chances of staying at or below each limit, in (0, 1). */
  chances: number[];
  /**
   * Longest decline searched, years: a member that still stays below the limit when net zero comes
   * this late has a budget of at least currentRate x maxDeclineYears / 2. Default: as long as the run
   * allows with a 20-year window and 50 years after net zero to see the peak.
   */
  maxDeclineYears?: number;
  /** Bisection stops when the net-zero time is known to this many years (default 0.01). */
  toleranceYears?: number;
}

/** What one member allows for one limit. */
export interface MemberBudget {
  /** Largest cumulative net CO2 from 1 January of fromYear along the straight-line family, Gt CO2. */
  budgetGtco2: number;
  /** `exceeded`: even an immediate stop peaks above the limit; `beyond`: the longest decline searched stays below; else `found`. */
  status: 'found' | 'exceeded' | 'beyond';
}

/** The remaining budget for one limit and chance. */
export interface BudgetRow {
  limitK: number;
  /** Chance of keeping peak warming at or below the limit, in (0, 1). */
  chance: number;
  /**
   * Remaining budget, Gt CO2 from 1 January of fromYear: the (1 - chance) quantile of the members'
   * budgets. NaN when the limit cannot be held with that chance (`met` false).
   */
  budgetGtco2: number;
  /** Calendar year in which the straight-line decline from the current rate that spends the budget reaches zero. */
  netZeroYear: number;
  /** False when more than 1 - chance of the members exceed the limit even if net CO2 stopped at once. */
  met: boolean;
  /** True when the budget is a lower bound: enough members stay below the limit with the longest decline searched. */
  atLeast: boolean;
}

/** Result of {@link remainingBudget}. */
export interface RemainingBudget {
  rows: BudgetRow[];
  /** Per limit (in the order given), each member's budget. */
  members: MemberBudget[][];
  /** Longest decline searched, years. */
  maxDeclineYears: number;
}

/**
 * Annual totals of a net CO2 path that falls in a straight line from `rate` at the start of the
 * first year to zero `declineYears` later and stays at zero: year i holds the integral of
 * rate (1 - t / D) over [i, i + 1] ∩ [0, D], so the totals add up to rate D / 2 exactly.
 *
 * @param rate emission rate at the start, Gt CO2 yr-1
 * @param declineYears D, years from the start to net zero (>= 0)
 * @param length number of years
 * @returns annual totals, Gt CO2
 * @example straightLineDecline(40, 2, 3) // Float64Array [30, 10, 0]
 */
export function straightLineDecline(rate: number, declineYears: number, length: number): Float64Array {
  const out = new Float64Array(length);
  const d = declineYears;
  for (let i = 0; i < length && i < d; i++) {
    const b = Math.min(i + 1, d);
    out[i] = rate * (b - i - (b * b - i * i) / (2 * d));
  }
  return out;
}

/**
 * The highest 20-year mean warming (the IPCC AR6 warming-level convention) over the windows labelled
 * from `fromIndex` on whose years all lie in the run.
 */
export function peakWindowMean(warmingK: Float64Array, fromIndex: number): number {
  const means = runningMean(warmingK, WARMING_LEVEL_WINDOW_YEARS);
  let best = -Infinity;
  for (let i = Math.max(0, fromIndex); i < means.length; i++) if (means[i] > best) best = means[i];
  return best;
}

/**
 * Remaining CO2 budgets: for each member, the largest cumulative net CO2 from 1 January of
 * `fromYear` along a family of pathways (net CO2 falling in a straight line from the current rate to
 * net zero, then zero; the members' non-CO2 path fixed) for which the member's peak warming (the
 * highest 20-year mean, AR6 convention) stays at or below the limit; found by bisection on the
 * net-zero time, peak warming rising with it. The budget at chance p is the (1 - p) quantile of the
 * members' budgets (linear between order statistics, Hyndman & Fan 1996 definition 7), so that a
 * share p of the members stays at or below the limit with it.
 *
 * @throws ConfigError when the rate is not positive, a chance is not in (0, 1), a limit not positive,
 *   or the run is too short to see a peak after fromYear
 * @example
 * // members whose peak is 1.1 K + 0.00045 K per Gt CO2 (TCRE 0.45 K per 1000 Gt CO2):
 * remainingBudget(members, { years, fromYear: 2025, currentRateGtco2: 40, limits: [1.5], chances: [0.5] }).rows[0].budgetGtco2 // ≈ 889
 */
export function remainingBudget(members: readonly BudgetMember[], options: RemainingBudgetOptions): RemainingBudget {
  const { years, fromYear, currentRateGtco2: rate, limits, chances } = options;
  if (!(rate > 0)) throw new ConfigError(`the current net CO2 rate must be positive to fall to net zero, got ${rate} Gt CO2 per year`, 'rate');
  for (const c of chances) if (!(c > 0 && c < 1)) throw new ConfigError(`a chance must lie between 0 and 1 (or 0 and 100 %), got ${c}`, 'chance');
  for (const l of limits) if (!(l > 0)) throw new ConfigError(`a warming limit must be positive, got ${l} K`, 'limit');
  if (members.length === 0) throw new ConfigError('a budget needs at least one member', 'members');
  const fromIndex = fromYear - years[0];
  const futureLength = years.length - fromIndex;
  const room = futureLength - WARMING_LEVEL_WINDOW_YEARS - 50;
  if (fromIndex < 0 || room < 10) {
    throw new ConfigError(`the run (${years[0]}-${years[years.length - 1]}) must reach at least 80 years past ${fromYear} to see the peak of a budget pathway`, 'from');
  }
  const maxDecline = Math.min(options.maxDeclineYears ?? room, room);
  const tolerance = options.toleranceYears ?? 0.01;

  const perLimit: MemberBudget[][] = limits.map(() => []);
  for (const member of members) {
    const peakFor = (d: number) => peakWindowMean(member.warming(straightLineDecline(rate, d, futureLength)).warmingK, fromIndex);
    const atStop = peakFor(0);
    const atMax = peakFor(maxDecline);
    limits.forEach((limit, li) => {
      if (atStop > limit) perLimit[li].push({ budgetGtco2: -Infinity, status: 'exceeded' });
      else if (atMax <= limit) perLimit[li].push({ budgetGtco2: (rate * maxDecline) / 2, status: 'beyond' });
      else {
        let lo = 0;
        let hi = maxDecline;
        while (hi - lo > tolerance) {
          const mid = 0.5 * (lo + hi);
          if (peakFor(mid) <= limit) lo = mid;
          else hi = mid;
        }
        perLimit[li].push({ budgetGtco2: (rate * lo) / 2, status: 'found' });
      }
    });
  }

  const rows: BudgetRow[] = [];
  limits.forEach((limitK, li) => {
    const sorted = perLimit[li].map((m) => m.budgetGtco2).sort((a, b) => a - b);
    const beyondCap = (rate * maxDecline) / 2;
    for (const chance of chances) {
      const q = budgetQuantile(sorted, 1 - chance);
      const met = q > -Infinity;
      const budgetGtco2 = met ? q : NaN;
      rows.push({
        limitK,
        chance,
        budgetGtco2,
        netZeroYear: met ? Math.floor(fromYear + (2 * budgetGtco2) / rate) : NaN,
        met,
        atLeast: met && budgetGtco2 >= beyondCap,
      });
    }
  });
  return { rows, members: perLimit, maxDeclineYears: maxDecline };
}

/**
 * The q quantile of sorted budgets (definition 7): -Infinity when either order statistic it rests on
 * is -Infinity (too many members exceed the limit at once), else linear between them.
 */
function budgetQuantile(sorted: number[], q: number): number {
  const h = (sorted.length - 1) * q;
  const lo = Math.floor(h);
  const hi = Math.ceil(h);
  if (sorted[lo] === -Infinity || sorted[hi] === -Infinity) return -Infinity;
  return sorted[lo] + (h - lo) * (sorted[hi] - sorted[lo]);
}

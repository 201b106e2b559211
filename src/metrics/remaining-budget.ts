import { ConfigError } from '../errors.js';
import { quantileSorted } from '../numerics/quantiles.js';
import { runningMean } from './running-mean.js';

/** The AR6 warming-level window, years. */
const WARMING_LEVEL_WINDOW_YEARS = 20;

/**
 * How closely each member's budget is found, Gt CO2: the search stops when the member's largest
 * cumulative CO2 within the limit is known to this, from below. Half of the 1 Gt CO2 the tables
 * round to, so a budget (a quantile of the members' budgets) is off by less than that.
 */
export const BUDGET_TOLERANCE_GTCO2 = 0.5;

/**
 * One ensemble member as the budget search sees it: the warming it shows for a given future of net
 * CO2 emissions, everything else (its parameters, the history, the non-CO2 path) held fixed.
 */
export interface BudgetMember {
  /**
   * Runs the member with net CO2 emissions `futureCo2Gtco2` (calendar-year totals, Gt CO2, one per
   * year from the budget's first year to the run's last) and returns its warming, K above the
   * baseline, one value per year of the whole run (`years` of {@link RemainingBudgetOptions}).
   */
  warming(futureCo2Gtco2: Float64Array): Float64Array;
}

/**
 * A one-parameter family of future net CO2 paths, cumulative CO2 rising with the parameter x (the
 * years of a straight-line decline, or the stretch of a user's own shape).
 */
export interface Co2PathFamily {
  /** Annual totals, Gt CO2, for years fromYear.. (length years). */
  path(x: number, length: number): Float64Array;
  /** Cumulative net CO2 to net zero from 1 January of fromYear, Gt CO2. */
  cumulativeGtco2(x: number): number;
  /** Calendar year in which net CO2 reaches zero. */
  netZeroYear(x: number): number;
  /** Smallest x searched (the earliest net zero the family has). */
  min: number;
  /** Largest x the run lets us see a peak after (the caller's bound, clamped to the run). */
  max: number;
  /** Root finding stops when x is known to this: {@link BUDGET_TOLERANCE_GTCO2} in units of x. */
  tolerance: number;
}

/** Options of {@link remainingBudget}. */
export interface RemainingBudgetOptions {
  /** Consecutive integer years of the members' runs (history included). */
  years: Float64Array;
  /** First calendar year counted in the budget (counted from 1 January of it). */
  fromYear: number;
  /** Warming limits, K. */
  limits: number[];
  /** Chances of staying at or below each limit, in (0, 1). */
  chances: number[];
}

/** What one member allows for one limit. */
export interface MemberBudget {
  /** Largest family parameter x whose peak stays at or below the limit (-Infinity: none; max: at least max). */
  x: number;
  /** `exceeded`: even the smallest x peaks above the limit; `beyond`: the largest x stays below; else `found`. */
  status: 'found' | 'exceeded' | 'beyond';
}

/** The remaining budget for one limit and chance. */
export interface BudgetRow {
  limitK: number;
  /** Chance of keeping peak warming at or below the limit, in (0, 1). */
  chance: number;
  /** Cumulative net CO2 to net zero from 1 January of fromYear, Gt CO2; NaN when `met` is false. */
  budgetGtco2: number;
  /** Calendar year net CO2 reaches zero along the family member that spends the budget; NaN when not met. */
  netZeroYear: number;
  /** The family parameter of that pathway (the (1 - chance) quantile of the members'); -Infinity when not met. */
  x: number;
  /** False when more than 1 - chance of the members exceed the limit even with the family's earliest net zero. */
  met: boolean;
  /** True when the figures are lower bounds: enough members stay below the limit with the latest net zero searched. */
  atLeast: boolean;
}

/** Result of {@link remainingBudget}. */
export interface RemainingBudget {
  rows: BudgetRow[];
  /** Per limit (in the order given), each member's result. */
  members: MemberBudget[][];
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
 * The straight-line family: net CO2 from `rate` on 1 January of `fromYear` down to zero after x
 * years, then zero; cumulative CO2 rate x / 2.
 * @param maxYears the longest decline searched
 */
export function straightLineFamily(rate: number, fromYear: number, maxYears: number): Co2PathFamily {
  if (!(rate > 0)) throw new ConfigError(`the current net CO2 rate must be positive to fall to net zero, got ${rate} Gt CO2 per year`, 'rate');
  return {
    path: (x, length) => straightLineDecline(rate, x, length),
    cumulativeGtco2: (x) => (rate * x) / 2,
    netZeroYear: (x) => Math.floor(fromYear + x),
    min: 0,
    max: maxYears,
    tolerance: (2 * BUDGET_TOLERANCE_GTCO2) / rate,
  };
}

/**
 * A user's own net CO2 shape stretched or compressed in time by a factor x: the rate in year t after
 * 1 January of fromYear is the shape's rate at t / x (each year of the shape a constant rate, its
 * annual total), so cumulative CO2 to net zero and the time to net zero both scale with x.
 *
 * @param shape annual totals from fromYear on, Gt CO2; must reach net zero (a value <= 0)
 * @param fromYear first year of `shape`
 * @param xRange smallest and largest stretch searched
 * @throws ConfigError when the shape never reaches net zero or starts at or below it
 */
export function stretchedShapeFamily(shape: ArrayLike<number>, fromYear: number, xRange: [number, number]): Co2PathFamily {
  let zero = -1;
  for (let i = 0; i < shape.length; i++) if (shape[i] <= 0) { zero = i; break; }
  if (zero < 1) {
    throw new ConfigError(
      zero === 0 ? `the pathway's net CO2 is already at or below zero in ${fromYear}: there is no decline to stretch` : 'the pathway\'s net CO2 never reaches zero: --shape needs a pathway that reaches net zero',
      'shape',
    );
  }
  let total = 0;
  for (let i = 0; i < zero; i++) total += shape[i];
  const rateAt = (tau: number) => (tau < shape.length ? shape[Math.floor(tau)] : shape[shape.length - 1]);
  return {
    path(x, length) {
      // Integral of rateAt(t / x) over [i, i + 1] = x times the integral of rateAt over [i / x, (i + 1) / x].
      const out = new Float64Array(length);
      for (let i = 0; i < length; i++) {
        const a = i / x;
        const b = (i + 1) / x;
        let sum = 0;
        for (let k = Math.floor(a); k < b; k++) sum += rateAt(k) * (Math.min(b, k + 1) - Math.max(a, k));
        out[i] = x * sum;
      }
      return out;
    },
    cumulativeGtco2: (x) => x * total,
    netZeroYear: (x) => Math.floor(fromYear + x * zero),
    min: xRange[0],
    max: xRange[1],
    tolerance: BUDGET_TOLERANCE_GTCO2 / total,
  };
}

/**
 * The highest 20-year mean warming (the IPCC AR6 warming-level convention) over the windows labelled
 * from `fromIndex` on whose years all lie in the run.
 */
export function peakWindowMean(warmingK: ArrayLike<number>, fromIndex: number): number {
  const means = runningMean(warmingK, WARMING_LEVEL_WINDOW_YEARS);
  let best = -Infinity;
  for (let i = Math.max(0, fromIndex); i < means.length; i++) if (means[i] > best) best = means[i];
  return best;
}

/**
 * Remaining CO2 budgets: for each member, the largest cumulative net CO2 from 1 January of
 * `fromYear` along a family of pathways (by default net CO2 falling in a straight line from the
 * current rate to net zero, then zero; the members' non-CO2 path fixed) for which the member's peak
 * warming (the highest 20-year mean, AR6 convention) stays at or below the limit; found to within
 * {@link BUDGET_TOLERANCE_GTCO2} by bracketed root finding (regula falsi, Illinois variant) on the
 * family's parameter, peak warming rising with it (every run of a member narrows the brackets of its
 * other limits too). The budget at chance p is the (1 - p)
 * quantile of the members' parameters (linear between order statistics, Hyndman & Fan 1996
 * definition 7), mapped to cumulative CO2, so that a share p of the members stays at or below the
 * limit with it.
 *
 * @throws ConfigError when a chance is not in (0, 1), a limit is not positive, there are no members,
 *   or the run is too short to see a peak after fromYear
 * @example
 * // members whose warming is 1.1 K + 0.00045 K per Gt CO2 (TCRE 0.45 K per 1000 Gt CO2):
 * remainingBudget(members, straightLineFamily(40, 2025, 200), { years, fromYear: 2025, limits: [1.5], chances: [0.5] }).rows[0].budgetGtco2 // ≈ 889
 */
export function remainingBudget(members: readonly BudgetMember[], family: Co2PathFamily, options: RemainingBudgetOptions): RemainingBudget {
  const { years, fromYear, limits, chances } = options;
  for (const c of chances) if (!(c > 0 && c < 1)) throw new ConfigError(`a chance must lie between 0 and 1 (or 0 and 100 %), got ${c}`, 'chance');
  for (const l of limits) if (!(l > 0)) throw new ConfigError(`a warming limit must be positive, got ${l} K`, 'limit');
  if (members.length === 0) throw new ConfigError('a budget needs at least one member', 'members');
  const fromIndex = fromYear - years[0];
  const futureLength = years.length - fromIndex;
  if (fromIndex < 0 || futureLength < WARMING_LEVEL_WINDOW_YEARS + 10) {
    throw new ConfigError(`the run (${years[0]}-${years[years.length - 1]}) must reach well past ${fromYear} to see the peak of a budget pathway`, 'from');
  }

  const perLimit: MemberBudget[][] = limits.map(() => []);
  for (const member of members) {
    // Every (x, peak) tried for this member: peak rises with x, so each one narrows the bracket of every later limit.
    const tried: TrialPoint[] = [];
    const peakFor = (x: number) => {
      const peak = peakWindowMean(member.warming(family.path(x, futureLength)), fromIndex);
      tried.push({ x, peak });
      return peak;
    };
    const atMin = peakFor(family.min);
    const atMax = peakFor(family.max);
    limits.forEach((limit, li) => {
      if (atMin > limit) perLimit[li].push({ x: -Infinity, status: 'exceeded' });
      else if (atMax <= limit) perLimit[li].push({ x: family.max, status: 'beyond' });
      else perLimit[li].push({ x: largestWithin(peakFor, limit, family.tolerance, tightestBracket(tried, limit)), status: 'found' });
    });
  }

  const rows: BudgetRow[] = [];
  limits.forEach((limitK, li) => {
    const sorted = perLimit[li].map((m) => m.x).sort((a, b) => a - b);
    for (const chance of chances) {
      const x = quantileOrMinusInfinity(sorted, 1 - chance);
      const met = x > -Infinity;
      rows.push({
        limitK,
        chance,
        budgetGtco2: met ? family.cumulativeGtco2(x) : NaN,
        netZeroYear: met ? family.netZeroYear(x) : NaN,
        x,
        met,
        atLeast: met && x >= family.max,
      });
    }
  });
  return { rows, members: perLimit };
}

/** One evaluation of a member's peak warming, K, at the family parameter x. */
interface TrialPoint {
  x: number;
  peak: number;
}

/**
 * The narrowest bracket of a limit among the points tried: the largest x whose peak is at or below
 * it and the smallest x whose peak is above it (peak rising with x). The family's min and max are
 * among the points, on either side.
 */
function tightestBracket(tried: readonly TrialPoint[], limit: number): [TrialPoint, TrialPoint] {
  let lo: TrialPoint = { x: -Infinity, peak: -Infinity };
  let hi: TrialPoint = { x: Infinity, peak: Infinity };
  for (const t of tried) {
    if (t.peak <= limit) {
      if (t.x > lo.x) lo = t;
    } else if (t.x < hi.x) hi = t;
  }
  return [lo, hi];
}

/**
 * The largest x in the bracket with peak(x) <= limit, given peak(lo) <= limit < peak(hi): the
 * Illinois variant of regula falsi (Dowell & Jarratt 1971), which keeps a bracket like bisection but
 * converges in a few evaluations on a smooth, near-linear peak(x); it stops when the bracket is
 * narrower than `tolerance` and returns the side that holds the limit.
 */
function largestWithin(peak: (x: number) => number, limit: number, tolerance: number, [from, to]: [TrialPoint, TrialPoint]): number {
  let lo = from.x;
  let hi = to.x;
  let flo = from.peak - limit;
  let fhi = to.peak - limit;
  let side = 0;
  for (let i = 0; i < 100 && hi - lo > tolerance; i++) {
    let x = lo - (flo * (hi - lo)) / (fhi - flo);
    // Keep the trial point well inside the bracket so the bracket always shrinks.
    const margin = 0.5 * tolerance;
    x = Math.min(hi - margin, Math.max(lo + margin, x));
    const fx = peak(x) - limit;
    if (fx <= 0) {
      lo = x;
      flo = fx;
      if (side === -1) fhi /= 2;
      side = -1;
    } else {
      hi = x;
      fhi = fx;
      if (side === 1) flo /= 2;
      side = 1;
    }
  }
  return lo;
}

/** How much a budget moves when the members are drawn again: one per row of {@link RemainingBudget}. */
export interface BudgetSpread {
  limitK: number;
  chance: number;
  /** Standard deviation of the budget over the resamples in which it is possible, Gt CO2 (NaN if in none). */
  sdGtco2: number;
  /** Share of the resamples in which the budget is not possible. */
  notPossibleShare: number;
}

/**
 * The sampling spread of each budget, by the bootstrap (Efron 1979): the members' budgets are drawn
 * again with replacement, as many as there are, `replicates` times; each budget is recomputed from
 * every resample as {@link remainingBudget} computes it. The standard deviation over the resamples
 * estimates the budget's standard deviation from one draw of as many members to another (the
 * seed's effect), and for the whole of a finite set, the sampling error of the set's own budget
 * against the distribution the set was drawn from.
 *
 * @param result the members' budgets (remainingBudget)
 * @param family the family they were found along (to turn parameters into Gt CO2)
 * @param replicates number of resamples (200 give the standard deviation to about 5 %: 1 / sqrt(2 (replicates - 1)))
 * @param random uniform numbers in [0, 1), injected so the spread is reproducible
 * @returns one spread per row of `result.rows`, in the same order
 * @example
 * // 400 members whose budgets spread as a normal distribution with sd 100 Gt CO2, at 50 %:
 * budgetSamplingSpread(result, family, 1000, random)[0].sdGtco2 // ≈ 6.2 (asymptotically 100 sqrt(0.25 / 400) / 0.399 = 6.3)
 */
export function budgetSamplingSpread(result: RemainingBudget, family: Co2PathFamily, replicates: number, random: () => number): BudgetSpread[] {
  const spreads: BudgetSpread[] = [];
  const perLimit = result.rows.length / result.members.length;
  result.members.forEach((memberBudgets, li) => {
    const xs = memberBudgets.map((m) => m.x);
    const n = xs.length;
    const rows = result.rows.slice(li * perLimit, (li + 1) * perLimit);
    const budgets: number[][] = rows.map(() => []);
    const resample = new Float64Array(n);
    for (let b = 0; b < replicates; b++) {
      for (let i = 0; i < n; i++) resample[i] = xs[Math.floor(random() * n)];
      resample.sort();
      rows.forEach((r, j) => {
        const x = quantileOrMinusInfinity(resample, 1 - r.chance);
        if (x > -Infinity) budgets[j].push(family.cumulativeGtco2(x));
      });
    }
    rows.forEach((r, j) => {
      spreads.push({ limitK: r.limitK, chance: r.chance, sdGtco2: standardDeviation(budgets[j]), notPossibleShare: 1 - budgets[j].length / replicates });
    });
  });
  return spreads;
}

/** Sample standard deviation (n - 1 in the denominator); NaN for fewer than two values. */
function standardDeviation(values: readonly number[]): number {
  const n = values.length;
  if (n < 2) return NaN;
  const mean = values.reduce((a, b) => a + b, 0) / n;
  return Math.sqrt(values.reduce((a, v) => a + (v - mean) ** 2, 0) / (n - 1));
}

/**
 * The q quantile of sorted values (quantileSorted, definition 7): -Infinity when the lower order
 * statistic it rests on is -Infinity (too many members exceed the limit at once; sorted ascending, so
 * the upper one can be -Infinity only if the lower one is), else linear between them.
 */
function quantileOrMinusInfinity(sorted: ArrayLike<number>, q: number): number {
  return sorted[Math.floor((sorted.length - 1) * q)] === -Infinity ? -Infinity : quantileSorted(sorted, q);
}

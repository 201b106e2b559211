import type { Comparison, PathwayComparison } from './compare-pathways.js';
import { valueAtYear } from './value-at-year.js';
import { lastVisibleYear } from './warming-levels.js';

/** Years whose warming every headline states, where the run covers them. */
export const HEADLINE_YEARS: readonly number[] = [2030, 2050, 2100];

/** A central value with its likely (17-83 %) and very likely (5-95 %) ranges across members, K. */
export interface HeadlineRange {
  p05: number;
  p17: number;
  p83: number;
  p95: number;
}

/** The answers one option's outputs lead with (terminal first lines, every file's `headline`). */
export interface Headline {
  /** The option's label (short, as in table headers). */
  label: string;
  /** Members behind the figures; absent for a single central run. */
  members?: number;
  /** Warming at the headline years the run covers, K relative to the baseline (the median with members). */
  atYears: { year: number; warmingK: number; range?: HeadlineRange }[];
  /**
   * The peak: the highest annual warming and its year. With members, each member's own peak
   * summarised (median warming with its 5-95 % range, median year, share still rising at the end);
   * `stillRising` then says whether most members are.
   */
  peak: { warmingK: number; year: number; stillRising: boolean; range?: { p05: number; p95: number }; shareStillRising?: number };
  /** Per warming level, when it is reached (AR6 20-year-mean rule). */
  crossings: {
    thresholdK: number;
    /** The crossing year; with members, the first year by which half of them have crossed. Null when not within the run. */
    year: number | null;
    /** True when the first 20-year window of the data is already above the level (reached then or earlier). */
    orEarlier: boolean;
    /** The last year the run can show a crossing for (its end less 10 years). */
    lastVisibleYear: number;
    /** With members: the share that has crossed by each headline year (null where the run cannot show it), the `crossed_by_<t>` column's value. */
    crossedBy?: { year: number; share: number | null }[];
    /** With members: the share crossed by `lastVisibleYear`, what can be said for a headline year the run cannot show. */
    crossedByLastVisible?: number;
  }[];
}

/**
 * The headline of each option of a comparison (a single run or an ensemble is a comparison of
 * one): warming at 2030, 2050 and 2100, the peak and its year, and the crossing year of each level.
 * With members the figures come from the members (median line and ranges; crossing years are the
 * first years by which half have crossed; shares crossed by the headline years are read from the
 * same per-year series as the files' `crossed_by_<t>` columns, so the two always agree).
 *
 * @param c the comparison
 * @param years headline years (default 2030, 2050, 2100)
 * @returns one headline per pathway, reference first
 * @example headlines(c)[0].atYears // [{ year: 2030, warmingK: 1.51 }, { year: 2050, warmingK: 2.06 }, { year: 2100, warmingK: 2.76 }]
 */
export function headlines(c: Comparison, years: readonly number[] = HEADLINE_YEARS): Headline[] {
  return c.pathways.map((p) => headlineOf(p, years));
}

function headlineOf(p: PathwayComparison, years: readonly number[]): Headline {
  const covered = years.filter((y) => y >= p.firstYear && y <= p.lastYear);
  const atYears = covered.map((year) => ({
    year,
    warmingK: valueAtYear(p.years, p.warmingK, year),
    ...(p.range
      ? { range: { p05: valueAtYear(p.years, p.range.p05, year), p17: valueAtYear(p.years, p.range.p17, year), p83: valueAtYear(p.years, p.range.p83, year), p95: valueAtYear(p.years, p.range.p95, year) } }
      : {}),
  }));
  const mp = p.membersPeak;
  const peak = mp
    ? { warmingK: mp.warmingK.p50, year: Math.round(mp.year.p50), stillRising: mp.stillRising >= 0.5, range: { p05: mp.warmingK.p05, p95: mp.warmingK.p95 }, shareStillRising: mp.stillRising }
    : { warmingK: p.peak.value, year: p.peak.year, stillRising: p.stillRising };
  const last = lastVisibleYear(p.lastYear);
  const crossings = p.crossings.map(({ thresholdK, period, odds }) => {
    if (!odds) return { thresholdK, year: period ? period.year : null, orEarlier: period ? period.atStart : false, lastVisibleYear: last };
    const crossedBy = covered.map((year) => {
      const share = odds.crossedBy[year - p.firstYear];
      return { year, share: Number.isFinite(share) ? share : null };
    });
    // Half of the members above the level in the first 20-year window: reached then or earlier.
    const atStart = odds.medianYear !== null && odds.medianYear === firstLabelledYear(odds.crossedBy, p.firstYear);
    const lastShare = odds.crossedBy[last - p.firstYear];
    return { thresholdK, year: odds.medianYear, orEarlier: atStart, lastVisibleYear: last, crossedBy, crossedByLastVisible: Number.isFinite(lastShare) ? lastShare : odds.withinRun };
  });
  return { label: p.label, ...(p.crossingOdds ? { members: p.memberCount } : {}), atYears, peak, crossings };
}

/** The first year with a value in a per-year share series (the first labelled year of a 20-year window). */
function firstLabelledYear(series: Float64Array, firstYear: number): number {
  const i = series.findIndex(Number.isFinite);
  return i < 0 ? NaN : firstYear + i;
}

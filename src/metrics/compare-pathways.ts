import { ConfigError } from '../errors.js';
import { crossingPeriod, type CrossingPeriod } from './crossing-year.js';
import { cumulativeToNetZero, type NetZero } from './cumulative-to-net-zero.js';
import { differences } from './differences.js';
import { peak, type Peak } from './peak.js';
import type { Series } from './series.js';
import { valueAtYear } from './value-at-year.js';
import { WARMING_LEVEL_WINDOW } from './warming-levels.js';

/** Ensemble percentiles of warming, K relative to 1850-1900, one value per year. */
export interface WarmingRange {
  p05: Float64Array;
  p17: Float64Array;
  p83: Float64Array;
  p95: Float64Array;
}

/**
 * How likely an ensemble makes the crossing of one warming level: shares of its members, each
 * member crossing when its 20-year mean warming first exceeds the level (the same rule as
 * `crossingPeriod`).
 */
export interface CrossingOdds {
  /** Warming level, K above the baseline. */
  thresholdK: number;
  /** Share of members that have crossed by each year (0-1); null where the run does not cover the 20-year window around that year. */
  byYear: { year: number; probability: number | null }[];
  /** First year by which at least half of the members have crossed; null when fewer than half cross within the run. */
  medianYear: number | null;
  /** Share of members that cross within the run (0-1). */
  withinRun: number;
  /** The last year with a complete 20-year window, by which `withinRun` have crossed (what can be said for a milestone the run does not cover). */
  lastWindowYear: number;
  /** Per year, the share of members whose 20-year mean warming around that year exceeds the level (NaN where the window leaves the run). */
  shareAbove: Float64Array;
  /**
   * Per year, the share of members that have crossed the level by that year (never decreasing; NaN
   * where the window leaves the run): what "crossed by 2100" quotes.
   */
  crossedBy: Float64Array;
}

/** Five percentiles (5, 17, 50, 83, 95 %) of one quantity across an ensemble's members. */
export interface MemberPercentiles {
  p05: number;
  p17: number;
  p50: number;
  p83: number;
  p95: number;
}

/**
 * The members' own peaks of an ensemble: each member's highest annual warming over the run and its
 * year, summarised across members (not the peak of the median line, which is lower and smoother).
 */
export interface MembersPeak {
  /** Percentiles of the members' peak warming, K relative to the baseline. */
  warmingK: MemberPercentiles;
  /** Percentiles of the members' peak years, each a year some member peaks in. */
  year: MemberPercentiles;
  /** Share of members whose peak is the run's last year: still rising at its end (0-1). */
  stillRising: number;
}

/** One pathway's projected warming, as a comparison takes it. */
export interface PathwayWarming {
  /** Display name; names in one comparison must be distinct. */
  label: string;
  /** Consecutive integer years, ascending. */
  years: Float64Array;
  /** Warming, K relative to 1850-1900 (the central estimate, or the median of an ensemble). */
  warmingK: Float64Array;
  /** Ensemble percentiles, when an ensemble was run. */
  range?: WarmingRange;
  /**
   * The ensemble's crossing odds, one entry per threshold of the comparison (matched by level), when
   * an ensemble was run. With them, `warmingK` is the ensemble median and reports take crossings
   * from the members rather than from the median line.
   */
  crossingOdds?: CrossingOdds[];
  /** The members' own peaks, when an ensemble was run; reports then give them as the pathway's peak. */
  membersPeak?: MembersPeak;
  /** Members of the ensemble, when one was run. */
  memberCount?: number;
  /** Net CO2 emissions, Gt CO2 per year, when the run is emission-driven. */
  co2Gtco2?: Float64Array;
  /**
   * Percentiles across paired members of this pathway's warming minus the reference's (member i of
   * each pathway shares its sampled parameters), K, when both ran ensembles with the same seed.
   */
  differenceRange?: WarmingRange & { p50: Float64Array };
  /** The full name of the pathway when `label` is a short label chosen for tables and headers. */
  name?: string;
}

/** What a comparison reports and how. */
export interface ComparisonOptions {
  /** Years of the milestone table. */
  milestoneYears: readonly number[];
  /** Warming levels whose crossing years are reported, K (default 1.5 and 2, the Paris Agreement levels). */
  thresholdsK?: readonly number[];
  /** Averaging period for crossings, years (default 20, the IPCC AR6 convention). */
  windowYears?: number;
  /** Years whose warming every pathway summary states (default 2050 and 2100). */
  keyYears?: readonly number[];
  /** First year counted in cumulative CO2 emissions (default each pathway's first year). */
  cumulativeFromYear?: number;
}

/** Warming of one pathway at one milestone year. */
export interface MilestoneValue {
  year: number;
  /** Warming, K; NaN when the pathway does not cover the year. */
  warmingK: number;
  /** This pathway minus the reference, K; 0 for the reference itself; NaN when either lacks the year. */
  differenceK: number;
  /** Ensemble percentiles at the year, K, when the pathway has a range. */
  range?: { p05: number; p17: number; p83: number; p95: number };
}

/** One pathway's results within a comparison. */
export interface PathwayComparison extends PathwayWarming {
  /** Warming minus the reference's, K, on the years both cover. */
  differenceK: Series;
  milestones: MilestoneValue[];
  /** Highest annual warming of `warmingK` (the median line of an ensemble), K, and its year. */
  peak: Peak;
  /** True when the peak is the last year: warming is still rising (or flat) at the end of the data. */
  stillRising: boolean;
  /**
   * One entry per threshold, in order: the first 20-year period of `warmingK` above it, or
   * undefined, and the ensemble's odds of crossing it when the pathway has an ensemble.
   */
  crossings: { thresholdK: number; period: CrossingPeriod | undefined; odds?: CrossingOdds }[];
  /** Warming at each key year, K (NaN when not covered). */
  keyYears: { year: number; warmingK: number }[];
  /** Cumulative CO2 emissions to net zero, Gt CO2, for emission-driven pathways. */
  netZero?: NetZero;
  firstYear: number;
  lastYear: number;
}

/** Several pathways side by side, the first one the reference. */
export interface Comparison {
  /** Label of the reference (first) pathway. */
  reference: string;
  milestoneYears: number[];
  thresholdsK: number[];
  windowYears: number;
  keyYears: number[];
  pathways: PathwayComparison[];
}

/**
 * Compares pathways against the first: warming and its difference from the reference at each
 * milestone year, and per pathway the peak and its year, the AR6 crossing year of each threshold
 * (see `crossingPeriod`), warming at the key years and, when emissions are given, cumulative CO2
 * emissions to net zero.
 *
 * @param pathways one or more pathways; the first is the reference
 * @param options milestone years, thresholds (K), averaging window, key years
 * @returns the comparison; arrays of the inputs are shared, not copied
 * @throws ConfigError when no pathway is given or two share a label
 * @example
 * const years = Float64Array.from({ length: 81 }, (_, i) => 2020 + i);
 * const c = comparePathways(
 *   [{ label: 'steady', years, warmingK: years.map((y) => 1.2 + 0.02 * (y - 2020)) },
 *    { label: 'swift', years, warmingK: years.map((y) => 1.2 + 0.01 * (y - 2020)) }],
 *   { milestoneYears: [2050] },
 * );
 * c.pathways[1].milestones[0] // { year: 2050, warmingK: ≈1.5, differenceK: ≈-0.3 }
 * c.pathways[0].crossings[0].period?.year // 2035
 */
export function comparePathways(pathways: readonly PathwayWarming[], options: ComparisonOptions): Comparison {
  if (pathways.length === 0) throw new ConfigError('a comparison must be given at least one pathway', 'pathways');
  const seen = new Set<string>();
  for (const p of pathways) {
    if (seen.has(p.label)) {
      // Labels of pathway files come from their `# name:` line, else the file name (parsePathway).
      throw new ConfigError(
        `pathway names in a comparison must be distinct; "${p.label}" appears twice. A pathway file is named by its `
          + '"# name: ..." line, else by its file name without the extension: give one of them a line such as "# name: Plan B"',
        'pathways',
      );
    }
    seen.add(p.label);
  }
  const thresholdsK = [...(options.thresholdsK ?? [1.5, 2])];
  for (const p of pathways) {
    const missing = p.crossingOdds && thresholdsK.find((t) => !p.crossingOdds!.some((o) => o.thresholdK === t));
    if (missing !== undefined) throw new ConfigError(`the ensemble of "${p.label}" has no crossing odds for ${missing} K`, 'crossingOdds');
  }
  const windowYears = options.windowYears ?? WARMING_LEVEL_WINDOW.years;
  const keyYears = [...(options.keyYears ?? [2050, 2100])];
  const milestoneYears = [...options.milestoneYears];
  const ref = pathways[0];
  const refSeries: Series = { years: ref.years, values: ref.warmingK };

  const results = pathways.map((p): PathwayComparison => {
    const diff = differences(refSeries, { years: p.years, values: p.warmingK });
    const top = peak(p.years, p.warmingK);
    const milestones = milestoneYears.map((year): MilestoneValue => {
      const m: MilestoneValue = { year, warmingK: valueAtYear(p.years, p.warmingK, year), differenceK: valueAtYear(diff.years, diff.values, year) };
      if (p.range) {
        const r = p.range;
        m.range = {
          p05: valueAtYear(p.years, r.p05, year),
          p17: valueAtYear(p.years, r.p17, year),
          p83: valueAtYear(p.years, r.p83, year),
          p95: valueAtYear(p.years, r.p95, year),
        };
      }
      return m;
    });
    const result: PathwayComparison = {
      ...p,
      differenceK: diff,
      milestones,
      peak: top,
      stillRising: top.index === p.years.length - 1,
      crossings: thresholdsK.map((thresholdK) => {
        const period = crossingPeriod(p.years, p.warmingK, thresholdK, windowYears);
        const odds = p.crossingOdds?.find((o) => o.thresholdK === thresholdK);
        return odds ? { thresholdK, period, odds } : { thresholdK, period };
      }),
      keyYears: keyYears.map((year) => ({ year, warmingK: valueAtYear(p.years, p.warmingK, year) })),
      firstYear: p.years[0],
      lastYear: p.years[p.years.length - 1],
    };
    if (p.co2Gtco2) result.netZero = cumulativeToNetZero(p.years, p.co2Gtco2, options.cumulativeFromYear);
    return result;
  });
  return { reference: ref.label, milestoneYears, thresholdsK, windowYears, keyYears, pathways: results };
}

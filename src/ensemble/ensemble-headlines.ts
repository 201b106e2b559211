import { RUNNING_MEAN_WINDOW } from './running-mean.js';
import { PERCENTILE_NAMES, type EnsembleResult, type PercentileName } from './summarize-ensemble.js';

/** How the median crossing of a warming level reads. */
export type MedianCrossing =
  /** At least half of the members cross within the run, after its first 20-year window. */
  | 'crosses'
  /** At least half of the members are already above the level in the first 20-year window. */
  | 'already-above-at-start'
  /** Fewer than half of the members cross within the run. */
  | 'fewer-than-half-cross';

/** The headline figures of one warming level. */
export interface ThresholdHeadline {
  /** Warming level, K above the baseline. */
  threshold_k: number;
  /**
   * Share of members whose 20-year mean warming has exceeded the level by each milestone year (the
   * key); null when the run does not reach the end of that year's 20-year window.
   */
  probability_crossed_by: Record<string, number | null>;
  /** Which of the cases the median crossing is. */
  median_crossing: MedianCrossing;
  /** The first year by which half of the members have crossed, when `median_crossing` is 'crosses'; else null. */
  median_crossing_year: number | null;
  /**
   * Share of members already above the level in the first complete 20-year window (`first_window`):
   * counted as crossing in its labelled year, they may have been above before it.
   */
  above_at_start: number;
  /**
   * Share of members that have crossed by `last_window_year`, the last year the run can say anything
   * about: the figure to quote for a milestone whose `probability_crossed_by` is null.
   */
  probability_crossed_by_last_window: number;
}

/** The members' own peaks: each member's highest annual warming and its year, summarised across members. */
export interface PeakHeadline {
  /** Percentiles across members of each member's peak warming, K relative to the baseline. */
  warming_k: Record<PercentileName, number>;
  /** Percentiles across members of each member's peak year, each a year some member peaks in (Hyndman & Fan 1996 definition 1). */
  year: Record<PercentileName, number>;
  /** Share of members whose peak is the run's last year (`last_year`): still rising at the end. */
  still_rising: number;
}

/** The figures an ensemble's outputs lead with, as JSON (snake_case keys, shares from 0 to 1). */
export interface EnsembleHeadlines {
  /** Members summarised. */
  members: number;
  /** Random seed. */
  seed: number;
  /** Baseline period of the warming values, "1850-1900". */
  baseline: string;
  /** The first complete 20-year window of the run, "1750-1769". */
  first_window: string;
  /** Last year of the run. */
  last_year: number;
  /** Last year with a complete 20-year window: crossings after it cannot be seen (the run's end less 10 years). */
  last_window_year: number;
  /** One entry per threshold, in the ensemble's order. */
  thresholds: ThresholdHeadline[];
  /** The members' own peaks (not the peak of the median line). */
  peak: PeakHeadline;
  /**
   * Percentiles across members of the sampled ECS and TCR (K) and, for emission-driven ensembles,
   * the carbon-cycle multiplier on the pre-industrial iIRF100 (`irf100_scale`).
   */
  sampled: Record<string, Record<PercentileName, number>>;
  /** Pearson correlation of the members' ECS and TCR; null for fewer than 3 members, whose correlation says nothing. */
  ecs_tcr_correlation: number | null;
}

/**
 * The headline figures of an ensemble: per warming level the probability of crossing it by each
 * milestone year, the median crossing year (or that half of the members are above it at the start,
 * or that fewer than half cross) and the share above it at the start; the percentiles of the members'
 * own peak warming and peak year with the share still rising at the end; the percentiles of the sampled
 * ECS, TCR (and carbon-cycle multiplier); the ECS-TCR correlation. One source for the terminal
 * summary and for the `headlines` of the output files, so they always agree.
 *
 * @param result from runEnsemble or summarizeEnsemble
 * @example ensembleHeadlines(result).thresholds[0] // { threshold_k: 1.5, probability_crossed_by: { 2050: 0.81, 2100: 0.97 }, median_crossing: 'crosses', median_crossing_year: 2031, above_at_start: 0 }
 */
export function ensembleHeadlines(result: EnsembleResult): EnsembleHeadlines {
  const c = result.config;
  const first = c.firstYear;
  const last = first + c.yearCount - 1;
  const windowEnd = first + RUNNING_MEAN_WINDOW.before + RUNNING_MEAN_WINDOW.after;
  const percentiles = (name: keyof EnsembleResult['parameters']) =>
    Object.fromEntries(PERCENTILE_NAMES.map((p) => [p, result.parameters[name][p]])) as Record<PercentileName, number>;
  return {
    members: result.memberCount,
    seed: c.seed,
    baseline: `${c.baseline[0]}-${c.baseline[1]}`,
    first_window: `${first}-${windowEnd}`,
    last_year: last,
    last_window_year: last - RUNNING_MEAN_WINDOW.after,
    thresholds: result.crossings.map((x): ThresholdHeadline => {
      const median: MedianCrossing = 2 * x.aboveAtStart >= 1 ? 'already-above-at-start' : x.medianYear === null ? 'fewer-than-half-cross' : 'crosses';
      return {
        threshold_k: x.thresholdK,
        probability_crossed_by: Object.fromEntries(x.byMilestone.map((m) => [String(m.year), m.probability])),
        median_crossing: median,
        median_crossing_year: median === 'crosses' ? x.medianYear : null,
        above_at_start: x.aboveAtStart,
        probability_crossed_by_last_window: x.byLastWindow.probability,
      };
    }),
    peak: { warming_k: { ...result.peak.warmingK }, year: { ...result.peak.year }, still_rising: result.peak.stillRising },
    sampled: {
      ecs_k: percentiles('ecs_k'),
      tcr_k: percentiles('tcr_k'),
      ...(c.emissionDriven && result.parameters.irf100_scale ? { irf100_scale: percentiles('irf100_scale') } : {}),
    },
    ecs_tcr_correlation: result.memberCount >= 3 && Number.isFinite(result.ecsTcrCorrelation) ? result.ecsTcrCorrelation : null,
  };
}

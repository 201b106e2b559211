import type { EnsembleHeadlines, ThresholdHeadline } from '../ensemble/ensemble-headlines.js';
import { percent } from './format-numbers.js';
import { thresholdName } from './threshold-name.js';

/** Display names of the sampled quantities of EnsembleHeadlines.sampled, with their units. */
const SAMPLED_NAMES: Record<string, string> = {
  ecs_k: 'ECS (K)',
  tcr_k: 'TCR (K)',
  irf100_scale: 'carbon-cycle multiplier on the pre-industrial iIRF100 r0',
};

/** The display name of a key of EnsembleHeadlines.sampled. */
export function sampledName(key: string): string {
  return SAMPLED_NAMES[key] ?? key;
}

/**
 * A probability or share as a whole percentage (see `percent`: `<1 %` and `>99 %` for shares that
 * are neither none nor all but would round to them); `n/a (run too short)` for null.
 * @example percentText(0.814) // '81 %'
 */
export function percentText(v: number | null): string {
  return v === null ? 'n/a (run too short)' : percent(v);
}

/**
 * What can be said for a milestone the run does not cover: the share crossed by the last year with a
 * complete 20-year window, e.g. `n/a (the run ends in 2100; by 2090, its last 20-year mean: 52 %)`.
 */
export function notCovered(t: ThresholdHeadline, h: EnsembleHeadlines): string {
  return `n/a (the run ends in ${h.last_year}; by ${h.last_window_year}, its last 20-year mean: ${percentText(t.probability_crossed_by_last_window)})`;
}

/**
 * The median crossing of a warming level in words: the year, "already above at the start (the first
 * 20-year mean, 1750-1769)", or "fewer than half of the members cross it by 2150".
 */
export function medianCrossingText(t: ThresholdHeadline, h: EnsembleHeadlines): string {
  if (t.median_crossing === 'already-above-at-start') return `already above at the start (the first 20-year mean, ${h.first_window})`;
  if (t.median_crossing === 'fewer-than-half-cross') return `fewer than half of the members cross it by ${h.last_window_year}`;
  return String(t.median_crossing_year);
}

/**
 * A percentile of the members' peak years as a whole year (percentiles of years may fall between two).
 * @example peakYearText(2079.4) // '2079'
 */
export function peakYearText(year: number): string {
  return Number.isFinite(year) ? String(Math.round(year)) : 'n/a';
}

/**
 * The members' own peak in words: median peak warming with its likely (17-83 %) and very likely
 * (5-95 %) ranges, the median peak year with its likely range, and the share still rising at the end.
 * @example peakText(h) // "median 1.98 K (likely 1.70 to 2.35, very likely 1.45 to 2.70), in 2079 (likely 2065 to 2150); 31 % of members still rising in 2150"
 */
export function peakText(h: EnsembleHeadlines): string {
  const { warming_k: w, year: y, still_rising: rising } = h.peak;
  return (
    `median ${w.p50.toFixed(2)} K (likely ${w.p17.toFixed(2)} to ${w.p83.toFixed(2)}, very likely ${w.p05.toFixed(2)} to ${w.p95.toFixed(2)}), ` +
    `in ${peakYearText(y.p50)} (likely ${peakYearText(y.p17)} to ${peakYearText(y.p83)}); ${percentText(rising)} of members still rising in ${h.last_year}`
  );
}

/**
 * The terminal lines of an ensemble's headlines, indented by two spaces: the sampled ECS and TCR
 * (median and 5-95 %) with their correlation, the carbon-cycle multiplier of an emission ensemble,
 * then per warming level the probability of crossing it by each milestone year and its median
 * crossing (and the share already above it at the start, when there is one), then the members' own
 * peak (`peak`: see peakText).
 *
 * @example ensembleHeadlineLines(h)[0] // '  sampled ECS 3.00 K [2.00-5.00], TCR 1.80 K [1.20-2.40] (median [5-95 %]); ECS-TCR correlation 0.64'
 */
export function ensembleHeadlineLines(h: EnsembleHeadlines): { sampled: string[]; thresholds: string[]; peak: string } {
  const range = (q: { p05: number; p50: number; p95: number }, unit = '') => `${q.p50.toFixed(2)}${unit} [${q.p05.toFixed(2)} to ${q.p95.toFixed(2)}]`;
  const { ecs_k: ecs, tcr_k: tcr, irf100_scale: carbon } = h.sampled;
  const correlation = h.ecs_tcr_correlation === null ? 'n/a (fewer than 3 members)' : h.ecs_tcr_correlation.toFixed(2);
  const sampled = [`  sampled ECS ${range(ecs, ' K')}, TCR ${range(tcr, ' K')} (median [5-95 %]); ECS-TCR correlation ${correlation}`];
  if (carbon) sampled.push(`  sampled ${sampledName('irf100_scale')} ${range(carbon)} (median [5-95 %])`);
  const [from, to] = h.baseline.split('-').map(Number);
  const thresholds = h.thresholds.map((t) => {
    const by = Object.entries(t.probability_crossed_by).map(([year, p]) => `by ${year} ${p === null ? notCovered(t, h) : percentText(p)}`).join(', ');
    const median = t.median_crossing === 'crosses' ? `median crossing year ${t.median_crossing_year}` : t.median_crossing === 'already-above-at-start' ? `median crossing: ${medianCrossingText(t, h)}` : medianCrossingText(t, h);
    const some = t.median_crossing !== 'already-above-at-start' && t.above_at_start > 0 ? `; ${percentText(t.above_at_start)} of members already above it at the start (${h.first_window})` : '';
    return `  ${thresholdName(t.threshold_k, [from, to])} (20-year mean): probability of crossing ${by}; ${median}${some}`;
  });
  return { sampled, thresholds, peak: `  peak warming (members' own): ${peakText(h)}` };
}

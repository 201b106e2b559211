import type { EnsembleHeadlines } from '../ensemble/ensemble-headlines.js';
import { medianCrossingText, peakYearText, percentText, sampledName } from './ensemble-headlines-text.js';
import { markdownTable } from './markdown-table.js';

/**
 * An ensemble's headlines as Markdown, to stand above its yearly table: a table of the warming
 * levels (probability of crossing by each milestone year, median crossing year, and the share above
 * the level at the start when any member is), a table of the members' own peak (percentiles of peak
 * warming and peak year, with the share still rising at the end), then a table of the sampled
 * quantities' percentiles and the ECS-TCR correlation.
 *
 * @param h from ensembleHeadlines
 * @returns Markdown text ending in a newline
 * @example ensembleHeadlinesMarkdown(h).split('\n')[0] // '**Headlines: 2000 members, seed 7; warming relative to 1850-1900, as 20-year means**'
 */
export function ensembleHeadlinesMarkdown(h: EnsembleHeadlines): string {
  const milestones = h.thresholds.length > 0 ? Object.keys(h.thresholds[0].probability_crossed_by) : [];
  const atStart = h.thresholds.some((t) => t.above_at_start > 0);
  const levels = markdownTable({
    caption: `Headlines: ${h.members} member${h.members === 1 ? '' : 's'}, seed ${h.seed}; warming relative to ${h.baseline}, as 20-year means`,
    columns: ['warming level', ...milestones.map((y) => `crossed by ${y}`), 'median crossing year', ...(atStart ? [`above at the start (${h.first_window})`] : [])],
    rows: h.thresholds.map((t) => [
      `${t.threshold_k} K`,
      ...milestones.map((y) => (t.probability_crossed_by[y] === null ? `n/a (by ${h.last_window_year}: ${percentText(t.probability_crossed_by_last_window)})` : percentText(t.probability_crossed_by[y]))),
      medianCrossingText(t, h),
      ...(atStart ? [percentText(t.above_at_start)] : []),
    ]),
    numeric: [true, ...milestones.map(() => true), false, ...(atStart ? [true] : [])],
    ...(h.thresholds.some((t) => Object.values(t.probability_crossed_by).includes(null))
      ? { notes: [`n/a: the run ends in ${h.last_year}, so its last 20-year mean is centred on ${h.last_window_year}; the share crossed by then is given instead.`] }
      : {}),
  });
  const { warming_k: w, year: y, still_rising: rising } = h.peak;
  const peak = markdownTable({
    caption: "Peak warming (members' own): each member's highest annual warming and its year, across members",
    columns: ['', '5 %', '17 %', '50 %', '83 %', '95 %'],
    rows: [
      ['peak warming (K)', w.p05.toFixed(2), w.p17.toFixed(2), w.p50.toFixed(2), w.p83.toFixed(2), w.p95.toFixed(2)],
      ['peak year', peakYearText(y.p05), peakYearText(y.p17), peakYearText(y.p50), peakYearText(y.p83), peakYearText(y.p95)],
    ],
    numeric: [false, true, true, true, true, true],
    notes: [`${percentText(rising)} of members still rising in ${h.last_year} (their peak is the run's last year, so it is only the highest so far).`],
  });
  const sampled = markdownTable({
    columns: ['sampled', '5 %', '17 %', '50 %', '83 %', '95 %'],
    rows: Object.entries(h.sampled).map(([key, q]) => [sampledName(key), q.p05.toFixed(2), q.p17.toFixed(2), q.p50.toFixed(2), q.p83.toFixed(2), q.p95.toFixed(2)]),
    numeric: [false, true, true, true, true, true],
    notes: [`ECS-TCR correlation across members: ${h.ecs_tcr_correlation === null ? 'n/a (fewer than 3 members)' : h.ecs_tcr_correlation.toFixed(2)}.`],
  });
  return `${levels}\n${peak}\n${sampled}`;
}

import { crossingPeriod, peak, valueAtYear } from '../metrics/index.js';
import type { Projection } from '../projection/index.js';
import { isAr6Baseline, markdownTable, thresholdName } from '../report/index.js';

/** Years whose warming a run's headlines state, where the reported years cover them. */
const HEADLINE_YEARS = [2030, 2050, 2100];
/** The warming levels a single run reports (IPCC AR6 global warming levels on the 1850-1900 baseline). */
const LEVELS_K = [1.5, 2];
/** Years a 20-year window reaches past its labelled (middle) year: y-9 .. y+10. */
const WINDOW_AFTER = 10;

/** The figures a single run's outputs lead with, as JSON (snake_case keys, K relative to `baseline`). */
export interface RunHeadlines {
  /** Baseline period, "1850-1900". */
  baseline: string;
  /** Warming at 2030, 2050 and 2100, where the reported years cover them, K. */
  warming_k: Record<string, number>;
  /** The highest annual warming in the reported years (`from_year`-`to_year`) and its year; the whole run spans `run_starts`-`run_ends`. */
  peak: { from_year: number; to_year: number; warming_k: number; year: number; still_rising: boolean; run_starts: number; run_ends: number };
  /** Per level: the first 20-year period above it in the whole run (the AR6 rule), or null with the last year the run can show. */
  thresholds: {
    threshold_k: number;
    first_reached: number | null;
    or_earlier: boolean;
    period: { first_year: number; last_year: number; mean_k: number } | null;
    last_visible_year: number;
  }[];
}

/**
 * A run's headline figures: warming at the headline years and the peak within the reported years
 * (`shown`, the projection as `--from`/`--to` clipped it), and the threshold crossings of the whole
 * run (`whole`), which do not move with the reporting window.
 *
 * @example runHeadlines(shown, whole).thresholds[0] // { threshold_k: 1.5, first_reached: 2030, ... }
 */
export function runHeadlines(shown: Projection, whole: Projection = shown): RunHeadlines {
  const { years } = shown;
  const w = shown.columns.warming_k;
  const first = years[0];
  const last = years[years.length - 1];
  const wholeLast = whole.years[whole.years.length - 1];
  const top = peak(years, w);
  return {
    baseline: `${shown.baseline[0]}-${shown.baseline[1]}`,
    warming_k: Object.fromEntries(HEADLINE_YEARS.filter((y) => y >= first && y <= last).map((y) => [String(y), valueAtYear(years, w, y)])),
    peak: { from_year: first, to_year: last, warming_k: top.value, year: top.year, still_rising: top.year === last, run_starts: whole.years[0], run_ends: wholeLast },
    thresholds: LEVELS_K.map((level) => {
      const c = crossingPeriod(whole.years, whole.columns.warming_k, level);
      return {
        threshold_k: level,
        first_reached: c ? c.year : null,
        or_earlier: c ? c.atStart : false,
        period: c ? { first_year: c.firstYear, last_year: c.lastYear, mean_k: c.mean } : null,
        last_visible_year: wholeLast - WINDOW_AFTER,
      };
    }),
  };
}

/**
 * The headline lines `warmcast run` prints, indented by two spaces: warming at the headline years,
 * the peak (or the highest warming of the reported years when `--from`/`--to` clipped them), and per
 * level its first 20-year period above it or the last year the run can show.
 */
export function runHeadlineLines(h: RunHeadlines): string[] {
  const lines: string[] = [];
  const at = Object.entries(h.warming_k).map(([y, v]) => `${y}: ${v.toFixed(2)} K`);
  if (at.length > 0) lines.push(`  warming in ${at.join(', ')}`);
  const p = h.peak;
  const clipped = p.run_starts !== p.from_year || p.run_ends !== p.to_year;
  const rising = p.still_rising ? (p.to_year === p.run_ends ? ' (the last year: still rising)' : ' (the last year shown: still rising)') : '';
  const atPeak = `${p.warming_k.toFixed(2)} K in ${p.year}${rising}`;
  lines.push(clipped ? `  highest warming in ${p.from_year}-${p.to_year}: ${atPeak}` : `  peak warming ${atPeak}`);
  const baseline = h.baseline.split('-').map(Number) as [number, number];
  // On another baseline the threshold is named with it, and the rule is not called AR6's levels.
  const rule = isAr6Baseline(baseline) ? 'the IPCC AR6 20-year-mean rule' : '20-year-mean rule';
  for (const t of h.thresholds) {
    const name = thresholdName(t.threshold_k, baseline);
    lines.push(
      t.period === null
        ? `  ${name}: not crossed by ${t.last_visible_year} (the run ends in ${p.run_ends}, so its last 20-year mean, ${p.run_ends - 19}-${p.run_ends}, stands for ${t.last_visible_year})`
        : `  ${name}: first reached in ${t.first_reached}${t.or_earlier ? ' or earlier' : ''} (mean of ${t.period.first_year}-${t.period.last_year} is ${t.period.mean_k.toFixed(2)} K; ${rule})`,
    );
  }
  return lines;
}

/**
 * A run's headlines as a Markdown table, to stand above its yearly table: warming at the headline
 * years, the peak, and per level the year it is first reached.
 */
export function runHeadlinesMarkdown(h: RunHeadlines): string {
  const baseline = h.baseline.split('-').map(Number) as [number, number];
  const rows: string[][] = [
    ...Object.entries(h.warming_k).map(([y, v]) => [`warming in ${y}`, `${v.toFixed(2)} K`]),
    [`peak warming (${h.peak.from_year}-${h.peak.to_year})`, `${h.peak.warming_k.toFixed(2)} K in ${h.peak.year}${h.peak.still_rising ? ' (the last year: still rising)' : ''}`],
    ...h.thresholds.map((t) => [
      `${thresholdName(t.threshold_k, baseline)} first reached`,
      t.first_reached === null ? `not crossed by ${t.last_visible_year}` : `${t.first_reached}${t.or_earlier ? ' or earlier' : ''}`,
    ]),
  ];
  return markdownTable({
    caption: `Headlines: warming relative to the ${h.baseline} mean`,
    columns: ['', 'value'],
    rows,
    numeric: [false, true],
    notes: ['A level counts as reached in the middle year of the first 20-year period whose mean exceeds it (the IPCC AR6 WG1 rule).'],
  });
}

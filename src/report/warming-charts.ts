import type { Comparison, PathwayComparison } from '../metrics/compare-pathways.js';
import type { Series } from '../metrics/series.js';
import type { OutputDocument } from './output-document.js';
import type { ChartBand, SvgChartOptions } from './svg-chart.js';
import type { ChartLine } from './terminal-chart.js';

/** Options of {@link warmingCharts}. */
export interface WarmingChartOptions {
  /** Baseline period of the warming. */
  baseline: readonly [number, number];
  /** First and last year charted (default 1850, or the first year, to the last). */
  from?: number;
  to?: number;
  /** The observed record rebased to the baseline, with its legend text (drawn over the historical years). */
  observed?: Series & { label: string };
  /** Terminal chart height in rows (default 12). */
  terminalHeight?: number;
}

/**
 * The charts of a projection document: warming of each option (the median line with members) with
 * its 5-95 % and 17-83 % bands in the option's own colour, the observed record as a thin line, the
 * thresholds; and, for two or more options, each one's difference from the first, with the range
 * of the difference across paired members when they ran. Lines and bands cover the same years, so
 * bands stop where the run ends.
 *
 * @param c the comparison (a single run is a comparison of one)
 * @param options baseline, years charted, observed record
 * @returns the SVG charts and the terminal chart
 */
export function warmingCharts(c: Comparison, options: WarmingChartOptions): { charts: SvgChartOptions[]; terminal: OutputDocument['terminalChart'] } {
  const last = Math.max(...c.pathways.map((p) => p.lastYear));
  const first = Math.min(...c.pathways.map((p) => p.firstYear));
  const from = options.from ?? Math.max(first, Math.min(1850, last));
  const to = options.to ?? last;
  const span = (years: ArrayLike<number>, start = from) => {
    let a = 0;
    while (a < years.length && years[a] < start) a++;
    let b = years.length;
    while (b > a && years[b - 1] > to) b--;
    return [a, b] as const;
  };
  const cut = <T extends ArrayLike<number> & { subarray(a: number, b: number): T }>(years: Float64Array, values: T) => {
    const [a, b] = span(years);
    return { years: years.subarray(a, b), values: values.subarray(a, b) };
  };
  const lines: ChartLine[] = c.pathways.map((p, j) => ({ label: p.label, style: j, ...cut(p.years, p.warmingK) }));
  const bands: ChartBand[] = [];
  // Where an option runs the same years as the reference (the shared history), its band would lie
  // exactly on the reference's and darken it: each later option's band starts where it departs.
  for (const [j, p] of c.pathways.entries()) {
    const start = j === 0 ? from : Math.max(from, departure(p));
    bands.push(...bandsOf(p.label, p.years, p.range, (years) => span(years, start)));
  }
  const observed = options.observed ? { label: options.observed.label, ...cut(options.observed.years, options.observed.values) } : undefined;
  const baseline = `${options.baseline[0]}-${options.baseline[1]}`;
  const ranged = c.pathways.some((p) => p.range);
  const charts: SvgChartOptions[] = [
    {
      title: c.pathways.length > 1 ? 'Global surface warming by option' : `Global surface warming, ${c.pathways[0].label}`,
      xLabel: 'Year',
      yLabel: `Warming relative to ${baseline} (K)`,
      series: lines,
      bands,
      thresholds: c.thresholdsK,
      ...(observed && observed.years.length > 0 ? { observed } : {}),
      ...(ranged ? { bandNote: 'shading: 5-95 % of members, darker 17-83 %; lines: medians' } : {}),
    },
  ];
  if (c.pathways.length > 1) {
    const diffs = c.pathways.slice(1).map((p, j): ChartLine => {
      const d = p.differenceRange ? { years: p.years, values: p.differenceRange.p50 } : p.differenceK;
      return { label: `${p.label} minus ${c.reference}`, style: j + 1, ...cut(d.years, d.values) };
    });
    const diffBands = c.pathways.slice(1).flatMap((p) => bandsOf(`${p.label} minus ${c.reference}`, p.years, p.differenceRange, span));
    charts.push({
      title: `Difference from ${c.reference}`,
      xLabel: 'Year',
      yLabel: 'Warming difference (K)',
      series: diffs,
      bands: diffBands,
      thresholds: [],
      ...(diffBands.length > 0 ? { bandNote: 'shading: 5-95 % of paired members (same parameters in both options), darker 17-83 %' } : {}),
    });
  }
  // The terminal chart leaves the observed record out: at a character per year its year-to-year
  // noise would cross the model's line over the whole history. A single option with members shows
  // its 5 and 95 % lines around the median (several options would be too many lines).
  const only = c.pathways.length === 1 ? c.pathways[0] : undefined;
  const terminalLines: ChartLine[] = only?.range
    ? [
        { label: '95th percentile', style: 1, ...cut(only.years, only.range.p95) },
        { ...lines[0], label: `${only.label}, median` },
        { label: '5th percentile', style: 2, ...cut(only.years, only.range.p05) },
      ]
    : lines;
  return {
    charts,
    terminal: {
      series: terminalLines,
      options: {
        title: `Warming, K relative to ${baseline}${only?.range ? ': median and 5-95 % of members' : ranged ? ' (medians)' : ''}`,
        yLabel: 'K',
        height: options.terminalHeight ?? 8,
        thresholds: c.thresholdsK,
      },
    },
  };
}

/** The first year an option's warming differs from the reference's (its first year when it never matches). */
function departure(p: PathwayComparison): number {
  const d = p.differenceK;
  for (let i = 0; i < d.years.length; i++) if (!(Math.abs(d.values[i]) < 1e-12)) return Math.max(d.years[0], d.years[i] - 1);
  return d.years.length > 0 ? d.years[d.years.length - 1] : p.firstYear;
}

function bandsOf(
  of: string,
  years: Float64Array,
  range: PathwayComparison['range'] | undefined,
  span: (years: ArrayLike<number>) => readonly [number, number],
): ChartBand[] {
  if (!range) return [];
  const [a, b] = span(years);
  return [
    { of, label: '5-95 %', years: years.subarray(a, b), lower: range.p05.subarray(a, b), upper: range.p95.subarray(a, b) },
    { of, label: '17-83 %', years: years.subarray(a, b), lower: range.p17.subarray(a, b), upper: range.p83.subarray(a, b) },
  ];
}

import type { Comparison } from '../metrics/compare-pathways.js';
import type { ChartBand } from './svg-chart.js';
import { svgChart } from './svg-chart.js';
import type { ChartLine } from './terminal-chart.js';

/** Options of {@link comparisonCharts} and {@link comparisonChartLines}. */
export interface ComparisonChartOptions {
  /** First year charted (default the earliest year of any pathway). */
  fromYear?: number;
  /** Baseline period the warming is relative to, as printed (default `1850-1900`). */
  baseline?: string;
  /** Chart size in px (default 720 x 420). */
  width?: number;
  height?: number;
}

/**
 * The lines of a comparison chart from `fromYear` on: each pathway's warming, K.
 *
 * @param c the comparison
 * @param fromYear first year kept (default: all years)
 */
export function comparisonChartLines(c: Comparison, fromYear = -Infinity): ChartLine[] {
  return c.pathways.map((p) => {
    const i0 = p.years.findIndex((y) => y >= fromYear);
    const from = i0 < 0 ? p.years.length : i0;
    return { label: p.label, years: p.years.subarray(from), values: p.warmingK.subarray(from) };
  });
}

/**
 * The SVG charts of a comparison: warming of every pathway with the thresholds (ensemble ranges
 * shaded, 5-95 % then 17-83 %, when the pathways have them) and, when there are two or more
 * pathways, each one's difference from the reference.
 *
 * @param c the comparison
 * @param options first year, baseline text, size
 * @returns SVG documents, warming chart first
 */
export function comparisonCharts(c: Comparison, options: ComparisonChartOptions = {}): string[] {
  const baseline = options.baseline ?? '1850-1900';
  const fromYear = options.fromYear ?? -Infinity;
  const size = { width: options.width, height: options.height };
  const lines = comparisonChartLines(c, fromYear);
  const bands: ChartBand[] = [];
  const keep = (p: Comparison['pathways'][number]) => {
    const i0 = p.years.findIndex((y) => y >= fromYear);
    return i0 < 0 ? p.years.length : i0;
  };
  for (const [lower, upper, label] of [
    ['p05', 'p95', 'very likely range (5-95 %)'],
    ['p17', 'p83', 'likely range (17-83 %)'],
  ] as const) {
    for (const p of c.pathways) {
      if (!p.range) continue;
      const i0 = keep(p);
      bands.push({ of: p.label, label, years: p.years.subarray(i0), lower: p.range[lower].subarray(i0), upper: p.range[upper].subarray(i0) });
    }
  }
  const charts = [
    svgChart({
      title: 'Global surface warming by pathway',
      xLabel: 'Year',
      yLabel: `Warming relative to ${baseline} (K)`,
      series: lines,
      bands,
      thresholds: c.thresholdsK,
      ...size,
    }),
  ];
  if (c.pathways.length > 1) {
    const diffs = c.pathways.slice(1).map((p, j): ChartLine => {
      const d = p.differenceK;
      const i0 = d.years.findIndex((y) => y >= fromYear);
      const from = i0 < 0 ? d.years.length : i0;
      return { label: `${p.label} minus ${c.reference}`, years: d.years.subarray(from), values: d.values.subarray(from), style: j + 1 };
    });
    charts.push(
      svgChart({ title: `Difference from ${c.reference}`, xLabel: 'Year', yLabel: 'Warming difference (K)', series: diffs, thresholds: [], ...size }),
    );
  }
  return charts;
}

import type { Comparison } from '../metrics/compare-pathways.js';
import { comparisonChartLines } from './comparison-charts.js';
import { comparisonHeadlines } from './comparison-headlines.js';
import { comparisonTables } from './comparison-tables.js';
import { plainTable } from './plain-table.js';
import { terminalChart } from './terminal-chart.js';

/** Options of {@link comparisonText}. */
export interface ComparisonTextOptions {
  /** ANSI colours in the chart (pass whether stdout is a TTY). Default false. */
  color?: boolean;
  /** Terminal width in characters (default 80). */
  width?: number;
  /** Chart height in rows (default 14). */
  height?: number;
  /** First year charted (default the earliest year of any pathway). */
  fromYear?: number;
  /** Baseline period the warming is relative to, as printed (default `1850-1900`). */
  baseline?: string;
  /** Leave the chart out. */
  noChart?: boolean;
}

/**
 * What `warmcast compare` prints on a terminal: the headline sentence of each pathway, the
 * milestone table, the per-pathway table, and a chart of all pathways with the thresholds.
 *
 * @param c the comparison
 * @param options colour, width, chart settings, baseline text
 * @returns text ending in a newline
 */
export function comparisonText(c: Comparison, options: ComparisonTextOptions = {}): string {
  const baseline = options.baseline ?? '1850-1900';
  const tables = comparisonTables(c, { baseline });
  const parts = [
    comparisonHeadlines(c, baseline).map((l) => `  ${l}`).join('\n') + '\n',
    plainTable(tables.milestones),
    plainTable(tables.summary),
    ...(tables.odds ? [plainTable(tables.odds)] : []),
  ];
  if (!options.noChart) {
    parts.push(
      terminalChart(comparisonChartLines(c, options.fromYear), {
        title: `Global surface warming (K relative to ${baseline})`,
        yLabel: 'K',
        width: options.width,
        height: options.height ?? 14,
        color: options.color,
        thresholds: c.thresholdsK,
      }) + '\n',
    );
  }
  return parts.join('\n');
}

import type { Comparison } from '../metrics/compare-pathways.js';
import { comparisonCharts } from './comparison-charts.js';
import { comparisonHeadlines } from './comparison-headlines.js';
import { comparisonTables } from './comparison-tables.js';
import { comparisonUncertainty } from './comparison-uncertainty.js';
import { htmlReport } from './html-report.js';

/** Options of {@link comparisonHtml}. */
export interface ComparisonHtmlOptions {
  /** Where the numbers came from, as the CLI built it. */
  provenance: object;
  /** Parameters, formula choice, baseline, history splice, ... (name -> text). */
  assumptions: Readonly<Record<string, string>>;
  /** Page title (default `Pathway comparison`). */
  title?: string;
  /** Baseline period the warming is relative to, as printed (default `1850-1900`). */
  baseline?: string;
  /** First year charted (default the earliest year of any pathway). */
  fromYear?: number;
  /** What uncertainty the report shows (default: comparisonUncertainty); see standardCautions. */
  uncertainty?: string;
  /** Cautions beyond the standard ones. */
  cautions?: readonly string[];
}

/**
 * A comparison as one self-contained HTML page (see htmlReport): headline sentences, the milestone
 * and per-pathway tables, the warming and difference charts as inline SVG, the assumptions (with
 * the crossing rule added), the provenance and the cautions.
 *
 * @param c the comparison
 * @param options provenance, assumptions, title, baseline, chart start, uncertainty, cautions
 * @returns the HTML document text
 */
export function comparisonHtml(c: Comparison, options: ComparisonHtmlOptions): string {
  const baseline = options.baseline ?? '1850-1900';
  const tables = comparisonTables(c, { baseline });
  return htmlReport({
    title: options.title ?? 'Pathway comparison',
    summaryLines: comparisonHeadlines(c, baseline),
    tables: [tables.milestones, tables.summary, ...(tables.odds ? [tables.odds] : [])],
    charts: comparisonCharts(c, { baseline, fromYear: options.fromYear }),
    assumptions: {
      ...options.assumptions,
      'reference pathway': c.reference,
      'threshold crossing':
        `middle year (the earlier of two) of the first ${c.windowYears}-year period whose mean warming exceeds the level ` +
        '(IPCC AR6 WG1 convention for global warming levels)',
    },
    provenance: options.provenance,
    uncertainty: options.uncertainty ?? comparisonUncertainty(c),
    cautions: options.cautions,
  });
}

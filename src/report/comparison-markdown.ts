import type { Comparison } from '../metrics/compare-pathways.js';
import { comparisonHeadlines } from './comparison-headlines.js';
import { comparisonTables } from './comparison-tables.js';
import { comparisonUncertainty } from './comparison-uncertainty.js';
import { markdownTable } from './markdown-table.js';
import { provenanceMarkdown } from './provenance-entries.js';
import { standardCautions } from './standard-cautions.js';

/** Options of {@link comparisonMarkdown}. */
export interface ComparisonMarkdownOptions {
  /** Where the numbers came from, as the CLI built it. */
  provenance: object;
  /** Heading (default `Pathway comparison`). */
  title?: string;
  /** Baseline period the warming is relative to, as printed (default `1850-1900`). */
  baseline?: string;
  /** What uncertainty is shown (default: comparisonUncertainty); see standardCautions. */
  uncertainty?: string;
}

/**
 * A comparison as a Markdown document to paste into planning documents: a heading, the headline
 * sentences, the milestone and per-pathway tables (pipe tables, see markdownTable), the cautions
 * and the provenance as a list.
 *
 * @param c the comparison
 * @param options provenance, title, baseline text, uncertainty sentence
 * @returns Markdown text ending in a newline
 */
export function comparisonMarkdown(c: Comparison, options: ComparisonMarkdownOptions): string {
  const tables = comparisonTables(c, { baseline: options.baseline });
  const inline = (s: string) => s.replace(/\r\n|\r|\n/g, ' ');
  const out = [
    `# ${inline(options.title ?? 'Pathway comparison')}`,
    '',
    ...comparisonHeadlines(c, options.baseline).map((l) => `- ${inline(l)}`),
    '',
    markdownTable(tables.milestones),
    markdownTable(tables.summary),
    ...(tables.odds ? [markdownTable(tables.odds)] : []),
    '## Cautions',
    '',
    ...standardCautions(options.uncertainty ?? comparisonUncertainty(c, 'text')).map((l) => `- ${l}`),
    '',
    '## Provenance',
    '',
    ...provenanceMarkdown(options.provenance),
  ];
  return out.join('\n') + '\n';
}

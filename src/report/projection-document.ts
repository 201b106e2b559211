import type { Comparison } from '../metrics/compare-pathways.js';
import { headlines } from '../metrics/headline.js';
import type { Series } from '../metrics/series.js';
import type { OutputDocument } from './output-document.js';
import { yearRows, yearSpan, type OutputTable } from './output-table.js';
import { warmingCharts } from './warming-charts.js';

/** Which years a document's tables show (`--from`, `--to`, `--years`, `--every`, resolved). */
export interface RowChoice {
  /** First and last year of every table, chart and file (the run itself is not clipped). */
  from?: number;
  to?: number;
  /** Rows of the human tables (Markdown, HTML, terminal): the milestone years. */
  years: readonly number[];
}

/** What {@link projectionDocument} builds a document from. */
export interface ProjectionDocumentInput {
  command: string;
  title: string;
  subtitle: string;
  baseline: readonly [number, number];
  /** The options side by side (a single run or an ensemble is a comparison of one). */
  comparison: Comparison;
  /** The yearly table over every year of the run (CSV, JSON, xlsx keep every year from `from` to `to`). */
  data: OutputTable;
  /** The compact human table over every year; its rows are cut to the milestone years. */
  compact: OutputTable;
  /** More human tables, shown after the compact one (not on the terminal). */
  more?: OutputTable[];
  rows: RowChoice;
  /** The observed record, rebased to the baseline, with its legend text. */
  observed?: Series & { label: string };
  notes: string[];
  terminalNotes?: string[];
  cautions: string[];
  shortCaution: string;
  labelKey?: string[];
  json?: Record<string, unknown>;
}

/**
 * The document of a command that projects warming: headlines from metrics, the yearly table cut to
 * `--from`..`--to`, the compact table cut to the milestone years, the charts (warmingCharts). Every
 * projecting command builds its tables and hands them here, so the headline, the row choice and
 * the charts mean the same in every command.
 *
 * @param input the tables, the comparison, the row choice and the texts
 * @returns the document for the output registry and the terminal
 */
export function projectionDocument(input: ProjectionDocumentInput): OutputDocument {
  const { charts, terminal } = warmingCharts(input.comparison, {
    baseline: input.baseline,
    from: input.rows.from,
    to: input.rows.to,
    observed: input.observed,
    terminalHeight: input.comparison.pathways.length > 1 ? 12 : 8,
  });
  return {
    command: input.command,
    title: input.title,
    subtitle: input.subtitle,
    baseline: input.baseline,
    headline: headlines(input.comparison),
    ...(input.labelKey ? { labelKey: input.labelKey } : {}),
    data: yearSpan(input.data, input.rows.from, input.rows.to),
    tables: [yearRows(input.compact, input.rows.years), ...(input.more ?? [])],
    charts,
    terminalChart: terminal,
    notes: input.notes,
    ...(input.terminalNotes ? { terminalNotes: input.terminalNotes } : {}),
    cautions: input.cautions,
    shortCaution: input.shortCaution,
    ...(input.json ? { json: input.json } : {}),
  };
}

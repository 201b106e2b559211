import type { Headline } from '../metrics/headline.js';
import type { OutputTable } from './output-table.js';
import type { SvgChartOptions } from './svg-chart.js';
import type { TerminalChartOptions, ChartLine } from './terminal-chart.js';

/**
 * Everything a command that projects hands to the output registry (see writeDocument and
 * terminalText): the same content for every format, so that adding a format touches one writer and
 * adding a command builds one of these.
 *
 * - `headline` (the answers) leads every human format and is the `headline` member of JSON files;
 * - `data` is the yearly table: every year from `--from` to `--to` in CSV, JSON and xlsx;
 * - `tables` are the human tables (milestone years by default), in Markdown, HTML, xlsx sheets and,
 *   the first of them, on the terminal;
 * - `charts` go to SVG and HTML, `terminalChart` to the terminal;
 * - `notes` (how the inputs were read and run) and `cautions` (in full) go to every file.
 */
export interface OutputDocument {
  /** The command that made it (`run`, `compare`, `ensemble`, ...), recorded in the files. */
  command: string;
  /** Title of the document (Markdown heading, HTML title, first terminal line). */
  title: string;
  /** One line under the title: what was run (parameters or members, baseline). */
  subtitle: string;
  /** Baseline period of the warming, inclusive years. */
  baseline: readonly [number, number];
  /** The headline of each option, reference first (one for run and ensemble). */
  headline: Headline[];
  /** `label = full name` lines when the labels are short forms of longer names (compare). */
  labelKey?: string[];
  /** The yearly table, every year (first column `year`). */
  data: OutputTable;
  /** Human tables, milestone years. The first is the terminal's compact table. */
  tables: OutputTable[];
  /** How many of `tables` the terminal prints (default 1). */
  terminalTables?: number;
  /** SVG charts (SVG and HTML files). */
  charts: SvgChartOptions[];
  /** The terminal chart. */
  terminalChart?: { series: ChartLine[]; options: TerminalChartOptions };
  /** Every note on how the inputs were read and run (files; the terminal with --notes). */
  notes: string[];
  /** Notes the terminal always shows (warnings), a few at most. */
  terminalNotes?: string[];
  /** The full cautions (files and --help). */
  cautions: string[];
  /** The one-line caution the terminal prints, pointing to the full ones. */
  shortCaution: string;
  /** More members of JSON files (and of a CSV's .meta.json), after `headline`. */
  json?: Record<string, unknown>;
}

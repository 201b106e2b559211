import { headlineLines, headlineTable } from './headline-text.js';
import type { OutputDocument } from './output-document.js';
import { humanCell, humanLabel, isNumeric, rowCount, type OutputTable } from './output-table.js';
import { terminalChart } from './terminal-chart.js';

/** Options of {@link terminalText}. */
export interface TerminalTextOptions {
  /** Columns of the terminal; every line fits them (default 100). */
  width?: number;
  /** ANSI colours in the chart. */
  color?: boolean;
  /** Leave the chart out. */
  chart?: boolean;
  /** Print every note instead of their count. */
  notes?: boolean;
}

/**
 * What a command prints on a terminal, answers first: the title and what was run, the headline
 * (sentences for one option, a table for several), the compact table (the document's first human
 * table, milestone years), the chart, then at most a few lines: warnings, how many notes there are
 * (all of them with `notes`), and one caution line pointing to the full cautions. Every line fits
 * `width` columns (long lines are wrapped at spaces, tables and charts are laid out to fit).
 *
 * @param doc the document
 * @param options width, colour, chart, notes
 * @returns text ending in a newline
 */
export function terminalText(doc: OutputDocument, options: TerminalTextOptions = {}): string {
  const width = Math.max(60, options.width ?? 100);
  const out: string[] = [];
  out.push(...wrap(doc.title, width, ''));
  out.push(...wrap(doc.subtitle, width, '  '));
  for (const k of doc.labelKey ?? []) out.push(...wrap(k, width, '  '));
  // Stated assumptions (what the inputs lack, filled by a rule) head the output, under the title.
  const assumptions = (doc.terminalNotes ?? []).filter((n) => n.startsWith('assumption: '));
  for (const a of assumptions) out.push(...wrap(a.slice('assumption: '.length), width, '  assumption: '));
  out.push('');
  if (doc.headline.length === 1) {
    // A long headline line wraps under its text, keeping its label ('  warming   ') as the lead.
    for (const l of headlineLines(doc.headline[0], doc.baseline)) out.push(...(l.length <= width ? [l] : wrap(l.slice(12), width, l.slice(0, 12))));
  } else if (doc.headline.length > 1) {
    // The headline is the answer (warming, peaks, crossing years): on a narrow terminal it wraps rather than hide a column.
    const t = headlineTable(doc.headline, doc.baseline, true);
    out.push(...plainTable({ ...t, notes: [], terminalOverflow: 'wrap' }, width));
  }
  for (const [i, t] of doc.tables.slice(0, doc.terminalTables ?? 1).entries()) {
    if (i > 0 || doc.headline.length > 0) out.push('');
    out.push(...plainTable({ ...t, notes: [] }, width));
  }
  if (options.chart !== false && doc.terminalChart) {
    out.push('');
    out.push(...terminalChart(doc.terminalChart.series, { ...doc.terminalChart.options, width, color: options.color }).split('\n'));
  }
  out.push('');
  for (const n of doc.terminalNotes ?? []) if (!assumptions.includes(n)) out.push(...wrap(n, width, '  note: ', 8));
  if (options.notes) {
    for (const n of doc.notes) out.push(...wrap(n, width, '  note: ', 8));
  } else if (doc.notes.length > 0) {
    out.push(...wrap(`${doc.notes.length} note${doc.notes.length === 1 ? '' : 's'} on how the inputs were read and run: add --notes to see them; every output file keeps them.`, width, '  '));
  }
  out.push(...wrap(doc.shortCaution, width, '  caution: ', 11));
  return out.join('\n') + '\n';
}

/**
 * A table laid out for a terminal: caption, header, rule, rows; columns two spaces apart, numbers
 * and ranges right-aligned, indented by two spaces. Columns that do not fit `width` are left out
 * from the right with a last line saying how many (the files keep them), or, for a table with
 * `terminalOverflow: 'wrap'`, go on in further blocks below, each led by the first column.
 */
export function plainTable(t: OutputTable, width = Infinity): string[] {
  const rows = rowCount(t);
  const clean = (s: string) => s.replace(/\s+/g, ' ');
  const cols = t.columns.map((c, j) => {
    const cells = Array.from({ length: rows }, (_, r) => clean(humanCell(c, r)));
    const head = clean(humanLabel(c));
    return { head, cells, right: j > 0 || isNumeric(c), w: Math.max(head.length, ...cells.map((s) => s.length)) };
  });
  // Blocks of columns that fit the width, each led by the first column (the row labels); a column
  // wider than the width on its own still gets a block.
  const blocks: (typeof cols)[] = [];
  let block = [cols[0]];
  let dropped = 0;
  for (const c of cols.slice(1)) {
    const used = 2 + block.reduce((s, b) => s + b.w + 2, 0) + c.w;
    if (used > width && block.length > 1) {
      if (t.terminalOverflow !== 'wrap') {
        dropped = cols.length - cols.indexOf(c);
        break;
      }
      blocks.push(block);
      block = [cols[0]];
    }
    block.push(c);
  }
  blocks.push(block);
  const out: string[] = [];
  if (t.caption) out.push(...wrap(t.caption, width, '  '));
  for (const [i, shown] of blocks.entries()) {
    const line = (cells: string[]) => '  ' + cells.map((s, j) => (shown[j].right ? s.padStart(shown[j].w) : s.padEnd(shown[j].w))).join('  ').trimEnd();
    if (i > 0) out.push('');
    out.push(line(shown.map((c) => c.head)), '  ' + shown.map((c) => '-'.repeat(c.w)).join('  '));
    for (let r = 0; r < rows; r++) out.push(line(shown.map((c) => c.cells[r])));
  }
  if (dropped > 0) out.push(...wrap(`(${dropped} more column${dropped === 1 ? '' : 's'} in the output files; widen the terminal to see them)`, width, '  '));
  for (const n of t.notes ?? []) out.push(...wrap(n, width, '  '));
  return out;
}

/**
 * `lead` then `text`, wrapped at spaces to `width` columns; continuation lines are indented by
 * `hang` spaces (default the width of `lead`). A word longer than a line is cut to fit.
 * @example wrap('aaa bbb ccc', 16, '  note: ') // ['  note: aaa bbb', '        ccc']
 */
export function wrap(text: string, width: number, lead: string, hang = lead.length): string[] {
  const lines: string[] = [];
  let line = lead;
  let empty = true;
  const indent = ' '.repeat(hang);
  for (let word of text.split(/\s+/).filter(Boolean)) {
    const room = width - (lines.length === 0 ? lead.length : hang);
    if (word.length > room) word = word.slice(0, Math.max(1, room - 1)) + '…';
    if (!empty && line.length + 1 + word.length > width) {
      lines.push(line);
      line = indent + word;
    } else {
      line = empty ? line + word : `${line} ${word}`;
    }
    empty = false;
  }
  lines.push(line);
  return lines;
}

import type { TextTable } from './text-table.js';

/**
 * Formats a table as a Markdown pipe table (GitHub Flavored Markdown tables), with its caption as
 * a bold line above and its notes as lines below. Numeric columns are right-aligned (`---:`), text
 * columns left-aligned; every column is padded to its widest cell so the source reads as a table
 * too. Cell text has backslashes and pipes escaped (`\\`, `\|`) and line breaks turned into spaces.
 *
 * @param table the cells (see TextTable)
 * @returns Markdown text ending in a newline
 * @example
 * markdownTable({ columns: ['Year', 'steady (K)'], rows: [['2030', '1.52']], numeric: [true, true] })
 * // '| Year | steady (K) |\n| ---: | ---------: |\n| 2030 |       1.52 |\n'
 */
export function markdownTable(table: TextTable): string {
  const numeric = table.columns.map((_, j) => table.numeric?.[j] ?? false);
  const head = table.columns.map(escapeCell);
  const body = table.rows.map((row) => table.columns.map((_, j) => escapeCell(row[j] ?? '')));
  const widths = head.map((h, j) => Math.max(3, h.length, ...body.map((row) => row[j].length)));
  const pad = (s: string, j: number) => (numeric[j] ? s.padStart(widths[j]) : s.padEnd(widths[j]));
  const line = (cells: string[]) => `| ${cells.map(pad).join(' | ')} |`;
  const rule = `| ${widths.map((w, j) => (numeric[j] ? '-'.repeat(w - 1) + ':' : ':' + '-'.repeat(w - 1))).join(' | ')} |`;
  const out: string[] = [];
  if (table.caption) out.push(`**${escapeInline(table.caption)}**`, '');
  out.push(line(head), rule, ...body.map(line));
  if (table.notes && table.notes.length > 0) out.push('', ...table.notes.map(escapeInline));
  return out.join('\n') + '\n';
}

function escapeCell(text: string): string {
  return escapeInline(text).replace(/\|/g, '\\|');
}

function escapeInline(text: string): string {
  return text.replace(/\r\n|\r|\n/g, ' ').replace(/\\/g, '\\\\');
}

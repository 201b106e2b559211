import type { TextTable } from './text-table.js';

/**
 * Lays a table out as plain text for a terminal: the caption, a heading row, a rule of dashes,
 * then the rows, columns separated by two spaces, numbers right-aligned, every line indented by
 * `indent`. Notes follow, one per line. Column widths count UTF-16 code units, which is one per
 * character for the text warmcast prints.
 *
 * @param table the cells (see TextTable)
 * @param indent text put before every line (default two spaces)
 * @returns the lines joined by `\n`, ending in a newline
 * @example
 * plainTable({ columns: ['Year', 'steady (K)'], rows: [['2030', '1.52']], numeric: [true, true] }, '')
 * // 'Year  steady (K)\n----  ----------\n2030        1.52\n'
 */
export function plainTable(table: TextTable, indent = '  '): string {
  const numeric = table.columns.map((_, j) => table.numeric?.[j] ?? false);
  const clean = (s: string) => s.replace(/\s+/g, ' ');
  const head = table.columns.map(clean);
  const body = table.rows.map((row) => table.columns.map((_, j) => clean(row[j] ?? '')));
  const widths = head.map((h, j) => Math.max(h.length, ...body.map((row) => row[j].length)));
  const line = (cells: string[]) => indent + cells.map((c, j) => (numeric[j] ? c.padStart(widths[j]) : c.padEnd(widths[j]))).join('  ').trimEnd();
  const out: string[] = [];
  if (table.caption) out.push(indent + clean(table.caption));
  out.push(line(head), indent + widths.map((w) => '-'.repeat(w)).join('  '), ...body.map(line));
  if (table.notes) out.push(...table.notes.map((n) => indent + clean(n)));
  return out.join('\n') + '\n';
}

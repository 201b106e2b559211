import { tableColumns, type Table } from './table.js';

/** A plain decimal or exponent number, which spreadsheets read as a number, never as a formula. */
const NUMBER_TEXT = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;
/** Leading characters that make a spreadsheet treat a cell as a formula (OWASP "CSV injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * Formats a table as CSV that spreadsheets open safely and that reads back exactly.
 *
 * - Header row of column names, then one line per row, lines ended by `\n`, a final `\n`.
 * - Numbers at full precision: the shortest text that reads back as the same double
 *   (`String(x)`, so 0.1 + 0.2 is `0.30000000000000004` and 1e-7 is `1e-7`); NaN is an empty cell;
 *   -0 is `0`; infinities are `Infinity` / `-Infinity`.
 * - Text cells that start with `=`, `+`, `-`, `@`, a tab or a carriage return and are not numbers
 *   get a leading `'`, so a spreadsheet shows them as text instead of running them as formulas
 *   (`-1.5 C target` is written `'-1.5 C target`; `-1.5` stays `-1.5`).
 * - Cells holding a comma, a quote, CR or LF are quoted, with quotes doubled.
 *
 * @param table - the table to write (see Table)
 * @returns the CSV text
 * @example
 * formatCsv({ columns: ['year', 'warming_k'], data: [Float64Array.of(2030), Float64Array.of(0.1 + 0.2)] })
 * // 'year,warming_k\n2030,0.30000000000000004\n'
 */
export function formatCsv(table: Table): string {
  const { rows, columns } = tableColumns(table);
  const out = [columns.map((c) => textCell(c.name)).join(',')];
  for (let r = 0; r < rows; r++) {
    const cells = new Array<string>(columns.length);
    for (let j = 0; j < columns.length; j++) {
      const c = columns[j];
      cells[j] = c.kind === 'number' ? numberCell(c.values[r]) : textCell(c.values[r] ?? '');
    }
    out.push(cells.join(','));
  }
  return out.join('\n') + '\n';
}

function numberCell(x: number): string {
  if (Number.isNaN(x)) return '';
  return Object.is(x, -0) ? '0' : String(x);
}

function textCell(text: string): string {
  let cell = text;
  if (FORMULA_START.test(cell) && !NUMBER_TEXT.test(cell)) cell = `'${cell}`;
  if (/[",\r\n]/.test(cell)) cell = `"${cell.replace(/"/g, '""')}"`;
  return cell;
}

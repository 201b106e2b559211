import { isNumeric, rowCount, type OutputTable } from './output-table.js';

/** A plain decimal or exponent number, which spreadsheets read as a number, never as a formula. */
const NUMBER_TEXT = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;
/** Leading characters that make a spreadsheet treat a cell as a formula (OWASP "CSV injection"). */
const FORMULA_START = /^[=+\-@\t\r]/;

/**
 * A table as CSV that spreadsheets open safely and that reads back exactly (the CSV escaping rule).
 *
 * - Header row of column keys, then one line per row, lines ended by `\n`, a final `\n`.
 * - Numbers at full precision: the shortest text that reads back as the same double
 *   (`String(x)`, so 0.1 + 0.2 is `0.30000000000000004` and 1e-7 is `1e-7`); NaN is an empty cell;
 *   -0 is `0`; infinities are `Infinity` / `-Infinity`.
 * - Text cells that start with `=`, `+`, `-`, `@`, a tab or a carriage return and are not numbers
 *   get a leading `'`, so a spreadsheet shows them as text instead of running them as formulas
 *   (`-1.5 C target` is written `'-1.5 C target`; `-1.5` stays `-1.5`).
 * - Cells holding a comma, a quote, CR or LF are quoted, with quotes doubled.
 *
 * @param table the table (see OutputTable)
 * @returns the CSV text
 * @example
 * csvText({ name: 'data', columns: [{ key: 'year', values: Float64Array.of(2030) }, { key: 'warming_k', values: Float64Array.of(0.1 + 0.2) }] })
 * // 'year,warming_k\n2030,0.30000000000000004\n'
 */
export function csvText(table: OutputTable): string {
  const rows = rowCount(table);
  const out = [table.columns.map((c) => csvTextCell(c.key)).join(',')];
  for (let r = 0; r < rows; r++) {
    out.push(table.columns.map((c) => (isNumeric(c) ? numberCell(c.values[r]) : csvTextCell((c.values as readonly string[])[r] ?? ''))).join(','));
  }
  return out.join('\n') + '\n';
}

function numberCell(x: number): string {
  if (Number.isNaN(x)) return '';
  return Object.is(x, -0) ? '0' : String(x);
}

/** One text cell of a CSV file, escaped by the rule above. */
export function csvTextCell(text: string): string {
  let cell = text;
  if (FORMULA_START.test(cell) && !NUMBER_TEXT.test(cell)) cell = `'${cell}`;
  if (/[",\r\n]/.test(cell)) cell = `"${cell.replace(/"/g, '""')}"`;
  return cell;
}

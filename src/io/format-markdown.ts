import { tableColumns, type Table } from './table.js';

/**
 * Decimals a human table shows for a column, by the unit its name ends in (units live in names):
 * `year` none; ppm and ppb 2 (0.01 ppm is below what global means are known to); K, W m-2 and
 * fractions 3; emission rates and amounts (Gt CO2, Mt) 2. Common practice, no source.
 */
const UNIT_DIGITS: readonly [RegExp, number][] = [
  [/^year$/, 0],
  [/_pp[mb]$/, 2],
  [/_k$/, 3],
  [/_wm2$/, 3],
  [/_fraction$/, 3],
  [/_gtco2$/, 2],
  [/_mt$/, 2],
];

/**
 * Formats a table as an aligned Markdown pipe table for planning documents.
 *
 * Numbers are printed with a fixed number of decimals (`x.toFixed(digits)`, so 1.23456 at 2 digits is
 * `1.23`), right-aligned. A column named in `columnDigits` gets that count; otherwise a column whose
 * name ends in a unit gets that unit's count (`year` 0, `_ppm`/`_ppb` 2, `_k`, `_wm2`, `_fraction` 3,
 * `_gtco2`, `_mt` 2); any other column gets `digits`. CSV and JSON keep full precision: this is for
 * reading. NaN is an empty cell, and a value that rounds to zero prints without a minus sign. Text
 * is left-aligned, with `|` escaped as `\|` and line breaks turned into spaces. Every column is padded
 * to its widest cell so the source reads as a table too.
 *
 * @param table - the table to write (see Table)
 * @param digits - decimals for number columns without a unit in their name (default 3)
 * @param columnDigits - decimals for named columns, overriding both the unit's count and `digits`
 * @returns the Markdown text, ending in a newline
 * @example
 * formatMarkdown({ columns: ['year', 'co2_ppm'], data: [Float64Array.of(2030), Float64Array.of(412.44)] }, 4)
 * // '| year | co2_ppm |\n| ---: | ------: |\n| 2030 |  412.44 |\n'
 */
export function formatMarkdown(
  table: Table,
  digits = 3,
  columnDigits: Readonly<Record<string, number>> = {},
): string {
  const { rows, columns } = tableColumns(table);
  const cells = columns.map((c) => {
    const out = new Array<string>(rows);
    if (c.kind === 'number') {
      const d = Object.hasOwn(columnDigits, c.name) ? columnDigits[c.name] : unitDigits(c.name) ?? digits;
      for (let r = 0; r < rows; r++) out[r] = fixed(c.values[r], d);
    } else {
      for (let r = 0; r < rows; r++) out[r] = escapeText(c.values[r] ?? '');
    }
    return out;
  });
  const headers = columns.map((c) => escapeText(c.name));
  // At least 4 wide so the delimiter row has three dashes, the minimum some Markdown readers need.
  const widths = columns.map((_, j) => cells[j].reduce((w, s) => Math.max(w, s.length), Math.max(4, headers[j].length)));
  const pad = (s: string, j: number) => (columns[j].kind === 'number' ? s.padStart(widths[j]) : s.padEnd(widths[j]));
  const line = (parts: string[]) => `| ${parts.join(' | ')} |`;

  const out = [
    line(headers.map(pad)),
    line(columns.map((c, j) => (c.kind === 'number' ? '-'.repeat(widths[j] - 1) + ':' : ':' + '-'.repeat(widths[j] - 1)))),
  ];
  for (let r = 0; r < rows; r++) out.push(line(cells.map((col, j) => pad(col[r], j))));
  return out.join('\n') + '\n';
}

function unitDigits(name: string): number | undefined {
  return UNIT_DIGITS.find(([pattern]) => pattern.test(name))?.[1];
}

function fixed(x: number, digits: number): string {
  if (Number.isNaN(x)) return '';
  const s = x.toFixed(digits);
  return /^-0(?:\.0*)?$/.test(s) ? s.slice(1) : s;
}

function escapeText(s: string): string {
  return s.replace(/\r\n|\r|\n/g, ' ').replace(/\|/g, '\\|');
}

/**
 * The one table model every writer takes (CSV, JSON, Markdown, HTML, xlsx, terminal): named
 * columns in order, each numbers (a Float64Array, NaN for "no value") or text (one string per row).
 * A column has a machine `key` (CSV header, JSON key, DESIGN.md names such as `warming_k`) and a
 * human `label` (Markdown, HTML and terminal headers, such as `warming K`); numbers keep full
 * precision in machine formats and show `digits` decimals in human ones.
 */
export interface OutputTable {
  /** Short name: the xlsx sheet name and the JSON member of a summary table. */
  name: string;
  /** One-line title, shown above the table in human formats. */
  caption?: string;
  columns: OutputColumn[];
  /** Sentences under the table in human formats (how to read it). */
  notes?: string[];
  /**
   * On a narrow terminal: `wrap` continues the columns that do not fit in further blocks (each led by
   * the first column), for tables whose every column was asked for (years, chances); `drop` (default)
   * leaves them out with a line saying how many, for tables the files give in full anyway.
   */
  terminalOverflow?: 'wrap' | 'drop';
}

/** One column of an OutputTable. */
export interface OutputColumn {
  /** Machine name: CSV header and JSON key (snake_case with the unit, `warming_k`). */
  key: string;
  /** Header in human formats (default `key`). */
  label?: string;
  /** Numbers (NaN: no value) or text cells, one per row. */
  values: Float64Array | readonly string[];
  /** Decimals in human formats (default by the unit the key ends in; see humanDigits). */
  digits?: number;
}

/**
 * Decimals a human table shows for a number column, by the unit its key ends in (units live in
 * names): `year` none; ppm and ppb 1; K and W m-2 2; shares 2; emissions (Gt CO2, Mt) 1. CSV,
 * JSON and xlsx keep full precision. Common practice, no source.
 */
const UNIT_DIGITS: readonly [RegExp, number][] = [
  [/^year$/, 0],
  [/_pp[mb]$/, 1],
  [/_k$/, 2],
  [/_wm2$/, 2],
  [/^(prob_above|crossed_by)_/, 2],
  [/_gtco2$/, 1],
  [/_mt$/, 1],
];

/** Rows of a table (the length of its first column; 0 for no columns). */
export function rowCount(t: OutputTable): number {
  return t.columns.length > 0 ? t.columns[0].values.length : 0;
}

/** Whether a column holds numbers. */
export function isNumeric(c: OutputColumn): c is OutputColumn & { values: Float64Array } {
  return c.values instanceof Float64Array;
}

/** Decimals a human format shows for a number column (its `digits`, else by its key's unit, else 2). */
export function humanDigits(c: OutputColumn): number {
  return c.digits ?? UNIT_DIGITS.find(([pattern]) => pattern.test(c.key))?.[1] ?? 2;
}

/**
 * The text of one cell in human formats: a number to its column's decimals (never `-0.00`; `n/a`
 * for NaN), text as it is.
 * @example humanCell({ key: 'warming_k', values: Float64Array.of(1.234) }, 0) // '1.23'
 */
export function humanCell(c: OutputColumn, row: number): string {
  if (!isNumeric(c)) return (c.values as readonly string[])[row] ?? '';
  const v = c.values[row];
  if (!Number.isFinite(v)) return 'n/a';
  const s = v.toFixed(humanDigits(c));
  return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
}

/** A column's header in human formats. */
export function humanLabel(c: OutputColumn): string {
  return c.label ?? c.key;
}

/**
 * The rows of a yearly table (one with a `year` column) whose year is in `years`, in table order; the
 * table itself when `years` is undefined.
 * @example yearRows(t, [2030, 2050]) // the table with only the 2030 and 2050 rows
 */
export function yearRows(t: OutputTable, years?: readonly number[]): OutputTable {
  if (!years) return t;
  const year = t.columns.find((c) => c.key === 'year')?.values;
  if (!(year instanceof Float64Array)) return t;
  const wanted = new Set(years);
  const keep: number[] = [];
  for (let i = 0; i < year.length; i++) if (wanted.has(year[i])) keep.push(i);
  return pickRows(t, keep);
}

/** The rows of a yearly table (one with a `year` column) from `from` to `to` (inclusive; either end open when undefined). */
export function yearSpan(t: OutputTable, from?: number, to?: number): OutputTable {
  const year = t.columns.find((c) => c.key === 'year')?.values;
  if (!(year instanceof Float64Array) || (from === undefined && to === undefined)) return t;
  const keep: number[] = [];
  for (let i = 0; i < year.length; i++) if (year[i] >= (from ?? -Infinity) && year[i] <= (to ?? Infinity)) keep.push(i);
  return pickRows(t, keep);
}

function pickRows(t: OutputTable, rows: readonly number[]): OutputTable {
  return {
    ...t,
    columns: t.columns.map((c) => ({
      ...c,
      values: isNumeric(c) ? Float64Array.from(rows, (i) => c.values[i]) : rows.map((i) => (c.values as readonly string[])[i]),
    })),
  };
}

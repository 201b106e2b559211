/**
 * A table for the output writers: named columns in a fixed order, each either numbers or text.
 *
 * - `columns` lists every column name, in output order (names must be distinct).
 * - `textColumns` maps the name of each text column to its cells (one string per row).
 * - `data` holds the number columns as Float64Arrays, one value per row, NaN for "no value". Either
 *   one entry per name in `columns`, index for index (a text column's entry is then not read: pass
 *   `new Float64Array(0)`), or only the number columns, in the order they appear in `columns`. With
 *   no text columns the two layouts are the same.
 *
 * @example
 * // A long table: text, then numbers.
 * const t: Table = {
 *   columns: ['pathway', 'year', 'warming_k'],
 *   data: [Float64Array.of(2030, 2030), Float64Array.of(1.52, 1.61)],
 *   textColumns: { pathway: ['swift', 'delayed'] },
 * };
 */
export interface Table {
  columns: string[];
  data: Float64Array[];
  textColumns?: Record<string, string[]>;
}

/** One resolved column of a Table. */
export type TableColumn =
  | { name: string; kind: 'number'; values: Float64Array }
  | { name: string; kind: 'text'; values: readonly string[] };

/**
 * Resolves a Table into its columns, in order, and its row count, checking that it is well formed.
 * A malformed table is a programming error, not bad input, so this throws a plain RangeError.
 *
 * @throws RangeError on duplicate names, a `data` length that fits neither layout, unequal column
 *   lengths, or a text column not listed in `columns`
 * @example
 * tableColumns({ columns: ['year'], data: [Float64Array.of(2030)] })
 * // { rows: 1, columns: [{ name: 'year', kind: 'number', values: Float64Array [2030] }] }
 */
export function tableColumns(table: Table): { rows: number; columns: TableColumn[] } {
  const text = table.textColumns ?? {};
  const names = table.columns;
  if (new Set(names).size !== names.length) throw new RangeError(`table column names must be distinct: ${names.join(', ')}`);
  for (const name of Object.keys(text)) {
    if (!names.includes(name)) throw new RangeError(`text column "${name}" must be listed in table.columns`);
  }
  const textCount = names.filter((name) => Object.hasOwn(text, name)).length;
  const aligned = table.data.length === names.length;
  if (!aligned && table.data.length !== names.length - textCount) {
    throw new RangeError(`table.data must hold ${names.length} or ${names.length - textCount} arrays, not ${table.data.length}`);
  }
  const columns: TableColumn[] = [];
  let next = 0;
  names.forEach((name, i) => {
    if (Object.hasOwn(text, name)) {
      columns.push({ name, kind: 'text', values: text[name] });
    } else {
      columns.push({ name, kind: 'number', values: table.data[aligned ? i : next++] });
    }
  });
  const rows = columns.length > 0 ? columns[0].values.length : 0;
  for (const c of columns) {
    if (c.values.length !== rows) throw new RangeError(`table column "${c.name}" has ${c.values.length} rows, expected ${rows}`);
  }
  return { rows, columns };
}

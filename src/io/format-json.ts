import { tableColumns, type Table } from './table.js';

/**
 * Formats a table as JSON, row by row, with the provenance of the numbers:
 * `{ "provenance": {...}, "columns": [names in order], "rows": [{ name: value, ... }, ...] }`, and
 * any `extra` members (such as an ensemble's `headlines`) between the provenance and the columns.
 * Each row object has its keys in column order. Numbers keep full precision (shortest round-trip
 * text, as JSON.stringify writes them); NaN and infinities become `null`. The layout is fixed so
 * outputs diff cleanly: two-space indentation, one row per line.
 *
 * @param table - the table to write (see Table)
 * @param provenance - any JSON-serialisable object describing where the numbers came from
 * @param extra - more JSON-serialisable members of the top-level object, in order (default none)
 * @returns the JSON text, ending in a newline
 * @example
 * formatJson({ columns: ['year', 'warming_k'], data: [Float64Array.of(2030), Float64Array.of(NaN)] }, { model: 'x' })
 * // '{\n  "provenance": {\n    "model": "x"\n  },\n  "columns": ["year","warming_k"],\n'
 * // + '  "rows": [\n    {"year":2030,"warming_k":null}\n  ]\n}\n'
 */
export function formatJson(table: Table, provenance: object, extra: Record<string, unknown> = {}): string {
  const { rows, columns } = tableColumns(table);
  const keys = columns.map((c) => JSON.stringify(c.name));
  const lines: string[] = [];
  for (let r = 0; r < rows; r++) {
    const parts = columns.map((c, j) => {
      const v = c.values[r];
      // JSON.stringify already writes non-finite numbers as null.
      return `${keys[j]}:${JSON.stringify(typeof v === 'number' ? v : (v ?? ''))}`;
    });
    lines.push(`    {${parts.join(',')}}`);
  }
  const member = (key: string, value: unknown) => `  ${JSON.stringify(key)}: ${JSON.stringify(value, null, 2).replace(/\n/g, '\n  ')},\n`;
  return '{\n'
    + member('provenance', provenance)
    + Object.entries(extra).map(([key, value]) => member(key, value)).join('')
    + `  "columns": [${keys.join(',')}],\n`
    + (rows === 0 ? '  "rows": []\n' : `  "rows": [\n${lines.join(',\n')}\n  ]\n`)
    + '}\n';
}

import type { OutputDocument } from './output-document.js';
import { isNumeric, rowCount, type OutputTable } from './output-table.js';

/**
 * A document as JSON: `{ "provenance", "command", "headline", ...json extras, "columns", "rows" }`,
 * the rows being the yearly table, one object per year with keys in column order. Numbers keep full
 * precision (shortest round-trip text); NaN and infinities become `null`. The layout is fixed so
 * files diff cleanly: two-space indentation, one row per line.
 *
 * @param doc the document
 * @param provenance where the numbers came from (written first)
 * @returns JSON text ending in a newline
 * @example JSON.parse(jsonText(doc, provenance)).rows[0] // { year: 2025, warming_k: 1.36, ... }
 */
export function jsonText(doc: OutputDocument, provenance: object): string {
  return jsonWithRows({ provenance, ...jsonSummary(doc) }, doc.data);
}

/** What a document's JSON holds besides its rows: command, title, headline and extras (also a CSV's .meta.json). */
export function jsonSummary(doc: OutputDocument): Record<string, unknown> {
  return {
    command: doc.command,
    title: doc.title,
    baseline: `${doc.baseline[0]}-${doc.baseline[1]}`,
    headline: doc.headline,
    ...(doc.json ?? {}),
    notes: doc.notes,
    cautions: doc.cautions,
  };
}

/**
 * Members, then `columns` and `rows` of a table.
 * @example jsonWithRows({ a: 1 }, table) // '{\n  "a": 1,\n  "columns": [...],\n  "rows": [\n    {...}\n  ]\n}\n'
 */
export function jsonWithRows(members: Record<string, unknown>, table: OutputTable): string {
  const rows = rowCount(table);
  const keys = table.columns.map((c) => JSON.stringify(c.key));
  const lines: string[] = [];
  for (let r = 0; r < rows; r++) {
    const parts = table.columns.map((c, j) => `${keys[j]}:${JSON.stringify(isNumeric(c) ? (Number.isFinite(c.values[r]) ? c.values[r] : null) : (c.values as readonly string[])[r] ?? '')}`);
    lines.push(`    {${parts.join(',')}}`);
  }
  const member = (key: string, value: unknown) => `  ${JSON.stringify(key)}: ${JSON.stringify(value, numbersOrNull, 2).replace(/\n/g, '\n  ')},\n`;
  return (
    '{\n' +
    Object.entries(members).filter(([, v]) => v !== undefined).map(([k, v]) => member(k, v)).join('') +
    `  "columns": [${keys.join(',')}],\n` +
    (rows === 0 ? '  "rows": []\n' : `  "rows": [\n${lines.join(',\n')}\n  ]\n`) +
    '}\n'
  );
}

/** JSON.stringify replacer: typed arrays as plain lists; non-finite numbers as null (as JSON.stringify does anyway). */
function numbersOrNull(_key: string, value: unknown): unknown {
  return value instanceof Float64Array ? Array.from(value, (v) => (Number.isFinite(v) ? v : null)) : value;
}

/**
 * Flattens a provenance record into `[key, text]` pairs for line-by-line writers (Markdown, the
 * terminal): one pair per top-level key, in the record's key order. Strings and numbers print as
 * they are; an array prints its items joined by `; `; an object prints its `key value` pairs joined
 * by `, `; null and undefined print as `none`.
 *
 * @param provenance the record the CLI built (any JSON-like object)
 * @example
 * provenanceEntries({ version: '0.1.0', inputs: [{ path: 'a.csv', sha256: 'ab12' }] })
 * // [['version', '0.1.0'], ['inputs', 'path a.csv, sha256 ab12']]
 */
export function provenanceEntries(provenance: object): [string, string][] {
  return Object.entries(provenance)
    .filter(([, v]) => v !== undefined)
    .map(([k, v]) => [k, valueText(v)]);
}

function valueText(v: unknown): string {
  if (v === null || v === undefined) return 'none';
  if (Array.isArray(v)) return v.length === 0 ? 'none' : v.map(valueText).join('; ');
  if (typeof v === 'object') {
    return Object.entries(v as Record<string, unknown>)
      .filter(([, x]) => x !== undefined)
      .map(([k, x]) => `${k} ${valueText(x)}`)
      .join(', ');
  }
  return String(v);
}

/**
 * A provenance record as Markdown list lines: one `- key: text` per top-level key, except that a
 * list of two or more items (the notes, the input files) becomes `- key:` with one nested item per
 * entry, so long lists read line by line. Line breaks inside values become spaces.
 *
 * @example
 * provenanceMarkdown({ version: '0.1.0', notes: ['a', 'b'] })
 * // ['- version: 0.1.0', '- notes:', '  - a', '  - b']
 */
export function provenanceMarkdown(provenance: object): string[] {
  const inline = (s: string) => s.replace(/\r\n|\r|\n/g, ' ');
  return Object.entries(provenance)
    .filter(([, v]) => v !== undefined)
    .flatMap(([k, v]) =>
      Array.isArray(v) && v.length > 1 ? [`- ${inline(k)}:`, ...v.map((item) => `  - ${inline(valueText(item))}`)] : [`- ${inline(k)}: ${inline(valueText(v))}`],
    );
}

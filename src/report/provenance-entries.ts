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

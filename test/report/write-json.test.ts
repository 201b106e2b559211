import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { jsonWithRows } from '../../src/report/write-json.js';

/** The tables below as columns of names, number arrays (in order, text columns skipped) and text cells, written with a provenance first. */
function formatJson(t: { columns: string[]; data: Float64Array[]; textColumns?: Record<string, string[]> }, provenance: object, extra: Record<string, unknown> = {}): string {
  let next = 0;
  const numbers = t.data.length === t.columns.length ? (i: number) => t.data[i] : () => t.data[next++];
  return jsonWithRows({ provenance, ...extra }, { name: 'data', columns: t.columns.map((key, i) => ({ key, values: t.textColumns?.[key] ?? numbers(i) })) });
}

describe('jsonWithRows', () => {
  it('formatJson writes provenance, columns and one object per row, keys in column order', () => {
    const json = formatJson({
      columns: ['pathway', 'year', 'warming_k'],
      data: [Float64Array.of(2030), Float64Array.of(NaN)],
      textColumns: { pathway: ['swift'] },
    }, { source: 'bundled:swift', notes: ['n'] });
    expect(json).toBe(
      '{\n'
      + '  "provenance": {\n    "source": "bundled:swift",\n    "notes": [\n      "n"\n    ]\n  },\n'
      + '  "columns": ["pathway","year","warming_k"],\n'
      + '  "rows": [\n    {"pathway":"swift","year":2030,"warming_k":null}\n  ]\n'
      + '}\n',
    );
  });

  it('formatJson puts extra members between the provenance and the columns, indented like the provenance', () => {
    const json = formatJson({ columns: ['year'], data: [Float64Array.of(2030)] }, { tool: 't' }, { headlines: { members: 2, levels: [1.5] } });
    expect(json).toBe(
      '{\n'
      + '  "provenance": {\n    "tool": "t"\n  },\n'
      + '  "headlines": {\n    "members": 2,\n    "levels": [\n      1.5\n    ]\n  },\n'
      + '  "columns": ["year"],\n'
      + '  "rows": [\n    {"year":2030}\n  ]\n'
      + '}\n',
    );
    expect(Object.keys(JSON.parse(json))).toEqual(['provenance', 'headlines', 'columns', 'rows']);
  });

  it('formatJson numbers read back with JSON.parse exactly; NaN and infinities become null (ECMA-404 has no NaN)', () => {
    fc.assert(fc.property(fc.array(fc.double(), { minLength: 1, maxLength: 40 }), (xs) => {
      const values = Float64Array.from(xs);
      const back = JSON.parse(formatJson({ columns: ['x'], data: [values] }, {}));
      expect(back.columns).toEqual(['x']);
      values.forEach((x, i) => {
        const v = back.rows[i].x;
        if (Number.isFinite(x)) expect(v === x).toBe(true);
        else expect(v).toBeNull();
      });
    }), { numRuns: 300 });
  });

  it('formatJson of an empty table is valid JSON with no rows', () => {
    expect(JSON.parse(formatJson({ columns: ['year'], data: [new Float64Array(0)] }, { a: 1 }))).toEqual({
      provenance: { a: 1 }, columns: ['year'], rows: [],
    });
  });
});

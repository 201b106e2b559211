import fc from 'fast-check';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvText } from '../../src/report/write-csv.js';

/** The tables below as columns of names, number arrays (in order, text columns skipped) and text cells. */
function formatCsv(t: { columns: string[]; data: Float64Array[]; textColumns?: Record<string, string[]> }): string {
  let next = 0;
  const numbers = t.data.length === t.columns.length ? (i: number) => t.data[i] : () => t.data[next++];
  return csvText({ name: 'data', columns: t.columns.map((key, i) => ({ key, values: t.textColumns?.[key] ?? numbers(i) })) });
}

/** Reads CSV back with papaparse, the reference parser here (the final newline removed first). */
const readBack = (csv: string) => {
  expect(csv.endsWith('\n')).toBe(true);
  const r = Papa.parse<string[]>(csv.slice(0, -1), { delimiter: ',', newline: '\n', quoteChar: '"' });
  expect(r.errors).toEqual([]);
  return r.data;
};

describe('csvText', () => {
  it('formatCsv writes shortest round-trip numbers: 0.1 + 0.2 is 0.30000000000000004 (IEEE 754 double)', () => {
    const csv = formatCsv({ columns: ['year', 'warming_k'], data: [Float64Array.of(2030), Float64Array.of(0.1 + 0.2)] });
    expect(csv).toBe('year,warming_k\n2030,0.30000000000000004\n');
  });

  it('formatCsv numbers read back through papaparse bit for bit, NaN as an empty cell (property)', () => {
    fc.assert(fc.property(fc.array(fc.double(), { minLength: 1, maxLength: 40 }), (xs) => {
      const values = Float64Array.from(xs);
      const rows = readBack(formatCsv({ columns: ['x'], data: [values] }));
      expect(rows[0]).toEqual(['x']);
      values.forEach((x, i) => {
        const cell = rows[i + 1][0];
        if (Number.isNaN(x)) expect(cell).toBe('');
        else expect(Number(cell) === x).toBe(true);
      });
    }), { numRuns: 300 });
  });

  it('formatCsv escapes formula-like text with a leading quote and leaves numbers alone (OWASP CSV injection)', () => {
    const text = ['=SUM(A1:A9)', '+1+1', '-1.5 C target', '@cmd', '\tlead', '\rlead', '-1.5', '+3', 'plain'];
    const csv = formatCsv({ columns: ['label', 'n'], data: [new Float64Array(text.length)], textColumns: { label: text } });
    expect(readBack(csv).slice(1).map((r) => r[0])).toEqual([
      "'=SUM(A1:A9)", "'+1+1", "'-1.5 C target", "'@cmd", "'\tlead", "'\rlead", '-1.5', '+3', 'plain',
    ]);
  });

  it('formatCsv quotes cells with commas, quotes and line breaks, doubling quotes (RFC 4180, section 2)', () => {
    const text = ['a,b', 'say "hi"', 'two\nlines'];
    const csv = formatCsv({ columns: ['label'], data: [], textColumns: { label: text } });
    expect(csv).toBe('label\n"a,b"\n"say ""hi"""\n"two\nlines"\n');
  });

  it('formatCsv text cells read back exactly, a formula-like cell with one extra leading quote (property)', () => {
    const chars = fc.constantFrom('a', 'Z', ',', '"', '\n', '\r', ' ', '=', '-', '+', '@', '\t', '1', '.', 'é', '|', "'");
    fc.assert(fc.property(fc.array(fc.array(chars, { maxLength: 8 }).map((a) => a.join('')), { minLength: 1, maxLength: 10 }), (text) => {
      const rows = readBack(formatCsv({ columns: ['t', 'n'], data: [new Float64Array(text.length)], textColumns: { t: text } }));
      text.forEach((s, i) => {
        const formulaLike = /^[=+\-@\t\r]/.test(s) && !/^[+-]?(\d+(\.\d*)?|\.\d+)(e[+-]?\d+)?$/i.test(s);
        expect(rows[i + 1][0]).toBe(formulaLike ? `'${s}` : s);
      });
    }), { numRuns: 300 });
  });

  it('formatCsv writes a long table in column order with text and number columns mixed', () => {
    const csv = formatCsv({
      columns: ['pathway', 'year', 'warming_k'],
      data: [Float64Array.of(2030, 2030), Float64Array.of(1.52, NaN)],
      textColumns: { pathway: ['swift', 'delayed'] },
    });
    expect(csv).toBe('pathway,year,warming_k\nswift,2030,1.52\ndelayed,2030,\n');
  });
});

import { describe, expect, it } from 'vitest';
import { plainTable, wrap } from '../../src/report/terminal-text.js';

describe('terminal layout helpers', () => {
  it('wrap breaks at spaces within the width, hangs continuation lines under the text, and cuts a word longer than a line', () => {
    expect(wrap('aaa bbb ccc', 16, '  note: ')).toEqual(['  note: aaa bbb', '        ccc']);
    const lines = wrap('x'.repeat(50) + ' end', 20, '  ');
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(20);
    expect(lines.at(-1)).toBe('  end');
  });

  it('plainTable leaves out columns from the right that would pass the width, and says how many', () => {
    const t = { name: 't', columns: [{ key: 'year', values: Float64Array.of(2030) }, ...['a', 'b', 'c'].map((k) => ({ key: `${k}_long_column_k`, values: Float64Array.of(1) }))] };
    const lines = plainTable(t, 30);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(30);
    expect(lines[0]).toBe('  year  a_long_column_k');
    expect(lines.slice(3).map((l) => l.trim()).join(' ')).toBe('(2 more columns in the output files; widen the terminal to see them)');
  });

  it("plainTable with terminalOverflow 'wrap' puts those columns in further blocks, each led by the first column", () => {
    const t = { name: 't', terminalOverflow: 'wrap' as const, columns: [{ key: 'year', values: Float64Array.of(2030) }, ...['a', 'b', 'c'].map((k) => ({ key: `${k}_long_column_k`, values: Float64Array.of(1) }))] };
    const lines = plainTable(t, 30);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(30);
    expect(lines.filter((l) => l.trim().startsWith('year')).map((l) => l.trim().split(/\s+/))).toEqual([
      ['year', 'a_long_column_k'],
      ['year', 'b_long_column_k'],
      ['year', 'c_long_column_k'],
    ]);
    expect(lines.filter((l) => l === '')).toHaveLength(2);
  });
});

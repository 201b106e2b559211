import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { markdownTable } from '../../src/report/markdown-table.js';
import { readGfmTables } from './gfm-table.js';

describe('markdownTable', () => {
  it('markdownTable reads back cell for cell under the GFM table rules, pipes and backslashes included (property)', () => {
    const cell = fc.string({ maxLength: 12 }).map((s) => s.replace(/[\r\n]/g, ' ').trim());
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 5 }), fc.array(fc.array(cell, { minLength: 5, maxLength: 5 }), { minLength: 1, maxLength: 6 }), (n, raw) => {
        const columns = raw[0].slice(0, n).map((c, j) => `${c}h${j}`);
        const rows = raw.slice(1).map((r) => r.slice(0, n));
        const [t] = readGfmTables(markdownTable({ columns, rows }));
        expect(t.header).toEqual(columns);
        expect(t.rows).toEqual(rows);
      }),
    );
  });

  it('markdownTable right-aligns numeric columns and left-aligns text ones in the delimiter row', () => {
    const md = markdownTable({ columns: ['Pathway', 'Peak (K)'], rows: [['a|b', '1.52']], numeric: [false, true] });
    const [t] = readGfmTables(md);
    expect(t.align).toEqual(['left', 'right']);
    expect(t.rows).toEqual([['a|b', '1.52']]);
    expect(md).toContain('a\\|b');
  });

  it('markdownTable writes the caption in bold above and the notes below', () => {
    const md = markdownTable({ caption: 'Caption', columns: ['x'], rows: [['1']], notes: ['Note one.'] });
    expect(md).toBe('**Caption**\n\n| x   |\n| :-- |\n| 1   |\n\nNote one.\n');
  });
});

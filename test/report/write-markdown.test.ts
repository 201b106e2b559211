import { describe, expect, it } from 'vitest';
import { markdownEscape, markdownTable } from '../../src/report/write-markdown.js';
import { readGfmTables } from './gfm-table.js';

describe('Markdown writer (one escaping rule)', () => {
  it('markdownEscape escapes backslash, pipe, < and * so that text reads back unchanged (CommonMark 0.30 section 2.4, backslash escapes; GFM tables section 4.10)', () => {
    expect(markdownEscape('prob_above_<t> | a\\b *x*')).toBe('prob_above_\\<t> \\| a\\\\b \\*x\\*');
    expect(markdownEscape('two\nlines')).toBe('two lines');
  });

  it('markdownTable cells read back exactly through a GFM table reader, numbers right-aligned and rounded to their unit\'s decimals', () => {
    const text = ['a | b', 'c\\d', 'plain'];
    const t = markdownTable({
      name: 't',
      caption: 'Cap',
      columns: [
        { key: 'label', values: text },
        { key: 'warming_k', label: 'warming K', values: Float64Array.of(1.234, -0.001, NaN) },
        { key: 'co2_ppm', values: Float64Array.of(420.04, 500, 612.36) },
      ],
    });
    const [back] = readGfmTables(t);
    expect(back.header).toEqual(['label', 'warming K', 'co2_ppm']);
    expect(back.rows).toEqual([
      ['a | b', '1.23', '420.0'],
      ['c\\d', '0.00', '500.0'],
      ['plain', 'n/a', '612.4'],
    ]);
    expect(back.align).toEqual(['left', 'right', 'right']);
  });
});

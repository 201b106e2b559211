import { describe, expect, it } from 'vitest';
import { ensembleHeadlinesMarkdown } from '../../src/report/ensemble-headlines-markdown.js';
import { headlinesFixture } from './ensemble-headlines-fixture.js';
import { readGfmTables } from './gfm-table.js';

describe('ensembleHeadlinesMarkdown', () => {
  it('ensembleHeadlinesMarkdown gives a caption, a table of warming levels, a table of the members\' own peaks and a table of sampled percentiles (read back under the GFM table rules)', () => {
    const md = ensembleHeadlinesMarkdown(headlinesFixture());
    expect(md.split('\n')[0]).toBe('**Headlines: 2000 members, seed 7; warming relative to 1850-1900, as 20-year means**');
    const [levels, peak, sampled] = readGfmTables(md);
    expect(levels.header).toEqual(['warming level', 'crossed by 2050', 'crossed by 2100', 'median crossing year', 'above at the start (1750-1769)']);
    expect(levels.rows).toEqual([
      ['1.5 K', '81 %', '97 %', '2031', '0 %'],
      ['0.05 K', '100 %', '100 %', '1915', '30 %'],
      ['0.001 K', '100 %', '100 %', 'already above at the start (the first 20-year mean, 1750-1769)', '60 %'],
      ['3 K', '<1 %', 'n/a (by 2140: 4 %)', 'fewer than half of the members cross it by 2140', '0 %'],
    ]);
    expect(peak.header).toEqual(['', '5 %', '17 %', '50 %', '83 %', '95 %']);
    // Peak years are percentiles of whole years, shown rounded.
    expect(peak.rows).toEqual([
      ['peak warming (K)', '1.45', '1.70', '1.98', '2.35', '2.70'],
      ['peak year', '2053', '2065', '2079', '2150', '2150'],
    ]);
    expect(md).toContain("31 % of members still rising in 2150 (their peak is the run's last year, so it is only the highest so far).");
    expect(sampled.header).toEqual(['sampled', '5 %', '17 %', '50 %', '83 %', '95 %']);
    expect(sampled.rows).toEqual([
      ['ECS (K)', '2.00', '2.50', '3.00', '3.50', '4.00'],
      ['TCR (K)', '0.80', '1.30', '1.80', '2.30', '2.80'],
    ]);
    expect(md).toMatch(/\n\nECS-TCR correlation across members: 0\.64\.\n$/);
  });

  it('ensembleHeadlinesMarkdown leaves out the above-at-the-start column when no member is above any level at the start', () => {
    const h = headlinesFixture();
    h.thresholds = [h.thresholds[0]];
    const [levels] = readGfmTables(ensembleHeadlinesMarkdown(h));
    expect(levels.header).toEqual(['warming level', 'crossed by 2050', 'crossed by 2100', 'median crossing year']);
  });
});

import { describe, expect, it } from 'vitest';
import { comparisonTables } from '../../src/report/comparison-tables.js';
import { markdownTable } from '../../src/report/write-markdown.js';
import { headersOf, rowsOf } from './output-rows.js';
import { comparePathways } from '../../src/metrics/index.js';
import { expectClose } from '../asserts.js';
import { fixtureComparison, oddsComparison } from './comparison-fixture.js';
import { readGfmTables } from './gfm-table.js';

const first = (cell: string) => Number(/^[-+]?\d+(\.\d+)?/.exec(cell)![0]);

describe('comparisonTables', () => {
  const c = fixtureComparison();
  const { milestones, summary } = comparisonTables(c);

  it('the milestone table in Markdown parses back to the comparison\'s warming and differences, to the 0.005 K its 2 decimals allow', () => {
    const [t] = readGfmTables(markdownTable(milestones));
    expect(t.header).toEqual(['Year', 'steady (K)', 'delayed (K)', 'delayed vs steady (K)', 'swift (K)', 'swift vs steady (K)']);
    expect(t.rows.map((r) => Number(r[0]))).toEqual(c.milestoneYears);
    t.rows.forEach((r, m) => {
      expectClose(first(r[1]), c.pathways[0].milestones[m].warmingK, 0.005, `steady ${r[0]}`);
      for (const [p, col] of [[1, 2], [2, 4]] as const) {
        const v = c.pathways[p].milestones[m];
        expectClose(first(r[col]), v.warmingK, 0.005, `${c.pathways[p].label} ${r[0]}`);
        expectClose(first(r[col + 1]), v.differenceK, 0.005, `${c.pathways[p].label} difference ${r[0]}`);
      }
      // The ensemble ranges of delayed: 17-83 % in parentheses, 5-95 % in brackets.
      const [, lo, hi] = /\[(\S+) to (\S+)\]/.exec(r[2])!.map(Number);
      expectClose(lo, c.pathways[1].milestones[m].range!.p05, 0.005);
      expectClose(hi, c.pathways[1].milestones[m].range!.p95, 0.005);
      const [, lo17, hi83] = /\((\S+) to (\S+)\)/.exec(r[2])!.map(Number);
      expectClose(lo17, c.pathways[1].milestones[m].range!.p17, 0.005);
      expectClose(hi83, c.pathways[1].milestones[m].range!.p83, 0.005);
    });
  });

  it('the per-pathway table in Markdown parses back to peak, crossing years, key-year warming and CO2 to net zero', () => {
    const [t] = readGfmTables(markdownTable(summary));
    expect(t.header).toEqual(['Pathway', 'Peak (K)', 'Peak year', 'Reaches 1.5 K', 'Reaches 2 K', '2050 (K)', '2100 (K)', 'CO2 to net zero (Gt CO2)', 'Net-zero year']);
    t.rows.forEach((r, i) => {
      const p = c.pathways[i];
      expect(r[0]).toBe(p.label);
      expectClose(first(r[1]), p.peak.value, 0.005);
      expect(first(r[2])).toBe(p.peak.year);
      expect(r[3]).toBe(String(p.crossings[0].period!.year));
      expect(r[4]).toBe(String(p.crossings[1].period!.year));
      expectClose(first(r[5]), p.keyYears[0].warmingK, 0.005);
      expectClose(first(r[6]), p.keyYears[1].warmingK, 0.005);
    });
    // swift: 40 - 1.5 (t - 2020) Gt CO2/yr is positive through 2046, net zero in 2047 (it is -0.5 then):
    // sum 2020..2046 = 27 x (40 + 1) / 2 = 553.5, printed as a whole number (analytic).
    expect(t.rows[2][7]).toBe(String(Math.round(553.5)));
    expect(t.rows[2][8]).toBe('2047');
    expect(t.rows[0][7]).toBe('n/a (concentration-driven)');
  });

  it('comparisonTables writes "not crossed by" the last year the data can show, "or earlier" and "still rising" where they apply', () => {
    const years = Float64Array.from({ length: 41 }, (_, i) => 2020 + i);
    const cc = comparePathways(
      [
        { label: 'warm', years, warmingK: years.map(() => 1.7) },
        { label: 'rising', years, warmingK: years.map((y) => 1.0 + 0.01 * (y - 2020)) },
      ],
      { milestoneYears: [2030] },
    );
    const rows = rowsOf(comparisonTables(cc).summary);
    // Data to 2060: the last 20-year period, 2041-2060, stands for 2050, the last crossing year that can be seen.
    expect(rows[0].slice(2, 5)).toEqual(['2020', '2029 or earlier', 'not crossed by 2050']);
    expect(rows[1].slice(2, 5)).toEqual(['2060 (still rising)', 'not crossed by 2050', 'not crossed by 2050']);
    expect(rows[1][6]).toBe('n/a'); // 2100 lies beyond the data
  });

  it('with crossing odds, "Reaches" is the year by which half of the members crossed, and a table of probabilities parses back to the odds', () => {
    const co = oddsComparison();
    const t = comparisonTables(co);
    expect(rowsOf(t.summary).map((r) => r.slice(3, 5))).toEqual([
      ['2061', 'not crossed by 2090'],
      ['2046', 'fewer than half by 2090'],
    ]);
    // The ensemble's peak cells are the members' own (median [5-95 %], median year, share still rising); the single run's its line's.
    expect(rowsOf(t.summary).map((r) => r.slice(1, 3))).toEqual([
      ['1.82', '2100 (still rising)'],
      ['1.95 [1.52 to 2.61]', '2088 (40 % still rising)'],
    ]);
    expect(t.summary.notes!.join(' ')).toContain("the peak is the members' own, not the median line's");
    const [odds] = readGfmTables(markdownTable(t.odds!));
    expect(odds.header).toEqual(['Pathway', '1.5 K by 2050', '1.5 K by 2100', '2 K by 2050', '2 K by 2100']);
    // 2100 lies beyond the run's last 20-year window (centred on 2090): the share crossed by 2090 is given.
    expect(odds.rows).toEqual([['ensemble', '62 %', 'n/a (by 2090: 97 %)', '30 %', 'n/a (by 2090: 45 %)']]);
    expect(comparisonTables(fixtureComparison()).odds).toBeUndefined();
  });

  it('CO2 to net zero that is not reached reads as a total through the last year, not as a range', () => {
    const years = Float64Array.from({ length: 11 }, (_, i) => 2020 + i);
    const cc = comparePathways([{ label: 'e', years, warmingK: years.map(() => 1), co2Gtco2: years.map(() => 10) }], { milestoneYears: [], cumulativeFromYear: 2020 });
    // 10 Gt CO2 a year over the 11 years 2020-2030 (analytic).
    expect(rowsOf(comparisonTables(cc).summary)[0].slice(-2)).toEqual(['110 (through 2030)', 'not reached by 2030']);
  });
});


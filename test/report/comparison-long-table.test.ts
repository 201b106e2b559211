import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvText as formatCsv } from '../../src/report/write-csv.js';
import { comparisonLongTable } from '../../src/report/comparison-long-table.js';
import { fixtureComparison, oddsComparison, years } from './comparison-fixture.js';

describe('comparisonLongTable', () => {
  const c = fixtureComparison();
  const t = comparisonLongTable(c);

  it('comparisonLongTable has one row per pathway and year with the tidy columns pathway, year, warming_k, difference_k, ...', () => {
    expect(t.columns.map((x) => x.key)).toEqual(['pathway', 'year', 'warming_k', 'difference_k', 'warming_p05_k', 'warming_p17_k', 'warming_p83_k', 'warming_p95_k', 'co2_gtco2']);
    expect(t.columns.every((x) => x.values.length === 3 * years.length)).toBe(true);
  });

  it('comparisonLongTable written by csvText reads back with papaparse to the same numbers (reference library)', () => {
    const parsed = Papa.parse<Record<string, string>>(formatCsv(t), { header: true, skipEmptyLines: true }).data;
    expect(parsed.length).toBe(3 * years.length);
    c.pathways.forEach((p, k) => {
      for (let i = 0; i < years.length; i += 37) {
        const row = parsed[k * years.length + i];
        expect(row.pathway).toBe(p.label);
        expect(Number(row.year)).toBe(years[i]);
        expect(Number(row.warming_k)).toBe(p.warmingK[i]);
        expect(Number(row.difference_k)).toBe(p.warmingK[i] - c.pathways[0].warmingK[i]);
        expect(row.warming_p05_k === '').toBe(!p.range);
        expect(row.co2_gtco2 === '').toBe(!p.co2Gtco2);
      }
    });
  });

  it('comparisonLongTable adds crossed_by_<t> and prob_above_<t> per threshold when a pathway has odds, NaN for pathways without', () => {
    const co = oddsComparison();
    const t = comparisonLongTable(co);
    expect(t.columns.map((x) => x.key)).toEqual(['pathway', 'year', 'warming_k', 'difference_k', 'warming_p05_k', 'warming_p17_k', 'warming_p83_k', 'warming_p95_k', 'crossed_by_1.5', 'prob_above_1.5', 'crossed_by_2', 'prob_above_2']);
    const col = (name: string) => t.columns.find((x) => x.key === name)!.values as Float64Array;
    const n = co.pathways[0].years.length;
    expect(Array.from(col('prob_above_1.5').subarray(0, n)).every(Number.isNaN)).toBe(true);
    expect(Array.from(col('prob_above_2').subarray(n))).toEqual(Array.from(co.pathways[1].crossings[1].odds!.shareAbove));
  });
});

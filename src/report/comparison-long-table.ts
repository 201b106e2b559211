import { probAboveColumn } from '../ensemble/ensemble-table.js';
import type { Comparison } from '../metrics/compare-pathways.js';
import { valueAtYear } from '../metrics/value-at-year.js';

/**
 * A tidy long table: one text column `pathway`, then number columns in `data`, in the order they
 * follow it in `columns`. It has the shape of io's `Table` (only the number columns in `data`), so
 * the CSV and JSON writers there take it as it is.
 */
export interface LongTable {
  columns: string[];
  data: Float64Array[];
  textColumns: { pathway: string[] };
}

/**
 * A comparison as a tidy long table, one row per pathway and year, pathways in comparison order:
 * `pathway, year, warming_k, difference_k` (this pathway minus the reference, K), then, when any
 * pathway has an ensemble range, `warming_p05_k, warming_p17_k, warming_p83_k, warming_p95_k`, when
 * any has crossing odds, `prob_above_<t>` per threshold (the share of members whose 20-year mean
 * around the year exceeds t), and,
 * when any is emission-driven, `co2_gtco2` (Gt CO2 per year). NaN where a pathway lacks a value.
 *
 * @param c the comparison
 * @example
 * comparisonLongTable(c).columns // ['pathway', 'year', 'warming_k', 'difference_k']
 */
export function comparisonLongTable(c: Comparison): LongTable {
  const anyRange = c.pathways.some((p) => p.range);
  const anyOdds = c.pathways.some((p) => p.crossings.some((x) => x.odds));
  const anyCo2 = c.pathways.some((p) => p.co2Gtco2);
  const n = c.pathways.reduce((sum, p) => sum + p.years.length, 0);
  const names = ['year', 'warming_k', 'difference_k'];
  if (anyRange) names.push('warming_p05_k', 'warming_p17_k', 'warming_p83_k', 'warming_p95_k');
  if (anyOdds) names.push(...c.thresholdsK.map(probAboveColumn));
  if (anyCo2) names.push('co2_gtco2');
  const data = names.map(() => new Float64Array(n).fill(NaN));
  const pathway: string[] = [];
  let row = 0;
  for (const p of c.pathways) {
    for (let i = 0; i < p.years.length; i++, row++) {
      pathway.push(p.label);
      const cells = [p.years[i], p.warmingK[i], valueAtYear(p.differenceK.years, p.differenceK.values, p.years[i])];
      if (anyRange) {
        const r = p.range;
        cells.push(r ? r.p05[i] : NaN, r ? r.p17[i] : NaN, r ? r.p83[i] : NaN, r ? r.p95[i] : NaN);
      }
      if (anyOdds) for (const { odds } of p.crossings) cells.push(odds ? odds.shareAbove[i] : NaN);
      if (anyCo2) cells.push(p.co2Gtco2 ? p.co2Gtco2[i] : NaN);
      cells.forEach((v, j) => (data[j][row] = v));
    }
  }
  return { columns: ['pathway', ...names], data, textColumns: { pathway } };
}

import { valueAtYear } from '../metrics/value-at-year.js';
import type { Comparison } from '../metrics/compare-pathways.js';
import type { OutputColumn, OutputTable } from './output-table.js';

/**
 * A comparison as a tidy long table, one row per option and year, options in comparison order:
 * `pathway` (the option's label), `year`, `warming_k`, `difference_k` (this option minus the
 * reference, K), then, when any option has an ensemble, `warming_p05_k` .. `warming_p95_k`, the
 * percentiles across paired members of the difference (`difference_p05_k` .. `difference_p95_k`),
 * and per threshold `crossed_by_<t>` (share of members crossed by that year) and `prob_above_<t>`
 * (share above in that year); when any is emission-driven, `co2_gtco2` (Gt CO2 per year). NaN
 * where an option lacks a value.
 *
 * @param c the comparison
 * @example comparisonLongTable(c).columns.map((x) => x.key) // ['pathway', 'year', 'warming_k', 'difference_k']
 */
export function comparisonLongTable(c: Comparison): OutputTable {
  const anyRange = c.pathways.some((p) => p.range);
  const anyDiffRange = c.pathways.some((p) => p.differenceRange);
  const anyOdds = c.pathways.some((p) => p.crossings.some((x) => x.odds));
  const anyCo2 = c.pathways.some((p) => p.co2Gtco2);
  const n = c.pathways.reduce((sum, p) => sum + p.years.length, 0);
  const keys = ['year', 'warming_k', 'difference_k'];
  if (anyRange) keys.push('warming_p05_k', 'warming_p17_k', 'warming_p83_k', 'warming_p95_k');
  if (anyDiffRange) keys.push('difference_p05_k', 'difference_p17_k', 'difference_p50_k', 'difference_p83_k', 'difference_p95_k');
  if (anyOdds) for (const t of c.thresholdsK) keys.push(`crossed_by_${t}`, `prob_above_${t}`);
  if (anyCo2) keys.push('co2_gtco2');
  const data = keys.map(() => new Float64Array(n).fill(NaN));
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
      if (anyDiffRange) {
        const d = p.differenceRange;
        cells.push(d ? d.p05[i] : NaN, d ? d.p17[i] : NaN, d ? d.p50[i] : NaN, d ? d.p83[i] : NaN, d ? d.p95[i] : NaN);
      }
      if (anyOdds) for (const { odds } of p.crossings) cells.push(odds ? odds.crossedBy[i] : NaN, odds ? odds.shareAbove[i] : NaN);
      if (anyCo2) cells.push(p.co2Gtco2 ? p.co2Gtco2[i] : NaN);
      cells.forEach((v, j) => (data[j][row] = v));
    }
  }
  const columns: OutputColumn[] = [{ key: 'pathway', values: pathway }, ...keys.map((key, j) => ({ key, values: data[j] }))];
  return { name: 'data', columns };
}

import { PERCENTILE_NAMES, type EnsembleResult } from './summarize-ensemble.js';

/**
 * The CSV/JSON column of a threshold's exceedance probability: `prob_above_` and the threshold as
 * its shortest decimal (DESIGN.md: `prob_above_1.5`).
 * @example probAboveColumn(2) // 'prob_above_2'
 */
export function probAboveColumn(thresholdK: number): string {
  return `prob_above_${thresholdK}`;
}

/**
 * The CSV/JSON column of the share of members that have crossed a threshold by each year.
 * @example crossedByColumn(1.5) // 'crossed_by_1.5'
 */
export function crossedByColumn(thresholdK: number): string {
  return `crossed_by_${thresholdK}`;
}

/** An ensemble's per-year output: column names in output order and one series per column. */
export interface EnsembleTable {
  /** `year`, `warming_p05_k` .. `warming_p95_k`, then per threshold `crossed_by_<t>` and `prob_above_<t>` (DESIGN.md). */
  columns: string[];
  /** Values of each column, one per year; NaN where a value does not exist (write it empty). */
  values: Record<string, Float64Array>;
}

/**
 * The per-year table of an ensemble, in the column order of DESIGN.md: year, the warming
 * percentiles (K relative to the baseline) and the exceedance probability of each threshold on
 * 20-year means.
 *
 * @param result from runEnsemble or summarizeEnsemble
 * @example ensembleTable(result).columns // ['year', 'warming_p05_k', ..., 'prob_above_1.5', 'prob_above_2', 'prob_above_3']
 */
export function ensembleTable(result: EnsembleResult): EnsembleTable {
  const columns: string[] = [];
  const values: Record<string, Float64Array> = {};
  const add = (name: string, series: Float64Array) => {
    columns.push(name);
    values[name] = series;
  };
  add('year', result.years);
  for (const name of PERCENTILE_NAMES) add(`warming_${name}_k`, result.percentiles[name]);
  result.config.thresholds.forEach((t, j) => {
    add(crossedByColumn(t), result.crossedBy[j]);
    add(probAboveColumn(t), result.probAbove[j]);
  });
  return { columns, values };
}

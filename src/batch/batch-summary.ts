import type { OutputColumn, OutputTable } from '../report/output-table.js';
import { BATCH_PERCENTILE_NAMES } from './assess-scenario.js';
import type { BatchOutcome } from './run-batch.js';

/** The summary's column of the share of members whose peak exceeds a level: `prob_peak_above_1.5`. */
export function probPeakAboveColumn(thresholdK: number): string {
  return `prob_peak_above_${thresholdK}`;
}

/** The summary's column of a level's median crossing year: `median_crossing_year_1.5`. */
export function medianCrossingColumn(thresholdK: number): string {
  return `median_crossing_year_${thresholdK}`;
}

/**
 * The batch summary as a table, one row per assessed scenario in table order: model, scenario,
 * category (AR6 WG3 code) and its name, peak_warming_pXX_k, peak_year_p50, warming_2100_pXX_k,
 * prob_peak_above_<t> and median_crossing_year_<t> per threshold, net_zero_co2_year,
 * cumulative_co2_to_net_zero_gtco2 with cumulative_co2_from_year, filled_by, and category_agreement
 * (last, so that columns scripts read by position keep their places). Missing values
 * (no 2100, not crossed, no net zero) are NaN, written as empty cells.
 *
 * @param outcome rows of runBatch (or merged shards)
 * @param thresholds the batch's levels, K
 */
export function batchSummaryTable(outcome: BatchOutcome, thresholds: readonly number[]): OutputTable {
  const rows = outcome.rows;
  const columns: OutputColumn[] = [];
  const addText = (key: string, values: string[]) => columns.push({ key, values });
  // Human formats: years and cumulative CO2 as whole numbers, shares to two decimals, warming by its unit (K, two).
  const addNumber = (key: string, values: (number | null)[]) =>
    columns.push({
      key,
      values: Float64Array.from(values, (v) => (v === null ? NaN : v)),
      // category_agreement to three decimals: a multiple of 1/200 just below 0.9 must not read as 0.90.
      ...(key.includes('year') || key.startsWith('cumulative_') ? { digits: 0 } : key.startsWith('prob_') ? { digits: 2 } : key === 'category_agreement' ? { digits: 3 } : {}),
    });
  addText('model', rows.map((r) => r.model));
  addText('scenario', rows.map((r) => r.scenario));
  addText('category', rows.map((r) => r.category));
  addText('category_name', rows.map((r) => r.categoryName));
  for (const p of BATCH_PERCENTILE_NAMES) addNumber(`peak_warming_${p}_k`, rows.map((r) => r.peakWarmingK[p]));
  addNumber('peak_year_p50', rows.map((r) => r.peakYearP50));
  for (const p of BATCH_PERCENTILE_NAMES) addNumber(`warming_2100_${p}_k`, rows.map((r) => r.warming2100K?.[p] ?? null));
  thresholds.forEach((t, j) => addNumber(probPeakAboveColumn(t), rows.map((r) => r.probPeakAbove[j].probability)));
  thresholds.forEach((t, j) => addNumber(medianCrossingColumn(t), rows.map((r) => r.medianCrossingYear[j].year)));
  addNumber('net_zero_co2_year', rows.map((r) => r.netZeroCo2Year));
  addNumber('cumulative_co2_to_net_zero_gtco2', rows.map((r) => r.cumulativeCo2ToNetZeroGtco2));
  addNumber('cumulative_co2_from_year', rows.map((r) => r.cumulativeFromYear));
  addText('filled_by', rows.map((r) => r.filledBy));
  addNumber('category_agreement', rows.map((r) => r.categoryAgreement));
  return { name: 'summary', caption: 'one row per scenario assessed', columns };
}

/** The errors of a batch as a table: one row per problem, with model, scenario, file, sheet, row, column, variable, code and message. */
export function batchErrorTable(outcome: BatchOutcome): OutputTable {
  const cells: Record<string, string[]> = { model: [], scenario: [], file: [], sheet: [], row: [], column: [], variable: [], code: [], problem: [] };
  for (const e of outcome.errors) {
    for (const p of e.problems) {
      cells.model.push(e.model);
      cells.scenario.push(e.scenario);
      cells.file.push(p.file);
      cells.sheet.push(p.sheet ?? '');
      cells.row.push(p.line !== undefined ? String(p.line) : '');
      cells.column.push(p.column ?? '');
      cells.variable.push(p.variable ?? '');
      cells.code.push(p.code);
      cells.problem.push(p.message + (p.value !== undefined ? ` (got "${p.value}")` : '') + (p.expected !== undefined ? ` (expected ${p.expected})` : ''));
    }
  }
  return { name: 'errors', caption: 'scenarios that failed', columns: Object.entries(cells).map(([key, values]) => ({ key, values })) };
}

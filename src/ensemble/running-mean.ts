import { WARMING_LEVEL_WINDOW } from '../metrics/warming-levels.js';

/**
 * Years before and after the labelled year in a 20-year mean: year y stands for the mean of
 * y-9 .. y+10 (so 2030 stands for 2021-2040, the period AR6 calls near term); the window is
 * metrics' WARMING_LEVEL_WINDOW, the one definition every command uses.
 */
export const RUNNING_MEAN_WINDOW = { before: WARMING_LEVEL_WINDOW.before, after: WARMING_LEVEL_WINDOW.after } as const;

/**
 * The 20-year running mean of an annual series, the average IPCC AR6 WG1 uses to say when a warming
 * level is reached (SPM B.1.3 and Cross-Chapter Box 2.3). Years whose window leaves the series get
 * NaN. Computed as a sliding sum (deterministic; rounding error below 1e-13 of the values).
 * (Private to ensembles; src/metrics has its own for single runs.)
 *
 * @param values annual series
 * @param out receives the means (same length; may not alias `values`)
 * @example runningMeanInto(Float64Array.from({ length: 30 }, (_, i) => i), out) // out[9] = 9.5, out[0] = NaN
 */
export function runningMeanInto(values: Float64Array, out: Float64Array): void {
  const { before, after } = RUNNING_MEAN_WINDOW;
  const width = before + after + 1;
  const n = values.length;
  out.fill(NaN);
  if (n < width) return;
  let sum = 0;
  for (let k = 0; k < width; k++) sum += values[k];
  for (let c = before; c + after < n; c++) {
    out[c] = sum / width;
    if (c + after + 1 < n) sum += values[c + after + 1] - values[c - before];
  }
}

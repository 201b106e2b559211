import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { bundledPathwaysDir } from './bundled-pathways.js';

/** An observed annual series with its citation. */
export interface ObservedRecord {
  /** Consecutive years, ascending. */
  years: Float64Array;
  /** Annual global mean surface temperature anomaly, K (relative to 1961-1990 as published). */
  anomalyK: Float64Array;
  /** Citation line shown beside the series. */
  citation: string;
}

/** Citation of the bundled observed record (pathways/records/README.md). */
export const HADCRUT5_CITATION = 'HadCRUT5 (Morice et al. 2021), Met Office Hadley Centre / CRU, Open Government Licence v3.0';

/**
 * The bundled HadCRUT5 global annual record (pathways/records/hadcrut5-global-annual.csv: year,
 * anomaly relative to 1961-1990, 2.5 and 97.5 % limits), for charts to draw beside the projected
 * warming; undefined when the file is not bundled. Rebase it to the run's baseline before use
 * (metrics' rebase).
 *
 * @throws Error when the bundled file is malformed (a packaging fault, not user input)
 */
export function loadObservedRecord(): ObservedRecord | undefined {
  const path = join(bundledPathwaysDir(), 'records', 'hadcrut5-global-annual.csv');
  if (!existsSync(path)) return undefined;
  const lines = readFileSync(path, 'utf8').split(/\r?\n/).filter((l) => l.trim() !== '');
  const years: number[] = [];
  const values: number[] = [];
  for (const line of lines.slice(1)) {
    const [y, v] = line.split(',').map(Number);
    if (!Number.isInteger(y) || !Number.isFinite(v) || (years.length > 0 && y !== years[years.length - 1] + 1)) {
      throw new Error(`${path}: malformed row "${line}" (expected consecutive years and a number)`);
    }
    years.push(y);
    values.push(v);
  }
  return { years: Float64Array.from(years), anomalyK: Float64Array.from(values), citation: HADCRUT5_CITATION };
}

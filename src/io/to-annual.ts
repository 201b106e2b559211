import { InputError } from '../errors.js';
import { PATHWAY_COLUMNS, type Pathway, type PathwayColumn } from '../pathway.js';
import type { ParsedPathway } from './parse-pathway.js';
import { describeTimeSteps, isAnnualGrid } from './time-steps.js';

/**
 * How far (in years) a first or last row may sit inside a whole year and still give that year its
 * value: one day. A date a day off mid-year (30 June, 3 July; 1 and 2 July are exactly the whole
 * year, see isoDateToYear) lands up to a day from the whole year; without this slack such a file
 * would lose its first year.
 */
const END_TOLERANCE_YEARS = 1 / 365;

/**
 * Puts a parsed pathway on the annual grid: the whole years from ceil(first time) to floor(last time)
 * (each end widened by one day, see above), every column interpolated linearly between the two
 * neighbouring rows. A year on a row takes the row's value exactly; an end year at most a day
 * outside the rows takes the end row's value. A file already on consecutive whole years is copied
 * unchanged; otherwise a provenance note says what was interpolated.
 *
 * @param parsed - a validated pathway from parsePathway (times strictly ascending)
 * @returns the annual Pathway; `provenance.source` is the parsed file
 * @throws InputError when the rows span no whole year (e.g. one row at 2030.5)
 * @example
 * const p = toAnnual(parsePathway('year,co2_ppm\n2025,420\n2030,430\n', 'demo.csv'));
 * p.years // Float64Array [2025, 2026, 2027, 2028, 2029, 2030]
 * p.series.co2_ppm // Float64Array [420, 422, 424, 426, 428, 430]
 * p.provenance.notes // ['interpolated linearly from 2 rows (5-year steps) to 6 annual values']
 */
export function toAnnual(parsed: ParsedPathway): Pathway {
  const t = parsed.times;
  const n = t.length;
  const firstYear = Math.ceil(t[0] - END_TOLERANCE_YEARS);
  const lastYear = Math.floor(t[n - 1] + END_TOLERANCE_YEARS);
  if (!(lastYear >= firstYear)) {
    throw new InputError([{
      file: parsed.file,
      line: parsed.rowLines[0],
      column: parsed.timeColumn,
      code: 'input.no-whole-year',
      message: `must span at least one whole year: the rows run from ${t[0]} to ${t[n - 1]}`,
      expected: 'rows on a whole year or on both sides of one',
    }]);
  }

  const count = lastYear - firstYear + 1;
  const years = new Float64Array(count);
  for (let i = 0; i < count; i++) years[i] = firstYear + i;

  const series: Partial<Record<PathwayColumn, Float64Array>> = {};
  for (const column of PATHWAY_COLUMNS) {
    const v = parsed.columns[column];
    if (v) series[column] = interpolate(t, v, years);
  }

  const notes: string[] = [];
  if (!isAnnualGrid(t)) {
    notes.push(`interpolated linearly from ${n} rows (${describeTimeSteps(t)}) to ${count} annual values`);
  }
  return {
    name: parsed.name,
    years,
    series,
    metadata: { ...parsed.metadata },
    provenance: { source: parsed.file, notes },
  };
}

/** Piecewise-linear values of (t, v) at ascending `at`, held at the end values outside [t0, tN]. */
function interpolate(t: Float64Array, v: Float64Array, at: Float64Array): Float64Array {
  const out = new Float64Array(at.length);
  const last = t.length - 1;
  let k = 0;
  for (let i = 0; i < at.length; i++) {
    const x = at[i];
    while (k < last && t[k + 1] <= x) k++;
    if (x <= t[0]) out[i] = v[0];
    else if (k === last || t[k] === x) out[i] = v[k];
    else out[i] = v[k] + ((v[k + 1] - v[k]) * (x - t[k])) / (t[k + 1] - t[k]);
  }
  return out;
}

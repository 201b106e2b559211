import { InputError } from '../errors.js';
import { PATHWAY_COLUMNS, type Pathway, type PathwayColumn } from '../pathway.js';
import { dayOfYearName } from './iso-date-year.js';
import type { ParsedPathway } from './parse-pathway.js';
import { describeTimeSteps, formatStepLength, isAnnualGrid } from './time-steps.js';

/**
 * How far (in years) a first or last row may sit inside a whole year and still give that year its
 * value: one day. A date a day off mid-year (30 June, 3 July; 1 and 2 July are exactly the whole
 * year, see isoDateToYear) lands up to a day from the whole year; without this slack such a file
 * would lose its first year.
 */
const END_TOLERANCE_YEARS = 1 / 365;

/**
 * Puts a parsed pathway on the annual grid. A `date` file whose dates all fall on one day of the year
 * names calendar years (parsePathway labels them so; a note here says so). Then: the whole years
 * from ceil(first time) to floor(last time)
 * (each end widened by one day, see above), every column interpolated linearly between the two
 * neighbouring rows. A year on a row takes the row's value exactly; an end year at most a day
 * outside the rows takes the end row's value. A file already on consecutive whole years is copied
 * unchanged; otherwise a provenance note says what was interpolated, and another when rows lie less
 * than 0.9 years apart (monthly or seasonal values are still read as annual means centred on their
 * dates, not averaged over each year: the numbers do not change, the note says so).
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
  const sameDay = sameDayNote(parsed);
  if (sameDay) notes.push(sameDay);
  if (n === 1) {
    if (!isAnnualGrid(t)) notes.push(`the single row lies within a day of the middle of ${firstYear} and gives that year's values`);
  } else if (!isAnnualGrid(t)) {
    notes.push(`interpolated linearly from ${n} rows (${describeTimeSteps(t)}) to ${count} annual value${count === 1 ? '' : 's'}`);
    const short = subAnnualNote(parsed);
    if (short) notes.push(short);
  }
  return {
    name: parsed.name,
    years,
    series,
    metadata: { ...parsed.metadata },
    provenance: { source: parsed.file, notes },
  };
}

/**
 * The note for a `date` file whose dates all fall on one day of the year (parsePathway then labels
 * the rows with their calendar years), unless the day is 1 or 2 July, whose dates name their whole
 * years anyway (isoDateToYear); or for one whose dates mostly do, where one date on another day is
 * probably a typo that moves every row half a year.
 */
function sameDayNote(parsed: ParsedPathway): string | undefined {
  const mostly = parsed.datesMostlyOnDay;
  if (mostly && mostly.monthDay !== '07-01' && mostly.monthDay !== '07-02') {
    return `${mostly.count} of the ${parsed.times.length} dates fall on ${dayOfYearName(mostly.monthDay)} but the date on line ${mostly.otherLine} does not, `
      + 'so every date is read as the centre of an annual mean (a date on 1 January stands half a year before its year\'s middle); '
      + `if the dates name calendar years, put all of them on ${dayOfYearName(mostly.monthDay)}`;
  }
  const day = parsed.datesOnDay;
  if (day === undefined || day === '07-01' || day === '07-02') return undefined;
  return `every date falls on ${dayOfYearName(day)}: each row is read as its calendar year (${parsed.times[0]}-${day} is the year ${parsed.times[0]}), `
    + 'its emissions that year\'s total and its other values that year\'s means';
}

/**
 * Rows closer together than this many years are taken to be sub-annual values (monthly, seasonal)
 * rather than annual means (common practice, no source: 0.9 leaves room for annual means whose dates
 * wander by a few weeks from year to year).
 */
const SUB_ANNUAL_STEP_YEARS = 0.9;

/** A note when rows are less than SUB_ANNUAL_STEP_YEARS apart: they are read as annual means all the same. */
function subAnnualNote(parsed: ParsedPathway): string | undefined {
  const t = parsed.times;
  let count = 0;
  let shortest = 0;
  for (let i = 1; i < t.length; i++) {
    const d = t[i] - t[i - 1];
    if (d < SUB_ANNUAL_STEP_YEARS) {
      if (count === 0 || d < t[shortest] - t[shortest - 1]) shortest = i;
      count++;
    }
  }
  if (count === 0) return undefined;
  const steps = t.length - 1;
  const which = count === steps
    ? `rows are less than a year apart (${describeTimeSteps(t)})`
    : `${count} of the ${steps} steps between rows ${count === 1 ? 'is' : 'are'} under ${SUB_ANNUAL_STEP_YEARS} years (the shortest, `
      + `${formatStepLength(t[shortest] - t[shortest - 1])}, between lines ${parsed.rowLines[shortest - 1]} and ${parsed.rowLines[shortest]})`;
  return `${which}: each row is read as an annual mean centred on its ${parsed.timeColumn === 'date' ? 'date' : 'year value'} and each `
    + 'year takes the value interpolated between the rows either side of its middle, not the average of the rows within it; '
    + 'if these are monthly or seasonal values, give one annual mean per year instead';
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

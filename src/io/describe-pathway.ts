import { forcingColumnsNotGiven } from '../forcing/lumped-forcing.js';
import { COLUMN_UNITS, GASES, PATHWAY_COLUMNS, type Gas, type Pathway } from '../pathway.js';
import { dayOfYearName } from './iso-date-year.js';
import type { ParsedPathway } from './parse-pathway.js';
import { describeTimeSteps, formatDecimalYear, isAnnualGrid } from './time-steps.js';

/**
 * What `warmcast check` prints about one pathway: the file, its name, the rows read and their years,
 * the time column, each column with its unit and range, the spacing of the rows and whether they were
 * interpolated, the splice onto the history, any other provenance notes, the gases the file does
 * not give (which the run holds at pre-industrial values) and the forcing columns it does not give
 * (which the run takes as zero).
 *
 * @param parsed - the rows as read (parsePathway)
 * @param pathway - the pathway a run uses (toAnnual, possibly spliceOntoHistory)
 * @returns one line of text per item, no trailing newlines
 * @example
 * describePathway(parsed, pathway)
 * // ['file: pathways/swift.csv', 'name: Swift transition', 'rows read: 26 (lines 4-29)',
 * //  'time column: year', 'years in file: 2025 to 2150', ...]
 */
export function describePathway(parsed: ParsedPathway, pathway: Pathway): string[] {
  const t = parsed.times;
  const n = t.length;
  const lines = [`file: ${parsed.file}`, `name: ${parsed.name}`];
  if (parsed.metadata.description) lines.push(`description: ${parsed.metadata.description}`);
  lines.push(n === 1
    ? `rows read: 1 (line ${parsed.rowLines[0]})`
    : `rows read: ${n} (lines ${parsed.rowLines[0]}-${parsed.rowLines[n - 1]})`);
  lines.push(parsed.timeColumn === 'year'
    ? 'time column: year'
    : parsed.datesOnDay !== undefined
      ? `time column: date (ISO 8601; every date on ${dayOfYearName(parsed.datesOnDay)}, so each names its calendar year)`
      : 'time column: date (ISO 8601; 1 or 2 July labels its whole year)');
  lines.push(n === 1
    ? `year in file: ${formatDecimalYear(t[0])}`
    : `years in file: ${formatDecimalYear(t[0])} to ${formatDecimalYear(t[n - 1])}`);
  // A single row has no steps; a note says if it lies off the whole year it stands for.
  if (n > 1) {
    lines.push(isAnnualGrid(t)
      ? 'steps: 1-year steps on whole years (no interpolation)'
      : `steps: ${describeTimeSteps(t)}, interpolated to annual`);
  }

  lines.push('columns:');
  for (const column of PATHWAY_COLUMNS) {
    const v = parsed.columns[column];
    if (!v) continue;
    let lo = Infinity;
    let hi = -Infinity;
    for (const x of v) {
      if (x < lo) lo = x;
      if (x > hi) hi = x;
    }
    lines.push(`  ${column} (${COLUMN_UNITS[column]}): ${lo === hi ? lo : `${lo} to ${hi}`}`);
  }

  const years = pathway.years;
  const span = `${years[0]} to ${years[years.length - 1]} (${years.length} years)`;
  const splice = pathway.provenance.notes.find((note) => note.startsWith('spliced'));
  lines.push(pathway.provenance.spliceYear !== undefined && splice ? `splice: ${splice}` : 'splice: none');
  lines.push(`run covers: ${span}`);
  for (const note of pathway.provenance.notes) {
    if (note !== splice && !note.startsWith('interpolated')) lines.push(`note: ${note}`);
  }

  const missing = (Object.keys(GASES) as Gas[]).filter((gas) => {
    const { concentration, emission } = GASES[gas];
    return pathway.series[concentration] === undefined && pathway.series[emission] === undefined;
  });
  if (missing.length > 0) {
    lines.push(`gases not given (held at pre-industrial): ${missing.map((g) => g.toUpperCase()).join(', ')}`);
  }
  const zeroForcing = forcingColumnsNotGiven(pathway.series);
  if (zeroForcing.length > 0) lines.push(`forcing not given (taken as zero): ${zeroForcing.join(', ')}`);
  return lines;
}

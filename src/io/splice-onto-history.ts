import { InputError } from '../errors.js';
import { splitLumpedForcing } from '../forcing/lumped-forcing.js';
import { NATURAL_BACKGROUND_WM2, NATURAL_BACKGROUND_YEARS } from '../forcing/natural-background.js';
import {
  COLUMN_UNITS,
  CONCENTRATION_COLUMNS,
  EMISSION_COLUMNS,
  FORCING_COLUMNS,
  GASES,
  PATHWAY_COLUMNS,
  type Pathway,
  type PathwayColumn,
} from '../pathway.js';

/**
 * Joins a pathway that starts after the history's first year onto that history, so that a run
 * starts from the historical baseline. With F the pathway's first year and H its history's last:
 *
 * - years before F come from the history, years from F on from the pathway; the result runs from the
 *   history's first year to the pathway's last year. A pathway that starts inside the history's span
 *   (say 1900) wins from its first year on.
 * - a column the pathway lacks continues from the history while the history covers it, and is then
 *   held at its year-H value; solar and volcanic forcing go instead linearly over 10 years to their
 *   pre-industrial background, the 1850-1900 means of the IPCC AR6 series (NATURAL_BACKGROUND_WM2),
 *   so that neither the phase of the solar cycle nor a quiet or eruptive end of the record is
 *   carried forward, and the join makes no step. Notes say which.
 * - a gas the pathway gives in the other form than the history does (the pathway gives `co2_gtco2`,
 *   the history `co2_ppm`): both series are kept. The history's form holds the history's values
 *   before F and NaN from F on; the pathway's form is NaN before F. The carbon cycle joins the two,
 *   and the note says so in the terms of a run (concentrations followed and emissions diagnosed
 *   before F, concentrations computed from the emissions after).
 * - a column in the pathway but not in the history (nor its other form) is NaN before F.
 * - a column in neither stays absent (physics holds it at pre-industrial and says so).
 * - when F is more than one year after H, the years in between are bridged linearly from the
 *   history's year-H value to the pathway's year-F value, column by column; an emission column
 *   whose gas the history gives as a concentration is held at its year-F value over the gap instead
 *   (the carbon cycle joins it to the history), and a note says so.
 * - when F is at most one year after H, a concentration or forcing column that both give and that
 *   steps at the join (the file's year-F value against the history's value for F, or for H when the
 *   file starts the year after it) by more than 2 % (concentrations) or 0.1 W m-2 (forcing) is noted
 *   with both values; the values are used as given.
 *
 * A lumped `aerosol_wm2` or `other_wm2` in the pathway is first split over its agents
 * (splitLumpedForcing), so that it replaces the history's agent columns rather than adding to them.
 * A pathway starting at or before the history's first year is returned as it is.
 *
 * @param future - the annual pathway read from a file
 * @param history - the annual history (normally the bundled history.csv)
 * @returns a new Pathway with `provenance.spliceYear` = F and notes on what came from where
 * @throws InputError when the years between H and F must be bridged for a column the history lacks
 * @example
 * const s = spliceOntoHistory(future2025to2150, history1750to2024);
 * s.years[0] // 1750
 * s.provenance.spliceYear // 2025
 * s.provenance.notes // [..., 'spliced onto bundled history at 2025 (1750-2024 from history.csv)']
 */
export function spliceOntoHistory(unsplitFuture: Pathway, unsplitHistory: Pathway): Pathway {
  // The file's lumped aerosol_wm2 / other_wm2 replace the history's agent columns, not add to them.
  const future = splitLumpedForcing(unsplitFuture);
  const history = splitLumpedForcing(unsplitHistory);
  const fy = future.years;
  const hy = history.years;
  const f0 = fy[0];
  const fLast = fy[fy.length - 1];
  const h0 = hy[0];
  const hLast = hy[hy.length - 1];
  if (f0 <= h0) return future;

  const count = fLast - h0 + 1;
  const years = new Float64Array(count);
  for (let i = 0; i < count; i++) years[i] = h0 + i;
  const bridged = f0 > hLast + 1;

  const series: Partial<Record<PathwayColumn, Float64Array>> = {};
  const held: PathwayColumn[] = [];
  const heldAtMean: PathwayColumn[] = [];
  const bridgedColumns: PathwayColumn[] = [];
  const unbridgeable: PathwayColumn[] = [];
  const backfilled: PathwayColumn[] = [];
  const notInHistory: PathwayColumn[] = [];
  const switched: [given: PathwayColumn, replaced: PathwayColumn][] = [];

  for (const column of PATHWAY_COLUMNS) {
    const fs = future.series[column];
    const hs = history.series[column];
    if (!fs && !hs) continue;
    const other = otherForm(column);
    const out = new Float64Array(count);
    if (fs) {
      const otherInHistory = Boolean(other && history.series[other]);
      if (!hs && !otherInHistory) notInHistory.push(column);
      if (bridged) (hs ? bridgedColumns : otherInHistory ? backfilled : unbridgeable).push(column);
      for (let i = 0; i < count; i++) {
        const y = years[i];
        if (y >= f0) out[i] = fs[y - f0];
        else if (!hs) out[i] = bridged && otherInHistory && y > hLast ? fs[0] : NaN;
        else if (y <= hLast) out[i] = hs[y - h0];
        else out[i] = hs[hLast - h0] + ((fs[0] - hs[hLast - h0]) * (y - hLast)) / (f0 - hLast);
      }
    } else if (hs && other && future.series[other]) {
      switched.push([other, column]);
      for (let i = 0; i < count; i++) {
        const y = years[i];
        out[i] = y < f0 && y <= hLast ? hs[y - h0] : NaN;
      }
    } else if (hs) {
      const natural = naturalBackground(column);
      (natural === undefined ? held : heldAtMean).push(column);
      const last = hs[hLast - h0];
      const level = natural ?? last;
      for (let i = 0; i < count; i++) {
        const y = years[i];
        const ramp = Math.min(1, (y - hLast) / NATURAL_BACKGROUND_RAMP_YEARS);
        out[i] = y <= hLast ? hs[y - h0] : last + (level - last) * ramp;
      }
    }
    series[column] = out;
  }

  if (unbridgeable.length > 0) {
    throw new InputError([{
      file: future.provenance.source,
      column: unbridgeable.join(', '),
      code: 'input.splice-gap',
      message: `must start by ${hLast + 1} to follow the history, which ends in ${hLast}: the history has no `
        + `${unbridgeable.join(', ')} to bridge ${hLast + 1}-${f0 - 1} from`,
      value: String(f0),
      expected: `rows from ${hLast + 1} on`,
    }]);
  }

  const fromHistory = history.provenance.source.startsWith('bundled:');
  const notes = [
    ...future.provenance.notes,
    `spliced onto ${fromHistory ? 'bundled ' : ''}history at ${f0} (${yearSpan(h0, Math.min(f0 - 1, hLast))} from ${historyFile(history)})`,
  ];
  if (bridgedColumns.length > 0) {
    notes.push(`${yearSpan(hLast + 1, f0 - 1)} bridged linearly from the history's ${hLast} value to the file's ${f0} value `
      + `(${bridgedColumns.join(', ')})`);
  }
  if (!bridged) notes.push(...joinSteps(future, history));
  if (fLast <= hLast) {
    const all = PATHWAY_COLUMNS.filter((c) => held.includes(c) || heldAtMean.includes(c));
    if (all.length > 0) notes.push(`${all.join(', ')} not in file: taken from history`);
  } else {
    if (held.length > 0) notes.push(`${held.join(', ')} not in file: taken from history to ${hLast}, then held at the ${hLast} value`);
    if (heldAtMean.length > 0) {
      const [from, to] = NATURAL_BACKGROUND_YEARS;
      const levels = heldAtMean.map((c) => `${c} ${naturalBackground(c)!.toFixed(3)}`).join(', ');
      const volcanic = heldAtMean.includes('volcanic_wm2')
        ? '; volcanic forcing is relative to the long pre-industrial mean, so this stands for eruptions at the rate of those years, not a quiet stratosphere'
        : '';
      notes.push(`${heldAtMean.join(', ')} not in file: taken from history to ${hLast}, then ramped linearly over ${NATURAL_BACKGROUND_RAMP_YEARS} years `
        + `(to ${hLast + NATURAL_BACKGROUND_RAMP_YEARS}) to the pre-industrial background, the ${from}-${to} mean of the IPCC AR6 series (${levels} W m-2${volcanic})`);
    }
  }
  if (backfilled.length > 0) {
    notes.push(`${backfilled.join(', ')} held at the file's ${f0} value over ${yearSpan(hLast + 1, f0 - 1)}: the history gives `
      + `that gas as a concentration, which cannot be bridged linearly to an emission rate`);
  }
  for (const [given, replaced] of switched) {
    const from = backfilled.includes(given) ? hLast + 1 : f0;
    // Said as a run uses the two series (runEmissionDriven), not as the gaps between them look here.
    notes.push((EMISSION_COLUMNS as readonly PathwayColumn[]).includes(given)
      ? `${given} given instead of the history's ${replaced}: a run follows the history's ${replaced} to ${from - 1}, `
        + `diagnosing ${given} from it, and from ${from} computes ${replaced} from the given ${given}`
      : `${given} given instead of the history's ${replaced}: the history's ${replaced} is used to ${from - 1} `
        + `and the file's ${given} from ${from}`);
  }
  if (notInHistory.length > 0) notes.push(`${notInHistory.join(', ')} not in history: NaN before ${f0}`);

  return {
    name: future.name,
    years,
    series,
    metadata: future.metadata,
    provenance: { source: future.provenance.source, spliceYear: f0, historyLastYear: Math.min(hLast, f0 - 1), notes, assumptions: future.provenance.assumptions },
    responsiveFrom: future.responsiveFrom,
  };
}

/**
 * Largest step at the join, relative to the history's value, that a concentration column takes
 * without a note: 2 % (common practice, no source; CO2 has grown by under 1 % a year in the record,
 * so a larger step says the file and the history disagree rather than that the gas changed).
 */
const JOIN_STEP_RELATIVE = 0.02;

/** Largest step at the join that a prescribed forcing column takes without a note, W m-2 (common practice, no source). */
const JOIN_STEP_FORCING_WM2 = 0.1;

/**
 * Notes on concentration and forcing columns that both the file and the history give and that step
 * at the join by more than JOIN_STEP_RELATIVE (concentrations) or JOIN_STEP_FORCING_WM2 (forcing):
 * the file's first value against the history's in the same year, or, when the file starts the year
 * after the history ends, in the history's last year. Emission columns are left to the carbon cycle,
 * which notes the rates either side of its own join.
 */
function joinSteps(future: Pathway, history: Pathway): string[] {
  const f0 = future.years[0];
  const h0 = history.years[0];
  const at = Math.min(f0, history.years[history.years.length - 1]);
  const notes: string[] = [];
  for (const column of [...CONCENTRATION_COLUMNS, ...FORCING_COLUMNS]) {
    const fs = future.series[column];
    const hs = history.series[column];
    if (!fs || !hs) continue;
    const given = fs[0];
    const before = hs[at - h0];
    const isConcentration = (CONCENTRATION_COLUMNS as readonly PathwayColumn[]).includes(column);
    const step = isConcentration ? (given - before) / before : given - before;
    if (!(Math.abs(step) > (isConcentration ? JOIN_STEP_RELATIVE : JOIN_STEP_FORCING_WM2))) continue;
    const unit = COLUMN_UNITS[column];
    const digits = isConcentration ? 2 : 3;
    const values = `the history gives ${before.toFixed(digits)} ${unit} for ${at}, the file ${given.toFixed(digits)} ${unit}`
      + (at === f0 ? '' : ` for ${f0}`);
    const size = isConcentration
      ? `${Math.abs(100 * step).toFixed(1)} % ${step > 0 ? 'higher' : 'lower'}; a step of more than ${100 * JOIN_STEP_RELATIVE} % is noted`
      : `${Math.abs(step).toFixed(3)} ${unit} ${step > 0 ? 'higher' : 'lower'}; a step of more than ${JOIN_STEP_FORCING_WM2} ${unit} is noted`;
    notes.push(`${column} steps at the join: ${values} (${size})${CONVENTION_HINT[column] ?? ''}`);
  }
  return notes;
}

/**
 * What a step in a natural forcing column most often means: a file written in another convention.
 * IPCC AR6 (and the history) measure both from long pre-industrial means, so a quiet stratosphere
 * reads about +0.2 W m-2, not 0 (pathways/records/README.md).
 */
const CONVENTION_HINT: Partial<Record<PathwayColumn, string>> = {
  volcanic_wm2: '; the history follows IPCC AR6, where volcanic forcing is relative to the long pre-industrial mean: '
    + `about +0.2 W m-2 in years without eruptions, ${NATURAL_BACKGROUND_WM2.volcanic_wm2.toFixed(3)} for eruptions at the 1850-1900 rate, not 0`,
  solar_wm2: '; the history follows IPCC AR6, where solar forcing is relative to the Sun\'s long-term mean',
};

/** `2025-2029`, or `2025` for a single year. */
function yearSpan(first: number, last: number): string {
  return first === last ? String(first) : `${first}-${last}`;
}

/** The other column of the same gas (`co2_ppm` <-> `co2_gtco2`), or undefined for forcing columns. */
function otherForm(column: PathwayColumn): PathwayColumn | undefined {
  for (const { concentration, emission } of Object.values(GASES)) {
    if (column === concentration) return emission;
    if (column === emission) return concentration;
  }
  return undefined;
}

/**
 * Years over which solar and volcanic forcing go linearly from the history's last value to their
 * background, so the join makes no step (a recent eruption or a solar maximum fades out). Common
 * practice: CMIP7 ramps future stratospheric aerosol to its background over 9 years (Aubry et al.
 * 2026, GMD 19, 3725; seen in the abstract); 10 here, about one solar cycle.
 */
const NATURAL_BACKGROUND_RAMP_YEARS = 10;

/** The background a natural forcing column goes to beyond the history, or undefined for other columns. */
function naturalBackground(column: PathwayColumn): number | undefined {
  return column === 'solar_wm2' || column === 'volcanic_wm2' ? NATURAL_BACKGROUND_WM2[column] : undefined;
}

/** `bundled:history` -> `history.csv`; a path -> its last segment. */
function historyFile(history: Pathway): string {
  const source = history.provenance.source;
  if (source.startsWith('bundled:')) return `${source.slice('bundled:'.length)}.csv`;
  return source.split(/[\\/]/).pop() ?? source;
}

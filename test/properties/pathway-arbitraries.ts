/**
 * fast-check generators of valid pathway files, shared by the property tests in this folder.
 *
 * A generated pathway is a list of rows (strictly increasing times, 1- to 10-year steps, whole or
 * decimal start) with values for a random set of concentration and prescribed-forcing columns. The
 * values are mostly typical of records and scenarios, and otherwise anywhere within VALUE_BOUNDS, the
 * plausibility bounds the reader itself enforces: every value the reader accepts is fair game.
 */
import fc from 'fast-check';
import { parsePathway, toAnnual, VALUE_BOUNDS } from '../../src/io/index.js';
import type { Pathway, PathwayColumn } from '../../src/pathway.js';

/** Columns a concentration-driven pathway may hold (emission columns are not generated here). */
// The lumped aerosol and other columns stand for the agent columns they split into (a file may not give both).
export const CONCENTRATION_RUN_COLUMNS = ['co2_ppm', 'ch4_ppb', 'n2o_ppb', 'aerosol_wm2', 'other_wm2', 'solar_wm2', 'volcanic_wm2'] as const satisfies readonly PathwayColumn[];
export type ConcentrationRunColumn = (typeof CONCENTRATION_RUN_COLUMNS)[number];

/** Rows of a pathway file: times and, per column, one value per row. */
export interface PathwayRows {
  times: number[];
  columns: Partial<Record<PathwayColumn, number[]>>;
}

/** A value within the reader's bounds for a column (inclusive), never NaN. */
export function valueIn(column: PathwayColumn, min = VALUE_BOUNDS[column].min, max = VALUE_BOUNDS[column].max): fc.Arbitrary<number> {
  return fc.double({ min, max, noNaN: true });
}

/**
 * Ranges met in historical records and assessed scenarios, 1750-2300: CO2 from the 1750 value to
 * about four times it, CH4 and N2O from their 1750 values to the highest scenario values, aerosol ERF
 * of a few tenths to about -2 W m-2, and so on (IPCC AR6 WG1 scenario ranges, from memory; the
 * ranges only steer sampling, no check depends on them).
 */
const TYPICAL: Readonly<Record<ConcentrationRunColumn, readonly [number, number]>> = {
  co2_ppm: [250, 1200],
  ch4_ppb: [600, 4000],
  n2o_ppb: [260, 450],
  aerosol_wm2: [-2, 0.2],
  other_wm2: [-0.5, 1.5],
  solar_wm2: [-0.3, 0.3],
  volcanic_wm2: [-5, 0],
};

/**
 * A value for a column: three times in four from the typical range above, otherwise anywhere within
 * the reader's bounds (where fast-check favours the ends and tiny magnitudes).
 */
export function plausibleValue(column: PathwayColumn): fc.Arbitrary<number> {
  const typical = TYPICAL[column as ConcentrationRunColumn];
  if (typical === undefined) return valueIn(column);
  return fc.oneof({ arbitrary: valueIn(column, typical[0], typical[1]), weight: 3 }, { arbitrary: valueIn(column), weight: 1 });
}

/** Options of {@link pathwayTimes}. */
export interface TimesOptions {
  /** Earliest first time (default 1000, the reader's lower bound). */
  firstMin?: number;
  /** Latest first time (default: as late as the span allows within 3000). */
  firstMax?: number;
  /** Whether the first time may be a decimal year (default true). */
  decimalStart?: boolean;
  /** Smallest span from first to last row, years (default 12: room for an 11-year baseline). */
  minSpan?: number;
  /** Most rows (default 40). */
  maxRows?: number;
}

/**
 * Strictly increasing row times: a first time, then steps of 1 to 10 whole years; the whole run lies
 * within the reader's 1000-3000 bounds.
 */
export function pathwayTimes(options: TimesOptions = {}): fc.Arbitrary<number[]> {
  const { firstMin = 1000, decimalStart = true, minSpan = 12, maxRows = 40 } = options;
  const steps = fc.array(fc.integer({ min: 1, max: 10 }), { minLength: 1, maxLength: maxRows - 1, size: 'max' }).map((s) => {
    // Lengthen a short run with 10-year steps until it spans minSpan years.
    const out = [...s];
    let span = out.reduce((a, b) => a + b, 0);
    while (span < minSpan) {
      out.push(10);
      span += 10;
    }
    return out;
  });
  return steps.chain((s) => {
    const span = s.reduce((a, b) => a + b, 0);
    const firstMax = Math.min(options.firstMax ?? 3000, 2999 - span);
    const fraction = decimalStart ? fc.oneof(fc.constant(0), fc.double({ min: 0.01, max: 0.99, noNaN: true })) : fc.constant(0);
    return fc.tuple(fc.integer({ min: firstMin, max: firstMax }), fraction).map(([whole, frac]) => {
      const times = [whole + frac];
      for (const step of s) times.push(times[times.length - 1] + step);
      return times;
    });
  });
}

/**
 * Values for the given columns, one per row, each from its own arbitrary (default: the reader's
 * bounds for that column).
 */
export function pathwayValues(
  times: number[],
  columns: readonly PathwayColumn[],
  arbitraryFor: (column: PathwayColumn) => fc.Arbitrary<number> = plausibleValue,
): fc.Arbitrary<PathwayRows> {
  const record: Record<string, fc.Arbitrary<number[]>> = {};
  for (const c of columns) record[c] = fc.array(arbitraryFor(c), { minLength: times.length, maxLength: times.length });
  return fc.record(record).map((values) => ({ times, columns: values as PathwayRows['columns'] }));
}

/** A non-empty set of concentration-run columns, in canonical order, always including `required`. */
export function columnSet(required: readonly ConcentrationRunColumn[] = []): fc.Arbitrary<ConcentrationRunColumn[]> {
  return fc
    .subarray([...CONCENTRATION_RUN_COLUMNS], { minLength: required.length > 0 ? 0 : 1 })
    .map((cols) => CONCENTRATION_RUN_COLUMNS.filter((c) => cols.includes(c) || required.includes(c)));
}

/** A random valid concentration-driven pathway: times, a column set, values from plausibleValue. */
export function pathwayRows(times: TimesOptions = {}, required: readonly ConcentrationRunColumn[] = []): fc.Arbitrary<PathwayRows> {
  return fc.tuple(pathwayTimes(times), columnSet(required)).chain(([t, cols]) => pathwayValues(t, cols));
}

/**
 * The rows as pathway CSV text: a `# name:` line, a `year,...` header in canonical column order, and
 * one line per row with every number written as its shortest round-trip text (`String(x)`).
 */
export function pathwayCsv(rows: PathwayRows, name = 'generated'): string {
  const cols = (Object.keys(rows.columns) as PathwayColumn[]).sort(
    (a, b) => CONCENTRATION_RUN_COLUMNS.indexOf(a as ConcentrationRunColumn) - CONCENTRATION_RUN_COLUMNS.indexOf(b as ConcentrationRunColumn),
  );
  const lines = [`# name: ${name}`, ['year', ...cols].join(',')];
  rows.times.forEach((t, i) => lines.push([t, ...cols.map((c) => rows.columns[c]![i])].map(String).join(',')));
  return lines.join('\n') + '\n';
}

/** Reads CSV text the way a run does, without splicing: parsePathway then toAnnual. */
export function readAnnual(text: string, file = 'generated.csv'): Pathway {
  return toAnnual(parsePathway(text, file));
}

/**
 * One row of `warmcast verify`: a published value, what warmcast computes for it, the tolerance
 * and whether it passes. The columns are the same in every output format.
 */
export interface VerificationRow {
  /** What is checked, e.g. `CO2 ERF 2019 vs 1750 (AR6 formulas)`. */
  check: string;
  /** Where the published value comes from, with "from memory" where it is recalled. */
  source: string;
  /** The published value or range, with its unit. */
  published: string;
  /** What warmcast gives, with its unit. */
  warmcast: string;
  /** How far warmcast may be from the published value, or the range it must fall in. */
  tolerance: string;
  /** Whether warmcast is within the tolerance. */
  pass: boolean;
}

/**
 * A published check: a name and a function computing its row(s) on the user's machine (several
 * rows when one model run answers several published values, as a pulse run does for 20, 100 and
 * 1000 years). The registry in registry.ts lists them; a new check is one more entry there.
 */
export interface PublishedCheck {
  /** Short name, unique in the registry. */
  id: string;
  /** Computes the rows; pure apart from reading bundled data. */
  run: () => VerificationRow[];
}

/** The column names of the verification table, in output order. */
export const VERIFICATION_COLUMNS = ['check', 'source', 'published', 'warmcast', 'tolerance', 'pass'] as const;

/**
 * A row that passes when `value` lies within [lo, hi] (inclusive).
 *
 * @param check what is checked
 * @param source where the range comes from
 * @param published the published value as written (e.g. `1.09 [0.95-1.20]`)
 * @param value warmcast's value
 * @param lo lower end of the accepted range
 * @param hi upper end
 * @param unit unit text, e.g. `K`
 * @param digits decimals to print
 * @example withinRange('TCRE', 'AR6 SPM D.1.1', '1.65 [1.0-2.3]', 1.6, 1.0, 2.3, 'K per 1000 Pg C', 2).pass // true
 */
export function withinRange(check: string, source: string, published: string, value: number, lo: number, hi: number, unit: string, digits: number): VerificationRow {
  return {
    check,
    source,
    published: `${published} ${unit}`,
    warmcast: `${value.toFixed(digits)} ${unit}`,
    tolerance: `within ${lo} to ${hi} ${unit}`,
    pass: value >= lo && value <= hi,
  };
}

/**
 * A row that passes when `value` is within `tolerance` of `expected`.
 * @example closeTo('2xCO2 ERF', 'AR6 7.3.2.1', 3.934, 3.93, 0.005, 'W m-2', 3).pass // true
 */
export function closeTo(check: string, source: string, value: number, expected: number, tolerance: number, unit: string, digits: number): VerificationRow {
  return {
    check,
    source,
    published: `${expected} ${unit}`,
    warmcast: `${value.toFixed(digits)} ${unit}`,
    tolerance: `±${tolerance} ${unit}`,
    pass: Math.abs(value - expected) <= tolerance,
  };
}

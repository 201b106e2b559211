/**
 * Describes the spacing of ascending time labels in words, for notes and `warmcast check`:
 * `1-year steps`, `5-year steps`, `steps of 0.5 years`, `irregular steps of 1 to 10 years`,
 * `irregular steps of 28 to 31 days`, or `a single row`. Steps shorter than a tenth of a year are
 * given in whole days (monthly dates read better as 28 to 31 days than as 0.08 years); longer ones in
 * years with at most two decimals.
 *
 * @param times - ascending decimal years
 * @example
 * describeTimeSteps(Float64Array.of(2025, 2030, 2035)) // '5-year steps'
 * describeTimeSteps(Float64Array.of(2025, 2030, 2040)) // 'irregular steps of 5 to 10 years'
 */
export function describeTimeSteps(times: ArrayLike<number>): string {
  if (times.length < 2) return 'a single row';
  let min = Infinity;
  let max = -Infinity;
  for (let i = 1; i < times.length; i++) {
    const d = times[i] - times[i - 1];
    if (d < min) min = d;
    if (d > max) max = d;
  }
  // Dates and decimal years carry rounding of order 1e-12 yr; a millionth of a year is far below a day.
  if (max - min <= 1e-6) {
    const step = (min + max) / 2;
    const whole = Math.round(step);
    if (Math.abs(step - whole) <= 1e-6 && whole >= 1) return `${whole}-year steps`;
    return `steps of ${formatStepLength(step)}`;
  }
  const lo = duration(min);
  const hi = duration(max);
  if (lo.text === hi.text && lo.unit === hi.unit) return `steps of about ${formatStepLength(min)}`;
  return lo.unit === hi.unit
    ? `irregular steps of ${lo.text} to ${hi.text} ${hi.unit}s`
    : `irregular steps of ${formatStepLength(min)} to ${formatStepLength(max)}`;
}

/** True when the labels are consecutive whole years (nothing to interpolate). */
export function isAnnualGrid(times: ArrayLike<number>): boolean {
  for (let i = 0; i < times.length; i++) {
    if (!Number.isInteger(times[i])) return false;
    if (i > 0 && times[i] !== times[i - 1] + 1) return false;
  }
  return true;
}

/**
 * A decimal year for people to read: at most two decimals, trailing zeros dropped, so a date's
 * label 2050.4986 reads 2050.5 and 2030 stays 2030.
 *
 * @param t - decimal year
 * @example
 * formatDecimalYear(2024.5397) // '2024.54'
 * formatDecimalYear(2030) // '2030'
 */
export function formatDecimalYear(t: number): string {
  return String(Number(t.toFixed(2)));
}

/** Days in a mean Gregorian year, for steps given in days. */
const DAYS_PER_YEAR = 365.2425;

/** Below this many years a step is given in days. */
const DAYS_BELOW_YEARS = 0.1;

function duration(years: number): { text: string; unit: 'day' | 'year' } {
  if (years < DAYS_BELOW_YEARS) return { text: String(Math.round(years * DAYS_PER_YEAR)), unit: 'day' };
  return { text: formatDecimalYear(years), unit: 'year' };
}

/**
 * The length of one step for people to read: whole days below a tenth of a year, else years with at
 * most two decimals.
 *
 * @param years - step length in years
 * @example
 * formatStepLength(31 / 365) // '31 days'
 * formatStepLength(10.997) // '11 years'
 */
export function formatStepLength(years: number): string {
  const { text, unit } = duration(years);
  return `${text} ${unit}${text === '1' ? '' : 's'}`;
}

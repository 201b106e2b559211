/**
 * Describes the spacing of ascending time labels in words, for notes and `warmcast check`:
 * `1-year steps`, `5-year steps`, `steps of 0.083 years`, `irregular steps of 1 to 10 years`,
 * or `a single row`.
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
    return `steps of ${formatYears(step)} years`;
  }
  return `irregular steps of ${formatYears(min)} to ${formatYears(max)} years`;
}

/** True when the labels are consecutive whole years (nothing to interpolate). */
export function isAnnualGrid(times: ArrayLike<number>): boolean {
  for (let i = 0; i < times.length; i++) {
    if (!Number.isInteger(times[i])) return false;
    if (i > 0 && times[i] !== times[i - 1] + 1) return false;
  }
  return true;
}

function formatYears(x: number): string {
  return String(Number(x.toFixed(3)));
}

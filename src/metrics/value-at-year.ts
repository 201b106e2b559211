/**
 * The value of a series at `year`: exact at a listed year, linearly interpolated between the two
 * listed years around it, NaN outside the series' years (no extrapolation).
 *
 * @param years years, strictly ascending
 * @param values one value per year
 * @param year the year wanted (may be fractional)
 * @returns the value, in the series' unit, or NaN when `year` lies outside `years`
 * @example
 * valueAtYear(Float64Array.of(2020, 2030), Float64Array.of(1.2, 1.5), 2030) // 1.5
 * valueAtYear(Float64Array.of(2020, 2030), Float64Array.of(1.2, 1.5), 2025) // 1.35
 * valueAtYear(Float64Array.of(2020, 2030), Float64Array.of(1.2, 1.5), 2031) // NaN
 */
export function valueAtYear(years: ArrayLike<number>, values: ArrayLike<number>, year: number): number {
  const n = years.length;
  if (n === 0 || !(year >= years[0] && year <= years[n - 1])) return NaN;
  // Binary search for the last listed year <= year.
  let lo = 0;
  let hi = n - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (years[mid] <= year) lo = mid;
    else hi = mid - 1;
  }
  if (years[lo] === year || lo === n - 1) return values[lo];
  const t = (year - years[lo]) / (years[lo + 1] - years[lo]);
  return values[lo] + t * (values[lo + 1] - values[lo]);
}

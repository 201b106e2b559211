/** Cumulative emissions up to the year net emissions first reach zero. */
export interface NetZero {
  /** First year at or after `fromYear` whose net emissions are <= 0; undefined if none in the data. */
  year: number | undefined;
  /**
   * Sum of the annual emissions from `fromYear` through the year before `year` (through the last
   * year of the data when net zero is not reached), in the emission unit times one year
   * (Gt CO2 for `co2_gtco2`).
   */
  total: number;
  /** First year summed. */
  fromYear: number;
  /** Last year summed (the year before net zero, or the last year of the data). */
  toYear: number;
}

/**
 * Cumulative net emissions to net zero: the sum of annual emissions from `fromYear` up to (not
 * including) the first year whose net emissions are zero or negative. Annual values are annual
 * totals (Gt CO2 in a year), so the sum is the integral over those years; the net-zero year is
 * left out because from it on emissions no longer add to the total. A series that is at or below
 * zero in `fromYear` has reached net zero there and sums to 0.
 *
 * @param years consecutive integer years, ascending
 * @param emissions annual net emissions (e.g. Gt CO2 per year), one per year
 * @param fromYear first year to count, default the first year of the data; clamped into the data
 * @returns the net-zero year (or undefined) and the cumulative total
 * @example
 * cumulativeToNetZero(Float64Array.of(2030, 2031, 2032, 2033), Float64Array.of(30, 20, 0, -5))
 * // { year: 2032, total: 50, fromYear: 2030, toYear: 2031 }
 */
export function cumulativeToNetZero(years: Float64Array, emissions: ArrayLike<number>, fromYear = years[0]): NetZero {
  let start = 0;
  while (start < years.length - 1 && years[start] < fromYear) start++;
  let total = 0;
  for (let i = start; i < years.length; i++) {
    if (emissions[i] <= 0) return { year: years[i], total, fromYear: years[start], toYear: years[i] - 1 };
    total += emissions[i];
  }
  return { year: undefined, total, fromYear: years[start], toYear: years[years.length - 1] };
}

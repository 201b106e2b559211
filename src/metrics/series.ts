/**
 * A year-by-year series: one value per year, `years` ascending. Warming series hold K relative to
 * 1850-1900; other series say their unit where they are made. NaN marks a year with no value.
 */
export interface Series {
  /** Years, ascending (an annual grid of consecutive integers wherever warmcast builds one). */
  years: Float64Array;
  /** One value per year, same length as `years`. */
  values: Float64Array;
}

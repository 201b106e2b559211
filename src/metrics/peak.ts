/** The highest value of a series and when it occurs. */
export interface Peak {
  /** Year of the highest value (the first such year when it repeats); NaN when there is no value. */
  year: number;
  /** The highest value, in the series' unit; NaN when there is no value. */
  value: number;
  /** Index of that year in the series; -1 when there is no value. */
  index: number;
}

/**
 * The highest value of an annual series and its year. NaN entries are skipped; ties go to the
 * earliest year. A peak in the last year means the series is still rising (or flat) at its end, so
 * "peak" is then only the highest value so far: callers should say so.
 *
 * @param years years, ascending
 * @param values one value per year (K for warming)
 * @returns `{ year, value, index }`, all NaN/-1 when `values` is empty or all NaN
 * @example
 * peak(Float64Array.of(2030, 2040, 2050), Float64Array.of(1.4, 1.7, 1.6)) // { year: 2040, value: 1.7, index: 1 }
 */
export function peak(years: ArrayLike<number>, values: ArrayLike<number>): Peak {
  let index = -1;
  for (let i = 0; i < values.length; i++) {
    if (values[i] > (index < 0 ? -Infinity : values[index])) index = i;
  }
  return index < 0 ? { year: NaN, value: NaN, index } : { year: years[index], value: values[index], index };
}

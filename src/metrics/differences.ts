import type { Series } from './series.js';

/**
 * Year-by-year difference `other - reference` over the years both series hold (matched exactly, in
 * ascending order). Subtraction in IEEE arithmetic is exactly antisymmetric, so
 * `differences(a, b)` is the elementwise negation of `differences(b, a)`, and a series minus itself
 * is zero wherever it has a value.
 *
 * @param reference the series compared against (e.g. the first pathway of a comparison)
 * @param other the series compared
 * @returns a new series on the common years; values in the unit of the inputs (K for warming), NaN
 *   where either input is NaN
 * @example
 * differences(
 *   { years: Float64Array.of(2030, 2040), values: Float64Array.of(1.5, 1.7) },
 *   { years: Float64Array.of(2040, 2050), values: Float64Array.of(1.6, 1.8) },
 * ) // { years: Float64Array [2040], values: Float64Array [≈-0.1] }
 */
export function differences(reference: Series, other: Series): Series {
  const years: number[] = [];
  const values: number[] = [];
  let i = 0;
  let j = 0;
  // Both year lists ascend: walk them together.
  while (i < reference.years.length && j < other.years.length) {
    const a = reference.years[i];
    const b = other.years[j];
    if (a === b) {
      years.push(a);
      values.push(other.values[j] - reference.values[i]);
      i++;
      j++;
    } else if (a < b) i++;
    else j++;
  }
  return { years: Float64Array.from(years), values: Float64Array.from(values) };
}

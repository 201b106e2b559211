/**
 * Years over which the growth rate at the end of a concentration record is taken: the least-squares
 * slope of the last 5 annual means (common practice, no source: 5 years span about one El Niño /
 * La Niña cycle, 2-7 years, so one El Niño year's fast rise, 3.4 ppm in 2023-2024 against a 2.5 ppm
 * trend, moves the slope by a fifth of its excess instead of setting it).
 */
export const JOIN_TREND_YEARS = 5;

/**
 * The concentrations at 1 January of each year, from annual means: what the carbon cycle must
 * match when it diagnoses emissions from a concentration record. A calendar year's emission total
 * raises the stock from one 1 January to the next, so the record's annual means are turned into
 * year boundaries:
 * - b_0 = c_0 (the run starts from an equilibrium at the first year's concentration);
 * - b_k = (c_{k-1} + c_k) / 2 for 1 <= k <= last (the value midway between two annual means, as
 *   the growth rate over a calendar year is commonly estimated from the December-January means
 *   around it; a path linear between these values has annual means that miss the record's by a
 *   quarter of its second difference, (c_{k+1} - 2 c_k + c_{k-1}) / 4: below 0.05 ppm of CO2 in
 *   smooth years, 0.43 ppm in 1973, whose annual mean stands 0.4 ppm above the line of its neighbours);
 * - b_{last+1} = b_last + s, with s the least-squares slope of the last JOIN_TREND_YEARS annual
 *   means (fewer if the record is shorter; 0 for one year): the last year of a record, the year a
 *   future emission pathway joins, grows at the recent trend and not at its own noisy rise (nor
 *   half of it, as the midway rule would give).
 *
 * @param annualMeans concentrations, one annual mean per year (ppm or ppb); only 0..last are read
 * @param last index of the last year given
 * @returns last + 2 values: b_0 .. b_{last+1}
 * @example
 * yearStartConcentrations(Float64Array.of(400, 402, 404), 2) // Float64Array [400, 401, 403, 405]
 */
export function yearStartConcentrations(annualMeans: ArrayLike<number>, last: number): Float64Array {
  const b = new Float64Array(last + 2);
  b[0] = annualMeans[0];
  for (let k = 1; k <= last; k++) b[k] = 0.5 * (annualMeans[k - 1] + annualMeans[k]);
  b[last + 1] = b[last] + trailingSlope(annualMeans, last, JOIN_TREND_YEARS);
  return b;
}

/**
 * Least-squares slope of values[last - m + 1 .. last] against their index, per year, with
 * m = min(years, last + 1); 0 for a single value.
 * @example trailingSlope([1, 2, 4, 5], 3, 5) // 1.4
 */
export function trailingSlope(values: ArrayLike<number>, last: number, years: number): number {
  const m = Math.min(years, last + 1);
  if (m < 2) return 0;
  const first = last - m + 1;
  const meanX = (m - 1) / 2;
  let meanY = 0;
  for (let i = 0; i < m; i++) meanY += values[first + i];
  meanY /= m;
  let sxy = 0;
  let sxx = 0;
  for (let i = 0; i < m; i++) {
    sxy += (i - meanX) * (values[first + i] - meanY);
    sxx += (i - meanX) * (i - meanX);
  }
  return sxy / sxx;
}

import { annualCarbonStepForIncreaseInto, annualCarbonStepInto, type AnnualCarbonState } from './annual-carbon-step.js';
import { GTC_PER_PPM, gtco2ToGtc } from './units.js';
import { yearStartConcentrations } from './year-start-concentrations.js';

/**
 * What drives atmospheric CO2 in each calendar year of a run, as plain data (an ensemble sends it
 * to worker threads as it is): in the years of a concentration record, the increase of the stock
 * from 1 January to 1 January (yearStartConcentrations); after them, the year's emission total.
 */
export interface Co2YearDrivers {
  /** Annual-mean concentration in the years it is given, ppm; NaN in emission years. */
  givenPpm: Float64Array;
  /** Atmospheric increase over each concentration year, Gt C; NaN in emission years. */
  increaseGtc: Float64Array;
  /** Emission total of each emission year, Gt C; NaN in concentration years. */
  emissionGtc: Float64Array;
  /** Atmospheric CO2 of the starting equilibrium, 1 January of the first year, ppm. */
  startPpm: number;
}

/**
 * The per-year CO2 drivers of a pathway: concentration years first (if any), then emission years.
 * The caller has checked the order and that each year has exactly one form (planGas in
 * runEmissionDriven does).
 *
 * @param ppm annual-mean CO2 per year, ppm, NaN where emissions are given (or undefined)
 * @param gtco2 CO2 emission total per year, Gt CO2, NaN where the concentration is given (or undefined)
 * @param preindustrialPpm the start when the first year is an emission year, ppm
 * @example
 * co2YearDrivers(Float64Array.of(400, 402, NaN), Float64Array.of(NaN, NaN, 40), 278.3).increaseGtc
 * // Float64Array [2.124 x 1, 2.124 x 1.5, NaN]
 */
export function co2YearDrivers(ppm: Float64Array | undefined, gtco2: Float64Array | undefined, preindustrialPpm: number): Co2YearDrivers {
  const n = (ppm ?? gtco2)!.length;
  let last = -1;
  while (ppm && last + 1 < n && Number.isFinite(ppm[last + 1])) last++;
  const givenPpm = new Float64Array(n).fill(NaN);
  const increaseGtc = new Float64Array(n).fill(NaN);
  const emissionGtc = new Float64Array(n).fill(NaN);
  if (last >= 0) {
    const b = yearStartConcentrations(ppm!, last);
    for (let k = 0; k <= last; k++) {
      givenPpm[k] = ppm![k];
      increaseGtc[k] = GTC_PER_PPM * (b[k + 1] - b[k]);
    }
  }
  for (let k = last + 1; k < n; k++) emissionGtc[k] = gtco2 ? gtco2ToGtc(gtco2[k]) : 0;
  return { givenPpm, increaseGtc, emissionGtc, startPpm: last >= 0 ? ppm![0] : preindustrialPpm };
}

/**
 * Steps the CO2 boxes over calendar year k, the one production carbon step every run and every
 * ensemble member takes: the year's emission total (given, or diagnosed so that the stock reaches the
 * next 1 January's concentration) at a constant rate, the feedback frozen at the start of the year
 * (annualCarbonStepInto, annualCarbonStepForIncreaseInto). The year's emission total is then in
 * `state.lastEmissionGtc`.
 *
 * @param state carbon state at 1 January of year k, advanced to 1 January of year k + 1
 * @param drivers the run's drivers
 * @param k year index
 * @param surfaceK warming the feedback sees during the year (the previous year's annual mean), K
 * @param irf100Scale multiplier on the pre-industrial iIRF100 (1 for a central run)
 * @returns the annual-mean CO2 of year k, ppm: the given value in a concentration year, else the
 *   exact mean of the boxes over the year
 */
export function co2YearInto(state: AnnualCarbonState, drivers: Co2YearDrivers, k: number, surfaceK: number, irf100Scale: number): number {
  const increase = drivers.increaseGtc[k];
  if (!Number.isNaN(increase)) {
    annualCarbonStepForIncreaseInto(state, surfaceK, irf100Scale, increase);
    return drivers.givenPpm[k];
  }
  annualCarbonStepInto(state, surfaceK, irf100Scale, drivers.emissionGtc[k]);
  return drivers.startPpm + state.meanGtc / GTC_PER_PPM;
}

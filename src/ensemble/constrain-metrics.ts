import { annualCarbonState } from '../carbon/annual-carbon-step.js';
import { co2YearDrivers, co2YearInto } from '../carbon/co2-year.js';
import { transientResponse } from '../climate/calibrate.js';
import { onePercentForcing } from '../climate/calibrate.js';
import { energyBalance } from '../climate/energy-balance.js';
import type { TwoBoxParams } from '../climate/two-box.js';
import { forcingOfDoubling } from '../forcing/co2.js';
import { PREINDUSTRIAL } from '../forcing/constants.js';
import type { MemberColumns } from './prior.js';

/** The emergent climate metrics of one member. */
export interface MemberMetrics {
  /** Equilibrium climate sensitivity F2x / lambda, K (F2x = scale_co2 x the AR6 formula's 3.93 W m-2). */
  ecsK: number;
  /** Transient climate response: mean warming over years 61-80 of the 1 %/yr CO2 run, K. */
  tcrK: number;
  /**
   * Transient climate response to cumulative emissions: the same warming over the CO2 emitted by
   * year 70 of that run (diagnosed with the member's carbon cycle), K per 1000 Pg C.
   */
  tcreKPer1000Pgc: number;
}

/** The two-box parameters of member i. */
export function memberTwoBox(columns: MemberColumns, i: number): TwoBoxParams {
  return {
    feedbackWm2K: columns.feedback_wm2k[i],
    upperHeatCapacity: columns.upper_heat_capacity[i],
    deepHeatCapacity: columns.deep_heat_capacity[i],
    exchangeWm2K: columns.exchange_wm2k[i],
    deepEfficacy: columns.deep_efficacy[i],
  };
}

/**
 * ECS, TCR and TCRE of member i (IPCC AR6 WG1 definitions: ECS the equilibrium warming for doubled
 * CO2, TCR the warming around the doubling year of a 1 %/yr CO2 increase, TCRE that warming per
 * cumulative CO2 emission). The emissions of the 1 %/yr run are diagnosed year by year with the
 * annual carbon step and the member's iIRF100 and rT multipliers, driven by its own warming.
 *
 * @param columns member parameters
 * @param i member index
 * @returns the three metrics
 */
export function memberMetrics(columns: MemberColumns, i: number): MemberMetrics {
  const twoBox = memberTwoBox(columns, i);
  const forcing2xWm2 = (columns.scale_co2?.[i] ?? 1) * forcingOfDoubling('ar6');
  const tcrK = transientResponse({ ...twoBox, co2Formula: 'ar6', forcing2xWm2 });
  const f = onePercentForcing('ar6', forcing2xWm2);
  const t = energyBalance(twoBox, f, 'exact').surfaceK;
  // Emissions compatible with the 1 %/yr concentrations (annual means C0 x 1.01^k), diagnosed with
  // the production carbon step, the feedback seeing the previous year's warming.
  const ppm = Float64Array.from({ length: 71 }, (_, k) => PREINDUSTRIAL.co2Ppm * 1.01 ** k);
  const drivers = co2YearDrivers(ppm, undefined, PREINDUSTRIAL.co2Ppm);
  const state = annualCarbonState();
  let emittedGtc = 0;
  for (let k = 0; k < 70; k++) {
    co2YearInto(state, drivers, k, columns.uptake_warming_scale![i] * (k > 0 ? t[k - 1] : 0), columns.irf100_scale![i]);
    emittedGtc += state.lastEmissionGtc;
  }
  return { ecsK: forcing2xWm2 / twoBox.feedbackWm2K, tcrK, tcreKPer1000Pgc: tcrK / (emittedGtc / 1000) };
}

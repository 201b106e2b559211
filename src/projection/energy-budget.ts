import type { ClimateParams } from '../climate/params.js';

/**
 * Earth's surface area, m2: 4 pi R^2 with the mean radius R = 6371.0 km (IUGG mean radius; common
 * practice). Turns the two-box model's per-square-metre heat into joules.
 */
export const EARTH_AREA_M2 = 4 * Math.PI * 6.371e6 * 6.371e6;

/** Seconds per Julian year, 365.25 x 86400 (REFERENCES.md, Constants). */
const SECONDS_PER_YEAR = 365.25 * 86400;

/**
 * Share of the climate system's heat gain taken up by the ocean, 1971-2018: 91 % (IPCC AR6 WG1 SPM
 * A.4.2 and Box 7.2: ocean 91 %, land 5 %, ice 3 %, atmosphere 1 %; from memory). The two boxes
 * stand for the whole climate system's heat (their heat gain is the time integral of the top-of-
 * atmosphere imbalance), so the ocean's heat is this share of theirs.
 */
export const OCEAN_SHARE_OF_HEAT_GAIN = 0.91;

/**
 * IPCC AR6 WG1 figures the energy budget is set against.
 * - Earth energy imbalance 2006-2018: 0.79 [0.52-1.06] W m-2 (AR6 WG1 Table 7.1; REFERENCES.md, C).
 * - Ocean heat content change 1971 to 2018, full depth: 395.3 ZJ, 1 sigma 31.2 ZJ (the AR6 assessed
 *   ocean heat content series, pathways/records/ar6-ocean-heat-content-1971-2018.csv, row 2018.5
 *   relative to the 1971 mean; test/reference/ar6-energy-budget.test.ts reads them back).
 */
export const AR6_ENERGY_BUDGET = {
  imbalanceYears: [2006, 2018],
  imbalanceWm2: 0.79,
  imbalanceVeryLikelyWm2: [0.52, 1.06],
  oceanHeatYears: [1971, 2018],
  oceanHeatZj: 395.3,
  oceanHeatSigmaZj: 31.2,
} as const;

/** A run's energy budget over the AR6 periods. */
export interface EnergyBudget {
  /** Mean top-of-atmosphere imbalance over 2006-2018, W m-2. */
  imbalanceWm2: number;
  /** Heat gained by both boxes from 1971 to 2018 (the whole climate system), ZJ (1e21 J). */
  heatGainZj: number;
  /** The ocean's share of it (OCEAN_SHARE_OF_HEAT_GAIN), ZJ. */
  oceanHeatGainZj: number;
}

/**
 * The energy budget of a run that covers 1971-2018: the mean top-of-atmosphere imbalance over
 * 2006-2018 and the heat gained from 1971 to 2018, C dT + Cd dTd per square metre over the Earth's
 * area, with the ocean's share. Years are annual means, so the 1971 to 2018 change matches a record
 * given at mid-year, 1971.5 to 2018.5.
 *
 * @param years consecutive whole years of the run
 * @param columns the run's `warming_k`, `deep_ocean_k` (K, any baseline) and `imbalance_wm2` (W m-2)
 * @param params the run's climate parameters (heat capacities, W yr m-2 K-1)
 * @returns the budget, or undefined when the run does not cover 1971-2018
 * @example energyBudget(run.years, run.columns, run.params) // { imbalanceWm2: 1.02, heatGainZj: ..., oceanHeatGainZj: ... }
 */
export function energyBudget(
  years: Float64Array,
  columns: { warming_k: Float64Array; deep_ocean_k: Float64Array; imbalance_wm2: Float64Array },
  params: Pick<ClimateParams, 'upperHeatCapacity' | 'deepHeatCapacity'>,
): EnergyBudget | undefined {
  const first = years[0];
  const last = years[years.length - 1];
  const [h0, h1] = AR6_ENERGY_BUDGET.oceanHeatYears;
  const [i0, i1] = AR6_ENERGY_BUDGET.imbalanceYears;
  if (first > Math.min(h0, i0) || last < Math.max(h1, i1)) return undefined;
  let sum = 0;
  for (let y = i0; y <= i1; y++) sum += columns.imbalance_wm2[y - first];
  const dT = columns.warming_k[h1 - first] - columns.warming_k[h0 - first];
  const dTd = columns.deep_ocean_k[h1 - first] - columns.deep_ocean_k[h0 - first];
  const heatWYrPerM2 = params.upperHeatCapacity * dT + params.deepHeatCapacity * dTd;
  const heatGainZj = (heatWYrPerM2 * SECONDS_PER_YEAR * EARTH_AREA_M2) / 1e21;
  return { imbalanceWm2: sum / (i1 - i0 + 1), heatGainZj, oceanHeatGainZj: OCEAN_SHARE_OF_HEAT_GAIN * heatGainZj };
}

/**
 * The note a run covering 1971-2018 carries: its energy budget beside AR6's figures.
 *
 * @example energyBudgetNote(budget) // 'energy budget: top-of-atmosphere imbalance 2006-2018 1.02 W m-2 (IPCC AR6: 0.79, very likely 0.52-1.06); ...'
 */
export function energyBudgetNote(budget: EnergyBudget): string {
  const a = AR6_ENERGY_BUDGET;
  return `energy budget: top-of-atmosphere imbalance ${a.imbalanceYears.join('-')} ${budget.imbalanceWm2.toFixed(2)} W m-2 `
    + `(IPCC AR6: ${a.imbalanceWm2}, very likely ${a.imbalanceVeryLikelyWm2.join('-')}); `
    + `heat gained ${a.oceanHeatYears.join('-')} ${budget.heatGainZj.toFixed(0)} ZJ by the two boxes (the whole climate system), `
    + `of which the ocean's ${Math.round(100 * OCEAN_SHARE_OF_HEAT_GAIN)} % (AR6) is ${budget.oceanHeatGainZj.toFixed(0)} ZJ `
    + `(AR6 ocean heat content record: ${a.oceanHeatZj.toFixed(0)} ZJ, 1 sigma ${a.oceanHeatSigmaZj.toFixed(0)})`;
}

/**
 * Stratospheric water vapour from CH4 oxidation: ERF proportional to the CH4 ERF, as in the AR6
 * forcing time series (ar6-erf-1750-2019.csv, Smith et al. 2021), where h2o_stratospheric /
 * ch4 = 0.0919 in every year (0.05 / 0.544 in 2019; read from the record, checked in
 * test/reference/ar6-methane.test.ts). AR6 WG1 7.3.2.6 assesses 0.05 [0.00 to 0.10] W m-2 for 2019.
 */
export const STRAT_H2O_PER_CH4_ERF = 0.05 / 0.5439829883633728;

/**
 * Stratospheric water vapour ERF, W m-2, for a CH4 ERF (W m-2), both relative to 1750.
 * @example stratH2oErfWm2(0.544) // ≈ 0.05
 */
export function stratH2oErfWm2(ch4ErfWm2: number): number {
  return STRAT_H2O_PER_CH4_ERF * ch4ErfWm2;
}

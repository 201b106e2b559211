import { AR6_ERF_OVER_SARF, MEINSHAUSEN_2020, PREINDUSTRIAL } from './constants.js';

/**
 * N2O effective radiative forcing, W m-2, relative to 1750: Meinshausen et al. 2020 eq. (3)
 * SARF (a2 sqrt(C) + b2 sqrt(N) + c2 sqrt(M) + d2)(sqrt(N) - sqrt(N0)), times AR6's adjustment 1.07.
 *
 * @param n2oPpb N2O concentration, ppb
 * @param co2Ppm CO2 concentration, ppm (band overlap)
 * @param ch4Ppb CH4 concentration, ppb (band overlap)
 * @example n2oErfAr6(332.1, 410.1, 1866.3) // ≈ 0.208 (AR6: 0.21 for 1750-2019)
 */
export function n2oErfAr6(n2oPpb: number, co2Ppm: number, ch4Ppb: number): number {
  const { a2, b2, c2, d2 } = MEINSHAUSEN_2020.n2o;
  const sarf =
    (a2 * Math.sqrt(co2Ppm) + b2 * Math.sqrt(n2oPpb) + c2 * Math.sqrt(ch4Ppb) + d2) *
    (Math.sqrt(n2oPpb) - Math.sqrt(PREINDUSTRIAL.n2oPpb));
  return AR6_ERF_OVER_SARF.n2o * sarf;
}

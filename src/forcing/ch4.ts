import { AR6_ERF_OVER_SARF, MEINSHAUSEN_2020, PREINDUSTRIAL } from './constants.js';

/**
 * CH4 effective radiative forcing, W m-2, relative to 1750: Meinshausen et al. 2020 eq. (4)
 * SARF (a3 sqrt(M) + b3 sqrt(N) + d3)(sqrt(M) - sqrt(M0)), times AR6's adjustment 0.86 (AR6 7.3.2.2).
 *
 * @param ch4Ppb CH4 concentration, ppb
 * @param n2oPpb N2O concentration, ppb (band overlap)
 * @example ch4ErfAr6(1866.3, 332.1) // ≈ 0.544 (AR6: 0.54 for 1750-2019)
 */
export function ch4ErfAr6(ch4Ppb: number, n2oPpb: number): number {
  const { a3, b3, d3 } = MEINSHAUSEN_2020.ch4;
  const sarf = (a3 * Math.sqrt(ch4Ppb) + b3 * Math.sqrt(n2oPpb) + d3) * (Math.sqrt(ch4Ppb) - Math.sqrt(PREINDUSTRIAL.ch4Ppb));
  return AR6_ERF_OVER_SARF.ch4 * sarf;
}

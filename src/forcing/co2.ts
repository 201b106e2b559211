import { AR6_ERF_OVER_SARF, MEINSHAUSEN_2020, MYHRE_1998_CO2_COEFFICIENT, PREINDUSTRIAL } from './constants.js';

/** Which CO2 forcing expression to use: `ar6` (Meinshausen et al. 2020 with AR6 adjustment) or `log`. */
export type Co2Formula = 'ar6' | 'log';

/**
 * CO2 stratospheric-temperature-adjusted radiative forcing, W m-2, of Meinshausen et al. 2020,
 * eq. (1)-(2) with Table 3 coefficients: (alpha' + c1 sqrt(N)) ln(C/C0), where alpha' grows
 * quadratically in C - C0 up to C_amax = C0 - b1/(2 a1) and is constant beyond it.
 *
 * @param co2Ppm CO2 concentration, ppm
 * @param n2oPpb N2O concentration, ppb (band overlap)
 * @param co2RefPpm reference CO2, ppm (default the AR6 1750 value 278.3)
 * @returns SARF in W m-2 relative to `co2RefPpm`
 * @example co2SarfMeinshausen(556.6, 270.1) // ≈ 3.747
 */
export function co2SarfMeinshausen(co2Ppm: number, n2oPpb: number, co2RefPpm: number = PREINDUSTRIAL.co2Ppm): number {
  const { a1, b1, c1, d1 } = MEINSHAUSEN_2020.co2;
  const cAlphaMax = co2RefPpm - b1 / (2 * a1);
  let alphaPrime: number;
  if (co2Ppm > cAlphaMax) alphaPrime = d1 - (b1 * b1) / (4 * a1);
  else if (co2Ppm > co2RefPpm) {
    const dc = co2Ppm - co2RefPpm;
    alphaPrime = d1 + a1 * dc * dc + b1 * dc;
  } else alphaPrime = d1;
  return (alphaPrime + c1 * Math.sqrt(n2oPpb)) * Math.log(co2Ppm / co2RefPpm);
}

/**
 * CO2 effective radiative forcing, W m-2, as IPCC AR6 WG1 computes it: the Meinshausen et al. 2020
 * SARF times the tropospheric-adjustment factor 1.05 (AR6 7.3.2.1).
 *
 * @param co2Ppm CO2 concentration, ppm
 * @param n2oPpb N2O concentration, ppb
 * @returns ERF in W m-2 relative to 1750
 * @example co2ErfAr6(556.6, 270.1) // ≈ 3.934 (AR6 assessed 3.93 ± 0.47 for 2xCO2)
 */
export function co2ErfAr6(co2Ppm: number, n2oPpb: number): number {
  return AR6_ERF_OVER_SARF.co2 * co2SarfMeinshausen(co2Ppm, n2oPpb);
}

/**
 * CO2 forcing from the simple logarithmic law of Myhre et al. 1998: 5.35 ln(C/C0), W m-2.
 *
 * @param co2Ppm CO2 concentration, ppm
 * @param co2RefPpm reference CO2, ppm (default 278.3)
 * @example co2ForcingLog(2 * 278.3) // ≈ 3.708
 */
export function co2ForcingLog(co2Ppm: number, co2RefPpm: number = PREINDUSTRIAL.co2Ppm): number {
  return MYHRE_1998_CO2_COEFFICIENT * Math.log(co2Ppm / co2RefPpm);
}

/**
 * CO2 forcing by the chosen formula, before any scaling to a sampled or configured 2xCO2 forcing.
 *
 * @param formula `ar6` or `log`
 * @param co2Ppm CO2, ppm
 * @param n2oPpb N2O, ppb (used by `ar6` only)
 */
export function co2Forcing(formula: Co2Formula, co2Ppm: number, n2oPpb: number): number {
  return formula === 'log' ? co2ForcingLog(co2Ppm) : co2ErfAr6(co2Ppm, n2oPpb);
}

/**
 * The forcing of doubled CO2 (2 x 278.3 ppm, N2O at 270.1 ppb) under a formula, W m-2.
 * @example forcingOfDoubling('ar6') // ≈ 3.934
 */
export function forcingOfDoubling(formula: Co2Formula): number {
  return co2Forcing(formula, 2 * PREINDUSTRIAL.co2Ppm, PREINDUSTRIAL.n2oPpb);
}

/**
 * Constants of the greenhouse-gas forcing formulas, each with its source.
 */

/**
 * Pre-industrial (1750) reference concentrations used by IPCC AR6 WG1 (Annex III / 7.SM.1.1):
 * 278.3 ppm CO2, 729.2 ppb CH4, 270.1 ppb N2O. Status: from memory, but together with the formulas
 * below they reproduce the AR6 1750-2019 ERF totals (see test/reference/ar6-forcing.test.ts).
 */
export const PREINDUSTRIAL = {
  co2Ppm: 278.3,
  ch4Ppb: 729.2,
  n2oPpb: 270.1,
} as const;

/**
 * Meinshausen et al. 2020 (GMD 13, 3571), Table 3: stratospheric-temperature-adjusted radiative
 * forcing (SARF) coefficients. Status: from memory; they reproduce AR6's assessed 2xCO2 ERF of
 * 3.93 W m-2 and its 2019 ERF by gas.
 */
export const MEINSHAUSEN_2020 = {
  co2: { a1: -2.4785e-7, b1: 7.5906e-4, c1: -2.1492e-3, d1: 5.2488 },
  n2o: { a2: -3.4197e-4, b2: 2.5455e-4, c2: -2.4357e-4, d2: 0.12173 },
  ch4: { a3: -8.9603e-5, b3: -1.2462e-4, d3: 0.045194 },
} as const;

/**
 * Ratio of effective radiative forcing to SARF (tropospheric adjustments) used by IPCC AR6 WG1
 * section 7.3.2: CO2 +5 % (from memory), CH4 -14 % (AR6 7.3.2.2, confirmed), N2O +7 % (from memory).
 */
export const AR6_ERF_OVER_SARF = {
  co2: 1.05,
  ch4: 0.86,
  n2o: 1.07,
} as const;

/** Myhre et al. 1998 (GRL 25, 2715), Table 3: CO2 forcing 5.35 ln(C/C0) W m-2. */
export const MYHRE_1998_CO2_COEFFICIENT = 5.35;

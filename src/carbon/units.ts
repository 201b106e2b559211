/**
 * Unit conversions of the carbon and gas cycles, in one place, each with its source. Masses are in
 * Gt (= Pg) of carbon or CO2 and Mt (= Tg) of CH4 or N2O; amounts in the atmosphere are dry-air mole
 * fractions (ppm, ppb).
 */

/**
 * Molar masses, g mol-1, from the IUPAC standard atomic weights (C 12.011, H 1.008, N 14.007,
 * O 15.999; conventional values of the 2013 table).
 */
export const MOLAR_MASS = {
  c: 12.011,
  co2: 12.011 + 2 * 15.999,
  n2: 2 * 14.007,
  n2o: 2 * 14.007 + 15.999,
} as const;

/** Gt CO2 per Gt C: 44.009 / 12.011 = 3.664 (ratio of molar masses). */
export const GTCO2_PER_GTC = MOLAR_MASS.co2 / MOLAR_MASS.c;

/**
 * Gt C per ppm of atmospheric CO2: 2.124 (Ballantyne et al. 2012, Nature 488, 70, as used by the
 * Global Carbon Budget, Friedlingstein et al. 2022; from memory). With {@link GTCO2_PER_GTC} this
 * is 7.78 Gt CO2 per ppm.
 */
export const GTC_PER_PPM = 2.124;

/**
 * Mt CH4 per ppb of atmospheric CH4: 2.75 (Prather et al. 2012, GRL 39, L09803, the factor used in
 * the CH4 budget of IPCC AR6 WG1 chapter 5, Table 5.2; from memory).
 */
export const MT_CH4_PER_PPB = 2.75;

/**
 * Mt N per ppb of atmospheric N2O: 4.79 (Prather et al. 2012; the factor of the N2O budget in IPCC
 * AR6 WG1 chapter 5, Table 5.3; from memory).
 */
export const MT_N_PER_PPB_N2O = 4.79;

/** Mt N2O per ppb of atmospheric N2O: 4.79 Mt N x 44.013 / 28.014 = 7.526 (derived). */
export const MT_N2O_PER_PPB = MT_N_PER_PPB_N2O * (MOLAR_MASS.n2o / MOLAR_MASS.n2);

/**
 * Gt C -> Gt CO2.
 * @example gtcToGtco2(1) // ≈ 3.664
 */
export function gtcToGtco2(gtc: number): number {
  return gtc * GTCO2_PER_GTC;
}

/**
 * Gt CO2 -> Gt C.
 * @example gtco2ToGtc(3.664) // ≈ 1.000
 */
export function gtco2ToGtc(gtco2: number): number {
  return gtco2 / GTCO2_PER_GTC;
}

/**
 * Atmospheric CO2 mass for a mole fraction, Gt C.
 * @example ppmToGtc(1) // 2.124
 */
export function ppmToGtc(ppm: number): number {
  return ppm * GTC_PER_PPM;
}

/**
 * Atmospheric CO2 mole fraction for a mass, ppm.
 * @example gtcToPpm(2.124) // 1
 */
export function gtcToPpm(gtc: number): number {
  return gtc / GTC_PER_PPM;
}

/**
 * Mt CH4 -> ppb of CH4.
 * @example mtCh4ToPpb(2.75) // 1
 */
export function mtCh4ToPpb(mt: number): number {
  return mt / MT_CH4_PER_PPB;
}

/**
 * ppb of CH4 -> Mt CH4.
 * @example ppbToMtCh4(1) // 2.75
 */
export function ppbToMtCh4(ppb: number): number {
  return ppb * MT_CH4_PER_PPB;
}

/**
 * Mt N2O -> ppb of N2O.
 * @example mtN2oToPpb(7.526) // ≈ 1.000
 */
export function mtN2oToPpb(mt: number): number {
  return mt / MT_N2O_PER_PPB;
}

/**
 * ppb of N2O -> Mt N2O.
 * @example ppbToMtN2o(1) // ≈ 7.526
 */
export function ppbToMtN2o(ppb: number): number {
  return ppb * MT_N2O_PER_PPB;
}

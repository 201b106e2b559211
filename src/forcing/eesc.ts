import type { HalogenSpecies } from '../carbon/halogen-species.js';

/**
 * Fractional release factors of the ozone-depleting gases (mid-latitude, 3-year mean age of air;
 * WMO Scientific Assessment of Ozone Depletion 2018, Table 6-1 / Newman et al. 2007, ACP 7, 4537;
 * from memory, unverified). Gases not listed release nothing (HFCs, PFCs, SF6, NF3).
 */
export const FRACTIONAL_RELEASE: Readonly<Record<string, number>> = {
  cfc11: 0.47,
  cfc12: 0.23,
  cfc113: 0.29,
  cfc114: 0.12,
  cfc115: 0.04,
  hcfc22: 0.13,
  hcfc141b: 0.34,
  hcfc142b: 0.17,
  ccl4: 0.56,
  ch3ccl3: 0.67,
  halon1211: 0.62,
  halon1301: 0.28,
  halon2402: 0.65,
  ch3br: 0.6,
  ch3cl: 0.44,
};

/** Ozone-destroying efficiency of bromine relative to chlorine (Daniel et al. 1999; WMO 2018; from memory). */
export const BROMINE_EFFICIENCY = 60;

/**
 * Equivalent effective stratospheric chlorine contributed by one gas, ppt:
 * FRF x (n_Cl + 60 n_Br) x concentration (Newman et al. 2007, eq. 1, without the transport lag,
 * which cancels in the changes warmcast uses).
 * @example eescPpt(cfc11, 226) // ≈ 318.7 (0.47 x 3 x 226)
 */
export function eescPpt(species: Pick<HalogenSpecies, 'column' | 'chlorine' | 'bromine'>, ppt: number): number {
  const frf = FRACTIONAL_RELEASE[species.column] ?? 0;
  return frf * (species.chlorine + BROMINE_EFFICIENCY * species.bromine) * ppt;
}

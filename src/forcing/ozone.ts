/**
 * Ozone ERF (tropospheric and stratospheric together) from the changes in its drivers, in the linear
 * form of IPCC AR6 WG1 chapter 7 (7.SM.1.3.2; coefficients from the CMIP6 AerChemMIP models,
 * Thornhill et al. 2021, ACP 21, 853, Table 3 / Skeie et al. 2020):
 *   dERF_O3 = 1.75e-4 dCH4 (ppb) + 7.10e-4 dN2O (ppb) - 1.25e-4 dEESC (ppt)
 *           + 1.55e-4 dCO (Mt yr-1) + 3.29e-4 dNMVOC (Mt yr-1) + 1.797e-3 dNOx (Mt NO2 yr-1).
 * Coefficients from memory, unverified; the temperature feedback on ozone that AR6 adds
 * (-0.037 W m-2 K-1) is not included.
 */
export const AR6_OZONE = {
  perCh4Ppb: 1.75e-4,
  perN2oPpb: 7.1e-4,
  perEesc: -1.25e-4,
  perCoMt: 1.55e-4,
  perNmvocMt: 3.29e-4,
  perNoxMt: 1.797e-3,
} as const;

/** Changes in the drivers of ozone between two times. */
export interface OzoneDriverChange {
  ch4Ppb: number;
  n2oPpb: number;
  /** Equivalent effective stratospheric chlorine, ppt (see eescPpt). */
  eescPpt: number;
  coMt: number;
  nmvocMt: number;
  /** NOx as NO2, Mt yr-1. */
  noxMt: number;
}

/**
 * Change in ozone ERF, W m-2, for changes in its drivers.
 * @example ozoneErfChangeWm2({ ch4Ppb: 100, n2oPpb: 0, eescPpt: 0, coMt: 0, nmvocMt: 0, noxMt: 0 }) // 0.0175
 */
export function ozoneErfChangeWm2(d: Readonly<OzoneDriverChange>): number {
  const c = AR6_OZONE;
  return c.perCh4Ppb * d.ch4Ppb + c.perN2oPpb * d.n2oPpb + c.perEesc * d.eescPpt + c.perCoMt * d.coMt + c.perNmvocMt * d.nmvocMt + c.perNoxMt * d.noxMt;
}

/**
 * Observed global-mean concentrations of the halogenated gases in 2019 and their recent growth, the
 * state an emission pathway continues from at its join with the history (which gives the halogenated
 * gases only as one forcing column). Status: from memory of the NOAA and AGAGE global means as
 * assessed in IPCC AR6 WG1 (Table 2.2, Annex V) and the WMO Ozone Assessment 2022; unverified. Their
 * forcing with the AR6 radiative efficiencies sums to 0.403 W m-2, against AR6's 0.408 W m-2 for all
 * halogenated gases in 2019 (test/reference/halogen-gases.test.ts), which bounds the error.
 *
 * `preindustrialPpt`: natural background (AR6 WG1 Table 7.SM.7 notes / WMO 2022; from memory):
 * CF4 34.05 ppt, CH3Br 5.3 ppt, CH3Cl 457 ppt; zero for the others.
 */
export const HALOGEN_PRESENT_DAY: Readonly<Record<string, { ppt2019: number; trendPptPerYr: number; preindustrialPpt: number }>> = {
  hfc23: { ppt2019: 32.4, trendPptPerYr: 1.0, preindustrialPpt: 0 },
  hfc32: { ppt2019: 20.0, trendPptPerYr: 2.6, preindustrialPpt: 0 },
  hfc125: { ppt2019: 29.4, trendPptPerYr: 3.0, preindustrialPpt: 0 },
  hfc134a: { ppt2019: 107.6, trendPptPerYr: 5.5, preindustrialPpt: 0 },
  hfc143a: { ppt2019: 24.0, trendPptPerYr: 1.6, preindustrialPpt: 0 },
  hfc152a: { ppt2019: 7.1, trendPptPerYr: 0.1, preindustrialPpt: 0 },
  hfc227ea: { ppt2019: 1.6, trendPptPerYr: 0.13, preindustrialPpt: 0 },
  hfc236fa: { ppt2019: 0.18, trendPptPerYr: 0.01, preindustrialPpt: 0 },
  hfc245fa: { ppt2019: 3.0, trendPptPerYr: 0.2, preindustrialPpt: 0 },
  hfc365mfc: { ppt2019: 1.0, trendPptPerYr: 0.05, preindustrialPpt: 0 },
  hfc4310mee: { ppt2019: 0.27, trendPptPerYr: 0.005, preindustrialPpt: 0 },
  cf4: { ppt2019: 85.5, trendPptPerYr: 0.9, preindustrialPpt: 34.05 },
  c2f6: { ppt2019: 4.85, trendPptPerYr: 0.1, preindustrialPpt: 0 },
  c3f8: { ppt2019: 0.67, trendPptPerYr: 0.015, preindustrialPpt: 0 },
  c_c4f8: { ppt2019: 1.75, trendPptPerYr: 0.06, preindustrialPpt: 0 },
  c4f10: { ppt2019: 0.2, trendPptPerYr: 0.002, preindustrialPpt: 0 },
  c5f12: { ppt2019: 0.15, trendPptPerYr: 0.002, preindustrialPpt: 0 },
  c6f14: { ppt2019: 0.28, trendPptPerYr: 0.002, preindustrialPpt: 0 },
  sf6: { ppt2019: 10.0, trendPptPerYr: 0.3, preindustrialPpt: 0 },
  nf3: { ppt2019: 2.05, trendPptPerYr: 0.15, preindustrialPpt: 0 },
  so2f2: { ppt2019: 2.5, trendPptPerYr: 0.1, preindustrialPpt: 0 },
  cfc11: { ppt2019: 226.2, trendPptPerYr: -1.3, preindustrialPpt: 0 },
  cfc12: { ppt2019: 503.1, trendPptPerYr: -3.2, preindustrialPpt: 0 },
  cfc113: { ppt2019: 69.8, trendPptPerYr: -0.6, preindustrialPpt: 0 },
  cfc114: { ppt2019: 16.0, trendPptPerYr: 0, preindustrialPpt: 0 },
  cfc115: { ppt2019: 8.7, trendPptPerYr: 0.03, preindustrialPpt: 0 },
  hcfc22: { ppt2019: 246.8, trendPptPerYr: 3.0, preindustrialPpt: 0 },
  hcfc141b: { ppt2019: 24.4, trendPptPerYr: 0.2, preindustrialPpt: 0 },
  hcfc142b: { ppt2019: 22.3, trendPptPerYr: -0.1, preindustrialPpt: 0 },
  ccl4: { ppt2019: 77.9, trendPptPerYr: -1.0, preindustrialPpt: 0 },
  ch3ccl3: { ppt2019: 1.6, trendPptPerYr: -0.3, preindustrialPpt: 0 },
  halon1211: { ppt2019: 3.2, trendPptPerYr: -0.07, preindustrialPpt: 0 },
  halon1301: { ppt2019: 3.3, trendPptPerYr: 0, preindustrialPpt: 0 },
  halon2402: { ppt2019: 0.41, trendPptPerYr: -0.005, preindustrialPpt: 0 },
  ch3br: { ppt2019: 6.6, trendPptPerYr: -0.05, preindustrialPpt: 5.3 },
  ch3cl: { ppt2019: 540, trendPptPerYr: 0, preindustrialPpt: 457 },
};

/** Year of {@link HALOGEN_PRESENT_DAY}. */
export const HALOGEN_PRESENT_DAY_YEAR = 2019;

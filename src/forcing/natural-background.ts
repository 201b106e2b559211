/**
 * Solar and volcanic effective radiative forcing, W m-2, that a pathway carries after the history
 * ends when it gives no values of its own: the means over 1850-1900 of the IPCC AR6 WG1 Annex III
 * series (pathways/records/ar6-erf-1750-2019.csv; test/reference/ar6-erf-history.test.ts recomputes
 * them from the record). Both series are relative to long pre-industrial means, as AR6 defines them,
 * so volcanic forcing is about +0.2 W m-2 in years without eruptions and 1850-1900's eruptions bring
 * its mean down to +0.035.
 *
 * Why 1850-1900: warming is reported relative to 1850-1900, IPCC AR6's stand-in for pre-industrial,
 * so futures that carry that period's natural forcing add no natural offset to their warming. It
 * stands for eruptions at the rate of that period and a Sun at that period's mean activity, neither
 * a quiet stratosphere (a warm bias of about 0.2 W m-2) nor the last solar cycle's phase.
 */
export const NATURAL_BACKGROUND_WM2 = {
  solar_wm2: -0.0127,
  volcanic_wm2: 0.0350,
} as const;

/** The years NATURAL_BACKGROUND_WM2 averages, inclusive. */
export const NATURAL_BACKGROUND_YEARS = [1850, 1900] as const;

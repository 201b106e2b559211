/**
 * Builds `pathways/history.csv`: the annual record, 1750-2024, that every run starts from (pre-industrial
 * equilibrium in 1750) and that future pathways are spliced onto. Columns: global-mean CO2 (ppm), CH4
 * and N2O (ppb), and prescribed effective radiative forcing (ERF, W m-2 relative to 1750) for aerosols,
 * other agents, the Sun and volcanoes.
 *
 * How it is built:
 * - Gases: anchor tables (year -> value) interpolated onto every year with a monotone cubic (Steffen
 *   1990, A&A 239, 443): the curve passes through every anchor and never overshoots between two, so
 *   growth rates stay smooth and no spurious dip or bump appears. Before the instrumental records the
 *   anchors are the Law Dome ice-core spline (MacFarling Meure et al. 2006), pinned to the AR6 1750
 *   values and, at the join, to the first instrumental value by a correction that ramps linearly in time.
 * - Aerosol and other forcing: anchor tables (mostly from memory of assessment figures) interpolated the
 *   same way; "other" is the sum of six component tables.
 * - Solar and volcanic forcing: built from a table of solar cycles and a table of eruptions, evaluated
 *   monthly and averaged over each calendar year.
 *
 * Every value carries its origin beside it: "seen" = read in (a copy of) the published data file named;
 * "REFERENCES.md" = the project's page of published values, with its status; "from memory" = recalled,
 * unverified; "derived" = computed here from the others. Values are approximate; see pathways/README.md.
 *
 * Usage: node dist/scripts/build-history.js [output.csv]   (default: pathways/history.csv under the
 * current directory). Deterministic: the same source always writes the same bytes.
 */
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';

/** A (year, value) pair; the year is a calendar year, the value that year's annual mean. */
type Anchor = readonly [year: number, value: number];

const FIRST_YEAR = 1750;
const LAST_YEAR = 2024;

// ---------------------------------------------------------------------------------------------------
// Gases before the instrumental records: Law Dome, Antarctica, 20-year smoothing spline.
// MacFarling Meure et al. 2006, GRL 33, L14810, data file law2006 (CO2 in ppm; CH4 in ppb on the
// NOAA04 scale; N2O in ppb). All values: seen (copy of the data file, annual spline columns).
// ---------------------------------------------------------------------------------------------------

/** Law Dome CO2 spline, ppm, read every 10 years (signal well above the ~1 ppm spline noise). */
const LAW_DOME_CO2: readonly Anchor[] = [
  [1750, 276.8], [1760, 276.5], [1770, 277.3], [1780, 278.2], [1790, 280.0],
  [1800, 282.6], [1810, 284.2], [1820, 283.3], [1830, 283.9], [1840, 284.0],
  [1850, 286.8], [1860, 286.1], [1870, 287.9], [1880, 289.8], [1890, 293.0],
  [1900, 296.1], [1910, 299.3], [1920, 303.4], [1930, 306.6], [1940, 310.5],
  [1950, 311.2], [1955, 313.5],
];
/** Law Dome CO2 spline in 1959, ppm (seen); used only to pin the join with Mauna Loa. */
const LAW_DOME_CO2_1959 = 315.7;

/** Law Dome CH4 spline (NOAA04 scale), ppb, every 10 years. */
const LAW_DOME_CH4: readonly Anchor[] = [
  [1750, 705.3], [1760, 708.5], [1770, 722.8], [1780, 726.9], [1790, 727.1],
  [1800, 735.5], [1810, 744.2], [1820, 748.5], [1830, 763.9], [1840, 775.2],
  [1850, 793.3], [1860, 795.8], [1870, 817.5], [1880, 836.6], [1890, 852.0],
  [1900, 875.6], [1910, 923.6], [1920, 969.0], [1930, 1023.5], [1940, 1075.7],
  [1950, 1117.3], [1960, 1220.3], [1970, 1357.6], [1980, 1513.6],
];
/** Law Dome CH4 spline in 1984, ppb (seen); used only to pin the join with the NOAA global mean. */
const LAW_DOME_CH4_1984 = 1579.6;

/**
 * Law Dome N2O spline, ppb. Read every 25 years before 1950: the ice-core precision (6.5 ppb, 1 sigma,
 * per the data file) makes decadal wiggles of +/-2 ppb in the spline noise rather than signal.
 */
const LAW_DOME_N2O: readonly Anchor[] = [
  [1750, 271.2], [1775, 273.1], [1800, 272.6], [1825, 274.1], [1850, 270.4],
  [1875, 274.7], [1900, 277.2], [1925, 284.2], [1950, 287.7], [1960, 292.3],
  [1970, 295.2], [1980, 302.6], [1990, 307.7], [2000, 315.4],
];
/** Law Dome N2O spline in 2001, ppb (seen); used only to pin the join with the NOAA global mean. */
const LAW_DOME_N2O_2001 = 316.2;

/** AR6 WG1 1750 concentrations (REFERENCES.md, status M✓: reproduce AR6's 1750-2019 ERF). */
const AR6_1750 = { co2Ppm: 278.3, ch4Ppb: 729.2, n2oPpb: 270.1 } as const;

// ---------------------------------------------------------------------------------------------------
// Gases from the instrumental records.
// ---------------------------------------------------------------------------------------------------

/**
 * Mauna Loa CO2 annual means, ppm, 1959-1978 (NOAA GML / Scripps, co2_annmean_mlo, WMO X2019 scale;
 * seen). Used as the global mean before the NOAA global series starts: over 1979-1981 the two differ by
 * -0.15 to +0.01 ppm (derived from the two files). REFERENCES.md lists 1959 as 315.97 (an older file
 * version); this version reads 315.98.
 */
const MAUNA_LOA_CO2: readonly Anchor[] = [
  [1959, 315.98], [1960, 316.91], [1961, 317.64], [1962, 318.45], [1963, 318.99],
  [1964, 319.62], [1965, 320.04], [1966, 321.37], [1967, 322.18], [1968, 323.05],
  [1969, 324.62], [1970, 325.68], [1971, 326.32], [1972, 327.46], [1973, 329.68],
  [1974, 330.19], [1975, 331.13], [1976, 332.03], [1977, 333.84], [1978, 335.41],
];

/**
 * NOAA GML global marine-surface CO2 annual means, ppm, 1979-2024 (co2_annmean_gl; seen). The 2019
 * value, 410.07, matches AR6's 410.1 (REFERENCES.md). The last year is preliminary in NOAA's file.
 */
const NOAA_GLOBAL_CO2: readonly Anchor[] = [
  [1979, 336.86], [1980, 338.91], [1981, 340.11], [1982, 340.85], [1983, 342.53],
  [1984, 344.07], [1985, 345.54], [1986, 346.97], [1987, 348.68], [1988, 351.16],
  [1989, 352.79], [1990, 354.06], [1991, 355.40], [1992, 356.09], [1993, 356.83],
  [1994, 358.33], [1995, 360.18], [1996, 361.93], [1997, 363.04], [1998, 365.70],
  [1999, 367.79], [2000, 368.96], [2001, 370.57], [2002, 372.58], [2003, 375.14],
  [2004, 376.95], [2005, 378.98], [2006, 381.16], [2007, 382.90], [2008, 385.02],
  [2009, 386.50], [2010, 388.75], [2011, 390.62], [2012, 392.65], [2013, 395.40],
  [2014, 397.34], [2015, 399.65], [2016, 403.07], [2017, 405.21], [2018, 407.62],
  [2019, 410.07], [2020, 412.44], [2021, 414.70], [2022, 417.08], [2023, 419.37],
  [2024, 422.80],
];

/**
 * NOAA GML global CH4 annual means, ppb, 1984-2023 (ch4_annmean_gl; seen), then 2024 from memory
 * (about 1930, +/-3 ppb). The 2019 value, 1866.58, matches AR6's 1866.3 (REFERENCES.md) within 0.3 ppb.
 */
const NOAA_GLOBAL_CH4: readonly Anchor[] = [
  [1984, 1644.84], [1985, 1657.29], [1986, 1670.09], [1987, 1682.70], [1988, 1693.21],
  [1989, 1704.52], [1990, 1714.47], [1991, 1724.76], [1992, 1735.48], [1993, 1736.48],
  [1994, 1742.05], [1995, 1748.88], [1996, 1751.30], [1997, 1754.51], [1998, 1765.53],
  [1999, 1772.30], [2000, 1773.22], [2001, 1771.29], [2002, 1772.66], [2003, 1777.33],
  [2004, 1777.02], [2005, 1774.25], [2006, 1774.94], [2007, 1781.38], [2008, 1787.01],
  [2009, 1793.54], [2010, 1798.89], [2011, 1803.08], [2012, 1808.12], [2013, 1813.43],
  [2014, 1822.54], [2015, 1834.21], [2016, 1843.12], [2017, 1849.58], [2018, 1857.34],
  [2019, 1866.58], [2020, 1878.72], [2021, 1894.80], [2022, 1910.92], [2023, 1921.70],
  [2024, 1930.0], // from memory
];

/**
 * NOAA GML global N2O annual means, ppb, 2001-2023 (n2o_annmean_gl; seen), then 2024 from memory
 * (about 337.8, +/-0.3 ppb). The 2019 value, 331.88, sits 0.22 ppb below AR6's multi-network 332.1.
 */
const NOAA_GLOBAL_N2O: readonly Anchor[] = [
  [2001, 316.36], [2002, 316.94], [2003, 317.63], [2004, 318.26], [2005, 318.91],
  [2006, 319.82], [2007, 320.44], [2008, 321.50], [2009, 322.27], [2010, 323.19],
  [2011, 324.21], [2012, 325.05], [2013, 325.94], [2014, 327.09], [2015, 328.17],
  [2016, 328.95], [2017, 329.74], [2018, 330.91], [2019, 331.88], [2020, 333.01],
  [2021, 334.27], [2022, 335.62], [2023, 336.69],
  [2024, 337.8], // from memory
];

// ---------------------------------------------------------------------------------------------------
// Aerosol ERF (aerosol-radiation + aerosol-cloud interactions), W m-2 relative to 1750.
// ---------------------------------------------------------------------------------------------------

const AEROSOL_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition
  [1800, -0.02], // from memory: early biomass and coal burning, small
  [1850, -0.10], // from memory
  [1875, -0.18], // from memory
  [1900, -0.35], // from memory (assessment time series give about -0.3 to -0.4)
  [1920, -0.45], // from memory
  [1940, -0.55], // from memory
  [1950, -0.65], // from memory
  [1960, -0.85], // from memory: rapid post-war growth of SO2 emissions
  [1970, -1.05], // from memory
  [1980, -1.20], // from memory
  [1990, -1.27], // from memory
  [2000, -1.30], // from memory
  [2010, -1.30], // REFERENCES.md (C/M✓): AR6 -1.3 [-2.0 to -0.6] for 1750 to 2005-2014, placed mid-period
  [2015, -1.22], // from memory: falling SO2 emissions, mainly East Asia
  [2019, -1.10], // from memory: AR6 2019 value, about -1.1 (not in REFERENCES.md)
  [2024, -1.00], // from memory: continued SO2 cuts, incl. the 2020 shipping-fuel sulphur limit
];

// ---------------------------------------------------------------------------------------------------
// Other anthropogenic ERF, W m-2 relative to 1750: the sum of the six components below.
// AR6 2019 values: halogenated 0.41, ozone 0.47 (REFERENCES.md, C/M✓); stratospheric water vapour
// 0.05, black carbon on snow 0.08, contrails and aviation cirrus 0.06, land use -0.20 (from memory).
// ---------------------------------------------------------------------------------------------------

/** Halogenated gases (CFCs, HCFCs, HFCs, PFCs, SF6, ...). */
const HALOGENATED_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition (natural CH3Cl/CH3Br are part of the 1750 state)
  [1930, 0.0], // from memory: industrial halocarbons begin in the 1930s
  [1950, 0.008], // from memory
  [1960, 0.025], // from memory
  [1970, 0.08], // from memory
  [1980, 0.19], // from memory
  [1990, 0.30], // from memory
  [2000, 0.35], // from memory: CFC growth stops (Montreal Protocol), HCFC/HFC growth continues
  [2010, 0.38], // from memory
  [2019, 0.41], // REFERENCES.md (C/M✓): AR6 1750-2019
  [2024, 0.42], // from memory: HFC rise slightly exceeds CFC decline
];

/** Tropospheric plus stratospheric ozone. */
const OZONE_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition
  [1850, 0.03], // from memory
  [1900, 0.07], // from memory
  [1920, 0.10], // from memory
  [1950, 0.17], // from memory
  [1960, 0.22], // from memory
  [1970, 0.29], // from memory
  [1980, 0.35], // from memory
  [1990, 0.38], // from memory (stratospheric depletion offsets part of the tropospheric rise)
  [2000, 0.41], // from memory
  [2010, 0.44], // from memory
  [2019, 0.47], // REFERENCES.md (C/M✓): AR6 1750-2019
  [2024, 0.48], // from memory
];

/**
 * Stratospheric water vapour from methane oxidation: 0.05 W m-2 in 2019 (AR6, from memory), taken
 * proportional to the CH4 rise since 1750 (common practice, no source).
 */
const STRAT_WATER_VAPOUR_2019_WM2 = 0.05;
const CH4_2019_PPB = 1866.3; // REFERENCES.md (AR6 2019)

/** Land-use surface albedo (and irrigation). */
const LAND_USE_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition
  [1800, -0.02], // from memory
  [1850, -0.05], // from memory
  [1900, -0.10], // from memory
  [1950, -0.15], // from memory
  [1980, -0.18], // from memory
  [2000, -0.19], // from memory
  [2019, -0.20], // from memory: AR6 -0.20 [-0.30 to -0.10]
  [2024, -0.20], // from memory
];

/** Black carbon deposited on snow and ice. */
const BC_ON_SNOW_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition
  [1850, 0.01], // from memory
  [1900, 0.03], // from memory
  [1950, 0.05], // from memory
  [1970, 0.07], // from memory
  [1990, 0.08], // from memory
  [2019, 0.08], // from memory: AR6 0.08 [0.00 to 0.18]
  [2024, 0.08], // from memory
];

/** Contrails and aviation-induced cirrus. */
const CONTRAILS_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition
  [1940, 0.0], // from memory: negligible before jet aviation
  [1950, 0.002], // from memory
  [1960, 0.006], // from memory
  [1970, 0.015], // from memory
  [1980, 0.022], // from memory
  [1990, 0.030], // from memory
  [2000, 0.040], // from memory
  [2010, 0.048], // from memory
  [2019, 0.057], // from memory: AR6 0.057 [0.019 to 0.098]
  [2020, 0.032], // from memory: air traffic roughly halved in the pandemic year
  [2021, 0.038], // from memory
  [2022, 0.048], // from memory
  [2023, 0.055], // from memory
  [2024, 0.059], // from memory
];

// ---------------------------------------------------------------------------------------------------
// Solar ERF: slow background plus an 11-year cycle, W m-2.
// ---------------------------------------------------------------------------------------------------

/**
 * Slow change of the cycle-mean solar ERF relative to the cycle-mean level around 1750 (from memory:
 * the shape of irradiance reconstructions, a Dalton-minimum dip near 1810 and a rise of about
 * 0.05 W m-2, i.e. about 0.3 W m-2 of total irradiance, through the 19th and 20th centuries).
 */
const SOLAR_BACKGROUND_WM2: readonly Anchor[] = [
  [1750, 0.0], // by definition
  [1790, 0.005], // from memory
  [1810, -0.025], // from memory: Dalton minimum
  [1830, -0.01], // from memory
  [1850, 0.0], // from memory
  [1880, 0.0], // from memory
  [1900, 0.005], // from memory
  [1925, 0.025], // from memory
  [1950, 0.04], // from memory
  [1960, 0.05], // from memory: strong cycles of the mid-20th century
  [1985, 0.05], // from memory
  [2000, 0.045], // from memory
  [2024, 0.035], // from memory: weaker cycles 23-24
];

/**
 * Solar-cycle minima, decimal years (from memory: the sunspot-cycle record; 1744.0 before cycle 1 is
 * less certain, 2030.9 after cycle 25 is assumed as 11 years on). Cycle k runs from minimum k to k+1.
 */
const SOLAR_MINIMA_YEARS: readonly number[] = [
  1744.0, 1755.2, 1766.5, 1775.5, 1784.7, 1798.3, 1810.6, 1823.3, 1833.9, 1843.5, 1855.9, 1867.2,
  1878.9, 1889.6, 1901.7, 1913.6, 1923.6, 1933.8, 1944.2, 1954.3, 1964.9, 1976.5, 1986.8, 1996.4,
  2008.9, 2019.9, 2030.9,
];

/**
 * Peak smoothed sunspot number of each cycle (version-2 numbers, from memory), cycles 0 to 25. Cycle 0
 * (140) is a guess; cycle 25 (160) is its approximate peak in 2024-2025.
 */
const CYCLE_PEAK_SUNSPOTS: readonly number[] = [
  140, 144, 193, 264, 235, 82, 81, 119, 245, 220, 186, 234, 124, 147, 107, 176, 130, 199, 219, 285, 157,
  233, 213, 180, 116, 160,
];

/**
 * Half-amplitude of the cycle's annual-mean ERF for a cycle peaking at 180 sunspots: 0.05 W m-2 (from
 * memory). A direct conversion of a ~0.9 W m-2 annual-mean irradiance swing, ERF = dTSI (1 - 0.29)/4,
 * would give about 0.08, so this amplitude is uncertain by a factor of about 1.5.
 */
const SOLAR_HALF_AMPLITUDE_WM2 = 0.05;
const REFERENCE_CYCLE_SUNSPOTS = 180;

// ---------------------------------------------------------------------------------------------------
// Volcanic ERF: negative spikes relative to a quiescent stratosphere, W m-2.
// ---------------------------------------------------------------------------------------------------

/**
 * Major eruptions: date (decimal year) and the peak annual-mean ERF of the aerosol cloud. All values
 * from memory (ice-core sulphate and optical-depth reconstructions scaled at about -20 W m-2 per unit
 * stratospheric optical depth); uncertain by about +/-30% for the 20th century and +/-50% before.
 * Smaller eruptions, and those after 2000 (together about -0.1 to -0.2 W m-2), are left out.
 */
const ERUPTIONS: readonly {
  name: string;
  dateYear: number;
  peakWm2: number;
  /** Rise and decay time constants, years, where they differ from the defaults below. */
  riseYears?: number;
  decayYears?: number;
}[] = [
  // Laki, a high-latitude fissure eruption: its aerosol stayed mostly in the upper troposphere and
  // lowermost stratosphere and was removed within months (from memory), so it rises and decays faster.
  { name: 'Laki', dateYear: 1783.45, peakWm2: -1.0, riseYears: 0.1, decayYears: 0.4 },
  { name: 'unidentified 1809', dateYear: 1809.0, peakWm2: -2.0 },
  { name: 'Tambora', dateYear: 1815.28, peakWm2: -4.5 },
  { name: 'Babuyan Claro', dateYear: 1831.5, peakWm2: -1.0 },
  { name: 'Cosigüina', dateYear: 1835.05, peakWm2: -1.3 },
  { name: 'Krakatau', dateYear: 1883.65, peakWm2: -2.0 },
  { name: 'Santa María', dateYear: 1902.8, peakWm2: -1.2 }, // with Pelée and Soufrière, 1902
  { name: 'Novarupta', dateYear: 1912.43, peakWm2: -0.6 },
  { name: 'Agung', dateYear: 1963.2, peakWm2: -1.3 },
  { name: 'Fuego', dateYear: 1974.8, peakWm2: -0.4 },
  { name: 'El Chichón', dateYear: 1982.28, peakWm2: -1.5 },
  { name: 'Pinatubo', dateYear: 1991.45, peakWm2: -2.5 }, // annual mean of 1992
];

/**
 * Time shape of a stratospheric aerosol cloud: rises with a 6-month time constant, decays with a
 * 12-month e-folding time, so it peaks about 6.6 months after the eruption (from memory: Pinatubo's
 * global optical depth peaked about 6-9 months after the eruption and decayed with an e-folding time
 * of about a year). The shape itself is common practice, no source.
 */
const VOLCANIC_RISE_YEARS = 0.5;
const VOLCANIC_DECAY_YEARS = 1.0;

// ---------------------------------------------------------------------------------------------------
// Construction.
// ---------------------------------------------------------------------------------------------------

/**
 * Corrects raw anchors so that they hit `startTarget` at `start.year` and `end.target` at `end.year`:
 * an additive offset (or, with `mode: 'ratio'`, a factor) that varies linearly in time between the two
 * pins. Used to put the Antarctic ice-core record onto the global-mean level at both ends.
 */
function pinBetween(
  raw: readonly Anchor[],
  start: { year: number; raw: number; target: number },
  end: { year: number; raw: number; target: number },
  mode: 'offset' | 'ratio',
): Anchor[] {
  const correction = (pin: { raw: number; target: number }) =>
    mode === 'offset' ? pin.target - pin.raw : pin.target / pin.raw;
  const c0 = correction(start);
  const c1 = correction(end);
  return raw.map(([year, value]) => {
    const c = c0 + ((c1 - c0) * (year - start.year)) / (end.year - start.year);
    return [year, mode === 'offset' ? value + c : value * c] as const;
  });
}

/**
 * Monotone cubic interpolation (Steffen 1990, A&A 239, 443, eqs. 11 and 13 for the interior slopes;
 * one-sided secant slopes at the two ends) of `anchors` at each of `years`.
 * Throws if the anchors are not strictly increasing in year or do not cover `years`.
 */
function interpolateMonotone(anchors: readonly Anchor[], years: readonly number[]): Float64Array {
  const n = anchors.length;
  const x = anchors.map((a) => a[0]);
  const y = anchors.map((a) => a[1]);
  for (let i = 1; i < n; i++) {
    if (!(x[i] > x[i - 1])) throw new Error(`anchor years must increase strictly, got ${x[i - 1]} then ${x[i]}`);
  }
  const h = new Float64Array(n - 1);
  const s = new Float64Array(n - 1);
  for (let i = 0; i < n - 1; i++) {
    h[i] = x[i + 1] - x[i];
    s[i] = (y[i + 1] - y[i]) / h[i];
  }
  const slope = new Float64Array(n);
  slope[0] = s[0];
  slope[n - 1] = s[n - 2];
  for (let i = 1; i < n - 1; i++) {
    const p = (s[i - 1] * h[i] + s[i] * h[i - 1]) / (h[i - 1] + h[i]);
    slope[i] =
      (Math.sign(s[i - 1]) + Math.sign(s[i])) * Math.min(Math.abs(s[i - 1]), Math.abs(s[i]), 0.5 * Math.abs(p));
  }
  const out = new Float64Array(years.length);
  let i = 0;
  years.forEach((t, k) => {
    if (t < x[0] || t > x[n - 1]) throw new Error(`year ${t} lies outside the anchors ${x[0]}-${x[n - 1]}`);
    while (i < n - 2 && t > x[i + 1]) i++;
    const u = (t - x[i]) / h[i];
    const u2 = u * u;
    const u3 = u2 * u;
    out[k] =
      (2 * u3 - 3 * u2 + 1) * y[i] +
      (u3 - 2 * u2 + u) * h[i] * slope[i] +
      (-2 * u3 + 3 * u2) * y[i + 1] +
      (u3 - u2) * h[i] * slope[i + 1];
  });
  return out;
}

/** Mean of `f` over calendar year `year`, from its values at the middle of each month. */
function calendarYearMean(f: (t: number) => number, year: number): number {
  let sum = 0;
  for (let month = 0; month < 12; month++) sum += f(year + (month + 0.5) / 12);
  return sum / 12;
}

/** The 11-year cycle part of solar ERF at decimal year `t`, W m-2 (zero mean over each cycle). */
function solarCycleWm2(t: number): number {
  const minima = SOLAR_MINIMA_YEARS;
  const k = minima.findIndex((m, j) => j < minima.length - 1 && t >= m && t < minima[j + 1]);
  if (k < 0) throw new Error(`year ${t} lies outside the solar-cycle table`);
  const phase = (t - minima[k]) / (minima[k + 1] - minima[k]);
  // The amplitude moves linearly between cycle midpoints so that the series stays continuous at minima.
  const midpoint = (j: number) => 0.5 * (minima[j] + minima[j + 1]);
  const last = CYCLE_PEAK_SUNSPOTS.length - 1;
  const j0 = t < midpoint(k) ? Math.max(k - 1, 0) : k;
  const j1 = Math.min(j0 + 1, last);
  const w = j1 === j0 ? 0 : Math.min(Math.max((t - midpoint(j0)) / (midpoint(j1) - midpoint(j0)), 0), 1);
  const sunspots = CYCLE_PEAK_SUNSPOTS[j0] * (1 - w) + CYCLE_PEAK_SUNSPOTS[j1] * w;
  return -SOLAR_HALF_AMPLITUDE_WM2 * (sunspots / REFERENCE_CYCLE_SUNSPOTS) * Math.cos(2 * Math.PI * phase);
}

/** Unscaled aerosol-cloud shape, `dt` years after an eruption, for the given time constants (years). */
function volcanicShape(dt: number, riseYears: number, decayYears: number): number {
  if (dt <= 0) return 0;
  return (1 - Math.exp(-dt / riseYears)) * Math.exp(-dt / decayYears);
}

/** Annual-mean volcanic ERF for each of `years`, each eruption scaled to its peak annual mean. */
function volcanicWm2(years: readonly number[]): Float64Array {
  const out = new Float64Array(years.length);
  for (const eruption of ERUPTIONS) {
    const rise = eruption.riseYears ?? VOLCANIC_RISE_YEARS;
    const decay = eruption.decayYears ?? VOLCANIC_DECAY_YEARS;
    const shape = years.map((year) => calendarYearMean((t) => volcanicShape(t - eruption.dateYear, rise, decay), year));
    const scale = eruption.peakWm2 / Math.max(...shape);
    shape.forEach((v, k) => (out[k] += scale * v));
  }
  return out;
}

/** Formats a number with fixed decimals, without a "-0.000" for values that round to zero. */
function fixed(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  return Number(text) === 0 ? (0).toFixed(decimals) : text;
}

function buildHistory(): { header: string[]; columns: [string, Float64Array, number][]; years: number[] } {
  const years = Array.from({ length: LAST_YEAR - FIRST_YEAR + 1 }, (_, k) => FIRST_YEAR + k);

  const co2Anchors = [
    ...pinBetween(
      LAW_DOME_CO2,
      { year: 1750, raw: LAW_DOME_CO2[0][1], target: AR6_1750.co2Ppm },
      { year: 1959, raw: LAW_DOME_CO2_1959, target: MAUNA_LOA_CO2[0][1] },
      'offset',
    ),
    ...MAUNA_LOA_CO2,
    ...NOAA_GLOBAL_CO2,
  ];
  // CH4 is not well mixed between the hemispheres: the Antarctic record sits a few per cent below the
  // global mean, so it is scaled (not shifted) onto the global level.
  const ch4Anchors = [
    ...pinBetween(
      LAW_DOME_CH4,
      { year: 1750, raw: LAW_DOME_CH4[0][1], target: AR6_1750.ch4Ppb },
      { year: 1984, raw: LAW_DOME_CH4_1984, target: NOAA_GLOBAL_CH4[0][1] },
      'ratio',
    ),
    ...NOAA_GLOBAL_CH4,
  ];
  const n2oAnchors = [
    ...pinBetween(
      LAW_DOME_N2O,
      { year: 1750, raw: LAW_DOME_N2O[0][1], target: AR6_1750.n2oPpb },
      { year: 2001, raw: LAW_DOME_N2O_2001, target: NOAA_GLOBAL_N2O[0][1] },
      'offset',
    ),
    ...NOAA_GLOBAL_N2O,
  ];

  const co2 = interpolateMonotone(co2Anchors, years);
  const ch4 = interpolateMonotone(ch4Anchors, years);
  const n2o = interpolateMonotone(n2oAnchors, years);
  const aerosol = interpolateMonotone(AEROSOL_WM2, years);

  const components = [HALOGENATED_WM2, OZONE_WM2, LAND_USE_WM2, BC_ON_SNOW_WM2, CONTRAILS_WM2].map((table) =>
    interpolateMonotone(table, years),
  );
  const other = years.map(
    (_, k) =>
      components.reduce((sum, series) => sum + series[k], 0) +
      (STRAT_WATER_VAPOUR_2019_WM2 * (ch4[k] - AR6_1750.ch4Ppb)) / (CH4_2019_PPB - AR6_1750.ch4Ppb),
  );

  const solarBackground = interpolateMonotone(SOLAR_BACKGROUND_WM2, years);
  const solar = years.map((year, k) => solarBackground[k] + calendarYearMean(solarCycleWm2, year));
  const volcanic = volcanicWm2(years);

  const header = [
    '# name: Historical record 1750-2024',
    '# description: Annual global-mean CO2, CH4 and N2O and prescribed effective radiative forcing (W m-2 relative to 1750), the record every run starts from and future pathways are spliced onto.',
    '# note: Values are approximate. Gases: Law Dome ice-core spline (MacFarling Meure et al. 2006) pinned to AR6 1750 values, then Mauna Loa and NOAA global annual means. Forcing: anchor values recalled from assessment figures (IPCC AR6), interpolated. Origins and uncertainties of every anchor: pathways/README.md.',
    '# built-by: scripts/build-history.ts',
    '# rows: calendar-year means; solar_wm2 is relative to the cycle-mean level around 1750; volcanic_wm2 is relative to a quiescent stratosphere (zero between eruptions).',
  ];
  const columns: [string, Float64Array, number][] = [
    ['co2_ppm', co2, 2],
    ['ch4_ppb', ch4, 2],
    ['n2o_ppb', n2o, 2],
    ['aerosol_wm2', aerosol, 4],
    ['other_wm2', Float64Array.from(other), 4],
    ['solar_wm2', Float64Array.from(solar), 4],
    ['volcanic_wm2', volcanic, 4],
  ];
  return { header, columns, years };
}

function toCsv({ header, columns, years }: ReturnType<typeof buildHistory>): string {
  const lines = [...header, ['year', ...columns.map(([name]) => name)].join(',')];
  years.forEach((year, k) => {
    lines.push([String(year), ...columns.map(([, series, decimals]) => fixed(series[k], decimals))].join(','));
  });
  return lines.join('\n') + '\n';
}

const history = buildHistory();
const outPath = resolve(process.argv[2] ?? 'pathways/history.csv');
writeFileSync(outPath, toCsv(history));

const volcanic = history.columns.find(([name]) => name === 'volcanic_wm2')![1];
const meanVolcanic = volcanic.reduce((a, b) => a + b, 0) / volcanic.length;
console.log(`wrote ${outPath}: ${history.years.length} years, ${history.years[0]}-${history.years.at(-1)}`);
for (const year of [1750, 1850, 1900, 1950, 1992, 2019, 2024]) {
  const k = year - FIRST_YEAR;
  console.log(`${year} ` + history.columns.map(([name, series, d]) => `${name}=${fixed(series[k], d)}`).join(' '));
}
console.log(`mean volcanic_wm2 over the record: ${meanVolcanic.toFixed(4)} W m-2`);

// Try: npx tsc -p tsconfig.build.json && node dist/scripts/build-history.js

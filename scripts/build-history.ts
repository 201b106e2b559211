/**
 * Builds `pathways/history.csv`, the annual record 1750-2024 that every run starts from (pre-industrial
 * equilibrium in 1750) and that future pathways are spliced onto, from the bundled IPCC AR6 WG1
 * Annex III effective radiative forcing (pathways/records/ar6-erf-1750-2019.csv; Smith et al. 2021,
 * CC-BY 4.0) and the observed greenhouse-gas concentrations below.
 *
 * What it writes, year by year:
 * - CO2 (ppm), CH4 and N2O (ppb): the observed annual means of the instrumental records (Mauna Loa CO2
 *   from 1959, NOAA global means of CO2 from 1979, CH4 from 1984, N2O from 2001). Before each record
 *   starts, the concentration that gives AR6's ERF of that gas through warmcast's AR6 formulas
 *   (src/forcing), found by inverting the three formulas together: AR6's own record in ppm. (An
 *   ice-core spline read directly, Law Dome, puts CO2 forcing up to 0.054 W m-2 away from AR6's in
 *   1808, as AR6 follows its own merged reconstruction; the issue's tolerance is 0.03.)
 * - Every other agent as its own column (W m-2): AR6's best estimate, 1750-2019, as in the record, and
 *   2020-2024 by a rule per agent (EXTENSION_RULES below). Volcanic and solar keep AR6's convention:
 *   relative to long pre-industrial means, so volcanic forcing is positive between eruptions.
 *
 * The output is deterministic; test/scripts/build-history.test.ts checks that it reproduces the
 * bundled file, and test/reference/ar6-erf-history.test.ts that the history's forcing by agent equals
 * the record's. Usage: node dist/scripts/build-history.js [records-folder] [output.csv]
 * (defaults: pathways/records and pathways/history.csv under the current directory).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ch4ErfAr6 } from '../src/forcing/ch4.js';
import { co2ErfAr6 } from '../src/forcing/co2.js';
import { PREINDUSTRIAL } from '../src/forcing/constants.js';
import { n2oErfAr6 } from '../src/forcing/n2o.js';
import { findRoot } from '../src/numerics/find-root.js';

/** A (year, value) pair of an annual-mean record. */
type Annual = readonly [year: number, value: number];

const FIRST_YEAR = 1750;
const LAST_AR6_YEAR = 2019;
const LAST_YEAR = 2024;

// ---------------------------------------------------------------------------------------------------
// Observed concentrations (annual means), the series the history held before this script read AR6.
// ---------------------------------------------------------------------------------------------------

/**
 * Mauna Loa CO2 annual means, ppm, 1959-1978 (NOAA GML / Scripps, co2_annmean_mlo, WMO X2019 scale;
 * seen). Used as the global mean before the NOAA global series starts: over 1979-1981 the two differ by
 * -0.15 to +0.01 ppm.
 */
const MAUNA_LOA_CO2: readonly Annual[] = [
  [1959, 315.98], [1960, 316.91], [1961, 317.64], [1962, 318.45], [1963, 318.99],
  [1964, 319.62], [1965, 320.04], [1966, 321.37], [1967, 322.18], [1968, 323.05],
  [1969, 324.62], [1970, 325.68], [1971, 326.32], [1972, 327.46], [1973, 329.68],
  [1974, 330.19], [1975, 331.13], [1976, 332.03], [1977, 333.84], [1978, 335.41],
];

/** NOAA GML global marine-surface CO2 annual means, ppm, 1979-2024 (co2_annmean_gl; seen; 2024 preliminary). */
const NOAA_GLOBAL_CO2: readonly Annual[] = [
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

/** NOAA GML global CH4 annual means, ppb, 1984-2023 (ch4_annmean_gl; seen), then 2024 from memory (about 1930, +/-3 ppb). */
const NOAA_GLOBAL_CH4: readonly Annual[] = [
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

/** NOAA GML global N2O annual means, ppb, 2001-2023 (n2o_annmean_gl; seen), then 2024 from memory (about 337.8, +/-0.3 ppb). */
const NOAA_GLOBAL_N2O: readonly Annual[] = [
  [2001, 316.36], [2002, 316.94], [2003, 317.63], [2004, 318.26], [2005, 318.91],
  [2006, 319.82], [2007, 320.44], [2008, 321.50], [2009, 322.27], [2010, 323.19],
  [2011, 324.21], [2012, 325.05], [2013, 325.94], [2014, 327.09], [2015, 328.17],
  [2016, 328.95], [2017, 329.74], [2018, 330.91], [2019, 331.88], [2020, 333.01],
  [2021, 334.27], [2022, 335.62], [2023, 336.69],
  [2024, 337.8], // from memory
];

// ---------------------------------------------------------------------------------------------------
// The prescribed agents: AR6 record column and the rule that carries it from 2019 to 2024.
// ---------------------------------------------------------------------------------------------------

/** How an agent is carried from the record's last year (2019) to 2024. */
type ExtensionRule =
  | { kind: 'trend'; years: readonly [number, number] }
  | { kind: 'ch4-ratio' }
  | { kind: 'activity'; relativeTo2019: readonly number[] }
  | { kind: 'cycle-repeat'; period: number }
  | { kind: 'mean'; years: readonly [number, number] };

/** Output column, record column and extension rule of each prescribed agent, in output order. */
const PRESCRIBED: readonly { column: string; record: string; rule: ExtensionRule; says: string }[] = [
  { column: 'other_ghg_wm2', record: 'other_wmghg', rule: { kind: 'trend', years: [2010, 2019] }, says: 'least-squares trend of 2010-2019 continued from the 2019 value' },
  { column: 'ozone_wm2', record: 'o3', rule: { kind: 'trend', years: [2010, 2019] }, says: 'least-squares trend of 2010-2019 continued from the 2019 value' },
  { column: 'strat_h2o_wm2', record: 'h2o_stratospheric', rule: { kind: 'ch4-ratio' }, says: 'AR6\'s fixed ratio to the CH4 ERF (0.05 / 0.544 in every year of the record), applied to the CH4 ERF of the observed CH4' },
  {
    column: 'contrails_wm2', record: 'contrails',
    // Global air traffic relative to 2019: about 0.56, 0.66, 0.84, 0.96, 1.03 (from memory: pandemic and recovery).
    rule: { kind: 'activity', relativeTo2019: [0.56, 0.66, 0.84, 0.96, 1.03] },
    says: 'the 2019 value times air traffic relative to 2019: 0.56, 0.66, 0.84, 0.96, 1.03 for 2020-2024 (from memory)',
  },
  { column: 'aerosol_ari_wm2', record: 'aerosol-radiation_interactions', rule: { kind: 'trend', years: [2010, 2019] }, says: 'least-squares trend of 2010-2019 continued from the 2019 value' },
  { column: 'aerosol_aci_wm2', record: 'aerosol-cloud_interactions', rule: { kind: 'trend', years: [2010, 2019] }, says: 'least-squares trend of 2010-2019 continued from the 2019 value' },
  { column: 'bc_snow_wm2', record: 'bc_on_snow', rule: { kind: 'trend', years: [2010, 2019] }, says: 'least-squares trend of 2010-2019 continued from the 2019 value' },
  { column: 'land_use_wm2', record: 'land_use', rule: { kind: 'trend', years: [2010, 2019] }, says: 'least-squares trend of 2010-2019 continued from the 2019 value' },
  // Solar cycle 24 ran from the minimum of late 2008 to that of late 2019 (from memory), so 2020-2024
  // repeat 2009-2013; cycle 25 has been stronger (from memory), so 2022-2024 are likely low by a few hundredths.
  { column: 'solar_wm2', record: 'solar', rule: { kind: 'cycle-repeat', period: 11 }, says: 'solar cycle 24 repeated: 2020-2024 take the values of 2009-2013, 11 years (one cycle, minimum to minimum) earlier' },
  { column: 'volcanic_wm2', record: 'volcanic', rule: { kind: 'mean', years: [2010, 2019] }, says: 'held at the 2010-2019 mean, the background of a decade of small eruptions (the record\'s 2019 repeats 2018)' },
];

/** The ERF record as columns of numbers by header name, with its years. */
interface ErfRecord {
  years: number[];
  columns: Record<string, number[]>;
}

/** Parses the AR6 ERF CSV (a header row, then one row of numbers per year). */
export function parseErfRecord(text: string): ErfRecord {
  const lines = text.trim().split(/\r?\n/);
  const header = lines[0].split(',');
  const columns: Record<string, number[]> = Object.fromEntries(header.map((h) => [h, [] as number[]]));
  for (const line of lines.slice(1)) {
    const cells = line.split(',').map(Number);
    header.forEach((h, j) => columns[h].push(cells[j]));
  }
  return { years: columns[header[0]], columns };
}

/** One annual series of the record, 1750-2019, checked to be complete. */
function recordSeries(record: ErfRecord, name: string): number[] {
  const series = record.columns[name];
  if (!series) throw new Error(`the ERF record has no column ${name}`);
  if (record.years[0] !== FIRST_YEAR || record.years[record.years.length - 1] !== LAST_AR6_YEAR || record.years.length !== LAST_AR6_YEAR - FIRST_YEAR + 1) {
    throw new Error(`the ERF record must run from ${FIRST_YEAR} to ${LAST_AR6_YEAR}, one row a year`);
  }
  return series;
}

/**
 * Concentrations (ppm, ppb, ppb) whose ERF through warmcast's AR6 formulas equals the given CO2, CH4 and
 * N2O ERF: each formula solved for its own gas with the others held, repeated until nothing moves
 * (the band overlaps couple the three only weakly, so a few rounds settle to 1e-9).
 */
export function concentrationsForErf(co2Wm2: number, ch4Wm2: number, n2oWm2: number): [number, number, number] {
  let c: number = PREINDUSTRIAL.co2Ppm;
  let m: number = PREINDUSTRIAL.ch4Ppb;
  let n: number = PREINDUSTRIAL.n2oPpb;
  for (let round = 0; round < 20; round++) {
    const before = [c, m, n];
    n = findRoot((x) => n2oErfAr6(x, c, m) - n2oWm2, 200, 400, 1e-10);
    c = findRoot((x) => co2ErfAr6(x, n) - co2Wm2, 200, 600, 1e-10);
    m = findRoot((x) => ch4ErfAr6(x, n) - ch4Wm2, 400, 3000, 1e-10);
    if (Math.abs(c - before[0]) < 1e-9 && Math.abs(m - before[1]) < 1e-9 && Math.abs(n - before[2]) < 1e-9) break;
  }
  return [c, m, n];
}

/** A year's observed value from a table of annual means, or undefined before the table starts. */
function observed(table: readonly Annual[], year: number): number | undefined {
  return table.find(([y]) => y === year)?.[1];
}

/** Least-squares slope of a series over the given years (inclusive), per year. */
function trendPerYear(years: number[], values: number[], [from, to]: readonly [number, number]): number {
  const xs: number[] = [];
  const ys: number[] = [];
  years.forEach((y, i) => {
    if (y >= from && y <= to) {
      xs.push(y);
      ys.push(values[i]);
    }
  });
  const mx = xs.reduce((a, b) => a + b, 0) / xs.length;
  const my = ys.reduce((a, b) => a + b, 0) / ys.length;
  let sxy = 0;
  let sxx = 0;
  xs.forEach((x, i) => {
    sxy += (x - mx) * (ys[i] - my);
    sxx += (x - mx) * (x - mx);
  });
  return sxy / sxx;
}

/** The values of one prescribed agent for 2020-2024 by its rule. */
function extend(rule: ExtensionRule, years: number[], values: number[], ch4ErfByYear: (year: number) => number, ch4Record2019: number): number[] {
  const last = values[values.length - 1];
  const out: number[] = [];
  for (let year = LAST_AR6_YEAR + 1; year <= LAST_YEAR; year++) {
    const ahead = year - LAST_AR6_YEAR;
    switch (rule.kind) {
      case 'trend':
        out.push(last + ahead * trendPerYear(years, values, rule.years));
        break;
      case 'ch4-ratio':
        out.push((last / ch4Record2019) * ch4ErfByYear(year));
        break;
      case 'activity':
        out.push(last * rule.relativeTo2019[ahead - 1]);
        break;
      case 'cycle-repeat':
        out.push(values[years.indexOf(year - rule.period)]);
        break;
      case 'mean': {
        const [from, to] = rule.years;
        const inSpan = values.filter((_, i) => years[i] >= from && years[i] <= to);
        out.push(inSpan.reduce((a, b) => a + b, 0) / inSpan.length);
        break;
      }
    }
  }
  return out;
}

/** The extension rule of each prescribed column, as the README states it. */
export const EXTENSION_RULES: Readonly<Record<string, string>> = Object.fromEntries(PRESCRIBED.map((p) => [p.column, p.says]));

/**
 * The text of history.csv built from the AR6 ERF record's CSV text.
 *
 * @param erfCsv contents of pathways/records/ar6-erf-1750-2019.csv
 * @returns the CSV text (comment lines, header, one row per year 1750-2024)
 */
export function buildHistoryCsv(erfCsv: string): string {
  const record = parseErfRecord(erfCsv);
  const years = record.years;
  const co2Erf = recordSeries(record, 'co2');
  const ch4Erf = recordSeries(record, 'ch4');
  const n2oErf = recordSeries(record, 'n2o');

  const rows: string[] = [];
  const ch4ErfOfYear = new Map<number, number>();
  const gases = new Map<number, [number, number, number]>();
  for (let year = FIRST_YEAR; year <= LAST_YEAR; year++) {
    const i = year - FIRST_YEAR;
    const implied = year <= LAST_AR6_YEAR ? concentrationsForErf(co2Erf[i], ch4Erf[i], n2oErf[i]) : undefined;
    const c = observed(year < 1979 ? MAUNA_LOA_CO2 : NOAA_GLOBAL_CO2, year) ?? implied![0];
    const m = observed(NOAA_GLOBAL_CH4, year) ?? implied![1];
    const n = observed(NOAA_GLOBAL_N2O, year) ?? implied![2];
    // The columns are written to 2 decimals; the forcing a run computes is that of the written values.
    const written: [number, number, number] = [round(c, 2), round(m, 2), round(n, 2)];
    gases.set(year, written);
    ch4ErfOfYear.set(year, ch4ErfAr6(written[1], written[2]));
  }

  const prescribed = PRESCRIBED.map(({ record: name, rule }) => {
    const values = recordSeries(record, name);
    return [...values, ...extend(rule, years, values, (y) => ch4ErfOfYear.get(y)!, ch4Erf[ch4Erf.length - 1])];
  });

  for (let year = FIRST_YEAR; year <= LAST_YEAR; year++) {
    const i = year - FIRST_YEAR;
    const [c, m, n] = gases.get(year)!;
    rows.push([year, c.toFixed(2), m.toFixed(2), n.toFixed(2), ...prescribed.map((v) => v[i].toFixed(5))].join(','));
  }
  const header = ['year', 'co2_ppm', 'ch4_ppb', 'n2o_ppb', ...PRESCRIBED.map((p) => p.column)].join(',');
  return [
    '# name: Historical record 1750-2024',
    '# description: Annual global-mean CO2, CH4 and N2O and prescribed effective radiative forcing by agent (W m-2), the record every run starts from and future pathways are spliced onto.',
    '# note: Forcing 1750-2019 is the IPCC AR6 WG1 Annex III best estimate (Smith et al. 2021, CC-BY 4.0; pathways/records/); 2020-2024 extended by a rule per agent. Solar and volcanic forcing are relative to long pre-industrial means as in AR6 (volcanic is positive between eruptions). Gases: observed annual means (Mauna Loa from 1959, NOAA global CO2 from 1979, CH4 from 1984, N2O from 2001), before that the concentrations that give AR6\'s gas ERF. Written by scripts/build-history.ts; origins of every column: pathways/README.md.',
    header,
    ...rows,
    '',
  ].join('\n');
}

function round(x: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(x * f) / f;
}

function main(argv: string[]): void {
  const recordsDir = resolve(argv[0] ?? join('pathways', 'records'));
  const output = resolve(argv[1] ?? join('pathways', 'history.csv'));
  const text = buildHistoryCsv(readFileSync(join(recordsDir, 'ar6-erf-1750-2019.csv'), 'utf8'));
  writeFileSync(output, text);
  console.log(`wrote ${output} (${text.split('\n').length - 5} years)`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) main(process.argv.slice(2));

// Try: npx tsc -p tsconfig.build.json && node dist/scripts/build-history.js && git diff --stat pathways/history.csv

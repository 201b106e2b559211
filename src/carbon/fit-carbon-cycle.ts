import type { ClimateParams } from '../climate/params.js';
import type { Pathway } from '../pathway.js';
import { runEmissionDriven } from './run-emission-driven.js';
import { GTCO2_PER_GTC } from './units.js';
import { MILLAR_2017, type CarbonCycleParams } from './uptake-feedback.js';

/**
 * The published totals the carbon cycle is fitted to, each with the uncertainty that weighs it.
 * - CO2 emitted 1850-2019: 2390 +/- 240 Gt CO2 (IPCC AR6 WG1 SPM, B.5.1; from memory; the +/- is
 *   AR6's likely range, taken as one standard deviation).
 * - Mean CO2 emissions 2010-2019: fossil 9.6 + land-use change 1.6 Gt C yr-1 = 11.2 Gt C yr-1 =
 *   41.0 Gt CO2 yr-1 (Global Carbon Budget, Friedlingstein et al. 2020/2022; from memory), +/- 3 Gt
 *   CO2 yr-1 (about the GCB's one-sigma on fossil and land-use emissions together, 0.9 Gt C yr-1;
 *   from memory).
 * The total land + ocean sink of the same budget, 3.4 + 2.5 = 5.9 Gt C yr-1 (from memory), is
 * reported beside the fit as a check, not fitted: with the atmospheric growth fixed by the record,
 * it carries the same information as the 2010-2019 emissions.
 */
export const CARBON_TARGETS = {
  cumulative1850to2019Gtco2: { value: 2390, sigma: 240 },
  mean2010to2019Gtco2PerYr: { value: (9.6 + 1.6) * GTCO2_PER_GTC, sigma: 3 },
  sink2010to2019GtcPerYr: 3.4 + 2.5,
} as const;

/** What the bundled history implies for one set of carbon-cycle coefficients. */
export interface CarbonRecordFigures {
  /** Sum of the diagnosed annual emissions 1850-2019, Gt CO2. */
  cumulative1850to2019Gtco2: number;
  /** Mean diagnosed emissions 2010-2019, Gt CO2 yr-1. */
  mean2010to2019Gtco2PerYr: number;
  /** Mean land + ocean uptake 2010-2019, Gt C yr-1. */
  sink2010to2019GtcPerYr: number;
  /** The emission total diagnosed for the record's last year (the join), Gt CO2. */
  lastYearGtco2: number;
}

/** Result of {@link fitCarbonCycle}. */
export interface CarbonCycleFit {
  /** The fitted coefficients (r0 and rT of Millar et al. 2017, rC fitted, rounded to 4 significant digits). */
  cycle: CarbonCycleParams;
  /** The record's figures with Millar et al. 2017's published coefficients. */
  before: CarbonRecordFigures;
  /** The record's figures with the fitted coefficients. */
  after: CarbonRecordFigures;
  /** Weighted misfit sum ((model - target) / sigma)^2 of the two targets after the fit. */
  chiSquare: number;
}

/**
 * The record's figures for a concentration history (years 1850-2019 at least) and coefficients.
 *
 * @param history annual concentration record
 * @param params climate parameters (the warming the feedback sees)
 * @param cycle carbon-cycle coefficients
 */
export function carbonRecordFigures(history: Pathway, params: ClimateParams, cycle: CarbonCycleParams): CarbonRecordFigures {
  const run = runEmissionDriven(history, params, { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 }, carbonCycle: cycle });
  const at = (year: number) => year - history.years[0];
  const e = run.co2EmissionsGtco2;
  let cumulative = 0;
  for (let y = 1850; y <= 2019; y++) cumulative += e[at(y)];
  let recent = 0;
  for (let y = 2010; y <= 2019; y++) recent += e[at(y)];
  const uptake = run.carbonBudget.uptakeGtc;
  return {
    cumulative1850to2019Gtco2: cumulative,
    mean2010to2019Gtco2PerYr: recent / 10,
    sink2010to2019GtcPerYr: (uptake[at(2019)] - uptake[at(2009)]) / 10,
    lastYearGtco2: e[e.length - 1],
  };
}

/** Search interval of rC, yr per Gt C: from no uptake dependence to 2.5 x Millar et al. 2017's. */
const RC_RANGE = [0, 0.05] as const;

/**
 * Fits the carbon cycle's uptake coefficient rC (the growth of iIRF100 with cumulative land and ocean
 * uptake, Millar et al. 2017) to the published totals of {@link CARBON_TARGETS}: the emissions
 * diagnosed from the concentration history must sum to AR6's 1850-2019 total and average the Global
 * Carbon Budget's 2010-2019 rate. r0 and rT stay at Millar et al. 2017's values (src/carbon/README.md
 * says why rC is the one refitted). The misfit, sum ((model - target) / sigma)^2, is minimised over
 * rC in [0, 0.05] by golden-section search to 1e-9 yr per Gt C (deterministic: no randomness, a fixed
 * number of steps); the result is rounded to 4 significant digits.
 *
 * @param history the bundled concentration record (pathways/history.csv), 1850-2019 at least
 * @param params central climate parameters
 * @returns the fitted coefficients and the record's figures before and after
 */
export function fitCarbonCycle(history: Pathway, params: ClimateParams): CarbonCycleFit {
  const published: CarbonCycleParams = { r0Yr: MILLAR_2017.r0Yr, rUptakeYrPerGtc: MILLAR_2017.rUptakeYrPerGtc, rTemperatureYrPerK: MILLAR_2017.rTemperatureYrPerK };
  const withRc = (rC: number): CarbonCycleParams => ({ ...published, rUptakeYrPerGtc: rC });
  const misfit = (rC: number) => chiSquare(carbonRecordFigures(history, params, withRc(rC)));
  const phi = (Math.sqrt(5) - 1) / 2;
  let a: number = RC_RANGE[0];
  let b: number = RC_RANGE[1];
  let c = b - phi * (b - a);
  let d = a + phi * (b - a);
  let fc = misfit(c);
  let fd = misfit(d);
  while (b - a > 1e-9) {
    if (fc <= fd) {
      [b, d, fd] = [d, c, fc];
      c = b - phi * (b - a);
      fc = misfit(c);
    } else {
      [a, c, fc] = [c, d, fd];
      d = a + phi * (b - a);
      fd = misfit(d);
    }
  }
  const cycle = withRc(Number((0.5 * (a + b)).toPrecision(4)));
  const after = carbonRecordFigures(history, params, cycle);
  return { cycle, before: carbonRecordFigures(history, params, published), after, chiSquare: chiSquare(after) };
}

function chiSquare(f: CarbonRecordFigures): number {
  const t = CARBON_TARGETS;
  return ((f.cumulative1850to2019Gtco2 - t.cumulative1850to2019Gtco2.value) / t.cumulative1850to2019Gtco2.sigma) ** 2
    + ((f.mean2010to2019Gtco2PerYr - t.mean2010to2019Gtco2PerYr.value) / t.mean2010to2019Gtco2PerYr.sigma) ** 2;
}

/**
 * The text of src/carbon/fitted-carbon-cycle.ts for a fit: the fitted coefficient and, as comments,
 * the record's figures before and after (so a reviewer sees what the fit did without running it).
 */
export function fittedCarbonCycleModule(fit: CarbonCycleFit): string {
  const line = (label: string, f: CarbonRecordFigures) =>
    `//   ${label}: 1850-2019 ${f.cumulative1850to2019Gtco2.toFixed(0)} Gt CO2, 2010-2019 mean ${f.mean2010to2019Gtco2PerYr.toFixed(2)} Gt CO2 yr-1, `
    + `sink ${f.sink2010to2019GtcPerYr.toFixed(2)} Gt C yr-1, last record year ${f.lastYearGtco2.toFixed(2)} Gt CO2`;
  const t = CARBON_TARGETS;
  return [
    '// Generated by scripts/fit-carbon-cycle.ts from pathways/history.csv; do not edit by hand.',
    '// test/carbon/fit-carbon-cycle.test.ts regenerates it and compares.',
    `// Targets: 1850-2019 ${t.cumulative1850to2019Gtco2.value} +/- ${t.cumulative1850to2019Gtco2.sigma} Gt CO2 (AR6 WG1 SPM), `
      + `2010-2019 mean ${t.mean2010to2019Gtco2PerYr.value.toFixed(2)} +/- ${t.mean2010to2019Gtco2PerYr.sigma} Gt CO2 yr-1 (Global Carbon Budget); `
      + `sink checked against ${t.sink2010to2019GtcPerYr.toFixed(1)} Gt C yr-1 (GCB land + ocean).`,
    line('Millar et al. 2017 rC 0.019', fit.before),
    line(`fitted rC ${fit.cycle.rUptakeYrPerGtc}`, fit.after),
    '',
    '/** The carbon-cycle coefficient fitted to published totals (see fitCarbonCycle). */',
    'export const FITTED_CARBON_CYCLE = {',
    '  /** Growth of iIRF100 with cumulative land and ocean uptake, yr per Gt C. */',
    `  rUptakeYrPerGtc: ${fit.cycle.rUptakeYrPerGtc},`,
    '} as const;',
    '',
  ].join('\n');
}

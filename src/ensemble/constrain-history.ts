import { annualCarbonState } from '../carbon/annual-carbon-step.js';
import { co2YearDrivers, co2YearInto } from '../carbon/co2-year.js';
import { gtcToGtco2 } from '../carbon/units.js';
import { energyBalance } from '../climate/energy-balance.js';
import { ConfigError } from '../errors.js';
import type { MemberColumns } from './prior.js';
import { memberTwoBox } from './constrain-metrics.js';

/** The historical drivers every member is run over (concentration-driven, from rest in the first year). */
export interface HistoryDrivers {
  /** Consecutive whole years, first = the pre-industrial start (1750). */
  years: Float64Array;
  /** ERF per agent, W m-2, one value per year (agent names as FORCING_AGENTS). */
  byAgent: Record<string, Float64Array>;
  /** Atmospheric CO2, ppm, one value per year (for the diagnosed emissions). */
  co2Ppm: Float64Array;
}

/** What each member's history is compared with. Years are inclusive. */
export interface HistoryTargets {
  /** Baseline of the warming period means (1850-1900). */
  baseline: [number, number];
  /** Periods whose mean warming relative to the baseline is compared with HadCRUT5. */
  periods: [number, number][];
  /** Ocean heat content change from the mean of the first year to the mean of the last. */
  oceanHeat: [number, number];
  /** Period of the mean aerosol ERF (AR6 assesses 2005-2014 relative to 1750). */
  aerosol: [number, number];
  /** Years whose diagnosed CO2 emissions are summed (1850-2019). */
  emissions: [number, number];
}

/** Each member's historical quantities, one value per member (period means member-major). */
export interface HistoryResponses {
  /** Mean warming of period p relative to the baseline for member i at i * periods + p, K. */
  periodWarmingK: Float64Array;
  /** Ocean heat content change, ZJ. */
  oceanHeatZj: Float64Array;
  /** Mean aerosol ERF (the agents whose names start with `aerosol`), W m-2. */
  aerosolWm2: Float64Array;
  /** Diagnosed cumulative CO2 emissions (fossil and land use), Gt CO2. */
  emissionsGtco2: Float64Array;
}

/**
 * Surface area of the Earth, m2 (5.10e14; common value, from memory) and seconds per year (Julian,
 * 3.15576e7): one W yr m-2 over the globe is 1.609e22 J = 16.09 ZJ.
 */
export const ZJ_PER_WYR_M2 = (5.1e14 * 3.15576e7) / 1e21;

/**
 * Share of the heat the climate system gains since 1971 that goes into the ocean: 91 % (IPCC AR6
 * WG1 Box 7.2: ocean 91 %, land 5 %, cryosphere 3 %, atmosphere 1 %; from memory). The two-box
 * heat content C T + C_d T_d integrates the top-of-atmosphere imbalance exactly, so the ocean's
 * part of it is this share.
 */
export const OCEAN_HEAT_SHARE = 0.91;

/** Index of a year in the drivers, checked. */
function yearIndex(years: Float64Array, year: number, what: string): number {
  const k = year - years[0];
  if (!(Number.isInteger(k) && k >= 0 && k < years.length)) throw new ConfigError(`${what}: year ${year} is outside the history ${years[0]}-${years[years.length - 1]}`, 'calibration');
  return k;
}

/** Mean of values[from..to] (indices, inclusive). */
function meanOver(values: ArrayLike<number>, from: number, to: number): number {
  let s = 0;
  for (let k = from; k <= to; k++) s += values[k];
  return s / (to - from + 1);
}

/** Scratch of {@link memberHistoryInto}, allocated once per run. */
export interface HistoryScratch {
  forcing: Float64Array;
  surface: Float64Array;
  deep: Float64Array;
}

/** Scratch for drivers of `length` years. */
export function historyScratch(length: number): HistoryScratch {
  return { forcing: new Float64Array(length), surface: new Float64Array(length), deep: new Float64Array(length) };
}

/**
 * Runs member i over the history with the two-box step of climate/ (forcing linear between year
 * nodes, from rest in the first year): its forcing sum_a scale_a F_a, its surface and deep
 * temperatures (K, relative to the first year) into the scratch.
 */
export function memberHistoryInto(columns: MemberColumns, i: number, drivers: HistoryDrivers, scratch: HistoryScratch): void {
  const scales: Record<string, number> = {};
  for (const agent of Object.keys(drivers.byAgent)) scales[agent] = columns[`scale_${agent}`]?.[i] ?? 1;
  const f = scratch.forcing.fill(0);
  for (const [agent, series] of Object.entries(drivers.byAgent)) {
    const s = scales[agent];
    for (let k = 0; k < f.length; k++) f[k] += s * series[k];
  }
  // The one two-box step every run uses (climate/), from rest in the first year.
  const run = energyBalance(memberTwoBox(columns, i), scratch.forcing, 'exact');
  scratch.surface.set(run.surfaceK);
  scratch.deep.set(run.deepK);
}

/**
 * The historical quantities of members [from, to) of a column set: mean warming of each target
 * period relative to the baseline, ocean heat content change, mean aerosol ERF and the CO2
 * emissions diagnosed from the observed concentrations with the member's carbon cycle (the one
 * production carbon step, co2YearInto, driven by the member's warming times its rT multiplier, with
 * its iIRF100 multiplier).
 *
 * @param columns member parameters (memberParameterKeys of the drivers' agents)
 * @param drivers the history
 * @param targets periods and years compared
 * @param from first member, to one past the last
 * @param onWarming optional: receives each member's surface warming series (a scratch array, valid
 *   during the call only) with its index
 */
export function historyResponses(
  columns: MemberColumns,
  drivers: HistoryDrivers,
  targets: HistoryTargets,
  from: number,
  to: number,
  onWarming?: (i: number, surfaceK: Float64Array) => void,
): HistoryResponses {
  const years = drivers.years;
  const n = years.length;
  const count = to - from;
  const np = targets.periods.length;
  const [b0, b1] = targets.baseline.map((y) => yearIndex(years, y, 'baseline'));
  const periods = targets.periods.map(([a, b]) => [yearIndex(years, a, 'period'), yearIndex(years, b, 'period')]);
  const [h0, h1] = targets.oceanHeat.map((y) => yearIndex(years, y, 'ocean heat'));
  const [a0, a1] = targets.aerosol.map((y) => yearIndex(years, y, 'aerosol'));
  const [e0, e1] = targets.emissions.map((y) => yearIndex(years, y, 'emissions'));
  if (e1 + 1 >= n) throw new ConfigError(`emissions of ${targets.emissions[1]} need the concentration of the year after`, 'calibration');
  const aerosolAgents = Object.keys(drivers.byAgent).filter((a) => a.startsWith('aerosol'));
  const aerosolMeans = aerosolAgents.map((a) => meanOver(drivers.byAgent[a], a0, a1));

  const out: HistoryResponses = {
    periodWarmingK: new Float64Array(count * np),
    oceanHeatZj: new Float64Array(count),
    aerosolWm2: new Float64Array(count),
    emissionsGtco2: new Float64Array(count),
  };
  const scratch = historyScratch(n);
  const co2Drivers = co2YearDrivers(drivers.co2Ppm, undefined, drivers.co2Ppm[0]);
  for (let i = from; i < to; i++) {
    const r = i - from;
    memberHistoryInto(columns, i, drivers, scratch);
    const t = scratch.surface;
    const d = scratch.deep;
    const base = meanOver(t, b0, b1);
    for (let p = 0; p < np; p++) out.periodWarmingK[r * np + p] = meanOver(t, periods[p][0], periods[p][1]) - base;
    const c = columns.upper_heat_capacity[i];
    const cd = columns.deep_heat_capacity[i];
    out.oceanHeatZj[r] = OCEAN_HEAT_SHARE * ZJ_PER_WYR_M2 * (c * t[h1] + cd * d[h1] - (c * t[h0] + cd * d[h0]));
    let aerosol = 0;
    for (let j = 0; j < aerosolAgents.length; j++) aerosol += (columns[`scale_${aerosolAgents[j]}`]?.[i] ?? 1) * aerosolMeans[j];
    out.aerosolWm2[r] = aerosol;
    // The production carbon step (carbon/co2-year.ts): year k's emission total is the one that
    // takes the stock to the next 1 January's concentration, the feedback seeing the previous
    // year's warming (times the member's rT multiplier).
    const state = annualCarbonState();
    const s0 = columns.irf100_scale![i];
    const sT = columns.uptake_warming_scale![i];
    let emitted = 0;
    for (let k = 0; k <= e1; k++) {
      co2YearInto(state, co2Drivers, k, sT * (k > 0 ? t[k - 1] : 0), s0);
      if (k >= e0) emitted += state.lastEmissionGtc;
    }
    out.emissionsGtco2[r] = gtcToGtco2(emitted);
    onWarming?.(i, t);
  }
  return out;
}

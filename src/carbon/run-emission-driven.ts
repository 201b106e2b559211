import type { ClimateParams } from '../climate/params.js';
import { stepTwoBoxInto, twoBoxSteps } from '../climate/two-box-step.js';
import { topOfAtmosphereImbalance } from '../climate/two-box.js';
import { ConfigError, NumericalError } from '../errors.js';
import { forcingByAgent, ghgForcingFunction, type ForcingOptions, type ForcingSeries } from '../forcing/agents.js';
import { PREINDUSTRIAL } from '../forcing/constants.js';
import { anchoredChemistryWm2, chemistryAnchor } from '../forcing/methane-chemistry.js';
import { FORCING_COLUMNS, GASES, type Gas, type Pathway } from '../pathway.js';
import { annualCarbonState, atmosphericGtc } from './annual-carbon-step.js';
import { gasYear } from './annual-gas-step.js';
import { co2YearDrivers, co2YearInto } from './co2-year.js';
import { CH4_CYCLE, ch4CycleFromJoin, gasSinkMt, N2O_CYCLE, withConstantLifetime, type GasCycle } from './gas-cycle.js';
import { GTC_PER_PPM, gtcToGtco2 } from './units.js';
import { CARBON_CYCLE, type CarbonCycleParams } from './uptake-feedback.js';
import { JOIN_TREND_YEARS, yearStartConcentrations } from './year-start-concentrations.js';

/** Options of {@link runEmissionDriven}. */
export interface EmissionRunOptions {
  /** How greenhouse-gas forcing is computed (formula, 2xCO2 scaling, aerosol scaling). */
  forcing: ForcingOptions;
  /** Carbon-climate feedback on uptake (Millar et al. 2017). Default true. */
  feedback?: boolean;
  /** iIRF100 coefficients of the carbon cycle. Default {@link CARBON_CYCLE} (fitted by scripts/fit-carbon-cycle.ts). */
  carbonCycle?: CarbonCycleParams;
  /**
   * CH4 lifetime. `join` (default): the constant 9.1 yr total lifetime while the record is followed,
   * then lengthening with the burden from the join's concentration, so that a change in emissions
   * decays with the 11.8 yr perturbation lifetime (ch4CycleFromJoin; Prather et al. 2012, AR6 Table
   * 7.15); a run with no CH4 record (emissions from its first year) has no join and keeps 9.1 yr. `burden`: lengthening with the burden from 1750 on (the natural emissions implied in 1750
   * are then 271 Mt CH4 yr-1 and the 2019 anthropogenic emissions diagnosed 15 % below inventories).
   * `constant`: 9.1 yr throughout (a change in emissions then decays with 9.1 yr). See src/carbon/README.md.
   */
  ch4Lifetime?: 'join' | 'burden' | 'constant';
  /** Multiplier on the CH4 total lifetime (an ensemble member's CH4 lifetime scale). Default 1. */
  ch4LifetimeScale?: number;
}

/** Cumulative CO2 bookkeeping since the start of the run, Gt C at the end of each calendar year. */
export interface CarbonBudget {
  /** CO2 emitted (given or diagnosed) from the start through the end of each year, Gt C. */
  emittedGtc: Float64Array;
  /** Increase of the atmospheric stock from the start to the end of each year (1 January of the next), Gt C. */
  atmosphericGtc: Float64Array;
  /** Taken up by land and ocean together from the start through the end of each year, Gt C. */
  uptakeGtc: Float64Array;
}

/** Result of an emission-driven (or mixed) run, one value per calendar year. */
export interface EmissionRunResult {
  /** Annual-mean atmospheric CO2, ppm; CH4 and N2O, ppb. */
  co2Ppm: Float64Array;
  /** Atmospheric CO2 at the end of each year (1 January of the next), ppm: the stock the carbon budget holds. */
  co2YearEndPpm: Float64Array;
  ch4Ppb: Float64Array;
  n2oPpb: Float64Array;
  /** Surface and deep-ocean temperature anomalies relative to the starting equilibrium, K. */
  surfaceK: Float64Array;
  deepK: Float64Array;
  /** Top-of-atmosphere energy imbalance, W m-2. */
  imbalanceWm2: Float64Array;
  /** ERF by agent and in total, W m-2, with the prescribed columns of the pathway. */
  forcing: ForcingSeries;
  /** Emission totals of each calendar year, given or diagnosed: Gt CO2, Mt CH4, Mt N2O. */
  co2EmissionsGtco2: Float64Array;
  ch4EmissionsMt: Float64Array;
  n2oEmissionsMt: Float64Array;
  /**
   * CO2 emitted from 1850 (or the first year, if later) through each year, Gt CO2: the running sum
   * of `co2EmissionsGtco2`, so year Y holds exactly the sum of the rows 1850..Y; 0 before 1850.
   */
  cumulativeCo2Gtco2: Float64Array;
  /** Atmospheric increase over emissions, both cumulative since the start to the end of the year; NaN while |emitted| < 1 Gt C. */
  airborneFraction: Float64Array;
  /** Last year whose CO2 emissions were diagnosed from concentrations, if any. */
  diagnosedUntil?: number;
  /** Largest |emitted - atmospheric increase - uptake| over the run, relative to the largest of the three. */
  massBalanceError: number;
  /** Cumulative CO2 bookkeeping since the start. */
  carbonBudget: CarbonBudget;
  /** Natural CH4 and N2O emissions implied by the starting steady state, Mt yr-1. */
  naturalEmissionsMt: { ch4: number; n2o: number };
  /** What the user should know: feedback setting, diagnosed spans, the emissions at the join. */
  notes: string[];
}

/** Cumulative emissions below this many Gt C leave the airborne fraction undefined (about 0.5 ppm). */
const AIRBORNE_FRACTION_MIN_GTC = 1;

/** Largest tolerated relative CO2 mass-balance error of a run. */
const MAX_MASS_BALANCE_ERROR = 1e-6;

/** Year from which `cumulativeCo2Gtco2` counts (IPCC AR6 WG1 SPM convention). */
const CUMULATIVE_FROM_YEAR = 1850;

const CONCENTRATION = 1;
const EMISSION = 2;

/** How one gas is driven in each year. */
interface GasPlan {
  gas: Gas;
  /** CONCENTRATION or EMISSION per year; concentration years, if any, come first. */
  mode: Uint8Array;
  /** Annual-mean concentrations in concentration years (ppm or ppb); pre-industrial for a gas not given. */
  concentration: Float64Array;
  /** Emission total of each year in the column's unit (Gt CO2, Mt): given ones now, diagnosed ones during the run. */
  emission: Float64Array;
  /** Index of the last concentration year, -1 if none. */
  lastConcentration: number;
  /** Whether the pathway gives this gas at all. */
  given: boolean;
}

/**
 * Runs the carbon cycle, CH4 and N2O and the two-box energy balance together, one calendar year at
 * a time, on a pathway whose gases are given as emissions, as concentrations, or as concentrations
 * up to a year and emissions after it (a future emission file spliced onto the concentration
 * history), each gas on its own. This is warmcast's one production scheme for emission-driven runs;
 * ensemble members take the same CO2 step (co2YearInto). The odex integration of the continuous
 * model (coupledModel) is its test oracle.
 *
 * Conventions (a row is a calendar year):
 * - An emission value is the total emitted during its year, emitted at a constant rate within the
 *   year, so the run's cumulative emissions are exactly the sum of the rows.
 * - A concentration value is an annual mean. In the years of a concentration record the year's
 *   emission total is diagnosed so that the stock moves from one 1 January concentration to the
 *   next (yearStartConcentrations: midway between annual means; the last record year grows at the
 *   least-squares trend of its last JOIN_TREND_YEARS years, so one El Niño year does not set the
 *   rate at the join). The boxes then hold the carbon-cycle state the record implies, and the
 *   emission years continue from it.
 * - Each year: the CO2 boxes step exactly with the feedback frozen at 1 January and the previous
 *   year's warming (co2YearInto); CH4 and N2O step exactly with the lifetime of the year's middle
 *   concentration (gasYear); the year's annual-mean concentrations give its ERF; the two-box model
 *   steps from the previous year with forcing linear between the years' values (the one two-box
 *   step, stepTwoBoxInto, as a concentration-driven run takes).
 * - The start is an equilibrium at the first year's concentrations (pre-industrial for a gas given
 *   as emissions there); natural CH4 and N2O emissions balance the sinks at it.
 *
 * @param pathway annual pathway (consecutive years), gases in either form, prescribed forcing columns
 * @param params climate parameters
 * @param options forcing options, feedback switches, carbon-cycle coefficients
 * @returns concentrations, temperatures, forcing, emissions and carbon bookkeeping per year
 * @throws ConfigError when a gas is given both ways in a year, in neither form in a year, or as a
 *   concentration after its emissions started; when a prescribed forcing value is not finite
 * @throws NumericalError when a value turns non-finite (e.g. emissions so negative that CH4 would
 *   vanish) or the CO2 mass balance is off by more than 1e-6 of the total
 * @example
 * const r = runEmissionDriven(spliced, calibrate(), { forcing: { co2Formula: 'ar6' } });
 * r.diagnosedUntil // 2024: history concentrations to 2024, the file's emissions after
 */
export function runEmissionDriven(pathway: Pathway, params: ClimateParams, options: EmissionRunOptions): EmissionRunResult {
  const years = pathway.years;
  const n = years.length;
  const feedback = options.feedback ?? true;
  const ch4Lifetime = options.ch4Lifetime ?? 'join';
  const ch4Scale = options.ch4LifetimeScale ?? 1;
  const ch4Base = { ...CH4_CYCLE, lifetimeYr: CH4_CYCLE.lifetimeYr * ch4Scale };
  const ch4Cycle = ch4Lifetime === 'burden' ? ch4Base : withConstantLifetime(ch4Base);
  const ch4AfterJoin = ch4Lifetime === 'join' ? (joinPpb: number) => ch4CycleFromJoin(joinPpb, ch4Scale) : undefined;
  const plans = {
    co2: planGas(pathway, 'co2', PREINDUSTRIAL.co2Ppm),
    ch4: planGas(pathway, 'ch4', PREINDUSTRIAL.ch4Ppb),
    n2o: planGas(pathway, 'n2o', PREINDUSTRIAL.n2oPpb),
  };
  const other = prescribedForcing(pathway, options.forcing);
  const chemistry = chemistryAnchor(years, pathway.responsiveFrom);
  const ghg = ghgForcingFunction(options.forcing);

  const co2Drivers = co2YearDrivers(
    plans.co2.lastConcentration >= 0 ? plans.co2.concentration : undefined,
    plans.co2.emission,
    PREINDUSTRIAL.co2Ppm,
  );
  const gases = {
    ch4: gasDrivers(plans.ch4, ch4Cycle, PREINDUSTRIAL.ch4Ppb, ch4AfterJoin),
    n2o: gasDrivers(plans.n2o, N2O_CYCLE, PREINDUSTRIAL.n2oPpb),
  };
  const natural = { ch4: gases.ch4.naturalMt, n2o: gases.n2o.naturalMt };

  const co2Ppm = new Float64Array(n);
  const co2YearEndPpm = new Float64Array(n);
  const ch4Ppb = new Float64Array(n);
  const n2oPpb = new Float64Array(n);
  const surfaceK = new Float64Array(n);
  const deepK = new Float64Array(n);
  const totalWm2 = new Float64Array(n);
  const emittedGtc = new Float64Array(n);
  const atmosphericStockGtc = new Float64Array(n);
  const uptakeGtc = new Float64Array(n);

  const carbon = annualCarbonState(options.carbonCycle ?? CARBON_CYCLE, feedback);
  const steps = twoBoxSteps(params);
  const t1 = new Float64Array(1);
  const d1 = new Float64Array(1);
  for (let k = 0; k < n; k++) {
    co2Ppm[k] = co2YearInto(carbon, co2Drivers, k, t1[0], 1);
    if (plans.co2.mode[k] === CONCENTRATION) plans.co2.emission[k] = gtcToGtco2(carbon.lastEmissionGtc);
    emittedGtc[k] = carbon.emittedGtc;
    atmosphericStockGtc[k] = atmosphericGtc(carbon);
    co2YearEndPpm[k] = co2Drivers.startPpm + atmosphericStockGtc[k] / GTC_PER_PPM;
    uptakeGtc[k] = carbon.uptakeGtc;
    ch4Ppb[k] = gases.ch4.yearInto(k);
    n2oPpb[k] = gases.n2o.yearInto(k);
    const f = ghg(co2Ppm[k], ch4Ppb[k], n2oPpb[k]);
    totalWm2[k] = f.co2 + f.ch4 + f.n2o + other[k];
    if (chemistry) {
      // Ozone and strat. H2O follow the run's CH4 and N2O from the join (forcingByAgent adds the same).
      const c = anchoredChemistryWm2(chemistry, ch4Ppb, n2oPpb, k, options.forcing.agentScale);
      totalWm2[k] += c.ozone + c.stratH2o;
    }
    // The one two-box step (climate/two-box-step.ts), forcing linear between the years' values.
    if (k > 0) stepTwoBoxInto(steps, totalWm2.subarray(k - 1, k), totalWm2.subarray(k, k + 1), t1, d1);
    const t = t1[0];
    surfaceK[k] = t;
    deepK[k] = d1[0];
    if (!(co2Ppm[k] > 0 && ch4Ppb[k] > 0 && n2oPpb[k] > 0 && Number.isFinite(co2Ppm[k] + ch4Ppb[k] + n2oPpb[k] + t))) {
      throw new NumericalError(
        `${pathway.name}: the run left the physical range in ${years[k]} (CO2 ${co2Ppm[k]} ppm, CH4 ${ch4Ppb[k]} ppb, N2O ${n2oPpb[k]} ppb, warming ${t} K); `
          + 'check the emissions for values far below zero',
        'numerical.non-finite',
      );
    }
  }
  for (const gas of ['ch4', 'n2o'] as const) {
    const plan = plans[gas];
    for (let k = 0; k <= plan.lastConcentration; k++) plan.emission[k] = gases[gas].emissionMt[k];
  }

  const forcing = forcingByAgent(n, { co2Ppm, ch4Ppb, n2oPpb, prescribed: pathway.series, chemistry }, options.forcing);
  const imbalanceWm2 = new Float64Array(n);
  for (let k = 0; k < n; k++) imbalanceWm2[k] = topOfAtmosphereImbalance(params, forcing.total[k], surfaceK[k], deepK[k]);

  const co2EmissionsGtco2 = plans.co2.emission;
  const cumulativeCo2Gtco2 = new Float64Array(n);
  let sum = 0;
  for (let k = Math.max(0, CUMULATIVE_FROM_YEAR - years[0]); k < n; k++) {
    sum += co2EmissionsGtco2[k];
    cumulativeCo2Gtco2[k] = sum;
  }

  const airborneFraction = new Float64Array(n);
  let scale = 0;
  let worst = 0;
  for (let k = 0; k < n; k++) {
    airborneFraction[k] = Math.abs(emittedGtc[k]) < AIRBORNE_FRACTION_MIN_GTC ? NaN : atmosphericStockGtc[k] / emittedGtc[k];
    scale = Math.max(scale, Math.abs(emittedGtc[k]), Math.abs(atmosphericStockGtc[k]), Math.abs(uptakeGtc[k]));
    worst = Math.max(worst, Math.abs(emittedGtc[k] - atmosphericStockGtc[k] - uptakeGtc[k]));
  }
  const massBalanceError = scale === 0 ? 0 : worst / scale;
  if (!(massBalanceError <= MAX_MASS_BALANCE_ERROR)) {
    throw new NumericalError(
      `CO2 mass balance violated: emitted minus (atmospheric increase + uptake) reached ${massBalanceError.toExponential(2)} of the total`,
      'numerical.mass-balance',
    );
  }

  const notes = [
    feedback
      ? 'carbon-climate feedback on uptake: on (sinks weaken with warming and cumulative uptake, Millar et al. 2017)'
      : 'carbon-climate feedback on uptake: off (fixed Joos et al. 2013 response)',
    ...gasNotes(plans.co2, years, (v) => `${v.toFixed(2)} Gt CO2`),
    ...gasNotes(plans.ch4, years, (v) => `${v.toFixed(1)} Mt CH4`),
    ...gasNotes(plans.n2o, years, (v) => `${v.toFixed(2)} Mt N2O`),
  ];
  if (plans.ch4.lastConcentration < n - 1) {
    notes.push(`CH4 natural emissions ${natural.ch4.toFixed(1)} Mt CH4 yr-1 (implied by the steady state at the start); lifetime ${{ join: 'constant 9.1 yr to the join, then lengthening with the burden from there (a change in emissions decays with the 11.8 yr perturbation lifetime)', burden: 'lengthening with the burden from the start (11.8 yr perturbation lifetime at 1800 ppb)', constant: 'constant 9.1 yr' }[ch4Lifetime]}${ch4Scale === 1 ? '' : ` x ${ch4Scale}`}`);
  }
  if (plans.n2o.lastConcentration < n - 1) notes.push(`N2O natural emissions ${natural.n2o.toFixed(2)} Mt N2O yr-1 (implied by the steady state at the start)`);

  const co2 = plans.co2;
  return {
    co2Ppm,
    co2YearEndPpm,
    ch4Ppb,
    n2oPpb,
    surfaceK,
    deepK,
    imbalanceWm2,
    forcing,
    co2EmissionsGtco2,
    ch4EmissionsMt: plans.ch4.emission,
    n2oEmissionsMt: plans.n2o.emission,
    cumulativeCo2Gtco2,
    airborneFraction,
    diagnosedUntil: co2.given && co2.lastConcentration >= 0 ? years[co2.lastConcentration] : undefined,
    massBalanceError,
    carbonBudget: { emittedGtc, atmosphericGtc: atmosphericStockGtc, uptakeGtc },
    naturalEmissionsMt: natural,
    notes,
  };
}

/**
 * The year-by-year stepping of CH4 or N2O for a plan: concentration years diagnose the emission total
 * that moves the burden between 1 January concentrations (yearStartConcentrations), emission years
 * take the given totals (gasYear), with the cycle `afterJoin` makes of the concentration at the join
 * when given (CH4: ch4CycleFromJoin).
 */
function gasDrivers(plan: GasPlan, cycle: GasCycle, preindustrial: number, afterJoin?: (joinPpb: number) => GasCycle) {
  const last = plan.lastConcentration;
  // The cycle of the emission years: `afterJoin` of the 1 January concentration of the first one.
  let emissionCycle: GasCycle | undefined;
  const bounds = last >= 0 ? yearStartConcentrations(plan.concentration, last) : new Float64Array(0);
  const start = last >= 0 ? plan.concentration[0] : preindustrial;
  const naturalMt = gasSinkMt(cycle, start);
  const emissionMt = new Float64Array(plan.mode.length);
  let ppb = start;
  return {
    naturalMt,
    emissionMt,
    /** Steps year k; returns its annual mean (the given one in a concentration year). */
    yearInto(k: number): number {
      const diagnosed = k <= last;
      // Without a record there is no join: the whole run keeps `cycle`, so that emissions diagnosed from a
      // record and run forward from the start reproduce it.
      if (!diagnosed && emissionCycle === undefined) emissionCycle = afterJoin && last >= 0 ? afterJoin(ppb) : cycle;
      const year = gasYear(diagnosed ? cycle : emissionCycle!, ppb, naturalMt, diagnosed ? NaN : plan.emission[k], diagnosed ? bounds[k + 1] : NaN);
      emissionMt[k] = year.emissionMt;
      ppb = year.endPpb;
      return diagnosed ? plan.concentration[k] : year.meanPpb;
    },
  };
}

/**
 * Works out, year by year, whether a gas is driven by its concentration or its emissions, and
 * checks that the pathway is usable: one form per year, concentration years before emission years.
 */
function planGas(pathway: Pathway, gas: Gas, preindustrial: number): GasPlan {
  const n = pathway.years.length;
  const { concentration: cCol, emission: eCol } = GASES[gas];
  const c = pathway.series[cCol];
  const e = pathway.series[eCol];
  const mode = new Uint8Array(n);
  const emission = new Float64Array(n);
  if (!c && !e) {
    return { gas, mode: mode.fill(CONCENTRATION), concentration: new Float64Array(n).fill(preindustrial), emission, lastConcentration: n - 1, given: false };
  }
  let lastConcentration = -1;
  let firstEmission = -1;
  for (let k = 0; k < n; k++) {
    const hasC = c !== undefined && Number.isFinite(c[k]);
    const hasE = e !== undefined && Number.isFinite(e[k]);
    const year = pathway.years[k];
    if (hasC && hasE) {
      throw new ConfigError(`${pathway.name}: ${cCol} and ${eCol} are both given for ${year}; a gas must be given one way each year`, 'pathway', 'pathway.gas-both-forms');
    }
    if (!hasC && !hasE) {
      throw new ConfigError(`${pathway.name}: ${gas.toUpperCase()} has no value for ${year}; ${cCol} or ${eCol} must be a number in every year`, 'pathway', 'pathway.gas-missing');
    }
    if (hasC) {
      if (firstEmission >= 0) {
        throw new ConfigError(
          `${pathway.name}: ${cCol} is given for ${year} after ${eCol} started in ${pathway.years[firstEmission]}; concentrations must come before emissions`,
          'pathway',
          'pathway.gas-order',
        );
      }
      mode[k] = CONCENTRATION;
      lastConcentration = k;
    } else {
      if (firstEmission < 0) firstEmission = k;
      mode[k] = EMISSION;
      emission[k] = e![k];
    }
  }
  const concentration = c ? Float64Array.from(c) : new Float64Array(n).fill(NaN);
  return { gas, mode, concentration, emission, lastConcentration, given: true };
}

/** Total prescribed (non-greenhouse-gas) ERF in each year, W m-2, after checking it is finite. */
function prescribedForcing(pathway: Pathway, options: ForcingOptions): Float64Array {
  for (const column of FORCING_COLUMNS) {
    const series = pathway.series[column];
    if (!series) continue;
    const bad = series.findIndex((v) => !Number.isFinite(v));
    if (bad >= 0) {
      throw new ConfigError(`${pathway.name}: ${column} must be a number in every year, got ${series[bad]} for ${pathway.years[bad]}`, 'pathway', 'pathway.forcing-missing');
    }
  }
  // With no gases given, forcingByAgent holds them at 1750 values, where their ERF is zero.
  return forcingByAgent(pathway.years.length, { prescribed: pathway.series }, options).total;
}

/** Notes on how a gas was driven: diagnosed span, given span, the annual totals either side of the join. */
function gasNotes(plan: GasPlan, years: Float64Array, format: (total: number) => string): string[] {
  if (!plan.given) return [];
  const name = plan.gas.toUpperCase();
  const n = years.length;
  const last = plan.lastConcentration;
  const notes: string[] = [];
  if (last >= 0) notes.push(`${name} emissions diagnosed from concentrations ${years[0]}-${years[last]}`);
  if (last < n - 1) {
    notes.push(`${name} emissions as given ${years[last + 1]}-${years[n - 1]}`);
    if (last >= 0) {
      const from = years[Math.max(0, last - JOIN_TREND_YEARS + 1)];
      notes.push(
        `${name} emissions at the join: ${format(plan.emission[last])} diagnosed for ${years[last]} (its growth taken as the ${from}-${years[last]} `
          + `least-squares trend of the concentration), ${format(plan.emission[last + 1])} given for ${years[last + 1]}`,
      );
    }
  }
  return notes;
}

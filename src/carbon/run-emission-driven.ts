import type { ClimateParams } from '../climate/params.js';
import { topOfAtmosphereImbalance } from '../climate/two-box.js';
import { ConfigError, NumericalError } from '../errors.js';
import { forcingByAgent, ghgForcingFunction, type ForcingOptions, type ForcingSeries } from '../forcing/agents.js';
import { PREINDUSTRIAL } from '../forcing/constants.js';
import { DEFAULT_TOLERANCES, integrateSteps, type OdeTolerances } from '../numerics/integrate-steps.js';
import { FORCING_COLUMNS, GASES, type Gas, type Pathway } from '../pathway.js';
import { CO2_BOX_COUNT } from './co2-impulse-response.js';
import { COUPLED_STATE, coupledModel, type CoupledModel, type GasStepInput } from './coupled-model.js';
import { CH4_CYCLE, gasEmissionsForTendency, gasSinkMt, N2O_CYCLE, withConstantLifetime, type GasCycle } from './gas-cycle.js';
import { GTC_PER_PPM, gtcToGtco2, gtco2ToGtc } from './units.js';

/** Options of {@link runEmissionDriven}. */
export interface EmissionRunOptions {
  /** How greenhouse-gas forcing is computed (formula, 2xCO2 scaling, aerosol scaling). */
  forcing: ForcingOptions;
  /** Carbon-climate feedback on uptake (Millar et al. 2017). Default true. */
  feedback?: boolean;
  /**
   * CH4 lifetime lengthening with the burden (perturbation lifetime 11.8 yr, Prather et al. 2012 /
   * AR6). Default false: a constant 9.1 yr total lifetime, which with natural emissions implied by
   * the 1750 steady state reproduces present-day anthropogenic inventories (see src/carbon/README.md).
   */
  ch4LifetimeFeedback?: boolean;
  /** odex tolerances. */
  tolerances?: OdeTolerances;
}

/** Cumulative CO2 bookkeeping since the start of the run, Gt C at each year node. */
export interface CarbonBudget {
  /** CO2 emitted (given or diagnosed), Gt C. */
  emittedGtc: Float64Array;
  /** Increase of the atmospheric stock, Gt C. */
  atmosphericGtc: Float64Array;
  /** Taken up by land and ocean together, Gt C. */
  uptakeGtc: Float64Array;
}

/** Result of an emission-driven (or mixed) run, one value per year node. */
export interface EmissionRunResult {
  /** Atmospheric CO2, ppm; CH4 and N2O, ppb. */
  co2Ppm: Float64Array;
  ch4Ppb: Float64Array;
  n2oPpb: Float64Array;
  /** Surface and deep-ocean temperature anomalies relative to the starting equilibrium, K. */
  surfaceK: Float64Array;
  deepK: Float64Array;
  /** Top-of-atmosphere energy imbalance, W m-2. */
  imbalanceWm2: Float64Array;
  /** ERF by agent and in total, W m-2, with the prescribed columns of the pathway. */
  forcing: ForcingSeries;
  /** Emission rates at the year nodes, given or diagnosed: Gt CO2 yr-1, Mt CH4 yr-1, Mt N2O yr-1. */
  co2EmissionsGtco2: Float64Array;
  ch4EmissionsMt: Float64Array;
  n2oEmissionsMt: Float64Array;
  /** CO2 emitted from the 1850 node (or the first year, if later) to each node, Gt CO2; 0 before 1850. */
  cumulativeCo2Gtco2: Float64Array;
  /** Atmospheric increase over emissions, both cumulative since the start; NaN while |emitted| < 1 Gt C. */
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

/** Largest tolerated relative CO2 mass-balance error of a run (the criterion). */
const MAX_MASS_BALANCE_ERROR = 1e-6;

/** Year from which `cumulativeCo2Gtco2` counts (IPCC AR6 WG1 SPM convention). */
const CUMULATIVE_FROM_YEAR = 1850;

const CONCENTRATION = 1;
const EMISSION = 2;

/** How one gas is driven at each year node. */
interface GasPlan {
  gas: Gas;
  /** CONCENTRATION or EMISSION per node; concentration nodes, if any, come first. */
  mode: Uint8Array;
  /** Concentrations at concentration nodes (ppm or ppb); pre-industrial for a gas not given. */
  concentration: Float64Array;
  /** Emission rate at every node in model units (Gt C or Mt yr-1): given ones now, diagnosed ones during the run. */
  emission: Float64Array;
  /** Index of the last concentration node, -1 if none. */
  lastConcentration: number;
  /** Whether the pathway gives this gas at all. */
  given: boolean;
}

/**
 * Runs the coupled carbon-gas-climate model on a pathway whose gases are given as emissions, as
 * concentrations, or as concentrations up to a year and emissions after it (a future emission file
 * spliced onto the concentration history), each gas on its own.
 *
 * One state vector holds the CO2 boxes, the CH4 and N2O concentrations, the two temperatures and the
 * cumulative emitted and taken-up CO2; `integrateSteps` advances it with odex, one solve per year.
 * - Years whose concentration is given (at both ends): the concentration is linear in time and the
 *   emissions are diagnosed within the ODE as E = dC/dt + uptake(state) (CO2) or
 *   m dc/dt + sink(c) - natural (CH4, N2O), with the temperature, and so the feedback, evolving
 *   alongside. This is exact up to the integrator's tolerance: the boxes then hold the carbon-cycle
 *   state consistent with the record, from which the emission years continue.
 * - Years whose emissions are given: emissions linear between the year nodes, concentrations free.
 * - The year that joins the two: emissions linear from the rate diagnosed at the last concentration
 *   node (its left-hand limit, dC/dt of the year before plus the uptake there) to the first given
 *   rate.
 * - Reported node values of diagnosed emissions are approximations: the diagnosed rate jumps at each
 *   node with the slope of the concentration, so the node value is the mean of the rates either
 *   side (a central difference of the concentration plus the uptake at the node). Cumulative
 *   emissions and the carbon budget are the exact integrals.
 * - Forcing inside each year is that of the current concentrations (not linear between nodes as in a
 *   concentration-driven run; the difference is second order in the year-to-year change).
 * - The start is an equilibrium at the first year's concentrations (pre-industrial for a gas given
 *   as emissions there); natural CH4 and N2O emissions balance the sinks at it.
 *
 * @param pathway annual pathway (consecutive years), gases in either form, prescribed forcing columns
 * @param params climate parameters
 * @param options forcing options, feedback switches, odex tolerances
 * @returns concentrations, temperatures, forcing, emissions and carbon bookkeeping at each year node
 * @throws ConfigError when a gas is given both ways in a year, in neither form in a year, or as a
 *   concentration after its emissions started; when a prescribed forcing value is not finite
 * @throws NumericalError when the integrator fails (e.g. emissions so negative that CH4 would vanish)
 *   or the CO2 mass balance is off by more than 1e-6 of the total
 * @example
 * const r = runEmissionDriven(spliced, calibrate(), { forcing: { co2Formula: 'ar6' } });
 * r.diagnosedUntil // 2024: history concentrations to 2024, the file's emissions after
 */
export function runEmissionDriven(pathway: Pathway, params: ClimateParams, options: EmissionRunOptions): EmissionRunResult {
  const n = pathway.years.length;
  const feedback = options.feedback ?? true;
  const ch4Cycle = options.ch4LifetimeFeedback ? CH4_CYCLE : withConstantLifetime(CH4_CYCLE);
  const plans = {
    co2: planGas(pathway, 'co2', PREINDUSTRIAL.co2Ppm, gtco2ToGtc),
    ch4: planGas(pathway, 'ch4', PREINDUSTRIAL.ch4Ppb, (x) => x),
    n2o: planGas(pathway, 'n2o', PREINDUSTRIAL.n2oPpb, (x) => x),
  };
  const other = prescribedForcing(pathway, options.forcing);

  const start = {
    co2: startValue(plans.co2, PREINDUSTRIAL.co2Ppm),
    ch4: startValue(plans.ch4, PREINDUSTRIAL.ch4Ppb),
    n2o: startValue(plans.n2o, PREINDUSTRIAL.n2oPpb),
  };
  const natural = { ch4: gasSinkMt(ch4Cycle, start.ch4), n2o: gasSinkMt(N2O_CYCLE, start.n2o) };
  const model = coupledModel({
    climate: params,
    ghgForcing: ghgForcingFunction(options.forcing),
    feedback,
    co2StartPpm: start.co2,
    ch4: ch4Cycle,
    n2o: N2O_CYCLE,
    ch4NaturalMt: natural.ch4,
    n2oNaturalMt: natural.n2o,
  });

  const I = COUPLED_STATE;
  const y0 = new Array<number>(I.size).fill(0);
  y0[I.ch4Ppb] = start.ch4;
  y0[I.n2oPpb] = start.n2o;
  const states: number[][] = new Array(n);
  states[0] = y0;

  const diagnoseAt = (j: number, y: readonly number[]): void => {
    if (plans.co2.mode[j] === CONCENTRATION) {
      plans.co2.emission[j] = GTC_PER_PPM * nodeSlope(plans.co2, j) + model.uptakeGtcPerYr(y);
    }
    if (plans.ch4.mode[j] === CONCENTRATION) {
      plans.ch4.emission[j] = gasEmissionsForTendency(ch4Cycle, y[I.ch4Ppb], nodeSlope(plans.ch4, j), natural.ch4);
    }
    if (plans.n2o.mode[j] === CONCENTRATION) {
      plans.n2o.emission[j] = gasEmissionsForTendency(N2O_CYCLE, y[I.n2oPpb], nodeSlope(plans.n2o, j), natural.n2o);
    }
  };
  diagnoseAt(0, y0);

  const inputs = { co2: emptyInput(), ch4: emptyInput(), n2o: emptyInput() };
  let inputStep = -1;
  const setInputs = (k: number): void => {
    setStepInput(inputs.co2, plans.co2, k, GTC_PER_PPM);
    setStepInput(inputs.ch4, plans.ch4, k, 1);
    setStepInput(inputs.n2o, plans.n2o, k, 1);
    inputStep = k;
  };
  const dy = new Array<number>(I.size).fill(0);
  integrateSteps(
    (k, s, y) => {
      if (k !== inputStep) setInputs(k);
      model.derivativesInto(y, s, inputs.co2, inputs.ch4, inputs.n2o, other[k] + s * (other[k + 1] - other[k]), dy);
      return dy.slice();
    },
    y0,
    n - 1,
    options.tolerances ?? DEFAULT_TOLERANCES,
    (k, y) => {
      states[k + 1] = y;
      diagnoseAt(k + 1, y);
    },
  );

  return assemble(pathway, params, options.forcing, model, plans, states, natural, feedback, options.ch4LifetimeFeedback ?? false);
}

/** Collects the node states into the result series and the notes. */
function assemble(
  pathway: Pathway,
  params: ClimateParams,
  forcingOptions: ForcingOptions,
  model: CoupledModel,
  plans: Record<Gas, GasPlan>,
  states: number[][],
  natural: { ch4: number; n2o: number },
  feedback: boolean,
  ch4LifetimeFeedback: boolean,
): EmissionRunResult {
  const I = COUPLED_STATE;
  const years = pathway.years;
  const n = years.length;
  const co2Ppm = new Float64Array(n);
  const ch4Ppb = new Float64Array(n);
  const n2oPpb = new Float64Array(n);
  const surfaceK = new Float64Array(n);
  const deepK = new Float64Array(n);
  const emittedGtc = new Float64Array(n);
  const atmosphericGtc = new Float64Array(n);
  const uptakeGtc = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const y = states[k];
    co2Ppm[k] = model.co2Ppm(y);
    ch4Ppb[k] = y[I.ch4Ppb];
    n2oPpb[k] = y[I.n2oPpb];
    surfaceK[k] = y[I.surfaceK];
    deepK[k] = y[I.deepK];
    emittedGtc[k] = y[I.emittedGtc];
    let stock = 0;
    for (let i = 0; i < CO2_BOX_COUNT; i++) stock += y[I.co2Boxes + i];
    atmosphericGtc[k] = stock;
    uptakeGtc[k] = y[I.uptakeGtc];
  }

  const forcing = forcingByAgent(n, { co2Ppm, ch4Ppb, n2oPpb, prescribed: pathway.series }, forcingOptions);
  const imbalanceWm2 = new Float64Array(n);
  for (let k = 0; k < n; k++) imbalanceWm2[k] = topOfAtmosphereImbalance(params, forcing.total[k], surfaceK[k], deepK[k]);

  const from = Math.max(0, Math.min(n - 1, CUMULATIVE_FROM_YEAR - years[0]));
  const cumulativeCo2Gtco2 = new Float64Array(n);
  if (years[n - 1] >= CUMULATIVE_FROM_YEAR) {
    for (let k = from; k < n; k++) cumulativeCo2Gtco2[k] = gtcToGtco2(emittedGtc[k] - emittedGtc[from]);
  }
  const airborneFraction = new Float64Array(n);
  let scale = 0;
  let worst = 0;
  for (let k = 0; k < n; k++) {
    airborneFraction[k] = Math.abs(emittedGtc[k]) < AIRBORNE_FRACTION_MIN_GTC ? NaN : atmosphericGtc[k] / emittedGtc[k];
    scale = Math.max(scale, Math.abs(emittedGtc[k]), Math.abs(atmosphericGtc[k]), Math.abs(uptakeGtc[k]));
    worst = Math.max(worst, Math.abs(emittedGtc[k] - atmosphericGtc[k] - uptakeGtc[k]));
  }

  const massBalanceError = scale === 0 ? 0 : worst / scale;
  if (!(massBalanceError <= MAX_MASS_BALANCE_ERROR)) {
    throw new NumericalError(
      `CO2 mass balance violated: emitted minus (atmospheric increase + uptake) reached ${massBalanceError.toExponential(2)} of the total; tighten the tolerances`,
      'numerical.mass-balance',
    );
  }

  const notes = [
    feedback
      ? 'carbon-climate feedback on uptake: on (sinks weaken with warming and cumulative uptake, Millar et al. 2017)'
      : 'carbon-climate feedback on uptake: off (fixed Joos et al. 2013 response)',
    ...gasNotes(plans.co2, years, (gtc) => `${gtcToGtco2(gtc).toFixed(2)} Gt CO2 yr-1`),
    ...gasNotes(plans.ch4, years, (mt) => `${mt.toFixed(1)} Mt CH4 yr-1`),
    ...gasNotes(plans.n2o, years, (mt) => `${mt.toFixed(2)} Mt N2O yr-1`),
  ];
  if (plans.ch4.lastConcentration < n - 1) {
    notes.push(`CH4 natural emissions ${natural.ch4.toFixed(1)} Mt CH4 yr-1 (implied by the steady state at the start); lifetime ${ch4LifetimeFeedback ? 'lengthening with the burden (11.8 yr perturbation lifetime)' : 'constant 9.1 yr'}`);
  }
  if (plans.n2o.lastConcentration < n - 1) notes.push(`N2O natural emissions ${natural.n2o.toFixed(2)} Mt N2O yr-1 (implied by the steady state at the start)`);

  const co2 = plans.co2;
  return {
    co2Ppm,
    ch4Ppb,
    n2oPpb,
    surfaceK,
    deepK,
    imbalanceWm2,
    forcing,
    co2EmissionsGtco2: co2.emission.map(gtcToGtco2),
    ch4EmissionsMt: plans.ch4.emission.slice(),
    n2oEmissionsMt: plans.n2o.emission.slice(),
    cumulativeCo2Gtco2,
    airborneFraction,
    diagnosedUntil: co2.given && co2.lastConcentration >= 0 ? years[co2.lastConcentration] : undefined,
    massBalanceError,
    carbonBudget: { emittedGtc, atmosphericGtc, uptakeGtc },
    naturalEmissionsMt: natural,
    notes,
  };
}

/**
 * Works out, node by node, whether a gas is driven by its concentration or its emissions, and
 * checks that the pathway is usable: one form per node, concentration nodes before emission nodes.
 */
function planGas(pathway: Pathway, gas: Gas, preindustrial: number, toModelUnits: (x: number) => number): GasPlan {
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
      emission[k] = toModelUnits(e![k]);
    }
  }
  const concentration = c ? Float64Array.from(c) : new Float64Array(n).fill(NaN);
  return { gas, mode, concentration, emission, lastConcentration, given: true };
}

/** Concentration of the starting equilibrium: the first year's if given, else pre-industrial. */
function startValue(plan: GasPlan, preindustrial: number): number {
  return plan.mode[0] === CONCENTRATION ? plan.concentration[0] : preindustrial;
}

/** Mean rate of change of the concentration either side of concentration node j (one side at an end). */
function nodeSlope(plan: GasPlan, j: number): number {
  const c = plan.concentration;
  const n = c.length;
  const left = j > 0 ? c[j] - c[j - 1] : NaN;
  const right = j < n - 1 && plan.mode[j + 1] === CONCENTRATION ? c[j + 1] - c[j] : NaN;
  if (Number.isNaN(left)) return Number.isNaN(right) ? 0 : right;
  return Number.isNaN(right) ? left : 0.5 * (left + right);
}

function emptyInput(): GasStepInput {
  return { prescribed: true, slope: 0, emissionStart: 0, emissionEnd: 0 };
}

/** The driver of step k (node k to k+1): prescribed concentration when node k+1 has one. */
function setStepInput(input: GasStepInput, plan: GasPlan, k: number, slopeUnits: number): void {
  input.prescribed = plan.mode[k + 1] === CONCENTRATION;
  input.slope = input.prescribed ? slopeUnits * (plan.concentration[k + 1] - plan.concentration[k]) : 0;
  input.emissionStart = plan.emission[k];
  input.emissionEnd = plan.emission[k + 1];
}

/** Total prescribed (non-greenhouse-gas) ERF at each node, W m-2, after checking it is finite. */
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

/** Notes on how a gas was driven: diagnosed span, given span, the rates either side of the join. */
function gasNotes(plan: GasPlan, years: Float64Array, format: (rate: number) => string): string[] {
  if (!plan.given) return [];
  const name = plan.gas.toUpperCase();
  const n = years.length;
  const last = plan.lastConcentration;
  const notes: string[] = [];
  if (last >= 0) notes.push(`${name} emissions diagnosed from concentrations ${years[0]}-${years[last]}`);
  if (last < n - 1) {
    notes.push(`${name} emissions as given ${years[last + 1]}-${years[n - 1]}`);
    if (last >= 0) {
      notes.push(`${name} emissions at the join: ${format(plan.emission[last])} diagnosed for ${years[last]}, ${format(plan.emission[last + 1])} given for ${years[last + 1]}`);
    }
  }
  return notes;
}

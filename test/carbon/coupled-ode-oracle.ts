// The test oracle of the production carbon scheme: the continuous coupled model (coupledModel)
// integrated by odex within each calendar year, with the same conventions as runEmissionDriven
// (a row is a calendar year; emission totals at a constant rate within their year; concentration
// records followed linearly between the 1 January values of yearStartConcentrations) and none of its
// approximations (the feedback and the CH4 lifetime follow the state continuously; forcing is that of
// the current concentrations; annual means are exact integrals carried in the state).
import { COUPLED_STATE, coupledModel, type GasStepInput } from '../../src/carbon/coupled-model.js';
import { CH4_CYCLE, gasSinkMt, N2O_CYCLE, withConstantLifetime } from '../../src/carbon/gas-cycle.js';
import { GTC_PER_PPM, gtcToGtco2, gtco2ToGtc } from '../../src/carbon/units.js';
import type { CarbonCycleParams } from '../../src/carbon/uptake-feedback.js';
import { yearStartConcentrations } from '../../src/carbon/year-start-concentrations.js';
import type { ClimateParams } from '../../src/climate/params.js';
import { forcingByAgent, ghgForcingFunction, type ForcingOptions } from '../../src/forcing/agents.js';
import { PREINDUSTRIAL } from '../../src/forcing/constants.js';
import { integrateSteps } from '../../src/numerics/integrate-steps.js';
import { GASES, type Gas, type Pathway } from '../../src/pathway.js';

export interface OracleOptions {
  forcing: ForcingOptions;
  feedback?: boolean;
  carbonCycle?: CarbonCycleParams;
  ch4LifetimeFeedback?: boolean;
}

export interface OracleRun {
  /** Annual means. */
  co2Ppm: Float64Array;
  ch4Ppb: Float64Array;
  surfaceK: Float64Array;
  /** CO2 at the end of each year, ppm. */
  co2YearEndPpm: Float64Array;
  /** Emission total of each year (given or diagnosed), Gt CO2. */
  co2EmissionsGtco2: Float64Array;
  /** Taken up by land and ocean through the end of each year, Gt C. */
  uptakeGtc: Float64Array;
}

/** Per year: the concentration change over the year while a record is followed, else the emission total. */
function drivers(pathway: Pathway, gas: Gas, preindustrial: number, toModel: (x: number) => number) {
  const n = pathway.years.length;
  const c = pathway.series[GASES[gas].concentration];
  const e = pathway.series[GASES[gas].emission];
  let last = -1;
  if (c) while (last + 1 < n && Number.isFinite(c[last + 1])) last++;
  if (!c && !e) last = n - 1;
  const record = c ?? new Float64Array(n).fill(preindustrial);
  const b = last >= 0 ? yearStartConcentrations(record, last) : new Float64Array(0);
  const input = (k: number): GasStepInput => (k <= last
    ? { prescribed: true, slope: b[k + 1] - b[k], emissionStart: 0, emissionEnd: 0 }
    : { prescribed: false, slope: 0, emissionStart: toModel(e![k]), emissionEnd: toModel(e![k]) });
  return { input, start: last >= 0 ? record[0] : preindustrial };
}

/** Runs the oracle; tight odex tolerances (1e-11). */
export function oracleEmissionRun(pathway: Pathway, params: ClimateParams, options: OracleOptions): OracleRun {
  const n = pathway.years.length;
  const ch4Cycle = options.ch4LifetimeFeedback ? CH4_CYCLE : withConstantLifetime(CH4_CYCLE);
  const co2 = drivers(pathway, 'co2', PREINDUSTRIAL.co2Ppm, gtco2ToGtc);
  const ch4 = drivers(pathway, 'ch4', PREINDUSTRIAL.ch4Ppb, (x) => x);
  const n2o = drivers(pathway, 'n2o', PREINDUSTRIAL.n2oPpb, (x) => x);
  const other = forcingByAgent(n, { prescribed: pathway.series }, options.forcing).total;
  const model = coupledModel({
    climate: params,
    ghgForcing: ghgForcingFunction(options.forcing),
    feedback: options.feedback ?? true,
    carbonCycle: options.carbonCycle,
    co2StartPpm: co2.start,
    ch4: ch4Cycle,
    n2o: N2O_CYCLE,
    ch4NaturalMt: gasSinkMt(ch4Cycle, ch4.start),
    n2oNaturalMt: gasSinkMt(N2O_CYCLE, n2o.start),
  });
  const I = COUPLED_STATE;
  // Three quadratures after the model's state: the integrals of CO2 (ppm), CH4 (ppb) and T (K) over the year.
  const y0 = new Array<number>(I.size + 3).fill(0);
  y0[I.ch4Ppb] = ch4.start;
  y0[I.n2oPpb] = n2o.start;
  const out: OracleRun = {
    co2Ppm: new Float64Array(n),
    ch4Ppb: new Float64Array(n),
    surfaceK: new Float64Array(n),
    co2YearEndPpm: new Float64Array(n),
    co2EmissionsGtco2: new Float64Array(n),
    uptakeGtc: new Float64Array(n),
  };
  const dy = new Array<number>(I.size).fill(0);
  let emittedBefore = 0;
  let y = y0;
  for (let k = 0; k < n; k++) {
    const inputs = [co2.input(k), ch4.input(k), n2o.input(k)];
    // Concentration slopes are per year in ppm; the model takes CO2 in Gt C yr-1.
    if (inputs[0].prescribed) inputs[0] = { ...inputs[0], slope: GTC_PER_PPM * inputs[0].slope };
    const start = y.slice();
    start[I.size] = 0;
    start[I.size + 1] = 0;
    start[I.size + 2] = 0;
    integrateSteps(
      (_step, s, state) => {
        model.derivativesInto(state, s, inputs[0], inputs[1], inputs[2], other[k], dy);
        return [...dy, model.co2Ppm(state), state[I.ch4Ppb], state[I.surfaceK]];
      },
      start,
      1,
      { relativeTolerance: 1e-11, absoluteTolerance: 1e-11, maxStepsPerUnit: 5000 },
      (_step, end) => {
        y = end;
      },
    );
    out.co2Ppm[k] = y[I.size];
    out.ch4Ppb[k] = y[I.size + 1];
    out.surfaceK[k] = y[I.size + 2];
    out.co2YearEndPpm[k] = model.co2Ppm(y);
    out.co2EmissionsGtco2[k] = gtcToGtco2(y[I.emittedGtc] - emittedBefore);
    out.uptakeGtc[k] = y[I.uptakeGtc];
    emittedBefore = y[I.emittedGtc];
  }
  return out;
}

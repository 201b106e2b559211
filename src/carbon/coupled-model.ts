import { twoBoxDerivativesInto, type TwoBoxParams } from '../climate/two-box.js';
import type { GhgForcing } from '../forcing/agents.js';
import { CO2_BOX_COUNT, JOOS_2013 } from './co2-impulse-response.js';
import { gasTendencyPpbPerYr, type GasCycle } from './gas-cycle.js';
import { GTC_PER_PPM } from './units.js';
import { CARBON_CYCLE, irf100Target, uptakeTimescaleScaling, type CarbonCycleParams } from './uptake-feedback.js';

/**
 * Layout of the coupled carbon-gas-climate state vector. Every entry is an anomaly from the
 * equilibrium at the start of the run except the CH4 and N2O concentrations, which are absolute.
 */
export const COUPLED_STATE = {
  /** First of the CO2 boxes (Joos et al. 2013 order: permanent, 394, 36.5, 4.3 yr), Gt C. */
  co2Boxes: 0,
  /** CH4 concentration, ppb. */
  ch4Ppb: CO2_BOX_COUNT,
  /** N2O concentration, ppb. */
  n2oPpb: CO2_BOX_COUNT + 1,
  /** Surface (upper-box) temperature anomaly, K. */
  surfaceK: CO2_BOX_COUNT + 2,
  /** Deep-ocean temperature anomaly, K. */
  deepK: CO2_BOX_COUNT + 3,
  /** CO2 emitted since the start, Gt C (the time integral of the emission rate). */
  emittedGtc: CO2_BOX_COUNT + 4,
  /** CO2 taken up by land and ocean since the start, Gt C (the time integral of the uptake flux). */
  uptakeGtc: CO2_BOX_COUNT + 5,
  /** Number of entries. */
  size: CO2_BOX_COUNT + 6,
} as const;

/**
 * What drives one gas through one unit step: either its concentration is prescribed (linear in
 * time, so its rate of change is constant) or its emissions are (linear between the step's ends).
 */
export interface GasStepInput {
  /** True when the concentration is prescribed during the step. */
  prescribed: boolean;
  /** With `prescribed`: the constant rate of change (Gt C yr-1 for CO2, ppb yr-1 for CH4 and N2O). */
  slope: number;
  /** Otherwise: emission rate at the start and end of the step (Gt C yr-1 for CO2, Mt yr-1 otherwise). */
  emissionStart: number;
  emissionEnd: number;
}

/** Fixed ingredients of the coupled model for one run. */
export interface CoupledModelSpec {
  /** Two-box energy balance parameters. */
  climate: TwoBoxParams;
  /** ERF of CO2 (ppm), CH4 and N2O (ppb) relative to 1750, W m-2. */
  ghgForcing: (co2Ppm: number, ch4Ppb: number, n2oPpb: number) => GhgForcing;
  /** Carbon-climate feedback on uptake (Millar et al. 2017) on, or the fixed Joos et al. 2013 response. */
  feedback: boolean;
  /** iIRF100 coefficients with the feedback on (default {@link CARBON_CYCLE}). */
  carbonCycle?: CarbonCycleParams;
  /** Atmospheric CO2 of the starting equilibrium, ppm. */
  co2StartPpm: number;
  ch4: GasCycle;
  n2o: GasCycle;
  /** Natural emissions, Mt yr-1 (the sinks at the starting equilibrium). */
  ch4NaturalMt: number;
  n2oNaturalMt: number;
}

/** The coupled model for one run: its right-hand side and the diagnostics the run reports at nodes. */
export interface CoupledModel {
  /**
   * Writes d(state)/dt at fraction `s` of a step into `out`.
   *
   * @param y state ({@link COUPLED_STATE} layout)
   * @param s fraction of the step, 0..1
   * @param co2 CO2 driver of the step; `ch4`, `n2o` likewise
   * @param otherForcingWm2 prescribed (non-greenhouse-gas) ERF at fraction s, W m-2
   * @param out receives the derivatives
   */
  derivativesInto(y: readonly number[], s: number, co2: GasStepInput, ch4: GasStepInput, n2o: GasStepInput, otherForcingWm2: number, out: number[]): void;
  /** Time-scale multiplier alpha of the CO2 boxes in a state (1 without the feedback). */
  timescaleScaling(y: readonly number[]): number;
  /** Net CO2 uptake by land and ocean in a state, Gt C yr-1: sum over decaying boxes of R_i / (alpha tau_i). */
  uptakeGtcPerYr(y: readonly number[]): number;
  /** Atmospheric CO2 in a state, ppm. */
  co2Ppm(y: readonly number[]): number;
}

/**
 * Builds the right-hand side of the coupled system (one state vector, one integrator): the
 * continuous-time statement of the model whose production scheme steps calendar years in closed
 * form (co2YearInto, gasYear, the one two-box step). Integrated by odex it is the test oracle of
 * that scheme (test/carbon/coupled-ode-oracle.ts).
 *
 *
 *   CO2 boxes (Joos et al. 2013): dR_i/dt = a_i E - R_i / (alpha tau_i),  C = C_start + sum R_i / 2.124
 *   uptake U = sum_i R_i / (alpha tau_i); with the feedback, alpha solves Millar et al. 2017 eq. 8
 *   for iIRF100 = r0 + rC (cumulative uptake) + rT T; without it alpha = 1.
 *   When the concentration is prescribed, E = dC/dt + U: the emissions that make the boxes
 *   reproduce it (exact: sum a_i = 1, so d(sum R)/dt = dC/dt identically).
 *   CH4, N2O: m dc/dt = E + E_natural - m c / tau(c), or dc/dt prescribed.
 *   Temperatures: the two-box model (Held et al. 2010; Geoffroy et al. 2013b) forced by the ERF of
 *   the current concentrations plus the prescribed forcing.
 *   Bookkeeping: d(emitted)/dt = E and d(uptake)/dt = U, so emitted = atmospheric increase + uptake.
 *
 * The returned functions keep the last alpha as the starting guess of the next solve (a local
 * cache; the result does not depend on it beyond round-off).
 */
export function coupledModel(spec: CoupledModelSpec): CoupledModel {
  const { fractions, timescalesYr } = JOOS_2013;
  const I = COUPLED_STATE;
  let lastAlpha = 1;

  const timescaleScaling = (y: readonly number[]): number => {
    if (!spec.feedback) return 1;
    lastAlpha = uptakeTimescaleScaling(irf100Target(y[I.uptakeGtc], y[I.surfaceK], spec.carbonCycle ?? CARBON_CYCLE), lastAlpha);
    return lastAlpha;
  };
  const uptakeAt = (y: readonly number[], alpha: number): number => {
    let u = 0;
    for (let i = 0; i < CO2_BOX_COUNT; i++) {
      if (timescalesYr[i] !== Infinity) u += y[I.co2Boxes + i] / (alpha * timescalesYr[i]);
    }
    return u;
  };
  const co2Ppm = (y: readonly number[]): number => {
    let sum = 0;
    for (let i = 0; i < CO2_BOX_COUNT; i++) sum += y[I.co2Boxes + i];
    return spec.co2StartPpm + sum / GTC_PER_PPM;
  };
  const gasRate = (cycle: GasCycle, natural: number, input: GasStepInput, ppb: number, s: number): number =>
    input.prescribed
      ? input.slope
      : gasTendencyPpbPerYr(cycle, ppb, input.emissionStart + s * (input.emissionEnd - input.emissionStart), natural);

  return {
    timescaleScaling,
    uptakeGtcPerYr: (y) => uptakeAt(y, timescaleScaling(y)),
    co2Ppm,
    derivativesInto(y, s, co2, ch4, n2o, otherForcingWm2, out) {
      const alpha = timescaleScaling(y);
      const uptake = uptakeAt(y, alpha);
      const emission = co2.prescribed ? co2.slope + uptake : co2.emissionStart + s * (co2.emissionEnd - co2.emissionStart);
      for (let i = 0; i < CO2_BOX_COUNT; i++) {
        const tau = timescalesYr[i];
        out[I.co2Boxes + i] = fractions[i] * emission - (tau === Infinity ? 0 : y[I.co2Boxes + i] / (alpha * tau));
      }
      out[I.emittedGtc] = emission;
      out[I.uptakeGtc] = uptake;
      const ch4Ppb = y[I.ch4Ppb];
      const n2oPpb = y[I.n2oPpb];
      out[I.ch4Ppb] = gasRate(spec.ch4, spec.ch4NaturalMt, ch4, ch4Ppb, s);
      out[I.n2oPpb] = gasRate(spec.n2o, spec.n2oNaturalMt, n2o, n2oPpb, s);
      const f = spec.ghgForcing(co2Ppm(y), ch4Ppb, n2oPpb);
      twoBoxDerivativesInto(spec.climate, f.co2 + f.ch4 + f.n2o + otherForcingWm2, y[I.surfaceK], y[I.deepK], out, I.surfaceK);
    },
  };
}

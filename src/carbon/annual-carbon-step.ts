import { CO2_BOX_COUNT, JOOS_2013 } from './co2-impulse-response.js';
import { CARBON_CYCLE, irf100Target, uptakeTimescaleScaling, type CarbonCycleParams } from './uptake-feedback.js';

/**
 * The CO2 state that {@link annualCarbonStepInto} advances, all anomalies from the starting
 * equilibrium: the four Joos et al. 2013 boxes and the cumulative bookkeeping, at the start of a
 * calendar year (1 January) between steps.
 */
export interface AnnualCarbonState {
  /** Box contents, Gt C (Joos et al. 2013 order: permanent, 394.4, 36.54, 4.304 yr). */
  boxesGtc: Float64Array;
  /** CO2 taken up by land and ocean since the start, Gt C. */
  uptakeGtc: number;
  /** CO2 emitted since the start, Gt C. */
  emittedGtc: number;
  /** Annual-mean atmospheric anomaly over the last year stepped, Gt C (the mean of the boxes' sum over the year). */
  meanGtc: number;
  /** Emission total of the last year stepped, Gt C (given or diagnosed). */
  lastEmissionGtc: number;
  /** Time-scale multiplier alpha of the last step (the warm start of the next solve). */
  alpha: number;
  /** The iIRF100 coefficients (Millar et al. 2017 form). */
  cycle: CarbonCycleParams;
  /** Carbon-climate feedback on uptake; false keeps alpha = 1 (the fixed Joos et al. 2013 response). */
  feedback: boolean;
  /** Scratch of one step: decay factors d_i = exp(-1 / (alpha tau_i)). */
  decay: Float64Array;
  /** Scratch of one step: growth factors g_i = alpha tau_i (1 - d_i) (1 for the permanent box). */
  growth: Float64Array;
}

/**
 * A fresh state at the starting equilibrium (empty boxes, nothing emitted or taken up).
 *
 * @param cycle iIRF100 coefficients (default {@link CARBON_CYCLE}, warmcast's fitted defaults)
 * @param feedback carbon-climate feedback on uptake (default true)
 * @example annualCarbonState().boxesGtc // Float64Array [0, 0, 0, 0]
 */
export function annualCarbonState(cycle: CarbonCycleParams = CARBON_CYCLE, feedback = true): AnnualCarbonState {
  return {
    boxesGtc: new Float64Array(CO2_BOX_COUNT),
    uptakeGtc: 0,
    emittedGtc: 0,
    meanGtc: 0,
    lastEmissionGtc: 0,
    alpha: 1,
    cycle,
    feedback,
    decay: new Float64Array(CO2_BOX_COUNT),
    growth: new Float64Array(CO2_BOX_COUNT),
  };
}

/**
 * Empties a state back to the starting equilibrium, keeping its coefficients and scratch arrays
 * (an ensemble reuses one state for every member).
 */
export function resetAnnualCarbonState(state: AnnualCarbonState): void {
  state.boxesGtc.fill(0);
  state.uptakeGtc = 0;
  state.emittedGtc = 0;
  state.meanGtc = 0;
  state.lastEmissionGtc = 0;
  state.alpha = 1;
}

/**
 * The Millar et al. 2017 time-scale multiplier alpha for a state and warming, with the pre-industrial
 * iIRF100 r0 multiplied by `irf100Scale`: alpha solves iIRF100(alpha) = s r0 + rC U + rT T (clamped
 * as {@link irf100Target} clamps); 1 when the state's feedback is off. Updates `state.alpha` (the
 * warm start).
 *
 * @param state carbon state (its uptake and coefficients are read, its alpha written)
 * @param surfaceK surface warming, K
 * @param irf100Scale multiplier s on r0, > 0
 * @returns alpha, dimensionless
 * @example annualTimescaleScaling(annualCarbonState(), 0, 1) // ≈ 0.120 (iIRF100 32.4 yr)
 */
export function annualTimescaleScaling(state: AnnualCarbonState, surfaceK: number, irf100Scale: number): number {
  if (!state.feedback) return (state.alpha = 1);
  state.alpha = uptakeTimescaleScaling(irf100Target(state.uptakeGtc, surfaceK, state.cycle, irf100Scale), state.alpha);
  return state.alpha;
}

/** Fills the state's step factors for a time-scale multiplier. */
function stepFactors(state: AnnualCarbonState, alpha: number): void {
  const { timescalesYr } = JOOS_2013;
  const { decay, growth } = state;
  for (let i = 0; i < CO2_BOX_COUNT; i++) {
    const tau = alpha * timescalesYr[i];
    if (tau === Infinity) {
      decay[i] = 1;
      growth[i] = 1;
    } else {
      // One transcendental call a box: e^(-1/tau) = 1 + expm1(-1/tau) (each step of every member of
      // an emission-driven ensemble comes here).
      const m = Math.expm1(-1 / tau);
      decay[i] = 1 + m;
      growth[i] = -tau * m;
    }
  }
}

/**
 * Advances the CO2 boxes exactly over one calendar year whose emission total is E, emitted at a
 * constant rate, with the time scales frozen at the start-of-year state (alpha from the uptake at
 * 1 January and the given warming, as {@link annualTimescaleScaling}): each decaying box of the
 * Joos et al. 2013 response, dR_i/dt = a_i E - R_i / (alpha tau_i), is solved in closed form,
 *   R_i(1) = R_i d_i + a_i E g_i,   d_i = exp(-1 / (alpha tau_i)),  g_i = alpha tau_i (1 - d_i),
 * and the permanent box gains a_0 E. The year's uptake is the exact integral of sum R_i / (alpha tau_i),
 *   sum_i [R_i (1 - d_i) + a_i E (1 - g_i)],
 * so emitted = atmospheric increase + uptake holds to rounding, and the emitted total grows by
 * exactly E. The annual mean of each box is also exact: R_i g_i + a_i E (alpha tau_i - alpha tau_i g_i)
 * (R_0 + a_0 E / 2 for the permanent box); their sum is left in `state.meanGtc`.
 *
 * Freezing alpha over the year is the scheme's one approximation: the feedback responds to the
 * year's warming and uptake a year late.
 *
 * @param state carbon state, advanced in place from 1 January of the year to 1 January of the next
 * @param surfaceK surface warming the feedback sees during the year, K
 * @param irf100Scale multiplier on the pre-industrial iIRF100 (1 = the state's r0)
 * @param emissionGtc CO2 emitted during the year, Gt C
 * @example annualCarbonStepInto(annualCarbonState(), 0, 1, 10) // boxes then hold 8.13 Gt C, 1.87 Gt C taken up (Millar r0)
 */
export function annualCarbonStepInto(state: AnnualCarbonState, surfaceK: number, irf100Scale: number, emissionGtc: number): void {
  stepFactors(state, annualTimescaleScaling(state, surfaceK, irf100Scale));
  advance(state, emissionGtc);
}

/**
 * The emission total of the coming year (emitted at a constant rate) that raises the atmospheric
 * stock from 1 January to 1 January by exactly `increaseGtc` under the same frozen-alpha step, then
 * takes that step: the step is linear in E, sum R(1) = sum_i R_i d_i + E sum_i a_i g_i, so
 * E = (increase + sum_i R_i (1 - d_i)) / sum_i a_i g_i.
 *
 * @param state carbon state, advanced in place
 * @param surfaceK surface warming the feedback sees during the year, K
 * @param irf100Scale multiplier on the pre-industrial iIRF100
 * @param increaseGtc atmospheric increase over the year, Gt C (2.124 x the ppm change)
 * @returns the diagnosed emission total of the year, Gt C
 * @example annualCarbonStepForIncreaseInto(annualCarbonState(), 0, 1, 0) // 0 (equilibrium stays)
 */
export function annualCarbonStepForIncreaseInto(state: AnnualCarbonState, surfaceK: number, irf100Scale: number, increaseGtc: number): number {
  stepFactors(state, annualTimescaleScaling(state, surfaceK, irf100Scale));
  const { fractions } = JOOS_2013;
  const { boxesGtc: r, decay, growth } = state;
  let loss = 0;
  let gain = 0;
  for (let i = 0; i < CO2_BOX_COUNT; i++) {
    loss += r[i] * (1 - decay[i]);
    gain += fractions[i] * growth[i];
  }
  const emission = (increaseGtc + loss) / gain;
  advance(state, emission);
  return emission;
}

/** One step with the factors in the state's scratch arrays. */
function advance(state: AnnualCarbonState, e: number): void {
  const { fractions, timescalesYr } = JOOS_2013;
  const { boxesGtc: r, decay, growth } = state;
  let uptake = 0;
  let mean = 0;
  for (let i = 0; i < CO2_BOX_COUNT; i++) {
    const a = fractions[i] * e;
    if (decay[i] === 1) {
      mean += r[i] + 0.5 * a;
    } else {
      const tau = state.alpha * timescalesYr[i];
      mean += r[i] * growth[i] + a * (tau - tau * growth[i]);
    }
    uptake += r[i] * (1 - decay[i]) + a * (1 - growth[i]);
    r[i] = r[i] * decay[i] + a * growth[i];
  }
  state.uptakeGtc += uptake;
  state.emittedGtc += e;
  state.meanGtc = mean;
  state.lastEmissionGtc = e;
}

/**
 * Atmospheric CO2 anomaly of a state, Gt C (the sum of the boxes).
 * @example atmosphericGtc(annualCarbonState()) // 0
 */
export function atmosphericGtc(state: AnnualCarbonState): number {
  const r = state.boxesGtc;
  let sum = 0;
  for (let i = 0; i < CO2_BOX_COUNT; i++) sum += r[i];
  return sum;
}

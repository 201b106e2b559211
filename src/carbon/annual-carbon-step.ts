import { CO2_BOX_COUNT, JOOS_2013 } from './co2-impulse-response.js';
import { irf100Target, MILLAR_2017, uptakeTimescaleScaling } from './uptake-feedback.js';

/**
 * The CO2 state that {@link annualCarbonStepInto} advances, all anomalies from the starting
 * equilibrium: the four Joos et al. 2013 boxes and the cumulative bookkeeping.
 */
export interface AnnualCarbonState {
  /** Box contents, Gt C (Joos et al. 2013 order: permanent, 394.4, 36.54, 4.304 yr). */
  boxesGtc: Float64Array;
  /** CO2 taken up by land and ocean since the start, Gt C. */
  uptakeGtc: number;
  /** CO2 emitted since the start, Gt C. */
  emittedGtc: number;
  /** Time-scale multiplier alpha of the last step (the warm start of the next solve). */
  alpha: number;
  /** Scratch of one step: decay factors d_i = exp(-1 / (alpha tau_i)). */
  decay: Float64Array;
  /** Scratch of one step: growth factors g_i = alpha tau_i (1 - d_i) (1 for the permanent box). */
  growth: Float64Array;
}

/**
 * A fresh state at the starting equilibrium (empty boxes, nothing emitted or taken up).
 * @example annualCarbonState().boxesGtc // Float64Array [0, 0, 0, 0]
 */
export function annualCarbonState(): AnnualCarbonState {
  return { boxesGtc: new Float64Array(CO2_BOX_COUNT), uptakeGtc: 0, emittedGtc: 0, alpha: 1, decay: new Float64Array(CO2_BOX_COUNT), growth: new Float64Array(CO2_BOX_COUNT) };
}

/**
 * The Millar et al. 2017 time-scale multiplier alpha for a state and warming, with the pre-industrial
 * iIRF100 r0 multiplied by `irf100Scale`: alpha solves iIRF100(alpha) = s r0 + rC U + rT T (clamped
 * as {@link irf100Target} clamps). Written as irf100Target at an uptake shifted by (s - 1) r0 / rC,
 * which is the same linear target and reuses its clamp; s = 1 gives exactly the central target.
 * Updates `state.alpha` (the warm start).
 *
 * @param state carbon state (its uptake is read, its alpha written)
 * @param surfaceK surface warming, K
 * @param irf100Scale multiplier s on r0 = 32.4 yr, > 0
 * @returns alpha, dimensionless
 * @example annualTimescaleScaling(annualCarbonState(), 0, 1) // ≈ 0.120 (iIRF100 32.4 yr)
 */
export function annualTimescaleScaling(state: AnnualCarbonState, surfaceK: number, irf100Scale: number): number {
  const m = MILLAR_2017;
  const shift = irf100Scale === 1 ? 0 : ((irf100Scale - 1) * m.r0Yr) / m.rUptakeYrPerGtc;
  state.alpha = uptakeTimescaleScaling(irf100Target(state.uptakeGtc + shift, surfaceK), state.alpha);
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
 * Advances the CO2 boxes exactly over one year with a constant emission rate and the time scales
 * frozen at the start-of-year state (alpha from the uptake and warming at the start, as
 * {@link annualTimescaleScaling}): each decaying box of the Joos et al. 2013 response,
 * dR_i/dt = a_i E - R_i / (alpha tau_i), is solved in closed form,
 *   R_i(1) = R_i d_i + a_i E alpha tau_i (1 - d_i),   d_i = exp(-1 / (alpha tau_i)),
 * and the permanent box gains a_0 E. The year's uptake is the exact integral of sum R_i / (alpha tau_i),
 *   sum_i [R_i (1 - d_i) + a_i E (1 - alpha tau_i (1 - d_i))],
 * so emitted = atmospheric increase + uptake holds to rounding.
 *
 * Freezing alpha over the year is the scheme's one approximation: the feedback responds to the
 * year's warming and uptake a year late.
 *
 * @param state carbon state, advanced in place
 * @param surfaceK surface warming at the start of the year, K
 * @param irf100Scale multiplier on the pre-industrial iIRF100 (1 = Millar et al. 2017)
 * @param emissionGtcPerYr CO2 emission rate during the year, Gt C yr-1
 * @example annualCarbonStepInto(annualCarbonState(), 0, 1, 10) // boxes then hold 8.13 Gt C, 1.87 Gt C taken up
 */
export function annualCarbonStepInto(state: AnnualCarbonState, surfaceK: number, irf100Scale: number, emissionGtcPerYr: number): void {
  stepFactors(state, annualTimescaleScaling(state, surfaceK, irf100Scale));
  advance(state, emissionGtcPerYr);
}

/**
 * The constant emission rate over the coming year that raises the atmospheric stock by exactly
 * `increaseGtc` under the same frozen-alpha step, then takes that step: the step is linear in E,
 * sum R(1) = sum_i R_i d_i + E sum_i a_i g_i, so E = (increase + sum_i R_i (1 - d_i)) / sum_i a_i g_i.
 *
 * @param state carbon state, advanced in place
 * @param surfaceK surface warming at the start of the year, K
 * @param irf100Scale multiplier on the pre-industrial iIRF100
 * @param increaseGtc atmospheric increase over the year, Gt C (2.124 x the ppm change)
 * @returns the diagnosed emission rate, Gt C yr-1
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
  const { fractions } = JOOS_2013;
  const { boxesGtc: r, decay, growth } = state;
  let uptake = 0;
  for (let i = 0; i < CO2_BOX_COUNT; i++) {
    uptake += r[i] * (1 - decay[i]) + fractions[i] * e * (1 - growth[i]);
    r[i] = r[i] * decay[i] + fractions[i] * e * growth[i];
  }
  state.uptakeGtc += uptake;
  state.emittedGtc += e;
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

import { NumericalError } from '../errors.js';
import { DEFAULT_TOLERANCES, integrateSteps, type OdeTolerances } from '../numerics/integrate-steps.js';
import { propagateTwoBoxInto } from './two-box-step.js';
import { topOfAtmosphereImbalance, twoBoxDerivativesInto, type TwoBoxParams } from './two-box.js';

/** Temperature response of the two-box model on an annual grid. */
export interface EnergyBalanceResult {
  /** Upper-box (surface) temperature anomaly at each year node, K, relative to the start state. */
  surfaceK: Float64Array;
  /** Deep-ocean temperature anomaly, K. */
  deepK: Float64Array;
  /** Top-of-atmosphere energy imbalance, W m-2 (positive = Earth gaining heat). */
  imbalanceWm2: Float64Array;
  /** Right-hand-side evaluations the integrator used (0 for the exact propagator). */
  evaluations: number;
}

/** How the temperature equations are stepped. */
export type EnergyBalanceMethod = 'odex' | 'exact';

/**
 * Integrates the two-box energy balance model from equilibrium (T = T_d = 0 at the first year) through
 * annual forcing values, forcing linear in time between consecutive year nodes; temperatures are
 * reported at the year nodes. `exact` (the default) steps the closed-form one-year propagator of
 * two-box-step.ts, the step every run and ensemble uses; `odex` integrates the ODE, the reference it
 * is checked against (same answer to solver tolerance, much slower).
 *
 * @param p model parameters
 * @param forcingWm2 total ERF at each year node, W m-2
 * @param method `exact` (default) or `odex`
 * @param tolerances odex tolerances
 * @throws NumericalError if odex exceeds its step bound or produces non-finite values
 */
export function energyBalance(
  p: TwoBoxParams,
  forcingWm2: Float64Array,
  method: EnergyBalanceMethod = 'exact',
  tolerances: OdeTolerances = DEFAULT_TOLERANCES,
): EnergyBalanceResult {
  const n = forcingWm2.length;
  const surfaceK = new Float64Array(n);
  const deepK = new Float64Array(n);
  let evaluations = 0;
  if (method === 'exact') {
    propagateTwoBoxInto(p, forcingWm2, surfaceK, deepK);
  } else {
    const dy = [0, 0];
    try {
      evaluations = integrateSteps(
      (k, s, y) => {
        const f = forcingWm2[k] + s * (forcingWm2[k + 1] - forcingWm2[k]);
        twoBoxDerivativesInto(p, f, y[0], y[1], dy);
        return dy.slice();
      },
      [0, 0],
      n - 1,
      tolerances,
      (k, y) => {
        surfaceK[k + 1] = y[0];
        deepK[k + 1] = y[1];
      },
      );
    } catch (e) {
      throw e instanceof NumericalError ? explainFailure(p, e) : e;
    }
  }
  const imbalanceWm2 = new Float64Array(n);
  for (let i = 0; i < n; i++) imbalanceWm2[i] = topOfAtmosphereImbalance(p, forcingWm2[i], surfaceK[i], deepK[i]);
  return { surfaceK, deepK, imbalanceWm2, evaluations };
}

/**
 * Adds the likely culprit to an integrator failure: the explicit odex steps must resolve the fastest
 * time scale, about C / (lambda + epsilon gamma), so a tiny upper heat capacity or a huge exchange
 * makes the system stiff. Names the parameter and suggests the exact propagator.
 */
function explainFailure(p: TwoBoxParams, e: NumericalError): NumericalError {
  const fastYears = p.upperHeatCapacity / (p.feedbackWm2K + p.deepEfficacy * p.exchangeWm2K);
  return new NumericalError(
    `${e.message}. The fastest time scale is ${fastYears.toExponential(2)} yr (upper_heat_capacity ${p.upperHeatCapacity} W yr m-2 K-1 ` +
      `over feedback_wm2k + deep_efficacy x exchange_wm2k = ${(p.feedbackWm2K + p.deepEfficacy * p.exchangeWm2K).toPrecision(4)} W m-2 K-1): ` +
      'raise upper_heat_capacity, or use the default --method exact',
    e.code,
  );
}

/**
 * The multi-model-mean impulse response of atmospheric CO2 to an emission pulse, Joos et al. 2013
 * (ACP 13, 2793), Table 5, as tabulated again in IPCC AR5 WG1 Table 8.SM.10: the airborne fraction of
 * a pulse emitted at t = 0 is
 *   IRF(t) = a0 + sum_{i=1..3} a_i exp(-t / tau_i).
 * The fit is to the 100 Gt C pulse on a constant 389 ppm background ("PD100"), with the models'
 * climate-carbon feedbacks active. Status: the coefficients are quoted by secondary sources
 * (REFERENCES.md, C2) and reproduce the paper's 20- and 100-year values.
 *
 * Box 0 never decays: it stands for the share that only ocean-sediment and weathering processes,
 * far slower than the fit's 1000-year window, remove.
 */
export const JOOS_2013 = {
  /** Shares of the pulse, dimensionless; they sum to 1. */
  fractions: [0.2173, 0.224, 0.2824, 0.2763],
  /** e-folding times, yr (box 0 is permanent). */
  timescalesYr: [Infinity, 394.4, 36.54, 4.304],
} as const;

/** Number of CO2 boxes. */
export const CO2_BOX_COUNT = JOOS_2013.fractions.length;

/**
 * Airborne fraction of a CO2 pulse t years after emission under the Joos et al. 2013 response with
 * every time scale multiplied by `scaling` (1 = the published fit).
 *
 * @param years time since the pulse, yr (>= 0)
 * @param scaling multiplier on the time scales (Millar et al. 2017's alpha), > 0
 * @returns fraction of the pulse still in the atmosphere, dimensionless
 * @example co2ImpulseResponse(100) // ≈ 0.409 (Joos et al. 2013: 0.41 ± 0.13)
 */
export function co2ImpulseResponse(years: number, scaling = 1): number {
  const { fractions, timescalesYr } = JOOS_2013;
  let sum = 0;
  for (let i = 0; i < fractions.length; i++) sum += fractions[i] * Math.exp(-years / (scaling * timescalesYr[i]));
  return sum;
}

/**
 * Time integral of {@link co2ImpulseResponse} from 0 to `horizonYr`, yr:
 *   sum_i a_i (alpha tau_i) (1 - exp(-H / (alpha tau_i))), with a0 H for the permanent box.
 * With H = 100 this is Millar et al. 2017's iIRF100.
 *
 * @param scaling multiplier alpha on the time scales, > 0
 * @param horizonYr integration horizon H, yr
 * @example integratedImpulseResponse(1, 100) // ≈ 52.4 (AR5 WG1 Table 8.SM.11: 52.4 yr)
 */
export function integratedImpulseResponse(scaling: number, horizonYr = 100): number {
  const { fractions, timescalesYr } = JOOS_2013;
  let sum = 0;
  for (let i = 0; i < fractions.length; i++) {
    const tau = scaling * timescalesYr[i];
    sum += tau === Infinity ? fractions[i] * horizonYr : fractions[i] * tau * -Math.expm1(-horizonYr / tau);
  }
  return sum;
}

/**
 * Derivative of {@link integratedImpulseResponse} with respect to the scaling, yr:
 *   sum_i a_i tau_i [1 - exp(-x_i)(1 + x_i)], x_i = H / (alpha tau_i).
 * Positive and decreasing in alpha (the integral is increasing and concave), which makes Newton's
 * method safe in `uptakeTimescaleScaling`.
 */
export function integratedImpulseResponseSlope(scaling: number, horizonYr = 100): number {
  const { fractions, timescalesYr } = JOOS_2013;
  let sum = 0;
  for (let i = 0; i < fractions.length; i++) {
    const tauPublished = timescalesYr[i];
    if (tauPublished === Infinity) continue;
    const x = horizonYr / (scaling * tauPublished);
    sum += fractions[i] * tauPublished * (-Math.expm1(-x) - x * Math.exp(-x));
  }
  return sum;
}

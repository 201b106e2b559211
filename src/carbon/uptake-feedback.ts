import { JOOS_2013 } from './co2-impulse-response.js';
import { FITTED_CARBON_CYCLE } from './fitted-carbon-cycle.js';

/**
 * The carbon-climate feedback on uptake of Millar et al. 2017 (ACP 17, 7213, eqs. 7-8 and Table 1):
 * land and ocean sinks weaken as the climate warms and as the carbon they have already taken up
 * grows. The 100-year integrated impulse response is made a linear function of the state,
 *   iIRF100 = r0 + rC C_acc + rT T   (capped at `maxIrf100Yr`),
 * where C_acc is the cumulative uptake by land and ocean (Gt C) and T the surface warming (K), and
 * every box time scale of the Joos et al. 2013 response is multiplied by the alpha that gives that
 * iIRF100. Values from memory (not checked against the paper's table). The defaults warmcast runs
 * with are {@link CARBON_CYCLE}.
 */
export const MILLAR_2017 = {
  /** iIRF100 of the pre-industrial carbon cycle, yr. */
  r0Yr: 32.4,
  /** Growth of iIRF100 with cumulative land and ocean uptake, yr per Gt C. */
  rUptakeYrPerGtc: 0.019,
  /** Growth of iIRF100 with surface warming, yr per K. */
  rTemperatureYrPerK: 4.165,
  /** Upper limit of iIRF100, yr (the 100-yr integral cannot exceed 100 yr; the paper caps it at 97). */
  maxIrf100Yr: 97,
  /** Integration horizon, yr. */
  horizonYr: 100,
} as const;

/** The three coefficients of the iIRF100 target, the carbon-cycle parameters a run or a member uses. */
export interface CarbonCycleParams {
  /** iIRF100 of the pre-industrial carbon cycle, r0, yr. */
  r0Yr: number;
  /** Growth of iIRF100 with cumulative land and ocean uptake, rC, yr per Gt C (>= 0). */
  rUptakeYrPerGtc: number;
  /** Growth of iIRF100 with surface warming, rT, yr per K (>= 0). */
  rTemperatureYrPerK: number;
}

/**
 * warmcast's default carbon cycle: r0 and rT of Millar et al. 2017, rC fitted by
 * scripts/fit-carbon-cycle.ts so that the emissions diagnosed from the bundled concentration history
 * match published totals (AR6 WG1 SPM 1850-2019, Global Carbon Budget 2010-2019; see
 * src/carbon/README.md for why rC is the coefficient refitted).
 */
export const CARBON_CYCLE: CarbonCycleParams = {
  r0Yr: MILLAR_2017.r0Yr,
  rUptakeYrPerGtc: FITTED_CARBON_CYCLE.rUptakeYrPerGtc,
  rTemperatureYrPerK: MILLAR_2017.rTemperatureYrPerK,
};

/**
 * Lower limit of iIRF100 used here, yr: a numerical guard, not part of the published formulation.
 * Box 0 of the Joos et al. 2013 response never decays, so iIRF100 cannot fall below a0 x 100 =
 * 21.7 yr for any alpha, and alpha (hence the fastest time scale) tends to zero as the target nears
 * it. Targets below 32.4 yr arise only after net removal from the air of carbon taken up earlier or
 * after cooling (25 yr needs about -390 Gt C of uptake or -1.8 K); there the time scales stop
 * shrinking at alpha of about 0.033.
 */
const MIN_IRF100_YR = 25;

/**
 * The iIRF100 target of Millar et al. 2017 for a state, yr: s r0 + rC U + rT T, clamped to [25, 97] yr.
 *
 * @param uptakeGtc cumulative uptake U by land and ocean since pre-industrial, Gt C
 * @param surfaceK surface warming T since pre-industrial, K
 * @param cycle the coefficients (default {@link CARBON_CYCLE})
 * @param r0Scale multiplier s on r0 (an ensemble member's draw; default 1)
 * @example irf100Target(0, 0) // 32.4
 */
export function irf100Target(uptakeGtc: number, surfaceK: number, cycle: CarbonCycleParams = CARBON_CYCLE, r0Scale = 1): number {
  const target = r0Scale * cycle.r0Yr + cycle.rUptakeYrPerGtc * uptakeGtc + cycle.rTemperatureYrPerK * surfaceK;
  return Math.min(MILLAR_2017.maxIrf100Yr, Math.max(MIN_IRF100_YR, target));
}

/**
 * The scaling alpha of the box time scales whose 100-year integrated response equals a target
 * (Millar et al. 2017, eq. 8): solves sum_i alpha a_i tau_i (1 - exp(-100 / (alpha tau_i))) = target.
 * The left side rises and is concave in alpha, so Newton's method started below the root climbs to
 * it monotonically; a start above the root is pulled below it by the first step (halved if it would
 * turn negative).
 *
 * @param targetYr iIRF100 target, yr, in (21.73, 100) (a0 x 100 < target < 100)
 * @param guess starting value (the previous solution when stepping through time), > 0
 * @returns alpha, dimensionless (1 = the published Joos et al. 2013 time scales)
 * @example uptakeTimescaleScaling(52.36) // ≈ 1 (the Joos et al. 2013 fit has iIRF100 = 52.4 yr)
 */
export function uptakeTimescaleScaling(targetYr: number, guess = 0.5): number {
  const h = MILLAR_2017.horizonYr;
  const { fractions, timescalesYr } = JOOS_2013;
  let alpha = guess > 0 ? guess : 0.5;
  for (let i = 0; i < 100; i++) {
    // integratedImpulseResponse and integratedImpulseResponseSlope together, from one expm1 per box
    // (each is called every year of every member of an emission-driven ensemble): with x = h / tau,
    // a box gives a tau (1 - e^-x), and its slope in alpha a tau_published (1 - e^-x - x e^-x).
    let value = 0;
    let slope = 0;
    for (let j = 0; j < fractions.length; j++) {
      const tau = alpha * timescalesYr[j];
      if (tau === Infinity) {
        value += fractions[j] * h;
        continue;
      }
      const x = h / tau;
      const m = Math.expm1(-x);
      value += fractions[j] * tau * -m;
      slope += fractions[j] * timescalesYr[j] * (-m - x * (1 + m));
    }
    const residual = value - targetYr;
    let next = alpha - residual / slope;
    if (!(next > 0)) next = alpha / 2;
    // Newton's error squares at each step, so once a step is below 1e-9 alpha the next iterate is
    // within about 1e-18 alpha of the root (rounding dominates): one evaluation fewer than waiting
    // for a step of 1e-14.
    if (Math.abs(next - alpha) <= 1e-9 * alpha) return next;
    alpha = next;
  }
  return alpha;
}

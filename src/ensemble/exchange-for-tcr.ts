import { onePercentForcing } from '../climate/calibrate.js';
import { twoBoxStepModes, type StepMode } from '../climate/two-box-step.js';
import type { TwoBoxParams } from '../climate/two-box.js';
import type { Co2Formula } from '../forcing/co2.js';
import { findRoot } from '../numerics/find-root.js';

/** Bracket for the exchange coefficient gamma, W m-2 K-1: the same as `calibrate` searches. */
export const EXCHANGE_RANGE = [1e-6, 50] as const;

/** Years of the 1 %/yr run the TCR needs: nodes 0..80, i.e. 80 steps (an even number, see unitResponse). */
const STEPS = 80;

/** Secant steps before falling back to Brent's method (AR6-like members need about five). */
const SECANT_ITERATIONS = 30;

/**
 * The fixed inputs of repeated TCR evaluations, prepared once per ensemble and thread: the TCR of
 * one mode as two polynomials in its one-year decay factor (see {@link solverTransientResponse}).
 */
export interface TcrSolver {
  /** Coefficients p_m of e^m (m = 0..79) of the mode's response to the forcing level, per W m-2 of 2xCO2 forcing. */
  levelWeights: Float64Array;
  /** Coefficients q_m of e^m of the mode's response to the forcing's rise over each year. */
  rampWeights: Float64Array;
}

/**
 * Prepares repeated TCR evaluations for a CO2 formula.
 * @example tcrSolver('ar6').levelWeights.length // 80
 */
export function tcrSolver(formula: Co2Formula): TcrSolver {
  // Forcing of the 1 %/yr CO2 run per W m-2 of 2xCO2 forcing, at nodes 0..80.
  const f = onePercentForcing(formula, 1).subarray(0, STEPS + 1);
  // A mode with one-year decay factor e and the propagator's gains g0 (level) and g1 (ramp) follows
  // x[k+1] = e x[k] + g0 f[k] + g1 (f[k+1] - f[k]) from x[0] = 0, so
  //   x[k] = g0 sum_{i<k} e^(k-1-i) f[i] + g1 sum_{i<k} e^(k-1-i) (f[i+1] - f[i]),
  // and the TCR, the mean over k = 60..79 of (x[k] + x[k+1]) / 2, is g0 P(e) + g1 Q(e) with the
  // coefficient of e^m collected below.
  const levelWeights = new Float64Array(STEPS);
  const rampWeights = new Float64Array(STEPS);
  for (let m = 0; m < STEPS; m++) {
    let p = 0;
    let q = 0;
    for (let k = 60; k < 80; k++) {
      for (const node of [k, k + 1]) {
        const i = node - 1 - m;
        if (i >= 0) {
          p += f[i];
          q += f[i + 1] - f[i];
        }
      }
    }
    levelWeights[m] = p / 40;
    rampWeights[m] = q / 40;
  }
  return { levelWeights, rampWeights };
}

/**
 * Transient climate response of the two-box model: the mean warming over years 61-80 of the 1 %/yr
 * CO2 run (IPCC AR6 WG1 glossary), defined exactly as `transientResponse` in src/climate defines it
 * (annual means (T[k] + T[k+1]) / 2 of the exact one-year propagation, k = 60..79), but evaluated
 * from the model's two modes: the surface warming is the sum of the modes (the first row of the
 * eigenvector matrix V of climate/two-box-step.ts is [1, 1]), each mode is a first-order recursive
 * filter of the forcing, and its 20-year mean is a fixed polynomial in the mode's decay factor
 * (from {@link tcrSolver}), evaluated by Horner's rule.
 *
 * @param solver from {@link tcrSolver}
 * @param p two-box parameters (lambda, gamma > 0)
 * @param forcing2xWm2 ERF of doubled CO2, W m-2 (the model is linear, so TCR scales with it)
 * @returns TCR, K
 * @example solverTransientResponse(tcrSolver('ar6'), { upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1, feedbackWm2K: 3.934 / 3, exchangeWm2K: 1.0175 }, 3.934) // ≈ 1.8
 */
export function solverTransientResponse(solver: TcrSolver, p: TwoBoxParams, forcing2xWm2: number): number {
  return forcing2xWm2 * unitResponse(solver, p.upperHeatCapacity, p.deepHeatCapacity, p.deepEfficacy, p.feedbackWm2K, p.exchangeWm2K);
}

/** TCR per W m-2 of 2xCO2 forcing, K / (W m-2), for scalar parameters (see solverTransientResponse). */
function unitResponse(solver: TcrSolver, c: number, cd: number, eps: number, lambda: number, gamma: number): number {
  // The surface warming is the sum of the step's two modes (climate/two-box-step.ts).
  const { fast, slow } = twoBoxStepModes({ upperHeatCapacity: c, deepHeatCapacity: cd, deepEfficacy: eps, feedbackWm2K: lambda, exchangeWm2K: gamma });
  return modeResponse(solver, fast) + modeResponse(solver, slow);
}

/** One mode's mean over years 61-80: level P(e) + ramp Q(e), the polynomials by Horner's rule. */
function modeResponse(solver: TcrSolver, mode: StepMode): number {
  const { levelWeights: pw, rampWeights: qw } = solver;
  let p = 0;
  let q = 0;
  for (let m = STEPS - 1; m >= 0; m--) {
    p = p * mode.decay + pw[m];
    q = q * mode.decay + qw[m];
  }
  return mode.level * p + mode.ramp * q;
}

/**
 * Solves for the exchange coefficient gamma at which the two-box model with feedback lambda gives
 * the target TCR, within the bracket `calibrate` uses. TCR falls as gamma grows (more heat goes into
 * the deep ocean), so the root is unique. The secant method on 1 / TCR against sqrt(gamma), from
 * kappa and 1.4 kappa, where kappa = F2x / TCR - lambda is the "climate resistance" (Gregory & Forster 2008,
 * JGR 113, D23105; gamma / kappa has median 1.2 and 98 % within 0.5-4.3 for AR6-like members),
 * converges in about six evaluations to a step below 1e-12 W m-2 K-1 (relative above 1);
 * should it leave the bracket or stall, Brent's method (src/numerics/find-root.ts) takes over, which
 * also decides when no gamma reaches the target.
 *
 * @param solver from {@link tcrSolver}
 * @param p heat capacities (W yr m-2 K-1), efficacy and lambda (W m-2 K-1)
 * @param forcing2xWm2 ERF of doubled CO2, W m-2
 * @param tcrK target TCR, K
 * @returns gamma in W m-2 K-1, or NaN when no gamma in {@link EXCHANGE_RANGE} reaches the target
 * @example exchangeForTcr(tcrSolver('ar6'), { upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1, feedbackWm2K: 3.934 / 3 }, 3.934, 1.8) // ≈ 1.0175
 */
export function exchangeForTcr(solver: TcrSolver, p: Omit<TwoBoxParams, 'exchangeWm2K'>, forcing2xWm2: number, tcrK: number): number {
  const { upperHeatCapacity: c, deepHeatCapacity: cd, deepEfficacy: eps, feedbackWm2K: lambda } = p;
  // TCR is linear in the forcing: solve on the unit forcing for TCR / F2x.
  const target = tcrK / forcing2xWm2;
  const [lo, hi] = EXCHANGE_RANGE;
  const kappa = 1 / target - lambda;
  if (kappa > 0) {
    // 1 / TCR is close to linear in the square root of gamma, which the secant method then follows
    // in about six evaluations (against seven to eight in gamma and TCR themselves).
    const resistance = 1 / target;
    const uLo = Math.sqrt(lo);
    const uHi = Math.sqrt(hi);
    let u0 = Math.min(Math.max(Math.sqrt(kappa), uLo), uHi);
    let u1 = Math.min(Math.max(Math.sqrt(1.4 * kappa), uLo), uHi);
    if (u0 !== u1) {
      let f0 = 1 / unitResponse(solver, c, cd, eps, lambda, u0 * u0) - resistance;
      let f1 = 1 / unitResponse(solver, c, cd, eps, lambda, u1 * u1) - resistance;
      for (let it = 0; it < SECANT_ITERATIONS; it++) {
        if (f1 === 0) return u1 * u1;
        if (f1 === f0) break;
        const u2 = u1 - (f1 * (u1 - u0)) / (f1 - f0);
        if (!(u2 >= uLo && u2 <= uHi)) break;
        const g2 = u2 * u2;
        if (Math.abs(g2 - u1 * u1) <= 1e-12 * Math.max(1, g2)) return g2;
        u0 = u1;
        f0 = f1;
        u1 = u2;
        f1 = 1 / unitResponse(solver, c, cd, eps, lambda, g2) - resistance;
      }
    }
  }
  return bracketed(solver, p, target);
}

/** Brent's method on the whole bracket (the path of members the secant method does not settle). */
function bracketed(solver: TcrSolver, p: Omit<TwoBoxParams, 'exchangeWm2K'>, target: number): number {
  const { upperHeatCapacity: c, deepHeatCapacity: cd, deepEfficacy: eps, feedbackWm2K: lambda } = p;
  const excess = (gamma: number) => unitResponse(solver, c, cd, eps, lambda, gamma) - target;
  const [lo, hi] = EXCHANGE_RANGE;
  const flo = excess(lo);
  const fhi = excess(hi);
  if (flo === 0) return lo;
  if (fhi === 0) return hi;
  // TCR above what the least exchange gives, or below what the most gives: out of reach.
  if (!(flo > 0 && fhi < 0)) return NaN;
  return findRoot(excess, lo, hi, 1e-12);
}

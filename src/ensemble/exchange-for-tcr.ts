import { onePercentForcing } from '../climate/calibrate.js';
import { propagateTwoBoxInto, type TwoBoxPropagator } from '../climate/exact-propagator.js';
import type { TwoBoxParams } from '../climate/two-box.js';
import type { Co2Formula } from '../forcing/co2.js';
import { findRoot } from '../numerics/find-root.js';
import { emptyTwoBoxPropagator, modalTwoBoxPropagatorInto } from './modal-propagator.js';

/** Bracket for the exchange coefficient gamma, W m-2 K-1: the same as `calibrate` searches. */
export const EXCHANGE_RANGE = [1e-6, 50] as const;

/** Years of the 1 %/yr run the TCR needs: nodes 0..80. */
const NODES = 81;

/** The fixed inputs and scratch buffers of repeated TCR evaluations (allocated once per ensemble and thread). */
export interface TcrSolver {
  /** Forcing of the 1 %/yr CO2 run per W m-2 of 2xCO2 forcing, at nodes 0..80. */
  unitForcing: Float64Array;
  /** Scratch propagator and temperatures. */
  propagator: TwoBoxPropagator;
  surfaceK: Float64Array;
  deepK: Float64Array;
}

/**
 * Prepares repeated TCR evaluations for a CO2 formula.
 * @example tcrSolver('ar6').unitForcing[70] // ≈ 1.0 (CO2 has doubled near year 70)
 */
export function tcrSolver(formula: Co2Formula): TcrSolver {
  return {
    unitForcing: onePercentForcing(formula, 1).slice(0, NODES),
    propagator: emptyTwoBoxPropagator(),
    surfaceK: new Float64Array(NODES),
    deepK: new Float64Array(NODES),
  };
}

/**
 * Transient climate response of the two-box model: the mean warming over years 61-80 of the 1 %/yr
 * CO2 run (IPCC AR6 WG1 glossary), computed exactly as `transientResponse` in src/climate does, but
 * with the closed-form modal propagator and no allocation, which makes solving for gamma per
 * ensemble member affordable.
 *
 * @param solver from {@link tcrSolver}
 * @param p two-box parameters (lambda, gamma > 0)
 * @param forcing2xWm2 ERF of doubled CO2, W m-2 (the model is linear, so TCR scales with it)
 * @returns TCR, K
 */
export function solverTransientResponse(solver: TcrSolver, p: TwoBoxParams, forcing2xWm2: number): number {
  const t = solver.surfaceK;
  propagateTwoBoxInto(modalTwoBoxPropagatorInto(p, solver.propagator), solver.unitForcing, t, solver.deepK);
  // Years 61-80 are the annual means around nodes 60.5-79.5, (T[k] + T[k+1]) / 2 for k = 60..79,
  // as `transientResponse` takes them.
  let sum = 0;
  for (let k = 60; k < 80; k++) sum += 0.5 * (t[k] + t[k + 1]);
  return (forcing2xWm2 * sum) / 20;
}

/**
 * Solves for the exchange coefficient gamma at which the two-box model with feedback lambda gives
 * the target TCR, by Brent's method (src/numerics/find-root.ts) within the bracket `calibrate` uses.
 * TCR falls as gamma grows (more heat goes into the deep ocean), so the root is unique.
 *
 * @param solver from {@link tcrSolver}
 * @param p heat capacities (W yr m-2 K-1), efficacy and lambda (W m-2 K-1)
 * @param forcing2xWm2 ERF of doubled CO2, W m-2
 * @param tcrK target TCR, K
 * @returns gamma in W m-2 K-1, or NaN when no gamma in {@link EXCHANGE_RANGE} reaches the target
 * @example exchangeForTcr(tcrSolver('ar6'), { upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1, feedbackWm2K: 3.934 / 3 }, 3.934, 1.8) // ≈ 1.0175
 */
export function exchangeForTcr(solver: TcrSolver, p: Omit<TwoBoxParams, 'exchangeWm2K'>, forcing2xWm2: number, tcrK: number): number {
  // One object of fixed shape, updated in place: this runs a dozen times per member.
  const q: TwoBoxParams = {
    upperHeatCapacity: p.upperHeatCapacity,
    deepHeatCapacity: p.deepHeatCapacity,
    feedbackWm2K: p.feedbackWm2K,
    exchangeWm2K: 0,
    deepEfficacy: p.deepEfficacy,
  };
  const excess = (exchangeWm2K: number) => {
    q.exchangeWm2K = exchangeWm2K;
    return solverTransientResponse(solver, q, forcing2xWm2) - tcrK;
  };
  // Brent's method first in a narrow bracket around the "climate resistance" estimate
  // kappa = F2x / TCR - lambda (Gregory & Forster 2008, JGR 113, D23105): gamma / kappa lies within
  // 0.5-4 for 98 % of AR6-like members, and the narrow bracket saves a third of the evaluations. Its
  // ends are tested first so that an unreachable TCR (a member to redraw) costs no exception.
  const [lo, hi] = EXCHANGE_RANGE;
  const kappa = forcing2xWm2 / tcrK - p.feedbackWm2K;
  let a = kappa > 0 ? Math.max(lo, kappa / 4) : lo;
  let b = kappa > 0 ? Math.min(hi, kappa * 4) : hi;
  if (!(a < b)) [a, b] = [lo, hi];
  const fa = excess(a);
  const fb = excess(b);
  if (fa > 0 && fb < 0) return findRoot(excess, a, b, 1e-12);
  if (fa <= 0) {
    // TCR too high even with this little deep-ocean exchange: a root, if any, lies below a.
    if (fa === 0) return a;
    if (a === lo || !(excess(lo) > 0)) return NaN;
    return findRoot(excess, lo, a, 1e-12);
  }
  // TCR too low even with this much exchange: a root, if any, lies above b.
  if (fb === 0) return b;
  if (b === hi || !(excess(hi) < 0)) return NaN;
  return findRoot(excess, b, hi, 1e-12);
}

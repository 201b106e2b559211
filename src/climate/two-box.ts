import type { ClimateParams } from './params.js';

/** The physical parameters the two-box equations need. */
export type TwoBoxParams = Pick<ClimateParams, 'upperHeatCapacity' | 'deepHeatCapacity' | 'feedbackWm2K' | 'exchangeWm2K' | 'deepEfficacy'>;

/**
 * Time derivatives of the two-box model with deep-ocean heat-uptake efficacy (Held et al. 2010;
 * Geoffroy et al. 2013b, eq. 1):
 *   C  dT/dt   = F - lambda T - epsilon gamma (T - T_d)
 *   C_d dT_d/dt = gamma (T - T_d)
 *
 * @param p parameters (heat capacities in W yr m-2 K-1, lambda and gamma in W m-2 K-1)
 * @param forcingWm2 effective radiative forcing F, W m-2
 * @param surfaceK upper-box temperature anomaly T, K
 * @param deepK deep-ocean temperature anomaly T_d, K
 * @param out receives [dT/dt, dT_d/dt] in K yr-1 at `offset`
 */
export function twoBoxDerivativesInto(p: TwoBoxParams, forcingWm2: number, surfaceK: number, deepK: number, out: number[], offset = 0): void {
  const exchange = p.exchangeWm2K * (surfaceK - deepK);
  out[offset] = (forcingWm2 - p.feedbackWm2K * surfaceK - p.deepEfficacy * exchange) / p.upperHeatCapacity;
  out[offset + 1] = exchange / p.deepHeatCapacity;
}

/**
 * Top-of-atmosphere energy imbalance of the efficacy model, W m-2 (Geoffroy et al. 2013b, eq. 4):
 * N = F - lambda T - (epsilon - 1) gamma (T - T_d).
 */
export function topOfAtmosphereImbalance(p: TwoBoxParams, forcingWm2: number, surfaceK: number, deepK: number): number {
  return forcingWm2 - p.feedbackWm2K * surfaceK - (p.deepEfficacy - 1) * p.exchangeWm2K * (surfaceK - deepK);
}

/**
 * The system matrix A and forcing vector b of d[T, T_d]/dt = A [T, T_d] + b F, row-major.
 */
export function twoBoxMatrix(p: TwoBoxParams): { a: Float64Array; b: Float64Array } {
  const { upperHeatCapacity: c, deepHeatCapacity: cd, feedbackWm2K: lambda, exchangeWm2K: gamma, deepEfficacy: eps } = p;
  return {
    a: Float64Array.of(-(lambda + eps * gamma) / c, (eps * gamma) / c, gamma / cd, -gamma / cd),
    b: Float64Array.of(1 / c, 0),
  };
}

/** The two modes of the two-box response (Geoffroy et al. 2013a, section 3, with efficacy as in 2013b). */
export interface TwoBoxModes {
  /** Fast and slow time scales, yr. */
  tauFast: number;
  tauSlow: number;
  /** Fractions of the equilibrium surface response carried by each mode (a_f + a_s = 1). */
  aFast: number;
  aSlow: number;
  /** Ratios of the deep to the surface amplitude in each mode. */
  phiFast: number;
  phiSlow: number;
}

/**
 * Modal decomposition of the two-box model (Geoffroy et al. 2013a, eqs. 9-14; efficacy version
 * Geoffroy et al. 2013b, appendix):
 *   b = (lambda + eps gamma)/C + gamma/C_d, b* = (lambda + eps gamma)/C - gamma/C_d,
 *   delta = b^2 - 4 lambda gamma / (C C_d),
 *   tau_{f,s} = C C_d (b -/+ sqrt(delta)) / (2 lambda gamma),
 *   phi_{f,s} = C (b* -/+ sqrt(delta)) / (2 eps gamma),
 *   a_f = phi_s tau_f lambda / (C (phi_s - phi_f)), a_s = -phi_f tau_s lambda / (C (phi_s - phi_f)).
 *
 * @param p parameters with lambda > 0 and gamma > 0
 */
export function twoBoxModes(p: TwoBoxParams): TwoBoxModes {
  const { upperHeatCapacity: c, deepHeatCapacity: cd, feedbackWm2K: lambda, exchangeWm2K: gamma, deepEfficacy: eps } = p;
  const b = (lambda + eps * gamma) / c + gamma / cd;
  const bStar = (lambda + eps * gamma) / c - gamma / cd;
  const delta = b * b - (4 * lambda * gamma) / (c * cd);
  const root = Math.sqrt(delta);
  const tauFast = (c * cd * (b - root)) / (2 * lambda * gamma);
  const tauSlow = (c * cd * (b + root)) / (2 * lambda * gamma);
  const phiFast = (c * (bStar - root)) / (2 * eps * gamma);
  const phiSlow = (c * (bStar + root)) / (2 * eps * gamma);
  const aFast = (phiSlow * tauFast * lambda) / (c * (phiSlow - phiFast));
  const aSlow = (-phiFast * tauSlow * lambda) / (c * (phiSlow - phiFast));
  return { tauFast, tauSlow, aFast, aSlow, phiFast, phiSlow };
}

/**
 * Analytic response to an abrupt, constant forcing F switched on at t = 0 from equilibrium
 * (Geoffroy et al. 2013a, eqs. 15-16):
 *   T(t)   = (F/lambda) [1 - a_f exp(-t/tau_f) - a_s exp(-t/tau_s)]
 *   T_d(t) = (F/lambda) [1 - phi_f a_f exp(-t/tau_f) - phi_s a_s exp(-t/tau_s)]
 *
 * @param p parameters
 * @param forcingWm2 F, W m-2
 * @param years time since the step, yr
 * @returns surface and deep temperature anomalies, K
 * @example abruptResponse(params, 3.93, 1e6).surfaceK // = 3.93 / lambda (the equilibrium)
 */
export function abruptResponse(p: TwoBoxParams, forcingWm2: number, years: number): { surfaceK: number; deepK: number } {
  const m = twoBoxModes(p);
  const eq = forcingWm2 / p.feedbackWm2K;
  const ef = Math.exp(-years / m.tauFast);
  const es = Math.exp(-years / m.tauSlow);
  return {
    surfaceK: eq * (1 - m.aFast * ef - m.aSlow * es),
    deepK: eq * (1 - m.phiFast * m.aFast * ef - m.phiSlow * m.aSlow * es),
  };
}

import type { TwoBoxPropagator } from '../climate/exact-propagator.js';
import { twoBoxModes, type TwoBoxParams } from '../climate/two-box.js';

/**
 * The one-year exact propagator of the two-box model (the same Phi, g0, g1 as `twoBoxPropagator`,
 * see src/climate/exact-propagator.ts) from the model's closed-form modes instead of a matrix
 * exponential, written into `out`. With the modes' time scales tau_j, deep-to-surface ratios phi_j
 * (Geoffroy et al. 2013a, eqs. 9-14; efficacy version 2013b) and V = [[1, 1], [phi_f, phi_s]]:
 *   Phi = V diag(e^{-1/tau_f}, e^{-1/tau_s}) V^-1,
 *   g0 = V [beta_j tau_j (1 - e^{-1/tau_j})]_j,  g1 = V [beta_j tau_j (1 - tau_j (1 - e^{-1/tau_j}))]_j,
 * where beta = V^-1 [1/C, 0] is the forcing's projection on the modes.
 *
 * Why ensembles use this: Node allocates every typed array over 64 bytes outside the JavaScript heap,
 * and the 4 x 4 Padé expm allocates about twenty, so `twoBoxPropagator` costs 20-30 µs per call and
 * its allocations contend across worker threads; this costs well under 1 µs and allocates nothing.
 * test/ensemble/modal-propagator.test.ts checks it against `twoBoxPropagator`, mathjs `expm` and odex.
 *
 * @param p parameters with lambda > 0 and gamma > 0
 * @param out receives the propagator (its arrays are overwritten)
 * @returns `out`
 * @example modalTwoBoxPropagatorInto(params, emptyTwoBoxPropagator()).phi // ≈ twoBoxPropagator(params).phi
 */
export function modalTwoBoxPropagatorInto(p: TwoBoxParams, out: TwoBoxPropagator): TwoBoxPropagator {
  const m = twoBoxModes(p);
  const hf = 1 / m.tauFast;
  const hs = 1 / m.tauSlow;
  const ef = Math.exp(-hf);
  const es = Math.exp(-hs);
  const { phiFast: pf, phiSlow: ps } = m;
  const d = ps - pf;
  out.phi[0] = (ef * ps - es * pf) / d;
  out.phi[1] = (es - ef) / d;
  out.phi[2] = (pf * ps * (ef - es)) / d;
  out.phi[3] = (ps * es - pf * ef) / d;
  // Forcing on the modes, beta = V^-1 [1/C, 0], times tau_j: the response per W m-2 of each mode.
  const bf = (ps / (p.upperHeatCapacity * d)) * m.tauFast;
  const bs = (-pf / (p.upperHeatCapacity * d)) * m.tauSlow;
  const g0f = -bf * Math.expm1(-hf);
  const g0s = -bs * Math.expm1(-hs);
  const g1f = bf * rampGain(hf);
  const g1s = bs * rampGain(hs);
  out.g0[0] = g0f + g0s;
  out.g0[1] = pf * g0f + ps * g0s;
  out.g1[0] = g1f + g1s;
  out.g1[1] = pf * g1f + ps * g1s;
  return out;
}

/** A propagator to fill with {@link modalTwoBoxPropagatorInto}. */
export function emptyTwoBoxPropagator(): TwoBoxPropagator {
  return { phi: new Float64Array(4), g0: new Float64Array(2), g1: new Float64Array(2) };
}

/**
 * Response of a mode with rate h (1 / tau) to a forcing rising by one unit over the year, relative to
 * its equilibrium response: 1 - (1 - e^-h) / h. A series for slow modes, where the closed form cancels.
 */
export function rampGain(h: number): number {
  if (h < 1e-2) return h * (1 / 2 - h * (1 / 6 - h * (1 / 24 - h * (1 / 120 - h * (1 / 720 - h / 5040)))));
  return 1 + Math.expm1(-h) / h;
}

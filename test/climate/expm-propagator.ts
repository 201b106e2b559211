import { twoBoxMatrix, type TwoBoxParams } from '../../src/climate/two-box.js';
import { expm } from '../../src/numerics/expm.js';

/**
 * Test oracle for src/climate/two-box-step.ts. One-year exact propagator of the linear two-box model for forcing linear within the year:
 *   x(k+1) = Phi x(k) + g0 F_k + g1 (F_{k+1} - F_k),
 * with Phi = e^A, g0 = ∫0^1 e^{A(1-s)} b ds and g1 = ∫0^1 e^{A(1-s)} b s ds, all read off one
 * exponential of the augmented 4 x 4 matrix [[A, b, 0], [0, 0, 1], [0, 0, 0]] (Van Loan 1978,
 * "Computing integrals involving the matrix exponential", IEEE TAC 23, 395).
 */
export interface TwoBoxPropagator {
  /** Phi row-major: [T<-T, T<-Td, Td<-T, Td<-Td]. */
  phi: Float64Array;
  /** Response to the forcing at the start of the year, per W m-2: [T, Td]. */
  g0: Float64Array;
  /** Response to the forcing's rise over the year, per W m-2: [T, Td]. */
  g1: Float64Array;
}

/**
 * Builds the one-year propagator for a parameter set.
 * @example twoBoxPropagator(params).phi // e^A for one year
 */
export function twoBoxPropagator(p: TwoBoxParams, stepYears = 1): TwoBoxPropagator {
  const { a, b } = twoBoxMatrix(p);
  const m = new Float64Array(16);
  // Augmented state [T, Td, u, v] with u = F(t), v = dF/dt: u' = v, v' = 0.
  m[0] = a[0] * stepYears;
  m[1] = a[1] * stepYears;
  m[2] = b[0] * stepYears;
  m[4] = a[2] * stepYears;
  m[5] = a[3] * stepYears;
  m[6] = b[1] * stepYears;
  m[11] = 1; // u' = v, with v measured per step (dF over the step), so no factor here
  const e = expm(m, 4);
  return {
    phi: Float64Array.of(e[0], e[1], e[4], e[5]),
    g0: Float64Array.of(e[2], e[6]),
    g1: Float64Array.of(e[3], e[7]),
  };
}

/**
 * Runs the two-box model from rest through forcing at year nodes (linear between them) with the
 * matrix-exponential propagator: the oracle of propagateTwoBoxInto.
 */
export function expmTwoBoxRun(p: TwoBoxParams, forcingWm2: ArrayLike<number>): { surfaceK: Float64Array; deepK: Float64Array } {
  const { phi, g0, g1 } = twoBoxPropagator(p);
  const n = forcingWm2.length;
  const surfaceK = new Float64Array(n);
  const deepK = new Float64Array(n);
  for (let k = 0; k + 1 < n; k++) {
    const f0 = forcingWm2[k];
    const df = forcingWm2[k + 1] - f0;
    surfaceK[k + 1] = phi[0] * surfaceK[k] + phi[1] * deepK[k] + g0[0] * f0 + g1[0] * df;
    deepK[k + 1] = phi[2] * surfaceK[k] + phi[3] * deepK[k] + g0[1] * f0 + g1[1] * df;
  }
  return { surfaceK, deepK };
}

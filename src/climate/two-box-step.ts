import { twoBoxModes, type TwoBoxParams } from './two-box.js';

/**
 * The one-year step of the linear two-box model for forcing linear within the year, for a set of
 * members (member r at index r of every array):
 *
 *   [T, T_d](k+1) = Phi [T, T_d](k) + level F_k + ramp (F_{k+1} - F_k),
 *
 * with Phi = e^A, level = ∫0^1 e^{A(1-s)} b ds and ramp = ∫0^1 e^{A(1-s)} b s ds for the system
 * d[T, T_d]/dt = A [T, T_d] + b F of two-box.ts. Forcing values are at year nodes and linear between
 * them (a forcing constant within the year is the case F_{k+1} = F_k). The coefficients come in
 * closed form from the model's two modes (see {@link twoBoxStepsInto}); odex (energy-balance.ts) and
 * the matrix exponential of the augmented matrix (Van Loan 1978) are the oracles the tests compare
 * them with.
 */
export interface TwoBoxSteps {
  /** Members. */
  count: number;
  /** Phi, row-major: T from T, T from T_d, T_d from T, T_d from T_d (dimensionless). */
  tFromT: Float64Array;
  tFromD: Float64Array;
  dFromT: Float64Array;
  dFromD: Float64Array;
  /** Response of T and T_d to one year of forcing held at 1 W m-2, K per W m-2. */
  tLevel: Float64Array;
  dLevel: Float64Array;
  /** Response of T and T_d to forcing rising by 1 W m-2 over the year (from 0), K per W m-2. */
  tRamp: Float64Array;
  dRamp: Float64Array;
}

/** The two-box parameters of many members, one array per parameter (member r at index r). */
export type TwoBoxParamArrays = { [K in keyof TwoBoxParams]: ArrayLike<number> };

/**
 * Step coefficients for `count` members, all zero until filled by {@link twoBoxStepsInto}.
 * @example emptyTwoBoxSteps(2).tFromT.length // 2
 */
export function emptyTwoBoxSteps(count: number): TwoBoxSteps {
  const a = () => new Float64Array(count);
  return { count, tFromT: a(), tFromD: a(), dFromT: a(), dFromD: a(), tLevel: a(), dLevel: a(), tRamp: a(), dRamp: a() };
}

/**
 * Fills the one-year step coefficients of every member from its parameters, in closed form from the
 * model's modes (Geoffroy et al. 2013a, eqs. 9-14; efficacy version 2013b): with time scales tau_j,
 * decay factors e_j = e^{-1/tau_j}, deep-to-surface ratios phi_j and V = [[1, 1], [phi_f, phi_s]],
 *   Phi = V diag(e_f, e_s) V^-1,
 *   level = V [beta_j tau_j (1 - e_j)]_j,  ramp = V [beta_j tau_j (1 - tau_j (1 - e_j))]_j,
 * where beta = V^-1 [1/C, 0] is the forcing's projection on the modes. With no exchange (gamma = 0)
 * the deep box is cut off and the upper box is one mode with tau = C / lambda (see
 * {@link twoBoxStepModes}).
 *
 * @param p per-member parameters: heat capacities W yr m-2 K-1, lambda > 0 and gamma >= 0 W m-2 K-1,
 *   efficacy > 0 (validated where they are read)
 * @param out receives the coefficients (its `count` members)
 * @returns `out`
 * @example twoBoxStepsInto(arrays, emptyTwoBoxSteps(n))
 */
export function twoBoxStepsInto(p: TwoBoxParamArrays, out: TwoBoxSteps): TwoBoxSteps {
  for (let r = 0; r < out.count; r++) {
    const m = twoBoxStepModes({
      upperHeatCapacity: p.upperHeatCapacity[r],
      deepHeatCapacity: p.deepHeatCapacity[r],
      feedbackWm2K: p.feedbackWm2K[r],
      exchangeWm2K: p.exchangeWm2K[r],
      deepEfficacy: p.deepEfficacy[r],
    });
    const { fast: f, slow: s } = m;
    if (!Number.isFinite(m.phiSlow)) {
      // No exchange: the deep box is cut off and stays where it is.
      setStep(out, r, f.decay, 0, 0, 1, f.level, 0, f.ramp, 0);
      continue;
    }
    const pf = m.phiFast;
    const ps = m.phiSlow;
    const d = ps - pf;
    setStep(
      out,
      r,
      (f.decay * ps - s.decay * pf) / d,
      (s.decay - f.decay) / d,
      (pf * ps * (f.decay - s.decay)) / d,
      (ps * s.decay - pf * f.decay) / d,
      f.level + s.level,
      pf * f.level + ps * s.level,
      f.ramp + s.ramp,
      pf * f.ramp + ps * s.ramp,
    );
  }
  return out;
}

/** One mode's share of the one-year step: its decay over the year and its surface response to forcing. */
export interface StepMode {
  /** e^{-1/tau} over one year. */
  decay: number;
  /** Surface response to one year of forcing held at 1 W m-2, K per W m-2. */
  level: number;
  /** Surface response to forcing rising by 1 W m-2 over the year, K per W m-2. */
  ramp: number;
}

/**
 * The two modes of the one-year step (see {@link twoBoxStepsInto}): each mode's decay factor and
 * surface responses, and the deep-to-surface ratios phi of the modes (the deep box's responses are
 * phi times the surface ones). With no exchange (gamma = 0) the fast mode is the upper box alone
 * (tau = C / lambda), the slow mode carries nothing and phiSlow is infinite.
 *
 * @param p parameters (lambda > 0, gamma >= 0)
 * @example twoBoxStepModes(params).fast.decay // e^{-1/tau_f}
 */
export function twoBoxStepModes(p: TwoBoxParams): { fast: StepMode; slow: StepMode; phiFast: number; phiSlow: number } {
  const c = p.upperHeatCapacity;
  const lambda = p.feedbackWm2K;
  if (p.exchangeWm2K === 0) {
    const h = lambda / c;
    return {
      fast: { decay: Math.exp(-h), level: -Math.expm1(-h) / lambda, ramp: rampGain(h) / lambda },
      slow: { decay: 1, level: 0, ramp: 0 },
      phiFast: 0,
      phiSlow: Infinity,
    };
  }
  const m = twoBoxModes(p);
  const d = m.phiSlow - m.phiFast;
  // Forcing on the modes, beta = V^-1 [1/C, 0], times tau_j: each mode's equilibrium response per W m-2.
  const mode = (tau: number, beta: number): StepMode => {
    const h = 1 / tau;
    return { decay: Math.exp(-h), level: -beta * tau * Math.expm1(-h), ramp: beta * tau * rampGain(h) };
  };
  return { fast: mode(m.tauFast, m.phiSlow / (c * d)), slow: mode(m.tauSlow, -m.phiFast / (c * d)), phiFast: m.phiFast, phiSlow: m.phiSlow };
}

function setStep(s: TwoBoxSteps, r: number, tt: number, td: number, dt: number, dd: number, tl: number, dl: number, tr: number, dr: number): void {
  s.tFromT[r] = tt;
  s.tFromD[r] = td;
  s.dFromT[r] = dt;
  s.dFromD[r] = dd;
  s.tLevel[r] = tl;
  s.dLevel[r] = dl;
  s.tRamp[r] = tr;
  s.dRamp[r] = dr;
}

/**
 * Response of a mode with rate h (1 / tau, yr-1) to a forcing rising by one unit over the year,
 * relative to its equilibrium response: 1 - (1 - e^-h) / h. A series for slow modes, where the
 * closed form cancels.
 * @example rampGain(1e-3) // ≈ 4.998e-4
 */
export function rampGain(h: number): number {
  if (h < 1e-2) return h * (1 / 2 - h * (1 / 6 - h * (1 / 24 - h * (1 / 120 - h * (1 / 720 - h / 5040)))));
  return 1 + Math.expm1(-h) / h;
}

/**
 * Advances every member one year: the step of {@link TwoBoxSteps}, in place.
 *
 * @param s the members' step coefficients
 * @param forcingStart each member's forcing at the start of the year (node k), W m-2
 * @param forcingEnd each member's forcing at the end of the year (node k + 1), W m-2
 * @param surfaceK each member's T at node k, K; replaced by T at node k + 1
 * @param deepK each member's T_d at node k, K; replaced by T_d at node k + 1
 */
export function stepTwoBoxInto(s: TwoBoxSteps, forcingStart: Float64Array, forcingEnd: Float64Array, surfaceK: Float64Array, deepK: Float64Array): void {
  const { tFromT, tFromD, dFromT, dFromD, tLevel, dLevel, tRamp, dRamp } = s;
  for (let r = 0; r < s.count; r++) {
    const f = forcingStart[r];
    const rise = forcingEnd[r] - f;
    const t = surfaceK[r];
    const d = deepK[r];
    surfaceK[r] = tFromT[r] * t + tFromD[r] * d + tLevel[r] * f + tRamp[r] * rise;
    deepK[r] = dFromT[r] * t + dFromD[r] * d + dLevel[r] * f + dRamp[r] * rise;
  }
}

/**
 * The step coefficients of one parameter set (a set of one member), for runs that step a single
 * model year by year with {@link stepTwoBoxInto} on arrays of length 1.
 * @example stepTwoBoxInto(twoBoxSteps(params), Float64Array.of(f0), Float64Array.of(f1), t, d)
 */
export function twoBoxSteps(p: TwoBoxParams): TwoBoxSteps {
  const one = (x: number) => [x];
  return twoBoxStepsInto(
    {
      upperHeatCapacity: one(p.upperHeatCapacity),
      deepHeatCapacity: one(p.deepHeatCapacity),
      feedbackWm2K: one(p.feedbackWm2K),
      exchangeWm2K: one(p.exchangeWm2K),
      deepEfficacy: one(p.deepEfficacy),
    },
    emptyTwoBoxSteps(1),
  );
}

/**
 * Runs the two-box model for one parameter set from rest (T = T_d = 0 at the first node) through
 * forcing given at annual nodes, linear between them: {@link stepTwoBoxInto} for one member.
 *
 * @param p parameters
 * @param forcingWm2 forcing at each year node, W m-2
 * @param surfaceOut receives T at each node, K (same length as the forcing)
 * @param deepOut receives T_d at each node, K
 * @example propagateTwoBoxInto(params, forcing, surface, deep) // surface[k]: warming at node k
 */
export function propagateTwoBoxInto(p: TwoBoxParams, forcingWm2: ArrayLike<number>, surfaceOut: Float64Array, deepOut: Float64Array): void {
  const steps = twoBoxSteps(p);
  const f0 = new Float64Array(1);
  const f1 = new Float64Array(1);
  const t = new Float64Array(1);
  const d = new Float64Array(1);
  if (forcingWm2.length === 0) return;
  surfaceOut[0] = 0;
  deepOut[0] = 0;
  for (let k = 0; k + 1 < forcingWm2.length; k++) {
    f0[0] = forcingWm2[k];
    f1[0] = forcingWm2[k + 1];
    stepTwoBoxInto(steps, f0, f1, t, d);
    surfaceOut[k + 1] = t[0];
    deepOut[k + 1] = d[0];
  }
}

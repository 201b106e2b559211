import { ConfigError, NumericalError } from '../errors.js';
import { VERY_LIKELY_Z } from './assessed-range.js';
import type { HistoryResponses } from './constrain-history.js';

/**
 * A first-order autoregressive process x_t = phi x_{t-1} + e_t, e_t ~ N(0, sigma^2): the error
 * model of annual internal variability around the forced response.
 */
export interface Ar1 {
  /** Lag-one autocorrelation, in (-1, 1). */
  phi: number;
  /** Standard deviation of the innovations, K. */
  sigmaK: number;
}

/**
 * Fits an AR(1) process to a residual series by least squares on the demeaned series (Yule-Walker
 * would differ only at order 1/n): phi = sum r_t r_{t-1} / sum r_{t-1}^2, sigma^2 = mean of
 * (r_t - phi r_{t-1})^2.
 *
 * @param residuals annual residuals, K (at least 10)
 * @returns phi and sigma
 * @throws ConfigError for fewer than 10 values or a constant series
 * @example fitAr1(series).phi // about 0.5 for HadCRUT5 minus a forced response
 */
export function fitAr1(residuals: ArrayLike<number>): Ar1 {
  const n = residuals.length;
  if (n < 10) throw new ConfigError(`an AR(1) fit needs at least 10 values, got ${n}`, 'calibration');
  let mean = 0;
  for (let k = 0; k < n; k++) mean += residuals[k];
  mean /= n;
  let sxy = 0;
  let sxx = 0;
  for (let k = 1; k < n; k++) {
    sxy += (residuals[k] - mean) * (residuals[k - 1] - mean);
    sxx += (residuals[k - 1] - mean) ** 2;
  }
  if (!(sxx > 0)) throw new ConfigError('an AR(1) fit needs a series that varies', 'calibration');
  const phi = Math.max(-0.99, Math.min(0.99, sxy / sxx));
  let ss = 0;
  for (let k = 1; k < n; k++) ss += (residuals[k] - mean - phi * (residuals[k - 1] - mean)) ** 2;
  return { phi, sigmaK: Math.sqrt(ss / (n - 1)) };
}

/**
 * Covariance of the errors of period means relative to a baseline mean, K^2 (periods x periods,
 * row-major). Two parts:
 * - internal variability, a stationary AR(1) over the years (covariance sigma^2 phi^|s-t| /
 *   (1 - phi^2)), pushed through the linear map "mean over the period minus mean over the
 *   baseline", so neighbouring years are not treated as independent;
 * - the dataset's own uncertainty, per year a standard deviation (HadCRUT5's 95 % half-width /
 *   1.96), taken as fully correlated within each period and within the baseline and independent
 *   between them (coverage and bias errors change slowly; a simplification: common practice, no
 *   source).
 *
 * @param firstYear year of index 0 of `obsSigmaK`
 * @param periods inclusive year ranges
 * @param baseline inclusive baseline years
 * @param ar1 internal variability
 * @param obsSigmaK dataset standard deviation per year, K
 */
export function periodMeanCovariance(firstYear: number, periods: [number, number][], baseline: [number, number], ar1: Ar1, obsSigmaK: ArrayLike<number>): Float64Array {
  const np = periods.length;
  const lastYear = Math.max(baseline[1], ...periods.map((p) => p[1]));
  const n = lastYear - firstYear + 1;
  if (obsSigmaK.length < n) throw new ConfigError(`observation uncertainty ends before ${lastYear}`, 'calibration');
  // Row p of the linear map: 1/len on the period's years, minus 1/len on the baseline's.
  const rows = periods.map(([a, b]) => {
    const w = new Float64Array(n);
    for (let y = a; y <= b; y++) w[y - firstYear] += 1 / (b - a + 1);
    for (let y = baseline[0]; y <= baseline[1]; y++) w[y - firstYear] -= 1 / (baseline[1] - baseline[0] + 1);
    return w;
  });
  const variance = (ar1.sigmaK * ar1.sigmaK) / (1 - ar1.phi * ar1.phi);
  const lagged = new Float64Array(n);
  for (let l = 0; l < n; l++) lagged[l] = variance * ar1.phi ** l;
  const meanSigma = (a: number, b: number) => {
    let s = 0;
    for (let y = a; y <= b; y++) s += obsSigmaK[y - firstYear];
    return s / (b - a + 1);
  };
  const baseObs = meanSigma(baseline[0], baseline[1]) ** 2;
  const cov = new Float64Array(np * np);
  for (let p = 0; p < np; p++) {
    for (let q = 0; q <= p; q++) {
      let s = 0;
      const wp = rows[p];
      const wq = rows[q];
      for (let i = 0; i < n; i++) {
        if (wp[i] === 0) continue;
        for (let j = 0; j < n; j++) if (wq[j] !== 0) s += wp[i] * wq[j] * lagged[Math.abs(i - j)];
      }
      s += baseObs + (p === q ? meanSigma(periods[p][0], periods[p][1]) ** 2 : 0);
      cov[p * np + q] = s;
      cov[q * np + p] = s;
    }
  }
  return cov;
}

/**
 * Lower Cholesky factor of a symmetric positive-definite matrix (row-major, n x n).
 * @throws NumericalError when the matrix is not positive definite
 */
export function cholesky(a: ArrayLike<number>, n: number): Float64Array {
  const l = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      let s = a[i * n + j];
      for (let k = 0; k < j; k++) s -= l[i * n + k] * l[j * n + k];
      if (i === j) {
        if (!(s > 0)) throw new NumericalError('covariance of the observed period means is not positive definite', 'numerical.calibration');
        l[i * n + i] = Math.sqrt(s);
      } else l[i * n + j] = s / l[j * n + j];
    }
  }
  return l;
}

/** A Gaussian observation: value and one standard deviation. */
export interface Gaussian {
  value: number;
  sigma: number;
}

/** An assessed 5 / 50 / 95 % range, read as a two-piece normal (each side its own spread). */
export interface SkewRange {
  p05: number;
  p50: number;
  p95: number;
}

/** Everything members are compared with. Absent parts are not used. */
export interface Observations {
  /** Observed period means relative to the baseline, K (periods of the targets, in order). */
  periodWarmingK: number[];
  /** Their error covariance, K^2 ({@link periodMeanCovariance}). */
  periodCovariance: Float64Array;
  /** Ocean heat content change, ZJ. */
  oceanHeatZj?: Gaussian;
  /** Assessed aerosol ERF, W m-2. */
  aerosolWm2?: SkewRange;
  /** Cumulative CO2 emissions, Gt CO2. */
  emissionsGtco2?: Gaussian;
}

/**
 * The log-likelihood of each member (up to a constant): a multivariate normal on the period means
 * (errors correlated through the covariance), and independent normals on ocean heat, emissions and
 * (two-piece) aerosol forcing.
 *
 * @param responses the members' historical quantities
 * @param obs the observations
 * @returns one log-likelihood per member
 */
export function logLikelihoods(responses: HistoryResponses, obs: Observations): Float64Array {
  const np = obs.periodWarmingK.length;
  const count = responses.oceanHeatZj.length;
  if (responses.periodWarmingK.length !== count * np) throw new ConfigError(`members give ${responses.periodWarmingK.length / count} period means, the observations ${np}`, 'calibration');
  const l = cholesky(obs.periodCovariance, np);
  const z = new Float64Array(np);
  const out = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    // Solve L z = (obs - model) by forward substitution; the quadratic form is |z|^2.
    let q = 0;
    for (let p = 0; p < np; p++) {
      let s = obs.periodWarmingK[p] - responses.periodWarmingK[i * np + p];
      for (let k = 0; k < p; k++) s -= l[p * np + k] * z[k];
      z[p] = s / l[p * np + p];
      q += z[p] * z[p];
    }
    let ll = -0.5 * q;
    if (obs.oceanHeatZj) ll -= 0.5 * ((responses.oceanHeatZj[i] - obs.oceanHeatZj.value) / obs.oceanHeatZj.sigma) ** 2;
    if (obs.emissionsGtco2) ll -= 0.5 * ((responses.emissionsGtco2[i] - obs.emissionsGtco2.value) / obs.emissionsGtco2.sigma) ** 2;
    if (obs.aerosolWm2) {
      const a = obs.aerosolWm2;
      const x = responses.aerosolWm2[i];
      const sigma = (x < a.p50 ? a.p50 - a.p05 : a.p95 - a.p50) / VERY_LIKELY_Z;
      ll -= 0.5 * ((x - a.p50) / sigma) ** 2;
    }
    out[i] = ll;
  }
  return out;
}

/**
 * Normalised importance weights exp(logL - max) / sum, and Kish's effective sample size
 * (sum w)^2 / sum w^2.
 * @example importanceWeights(Float64Array.of(0, 0)).effectiveSize // 2
 */
export function importanceWeights(logL: ArrayLike<number>): { weights: Float64Array; effectiveSize: number } {
  let max = -Infinity;
  for (let i = 0; i < logL.length; i++) if (logL[i] > max) max = logL[i];
  if (!Number.isFinite(max)) throw new NumericalError('no member has a finite likelihood', 'numerical.calibration');
  const weights = new Float64Array(logL.length);
  let sum = 0;
  for (let i = 0; i < logL.length; i++) sum += weights[i] = Math.exp(logL[i] - max);
  let sq = 0;
  for (let i = 0; i < weights.length; i++) {
    weights[i] /= sum;
    sq += weights[i] * weights[i];
  }
  return { weights, effectiveSize: 1 / sq };
}

/**
 * Systematic resampling (Kitagawa 1996): `count` indices whose multiplicities follow the weights,
 * at positions (u + j) / count on the cumulative weights, in ascending order.
 *
 * @param weights normalised weights
 * @param count indices to draw
 * @param u offset in [0, 1) (from the seeded generator)
 * @example systematicResample(Float64Array.of(0.5, 0.5), 4, 0.1) // [0, 0, 1, 1]
 */
export function systematicResample(weights: ArrayLike<number>, count: number, u: number): Int32Array {
  const out = new Int32Array(count);
  let cumulative = weights[0];
  let i = 0;
  for (let j = 0; j < count; j++) {
    const position = (u + j) / count;
    while (position > cumulative && i < weights.length - 1) cumulative += weights[++i];
    out[j] = i;
  }
  return out;
}

/**
 * Weighted quantile of values (inverse of the weighted empirical distribution, interpolated at the
 * midpoints of each value's weight).
 */
export function weightedQuantile(values: ArrayLike<number>, weights: ArrayLike<number>, p: number): number {
  const order = Array.from({ length: values.length }, (_, i) => i).sort((a, b) => values[a] - values[b]);
  let total = 0;
  for (const i of order) total += weights[i];
  let below = 0;
  let prevMid = -Infinity;
  let prevValue = values[order[0]];
  for (const i of order) {
    const mid = (below + weights[i] / 2) / total;
    if (mid >= p) {
      if (prevMid === -Infinity) return values[i];
      return prevValue + ((values[i] - prevValue) * (p - prevMid)) / (mid - prevMid);
    }
    below += weights[i];
    prevMid = mid;
    prevValue = values[i];
  }
  return values[order[order.length - 1]];
}

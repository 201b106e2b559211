import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../asserts.js';
import { cholesky, fitAr1, importanceWeights, logLikelihoods, periodMeanCovariance, systematicResample, weightedQuantile } from '../../src/ensemble/constrain.js';
import { normalQuantile } from '../../src/ensemble/normal-quantile.js';

describe('fitAr1', () => {
  it('recovers phi 0.5 and sigma 0.1 of a simulated AR(1) series of 20,000 values (standard error of phi about sqrt((1 - phi^2)/n) = 0.006)', () => {
    const rng = xoroshiro128plus(5);
    const x = new Float64Array(20_000);
    for (let k = 1; k < x.length; k++) x[k] = 0.5 * x[k - 1] + 0.1 * normalQuantile(uniformFloat64(rng));
    const fit = fitAr1(x);
    expectClose(fit.phi, 0.5, 0.025, 'phi');
    expectClose(fit.sigmaK, 0.1, 0.003, 'sigma');
  });
});

describe('periodMeanCovariance', () => {
  it('with independent years (phi 0) and no dataset error is sigma^2 (1/n_period + 1/n_baseline), the variance of a difference of two means', () => {
    const cov = periodMeanCovariance(1850, [[1901, 1930], [1931, 1960]], [1850, 1900], { phi: 0, sigmaK: 0.1 }, new Float64Array(200));
    expectClose(cov[0], 0.01 * (1 / 30 + 1 / 51), 1e-15, 'variance');
    expectClose(cov[1], 0.01 / 51, 1e-15, 'covariance through the shared baseline');
  });

  it('grows with autocorrelation: phi 0.5 makes a 30-year mean about (1 + phi)/(1 - phi) = 3 times as variable', () => {
    const white = periodMeanCovariance(1850, [[1901, 1930]], [1850, 1900], { phi: 0, sigmaK: 0.1 }, new Float64Array(200));
    const red = periodMeanCovariance(1850, [[1901, 1930]], [1850, 1900], { phi: 0.5, sigmaK: 0.1 * Math.sqrt(0.75) }, new Float64Array(200));
    expect(red[0] / white[0]).toBeGreaterThan(2.5);
    expect(red[0] / white[0]).toBeLessThan(3);
  });
});

describe('likelihood and weights', () => {
  it('cholesky reproduces the matrix', () => {
    const a = [4, 2, 2, 3];
    const l = cholesky(a, 2);
    expectClose(l[0] * l[0], 4, 1e-14);
    expectClose(l[2] * l[0], 2, 1e-14);
    expectClose(l[2] * l[2] + l[3] * l[3], 3, 1e-14);
  });

  it('scores a member one standard deviation off with log-likelihood -1/2, and equal members share weight equally (ESS = count)', () => {
    const responses = { periodWarmingK: Float64Array.of(1, 1.1), oceanHeatZj: new Float64Array(2), aerosolWm2: new Float64Array(2), emissionsGtco2: new Float64Array(2) };
    const ll = logLikelihoods(responses, { periodWarmingK: [1], periodCovariance: Float64Array.of(0.01) });
    expectClose(ll[0], 0, 1e-12);
    expectClose(ll[1], -0.5, 1e-12);
    expect(importanceWeights(Float64Array.of(-3, -3, -3)).effectiveSize).toBeCloseTo(3, 12);
  });

  it('systematic resampling keeps each index about weight x count times, in order', () => {
    const picks = systematicResample(Float64Array.of(0.1, 0.6, 0.3), 10, 0.5);
    expect(Array.from(picks)).toEqual([0, 1, 1, 1, 1, 1, 1, 2, 2, 2]);
  });

  it('weighted quantile of equal weights is the plain median', () => {
    expect(weightedQuantile([3, 1, 2], [1, 1, 1], 0.5)).toBe(2);
  });
});

import { describe, expect, it } from 'vitest';
import { AR6_SAMPLING, drawMember, MEMBER_PARAMETERS, memberGenerators, memberSampler, pointRange, sampleMembers, validateSampling, type EnsembleSampling } from '../../src/ensemble/index.js';
import { emptyDraw } from '../../src/ensemble/sample-members.js';
import { ConfigError } from '../../src/errors.js';
import { forcingOfDoubling } from '../../src/forcing/co2.js';

/** Spearman rank correlation (Pearson correlation of ranks; no ties in continuous draws). */
function spearman(x: Float64Array, y: Float64Array): number {
  const ranks = (v: Float64Array) => {
    const order = Array.from(v.keys()).sort((i, j) => v[i] - v[j]);
    const r = new Float64Array(v.length);
    order.forEach((i, k) => (r[i] = k));
    return r;
  };
  const a = ranks(x);
  const b = ranks(y);
  const n = x.length;
  const mean = (n - 1) / 2;
  let sab = 0;
  let saa = 0;
  for (let i = 0; i < n; i++) {
    sab += (a[i] - mean) * (b[i] - mean);
    saa += (a[i] - mean) ** 2;
  }
  return sab / saa;
}

describe('sampleMembers', () => {
  it('sampleMembers with AR6_SAMPLING leaves gamma rank-uncorrelated with lambda: the ECS-TCR correlation is the one the calibrated two-box model implies when ocean uptake is independent of feedback', () => {
    const n = 20_000;
    const { parameters: s } = sampleMembers(2024, n, AR6_SAMPLING);
    // Under independence the Spearman coefficient has standard error 1 / sqrt(n - 1) (Kendall &
    // Stuart, The Advanced Theory of Statistics, vol. 2, 31.19); allow 3 standard errors.
    expect(Math.abs(spearman(s.exchangeWm2K, s.feedbackWm2K))).toBeLessThan(3 / Math.sqrt(n - 1));
    // And a correlation chosen differently does correlate them (the check can fail).
    const other = sampleMembers(2024, 5000, { ...AR6_SAMPLING, ecsTcrCorrelation: 0.3 }).parameters;
    expect(Math.abs(spearman(other.exchangeWm2K, other.feedbackWm2K))).toBeGreaterThan(3 / Math.sqrt(5000));
  });

  it('sampleMembers accepts only physical members: 0 < TCR < ECS, F2x > 0, aerosol multiplier >= 0, lambda = F2x / ECS, gamma in (0, 50] (two-box model, Held et al. 2010)', () => {
    const { parameters: s, redraws } = sampleMembers(5, 5000, AR6_SAMPLING);
    for (let i = 0; i < 5000; i++) {
      expect(s.tcrK[i]).toBeGreaterThan(0);
      expect(s.tcrK[i]).toBeLessThan(s.ecsK[i]);
      expect(s.forcing2xWm2[i]).toBeGreaterThan(0);
      expect(s.aerosolScale[i]).toBeGreaterThanOrEqual(0);
      expect(s.feedbackWm2K[i]).toBe(s.forcing2xWm2[i] / s.ecsK[i]);
      expect(s.exchangeWm2K[i]).toBeGreaterThan(0);
      expect(s.exchangeWm2K[i]).toBeLessThanOrEqual(50);
    }
    // The AR6 ranges let ECS and TCR overlap near 2.2-2.4 K, so some draws must be redrawn.
    expect(redraws).toBeGreaterThan(0);
  });

  it('drawMember counts as redrawn exactly the draws it discards: each draw takes one 53-bit uniform (two generator outputs) and a member keeps four', () => {
    const sampler = memberSampler(AR6_SAMPLING, 'ar6');
    const next = memberGenerators(77, 0);
    const draw = emptyDraw();
    let total = 0;
    for (let i = 0; i < 2000; i++) {
      const inner = next();
      let calls = 0;
      const counting = { next: () => (calls++, inner.next()), clone: () => inner.clone(), getState: () => inner.getState() };
      const discarded = drawMember(counting, sampler, draw);
      expect(discarded).toBe(calls / 2 - 4);
      total += discarded;
    }
    expect(total).toBeGreaterThan(0);
  });

  it('sampleMembers gives member i the same parameters whatever the first member drawn (parameters depend only on seed and i)', () => {
    const whole = sampleMembers(99, 30, AR6_SAMPLING);
    const tail = sampleMembers(99, 12, AR6_SAMPLING, 'ar6', 18);
    for (const name of MEMBER_PARAMETERS) expect(Array.from(tail.parameters[name])).toEqual(Array.from(whole.parameters[name].subarray(18)));
    const otherSeed = sampleMembers(100, 30, AR6_SAMPLING);
    expect(Array.from(otherSeed.parameters.ecsK)).not.toEqual(Array.from(whole.parameters.ecsK));
  });

  it('sampleMembers with zero spread gives every member the central parameters and no redraws', () => {
    const fixed: EnsembleSampling = { ...AR6_SAMPLING, ecsK: pointRange(3), tcrK: pointRange(1.8), forcing2xScale: pointRange(1), aerosolScale: pointRange(1) };
    const { parameters: s, redraws } = sampleMembers(1, 50, fixed);
    expect(redraws).toBe(0);
    expect(new Set(s.exchangeWm2K).size).toBe(1);
    expect(s.forcing2xWm2[0]).toBe(forcingOfDoubling('ar6'));
  });

  it('sampleMembers throws ConfigError when the ranges leave no physical member (TCR always above ECS)', () => {
    const impossible: EnsembleSampling = { ...AR6_SAMPLING, ecsK: pointRange(2), tcrK: pointRange(2.5) };
    expect(() => sampleMembers(1, 1, impossible)).toThrow(ConfigError);
  });
});

describe('validateSampling', () => {
  it('validateSampling rejects decreasing percentiles, a correlation outside (-1, 1) and non-positive heat capacities with "must" messages', () => {
    expect(() => validateSampling(AR6_SAMPLING)).not.toThrow();
    expect(() => validateSampling({ ...AR6_SAMPLING, ecsK: { ...AR6_SAMPLING.ecsK, p83: 2 } })).toThrow(/must not decrease/);
    expect(() => validateSampling({ ...AR6_SAMPLING, ecsTcrCorrelation: 1 })).toThrow(/must be a number between -1 and 1/);
    expect(() => validateSampling({ ...AR6_SAMPLING, deepHeatCapacity: 0 })).toThrow(/must be a positive number/);
    expect(() => validateSampling({ ...AR6_SAMPLING, tcrK: { ...AR6_SAMPLING.tcrK, p50: NaN } })).toThrow(/five finite percentiles/);
  });
});

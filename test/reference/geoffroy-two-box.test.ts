// Reference checks of the energy balance model against the analytic two-box solution of
// Geoffroy et al. 2013a (J. Climate 26, 1841), eqs. 15-16, and its steady state T = F / lambda.
import { describe, expect, it } from 'vitest';
import { abruptResponse, energyBalance, twoBoxModes, type TwoBoxParams } from '../../src/climate/index.js';
import { expectClose } from '../asserts.js';

const cases: Record<string, TwoBoxParams> = {
  'warmcast defaults (C 8, Cd 100, lambda 1.31, gamma 1.02, eps 1)': {
    upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.3114, exchangeWm2K: 1.0176, deepEfficacy: 1,
  },
  // CMIP5-mean-like magnitudes (Geoffroy et al. 2013b, Table 3; from memory, used only as a plausible case).
  'CMIP5-mean-like with efficacy (C 7.3, Cd 106, lambda 1.13, gamma 0.73, eps 1.28)': {
    upperHeatCapacity: 7.3, deepHeatCapacity: 106, feedbackWm2K: 1.13, exchangeWm2K: 0.73, deepEfficacy: 1.28,
  },
  'low feedback, thin mixed layer (C 4, Cd 300, lambda 0.6, gamma 0.5, eps 1.5)': {
    upperHeatCapacity: 4, deepHeatCapacity: 300, feedbackWm2K: 0.6, exchangeWm2K: 0.5, deepEfficacy: 1.5,
  },
};

describe('energyBalance (odex) against the analytic abrupt-forcing solution', () => {
  for (const [label, p] of Object.entries(cases)) {
    it(`matches Geoffroy et al. 2013a eqs. 15-16 to 1e-6 K over 500 years: ${label}`, () => {
      const forcing = 3.93;
      const years = 500;
      // Abrupt step: forcing is F from the first node on; the analytic solution starts from rest
      // with F applied at t = 0+, so the first interval has F at both ends.
      const f = new Float64Array(years + 1).fill(forcing);
      const run = energyBalance(p, f, 'odex');
      let worst = 0;
      for (let t = 0; t <= years; t++) {
        const exact = abruptResponse(p, forcing, t);
        worst = Math.max(worst, Math.abs(run.surfaceK[t] - exact.surfaceK), Math.abs(run.deepK[t] - exact.deepK));
      }
      // Tolerance 1e-6 K: the requirement; odex runs at rtol = atol = 1e-10.
      expect(worst).toBeLessThan(1e-6);
    });
  }

  it('reaches the steady state T = T_d = F / lambda (energy balance at equilibrium, Held et al. 2010)', () => {
    const p = cases['warmcast defaults (C 8, Cd 100, lambda 1.31, gamma 1.02, eps 1)'];
    const f = new Float64Array(6001).fill(3.93);
    const run = energyBalance(p, f, 'exact');
    // After 6000 yr (> 20 slow time scales) the residual exp(-6000/tau_s) is below 1e-10.
    expectClose(run.surfaceK[6000], 3.93 / p.feedbackWm2K, 1e-8, 'surface');
    expectClose(run.deepK[6000], 3.93 / p.feedbackWm2K, 1e-8, 'deep');
    expectClose(run.imbalanceWm2[6000], 0, 1e-8, 'imbalance');
  });

  it('has a fast mode of a few years and a slow mode of centuries (Geoffroy et al. 2013a, Table 3: CMIP5 tau_f ~ 4 yr, tau_s ~ 250 yr; from memory)', () => {
    const m = twoBoxModes(cases['CMIP5-mean-like with efficacy (C 7.3, Cd 106, lambda 1.13, gamma 0.73, eps 1.28)']);
    expect(m.tauFast).toBeGreaterThan(1);
    expect(m.tauFast).toBeLessThan(10);
    expect(m.tauSlow).toBeGreaterThan(100);
    expect(m.tauSlow).toBeLessThan(600);
    expectClose(m.aFast + m.aSlow, 1, 1e-12, 'modal amplitudes sum to one (T(0) = 0)');
  });
});

// Numerics under stress: at and beyond the edges of plausible parameters the odex path either
// matches the exact propagator or stops with an error that names the parameter; never a silent NaN
// and never a hang (odex's steps are bounded per year).
import { describe, expect, it } from 'vitest';
import { energyBalance, type TwoBoxParams } from '../../src/climate/index.js';
import { NumericalError } from '../../src/errors.js';
import { DEFAULT_TOLERANCES } from '../../src/numerics/integrate-steps.js';

const base: TwoBoxParams = { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.31, exchangeWm2K: 1.02, deepEfficacy: 1 };
const forcing = Float64Array.from({ length: 551 }, (_, i) => 0.01 * i + 0.3 * Math.sin(i / 5));

const edges: [string, Partial<TwoBoxParams>][] = [
  ['a thin upper box (C = 0.5)', { upperHeatCapacity: 0.5 }],
  ['a very thin upper box (C = 0.05)', { upperHeatCapacity: 0.05 }],
  ['a huge deep ocean (Cd = 1e5)', { deepHeatCapacity: 1e5 }],
  ['feedback near zero (lambda = 1e-4)', { feedbackWm2K: 1e-4 }],
  ['no exchange (gamma = 0)', { exchangeWm2K: 0 }],
  ['strong exchange and efficacy (gamma = 40, eps = 3)', { exchangeWm2K: 40, deepEfficacy: 3 }],
];

describe('energyBalance under stress', () => {
  for (const [label, change] of edges) {
    it(`${label}: odex matches the exact propagator to 1e-6 K`, () => {
      const p = { ...base, ...change };
      const ode = energyBalance(p, forcing, 'odex');
      const exact = energyBalance(p, forcing, 'exact');
      let worst = 0;
      for (let i = 0; i < forcing.length; i++) worst = Math.max(worst, Math.abs(ode.surfaceK[i] - exact.surfaceK[i]), Math.abs(ode.deepK[i] - exact.deepK[i]));
      expect(worst).toBeLessThan(1e-6);
      expect(exact.surfaceK.every(Number.isFinite)).toBe(true);
    });
  }

  it('stops with a NumericalError naming upper_heat_capacity when the system is too stiff for the step bound', () => {
    const p = { ...base, upperHeatCapacity: 1e-5 };
    expect(() => energyBalance(p, forcing, 'odex', { ...DEFAULT_TOLERANCES, maxStepsPerUnit: 200 })).toThrow(NumericalError);
    expect(() => energyBalance(p, forcing, 'odex', { ...DEFAULT_TOLERANCES, maxStepsPerUnit: 200 })).toThrow(/upper_heat_capacity/);
  });

  it('converges as the tolerance tightens (error at rtol 1e-6 above the error at 1e-10)', () => {
    const exact = energyBalance(base, forcing, 'exact');
    const err = (tol: number) => {
      const r = energyBalance(base, forcing, 'odex', { relativeTolerance: tol, absoluteTolerance: tol, maxStepsPerUnit: 2000 });
      return Math.max(...r.surfaceK.map((v, i) => Math.abs(v - exact.surfaceK[i])));
    };
    expect(err(1e-10)).toBeLessThan(err(1e-5));
    expect(err(1e-10)).toBeLessThan(1e-8);
  });
});

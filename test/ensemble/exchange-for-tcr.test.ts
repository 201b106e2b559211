import { describe, expect, it } from 'vitest';
import { calibrate, transientResponse, type TwoBoxParams } from '../../src/climate/index.js';
import { exchangeForTcr, solverTransientResponse, tcrSolver } from '../../src/ensemble/exchange-for-tcr.js';
import { forcingOfDoubling } from '../../src/forcing/co2.js';
import { expectClose } from '../asserts.js';

describe('solverTransientResponse', () => {
  it('solverTransientResponse equals transientResponse of src/climate (the TCR definition: years 61-80 of the 1 %/yr run, IPCC AR6 WG1 glossary)', () => {
    for (const formula of ['ar6', 'log'] as const) {
      const solver = tcrSolver(formula);
      for (const feedbackWm2K of [0.6, 1.31, 2.2]) {
        for (const exchangeWm2K of [0.05, 0.7, 3, 20]) {
          for (const deepEfficacy of [1, 1.3]) {
            const p: TwoBoxParams = { upperHeatCapacity: 7.3, deepHeatCapacity: 106, feedbackWm2K, exchangeWm2K, deepEfficacy };
            const f2x = forcingOfDoubling(formula) * 1.07;
            const theirs = transientResponse({ ...p, co2Formula: formula, forcing2xWm2: f2x });
            // Two exact propagators of the same linear model: agreement to rounding.
            expectClose(solverTransientResponse(solver, p, f2x), theirs, 1e-12 * theirs, `${formula} lambda ${feedbackWm2K} gamma ${exchangeWm2K}`);
          }
        }
      }
    }
  });
});

describe('exchangeForTcr', () => {
  const solver = tcrSolver('ar6');
  const f2x = forcingOfDoubling('ar6');
  const fixed = { upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1 };

  // The AR6 assessed ECS / TCR percentiles paired (IPCC AR6 WG1 chapter 7; TCR ranges from memory).
  for (const [ecs, tcr] of [[3, 1.8], [2, 1.2], [5, 2.4], [2.5, 1.4], [4, 2.2]]) {
    it(`exchangeForTcr(ECS ${ecs} K, TCR ${tcr} K) gives the gamma calibrate() solves for`, () => {
      const gamma = exchangeForTcr(solver, { ...fixed, feedbackWm2K: f2x / ecs }, f2x, tcr);
      // Both solve to 1e-12 in gamma with Brent's method on the same TCR (to rounding).
      expectClose(gamma, calibrate({ ecsK: ecs, tcrK: tcr }).exchangeWm2K, 1e-9);
      expectClose(solverTransientResponse(solver, { ...fixed, feedbackWm2K: f2x / ecs, exchangeWm2K: gamma }, f2x), tcr, 1e-9, 'TCR reproduced');
    });
  }

  it('exchangeForTcr is NaN for a TCR no gamma in (0, 50] reaches, where calibrate() throws "out of reach"', () => {
    expect(() => calibrate({ ecsK: 3, tcrK: 2.99 })).toThrow(/out of reach/);
    expect(exchangeForTcr(solver, { ...fixed, feedbackWm2K: f2x / 3 }, f2x, 2.99)).toBeNaN();
    expect(() => calibrate({ ecsK: 3, tcrK: 0.05 })).toThrow(/out of reach/);
    expect(exchangeForTcr(solver, { ...fixed, feedbackWm2K: f2x / 3 }, f2x, 0.05)).toBeNaN();
  });

  it('exchangeForTcr agrees with calibrate() on a grid of ECS 0.8-9 K, TCR 0.3-4 K and F2x 3-5 W m-2: the same gamma to 1e-9, its TCR by transientResponse within 1e-9 K, and NaN exactly where calibrate() finds the TCR out of reach', () => {
    // calibrate (src/climate) solves with the matrix-exponential propagator and Brent's method: an
    // independent path to the same root. The grid reaches the unreachable corners on both sides.
    let solved = 0;
    let unreachable = 0;
    for (const ecsK of [0.8, 1.5, 2.2, 3, 4.5, 6, 9]) {
      for (const tcrK of [0.3, 0.7, 1.1, 1.5, 1.8, 2.1, 2.5, 3, 4]) {
        if (tcrK >= ecsK) continue;
        for (const forcing2xWm2 of [3, 3.934, 5]) {
          const lambda = forcing2xWm2 / ecsK;
          const gamma = exchangeForTcr(solver, { ...fixed, feedbackWm2K: lambda }, forcing2xWm2, tcrK);
          let reference: number;
          try {
            reference = calibrate({ ecsK, tcrK, forcing2xWm2 }).exchangeWm2K;
          } catch (e) {
            expect(String(e)).toMatch(/out of reach/);
            expect(gamma, `ECS ${ecsK} TCR ${tcrK} F2x ${forcing2xWm2}`).toBeNaN();
            unreachable++;
            continue;
          }
          expectClose(gamma, reference, 1e-9, `ECS ${ecsK} TCR ${tcrK} F2x ${forcing2xWm2}`);
          const tcr = transientResponse({ ...fixed, feedbackWm2K: lambda, exchangeWm2K: gamma, co2Formula: 'ar6', forcing2xWm2 });
          expectClose(tcr, tcrK, 1e-9, `TCR at ECS ${ecsK} TCR ${tcrK} F2x ${forcing2xWm2}`);
          solved++;
        }
      }
    }
    expect(solved).toBeGreaterThan(60);
    expect(unreachable).toBeGreaterThan(5);
  });
});

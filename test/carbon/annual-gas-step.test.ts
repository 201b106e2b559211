import { describe, expect, it } from 'vitest';
import { gasYear } from '../../src/carbon/annual-gas-step.js';
import { CH4_CYCLE, gasSinkMt, N2O_CYCLE, withConstantLifetime } from '../../src/carbon/gas-cycle.js';
import { expectClose } from '../asserts.js';

describe('gasYear', () => {
  const ch4 = withConstantLifetime(CH4_CYCLE);
  const natural = gasSinkMt(ch4, 1800);

  it('a steady state stays put with no anthropogenic emissions', () => {
    const y = gasYear(N2O_CYCLE, 270.1, gasSinkMt(N2O_CYCLE, 270.1), 0, NaN);
    expectClose(y.endPpb, 270.1, 1e-12);
    expectClose(y.meanPpb, 270.1, 1e-12);
  });

  it('with a constant lifetime, end and annual mean solve m dc/dt = E + N - m c / tau in closed form (analytic)', () => {
    const e = 50;
    const y = gasYear(ch4, 1800, natural, e, NaN);
    const tau = 9.1;
    const q = (e + natural) / 2.75;
    const c = (t: number) => q * tau + (1800 - q * tau) * Math.exp(-t / tau);
    expectClose(y.endPpb, c(1), 1e-9);
    // Mean of c over [0, 1], by Simpson's rule on 1000 intervals (error far below 1e-9).
    let s = 0;
    for (let i = 0; i <= 1000; i++) s += (i === 0 || i === 1000 ? 1 : i % 2 ? 4 : 2) * c(i / 1000);
    expectClose(y.meanPpb, s / 3000, 1e-9);
  });

  it('diagnosing from the end concentration returns the emission that reaches it (inverse of the forward step)', () => {
    for (const cycle of [ch4, CH4_CYCLE]) {
      const forward = gasYear(cycle, 1850, natural, 120, NaN);
      const back = gasYear(cycle, 1850, natural, NaN, forward.endPpb);
      // The forward step takes its midpoint lifetime from a first pass; the inverse knows the end.
      expectClose(back.emissionMt, 120, cycle.lifetimeExponent === 0 ? 1e-9 : 0.05);
      expect(back.endPpb).toBeCloseTo(forward.endPpb, 9);
    }
  });
});

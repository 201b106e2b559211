import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  CH4_CYCLE,
  ch4CycleFromJoin,
  gasEmissionsForTendency,
  gasLifetimeYr,
  gasSinkMt,
  gasTendencyPpbPerYr,
  N2O_CYCLE,
  withConstantLifetime,
} from '../../src/carbon/index.js';
import { expectClose } from '../asserts.js';

/** Perturbation lifetime m / (d sink / dc) at a concentration, by central difference, yr. */
function perturbationLifetime(cycle: typeof CH4_CYCLE, ppb: number): number {
  const d = 1e-4 * ppb;
  return (cycle.mtPerPpb * 2 * d) / (gasSinkMt(cycle, ppb + d) - gasSinkMt(cycle, ppb - d));
}

describe('CH4 cycle', () => {
  it('gasLifetimeYr(CH4, 1800 ppb) is the total lifetime 9.1 yr (Prather et al. 2012; from memory)', () => {
    expectClose(gasLifetimeYr(CH4_CYCLE, 1800), 9.1, 1e-12);
  });

  it('the perturbation lifetime at 1800 ppb is 11.8 yr (IPCC AR6 WG1 Table 7.15; from memory)', () => {
    // Central-difference error of the power law at 1e-4 relative step: far below 1e-6 yr.
    expectClose(perturbationLifetime(CH4_CYCLE, 1800), 11.8, 1e-6);
  });

  it('the lifetime grows with the burden (OH is used up), and is constant when the feedback is off', () => {
    expect(gasLifetimeYr(CH4_CYCLE, 729.2)).toBeLessThan(gasLifetimeYr(CH4_CYCLE, 1866));
    expect(gasLifetimeYr(withConstantLifetime(CH4_CYCLE), 729.2)).toBe(9.1);
  });
});

describe('N2O cycle', () => {
  it('gasLifetimeYr(N2O) is 109 yr at any burden (IPCC AR6 WG1 Table 7.15; from memory)', () => {
    expect(gasLifetimeYr(N2O_CYCLE, 270.1)).toBe(109);
    expect(gasLifetimeYr(N2O_CYCLE, 400)).toBe(109);
    expectClose(perturbationLifetime(N2O_CYCLE, 330), 109, 1e-6);
  });
});

describe('mass balance', () => {
  it('the natural emissions equal to the sink keep a steady state (dc/dt = 0 without anthropogenic emissions)', () => {
    for (const cycle of [CH4_CYCLE, N2O_CYCLE]) {
      const c = cycle === CH4_CYCLE ? 729.2 : 270.1;
      expect(gasTendencyPpbPerYr(cycle, c, 0, gasSinkMt(cycle, c))).toBe(0);
    }
  });

  it('gasEmissionsForTendency inverts gasTendencyPpbPerYr (property)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(CH4_CYCLE, N2O_CYCLE),
        fc.double({ min: 100, max: 5000, noNaN: true }),
        fc.double({ min: -50, max: 50, noNaN: true }),
        fc.double({ min: 0, max: 500, noNaN: true }),
        (cycle, ppb, tendency, natural) => {
          const e = gasEmissionsForTendency(cycle, ppb, tendency, natural);
          return Math.abs(gasTendencyPpbPerYr(cycle, ppb, e, natural) - tendency) <= 1e-9 * (1 + Math.abs(tendency) + ppb / cycle.lifetimeYr);
        },
      ),
    );
  });
});

describe('ch4CycleFromJoin', () => {
  it('has the 9.1 yr total lifetime at the join and the 11.8 yr perturbation lifetime there (Prather et al. 2012 feedback factor; AR6 WG1 Table 7.15; from memory)', () => {
    const cycle = ch4CycleFromJoin(1930);
    expectClose(gasLifetimeYr(cycle, 1930), 9.1, 1e-12);
    expectClose(perturbationLifetime(cycle, 1930), 11.8, 1e-6);
  });

  it('keeps the sink continuous at the join: the same removal as the constant 9.1 yr lifetime there', () => {
    expectClose(gasSinkMt(ch4CycleFromJoin(1930), 1930), gasSinkMt(withConstantLifetime(CH4_CYCLE), 1930), 1e-9);
  });

  it('scales the total lifetime with an ensemble member\'s CH4 lifetime scale', () => {
    expectClose(gasLifetimeYr(ch4CycleFromJoin(1930, 1.1), 1930), 10.01, 1e-12);
  });
});

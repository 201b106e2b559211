import { describe, expect, it } from 'vitest';
import { calibrate, transientResponse } from '../../src/climate/index.js';
import { ConfigError } from '../../src/errors.js';
import { expectClose } from '../asserts.js';

describe('calibrate', () => {
  // Round trip: the definitions of ECS (F2x / lambda, the two-box equilibrium; Held et al. 2010) and
  // TCR (mean warming over years 61-80 of a 1 %/yr CO2 run; IPCC AR6 WG1 glossary) applied to the
  // calibrated model give back the targets. Tolerance 1e-9 K: the root finder's tolerance on gamma.
  for (const [ecs, tcr] of [[3, 1.8], [2, 1.2], [5, 2.4], [2.5, 1.4], [4, 2.2]]) {
    it(`calibrate({ ecsK: ${ecs}, tcrK: ${tcr} }) reproduces ECS and TCR`, () => {
      const p = calibrate({ ecsK: ecs, tcrK: tcr });
      expectClose(p.forcing2xWm2 / p.feedbackWm2K, ecs, 1e-12, 'ECS');
      expectClose(transientResponse(p), tcr, 1e-9, 'TCR');
      expectClose(p.tcrK, tcr, 1e-9, 'reported TCR');
    });
  }

  it('defaults to AR6 best estimates ECS 3 K, TCR 1.8 K with lambda = 3.934 / 3 (IPCC AR6 WG1 chapter 7)', () => {
    const p = calibrate();
    expectClose(p.ecsK, 3, 1e-12);
    expectClose(p.tcrK, 1.8, 1e-9);
    expectClose(p.feedbackWm2K, p.forcing2xWm2 / 3, 1e-12);
  });

  it('lets an explicit exchange coefficient win over the TCR target and reports the resulting TCR', () => {
    const p = calibrate({ ecsK: 3, tcrK: 1.8, exchangeWm2K: 0.5 });
    expect(p.exchangeWm2K).toBe(0.5);
    expect(p.tcrK).toBeGreaterThan(1.8);
    expectClose(p.tcrK, transientResponse(p), 1e-12);
  });

  it('rejects TCR at or above ECS, non-positive heat capacities and unreachable targets with ConfigError', () => {
    expect(() => calibrate({ ecsK: 2, tcrK: 2.5 })).toThrow(ConfigError);
    expect(() => calibrate({ upperHeatCapacity: -1 })).toThrow(/upper_heat_capacity must be a positive number/);
    expect(() => calibrate({ ecsK: 3, tcrK: 2.99 })).toThrow(/out of reach/);
  });
});

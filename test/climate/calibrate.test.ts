import { describe, expect, it, vi } from 'vitest';
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

  it('calibrate returns ECS and TCR exactly as asked (1.8, not 1.8000000000000604), the model reaching them within 1e-9 K', () => {
    for (const [ecs, tcr] of [[3, 1.8], [2.5, 1.4], [4, 2.2], [3.3, 1.87]]) {
      const p = calibrate({ ecsK: ecs, tcrK: tcr });
      expect(p.ecsK).toBe(ecs);
      expect(p.tcrK).toBe(tcr);
      expectClose(transientResponse(p), tcr, 1e-9, 'achieved TCR');
    }
  });

  it('calibrate of a calibrated set read back (explicit feedback and exchange) keeps the targets as written', () => {
    const p = calibrate(calibrate({ ecsK: 3, tcrK: 1.8 }));
    expect(p.ecsK).toBe(3);
    expect(p.tcrK).toBe(1.8);
  });

  it('calibrate reports a solved model that misses the TCR target by more than 1e-9 K as a NumericalError, never silently', async () => {
    // A root finder that stops early (gamma 1e-9 above the root moves TCR by far more than 1e-9 K).
    vi.resetModules();
    vi.doMock('../../src/numerics/find-root.js', async (load) => {
      const real = await load<typeof import('../../src/numerics/find-root.js')>();
      return { findRoot: (f: (x: number) => number, lo: number, hi: number, tol?: number) => real.findRoot(f, lo, hi, tol) + 1e-3 };
    });
    try {
      const fresh = await import('../../src/climate/calibrate.js');
      const errors = await import('../../src/errors.js');
      expect(() => fresh.calibrate({ ecsK: 3, tcrK: 1.8 })).toThrow(errors.NumericalError);
      expect(() => fresh.calibrate({ ecsK: 3, tcrK: 1.8 })).toThrow(/calibration failed: the solved model gives tcr_k 1\.79\d* K, not the target 1\.8 K/);
    } finally {
      vi.doUnmock('../../src/numerics/find-root.js');
      vi.resetModules();
    }
  });
});

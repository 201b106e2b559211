import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CARBON_CYCLE, integratedImpulseResponse, irf100Target, MILLAR_2017, uptakeTimescaleScaling } from '../../src/carbon/index.js';
import { expectClose } from '../asserts.js';

describe('irf100Target (Millar et al. 2017, eq. 7; coefficients from memory)', () => {
  it('is r0 = 32.4 yr for the pre-industrial state', () => {
    expectClose(irf100Target(0, 0), 32.4, 1e-12);
  });

  it('with the published coefficients grows by 0.019 yr per Gt C of uptake and 4.165 yr per K of warming', () => {
    expectClose(irf100Target(100, 0, MILLAR_2017) - irf100Target(0, 0, MILLAR_2017), 1.9, 1e-12);
    expectClose(irf100Target(0, 1, MILLAR_2017) - irf100Target(0, 0, MILLAR_2017), 4.165, 1e-12);
  });

  it('with the defaults (CARBON_CYCLE) grows by the fitted rC per Gt C and the published rT per K; r0Scale multiplies r0 alone', () => {
    expectClose(irf100Target(100, 0) - irf100Target(0, 0), 100 * CARBON_CYCLE.rUptakeYrPerGtc, 1e-12);
    expectClose(irf100Target(0, 1) - irf100Target(0, 0), 4.165, 1e-12);
    expectClose(irf100Target(50, 0.5, CARBON_CYCLE, 1.2) - irf100Target(50, 0.5), 0.2 * 32.4, 1e-12);
  });

  it('is capped at 97 yr (Millar et al. 2017) and floored at 25 yr (numerical guard)', () => {
    expect(irf100Target(1e5, 10)).toBe(MILLAR_2017.maxIrf100Yr);
    expect(irf100Target(-1e5, -10)).toBe(25);
  });
});

describe('uptakeTimescaleScaling', () => {
  it('uptakeTimescaleScaling(iIRF100 of the Joos fit) is 1', () => {
    expectClose(uptakeTimescaleScaling(integratedImpulseResponse(1, 100)), 1, 1e-12);
  });

  it('inverts integratedImpulseResponse over the clamped range, from any starting guess (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: 25, max: 97, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), (target, guess) => {
        const alpha = uptakeTimescaleScaling(target, guess);
        return alpha > 0 && Math.abs(integratedImpulseResponse(alpha, 100) - target) <= 1e-9 * target;
      }),
    );
  });

  it('increases with the target: weaker sinks mean longer time scales', () => {
    let previous = 0;
    for (let target = 25; target <= 97; target += 0.5) {
      const alpha = uptakeTimescaleScaling(target);
      expect(alpha).toBeGreaterThan(previous);
      previous = alpha;
    }
  });
});

import { describe, expect, it } from 'vitest';
import { energyBalance, twoBoxPropagator, type TwoBoxParams } from '../../src/climate/index.js';
import { expectAllClose } from '../asserts.js';

const p: TwoBoxParams = { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.31, exchangeWm2K: 1.02, deepEfficacy: 1.2 };

describe('twoBoxPropagator', () => {
  it('gives the odex path to 1e-8 K for a forcing ramp with wiggles (forcing linear within each year)', () => {
    const n = 300;
    const f = new Float64Array(n);
    for (let i = 0; i < n; i++) f[i] = 0.02 * i + 0.5 * Math.sin(i / 3) - (i === 140 ? 3 : 0);
    const exact = energyBalance(p, f, 'exact');
    const ode = energyBalance(p, f, 'odex');
    expectAllClose(exact.surfaceK, ode.surfaceK, 1e-8, 'surface');
    expectAllClose(exact.deepK, ode.deepK, 1e-8, 'deep');
  });

  it('has g1 = the response to a unit ramp over one year, below g0 (ramp starts at zero)', () => {
    const prop = twoBoxPropagator(p);
    expect(prop.g1[0]).toBeGreaterThan(0);
    expect(prop.g1[0]).toBeLessThan(prop.g0[0]);
  });
});

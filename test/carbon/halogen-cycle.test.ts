import { describe, expect, it } from 'vitest';
import { halogenAnomalyPpt, halogenEmissionsKt, halogenForcingWm2, ktPerPpt } from '../../src/carbon/halogen-cycle.js';
import { expectClose } from '../asserts.js';

const gas = { lifetimeYr: 14, molarMass: 102.03, radiativeEfficiency: 0.167 };

describe('halogen cycle', () => {
  it('ktPerPpt(M) is 0.17726 M kt: 5.1352e18 kg of air over 28.97 g mol-1 (Trenberth and Smith 2005; from memory)', () => {
    expectClose(ktPerPpt(1), 0.177259, 1e-6);
  });

  it('halogenAnomalyPpt with constant emissions approaches the steady state E tau / m (analytic)', () => {
    const e = new Float64Array(400).fill(100);
    const d = halogenAnomalyPpt(gas, 0, e);
    expectClose(d[399], (100 * gas.lifetimeYr) / ktPerPpt(gas.molarMass), 1e-9, 'steady state');
  });

  it('halogenAnomalyPpt conserves mass: the yearly change is (E - m D / tau) / m integrated exactly (year-end values)', () => {
    // Start from a steady state and stop emitting: the annual mean of year k is D0 e^{-k/tau} tau (1 - e^{-1/tau}).
    const d0 = 50;
    const d = halogenAnomalyPpt(gas, d0, new Float64Array(5));
    for (let k = 0; k < 5; k++) {
      expectClose(d[k], d0 * Math.exp(-k / gas.lifetimeYr) * gas.lifetimeYr * (1 - Math.exp(-1 / gas.lifetimeYr)), 1e-12);
    }
  });

  it('halogenEmissionsKt inverts the mass balance: a steady anomaly needs m D / tau', () => {
    expectClose(halogenEmissionsKt(gas, 10, 0), (ktPerPpt(gas.molarMass) * 10) / 14, 1e-12);
    expect(halogenEmissionsKt(gas, 10, 1)).toBeGreaterThan(halogenEmissionsKt(gas, 10, 0));
  });

  it('halogenForcingWm2 is RE x ppt / 1000', () => {
    expectClose(halogenForcingWm2(gas, 100), 0.0167, 1e-15);
  });
});

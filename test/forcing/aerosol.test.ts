import { describe, expect, it } from 'vitest';
import { aerosolAciWm2, aerosolAriWm2, PRECURSOR_PRESENT_DAY, PRECURSORS, type PrecursorEmissions } from '../../src/forcing/aerosol.js';
import { expectClose, expectWithin } from '../asserts.js';

const zero = Object.fromEntries(PRECURSORS.map((p) => [p, 0])) as PrecursorEmissions;

describe('aerosol forcing from emissions (AR6 WG1 7.SM.1.3.1 forms)', () => {
  it('zero anthropogenic emissions give zero ERFari and ERFaci', () => {
    expect(Math.abs(aerosolAriWm2(zero))).toBe(0);
    expect(Math.abs(aerosolAciWm2(zero))).toBe(0);
  });

  it('aerosolAriWm2 is linear: doubling every emission doubles it', () => {
    const twice = Object.fromEntries(PRECURSORS.map((p) => [p, 2 * PRECURSOR_PRESENT_DAY[p]])) as PrecursorEmissions;
    expectClose(aerosolAriWm2(twice), 2 * aerosolAriWm2(PRECURSOR_PRESENT_DAY), 1e-15);
  });

  it('aerosolAciWm2 saturates: the second 80 Mt of SO2 cools less than the first (logarithmic form, Smith et al. 2021)', () => {
    const first = aerosolAciWm2({ ...zero, so2: 80 });
    const second = aerosolAciWm2({ ...zero, so2: 160 }) - first;
    expect(first).toBeLessThan(0);
    expect(second).toBeLessThan(0);
    expect(Math.abs(second)).toBeLessThan(Math.abs(first));
  });

  it('present-day emissions give ERFari and ERFaci near AR6 2019 (-0.22, -0.84 W m-2; ar6-erf-1750-2019.csv) within 40 % (coefficients and emissions from memory)', () => {
    expectWithin(aerosolAriWm2(PRECURSOR_PRESENT_DAY) / -0.2156, 0.6, 1.4, 'ari');
    expectWithin(aerosolAciWm2(PRECURSOR_PRESENT_DAY) / -0.8428, 0.6, 1.4, 'aci');
  });

  it('BC warms through ERFari; SO2, OC and NH3 cool', () => {
    expect(aerosolAriWm2({ ...zero, bc: 1 })).toBeGreaterThan(0);
    for (const p of ['so2', 'oc', 'nh3'] as const) expect(aerosolAriWm2({ ...zero, [p]: 1 })).toBeLessThan(0);
  });
});

import { describe, expect, it } from 'vitest';
import { co2ErfAr6, co2ForcingLog, co2SarfMeinshausen, forcingByAgent } from '../../src/forcing/index.js';
import { expectClose } from '../asserts.js';

describe('co2SarfMeinshausen', () => {
  it('is continuous at C_amax = C0 - b1/(2 a1) (Meinshausen et al. 2020, eq. 1)', () => {
    const cMax = 278.3 - 7.5906e-4 / (2 * -2.4785e-7);
    expectClose(co2SarfMeinshausen(cMax + 1e-6, 270.1), co2SarfMeinshausen(cMax - 1e-6, 270.1), 1e-6);
  });

  it('never decreases as CO2 rises from 150 to 5000 ppm (more CO2 never cools)', () => {
    let last = -Infinity;
    for (let c = 150; c <= 5000; c += 5) {
      const f = co2ErfAr6(c, 300);
      expect(f).toBeGreaterThan(last);
      last = f;
    }
  });

  it('is close to the log law near present-day levels (both fit line-by-line results; within 0.2 W m-2 at 410 ppm, common practice, no source)', () => {
    expectClose(co2ErfAr6(410, 332), co2ForcingLog(410), 0.2);
  });
});

describe('forcingByAgent', () => {
  it('scales CO2 forcing so that doubling gives forcing2xWm2', () => {
    const f = forcingByAgent(1, { co2Ppm: Float64Array.of(556.6) }, { co2Formula: 'log', forcing2xWm2: 4.5 });
    expectClose(f.byAgent.co2[0], 4.5, 1e-12);
  });

  it('adds prescribed agent columns as given and scales both aerosol agents', () => {
    const f = forcingByAgent(
      2,
      { prescribed: { aerosol_ari_wm2: Float64Array.of(-0.25, -0.5), aerosol_aci_wm2: Float64Array.of(-0.75, -1.5), ozone_wm2: Float64Array.of(0.5, 0.25), solar_wm2: Float64Array.of(0.125, 0), volcanic_wm2: Float64Array.of(0, -1) } },
      { co2Formula: 'ar6', aerosolScale: 0.5 },
    );
    expect(Array.from(f.byAgent.aerosol_ari)).toEqual([-0.125, -0.25]);
    expect(Array.from(f.byAgent.aerosol_aci)).toEqual([-0.375, -0.75]);
    expect(Array.from(f.aerosol)).toEqual([-0.5, -1]);
    expect(Array.from(f.total)).toEqual([-0.5 + 0.5 + 0.125, -1 + 0.25 - 1]);
  });
});

// Reference checks of greenhouse-gas forcing against published values.
import { describe, it } from 'vitest';
import { ch4ErfAr6, co2ErfAr6, co2ForcingLog, forcingByAgent, forcingOfDoubling, n2oErfAr6 } from '../../src/forcing/index.js';
import { expectClose, expectWithin } from '../asserts.js';

describe('CO2 forcing of doubling', () => {
  it('co2ForcingLog(2 x C0) is 3.71 W m-2 (Myhre et al. 1998, Table 3: 5.35 ln 2)', () => {
    // Tolerance: the published figure is given to 2 decimals.
    expectClose(co2ForcingLog(2 * 278.3), 3.71, 0.005);
  });

  it('forcingOfDoubling("ar6") is within AR6 assessed 3.93 +/- 0.47 W m-2 and rounds to 3.93 (IPCC AR6 WG1 7.3.2.1)', () => {
    const f2x = forcingOfDoubling('ar6');
    expectWithin(f2x, 3.93 - 0.47, 3.93 + 0.47, 'assessed range');
    // The assessed central value is quoted to 2 decimals.
    expectClose(f2x, 3.93, 0.005, 'central value');
  });
});

describe('ERF 1750-2019 by gas (IPCC AR6 WG1 chapter 7, Table 7.8 best estimates)', () => {
  // 2019 concentrations: CO2 410.1 ppm, CH4 1866.3 ppb, N2O 332.1 ppb (AR6 WG1 chapter 2; CO2 and
  // N2O from memory, CH4 confirmed). Tolerance: the report rounds ERF to 0.01 W m-2, so +/-0.005.
  const co2 = 410.1;
  const ch4 = 1866.3;
  const n2o = 332.1;

  it('co2ErfAr6(2019) is 2.16 W m-2', () => expectClose(co2ErfAr6(co2, n2o), 2.16, 0.005));
  it('ch4ErfAr6(2019) is 0.54 W m-2', () => expectClose(ch4ErfAr6(ch4, n2o), 0.54, 0.005));
  it('n2oErfAr6(2019) is 0.21 W m-2', () => expectClose(n2oErfAr6(n2o, co2, ch4), 0.21, 0.005));

  it('forcingByAgent sums the three gases to AR6 2.91 W m-2 (2.16 + 0.54 + 0.21)', () => {
    const one = (x: number) => Float64Array.of(x);
    const f = forcingByAgent(1, { co2Ppm: one(co2), ch4Ppb: one(ch4), n2oPpb: one(n2o) }, { co2Formula: 'ar6' });
    // Sum of three values each rounded to 0.01: +/-0.015.
    expectClose(f.total[0], 2.91, 0.015);
  });
});

describe('pre-industrial reference', () => {
  it('every agent is zero at the AR6 1750 concentrations (278.3 ppm, 729.2 ppb, 270.1 ppb)', () => {
    const f = forcingByAgent(1, { co2Ppm: Float64Array.of(278.3), ch4Ppb: Float64Array.of(729.2), n2oPpb: Float64Array.of(270.1) }, { co2Formula: 'ar6' });
    expectClose(f.total[0], 0, 1e-12);
  });
});

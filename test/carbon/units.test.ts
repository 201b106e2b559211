import { describe, expect, it } from 'vitest';
import {
  GTC_PER_PPM,
  gtcToGtco2,
  gtcToPpm,
  gtco2ToGtc,
  MT_CH4_PER_PPB,
  MT_N2O_PER_PPB,
  mtCh4ToPpb,
  mtN2oToPpb,
  ppbToMtCh4,
  ppbToMtN2o,
  ppmToGtc,
} from '../../src/carbon/index.js';
import { expectClose } from '../asserts.js';

// Moles of dry air in the atmosphere: mass 5.1352e18 kg (Trenberth & Smith 2005, J. Climate 18, 864;
// from memory) over the molar mass of dry air 28.97 g mol-1 (US Standard Atmosphere 1976; from memory).
const MOLES_OF_AIR = 5.1352e18 / 0.02897;

describe('mass per mole fraction', () => {
  it('gtcToGtco2(1) is 3.664 (molar masses 44.009 / 12.011, IUPAC standard atomic weights)', () => {
    // The conventional factor is quoted to 3 decimals.
    expectClose(gtcToGtco2(1), 3.664, 0.0005);
  });

  it('1 ppm CO2 is 7.78 Gt CO2 (REFERENCES.md, derived from 2.124 Gt C x 3.664)', () => {
    expectClose(gtcToGtco2(ppmToGtc(1)), 7.78, 0.005);
  });

  it('GTC_PER_PPM agrees with the mass of a well-mixed atmosphere to 0.5 % (Trenberth & Smith 2005)', () => {
    // 1 ppm of the air's moles times 12.011 g mol-1, in Gt: 2.129. The 0.5 % allows for the spread of
    // published atmospheric masses (about 5.13-5.15e18 kg).
    const derived = (MOLES_OF_AIR * 1e-6 * 12.011) / 1e15;
    expectClose(GTC_PER_PPM / derived, 1, 0.005);
  });

  it('Mt per ppb of CH4 and N2O lie within 5 % below the well-mixed-atmosphere mass (Prather et al. 2012)', () => {
    // Both gases fall off with height in the stratosphere, so the burden per ppb of surface mole fraction
    // is a few percent below the well-mixed value (2.844 Mt CH4, 7.80 Mt N2O); 5 % is our bound
    // (common practice, no source).
    const ch4 = (MOLES_OF_AIR * 1e-9 * 16.043) / 1e12;
    const n2o = (MOLES_OF_AIR * 1e-9 * 44.013) / 1e12;
    for (const [value, wellMixed] of [[MT_CH4_PER_PPB, ch4], [MT_N2O_PER_PPB, n2o]]) {
      expect(value).toBeLessThan(wellMixed);
      expect(value).toBeGreaterThan(0.95 * wellMixed);
    }
  });

  it('MT_N2O_PER_PPB is 4.79 Mt N per ppb in N2O mass, 7.526 (Prather et al. 2012; molar masses)', () => {
    expectClose(MT_N2O_PER_PPB, (4.79 * 44.013) / 28.014, 1e-9);
  });
});

describe('conversions invert', () => {
  it('each conversion and its inverse compose to the identity', () => {
    for (const x of [-12.5, 0, 1, 417.3, 1e4]) {
      expectClose(gtco2ToGtc(gtcToGtco2(x)), x, 1e-12 * Math.max(1, Math.abs(x)));
      expectClose(gtcToPpm(ppmToGtc(x)), x, 1e-12 * Math.max(1, Math.abs(x)));
      expectClose(mtCh4ToPpb(ppbToMtCh4(x)), x, 1e-12 * Math.max(1, Math.abs(x)));
      expectClose(mtN2oToPpb(ppbToMtN2o(x)), x, 1e-12 * Math.max(1, Math.abs(x)));
    }
  });
});

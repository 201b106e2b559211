import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { EXTENSION_RULES, buildHistoryCsv, concentrationsForErf } from '../../scripts/build-history.js';
import { ch4ErfAr6, co2ErfAr6, n2oErfAr6 } from '../../src/forcing/index.js';
import { expectClose } from '../asserts.js';

describe('scripts/build-history.ts', () => {
  it('buildHistoryCsv(the bundled AR6 record) reproduces pathways/history.csv byte for byte', () => {
    const built = buildHistoryCsv(readFileSync('pathways/records/ar6-erf-1750-2019.csv', 'utf8'));
    expect(built).toBe(readFileSync('pathways/history.csv', 'utf8'));
  });

  it('concentrationsForErf inverts the three AR6 gas formulas together (round trip to 1e-9 W m-2)', () => {
    // The record's 2019 row (pathways/records/ar6-erf-1750-2019.csv).
    const erf = [2.156277925173476, 0.5439829883633728, 0.20846263508630938] as const;
    const [c, m, n] = concentrationsForErf(...erf);
    expectClose(co2ErfAr6(c, n), erf[0], 1e-9, 'CO2');
    expectClose(ch4ErfAr6(m, n), erf[1], 1e-9, 'CH4');
    expectClose(n2oErfAr6(n, c, m), erf[2], 1e-9, 'N2O');
    // They point back to AR6's 2019 concentrations 410.1 ppm, 1866.3 ppb, 332.1 ppb (REFERENCES.md;
    // CH4 C, others M✓) within 0.5 ppm / 5 ppb / 0.5 ppb: the formulas give 2.160 W m-2 at 410.1 ppm,
    // 0.004 above the record, which is 0.3 ppm of CO2.
    expectClose(c, 410.1, 0.5, 'CO2 ppm');
    expectClose(m, 1866.3, 5, 'CH4 ppb');
    expectClose(n, 332.1, 0.5, 'N2O ppb');
  });

  it('states an extension rule for every prescribed column', () => {
    expect(Object.keys(EXTENSION_RULES)).toEqual([
      'other_ghg_wm2', 'ozone_wm2', 'strat_h2o_wm2', 'contrails_wm2', 'aerosol_ari_wm2', 'aerosol_aci_wm2', 'bc_snow_wm2', 'land_use_wm2', 'solar_wm2', 'volcanic_wm2',
    ]);
  });
});

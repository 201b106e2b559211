import { describe, expect, it } from 'vitest';
import { ch4ErfAr6 } from '../../src/forcing/ch4.js';
import { methaneChemistryWm2 } from '../../src/forcing/methane-chemistry.js';
import { STRAT_H2O_PER_CH4_ERF } from '../../src/forcing/strat-h2o.js';
import { expectClose } from '../asserts.js';

describe('methaneChemistryWm2', () => {
  it('is zero at the reference state', () => {
    const c = methaneChemistryWm2(1930, 338, 1930, 338);
    expect(c.ozone).toBe(0);
    expect(c.stratH2o).toBe(0);
  });

  it('strat. H2O is 0.0919 of the CH4 ERF change, the ratio of the AR6 series (ar6-erf-1750-2019.csv: 0.05 / 0.544 in 2019)', () => {
    const c = methaneChemistryWm2(2200, 338, 1930, 338);
    expectClose(c.stratH2o, STRAT_H2O_PER_CH4_ERF * (ch4ErfAr6(2200, 338) - ch4ErfAr6(1930, 338)), 1e-15);
    expectClose(STRAT_H2O_PER_CH4_ERF, 0.0919146, 1e-6);
  });

  it('more CH4 adds ozone at 1.75e-4 W m-2 ppb-1 (Thornhill et al. 2021; from memory)', () => {
    expectClose(methaneChemistryWm2(2030, 338, 1930, 338).ozone, 0.0175, 1e-12);
  });
});

/**
 * Warming by agent for 2010-2019 relative to 1850-1900 against IPCC AR6 WG1 SPM Figure SPM.2 (panel b:
 * well-mixed greenhouse gases 1.5 [1.0 to 2.0] K, other human drivers, mainly aerosols, -0.4 [-0.8 to
 * 0.0] K, total human-caused 1.07 [0.8 to 1.3] K; panel c: CO2 about 0.8 K). Values from memory.
 * The deterministic run of a bundled future (its history part) is the one compared.
 */
import { describe, it } from 'vitest';
import { calibrate } from '../../src/climate/calibrate.js';
import { readPathway } from '../../src/io/load-pathway.js';
import { attributePathway } from '../../src/projection/attribute-pathway.js';
import { expectWithin } from '../asserts.js';

const { projection: p, attribution: a } = attributePathway(readPathway('delayed').pathway, { params: calibrate() });
const mean = (v: Float64Array) => {
  let s = 0;
  for (let y = 2010; y <= 2019; y++) s += v[y - p.years[0]];
  return s / 10;
};
const part = (...agents: string[]) => agents.reduce((s, x) => s + mean(a.warmingK[x]), 0);

describe('attribution 2010-2019 vs 1850-1900 beside AR6 WG1 Figure SPM.2 (from memory)', () => {
  it('well-mixed greenhouse gases (CO2, CH4, N2O, halogenated) within 1.0-2.0 K (SPM.2b)', () => {
    expectWithin(part('co2', 'ch4', 'n2o', 'other_ghg'), 1.0, 2.0, 'WMGHG, K');
  });
  it('aerosols (radiation and cloud interactions) within -0.8 to 0.0 K (SPM.2b "other human drivers", mainly aerosols)', () => {
    expectWithin(part('aerosol_ari', 'aerosol_aci'), -0.8, 0.0, 'aerosol, K');
  });
  it('CO2 within 0.6-1.1 K (SPM.2c CO2 bar, about 0.8 K; range from memory)', () => {
    expectWithin(part('co2'), 0.6, 1.1, 'CO2, K');
  });
  it('all human-caused agents (everything but solar and volcanic) within 0.8-1.3 K (SPM.2b)', () => {
    const human = a.agents.filter((x) => x !== 'solar' && x !== 'volcanic');
    expectWithin(part(...human), 0.8, 1.3, 'human-caused, K');
  });
});

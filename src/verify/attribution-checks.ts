import { calibrate } from '../climate/calibrate.js';
import { loadPathway } from '../io/load-pathway.js';
import { attributePathway } from '../projection/attribute-pathway.js';
import { withinRange, type PublishedCheck } from './published-check.js';

/**
 * Warming in 2010-2019 relative to 1850-1900 split by agent and by emitted species, with the AR6
 * central climate response (ECS 3 K, TCR 1.8 K, calibrate's defaults) on the history of a bundled
 * emission future (clean-air-emissions, which gives its precursors), beside IPCC AR6 WG1 SPM Figure SPM.2 (panel b by agent
 * group, panel c by emitted species; all values from memory, the ranges those recalled for the bars).
 * The same comparisons as test/reference/ar6-attribution.test.ts and ar6-species-attribution.test.ts.
 */
export const attribution2010s: PublishedCheck = {
  id: 'attribution-2010s',
  run: () => {
    const r = attributePathway(loadPathway('clean-air-emissions'), { params: calibrate() });
    const first = r.projection.years[0];
    const mean = (v: Float64Array) => {
      let s = 0;
      for (let y = 2010; y <= 2019; y++) s += v[y - first];
      return s / 10;
    };
    const agents = (...xs: string[]) => xs.reduce((s, x) => s + mean(r.attribution.warmingK[x]), 0);
    const species = (x: string) => mean(r.bySpecies!.warmingK[x]);
    const b = 'IPCC AR6 WG1 SPM Figure SPM.2b (from memory)';
    const c = 'IPCC AR6 WG1 SPM Figure SPM.2c, by emitted species (from memory)';
    const what = (s: string) => `warming 2010-2019 vs 1850-1900, ${s}`;
    return [
      withinRange(what('well-mixed greenhouse gases'), b, '1.5 [1.0-2.0]', agents('co2', 'ch4', 'n2o', 'other_ghg'), 1.0, 2.0, 'K', 2),
      withinRange(what('aerosols'), `${b}, "other human drivers", mainly aerosols`, '-0.4 [-0.8-0.0]', agents('aerosol_ari', 'aerosol_aci'), -0.8, 0.0, 'K', 2),
      withinRange(what('CO2'), c, 'about 0.8', species('co2'), 0.6, 1.1, 'K', 2),
      withinRange(what('methane emissions, with their ozone and strat. H2O'), c, 'about 0.5', species('ch4'), 0.3, 0.8, 'K', 2),
      withinRange(what('SO2, BC, OC and NH3 emissions together'), c, 'about -0.5', species('aerosol_precursors'), -0.9, -0.2, 'K', 2),
    ];
  },
};

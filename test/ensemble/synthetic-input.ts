// A synthetic concentration-driven pathway for ensemble tests: smooth CO2, CH4 and N2O rising to a
// peak and falling, aerosol forcing growing then fading, two volcanic eruptions and a solar cycle.
// Not a real pathway; the tests using it check properties, not published values.
import type { EnsembleInput } from '../../src/ensemble/index.js';
import { forcingByAgent } from '../../src/forcing/agents.js';
import type { Pathway } from '../../src/pathway.js';

export function syntheticPathway(firstYear = 1750, lastYear = 2150): Pathway {
  const years = Float64Array.from({ length: lastYear - firstYear + 1 }, (_, k) => firstYear + k);
  const co2 = years.map((y) => 278.3 + (y < 1850 ? 0 : 180 * Math.exp(-(((Math.min(y, 2060) - 2060) / 70) ** 2)) - (y > 2060 ? 40 * (1 - Math.exp(-(y - 2060) / 60)) : 0)));
  const ch4 = years.map((y) => 729.2 + (y < 1850 ? 0 : 1200 * Math.exp(-(((y - 2030) / 80) ** 2))));
  const n2o = years.map((y) => 270.1 + (y < 1850 ? 0 : 90 / (1 + Math.exp(-(y - 2000) / 40))));
  const aerosol = years.map((y) => -1.2 * Math.exp(-(((y - 2005) / 55) ** 2)) * (y < 1850 ? (y - 1750) / 100 : 1));
  const volcanic = years.map((y) => (y === 1815 ? -4 : y === 1816 ? -1.5 : y === 1991 ? -2.5 : y === 1992 ? -1 : 0));
  const solar = years.map((y) => 0.1 * Math.sin(((y - 1750) * 2 * Math.PI) / 11));
  const other = years.map((y) => (y <= 1850 ? 0 : 0.8 * Math.exp(-(((y - 2020) / 90) ** 2))));
  return {
    name: 'synthetic',
    years,
    series: { co2_ppm: co2, ch4_ppb: ch4, n2o_ppb: n2o, aerosol_wm2: aerosol, volcanic_wm2: volcanic, solar_wm2: solar, other_wm2: other },
    metadata: {},
    provenance: { source: 'test', notes: [] },
  };
}

/** The ensemble input of a pathway: its years and forcing by agent (formula's own 2xCO2 forcing). */
export function ensembleInputOf(pathway: Pathway, co2Formula: 'ar6' | 'log' = 'ar6'): EnsembleInput {
  const s = pathway.series;
  const forcing = forcingByAgent(pathway.years.length, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, { co2Formula });
  return { years: pathway.years, forcing, co2Formula };
}

export function syntheticInput(firstYear = 1750, lastYear = 2150): EnsembleInput {
  return ensembleInputOf(syntheticPathway(firstYear, lastYear));
}


import { FORCING_AGENTS, forcingByAgent, type ForcingAgent } from '../forcing/agents.js';
import { loadHistory } from '../io/bundled-pathways.js';
import { loadRecord } from '../io/load-record.js';
import type { PublishedCheck, VerificationRow } from './published-check.js';

const SOURCE = 'IPCC AR6 WG1 Annex III ERF 1750-2019 (Smith et al. 2021), pathways/records/';

/** The record's column for each of warmcast's agents. */
const RECORD_COLUMN: Record<ForcingAgent, string> = {
  co2: 'co2',
  ch4: 'ch4',
  n2o: 'n2o',
  other_ghg: 'other_wmghg',
  ozone: 'o3',
  strat_h2o: 'h2o_stratospheric',
  contrails: 'contrails',
  aerosol_ari: 'aerosol-radiation_interactions',
  aerosol_aci: 'aerosol-cloud_interactions',
  bc_snow: 'bc_on_snow',
  land_use: 'land_use',
  solar: 'solar',
  volcanic: 'volcanic',
};

/**
 * The bundled history's forcing against the AR6 ERF series, every year 1750-2019: the gases, computed
 * from the history's concentrations by the AR6 formulas, within 0.03 W m-2 of the record (warmcast's
 * tolerance; AR6's own 5-95 % range for CO2 in 2019 is ±0.25 W m-2); the prescribed agents equal to
 * the 5 decimals history.csv writes; and the 2019 total.
 */
export const erfHistory: PublishedCheck = {
  id: 'ar6-erf-history',
  run: () => {
    const record = loadRecord('ar6-erf-1750-2019.csv').columns;
    const history = loadHistory();
    const s = history.series;
    const forcing = forcingByAgent(history.years.length, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, { co2Formula: 'ar6' });
    const at = (year: number) => year - history.years[0];
    const worst = (agent: ForcingAgent) => {
      let diff = 0;
      record.year.forEach((y, i) => {
        const d = forcing.byAgent[agent][at(y)] - record[RECORD_COLUMN[agent]][i];
        if (Math.abs(d) > Math.abs(diff)) diff = d;
      });
      return diff;
    };
    const gases = (['co2', 'ch4', 'n2o'] as const).map((agent): VerificationRow => {
      const d = worst(agent);
      return { check: `history ${agent} ERF 1750-2019 from concentrations, largest difference`, source: SOURCE, published: 'the AR6 series', warmcast: `${d.toFixed(4)} W m-2`, tolerance: '±0.03 W m-2', pass: Math.abs(d) <= 0.03 };
    });
    const prescribed = FORCING_AGENTS.filter((a) => !['co2', 'ch4', 'n2o'].includes(a));
    const worstPrescribed = Math.max(...prescribed.map((a) => Math.abs(worst(a))));
    const total2019 = forcing.total[at(2019)];
    const recordTotal = record.total[2019 - record.year[0]];
    return [
      ...gases,
      {
        check: `history's ${prescribed.length} other agents 1750-2019, largest difference`,
        source: SOURCE,
        published: 'the AR6 series',
        warmcast: `${worstPrescribed.toExponential(1)} W m-2`,
        tolerance: 'at most 5e-6 W m-2 (5 decimals)',
        pass: worstPrescribed <= 0.5e-5 + 1e-12,
      },
      { check: 'history total ERF 2019 vs 1750', source: SOURCE, published: `${recordTotal.toFixed(3)} W m-2`, warmcast: `${total2019.toFixed(3)} W m-2`, tolerance: '±0.03 W m-2', pass: Math.abs(total2019 - recordTotal) <= 0.03 },
    ];
  },
};

// The default run of the bundled history against the IPCC AR6 WG1 energy budget: the Earth energy
// imbalance 2006-2018 (AR6 WG1 Table 7.1: 0.79 [0.52-1.06] W m-2) and the AR6 assessed ocean heat
// content series (pathways/records/ar6-ocean-heat-content-1971-2018.csv; AR6 WG1 chapter 2 and
// Box 7.2; CC-BY 4.0). Nothing is tuned to these checks; a miss is a finding.
import { readFileSync } from 'node:fs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory } from '../../src/io/index.js';
import { AR6_ENERGY_BUDGET, energyBudget, projectPathway } from '../../src/projection/index.js';
import { expectClose, expectWithin } from '../asserts.js';

// The record's first line is a title, then the header.
const text = readFileSync('pathways/records/ar6-ocean-heat-content-1971-2018.csv', 'utf8').split('\n').slice(1).join('\n');
const rows = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
const last = rows[rows.length - 1];

describe('the AR6 ocean heat content record', () => {
  it('AR6_ENERGY_BUDGET holds the record\'s full-depth change 1971 to 2018.5 and its 1 sigma (to the 0.1 ZJ written)', () => {
    expect(last.Year).toBe('2018.5');
    expectClose(AR6_ENERGY_BUDGET.oceanHeatZj, Number(last['Central Estimate Full-depth']), 0.05, 'central');
    expectClose(AR6_ENERGY_BUDGET.oceanHeatSigmaZj, Number(last['Full-depth Uncertainty (1-sigma)']), 0.05, 'sigma');
  });
});

describe('energy budget of the default run of the bundled history', () => {
  const params = calibrate();
  const run = projectPathway(loadHistory(), { params });
  const budget = energyBudget(run.years, run.columns as Parameters<typeof energyBudget>[1], params)!;

  it('the run carries its energy budget in its notes', () => {
    expect(run.notes.some((n) => n.startsWith('energy budget: top-of-atmosphere imbalance 2006-2018 '))).toBe(true);
  });

  it('top-of-atmosphere imbalance 2006-2018 is inside the AR6 very likely range 0.52-1.06 W m-2 (AR6 WG1 Table 7.1)', () => {
    console.info(`imbalance 2006-2018: ${budget.imbalanceWm2.toFixed(3)} W m-2 (AR6 0.79 [0.52-1.06])`);
    expectWithin(budget.imbalanceWm2, 0.52, 1.06, 'imbalance');
  });

  it('ocean heat gain 1971-2018 (91 % of the two boxes\' heat, AR6 SPM A.4.2, from memory) is within the record\'s 5-95 % range, 395 +/- 1.645 sigma ZJ', () => {
    const { oceanHeatZj, oceanHeatSigmaZj } = AR6_ENERGY_BUDGET;
    console.info(`ocean heat gain 1971-2018: ${budget.oceanHeatGainZj.toFixed(0)} ZJ of ${budget.heatGainZj.toFixed(0)} ZJ in both boxes (AR6 record ${oceanHeatZj} +/- ${oceanHeatSigmaZj} ZJ, 1 sigma)`);
    // 1.645 sigma: the 5-95 % range of a normal error (the record gives 1 sigma).
    expectWithin(budget.oceanHeatGainZj, oceanHeatZj - 1.645 * oceanHeatSigmaZj, oceanHeatZj + 1.645 * oceanHeatSigmaZj, 'ocean heat gain');
  });
});

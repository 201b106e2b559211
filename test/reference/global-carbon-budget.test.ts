// Reference checks of the default carbon cycle against the published carbon budget: the emissions
// the production scheme diagnoses from the bundled concentration history (pathways/history.csv)
// against IPCC AR6 WG1 and the Global Carbon Budget (Friedlingstein et al. 2020/2022). Values from
// memory (REFERENCES.md status M). The defaults were fitted to the first two totals by
// scripts/fit-carbon-cycle.ts; the sinks are a check the fit did not use.
import { describe, it } from 'vitest';
import { runEmissionDriven } from '../../src/carbon/index.js';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory } from '../../src/io/index.js';
import { expectWithin } from '../asserts.js';

const params = calibrate();
const history = loadHistory();
const run = runEmissionDriven(history, params, { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 } });
const at = (year: number) => year - history.years[0];

describe('emissions diagnosed from the bundled history (default carbon cycle)', () => {
  it('sum to 2390 +/- 240 Gt CO2 over 1850-2019 (IPCC AR6 WG1 SPM B.5.1; from memory)', () => {
    expectWithin(run.cumulativeCo2Gtco2[at(2019)], 2390 - 240, 2390 + 240, 'Gt CO2');
  });

  it('average 38-44 Gt CO2 per year over 2010-2019 (GCB: fossil 9.6 + land use 1.6 Gt C yr-1 = 41.0 Gt CO2 yr-1; from memory)', () => {
    let sum = 0;
    for (let y = 2010; y <= 2019; y++) sum += run.co2EmissionsGtco2[at(y)];
    expectWithin(sum / 10, 38, 44, 'Gt CO2 yr-1');
  });

  it('read 41.6 +/- 3 Gt CO2 for 2024, the year a future file joins (GCB 2024 projection: fossil 37.4 + land use 4.2; from memory)', () => {
    expectWithin(run.co2EmissionsGtco2[at(2024)], 41.6 - 3, 41.6 + 3, 'Gt CO2');
  });
});

describe('land + ocean sink 2010-2019 (no land/ocean split in the model: the total is checked)', () => {
  it('is 5.9 +/- 1.0 Gt C per year (GCB: ocean 2.5 +/- 0.6, land 3.4 +/- 0.9; from memory)', () => {
    const uptake = run.carbonBudget.uptakeGtc;
    expectWithin((uptake[at(2019)] - uptake[at(2009)]) / 10, 5.9 - 1.0, 5.9 + 1.0, 'Gt C yr-1');
  });
});

// The default configuration run over the bundled history against IPCC AR6 WG1 observed warming.
// Nothing in the model or the history data is tuned to this check; a miss is a finding.
import { describe, it } from 'vitest';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory } from '../../src/io/index.js';
import { projectPathway } from '../../src/projection/index.js';
import { expectWithin } from '../asserts.js';

function decadeMean(years: Float64Array, values: Float64Array, from: number, to: number): number {
  let s = 0;
  for (let y = from; y <= to; y++) s += values[y - years[0]];
  return s / (to - from + 1);
}

describe('default run of the bundled history', () => {
  const history = loadHistory();
  const run = projectPathway(history, { params: calibrate() });

  it('gives 2011-2020 warming inside the AR6 assessed 0.95-1.20 K relative to 1850-1900 (IPCC AR6 WG1 SPM A.1.2: 1.09 [0.95-1.20] K)', () => {
    const w = decadeMean(run.years, run.columns.warming_k, 2011, 2020);
    console.info(`2011-2020 warming, default parameters: ${w.toFixed(3)} K (AR6: 1.09 [0.95-1.20])`);
    expectWithin(w, 0.95, 1.2, '2011-2020 mean warming');
  });

  it('gives 2001-2020 warming inside the AR6 assessed 0.84-1.10 K (IPCC AR6 WG1 SPM A.1.2: 0.99 [0.84-1.10] K)', () => {
    const w = decadeMean(run.years, run.columns.warming_k, 2001, 2020);
    console.info(`2001-2020 warming: ${w.toFixed(3)} K (AR6: 0.99 [0.84-1.10])`);
    expectWithin(w, 0.84, 1.1, '2001-2020 mean warming');
  });

  it('gives a 2006-2018 energy imbalance inside the AR6 assessed 0.52-1.06 W m-2 (IPCC AR6 WG1 chapter 7, 7.2.2: 0.79 [0.52-1.06])', () => {
    const n = decadeMean(run.years, run.columns.imbalance_wm2, 2006, 2018);
    console.info(`2006-2018 energy imbalance: ${n.toFixed(3)} W m-2 (AR6: 0.79 [0.52-1.06])`);
    expectWithin(n, 0.52, 1.06, '2006-2018 imbalance');
  });
});

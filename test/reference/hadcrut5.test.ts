// The central historical run (default parameters, the bundled history) against HadCRUT5
// (pathways/records/hadcrut5-global-annual.csv; Morice et al. 2021, JGR Atmospheres 126,
// e2019JD032361; Met Office Hadley Centre / CRU, Open Government Licence v3.0), rebased from
// 1961-1990 to the 1850-1900 mean. Nothing is tuned to this check: the ensemble constraint closes the
// gap; this test reports it and fails only outside the tolerances stated beside each check.
import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory } from '../../src/io/index.js';
import { projectPathway } from '../../src/projection/index.js';
import { expectClose, expectWithin } from '../asserts.js';

const rows = readFileSync('pathways/records/hadcrut5-global-annual.csv', 'utf8').trim().split('\n').slice(1).map((l) => l.split(',').map(Number));
const observedRaw = new Map(rows.map(([year, anomaly]) => [year, anomaly]));

function mean(values: (year: number) => number, from: number, to: number): number {
  let s = 0;
  for (let y = from; y <= to; y++) s += values(y);
  return s / (to - from + 1);
}

const base = mean((y) => observedRaw.get(y)!, 1850, 1900);
const observed = (y: number) => observedRaw.get(y)! - base;
const run = projectPathway(loadHistory(), { params: calibrate() });
const model = (y: number) => run.columns.warming_k[y - run.years[0]];

/** Root-mean-square difference of the 17 decadal means 1850-1859 ... 2010-2019, K. */
function decadalRms(): number {
  let ss = 0;
  let n = 0;
  for (let d = 1850; d <= 2010; d += 10) {
    const e = mean(model, d, d + 9) - mean(observed, d, d + 9);
    ss += e * e;
    n++;
  }
  return Math.sqrt(ss / n);
}

describe('central historical run against HadCRUT5, both relative to 1850-1900', () => {
  it('HadCRUT5 rebased to 1850-1900 gives 0.870 K for 1995-2014 and 1.116 K for 2011-2020 (REFERENCES.md, D from the data)', () => {
    expect(observedRaw.size).toBe(2023 - 1850 + 1);
    expectClose(mean(observed, 1995, 2014), 0.870, 0.0005);
    expectClose(mean(observed, 2011, 2020), 1.116, 0.0005);
  });

  it('1995-2014 mean warming is within 0.15 K of HadCRUT5\'s 0.870 K (tolerance: common practice, no source; about the AR6 likely range half-width)', () => {
    const m = mean(model, 1995, 2014);
    console.info(`1995-2014: model ${m.toFixed(3)} K, HadCRUT5 ${mean(observed, 1995, 2014).toFixed(3)} K`);
    expectWithin(m - mean(observed, 1995, 2014), -0.15, 0.15, '1995-2014 model - observed');
  });

  it('2011-2020 mean warming is inside the AR6 assessed 0.95-1.20 K (IPCC AR6 WG1 SPM A.1.2)', () => {
    const m = mean(model, 2011, 2020);
    console.info(`2011-2020: model ${m.toFixed(3)} K, HadCRUT5 ${mean(observed, 2011, 2020).toFixed(3)} K`);
    expectWithin(m, 0.95, 1.2, '2011-2020 model');
  });

  it('decadal-mean RMS difference 1850-2019 is below 0.15 K (common practice, no source: the size of decadal internal variability plus the record\'s early uncertainty)', () => {
    const rms = decadalRms();
    console.info(`decadal RMS 1850-2019: ${rms.toFixed(3)} K`);
    expectWithin(rms, 0, 0.15, 'decadal RMS');
  });
});

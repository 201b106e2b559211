import { calibrate } from '../climate/calibrate.js';
import { representativeParams } from '../ensemble/calibrated-set.js';
import { readCalibratedSet } from '../io/read-calibrated-set.js';
import { loadHistory } from '../io/bundled-pathways.js';
import { loadRecord } from '../io/load-record.js';
import { projectPathway } from '../projection/project-pathway.js';
import type { PublishedCheck, VerificationRow } from './published-check.js';

const SOURCE = 'HadCRUT5 (Morice et al. 2021, JGR 126, e2019JD032361), rebased to 1850-1900';
/** Largest difference of a period mean, K, and largest decadal RMS difference, K (see hadcrut5Fit). */
const PERIOD_TOLERANCE_K = 0.05;
const DECADAL_RMS_K = 0.08;

/**
 * The central run of the bundled history (the calibrated set's posterior-median parameters, as
 * `warmcast run` uses them) against HadCRUT5 (pathways/records/), both relative to 1850-1900, as
 * test/reference/calibrated-posterior.test.ts checks it: the 1995-2014 and 2011-2020 means within
 * 0.05 K and the decadal means 1850-2019 within 0.08 K RMS (warmcast's targets for its central run,
 * issue 13 item 4: tolerances of ours, not published).
 */
export const hadcrut5Fit: PublishedCheck = {
  id: 'hadcrut5-fit',
  run: () => {
    const record = loadRecord('hadcrut5-global-annual.csv');
    const [yearName, anomalyName] = record.names;
    const years = record.columns[yearName];
    const anomaly = record.columns[anomalyName];
    const raw = (y: number) => anomaly[y - years[0]];
    const mean = (f: (y: number) => number, from: number, to: number) => {
      let s = 0;
      for (let y = from; y <= to; y++) s += f(y);
      return s / (to - from + 1);
    };
    const base = mean(raw, 1850, 1900);
    const observed = (y: number) => raw(y) - base;
    const run = centralRun();
    const model = (y: number) => run.columns.warming_k[y - run.years[0]];
    const period = (from: number, to: number): VerificationRow => {
      const o = mean(observed, from, to);
      const m = mean(model, from, to);
      return {
        check: `central run of the history, mean warming ${from}-${to}`,
        source: SOURCE,
        published: `${o.toFixed(3)} K`,
        warmcast: `${m.toFixed(3)} K`,
        tolerance: `±${PERIOD_TOLERANCE_K} K (warmcast target)`,
        pass: Math.abs(m - o) <= PERIOD_TOLERANCE_K,
      };
    };
    let ss = 0;
    let decades = 0;
    for (let d = 1850; d <= 2010; d += 10) {
      ss += (mean(model, d, d + 9) - mean(observed, d, d + 9)) ** 2;
      decades++;
    }
    const rms = Math.sqrt(ss / decades);
    return [
      period(1995, 2014),
      period(2011, 2020),
      {
        check: 'central run of the history, decadal means 1850-2019',
        source: SOURCE,
        published: 'the 17 decadal means',
        warmcast: `RMS difference ${rms.toFixed(3)} K`,
        tolerance: `RMS at most ${DECADAL_RMS_K} K (warmcast target)`,
        pass: rms <= DECADAL_RMS_K,
      },
    ];
  },
};

/** The deterministic run of the bundled history that `warmcast run history` gives: the calibrated set's representative (posterior-median) parameters and forcing scales. */
function centralRun() {
  const { targets, forcingScale } = representativeParams(readCalibratedSet());
  return projectPathway(loadHistory(), { params: calibrate(targets), forcingScale });
}

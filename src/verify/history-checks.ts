import { calibrate } from '../climate/calibrate.js';
import { representativeParams } from '../ensemble/calibrated-set.js';
import { readCalibratedSet } from '../io/read-calibrated-set.js';
import { loadHistory } from '../io/bundled-pathways.js';
import { projectPathway } from '../projection/project-pathway.js';
import { withinRange, type PublishedCheck } from './published-check.js';

function periodMean(years: Float64Array, values: Float64Array, from: number, to: number): number {
  let s = 0;
  for (let y = from; y <= to; y++) s += values[y - years[0]];
  return s / (to - from + 1);
}

/**
 * The central run over the bundled history (posterior-median parameters, as `warmcast run` uses them) against the AR6 assessed observed warming (SPM A.1.2:
 * 2011-2020 1.09 [0.95-1.20] K, 2001-2020 0.99 [0.84-1.10] K relative to 1850-1900) and energy
 * imbalance (ch. 7, 7.2.2: 2006-2018 0.79 [0.52-1.06] W m-2).
 */
export const historyObserved: PublishedCheck = {
  id: 'history-observed',
  run: () => {
    const run = centralRun();
    const w = (from: number, to: number) => periodMean(run.years, run.columns.warming_k, from, to);
    return [
      withinRange('warming 2011-2020 vs 1850-1900, central run of the history', 'IPCC AR6 WG1 SPM A.1.2', '1.09 [0.95-1.20]', w(2011, 2020), 0.95, 1.2, 'K', 3),
      withinRange('warming 2001-2020 vs 1850-1900, central run of the history', 'IPCC AR6 WG1 SPM A.1.2', '0.99 [0.84-1.10]', w(2001, 2020), 0.84, 1.1, 'K', 3),
      withinRange(
        'energy imbalance 2006-2018, central run of the history',
        'IPCC AR6 WG1 ch. 7, 7.2.2',
        '0.79 [0.52-1.06]',
        periodMean(run.years, run.columns.imbalance_wm2, 2006, 2018),
        0.52,
        1.06,
        'W m-2',
        3,
      ),
    ];
  },
};

/** The deterministic run of the bundled history that `warmcast run history` gives: the calibrated set's representative (posterior-median) parameters and forcing scales. */
function centralRun() {
  const { targets, forcingScale } = representativeParams(readCalibratedSet());
  return projectPathway(loadHistory(), { params: calibrate(targets), forcingScale });
}

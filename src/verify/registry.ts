import { attribution2010s } from './attribution-checks.js';
import { calibrationRoundTrip } from './calibration-checks.js';
import { historicalEmissions, joosPulse, tcre, zeroEmissionsCommitment } from './carbon-checks.js';
import { ar6GasForcing2019, doublingForcing } from './forcing-checks.js';
import { erfHistory } from './erf-history-checks.js';
import { hadcrut5Fit } from './hadcrut-checks.js';
import { historyObserved } from './history-checks.js';
import { posteriorRanges } from './posterior-checks.js';
import type { PublishedCheck, VerificationRow } from './published-check.js';
import { twoBoxAnalytic, twoBoxOdex } from './two-box-checks.js';

/**
 * Every published check `warmcast verify` runs, in the order of the table: forcing, the two-box
 * model, calibration, the carbon cycle, the history against the AR6 ERF series, observed warming and HadCRUT5, the calibrated posterior, and warming by agent and species. Adding a check is adding its entry here.
 */
export const PUBLISHED_CHECKS: readonly PublishedCheck[] = [
  ar6GasForcing2019,
  doublingForcing,
  twoBoxAnalytic,
  twoBoxOdex,
  calibrationRoundTrip,
  joosPulse,
  historicalEmissions,
  tcre,
  zeroEmissionsCommitment,
  erfHistory,
  historyObserved,
  hadcrut5Fit,
  posteriorRanges,
  attribution2010s,
];

/**
 * Runs checks and collects their rows, in order. A check that throws gives one failing row saying
 * so (a verification never stops half way).
 *
 * @param checks the checks (default PUBLISHED_CHECKS)
 * @returns the rows
 * @example runPublishedChecks().every((row) => row.pass) // true when warmcast agrees with every published value
 */
export function runPublishedChecks(checks: readonly PublishedCheck[] = PUBLISHED_CHECKS): VerificationRow[] {
  return checks.flatMap((c): VerificationRow[] => {
    try {
      return c.run();
    } catch (e) {
      return [{ check: c.id, source: '', published: '', warmcast: `failed to run: ${(e as Error).message}`, tolerance: '', pass: false }];
    }
  });
}

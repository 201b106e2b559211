import { memberMetrics } from '../ensemble/constrain-metrics.js';
import { readCalibratedSet } from '../io/read-calibrated-set.js';
import { withinRange, type PublishedCheck, type VerificationRow } from './published-check.js';

/** Median of values. */
function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  const h = (s.length - 1) / 2;
  return (s[Math.floor(h)] + s[Math.ceil(h)]) / 2;
}

/**
 * The calibrated set's posterior against the AR6 assessed ranges: the medians of ECS, TCR and TCRE
 * of its members within the likely ranges (ECS 2.5-4 K, SPM A.4.4; TCR 1.4-2.2 K, chapter 7.5, from
 * memory; TCRE 1.0-2.3 K per 1000 Pg C, SPM D.1.1), the median 2005-2014 aerosol ERF within the AR6
 * 5-95 % range of the bundled AR6 series, and the effective sample size of its weights (issue
 * requirement: at least 1,000).
 */
export const posteriorRanges: PublishedCheck = {
  id: 'posterior-ranges',
  run: () => {
    const set = readCalibratedSet();
    const metrics = Array.from({ length: set.count }, (_, i) => memberMetrics(set.members, i));
    const likelihood = set.provenance.likelihood as { aerosol?: { p05: number; p50: number; p95: number } } | undefined;
    const ess = Number(set.provenance.effectiveSampleSize);
    const rows: VerificationRow[] = [
      withinRange('calibrated set: posterior median ECS', 'IPCC AR6 WG1 SPM A.4.4 (likely range)', '3 [2.5-4]', median(metrics.map((m) => m.ecsK)), 2.5, 4, 'K', 2),
      withinRange('calibrated set: posterior median TCR', 'IPCC AR6 WG1 ch. 7.5 (likely range; from memory)', '1.8 [1.4-2.2]', median(metrics.map((m) => m.tcrK)), 1.4, 2.2, 'K', 2),
      withinRange('calibrated set: posterior median TCRE', 'IPCC AR6 WG1 SPM D.1.1 (likely range)', '1.65 [1.0-2.3]', median(metrics.map((m) => m.tcreKPer1000Pgc)), 1.0, 2.3, 'K per 1000 Pg C', 2),
    ];
    const aerosol = likelihood?.aerosol;
    const aerosolPosterior = (set.posterior.aerosolWm2_2005_2014 as number[] | undefined)?.[2];
    if (aerosol && aerosolPosterior !== undefined) {
      rows.push(withinRange('calibrated set: posterior median aerosol ERF 2005-2014', 'IPCC AR6 WG1 Annex III ERF series (Smith et al. 2021), 5-95 %, pathways/records/', `${aerosol.p50.toFixed(2)} [${aerosol.p05.toFixed(2)} to ${aerosol.p95.toFixed(2)}]`, aerosolPosterior, +aerosol.p05.toFixed(2), +aerosol.p95.toFixed(2), 'W m-2', 2));
    }
    rows.push({
      check: 'calibrated set: effective sample size of the weights',
      source: 'issue requirement (common practice: enough distinct members for stable 5-95 % ranges, no source)',
      published: 'at least 1000 of at least 100,000 prior members',
      warmcast: `${ess.toFixed(0)} of ${set.provenance.priorMembers}`,
      tolerance: 'at least 1000',
      pass: ess >= 1000 && Number(set.provenance.priorMembers) >= 100_000,
    });
    return rows;
  },
};

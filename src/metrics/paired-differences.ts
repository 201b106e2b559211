import { quantilesInPlace } from '../numerics/quantiles.js';
import type { WarmingRange } from './compare-pathways.js';

/** Members' yearly warming of one option: year-major (year k of member r at k * members + r). */
export interface MemberWarming {
  /** First year of the rows. */
  firstYear: number;
  /** Members per year. */
  members: number;
  /** Year-major values, K. */
  warmingK: Float64Array;
}

/**
 * Percentiles (5, 17, 50, 83, 95 %; Hyndman & Fan 1996 definition 7) across paired members of one
 * option's warming minus the reference's, year by year over `years`: member i of each option ran
 * with the same sampled parameters (the same seed and member index), so the spread is that of the
 * difference the options make, not of the two ranges side by side (which would double-count the
 * parameter uncertainty they share). NaN for a year either option lacks.
 *
 * @param reference the reference option's members
 * @param other the compared option's members (the same member count)
 * @param years the years wanted (consecutive)
 * @throws RangeError when the member counts differ (a programming error)
 * @example pairedDifferenceRange(a, b, years).p50 // median of (b_i - a_i) per year, K
 */
export function pairedDifferenceRange(reference: MemberWarming, other: MemberWarming, years: Float64Array): WarmingRange & { p50: Float64Array } {
  const m = reference.members;
  if (other.members !== m) throw new RangeError(`paired differences need the same members in both options, not ${m} and ${other.members}`);
  const n = years.length;
  const out = { p05: new Float64Array(n), p17: new Float64Array(n), p50: new Float64Array(n), p83: new Float64Array(n), p95: new Float64Array(n) };
  const diff = new Float64Array(m);
  const q = new Float64Array(5);
  const rows = (w: MemberWarming) => w.warmingK.length / w.members;
  for (let k = 0; k < n; k++) {
    const ka = years[k] - reference.firstYear;
    const kb = years[k] - other.firstYear;
    if (ka < 0 || kb < 0 || ka >= rows(reference) || kb >= rows(other)) {
      q.fill(NaN);
    } else {
      for (let r = 0; r < m; r++) diff[r] = other.warmingK[kb * m + r] - reference.warmingK[ka * m + r];
      quantilesInPlace(diff, [0.05, 0.17, 0.5, 0.83, 0.95], q);
    }
    out.p05[k] = q[0];
    out.p17[k] = q[1];
    out.p50[k] = q[2];
    out.p83[k] = q[3];
    out.p95[k] = q[4];
  }
  return out;
}

import { calibratedMemberSource, priorMemberSource } from '../ensemble/calibrated-set.js';
import type { MemberSource } from '../ensemble/member-parameters.js';
import { readCalibratedSet } from '../io/read-calibrated-set.js';

/**
 * Where the members of `ensemble` and `compare --members` come from: the bundled calibrated set
 * (pathways/calibrated-members.json), or with `prior` the prior it was drawn from, unweighted by the
 * observed record (the unconstrained spread, for comparison).
 *
 * @param prior draw from the prior instead of the calibrated set
 * @throws InputError or ConfigError when the bundled set cannot be read
 * @example memberSource(false).draw(7, 0, 1000).parameters.count // 1000
 */
export function memberSource(prior: boolean): MemberSource {
  const set = readCalibratedSet();
  return prior ? priorMemberSource(set) : calibratedMemberSource(set);
}

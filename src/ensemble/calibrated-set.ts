import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { ConfigError } from '../errors.js';
import { forcingOfDoubling } from '../forcing/co2.js';
import type { CalibrationTargets } from '../climate/calibrate.js';
import { memberGenerators } from './member-generators.js';
import { TWO_BOX_KEYS, type MemberParameters, type MemberSource } from './member-parameters.js';
import { rangeFrom3, samplePrior, type EnsemblePrior, type MemberColumns } from './prior.js';

/** Format line of pathways/calibrated-members.json (scripts/calibrate-ensemble.ts writes it). */
export const CALIBRATED_SET_FORMAT = 'warmcast calibrated member set, version 1';

/** The calibrated parameter set as read from its file. */
export interface CalibratedSet {
  /** Where it was read from (for provenance). */
  file: string;
  /** SHA-256 of the file's bytes, hex. */
  sha256: string;
  /** Members in the set (equal weight). */
  count: number;
  /** One column per parameter key (two-box, `scale_<agent>`, cycle multipliers). */
  members: MemberColumns;
  /** Posterior medians of every parameter: what the deterministic run uses. */
  representative: Record<string, number>;
  /** The prior the set was drawn from, in draw order (for `--prior`). */
  prior: EnsemblePrior;
  /** Provenance as written by the script (data files, prior, likelihood, seed, effective sample size). */
  provenance: Record<string, unknown>;
  /** The script's posterior summary (percentiles of ECS, TCR, TCRE, aerosol ERF), as written. */
  posterior: Record<string, unknown>;
}

/**
 * Checks the parsed JSON of a calibrated set and turns it into typed columns.
 *
 * @param data parsed JSON
 * @param file path, for messages
 * @param sha256 digest of the file's bytes
 * @throws ConfigError naming the file and the key that is wrong
 */
export function calibratedSetFromJson(data: unknown, file: string, sha256: string): CalibratedSet {
  const fail = (what: string) => new ConfigError(`${file}: ${what}; regenerate it with scripts/calibrate-ensemble.ts`, 'members');
  if (typeof data !== 'object' || data === null) throw fail('must hold a JSON object');
  const d = data as Record<string, unknown>;
  if (d.format !== CALIBRATED_SET_FORMAT) throw fail(`format must be "${CALIBRATED_SET_FORMAT}", got ${JSON.stringify(d.format)}`);
  const raw = d.members as Record<string, unknown> | undefined;
  if (typeof raw !== 'object' || raw === null) throw fail('"members" must be an object of arrays');
  const members: Record<string, Float64Array> = {};
  let count = -1;
  for (const [key, values] of Object.entries(raw)) {
    if (!Array.isArray(values) || !values.every((v) => typeof v === 'number' && Number.isFinite(v))) throw fail(`members.${key} must be an array of finite numbers`);
    if (count >= 0 && values.length !== count) throw fail(`members.${key} has ${values.length} values, the others ${count}`);
    count = values.length;
    members[key] = Float64Array.from(values);
  }
  for (const key of TWO_BOX_KEYS) {
    if (!members[key]) throw fail(`members.${key} is missing`);
    if (!members[key].every((v) => v > 0)) throw fail(`members.${key} must be positive`);
  }
  if (count < 1) throw fail('holds no members');
  const representative = d.representative as Record<string, number>;
  if (typeof representative !== 'object' || representative === null || !TWO_BOX_KEYS.every((k) => typeof representative[k] === 'number')) throw fail('"representative" must give every two-box parameter');
  const provenance = (d.provenance ?? {}) as Record<string, unknown>;
  const priorRows = provenance.prior as { key: string; p05: number; p50: number; p95: number; lower: number; source: string }[] | undefined;
  if (!Array.isArray(priorRows)) throw fail('provenance.prior must list the prior quantities');
  const prior: EnsemblePrior = { quantities: priorRows.map((q) => ({ key: q.key, range: rangeFrom3(q.p05, q.p50, q.p95), lower: q.lower, source: q.source })) };
  return { file, sha256, count, members: members as MemberColumns, representative, prior, provenance, posterior: (d.posterior ?? {}) as Record<string, unknown> };
}

/**
 * The members of an ensemble drawn from the calibrated set: member i takes set member
 * floor(u K), u the first 53-bit uniform of member i's own generator (memberGenerators: depends only
 * on (seed, i)), K the set's size. Draws are with replacement, so any number of members (up to a
 * million, in shards) can be drawn, each one of the set's equally weighted members.
 *
 * @param set the calibrated set
 * @returns a MemberSource (member-parameters.ts)
 * @example calibratedMemberSource(set).draw(7, 0, 1000).parameters.count // 1000
 */
export function calibratedMemberSource(set: CalibratedSet): MemberSource {
  const keys = Object.keys(set.members);
  return {
    scheme: `calibrated set ${set.file.split(/[\\/]/).pop()} sha256 ${set.sha256}; member i takes set member floor(u K), u the first uniform of xoroshiro128+ from fmix32(seed, i)`,
    notes: [
      `members drawn with replacement from the ${set.count} equally weighted members of the calibrated set ${describeSet(set)}`,
    ],
    draw(seed, from, to) {
      const count = to - from;
      const values: Record<string, Float64Array> = {};
      for (const key of keys) values[key] = new Float64Array(count);
      const next = memberGenerators(seed, from);
      for (let r = 0; r < count; r++) {
        const j = Math.floor(uniformFloat64(next()) * set.count);
        for (const key of keys) values[key][r] = set.members[key]![j];
      }
      return { parameters: { count, values: values as MemberParameters['values'] }, redraws: 0 };
    },
  };
}

/**
 * Every member of the calibrated set once, in the set's order: member i is set member i, with no
 * seed and no resampling, so what is computed from them does not move with the seed (the default of
 * `warmcast budget`, whose quantiles need every member of a few thousand to sit still).
 *
 * @param set the calibrated set
 * @returns a MemberSource whose draw(seed, from, to) ignores the seed and gives set members from..to - 1
 * @throws ConfigError from draw when `to` is beyond the set's size
 * @example calibratedSetInOrder(set).draw(1, 0, set.count).parameters.values.feedback_wm2k[0] === set.members.feedback_wm2k[0] // true
 */
export function calibratedSetInOrder(set: CalibratedSet): MemberSource {
  const keys = Object.keys(set.members);
  return {
    scheme: `calibrated set ${set.file.split(/[\\/]/).pop()} sha256 ${set.sha256}; member i is set member i, in order`,
    notes: [
      `every one of the ${set.count} equally weighted members of the calibrated set once, in order, no resampling ${describeSet(set)}`,
    ],
    draw(_seed, from, to) {
      if (!(from >= 0 && to <= set.count && from <= to)) throw new ConfigError(`the calibrated set has ${set.count} members: members ${from} to ${to - 1} cannot be taken in order`, 'members');
      const values: Record<string, Float64Array> = {};
      for (const key of keys) values[key] = set.members[key]!.slice(from, to);
      return { parameters: { count: to - from, values: values as MemberParameters['values'] }, redraws: 0 };
    },
  };
}

/** The set's file, digest and what it is, for the notes of a member source. */
function describeSet(set: CalibratedSet): string {
  return `(${set.file.split(/[\\/]/).pop()}, sha256 ${set.sha256.slice(0, 12)}…): a prior over the two-box physics, per-agent forcing scales and carbon-cycle multipliers, weighted by HadCRUT5 warming, AR6 ocean heat content, cumulative CO2 emissions and the AR6 aerosol ERF`;
}

/**
 * The members of an unconstrained ensemble: drawn from the prior the calibrated set was made from
 * (`--prior`), member i from its own generator as in the calibration script.
 */
export function priorMemberSource(set: CalibratedSet): MemberSource {
  return {
    scheme: `prior of calibrated set sha256 ${set.sha256}; member i drawn from xoroshiro128+ from fmix32(seed, i)`,
    notes: ['members drawn from the prior of the calibrated set, not weighted by the record: the unconstrained spread, for comparison'],
    draw(seed, from, to) {
      const values = samplePrior(seed, to - from, set.prior, from);
      return { parameters: { count: to - from, values }, redraws: 0 };
    },
  };
}

/**
 * The deterministic run's parameters: the posterior median of each physical parameter (lambda, C,
 * C_d, gamma, epsilon; the CO2 forcing scale as F2x = scale_co2 x the formula's 2xCO2 ERF), as
 * calibration inputs that explicit options override, and the median multiplier of every other
 * forcing agent.
 *
 * @param set the calibrated set
 * @returns calibration inputs and the forcing multipliers by agent
 */
export function representativeParams(set: CalibratedSet): { targets: CalibrationTargets; forcingScale: Record<string, number> } {
  const r = set.representative;
  const forcingScale: Record<string, number> = {};
  for (const [key, value] of Object.entries(r)) if (key.startsWith('scale_') && key !== 'scale_co2') forcingScale[key.slice('scale_'.length)] = value;
  return {
    targets: {
      feedbackWm2K: r.feedback_wm2k,
      upperHeatCapacity: r.upper_heat_capacity,
      deepHeatCapacity: r.deep_heat_capacity,
      exchangeWm2K: r.exchange_wm2k,
      deepEfficacy: r.deep_efficacy,
      forcing2xWm2: (r.scale_co2 ?? 1) * forcingOfDoubling('ar6'),
    },
    forcingScale,
  };
}

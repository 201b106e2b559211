import { ConfigError } from '../errors.js';
import { FORCING_AGENTS, type ForcingSeries } from '../forcing/agents.js';
import type { Co2Formula } from '../forcing/co2.js';
import { ar6Members } from './ar6-members.js';
import type { EnsembleConfig, EnsembleMembers } from './ensemble-members.js';
import type { MemberSource } from './member-parameters.js';
import { runMembers, type MemberCarbonTask, type MemberTask } from './run-members.js';
import { AR6_SAMPLING, type EnsembleSampling } from './sampling.js';
import { summarizeEnsemble, type EnsembleResult } from './summarize-ensemble.js';

/** The forcing an ensemble perturbs: one pathway's annual ERF by agent. */
export interface EnsembleInput {
  /** Consecutive integer years. */
  years: Float64Array;
  /**
   * ERF by agent, W m-2, as forcingByAgent gives it for a concentration-driven pathway with the
   * formula's own 2xCO2 forcing and every agent as given (members scale them).
   */
  forcing: ForcingSeries;
  /** CO2 formula the CO2 agent was computed with (default ar6). */
  co2Formula?: Co2Formula;
  /**
   * Emission-driven pathways: the CO2 drivers of each member's own carbon cycle (history
   * concentrations, emissions, central CH4 and N2O). Members then compute their CO2, CH4 and N2O
   * forcing themselves; `forcing`'s values for those agents are not used.
   */
  carbon?: MemberCarbonTask;
}

/** Options of {@link runEnsemble}. */
export interface EnsembleOptions {
  /** Members of the whole ensemble. */
  members: number;
  /** Random seed, integer in [0, 2^32). */
  seed: number;
  /** Where the members come from (default: the AR6-range sampling of `sampling`). */
  source?: MemberSource;
  /** Ranges of the default AR6-range member source (default AR6_SAMPLING); ignored with `source`. */
  sampling?: EnsembleSampling;
  /** Warming levels, K, for exceedance probabilities and crossing years (default 1.5, 2 and 3). */
  thresholds?: number[];
  /** Baseline period, inclusive years (default 1850-1900, the IPCC AR6 reference for warming levels). */
  baseline?: readonly [number, number];
  /** Run only the index-th (1-based) of `count` equal slices of the members. */
  shard?: { index: number; count: number };
  /** Called as the run goes, with the member-equivalents done and the members of this call. */
  onProgress?: (done: number, total: number) => void;
  /** Years at which to report crossing probabilities (default 2050 and 2100). */
  milestones?: number[];
  /** Keep every member's yearly warming in the result's `members` (always kept for a shard). */
  keepMembers?: boolean;
}

/**
 * Runs a parameter ensemble for one pathway: draws the members from `source` (by default the
 * AR6-range sampling, see ar6-members.ts), runs them all together year by year with the one two-box
 * step (run-members.ts), rebases each member on its own baseline mean, and summarises the warming
 * per year (percentiles, probabilities of exceeding each threshold on 20-year means) and per
 * threshold (crossing probabilities by the milestones, median crossing year). With `shard`, only
 * that slice of the members runs, drawn exactly as in a whole run; its `members` can be written
 * with shardToJson and merged later into exactly what one run gives.
 *
 * @param input years and forcing by agent of the pathway
 * @param options members, seed, source, thresholds, baseline, and optional shard, progress, milestones
 * @returns the statistics, and the raw members when kept
 * @throws ConfigError for invalid options (members, seed, thresholds, baseline, shard, sampling)
 * @example
 * const result = await runEnsemble({ years, forcing }, { members: 2000, seed: 7, thresholds: [1.5, 2, 3], baseline: [1850, 1900] });
 * result.percentiles.p50 // median warming per year, K
 */
export async function runEnsemble(input: EnsembleInput, options: EnsembleOptions): Promise<EnsembleResult> {
  const co2Formula = input.co2Formula ?? 'ar6';
  const source = options.source ?? ar6Members(options.sampling ?? AR6_SAMPLING, co2Formula, input.carbon !== undefined);
  const config = ensembleConfig(input, options, source);
  const { from, to } = shardRange(config.membersTotal, options.shard);
  const { parameters, redraws } = source.draw(config.seed, from, to);
  const task: MemberTask = { co2Formula, forcing: input.forcing.byAgent, ...(input.carbon ? { carbon: input.carbon } : {}) };
  const warmingK = runMembers(task, parameters, options.onProgress && ((done) => options.onProgress!(done, to - from)));
  rebaseMembersInPlace(warmingK, to - from, config.baseline[0] - config.firstYear, config.baseline[1] - config.firstYear);
  const members: EnsembleMembers = {
    config,
    shard: options.shard ? { index: options.shard.index, count: options.shard.count } : undefined,
    memberStart: from,
    memberCount: to - from,
    warmingK,
    parameters,
    redraws,
  };
  const result = summarizeEnsemble(members);
  if (options.keepMembers === true || options.shard !== undefined) return result;
  const { members: _kept, ...statistics } = result;
  return statistics;
}

/**
 * Subtracts from each member's values its mean over the baseline years (summed in year order, as
 * `rebase` in src/projection does for a single run).
 *
 * @param warmingK year-major member values (year k of member r at k * m + r), changed in place
 * @param m members
 * @param from first baseline year index
 * @param to last baseline year index (inclusive)
 */
export function rebaseMembersInPlace(warmingK: Float64Array, m: number, from: number, to: number): void {
  const mean = new Float64Array(m);
  for (let k = from; k <= to; k++) for (let r = 0; r < m; r++) mean[r] += warmingK[k * m + r];
  for (let r = 0; r < m; r++) mean[r] /= to - from + 1;
  for (let k = 0; k * m < warmingK.length; k++) for (let r = 0; r < m; r++) warmingK[k * m + r] -= mean[r];
}

/**
 * The members [from, to) of the index-th of `count` slices: from = floor((index - 1) M / count),
 * to = floor(index M / count), so the slices are equal to within one member and cover 0..M-1.
 * @example shardRange(10, { index: 2, count: 3 }) // { from: 3, to: 6 }
 */
export function shardRange(members: number, shard?: { index: number; count: number }): { from: number; to: number } {
  if (!shard) return { from: 0, to: members };
  return { from: Math.floor(((shard.index - 1) * members) / shard.count), to: Math.floor((shard.index * members) / shard.count) };
}

function ensembleConfig(input: EnsembleInput, options: EnsembleOptions, source: MemberSource): EnsembleConfig {
  const { members, seed, shard } = options;
  const thresholds = options.thresholds ?? [1.5, 2, 3];
  const baseline = options.baseline ?? [1850, 1900];
  const milestones = options.milestones ?? [2050, 2100];
  if (!(Number.isInteger(members) && members >= 1)) throw new ConfigError(`members must be a whole number of at least 1, got ${members}`, 'members');
  if (!(Number.isInteger(seed) && seed >= 0 && seed < 2 ** 32)) throw new ConfigError(`seed must be a whole number from 0 to 4294967295, got ${seed}`, 'seed');
  if (!(Array.isArray(thresholds) && thresholds.every((t) => Number.isFinite(t)))) throw new ConfigError(`thresholds must be finite numbers (K), got ${thresholds}`, 'thresholds');
  if (new Set(thresholds).size !== thresholds.length) throw new ConfigError(`thresholds must not repeat, got ${thresholds.join(', ')}`, 'thresholds');
  if (!milestones.every((y) => Number.isInteger(y))) throw new ConfigError(`milestones must be whole years, got ${milestones.join(', ')}`, 'milestones');
  if (shard !== undefined) {
    const { index, count } = shard;
    if (!(Number.isInteger(count) && count >= 1 && count <= members)) {
      throw new ConfigError(`shard count must be a whole number from 1 to the number of members (${members}), got ${count}`, 'shard');
    }
    if (!(Number.isInteger(index) && index >= 1 && index <= count)) throw new ConfigError(`shard index must be a whole number from 1 to ${count}, got ${index}`, 'shard');
  }

  const years = input.years;
  const n = years.length;
  for (let k = 1; k < n; k++) {
    if (years[k] !== years[0] + k) throw new ConfigError(`ensemble years must be consecutive whole years; year ${years[k]} follows ${years[k - 1]}`, 'years');
  }
  for (const [agent, series] of Object.entries(input.forcing.byAgent)) {
    if (series.length !== n) throw new ConfigError(`forcing of ${agent} must have one value per year (${n}), got ${series.length}`, 'forcing');
  }
  const [from, to] = baseline;
  if (!(Number.isInteger(from) && Number.isInteger(to) && from <= to && from >= years[0] && to <= years[n - 1])) {
    throw new ConfigError(`baseline ${from}-${to} must lie within the run's years ${years[0]}-${years[n - 1]}`, 'baseline');
  }
  const c = input.carbon;
  if (c) {
    const perYear = { ...c.co2, ch4Ppb: c.ch4Ppb, n2oPpb: c.n2oPpb };
    for (const [name, series] of Object.entries(perYear)) {
      if (typeof series !== 'number' && series.length !== n) throw new ConfigError(`carbon input ${name} must have one value per year (${n}), got ${series.length}`, 'carbon');
    }
  }
  const a = input.forcing.byAgent;
  const carbonSeries = c ? [c.co2.givenPpm, c.co2.increaseGtc, c.co2.emissionGtc, Float64Array.of(c.co2.startPpm), c.ch4Ppb, c.n2oPpb] : [];
  return {
    scheme: source.scheme,
    sourceNotes: [...source.notes],
    seed,
    membersTotal: members,
    firstYear: years[0],
    yearCount: n,
    baseline: [from, to],
    thresholds: [...thresholds],
    milestones: [...milestones],
    co2Formula: input.co2Formula ?? 'ar6',
    emissionDriven: c !== undefined,
    inputChecksum: checksum([...FORCING_AGENTS.map((agent) => a[agent]), ...carbonSeries]),
  };
}

/**
 * Two 32-bit hashes in the manner of FNV-1a (Fowler, Noll & Vo; the second with a different odd
 * multiplier) over the little-endian bytes of the series, as 16 hex digits. A guard against merging
 * shards of different pathways, not a cryptographic digest.
 */
function checksum(series: Float64Array[]): string {
  const view = new DataView(new ArrayBuffer(8));
  let h1 = 0x811c9dc5;
  let h2 = 0x811c9dc5;
  for (const s of series) {
    for (let i = 0; i < s.length; i++) {
      view.setFloat64(0, s[i], true);
      for (let b = 0; b < 8; b++) {
        const byte = view.getUint8(b);
        h1 = Math.imul(h1 ^ byte, 0x01000193);
        h2 = Math.imul(h2 ^ byte, 0x5bd1e995);
      }
    }
  }
  return `${(h1 >>> 0).toString(16).padStart(8, '0')}${(h2 >>> 0).toString(16).padStart(8, '0')}`;
}

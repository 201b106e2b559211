import { ConfigError } from '../errors.js';
import { AEROSOL_AGENTS, FORCING_AGENTS, type ForcingSeries } from '../forcing/agents.js';
import type { Co2Formula } from '../forcing/co2.js';
import type { EnsembleConfig, EnsembleMemberParameters } from './ensemble-members.js';
import { MEMBER_STREAM_SCHEME } from './member-generators.js';
import { defaultWorkerCount, runMembersParallel, type EnsembleThreads } from './run-members-parallel.js';
import type { MemberCarbonTask } from './run-emission-members.js';
import type { MemberTask } from './run-members.js';
import { AR6_SAMPLING, validateSampling, type EnsembleSampling } from './sampling.js';
import { summarizeEnsemble, type EnsembleResult } from './summarize-ensemble.js';

/** The forcing an ensemble perturbs: one pathway's annual ERF by agent. */
export interface EnsembleInput {
  /** Consecutive integer years. */
  years: Float64Array;
  /**
   * ERF by agent, W m-2, as forcingByAgent gives it for a concentration-driven pathway with the
   * formula's own 2xCO2 forcing and the aerosol series as given (no scaling options).
   */
  forcing: ForcingSeries;
  /** CO2 formula the CO2 agent was computed with (default ar6). */
  co2Formula?: Co2Formula;
  /**
   * Emission-driven pathways: the CO2 drivers of each member's own carbon cycle (history
   * concentrations, emissions, central CH4 and N2O). Members then draw a carbon-cycle multiplier
   * and compute their CO2, CH4 and N2O forcing themselves; `forcing`'s CO2 agent is not used.
   */
  carbon?: MemberCarbonTask;
}

/** Options of {@link runEnsemble}. */
export interface EnsembleOptions {
  /** Members of the whole ensemble. */
  members: number;
  /** Random seed, integer in [0, 2^32). */
  seed: number;
  /** Warming levels, K, for exceedance probabilities and crossing years (default 1.5, 2 and 3). */
  thresholds?: number[];
  /** Baseline period, inclusive years (default 1850-1900, the IPCC AR6 reference for warming levels). */
  baseline?: readonly [number, number];
  /** Run only the index-th (1-based) of `count` equal slices of the members. */
  shard?: { index: number; count: number };
  /**
   * Threads, this one included; default one per core for large runs, 1 for small ones (or every
   * thread of `threads`). The output does not depend on it.
   */
  workers?: number;
  /** Threads started beforehand with startEnsembleThreads, shared by several runs (the run uses at most its size). */
  threads?: EnsembleThreads;
  /** Called as members finish, with the number done and the number this call runs. */
  onProgress?: (done: number, total: number) => void;
  /** Parameter distributions (default AR6_SAMPLING). */
  sampling?: EnsembleSampling;
  /** Years at which to report crossing probabilities (default 2050 and 2100). */
  milestones?: number[];
  /**
   * Keep every member's yearly warming in the result's `members` (8 bytes per member-year; always
   * kept for a shard). Without it the members run as a stream of year blocks and only their
   * statistics and parameters are returned.
   */
  keepMembers?: boolean;
}

/** Version of the draw layout (see drawMember). */
const DRAW_LAYOUT = 'draws in turn: ECS, 2xCO2 ERF, aerosol, TCR given ECS, each redrawn alone until physical; v1';
/** What emission-driven members draw after the climate quantities. */
const CARBON_DRAW_LAYOUT = 'then the carbon-cycle iIRF100 multiplier, redrawn alone until positive; annual carbon step v1';

/**
 * Runs a parameter ensemble for one pathway: samples each member's ECS, TCR, 2xCO2 forcing and
 * aerosol scaling (AR6-matched by default, see AR6_SAMPLING), runs every member with the exact
 * two-box propagator, and summarises the warming per year (percentiles, probabilities of exceeding
 * each threshold on 20-year means) and per threshold (crossing probabilities by the milestones,
 * median crossing year). With `shard`, only that slice of the members runs, drawn from the same
 * streams as in a whole run; its `members` can be written with shardToJson and merged later.
 *
 * @param input years and forcing by agent of the pathway
 * @param options members, seed, thresholds, baseline, and optional shard, workers, progress, sampling
 * @returns the statistics and the raw members
 * @throws ConfigError for invalid options (members, seed, thresholds, baseline, shard, sampling)
 * @example
 * const result = await runEnsemble({ years, forcing }, { members: 2000, seed: 7, thresholds: [1.5, 2, 3], baseline: [1850, 1900] });
 * result.percentiles.p50 // median warming per year, K
 */
export async function runEnsemble(input: EnsembleInput, options: EnsembleOptions): Promise<EnsembleResult> {
  const sampling = options.sampling ?? AR6_SAMPLING;
  const config = ensembleConfig(input, options, sampling);
  const { from, to } = shardRange(config.membersTotal, options.shard);
  const task = memberTask(input, config);
  const n = input.years.length;
  const workers = options.workers ?? options.threads?.size ?? defaultWorkerCount((to - from) * n, input.carbon !== undefined);
  const keep = options.keepMembers === true || options.shard !== undefined;
  const run = await runMembersParallel(task, from, to, workers, config.thresholds, options.onProgress, options.threads, keep);
  const members: EnsembleMemberParameters = {
    config,
    shard: options.shard ? { index: options.shard.index, count: options.shard.count } : undefined,
    memberStart: from,
    memberCount: to - from,
    ...(run.warmingK ? { warmingK: run.warmingK } : {}),
    parameters: run.parameters,
    peaks: run.peaks,
    redraws: run.redraws,
  };
  return summarizeEnsemble(members, run.workersUsed, run.statistics);
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

function ensembleConfig(input: EnsembleInput, options: EnsembleOptions, sampling: EnsembleSampling): EnsembleConfig {
  const { members, seed, shard, workers } = options;
  const thresholds = options.thresholds ?? [1.5, 2, 3];
  const baseline = options.baseline ?? [1850, 1900];
  const milestones = options.milestones ?? [2050, 2100];
  if (!(Number.isInteger(members) && members >= 1)) throw new ConfigError(`members must be a whole number of at least 1, got ${members}`, 'members');
  if (!(Number.isInteger(seed) && seed >= 0 && seed < 2 ** 32)) throw new ConfigError(`seed must be a whole number from 0 to 4294967295, got ${seed}`, 'seed');
  if (!(Array.isArray(thresholds) && thresholds.every((t) => Number.isFinite(t)))) throw new ConfigError(`thresholds must be finite numbers (K), got ${thresholds}`, 'thresholds');
  if (new Set(thresholds).size !== thresholds.length) throw new ConfigError(`thresholds must not repeat, got ${thresholds.join(', ')}`, 'thresholds');
  if (!milestones.every((y) => Number.isInteger(y))) throw new ConfigError(`milestones must be whole years, got ${milestones.join(', ')}`, 'milestones');
  if (workers !== undefined && !(Number.isInteger(workers) && workers >= 1)) throw new ConfigError(`workers must be a whole number of at least 1, got ${workers}`, 'workers');
  if (shard !== undefined) {
    const { index, count } = shard;
    if (!(Number.isInteger(count) && count >= 1 && count <= members)) {
      throw new ConfigError(`shard count must be a whole number from 1 to the number of members (${members}), got ${count}`, 'shard');
    }
    if (!(Number.isInteger(index) && index >= 1 && index <= count)) throw new ConfigError(`shard index must be a whole number from 1 to ${count}, got ${index}`, 'shard');
  }
  validateSampling(sampling);

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
    for (const [name, series] of Object.entries(c)) {
      if (typeof series !== 'number' && series.length !== n) throw new ConfigError(`carbon input ${name} must have one value per year (${n}), got ${series.length}`, 'carbon');
    }
  }
  const a = input.forcing.byAgent;
  const carbonSeries = c ? [c.co2Ppm, c.co2EmissionGtcPerYr, Float64Array.of(c.co2StartPpm), c.ch4Ppb, c.n2oPpb] : [];
  return {
    scheme: c ? `${MEMBER_STREAM_SCHEME}; ${DRAW_LAYOUT}; ${CARBON_DRAW_LAYOUT}` : `${MEMBER_STREAM_SCHEME}; ${DRAW_LAYOUT}`,
    seed,
    membersTotal: members,
    firstYear: years[0],
    yearCount: n,
    baseline: [from, to],
    thresholds: [...thresholds],
    milestones: [...milestones],
    co2Formula: input.co2Formula ?? 'ar6',
    sampling,
    emissionDriven: c !== undefined,
    inputChecksum: checksum([...FORCING_AGENTS.map((agent) => a[agent]), ...carbonSeries]),
  };
}

function memberTask(input: EnsembleInput, config: EnsembleConfig): MemberTask {
  const a = input.forcing.byAgent;
  const n = config.yearCount;
  const otherWm2 = new Float64Array(n);
  const aerosolWm2 = new Float64Array(n);
  // Emission-driven members compute their own CO2, CH4 and N2O forcing; members scale CO2 and the aerosols.
  const unscaled = FORCING_AGENTS.filter((agent) => agent !== 'co2' && !(AEROSOL_AGENTS as readonly string[]).includes(agent)
    && !(input.carbon && (agent === 'ch4' || agent === 'n2o')));
  for (let k = 0; k < n; k++) {
    let sum = 0;
    for (const agent of unscaled) sum += a[agent][k];
    otherWm2[k] = sum;
    aerosolWm2[k] = a.aerosol_ari[k] + a.aerosol_aci[k];
  }
  return {
    seed: config.seed,
    sampling: config.sampling,
    co2Formula: config.co2Formula,
    co2Wm2: Float64Array.from(a.co2),
    aerosolWm2,
    otherWm2,
    baselineFrom: config.baseline[0] - config.firstYear,
    baselineTo: config.baseline[1] - config.firstYear,
    ...(input.carbon ? { carbon: input.carbon } : {}),
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

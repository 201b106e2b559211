import { ConfigError } from '../errors.js';
import { quantilesInPlace } from '../numerics/quantiles.js';
import { memberSensitivities } from './member-sensitivities.js';
import { emptyMemberPeaks, memberPeaksInto, type MemberPeaks } from './member-peaks.js';
import type { EnsembleConfig, EnsembleMemberParameters, EnsembleMembers } from './ensemble-members.js';
import { RUNNING_MEAN_WINDOW } from './running-mean.js';

/** The percentiles every ensemble reports, as probabilities, and their names. */
export const PERCENTILES = [0.05, 0.17, 0.5, 0.83, 0.95] as const;
export const PERCENTILE_NAMES = ['p05', 'p17', 'p50', 'p83', 'p95'] as const;
export type PercentileName = (typeof PERCENTILE_NAMES)[number];

/** When the ensemble crosses one warming level. */
export interface ThresholdCrossing {
  /** Warming level, K above the baseline. */
  thresholdK: number;
  /**
   * Share of members whose 20-year mean has exceeded the level by each milestone year; null when
   * the run does not cover the 20-year window around that year.
   */
  byMilestone: { year: number; probability: number | null }[];
  /** First year by which at least half of the members have crossed; null if fewer than half cross within the run. */
  medianYear: number | null;
  /** Share of members that cross at all within the run. */
  probabilityWithinRun: number;
  /**
   * Share of members already above the level in the first complete 20-year window of the run (their
   * crossing year is that window's labelled year, but they may have been above before it). When it
   * is at least one half, `medianYear` is that first labelled year and says only "at the start".
   */
  aboveAtStart: number;
  /**
   * The last year with a complete 20-year window in the run (the run's end less 10 years) and the
   * share of members that have crossed by then: what can be said for a milestone the run does not
   * cover (a run ending in 2100 covers crossings up to 2090).
   */
  byLastWindow: { year: number; probability: number };
}

/** Summary quantiles of one sampled parameter across members. */
export type ParameterSummary = Record<PercentileName, number> & { mean: number };

/**
 * The members' own peaks across the ensemble: not the peak of the median line, but the percentiles
 * of every member's highest annual warming and of the year it comes in.
 */
export interface PeakSummary {
  /** Percentiles across members of each member's peak warming, K relative to the baseline. */
  warmingK: Record<PercentileName, number>;
  /**
   * Percentiles across members of each member's peak year by the inverse empirical distribution
   * (Hyndman & Fan 1996 definition 1), so each is a year some member peaks in.
   */
  year: Record<PercentileName, number>;
  /** Share of members whose peak is the run's last year: still rising (or flat) at the end (0-1). */
  stillRising: number;
}

/** The statistics of an ensemble (or of one shard of it), per year and overall. */
export interface EnsembleResult {
  /** Annual grid. */
  years: Float64Array;
  /** The definition of the ensemble. */
  config: EnsembleConfig;
  /** Members summarised here (all of them unless this is a shard). */
  memberCount: number;
  /** The shard these members are, if not the whole ensemble. */
  shard?: { index: number; count: number };
  /** Warming percentiles per year, K relative to the baseline: p05 .. p95. */
  percentiles: Record<PercentileName, Float64Array>;
  /**
   * Per threshold (in config order): share of members whose 20-year mean warming around each year
   * exceeds the threshold; NaN where the 20-year window leaves the run.
   */
  probAbove: Float64Array[];
  /**
   * Per threshold (in config order): share of members that have crossed it by each year, each member
   * counting from the labelled year of its first 20-year mean above the level (so the share never
   * falls); NaN where the 20-year window leaves the run. The figure the headlines quote.
   */
  crossedBy: Float64Array[];
  /** Per threshold: crossing probabilities by milestone years and the median crossing year. */
  crossings: ThresholdCrossing[];
  /** Unphysical draws discarded (redrawn) while sampling these members. */
  redraws: number;
  /** Quantiles and mean of each member parameter, by key (MemberParameters.values). */
  parameters: Record<string, ParameterSummary>;
  /** Pearson correlation of the members' ECS and TCR. */
  ecsTcrCorrelation: number;
  /** Percentiles of the members' own peak warming and peak year, and the share still rising at the end. */
  peak: PeakSummary;
  /** How the numbers were made, one sentence each, for the provenance of an output. */
  notes: string[];
  /**
   * The raw members with every member's yearly warming (to write a shard file, or for further
   * statistics); only when they were kept (runEnsemble with keepMembers or a shard, or merged shards).
   */
  members?: EnsembleMembers;
  /** Each member's parameters and peak (and which members these are). */
  memberParameters: EnsembleMemberParameters & { peaks: MemberPeaks };
  /** Threads that ran the members (1 when run in the calling thread, or for merged shards). */
  workersUsed: number;
}

/** The parts of a summary that scan every member-year: {@link yearPercentilesInto} and {@link exceedanceCountsInto}. */
export interface MemberStatistics {
  /** The five percentiles (PERCENTILES order), each one value per year. */
  percentiles: Float64Array[];
  /** From exceedanceCountsInto over all members. */
  counts: Float64Array;
}

/**
 * Computes an ensemble's statistics from its members: per year the warming percentiles (one
 * selection per year over the members, Hyndman & Fan 1996 definition 7) and the share of members
 * whose 20-year mean exceeds each threshold; per threshold the probability of having crossed by
 * each milestone year and the median crossing year; the spread of the parameters and of the members'
 * own peaks (taken from `members.peaks`, else found in their yearly warming). A deterministic
 * function of the members in order, so merged shards give exactly what one run gives.
 *
 * @param members raw members of a run or of merged shards
 * @param workersUsed recorded in the result (default 1)
 * @param statistics the member-year scans if already done (by worker threads); computed here otherwise
 * @example summarizeEnsemble(members).percentiles.p50 // median warming per year, K
 */
export function summarizeEnsemble(members: EnsembleMembers | EnsembleMemberParameters, workersUsed = 1, statistics?: MemberStatistics): EnsembleResult {
  const warmingK = 'warmingK' in members ? members.warmingK : undefined;
  const { config, memberCount: m } = members;
  const n = config.yearCount;
  const thresholds = config.thresholds;
  const years = Float64Array.from({ length: n }, (_, k) => config.firstYear + k);
  let stats = statistics;
  if (!stats) {
    if (!warmingK) throw new ConfigError('summarizeEnsemble needs the members\' yearly warming (run with keepMembers) or their statistics', 'members');
    stats = { percentiles: PERCENTILES.map(() => new Float64Array(n)), counts: new Float64Array(exceedanceCountsLength(thresholds.length, n)) };
    yearPercentilesInto(warmingK, m, 0, n, stats.percentiles);
    exceedanceCountsInto(warmingK, m, n, thresholds, stats.counts);
  }
  const percentiles = Object.fromEntries(PERCENTILE_NAMES.map((name, j) => [name, stats.percentiles[j]])) as Record<PercentileName, Float64Array>;
  let peaks = members.peaks;
  if (!peaks) {
    if (!warmingK) throw new ConfigError('summarizeEnsemble needs the members\' yearly warming or their peaks', 'members');
    peaks = emptyMemberPeaks(m);
    memberPeaksInto(warmingK, m, n, 0, m, peaks);
  }

  const first = RUNNING_MEAN_WINDOW.before;
  const last = n - 1 - RUNNING_MEAN_WINDOW.after;
  const probAbove = thresholds.map((_, j) => {
    const p = new Float64Array(n).fill(NaN);
    for (let k = first; k <= last; k++) p[k] = stats.counts[j * n + k] / m;
    return p;
  });
  const crossedBy: Float64Array[] = [];
  const crossings = thresholds.map((thresholdK, j): ThresholdCrossing => {
    const crossedAt = stats.counts.subarray((thresholds.length + j) * n, (thresholds.length + j + 1) * n);
    const cumulative = new Float64Array(n);
    const share = new Float64Array(n).fill(NaN);
    let total = 0;
    for (let k = first; k <= last; k++) {
      cumulative[k] = total += crossedAt[k];
      share[k] = cumulative[k] / m;
    }
    crossedBy.push(share);
    let medianYear: number | null = null;
    for (let k = first; k <= last; k++) {
      if (2 * cumulative[k] >= m) {
        medianYear = years[k];
        break;
      }
    }
    const byMilestone = config.milestones.map((year) => {
      const k = year - config.firstYear;
      return { year, probability: k >= first && k <= last ? cumulative[k] / m : null };
    });
    return {
      thresholdK,
      byMilestone,
      medianYear,
      probabilityWithinRun: total / m,
      aboveAtStart: first <= last ? crossedAt[first] / m : 0,
      byLastWindow: { year: years[Math.max(first, last)], probability: total / m },
    };
  });

  const { ecs_k: ecs, tcr_k: tcr } = memberSensitivities(members.parameters, config.co2Formula);
  const parameters: Record<string, ParameterSummary> = { ecs_k: summarizeValues(ecs), tcr_k: summarizeValues(tcr) };
  for (const [key, values] of Object.entries(members.parameters.values)) if (values) parameters[key] = summarizeValues(values);

  return {
    years,
    config,
    memberCount: m,
    shard: members.shard,
    percentiles,
    probAbove,
    crossedBy,
    crossings,
    redraws: members.redraws,
    parameters,
    ecsTcrCorrelation: pearson(ecs, tcr),
    peak: summarizePeaks(peaks, config.firstYear, n),
    notes: ensembleNotes(members),
    ...(warmingK ? { members: { ...members, warmingK, peaks } } : {}),
    memberParameters: { ...members, peaks },
    workersUsed,
  };
}

/**
 * Warming percentiles (PERCENTILES) of years [yearFrom, yearTo) across all m members: each year's
 * row of member values copied and its percentiles found by quickselect (quantilesInPlace).
 *
 * @param warmingK year-major member values (year k of member r at k * m + r)
 * @param m members
 * @param yearFrom first year index
 * @param yearTo end year index, exclusive
 * @param out one array per percentile, indexed by year
 */
export function yearPercentilesInto(warmingK: Float64Array, m: number, yearFrom: number, yearTo: number, out: Float64Array[]): void {
  const row = new Float64Array(m);
  const q = new Float64Array(PERCENTILES.length);
  for (let k = yearFrom; k < yearTo; k++) {
    row.set(warmingK.subarray(k * m, (k + 1) * m));
    quantilesInPlace(row, PERCENTILES, q);
    for (let j = 0; j < out.length; j++) out[j][k] = q[j];
  }
}

/** Length of the counts array of {@link exceedanceCountsInto}. */
export function exceedanceCountsLength(thresholds: number, n: number): number {
  return 2 * thresholds * n;
}

/**
 * Adds, for every member, whether its 20-year mean warming around each year exceeds each threshold
 * (counts[j * n + c], the members above threshold j in year c) and the year its 20-year mean first
 * exceeds it (counts[(T + j) * n + c], the members first above in year c), T thresholds. The 20-year
 * mean of years c-9 .. c+10 stands for year c (IPCC AR6 WG1 convention for reaching a warming
 * level); each member's 20-year sum slides along the years, all members of a year at a time. Years
 * whose window leaves the run get nothing. Counts are whole numbers, so those of merged shards add
 * up to exactly what one run gives.
 *
 * @param warmingK year-major member values (year k of member r at k * m + r)
 * @param m members
 * @param n years
 * @param thresholds levels, K
 * @param counts receives the counts (added to; length exceedanceCountsLength)
 */
export function exceedanceCountsInto(warmingK: Float64Array, m: number, n: number, thresholds: readonly number[], counts: Float64Array): void {
  const { before, after } = RUNNING_MEAN_WINDOW;
  const width = before + after + 1;
  if (n < width) return;
  const t = thresholds.length;
  const sum = new Float64Array(m);
  const mean = new Float64Array(m);
  const crossed = thresholds.map(() => new Uint8Array(m));
  for (let k = 0; k < width; k++) for (let r = 0; r < m; r++) sum[r] += warmingK[k * m + r];
  for (let c = before; c + after < n; c++) {
    if (c > before) {
      const enter = (c + after) * m;
      const leave = (c - before - 1) * m;
      for (let r = 0; r < m; r++) sum[r] += warmingK[enter + r] - warmingK[leave + r];
    }
    for (let r = 0; r < m; r++) mean[r] = sum[r] / width;
    for (let j = 0; j < t; j++) {
      const level = thresholds[j];
      const first = crossed[j];
      let above = 0;
      let firsts = 0;
      for (let r = 0; r < m; r++) {
        if (mean[r] > level) {
          above++;
          if (first[r] === 0) {
            first[r] = 1;
            firsts++;
          }
        }
      }
      counts[j * n + c] += above;
      counts[(t + j) * n + c] += firsts;
    }
  }
}

/**
 * Ensembles smaller than this get a warning that their ranges and probabilities are rough (a rule of
 * thumb: common practice, no source).
 */
export const FEW_MEMBERS = 100;

/**
 * The warning for an ensemble of fewer than {@link FEW_MEMBERS} members, with the sampling error of
 * a probability near 50 % (the binomial standard error 0.5 / sqrt(n); common practice, no source);
 * undefined for larger ensembles.
 * @example fewMembersWarning(25) // 'only 25 members: ... about 10 percentage points ...'
 */
export function fewMembersWarning(members: number): string | undefined {
  if (members >= FEW_MEMBERS) return undefined;
  const error = (100 * 0.5) / Math.sqrt(members);
  return (
    `only ${members} member${members === 1 ? '' : 's'}: percentile ranges and probabilities from so few members are rough ` +
    `(a probability near 50 % has a sampling standard error of about ${error.toFixed(0)} percentage points, 0.5/sqrt(${members}), ` +
    `and the 5-95 % range rests on the few most extreme members); use at least ${FEW_MEMBERS} members`
  );
}

/** The conventions behind the numbers, for an output's provenance. */
function ensembleNotes(members: EnsembleMemberParameters): string[] {
  const c = members.config;
  const { before, after } = RUNNING_MEAN_WINDOW;
  const held = members.shard ? `shard ${members.shard.index}/${members.shard.count}: members ${members.memberStart}-${members.memberStart + members.memberCount - 1} of ${c.membersTotal}` : `${c.membersTotal} members`;
  const few = fewMembersWarning(c.membersTotal);
  return [
    `ensemble of ${held}, seed ${c.seed}; member i depends only on the seed and i`,
    ...(few ? [`warning: ${few}`] : []),
    ...(members.redraws > 0 ? [`${members.redraws} unphysical parameter draws were redrawn`] : []),
    'warming_pXX_k: percentiles across members of each year\'s warming, by linear interpolation between order statistics (Hyndman & Fan 1996, definition 7)',
    `prob_above_<t>: share of members whose 20-year mean warming (years y-${before} to y+${after}) is above t K in year y (a member that falls back below counts no more); empty where the 20-year window leaves the run`,
    `crossed_by_<t>: share of members that have crossed t K by year y, a member counting from the first year its 20-year mean is above t (the IPCC AR6 rule for reaching a warming level) even if it later falls back; it never decreases, and it is the figure the headlines quote ("crossed by 2100")`,
    'crossing year: the labelled year of the first 20-year mean above the level; median crossing year: the first year by which at least half of the members have crossed',
    'peak warming (members\' own): each member\'s highest annual warming over the whole run and its year (the first such year on ties), then their percentiles across members; a member whose peak is the last year is still rising',
    ...c.sourceNotes,
  ];
}

/**
 * The percentiles of the members' peak warming and peak year (first year + index), and the share
 * whose peak is the last of the n years.
 */
function summarizePeaks(peaks: MemberPeaks, firstYear: number, n: number): PeakSummary {
  const m = peaks.warmingK.length;
  const years = Float64Array.from(peaks.yearIndex, (k) => firstYear + k);
  let rising = 0;
  for (let r = 0; r < m; r++) if (peaks.yearIndex[r] === n - 1) rising++;
  const percentilesOf = (values: Float64Array) => {
    const q = new Float64Array(PERCENTILES.length);
    quantilesInPlace(Float64Array.from(values), PERCENTILES, q);
    return Object.fromEntries(PERCENTILE_NAMES.map((name, j) => [name, q[j]])) as Record<PercentileName, number>;
  };
  // Years by the inverse empirical distribution (Hyndman & Fan 1996, definition 1): each percentile
  // is a year some member peaks in. Interpolating between members (definition 7) puts the median of
  // an ensemble split between a mid-century peak and still rising at the end in a year no member peaks in.
  years.sort();
  const yearAt = (p: number) => (m > 0 ? years[Math.max(0, Math.ceil(p * m) - 1)] : NaN);
  const yearPercentiles = Object.fromEntries(PERCENTILE_NAMES.map((name, j) => [name, yearAt(PERCENTILES[j])])) as Record<PercentileName, number>;
  return { warmingK: percentilesOf(peaks.warmingK), year: yearPercentiles, stillRising: m > 0 ? rising / m : NaN };
}

function summarizeValues(values: Float64Array): ParameterSummary {
  const q = new Float64Array(PERCENTILES.length);
  quantilesInPlace(Float64Array.from(values), PERCENTILES, q);
  let sum = 0;
  for (const v of values) sum += v;
  const summary = { mean: values.length > 0 ? sum / values.length : NaN } as ParameterSummary;
  PERCENTILE_NAMES.forEach((name, j) => (summary[name] = q[j]));
  return summary;
}

function pearson(x: Float64Array, y: Float64Array): number {
  const n = x.length;
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i];
    my += y[i];
  }
  mx /= n;
  my /= n;
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const a = x[i] - mx;
    const b = y[i] - my;
    sxy += a * b;
    sxx += a * a;
    syy += b * b;
  }
  return sxx > 0 && syy > 0 ? sxy / Math.sqrt(sxx * syy) : NaN;
}

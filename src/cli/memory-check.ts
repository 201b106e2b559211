import { constants } from 'node:buffer';
import { totalmem } from 'node:os';
import { ensembleMemory, mergeMemory, type MemoryEstimate } from '../ensemble/index.js';
import { ConfigError } from '../errors.js';

/** What this machine and JavaScript engine allow. */
export interface MemoryLimits {
  /** Physical memory, bytes. */
  totalBytes: number;
  /** Longest typed array, in values (Node's largest Buffer, a Uint8Array: 2^32 in Node 20, for any element type). */
  maxArrayLength: number;
  /** Longest string, in characters (2^29 - 24 in Node 20). */
  maxStringLength: number;
}

/** The limits of the machine this process runs on. */
export function machineLimits(): MemoryLimits {
  return { totalBytes: totalmem(), maxArrayLength: constants.MAX_LENGTH, maxStringLength: constants.MAX_STRING_LENGTH };
}

/** What an ensemble command is about to run. */
export interface EnsembleRunSize {
  /** Members of the whole ensemble (`--members`). */
  members: number;
  /** Members this command computes (a shard's own, or all). */
  count: number;
  /** Years of the run. */
  years: number;
  emissionDriven: boolean;
  /** The shard this command runs, if any. */
  shard?: { index: number; count: number };
}

/**
 * Refuses, before anything is allocated, an ensemble run that would not fit this machine: more
 * memory than it has, a typed array or a shard file's text longer than the engine allows. The
 * message gives the estimate and what to do instead: how many shards (`--shard K/N`) would each
 * fit, and whether merging them would (merge holds every member-year).
 *
 * @throws ConfigError (exit 2) when the run does not fit
 */
export function checkEnsembleMemory(run: EnsembleRunSize, limits: MemoryLimits = machineLimits()): void {
  const estimate = ensembleMemory(run.count, run.years, { emissionDriven: run.emissionDriven, shard: run.shard !== undefined });
  const why = exceeds(estimate, limits);
  if (!why) return;
  const what = run.shard
    ? `shard ${run.shard.index}/${run.shard.count} (${run.count} of ${run.members} members) over ${run.years} years`
    : `--members ${run.members} over ${run.years} years`;
  // The largest shard (every member-year kept, its file written) that fits.
  const fitting = largestFitting(run.members, (m) => ensembleMemory(m, run.years, { emissionDriven: run.emissionDriven, shard: true }), limits);
  const shards = fitting > 0 ? Math.ceil(run.members / fitting) : 0;
  const advice = shards > 0 ? `run it in slices of at most ${fitting} members with --shard K/N, N at least ${shards}, and combine them with \`warmcast merge\`` : 'use fewer members';
  throw new ConfigError(`${what} would need ${why}; ${advice}${mergeCaveat(run.members, run.years, Math.max(1, fitting), limits)}`, run.shard ? 'shard' : 'members');
}

/**
 * Refuses, after reading the first shard, a merge that would not fit this machine.
 * @throws ConfigError (exit 2) when the merge does not fit
 */
export function checkMergeMemory(membersTotal: number, years: number, shardMembers: number, limits: MemoryLimits = machineLimits()): void {
  const why = exceeds(mergeMemory(membersTotal, years, shardMembers), limits);
  if (!why) return;
  const fitting = largestFitting(membersTotal, (m) => mergeMemory(m, years, Math.min(m, shardMembers)), limits);
  throw new ConfigError(
    `merging ${membersTotal} members over ${years} years would need ${why}, since the merge holds every member's yearly warming; ` +
      `an ensemble that size cannot be merged on this machine${fitting > 0 ? ` (at most about ${fitting} members can)` : ''}`,
    'members',
  );
}

/**
 * An allocation failure (a RangeError from an engine limit or exhausted memory, also when it comes
 * back from a worker thread as a plain Error) as a ConfigError (exit 2) saying what ran out and what
 * to do; undefined for any other error.
 */
export function allocationError(e: unknown, what: string): ConfigError | undefined {
  const message = e instanceof Error ? e.message : '';
  const code = (e as { code?: unknown } | undefined)?.code;
  const allocation =
    /Array buffer allocation failed|Invalid typed array length|Invalid array buffer length|Invalid string length|Cannot create a string longer/.test(message) ||
    code === 'ERR_STRING_TOO_LONG';
  if (!allocation) return undefined;
  return new ConfigError(`${what} ran out of memory (${message}); use fewer members, or run it in slices with --shard K/N and \`warmcast merge\``, 'members', 'config.out-of-memory');
}

/** Why an estimate does not fit, in words, or undefined when it does. */
function exceeds(e: MemoryEstimate, limits: MemoryLimits): string | undefined {
  if (e.bytes > limits.totalBytes) return `about ${size(e.bytes)} of memory, more than this machine's ${size(limits.totalBytes)}`;
  if (e.largestArray > limits.maxArrayLength) return `an array of ${e.largestArray} values, more than the ${limits.maxArrayLength} a JavaScript typed array may hold`;
  if (e.largestText > limits.maxStringLength) return `a shard file of ${size(e.largestText)}, more than the ${size(limits.maxStringLength)} a JavaScript string may hold`;
  return undefined;
}

/** The largest member count from 1 to `members` whose estimate fits (0 if none): estimates grow with members. */
function largestFitting(members: number, estimate: (m: number) => MemoryEstimate, limits: MemoryLimits): number {
  let lo = 0;
  let hi = members;
  while (lo < hi) {
    const mid = Math.ceil((lo + hi) / 2);
    if (exceeds(estimate(mid), limits)) hi = mid - 1;
    else lo = mid;
  }
  return lo;
}

/** A warning, when merging all members would not fit either, with the most that would. */
function mergeCaveat(members: number, years: number, shardMembers: number, limits: MemoryLimits): string {
  const why = exceeds(mergeMemory(members, years, Math.min(members, shardMembers)), limits);
  if (!why) return '';
  const most = largestFitting(members, (m) => mergeMemory(m, years, Math.min(m, shardMembers)), limits);
  return `; but merging all ${members} members would need ${why} too, since the merge holds every member's yearly warming (at most about ${most} members can be merged here)`;
}

/** Bytes as MB, GB or TB with three significant digits. */
function size(bytes: number): string {
  const [unit, scale] = bytes >= 1e12 ? ['TB', 1e12] : bytes >= 1e9 ? ['GB', 1e9] : ['MB', 1e6];
  return `${+(bytes / (scale as number)).toPrecision(3)} ${unit}`;
}

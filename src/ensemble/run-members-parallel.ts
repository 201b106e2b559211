/**
 * The one process-level part of ensembles: spreading the work over worker threads. The physics and
 * statistics stay in pure functions (run-members.ts, summarize-ensemble.ts); this file splits the
 * work, starts the workers (member-worker.ts) on shared memory, relays progress and errors, and
 * falls back to running in this thread when no compiled worker file is at hand (running from
 * TypeScript sources, as under vitest). Results are identical either way: each member is computed
 * by the same code from (seed, index) alone into its own column, each year's percentiles from all
 * members, and exceedance counts are whole numbers whose partial sums add up exactly.
 *
 * Two phases per worker: (1) run its slice of members into the shared year-major block; (2) once
 * every worker is done, compute the percentiles of its slice of years and the exceedance counts of
 * its slice of members.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { ConfigError, NumericalError, WarmcastError } from '../errors.js';
import { runMembersInto, type MemberBlock, type MemberTask } from './run-members.js';
import { emptyParameters, MEMBER_PARAMETERS, type MemberParameter } from './sample-members.js';
import { exceedanceCountsLength, PERCENTILES, type MemberStatistics } from './summarize-ensemble.js';

/**
 * Member-years each worker should have before a run uses another: worker start-up (module loading,
 * and compiling the code afresh in each thread) costs about 0.2 s, so on the 2-core development
 * machine two workers only beat one thread from about 20,000 members over 1750-2300 (measured with
 * scripts/bench-ensemble.ts).
 */
const MEMBER_YEARS_PER_WORKER = 5_000_000;

/** What a member run produced. */
export interface MemberRun {
  block: MemberBlock;
  /** Unphysical draws discarded. */
  redraws: number;
  /** Threads that did the work (1 = this thread only). */
  workersUsed: number;
  /** The member-year statistics, when worker threads computed them (else undefined). */
  statistics?: MemberStatistics;
}

/** Messages from member-worker.ts. */
export type WorkerMessage =
  | { kind: 'progress'; done: number }
  | { kind: 'members-done'; redraws: number }
  | { kind: 'summary-done'; counts: Float64Array }
  | { kind: 'error'; name: string; message: string; code?: string; parameter?: string };

/** The second-phase request to member-worker.ts. */
export interface SummarizeRequest {
  kind: 'summarize';
  yearFrom: number;
  yearTo: number;
  memberFrom: number;
  memberTo: number;
}

/** What member-worker.ts receives when it starts. */
export interface WorkerInput {
  task: MemberTask;
  /** Members this worker runs (global indices). */
  from: number;
  to: number;
  /** The shared block. */
  blockStart: number;
  memberCount: number;
  warming: SharedArrayBuffer;
  parameters: Record<MemberParameter, SharedArrayBuffer>;
  /** Shared percentile output, PERCENTILES.length x years. */
  percentiles: SharedArrayBuffer;
  thresholds: number[];
}

/**
 * True when the compiled worker entry sits beside this module: this file is then JavaScript (built
 * with tsc into dist/), and so is member-worker.js next to it. Under vitest or any TypeScript
 * loader this module is a .ts file and everything runs in the calling thread.
 */
export function workerThreadsAvailable(): boolean {
  return import.meta.url.endsWith('.js');
}

/**
 * The number of threads a run of this size should use when the caller does not say: one per core,
 * but only as many as have at least five million member-years each.
 * @example defaultWorkerCount(40_000 * 551) // 2 on a 2-core machine
 */
export function defaultWorkerCount(memberYears: number): number {
  return Math.max(1, Math.min(availableParallelism(), Math.floor(memberYears / MEMBER_YEARS_PER_WORKER)));
}

/**
 * Runs members [from, to) on `workers` threads (in this thread when workers is 1 or no compiled
 * worker is available) into one year-major block of shared memory; with more than one thread, the
 * threads also compute the member-year statistics for `thresholds`.
 *
 * @param task shared inputs
 * @param from first member
 * @param to end member, exclusive
 * @param workers threads to use (at least 1)
 * @param thresholds warming levels of the summary, K
 * @param onProgress called with the members done so far and the total of this call
 * @throws ConfigError or NumericalError as the member runs raise them
 */
export async function runMembersParallel(
  task: MemberTask,
  from: number,
  to: number,
  workers: number,
  thresholds: readonly number[],
  onProgress?: (done: number, total: number) => void,
): Promise<MemberRun> {
  const count = to - from;
  const n = task.co2Wm2.length;
  const threads = workerThreadsAvailable() ? Math.max(1, Math.min(workers, count, n)) : 1;
  if (threads === 1) {
    const block: MemberBlock = { blockStart: from, memberCount: count, warmingK: new Float64Array(count * n), parameters: emptyParameters(count) };
    const redraws = runMembersInto(task, from, to, block, onProgress && ((done) => onProgress(done, count)));
    return { block, redraws, workersUsed: 1 };
  }

  const warming = new SharedArrayBuffer(count * n * 8);
  const named = Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new SharedArrayBuffer(count * 8)])) as Record<MemberParameter, SharedArrayBuffer>;
  const parameters = Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new Float64Array(named[name])])) as Record<MemberParameter, Float64Array>;
  const block: MemberBlock = { blockStart: from, memberCount: count, warmingK: new Float64Array(warming), parameters };
  const percentileBuffer = new SharedArrayBuffer(PERCENTILES.length * n * 8);
  const split = (total: number, w: number, offset = 0) => [offset + Math.floor((w * total) / threads), offset + Math.floor(((w + 1) * total) / threads)];

  const done = new Array<number>(threads).fill(0);
  const pool: Worker[] = [];
  try {
    // Phase 1: members.
    const phase1: Promise<number>[] = [];
    const phase2: Promise<Float64Array>[] = [];
    for (let w = 0; w < threads; w++) {
      const [a, b] = split(count, w, from);
      const input: WorkerInput = { task, from: a, to: b, blockStart: from, memberCount: count, warming, parameters: named, percentiles: percentileBuffer, thresholds: [...thresholds] };
      const worker = new Worker(new URL('./member-worker.js', import.meta.url), { workerData: input });
      pool.push(worker);
      const replies = expectReplies(worker);
      phase1.push(
        replies.next((m) => {
          if (m.kind === 'progress') {
            done[w] = m.done;
            onProgress?.(done.reduce((s, d) => s + d, 0), count);
            return undefined;
          }
          return m.kind === 'members-done' ? m.redraws : undefined;
        }),
      );
      phase2.push(phase1[w].then(() => replies.next((m) => (m.kind === 'summary-done' ? m.counts : undefined))));
    }
    const redraws = await Promise.all(phase1);
    // Phase 2: statistics, once every member is in the block.
    pool.forEach((worker, w) => {
      const [yearFrom, yearTo] = split(n, w);
      const [memberFrom, memberTo] = split(count, w);
      worker.postMessage({ kind: 'summarize', yearFrom, yearTo, memberFrom, memberTo } satisfies SummarizeRequest);
    });
    const partial = await Promise.all(phase2);
    const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
    for (const p of partial) for (let i = 0; i < counts.length; i++) counts[i] += p[i];
    const percentiles = PERCENTILES.map((_, j) => new Float64Array(percentileBuffer, j * n * 8, n));
    return { block, redraws: redraws.reduce((s, r) => s + r, 0), workersUsed: threads, statistics: { percentiles, counts } };
  } finally {
    await Promise.all(pool.map((w) => w.terminate()));
  }
}

/**
 * The replies of one worker, awaited one kind at a time: `next(pick)` resolves with the first
 * message that `pick` maps to a value, and rejects on an error message or an early exit.
 */
function expectReplies(worker: Worker): { next<T>(pick: (m: WorkerMessage) => T | undefined): Promise<T> } {
  let waiting: { pick: (m: WorkerMessage) => unknown; resolve: (v: unknown) => void; reject: (e: Error) => void } | undefined;
  let failure: Error | undefined;
  const fail = (e: Error) => {
    failure ??= e;
    waiting?.reject(failure);
    waiting = undefined;
  };
  worker.on('message', (m: WorkerMessage) => {
    if (m.kind === 'error') return fail(rebuildError(m));
    const value = waiting?.pick(m);
    if (value !== undefined && waiting) {
      const { resolve } = waiting;
      waiting = undefined;
      resolve(value);
    }
  });
  worker.on('error', fail);
  worker.on('exit', (code) => fail(new Error(`an ensemble worker stopped (exit code ${code}) before finishing its work`)));
  return {
    next<T>(pick: (m: WorkerMessage) => T | undefined): Promise<T> {
      return new Promise<T>((resolve, reject) => {
        if (failure) return reject(failure);
        waiting = { pick, resolve: resolve as (v: unknown) => void, reject };
      });
    },
  };
}

/** Errors cross threads as plain data; this gives them their warmcast class (and exit code) back. */
function rebuildError(m: Extract<WorkerMessage, { kind: 'error' }>): Error {
  if (m.name === 'ConfigError') return new ConfigError(m.message, m.parameter, m.code);
  if (m.name === 'NumericalError') return new NumericalError(m.message, m.code);
  if (m.code !== undefined) return new WarmcastError(m.message, m.code, 1);
  return new Error(m.message);
}

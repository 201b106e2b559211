/**
 * The one process-level part of ensembles: spreading the work over threads. The physics and
 * statistics stay in pure functions (run-members.ts, exceedance-counter.ts, summarize-ensemble.ts);
 * this file splits the work, keeps worker threads (member-worker.ts) that share memory with this
 * one, relays progress and errors, and runs everything in this thread when no compiled worker file
 * is at hand (running from TypeScript sources, as under vitest). Results are identical either way:
 * each member is computed by the same code from (seed, index) alone into its own column, each year's
 * percentiles from all members, and exceedance counts are whole numbers whose partial sums add up
 * exactly.
 *
 * The calling thread works too: with T threads it runs the first of T slices itself and T - 1 workers
 * run the others. Two phases: (1) every thread runs its slice of members into the shared year-major
 * block, counting threshold exceedances as each member's row is written; (2) once every thread is
 * done, each computes the percentiles of its slice of years.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { ConfigError, NumericalError, WarmcastError } from '../errors.js';
import { ExceedanceCounter } from './exceedance-counter.js';
import { runMembersInto, type MemberBlock, type MemberTask } from './run-members.js';
import { emptyParameters, MEMBER_PARAMETERS, type MemberParameter } from './sample-members.js';
import { exceedanceCountsLength, PERCENTILES, yearPercentilesInto, type MemberStatistics } from './summarize-ensemble.js';

/**
 * Member-years a run should have per thread before it uses another. A worker starts in about 30 ms
 * on the 2-core development machine (module loading) while this thread already works, and then
 * compiles the hot loops afresh; from about 2,000 members over 1750-2300 two threads beat one
 * (measured with scripts/bench-ensemble.ts).
 */
const MEMBER_YEARS_PER_THREAD = 1_000_000;

/** What a member run produced. */
export interface MemberRun {
  block: MemberBlock;
  /** Unphysical draws discarded. */
  redraws: number;
  /** Threads that did the work (1 = this thread only). */
  workersUsed: number;
  /** The member-year statistics: percentiles per year and exceedance counts. */
  statistics: MemberStatistics;
}

/** Messages from member-worker.ts. */
export type WorkerMessage =
  | { kind: 'progress'; done: number }
  | { kind: 'members-done'; redraws: number; counts: Float64Array }
  | { kind: 'summary-done' }
  | { kind: 'error'; name: string; message: string; code?: string; parameter?: string };

/** Requests to member-worker.ts. */
export type WorkerRequest = { kind: 'run'; input: WorkerInput } | { kind: 'summarize'; yearFrom: number; yearTo: number };

/** What member-worker.ts receives with a run request. */
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
  /** Shared Int32 progress counters, one per thread; this worker writes slot `slot`. */
  progress: SharedArrayBuffer;
  slot: number;
}

/**
 * Threads an ensemble run may use, kept between runs so that several ensembles in one process (a
 * comparison of pathways, a service) start their workers once. Close it when done; a process with
 * an open pool still exits (its workers do not keep it alive).
 */
export interface EnsembleThreads {
  /** Threads available to a run: the calling thread plus the pool's workers. */
  readonly size: number;
  /** Stops the workers. */
  close(): Promise<void>;
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
 * but only as many as have at least a million member-years each.
 * @example defaultWorkerCount(10_000 * 551) // 2 on a 2-core machine
 */
export function defaultWorkerCount(memberYears: number): number {
  return Math.max(1, Math.min(availableParallelism(), Math.floor(memberYears / MEMBER_YEARS_PER_THREAD)));
}

/**
 * Starts threads for ensemble runs: `size - 1` workers beside the calling thread (none when worker
 * threads are not available, see {@link workerThreadsAvailable}; `size` is then 1).
 *
 * @param size threads in all, at least 1
 * @example
 * const threads = startEnsembleThreads(2);
 * try { for (const input of inputs) results.push(await runEnsemble(input, { ...options, threads })); } finally { await threads.close(); }
 */
export function startEnsembleThreads(size: number): EnsembleThreads {
  if (!(Number.isInteger(size) && size >= 1)) throw new ConfigError(`threads must be a whole number of at least 1, got ${size}`, 'workers');
  return new WorkerPool(workerThreadsAvailable() ? size - 1 : 0);
}

/**
 * Runs members [from, to) on up to `threads` threads (this one included) into one year-major block
 * of shared memory, and computes the member-year statistics for `thresholds`: percentiles per year
 * and exceedance counts.
 *
 * @param task shared inputs
 * @param from first member
 * @param to end member, exclusive
 * @param threads threads to use, this one included (at least 1)
 * @param thresholds warming levels of the summary, K
 * @param onProgress called with the members done so far and the total of this call
 * @param pool started threads to use (at most its size); without it, workers are started and stopped here
 * @throws ConfigError or NumericalError as the member runs raise them
 */
export async function runMembersParallel(
  task: MemberTask,
  from: number,
  to: number,
  threads: number,
  thresholds: readonly number[],
  onProgress?: (done: number, total: number) => void,
  pool?: EnsembleThreads,
): Promise<MemberRun> {
  const count = to - from;
  const n = task.otherWm2.length;
  const size = Math.max(1, Math.min(threads, pool ? pool.size : Infinity, count, n));
  if (size === 1 || !workerThreadsAvailable()) return runInThisThread(task, from, to, thresholds, onProgress);
  const workers = pool ? (pool as WorkerPool) : new WorkerPool(size - 1);
  try {
    return await runOnPool(workers, size, task, from, to, thresholds, onProgress);
  } finally {
    if (!pool) await workers.close();
  }
}

function runInThisThread(task: MemberTask, from: number, to: number, thresholds: readonly number[], onProgress?: (done: number, total: number) => void): MemberRun {
  const count = to - from;
  const n = task.otherWm2.length;
  const block: MemberBlock = { blockStart: from, memberCount: count, warmingK: new Float64Array(count * n), parameters: emptyParameters(count) };
  const exceedance = new ExceedanceCounter(thresholds, n);
  const redraws = runMembersInto(task, from, to, block, onProgress && ((done) => onProgress(done, count)), exceedance);
  const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
  exceedance.addCountsTo(counts);
  const percentiles = PERCENTILES.map(() => new Float64Array(n));
  yearPercentilesInto(block.warmingK, count, 0, n, percentiles);
  return { block, redraws, workersUsed: 1, statistics: { percentiles, counts } };
}

async function runOnPool(
  pool: WorkerPool,
  size: number,
  task: MemberTask,
  from: number,
  to: number,
  thresholds: readonly number[],
  onProgress?: (done: number, total: number) => void,
): Promise<MemberRun> {
  const count = to - from;
  const n = task.otherWm2.length;
  const warming = new SharedArrayBuffer(count * n * 8);
  const named = Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new SharedArrayBuffer(count * 8)])) as Record<MemberParameter, SharedArrayBuffer>;
  const parameters = Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new Float64Array(named[name])])) as Record<MemberParameter, Float64Array>;
  const block: MemberBlock = { blockStart: from, memberCount: count, warmingK: new Float64Array(warming), parameters };
  const percentileBuffer = new SharedArrayBuffer(PERCENTILES.length * n * 8);
  const percentiles = PERCENTILES.map((_, j) => new Float64Array(percentileBuffer, j * n * 8, n));
  const progressBuffer = new SharedArrayBuffer(4 * size);
  const progress = new Int32Array(progressBuffer);
  const split = (total: number, w: number, offset = 0) => [offset + Math.floor((w * total) / size), offset + Math.floor(((w + 1) * total) / size)];
  const report = onProgress && ((own: number) => {
    let done = own;
    for (let w = 1; w < size; w++) done += Atomics.load(progress, w);
    onProgress(done, count);
  });
  let ownDone = 0;

  // Phase 1: members. Workers take slices 1..size-1; this thread takes slice 0.
  const workers = pool.take(size - 1);
  const phase1 = workers.map((worker, i) => {
    const w = i + 1;
    const [a, b] = split(count, w, from);
    const input: WorkerInput = { task, from: a, to: b, blockStart: from, memberCount: count, warming, parameters: named, percentiles: percentileBuffer, thresholds: [...thresholds], progress: progressBuffer, slot: w };
    worker.onProgress = report && (() => report(ownDone));
    worker.post({ kind: 'run', input });
    return worker.next((m) => (m.kind === 'members-done' ? m : undefined));
  });
  // Every worker's failure is awaited below; until then a rejection must not count as unhandled.
  phase1.forEach((p) => p.catch(() => undefined));
  const [a0, b0] = split(count, 0, from);
  const exceedance = new ExceedanceCounter(thresholds, n);
  let redraws = runMembersInto(task, a0, b0, block, report && ((done) => report((ownDone = done))), exceedance);
  const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
  exceedance.addCountsTo(counts);
  for (const done of await Promise.all(phase1)) {
    redraws += done.redraws;
    for (let i = 0; i < counts.length; i++) counts[i] += done.counts[i];
  }

  // Phase 2: percentiles, once every member is in the block.
  const phase2 = workers.map((worker, i) => {
    const [yearFrom, yearTo] = split(n, i + 1);
    worker.post({ kind: 'summarize', yearFrom, yearTo });
    return worker.next((m) => (m.kind === 'summary-done' ? true : undefined));
  });
  phase2.forEach((p) => p.catch(() => undefined));
  const [y0, y1] = split(n, 0);
  yearPercentilesInto(block.warmingK, count, y0, y1, percentiles);
  await Promise.all(phase2);
  for (const worker of workers) worker.onProgress = undefined;
  return { block, redraws, workersUsed: size, statistics: { percentiles, counts } };
}

/** A started worker and the replies it sends, awaited one kind at a time. */
class PooledWorker {
  onProgress?: () => void;
  private waiting?: { pick: (m: WorkerMessage) => unknown; resolve: (v: unknown) => void; reject: (e: Error) => void };
  private failure?: Error;

  constructor(readonly worker: Worker) {
    worker.unref();
    worker.on('message', (m: WorkerMessage) => {
      if (m.kind === 'error') return this.fail(rebuildError(m));
      if (m.kind === 'progress') return this.onProgress?.();
      const value = this.waiting?.pick(m);
      if (value !== undefined && this.waiting) {
        const { resolve } = this.waiting;
        this.waiting = undefined;
        resolve(value);
      }
    });
    worker.on('error', (e) => this.fail(e));
    worker.on('exit', (code) => this.fail(new Error(`an ensemble worker stopped (exit code ${code}) before finishing its work`)));
  }

  post(request: WorkerRequest): void {
    if (!this.failure) this.worker.postMessage(request);
  }

  /** Resolves with the first message that `pick` maps to a value; rejects on an error or an exit. */
  next<T>(pick: (m: WorkerMessage) => T | undefined): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      if (this.failure) return reject(this.failure);
      this.waiting = { pick, resolve: resolve as (v: unknown) => void, reject };
    });
  }

  private fail(e: Error): void {
    this.failure ??= e;
    this.waiting?.reject(this.failure);
    this.waiting = undefined;
  }
}

/** Workers started once and reused by every run given the pool. */
class WorkerPool implements EnsembleThreads {
  private readonly workers: PooledWorker[];
  private closed = false;

  constructor(workers: number) {
    this.workers = Array.from({ length: workers }, () => new PooledWorker(new Worker(new URL('./member-worker.js', import.meta.url))));
  }

  get size(): number {
    return this.workers.length + 1;
  }

  take(count: number): PooledWorker[] {
    if (this.closed) throw new ConfigError('the ensemble threads were closed before this run', 'workers');
    return this.workers.slice(0, count);
  }

  async close(): Promise<void> {
    if (this.closed) return;
    this.closed = true;
    await Promise.all(this.workers.map((w) => w.worker.terminate()));
  }
}

/** Errors cross threads as plain data; this gives them their warmcast class (and exit code) back. */
function rebuildError(m: Extract<WorkerMessage, { kind: 'error' }>): Error {
  if (m.name === 'ConfigError') return new ConfigError(m.message, m.parameter, m.code);
  if (m.name === 'NumericalError') return new NumericalError(m.message, m.code);
  if (m.code !== undefined) return new WarmcastError(m.message, m.code, 1);
  return new Error(m.message);
}

/**
 * The one process-level part of ensembles: spreading the work over threads. The physics and
 * statistics stay in pure functions (member-stream.ts, run-thread-share.ts, summarize-ensemble.ts);
 * this file allocates the shared memory, keeps worker threads (member-worker.ts), hands each its
 * share, relays progress and errors, and runs everything in this thread when one thread is asked for
 * or no compiled worker file is at hand (running from TypeScript sources, as under vitest). Results
 * are identical either way: each member is computed by the same code from (seed, index) alone into
 * its own column, each year's percentiles from all members, and exceedance counts are whole numbers
 * whose partial sums add up exactly.
 */
import { availableParallelism } from 'node:os';
import { Worker } from 'node:worker_threads';
import { ConfigError, NumericalError, WarmcastError } from '../errors.js';
import { emptyMemberPeaks, type MemberPeaks } from './member-peaks.js';
import { streamRows } from './member-stream.js';
import type { MemberTask } from './run-members.js';
import { abandonRun, RunAbandoned, runThreadShare, type ThreadJob } from './run-thread-share.js';
import { emptyParameters, type MemberParameter } from './sample-members.js';
import { exceedanceCountsLength, PERCENTILES, type MemberStatistics } from './summarize-ensemble.js';

/**
 * Member-years a run should have per thread before it uses another. A command runs once, so its
 * workers start cold: loading the modules and compiling the hot loops afresh in each thread costs
 * about 0.15 s on the 2-core development machine, and two threads only beat one from about 50,000
 * members over 1750-2100 (measured with `warmcast ensemble --workers 1|2`). A pool started once and
 * reused (startEnsembleThreads) pays that only once.
 */
const MEMBER_YEARS_PER_THREAD = 10_000_000;

/** What a member run produced. */
export interface MemberRun {
  /** Every member's yearly warming, year-major (year k of member r at k * members + r), when kept. */
  warmingK?: Float64Array;
  /** Each member's parameters. */
  parameters: Record<MemberParameter, Float64Array>;
  /** Each member's peak: highest annual warming and its year index. */
  peaks: MemberPeaks;
  /** Unphysical draws discarded. */
  redraws: number;
  /** Threads that did the work (1 = this thread only). */
  workersUsed: number;
  /** The member-year statistics: percentiles per year and exceedance counts. */
  statistics: MemberStatistics;
}

/** Messages from member-worker.ts. */
export type WorkerMessage =
  | { kind: 'progress' }
  | { kind: 'done'; redraws: number; counts: Float64Array }
  | { kind: 'error'; name: string; message: string; code?: string; parameter?: string };

/** A request to member-worker.ts: run one thread's share. */
export interface WorkerRequest {
  kind: 'run';
  job: ThreadJob;
}

/**
 * Threads an ensemble run may use, kept between runs so that several ensembles in one process (a
 * comparison of pathways, a service) start their workers once. Close it when done; a process with
 * an open pool still exits (its workers do not keep it alive).
 */
export interface EnsembleThreads {
  /** Threads available to a run. */
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
 * How much more an emission-driven member-year counts than a concentration-driven one when choosing
 * threads (its own carbon cycle, CO2 forcing formula and feedback solve each year cost several times
 * as much): on the 2-core development machine the cold start of a second thread pays from about
 * 2,500 members over 1750-2100 (`warmcast ensemble swift-emissions --workers 1|2`: 0.45 / 0.48 s at
 * 1,000 members, 0.56 / 0.57 s at 2,000, 0.87 / 0.77 s at 4,000), hence the weight.
 */
const EMISSION_MEMBER_YEAR_WEIGHT = 20;

/**
 * The number of threads a run of this size should use when the caller does not say: one per core,
 * but only as many as have at least ten million member-years each (an emission-driven member-year
 * counting as EMISSION_MEMBER_YEAR_WEIGHT).
 * @example defaultWorkerCount(100_000 * 351) // 2 on a 2-core machine
 * @example defaultWorkerCount(4_000 * 351, true) // 2 on a 2-core machine
 */
export function defaultWorkerCount(memberYears: number, emissionDriven = false): number {
  const work = memberYears * (emissionDriven ? EMISSION_MEMBER_YEAR_WEIGHT : 1);
  return Math.max(1, Math.min(availableParallelism(), Math.floor(work / MEMBER_YEARS_PER_THREAD)));
}

/**
 * Starts `size` worker threads for ensemble runs (none when worker threads are not available, see
 * {@link workerThreadsAvailable}; runs then use the calling thread).
 *
 * @param size threads, at least 1
 * @example
 * const threads = startEnsembleThreads(2);
 * try { for (const input of inputs) results.push(await runEnsemble(input, { ...options, threads })); } finally { await threads.close(); }
 */
export function startEnsembleThreads(size: number): EnsembleThreads {
  if (!(Number.isInteger(size) && size >= 1)) throw new ConfigError(`threads must be a whole number of at least 1, got ${size}`, 'workers');
  return new WorkerPool(workerThreadsAvailable() ? size : 0);
}

/**
 * The largest block of member rows handed to worker threads, bytes. Node 20 passes a typed array on
 * a SharedArrayBuffer of 2^32 bytes or more to a worker with its length wrapped modulo 2^32
 * (measured: a 4294967304-byte view arrives as 8 bytes), so the workers' writes past the wrapped
 * end would vanish without an error. A larger block is run in the calling thread, which gives the
 * same numbers, only more slowly.
 */
export const MAX_SHARED_BLOCK_BYTES = 2 ** 32 - 1;

/**
 * How many threads run `count` members whose rows take `rowBytes`: the threads asked for, at most
 * one per member and the pool's size; 1 when worker threads are unavailable or the rows exceed
 * {@link MAX_SHARED_BLOCK_BYTES}.
 *
 * @param threads threads asked for (at least 1)
 * @param count members to run
 * @param rowBytes bytes of the members' shared rows
 * @param poolSize size of a started pool, if one is used
 * @example memberThreads(2, 10_000, 2 ** 33) // 1: the rows would not reach the workers whole
 */
export function memberThreads(threads: number, count: number, rowBytes: number, poolSize?: number): number {
  let size = Math.max(1, Math.min(threads, count));
  if (poolSize !== undefined) size = Math.min(size, poolSize);
  if (!workerThreadsAvailable() || poolSize === 0 || rowBytes > MAX_SHARED_BLOCK_BYTES) size = 1;
  return size;
}

/**
 * Runs members [from, to) on up to `threads` threads and computes the member-year statistics for
 * `thresholds`: percentiles per year and exceedance counts, and each member's peak. Concentration-driven members stream
 * through blocks of years and only a few years of all members are held at a time, unless `keep`
 * asks for every member's yearly warming (emission-driven members are always kept).
 *
 * @param task shared inputs
 * @param from first member
 * @param to end member, exclusive
 * @param threads threads to use (at least 1; 1 runs in this thread)
 * @param thresholds warming levels of the summary, K
 * @param onProgress called with the members done so far and the total of this call
 * @param pool started threads to use (at most its size); without it, workers are started and stopped here
 * @param keep return every member's yearly warming
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
  keep = false,
): Promise<MemberRun> {
  const count = to - from;
  const n = task.otherWm2.length;
  const kept = keep || task.carbon !== undefined;
  const rowCount = streamRows(n, kept);
  const size = memberThreads(threads, count, rowCount * count * 8, pool?.size);
  const shared = size > 1;
  const buffer = (bytes: number) => (shared ? new SharedArrayBuffer(bytes) : new ArrayBuffer(bytes));
  const rows = new Float64Array(buffer(rowCount * count * 8));
  const parameters = emptyParameters(count, buffer);
  const peaks = emptyMemberPeaks(count, buffer);
  const percentiles = new Float64Array(buffer(PERCENTILES.length * n * 8));
  const sync = new Int32Array(buffer(4 * (2 + size)));
  const jobs = Array.from({ length: size }, (_, w): ThreadJob => ({
    task,
    from: from + Math.floor((w * count) / size),
    to: from + Math.floor(((w + 1) * count) / size),
    blockStart: from,
    memberCount: count,
    thread: w,
    threads: size,
    thresholds: [...thresholds],
    progress: onProgress !== undefined,
    rows,
    rowCount,
    parameters,
    peaks,
    percentiles,
    sync,
  }));
  let last = -1;
  const report = onProgress && (() => {
    let done = 0;
    for (let w = 0; w < size; w++) done += Atomics.load(sync, 2 + w);
    if (done > last) onProgress((last = done), count);
  });

  const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
  let redraws = 0;
  if (!shared) {
    const share = runThreadShare(jobs[0], report);
    redraws = share.redraws;
    counts.set(share.counts);
  } else {
    const workers = pool ? (pool as WorkerPool) : new WorkerPool(size);
    try {
      const shares = await workers.run(jobs, report);
      for (const share of shares) {
        redraws += share.redraws;
        for (let i = 0; i < counts.length; i++) counts[i] += share.counts[i];
      }
      // Workers tell of progress at most every 100 ms; the end is told here.
      report?.();
    } finally {
      if (!pool) await workers.close();
    }
  }
  return {
    ...(kept ? { warmingK: rows } : {}),
    parameters,
    peaks,
    redraws,
    workersUsed: size,
    statistics: { percentiles: PERCENTILES.map((_, j) => percentiles.subarray(j * n, (j + 1) * n)), counts },
  };
}

/**
 * A started worker and the replies it sends, awaited one at a time. An error reply fails only the
 * run in progress; the worker's own death (an exit or an uncaught error) fails it for good.
 */
class PooledWorker {
  onProgress?: () => void;
  private waiting?: { pick: (m: WorkerMessage) => unknown; resolve: (v: unknown) => void; reject: (e: Error) => void };
  private failure?: Error;

  constructor(readonly worker: Worker) {
    worker.on('message', (m: WorkerMessage) => {
      if (m.kind === 'progress') return this.onProgress?.();
      if (m.kind === 'error') return this.settle((w) => w.reject(rebuildError(m)));
      const value = this.waiting?.pick(m);
      if (value !== undefined) this.settle((w) => w.resolve(value));
    });
    worker.on('error', (e) => this.fail(e));
    worker.on('exit', (code) => this.fail(new Error(`an ensemble worker stopped (exit code ${code}) before finishing its work`)));
    // After the listeners (attaching a message listener refs the worker's port again): an idle worker
    // does not keep the process alive.
    worker.unref();
  }

  post(request: WorkerRequest): void {
    if (!this.failure) this.worker.postMessage(request);
  }

  /** Resolves with the first message that `pick` maps to a value; rejects on an error reply or the worker's death. */
  next<T>(pick: (m: WorkerMessage) => T | undefined): Promise<T> {
    return new Promise<T>((resolve, reject) => {
      if (this.failure) return reject(this.failure);
      this.waiting = { pick, resolve: resolve as (v: unknown) => void, reject };
    });
  }

  private settle(how: (w: NonNullable<PooledWorker['waiting']>) => void): void {
    const w = this.waiting;
    this.waiting = undefined;
    if (w) how(w);
  }

  private fail(e: Error): void {
    this.failure ??= e;
    this.settle((w) => w.reject(this.failure!));
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
    return this.workers.length;
  }

  /**
   * Hands job w to worker w and waits for all of them; on the first failure the run is abandoned
   * (every other worker stops at its next barrier) and that failure is thrown.
   */
  async run(jobs: ThreadJob[], onProgress?: () => void): Promise<{ redraws: number; counts: Float64Array }[]> {
    if (this.closed) throw new ConfigError('the ensemble threads were closed before this run', 'workers');
    const workers = this.workers.slice(0, jobs.length);
    const sync = jobs[0].sync;
    const replies = workers.map((worker, w) => {
      // Busy workers keep the process alive until they reply; idle ones do not (see PooledWorker).
      worker.worker.ref();
      worker.onProgress = onProgress;
      worker.post({ kind: 'run', job: jobs[w] });
      return worker.next((m) => (m.kind === 'done' ? m : undefined));
    });
    try {
      return await Promise.all(
        replies.map((reply) =>
          reply.catch((e: unknown) => {
            abandonRun(sync);
            throw e;
          }),
        ),
      );
    } finally {
      // Every worker has replied or failed before the next run uses the pool.
      await Promise.allSettled(replies);
      for (const worker of workers) {
        worker.onProgress = undefined;
        worker.worker.unref();
      }
    }
  }

  async close(): Promise<void> {
    if (this.closed) return;
    this.closed = true;
    await Promise.all(this.workers.map((w) => w.worker.terminate()));
  }
}

/** Errors cross threads as plain data; this gives them their warmcast class (and exit code) back. */
function rebuildError(m: Extract<WorkerMessage, { kind: 'error' }>): Error {
  if (m.name === 'RunAbandoned') return new RunAbandoned();
  if (m.name === 'ConfigError') return new ConfigError(m.message, m.parameter, m.code);
  if (m.name === 'NumericalError') return new NumericalError(m.message, m.code);
  if (m.code !== undefined) return new WarmcastError(m.message, m.code, 1);
  return new Error(m.message);
}

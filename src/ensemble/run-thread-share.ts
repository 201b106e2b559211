import { ConfigError } from '../errors.js';
import { QuantileSelector } from '../numerics/quantiles.js';
import { ExceedanceCounter } from './exceedance-counter.js';
import { memberPeaksInto, type MemberPeaks } from './member-peaks.js';
import { MemberStream, STREAM_BLOCK_YEARS } from './member-stream.js';
import { runMembersInto, type MemberTask } from './run-members.js';
import type { MemberParameter } from './sample-members.js';
import { exceedanceCountsLength, PERCENTILES, YearPercentiles } from './summarize-ensemble.js';

/**
 * One thread's part of an ensemble run, as plain data (sent to a worker thread as is; the typed
 * arrays are views of memory every thread of the run shares).
 */
export interface ThreadJob {
  task: MemberTask;
  /** Members this thread runs (global indices). */
  from: number;
  to: number;
  /** First member of the run (column 0 of the rows) and the members of the run (row width). */
  blockStart: number;
  memberCount: number;
  /** This thread's index and the number of threads of the run. */
  thread: number;
  threads: number;
  thresholds: number[];
  /** Whether the caller follows progress (a worker then tells it, now and then). */
  progress: boolean;
  /** Year-major member values: `rowCount` rows of `memberCount`, year k in row k mod rowCount. */
  rows: Float64Array;
  rowCount: number;
  /** Receives each member's parameters at its column. */
  parameters: Record<MemberParameter, Float64Array>;
  /** Receives each member's peak (highest warming and its year) at its column. */
  peaks: MemberPeaks;
  /** Receives percentile j of year k at j * years + k. */
  percentiles: Float64Array;
  /**
   * Synchronisation: [0] arrivals at the barrier, [1] 1 once the run is abandoned, [2 + t] members
   * (equivalent) thread t has finished.
   */
  sync: Int32Array;
}

/** Thrown in a thread whose run another thread abandoned (its error is the one to report). */
export class RunAbandoned extends Error {
  constructor() {
    super('the ensemble run was abandoned by another thread');
    this.name = 'RunAbandoned';
  }
}

/**
 * Runs one thread's share of an ensemble and its share of the statistics:
 * - concentration-driven members stream through blocks of years (member-stream.ts); after each
 *   block every thread waits for the others, then computes the percentiles of its slice of the
 *   block's years while the rows are fresh;
 * - emission-driven members (task.carbon) run whole, one after another (runMembersInto), into rows
 *   that hold every year; after all threads are done, each computes the percentiles of its slice of
 *   the years.
 * Exceedances are counted as each member's values are written; each member's peak is tracked as its
 * values are written (streamed) or found in its kept row once it has run (emission-driven).
 *
 * @param job the share
 * @param onProgress called as members (or their equivalent in member-years) finish
 * @returns unphysical draws discarded and this share's exceedance counts
 * @throws RunAbandoned when another thread gave up the run
 */
export function runThreadShare(job: ThreadJob, onProgress?: () => void): { redraws: number; counts: Float64Array } {
  const { task, from, to, memberCount: m, rows, rowCount, thread, threads, sync } = job;
  const n = task.otherWm2.length;
  const own = to - from;
  const years = new YearPercentiles(m);
  const out = PERCENTILES.map((_, j) => job.percentiles.subarray(j * n, (j + 1) * n));
  const percentilesOf = (k0: number, k1: number) => years.into(rows, k0, k1, out, rowCount);
  const slice = (k0: number, k1: number): [number, number] => [k0 + Math.floor((thread * (k1 - k0)) / threads), k0 + Math.floor(((thread + 1) * (k1 - k0)) / threads)];
  const report = (done: number) => {
    Atomics.store(sync, 2 + thread, done);
    onProgress?.();
  };
  const counts = new Float64Array(exceedanceCountsLength(job.thresholds.length, n));
  let redraws: number;
  let generation = 0;

  if (task.carbon) {
    if (rowCount !== n) throw new ConfigError('emission-driven ensembles keep every year of every member', 'rows');
    const counter = new ExceedanceCounter(job.thresholds, n);
    const block = { blockStart: job.blockStart, memberCount: m, warmingK: rows, parameters: job.parameters };
    redraws = runMembersInto(task, from, to, block, report, counter);
    counter.addCountsTo(counts);
    memberPeaksInto(rows, m, n, from - job.blockStart, to - job.blockStart, job.peaks);
    arrive(sync, threads, ++generation);
    percentilesOf(...slice(0, n));
    return { redraws, counts };
  }

  QuantileSelector.prime();
  MemberStream.prime(task);
  const stream = new MemberStream(task, from, to, from - job.blockStart, m, rows, rowCount, job.parameters, job.thresholds, job.peaks);
  redraws = stream.draw();
  for (let y0 = 0; y0 < n; y0 += STREAM_BLOCK_YEARS) {
    const y1 = Math.min(n, y0 + STREAM_BLOCK_YEARS);
    stream.advance(y0, y1);
    arrive(sync, threads, ++generation);
    percentilesOf(...slice(y0, y1));
    report(Math.floor((own * y1) / n));
  }
  stream.addCountsTo(counts);
  return { redraws, counts };
}

/** Busy checks of the barrier before sleeping on it (the other threads are usually close behind). */
const SPINS = 20_000;

/**
 * Waits until all `threads` threads have arrived `generation` times (a counting barrier on sync[0]).
 * @throws RunAbandoned when sync[1] says the run was abandoned
 */
function arrive(sync: Int32Array, threads: number, generation: number): void {
  if (threads === 1) return;
  const target = generation * threads;
  if (Atomics.add(sync, 0, 1) + 1 >= target) {
    Atomics.notify(sync, 0);
  } else {
    for (let spin = 0; ; spin++) {
      const seen = Atomics.load(sync, 0);
      if (seen >= target || Atomics.load(sync, 1) !== 0) break;
      if (spin >= SPINS) Atomics.wait(sync, 0, seen, 100);
    }
  }
  if (Atomics.load(sync, 1) !== 0) throw new RunAbandoned();
}

/** Marks a run abandoned and wakes every thread waiting at its barrier. */
export function abandonRun(sync: Int32Array): void {
  Atomics.store(sync, 1, 1);
  Atomics.notify(sync, 0);
}

/**
 * Worker-thread entry for ensembles (started by run-members-parallel.ts from the compiled dist/
 * file, and kept for as many runs as its pool lives). Each request runs one thread's share of a run
 * (run-thread-share.ts) on memory shared with the other threads and replies with its redraw count
 * and exceedance counts. An error abandons the run, so that no other thread waits for this one, and
 * goes back as plain data.
 */
import { parentPort } from 'node:worker_threads';
import { WarmcastError } from '../errors.js';
import type { WorkerMessage, WorkerRequest } from './run-members-parallel.js';
import { abandonRun, runThreadShare, type ThreadJob } from './run-thread-share.js';

const port = parentPort!;

function post(m: WorkerMessage, transfer?: ArrayBuffer[]): void {
  port.postMessage(m, transfer);
}

/** Least time between two progress messages, ms: each wakes the calling thread, which on a busy machine takes a core from the workers. */
const PROGRESS_INTERVAL_MS = 100;

/**
 * The job rebuilt from plain object literals. Objects that arrive through postMessage are built by
 * V8's deserializer with slow property access, and the draws read the sampling ranges and write the
 * parameters for every member: rebuilt, drawing 5,000 members takes about 10 ms instead of 14.
 */
function rebuilt(job: ThreadJob): ThreadJob {
  const s = job.task.sampling;
  const sampling = Object.fromEntries(Object.entries(s).map(([key, value]) => [key, typeof value === 'object' ? { ...value } : value])) as typeof s;
  return { ...job, task: { ...job.task, sampling }, parameters: { ...job.parameters }, thresholds: [...job.thresholds] };
}

port.on('message', (request: WorkerRequest) => {
  const job = rebuilt(request.job);
  let last = performance.now();
  const progress = () => {
    const now = performance.now();
    if (now - last < PROGRESS_INTERVAL_MS) return;
    last = now;
    post({ kind: 'progress' });
  };
  try {
    const { redraws, counts } = runThreadShare(job, job.progress ? progress : undefined);
    post({ kind: 'done', redraws, counts }, [counts.buffer as ArrayBuffer]);
  } catch (e) {
    abandonRun(job.sync);
    const err = e as Error;
    post({
      kind: 'error',
      name: err?.name ?? 'Error',
      message: err?.message ?? String(e),
      code: e instanceof WarmcastError ? e.code : undefined,
      parameter: (e as { parameter?: string }).parameter,
    });
  }
});

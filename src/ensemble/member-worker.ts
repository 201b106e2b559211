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
import { abandonRun, runThreadShare } from './run-thread-share.js';

const port = parentPort!;

function post(m: WorkerMessage, transfer?: ArrayBuffer[]): void {
  port.postMessage(m, transfer);
}

/** Least time between two progress messages, ms: each wakes the calling thread, which on a busy machine takes a core from the workers. */
const PROGRESS_INTERVAL_MS = 100;

port.on('message', (request: WorkerRequest) => {
  const job = request.job;
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

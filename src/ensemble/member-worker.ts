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

port.on('message', (request: WorkerRequest) => {
  const job = request.job;
  try {
    const { redraws, counts } = runThreadShare(job, () => post({ kind: 'progress' }));
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

/**
 * Worker-thread entry for ensembles (started by run-members-parallel.ts from the compiled dist/
 * file). Phase 1: run its slice of members into the shared block, reporting progress. Phase 2, on
 * request: the percentiles of its slice of years (into shared memory) and the exceedance counts of
 * its slice of members (sent back). Errors go back as plain data.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { WarmcastError } from '../errors.js';
import type { SummarizeRequest, WorkerInput, WorkerMessage } from './run-members-parallel.js';
import { runMembersInto, type MemberBlock } from './run-members.js';
import { MEMBER_PARAMETERS, type MemberParameter } from './sample-members.js';
import { exceedanceCountsInto, exceedanceCountsLength, PERCENTILES, yearPercentilesInto } from './summarize-ensemble.js';

const input = workerData as WorkerInput;
const port = parentPort!;
const n = input.task.co2Wm2.length;
const block: MemberBlock = {
  blockStart: input.blockStart,
  memberCount: input.memberCount,
  warmingK: new Float64Array(input.warming),
  parameters: Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new Float64Array(input.parameters[name])])) as Record<MemberParameter, Float64Array>,
};

function post(m: WorkerMessage, transfer?: ArrayBuffer[]): void {
  port.postMessage(m, transfer);
}

function guarded(work: () => void): void {
  try {
    work();
  } catch (e) {
    const err = e as Error;
    post({
      kind: 'error',
      name: err?.name ?? 'Error',
      message: err?.message ?? String(e),
      code: e instanceof WarmcastError ? e.code : undefined,
      parameter: (e as { parameter?: string }).parameter,
    });
  }
}

port.on('message', (request: SummarizeRequest) =>
  guarded(() => {
    const percentiles = PERCENTILES.map((_, j) => new Float64Array(input.percentiles, j * n * 8, n));
    yearPercentilesInto(block.warmingK, input.memberCount, request.yearFrom, request.yearTo, percentiles);
    const counts = new Float64Array(exceedanceCountsLength(input.thresholds.length, n));
    exceedanceCountsInto(block.warmingK, input.memberCount, n, input.thresholds, request.memberFrom, request.memberTo, counts);
    post({ kind: 'summary-done', counts }, [counts.buffer]);
  }),
);

guarded(() => {
  const redraws = runMembersInto(input.task, input.from, input.to, block, (done) => post({ kind: 'progress', done }));
  post({ kind: 'members-done', redraws });
});

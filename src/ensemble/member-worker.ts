/**
 * Worker-thread entry for ensembles (started by run-members-parallel.ts from the compiled dist/
 * file, and kept for as many runs as its pool lives). On a run request: run its slice of members
 * into the shared block, counting threshold exceedances and writing its progress into a shared
 * counter, and send back the counts. On a summarize request: the percentiles of its slice of years,
 * into shared memory. Errors go back as plain data.
 */
import { parentPort } from 'node:worker_threads';
import { WarmcastError } from '../errors.js';
import { ExceedanceCounter } from './exceedance-counter.js';
import type { WorkerInput, WorkerMessage, WorkerRequest } from './run-members-parallel.js';
import { runMembersInto, type MemberBlock } from './run-members.js';
import { MEMBER_PARAMETERS, type MemberParameter } from './sample-members.js';
import { exceedanceCountsLength, PERCENTILES, yearPercentilesInto } from './summarize-ensemble.js';

const port = parentPort!;

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

/** The run in progress (its views of the shared memory). */
let current: { input: WorkerInput; block: MemberBlock } | undefined;

function run(input: WorkerInput): void {
  const n = input.task.otherWm2.length;
  const block: MemberBlock = {
    blockStart: input.blockStart,
    memberCount: input.memberCount,
    warmingK: new Float64Array(input.warming),
    parameters: Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new Float64Array(input.parameters[name])])) as Record<MemberParameter, Float64Array>,
  };
  current = { input, block };
  const progress = new Int32Array(input.progress);
  const exceedance = new ExceedanceCounter(input.thresholds, n);
  const redraws = runMembersInto(
    input.task,
    input.from,
    input.to,
    block,
    (done) => {
      Atomics.store(progress, input.slot, done);
      post({ kind: 'progress', done });
    },
    exceedance,
  );
  const counts = new Float64Array(exceedanceCountsLength(input.thresholds.length, n));
  exceedance.addCountsTo(counts);
  post({ kind: 'members-done', redraws, counts }, [counts.buffer]);
}

function summarize(yearFrom: number, yearTo: number): void {
  const { input, block } = current!;
  const n = input.task.otherWm2.length;
  const percentiles = PERCENTILES.map((_, j) => new Float64Array(input.percentiles, j * n * 8, n));
  yearPercentilesInto(block.warmingK, input.memberCount, yearFrom, yearTo, percentiles);
  current = undefined;
  post({ kind: 'summary-done' });
}

port.on('message', (request: WorkerRequest) =>
  guarded(() => {
    if (request.kind === 'run') run(request.input);
    else summarize(request.yearFrom, request.yearTo);
  }),
);

/**
 * Worker-thread entry of `warmcast batch` (started by batch-threads.ts from the compiled dist/ file):
 * each request is one scenario of the table, read and assessed in this thread with a one-thread
 * ensemble (runBatch on a single item), exactly as the calling thread would; the reply is its row or
 * error and, when asked, its yearly table and notes for `--out-dir`.
 */
import { parentPort } from 'node:worker_threads';
import { runBatch } from '../batch/run-batch.js';
import { ensembleTable } from '../ensemble/index.js';
import { batchScenario } from './batch-scenario.js';
import { memberSource } from './member-source.js';
import type { MemberSource } from '../ensemble/index.js';
import type { BatchWorkerReply, BatchWorkerRequest } from './batch-threads.js';

const port = parentPort!;
/** The member source, built once per worker (the calibrated set is read from its bundled file). */
let source: { prior: boolean; value: MemberSource } | undefined;

port.on('message', async (request: BatchWorkerRequest) => {
  let yearly: BatchWorkerReply['yearly'];
  if (source?.prior !== request.prior) source = { prior: request.prior, value: memberSource(request.prior) };
  const outcome = await runBatch([batchScenario(request.scenario, request.index, request.load)], {
    ...request.options,
    source: source.value,
    onAssessed: (_s, result, notes) => {
      if (request.yearly) yearly = { table: ensembleTable(result), notes, ensembleNotes: result.notes };
    },
  });
  const reply: BatchWorkerReply = { index: request.index, outcome, ...(yearly ? { yearly } : {}) };
  port.postMessage(reply);
});

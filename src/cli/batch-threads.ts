import { Worker } from 'node:worker_threads';
import type { AssessOptions } from '../batch/assess-scenario.js';
import { runBatch, type BatchOutcome } from '../batch/run-batch.js';
import { ensembleTable, type EnsembleTable } from '../ensemble/index.js';
import type { IamcScenario } from '../io/iamc-table.js';
import type { LoadPathwayOptions } from '../io/load-pathway.js';
import { batchScenario } from './batch-scenario.js';
import { memberSource } from './member-source.js';

/** One scenario handed to a batch worker. */
export interface BatchWorkerRequest {
  index: number;
  scenario: IamcScenario;
  /** How the scenario is read (splice), as the calling thread would read it. */
  load: LoadPathwayOptions;
  /** Ensemble settings without the member source, which cannot cross threads: `prior` says which the worker builds. */
  options: Omit<AssessOptions, 'source'>;
  prior: boolean;
  /** Whether to send back the yearly table (for `--out-dir`). */
  yearly: boolean;
}

/** A batch worker's answer for one scenario. */
export interface BatchWorkerReply {
  index: number;
  outcome: BatchOutcome;
  yearly?: { table: EnsembleTable; notes: string[]; ensembleNotes: string[] };
}

/** What the batch does with each assessed scenario's yearly table. */
export type OnYearly = (index: number, table: EnsembleTable, notes: string[], ensembleNotes: string[]) => void;

/**
 * Assesses the table's scenarios [from, to) with members from the calibrated set (or its prior with
 * `prior`, as `warmcast ensemble --prior`) on `threads` threads, one whole scenario per thread at a
 * time (reading, the central run and a one-thread ensemble): with 600 members a scenario is about a
 * quarter of a second of work, so scenarios, not members, are the unit that keeps both cores busy,
 * and the calling thread stays free to hand out work and write files. The rows are those of runBatch
 * in the calling thread (each scenario depends only on itself and the seed), in table order. Without
 * compiled worker files (under a TypeScript loader) or with one thread, runBatch runs them here.
 *
 * @param scenarios the whole table's scenarios; `from`/`to` the slice (a shard) to assess
 */
export async function runBatchThreads(
  scenarios: IamcScenario[],
  from: number,
  to: number,
  options: Omit<AssessOptions, 'source'> & { prior: boolean; load: LoadPathwayOptions; threads: number; onProgress?: (done: number, total: number) => void; onYearly?: OnYearly },
): Promise<BatchOutcome> {
  const { load, threads, onProgress, onYearly, prior, ...assess } = options;
  const count = to - from;
  const size = Math.min(threads, count);
  if (!compiled() || size <= 1) {
    const items = scenarios.slice(from, to).map((s, i) => batchScenario(s, from + i, load));
    return runBatch(items, {
      ...assess,
      source: memberSource(prior),
      onProgress,
      ...(onYearly ? { onAssessed: (s, result, notes) => onYearly(s.index, ensembleTable(result), notes, result.notes) } : {}),
    });
  }
  const workers = Array.from({ length: size }, () => new Worker(new URL('./batch-worker.js', import.meta.url)));
  const replies: BatchWorkerReply[] = [];
  let next = from;
  try {
    await Promise.all(
      workers.map(
        (worker) =>
          new Promise<void>((resolve, reject) => {
            const give = () => {
              if (next >= to) return resolve();
              const index = next++;
              const request: BatchWorkerRequest = { index, scenario: scenarios[index], load, options: assess, prior, yearly: onYearly !== undefined };
              worker.postMessage(request);
            };
            worker.on('message', (reply: BatchWorkerReply) => {
              replies.push(reply);
              if (reply.yearly && onYearly) onYearly(reply.index, reply.yearly.table, reply.yearly.notes, reply.yearly.ensembleNotes);
              onProgress?.(replies.length, count);
              give();
            });
            worker.on('error', reject);
            give();
          }),
      ),
    );
  } finally {
    await Promise.all(workers.map((w) => w.terminate()));
  }
  replies.sort((a, b) => a.index - b.index);
  return { rows: replies.flatMap((r) => r.outcome.rows), errors: replies.flatMap((r) => r.outcome.errors) };
}

/**
 * True when this module is the compiled JavaScript in dist/, beside the compiled batch-worker.js;
 * under vitest or another TypeScript loader it is a .ts file and the scenarios run in this thread.
 */
function compiled(): boolean {
  return import.meta.url.endsWith('.js');
}

import { InputError } from '../errors.js';
import type { BatchOutcome } from './run-batch.js';

/** The `format` member of a batch shard file. */
export const BATCH_SHARD_FORMAT = 'warmcast-batch-shard';
/** Version of the batch shard layout (2: rows carry categoryAgreement, which version 1 lacks and cannot be recomputed from). */
export const BATCH_SHARD_VERSION = 2;

/** What every shard of one batch must share: the table and the ensemble settings. */
export interface BatchSettings {
  /** The table as given and its SHA-256. */
  table: { path: string; sha256: string };
  /** Scenarios in the whole table. */
  scenarios: number;
  members: number;
  seed: number;
  thresholds: number[];
  baseline: [number, number];
  co2Formula: string;
  splice: boolean;
  /** The rule for emissions a scenario does not give (`--absent-emissions`), null when none was given. */
  absentEmissions?: unknown;
  /** Where the members come from (`calibrated set`, or its prior). */
  members_from?: string;
}

/** One shard of a batch: the scenarios [from, to) of the table's slice `index` of `count`. */
export interface BatchShard {
  settings: BatchSettings;
  shard: { index: number; count: number };
  outcome: BatchOutcome;
  /** Notes of the batch (table notes, ensemble conventions). */
  notes: string[];
}

/** A batch shard as JSON (rows and errors exactly: JSON numbers read back to the same doubles). */
export function batchShardToJson(shard: BatchShard): string {
  return JSON.stringify({ format: BATCH_SHARD_FORMAT, version: BATCH_SHARD_VERSION, ...shard }) + '\n';
}

/** Whether a file's text is a batch shard (rather than an ensemble shard). */
export function isBatchShardText(text: string): boolean {
  return text.slice(0, 200).includes(`"format":"${BATCH_SHARD_FORMAT}"`);
}

/**
 * Reads a batch shard file.
 * @throws InputError when it is not a batch shard of this version (an older one is named as such)
 */
export function batchShardFromJson(text: string, file: string): BatchShard {
  let data: Record<string, unknown>;
  try {
    data = JSON.parse(text) as Record<string, unknown>;
  } catch (e) {
    throw new InputError([{ file, code: 'input.bad-json', message: `must be JSON: ${(e as Error).message}`, expected: 'a shard file written by `warmcast batch --shard K/N --out NAME.json`' }]);
  }
  if (data.format === BATCH_SHARD_FORMAT && typeof data.version === 'number' && data.version < BATCH_SHARD_VERSION) {
    // The members are not kept in a shard, so an older shard's rows cannot be given their category agreement.
    throw new InputError([{ file, code: 'input.old-batch-shard', message: `is a batch shard of version ${data.version}, written by an earlier warmcast; this version merges shards of version ${BATCH_SHARD_VERSION} only (their rows carry category_agreement)`, expected: 'the shard rerun with this warmcast: `warmcast batch ... --shard K/N --out NAME.json`' }]);
  }
  if (data.format !== BATCH_SHARD_FORMAT || data.version !== BATCH_SHARD_VERSION) {
    throw new InputError([{ file, code: 'input.not-batch-shard', message: `must be a batch shard file of version ${BATCH_SHARD_VERSION}`, expected: 'a shard file written by `warmcast batch --shard K/N --out NAME.json` of this version' }]);
  }
  return data as unknown as BatchShard;
}

/**
 * Merges the shards of one batch into the outcome one whole batch gives: rows and errors in table
 * order. Every shard must share the settings (same table contents, members, seed, thresholds,
 * baseline, formula and splice) and the shard count, and each of 1..N must be present once.
 *
 * @throws InputError naming the file that disagrees, repeats a shard, or the shards missing
 */
export function mergeBatchShards(shards: { file: string; shard: BatchShard }[]): { settings: BatchSettings; outcome: BatchOutcome; notes: string[] } {
  const first = shards[0];
  const key = (s: BatchSettings) => JSON.stringify({ ...s, table: s.table.sha256 });
  const seen = new Map<number, string>();
  for (const { file, shard } of shards) {
    if (key(shard.settings) !== key(first.shard.settings) || shard.shard.count !== first.shard.shard.count) {
      throw new InputError([{ file, code: 'input.shard-mismatch', message: `must be a shard of the same batch as ${first.file} (same table contents, members, seed, thresholds, baseline and shard count)`, expected: 'shards written by one `warmcast batch ... --shard K/N` command line, K from 1 to N' }]);
    }
    const earlier = seen.get(shard.shard.index);
    if (earlier !== undefined) throw new InputError([{ file, code: 'input.shard-twice', message: `repeats shard ${shard.shard.index}/${shard.shard.count} of ${earlier}`, expected: 'each shard once' }]);
    seen.set(shard.shard.index, file);
  }
  const count = first.shard.shard.count;
  const missing = Array.from({ length: count }, (_, i) => i + 1).filter((i) => !seen.has(i));
  if (missing.length > 0) {
    throw new InputError([{ file: first.file, code: 'input.shards-missing', message: `the batch has ${count} shards; missing ${missing.map((i) => `${i}/${count}`).join(', ')}`, expected: 'every shard K/N, K from 1 to N' }]);
  }
  const ordered = [...shards].sort((a, b) => a.shard.shard.index - b.shard.shard.index);
  return {
    settings: first.shard.settings,
    outcome: {
      rows: ordered.flatMap((s) => s.shard.outcome.rows).sort((a, b) => a.index - b.index),
      errors: ordered.flatMap((s) => s.shard.outcome.errors).sort((a, b) => a.index - b.index),
    },
    notes: first.shard.notes,
  };
}

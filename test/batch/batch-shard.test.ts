import { describe, expect, it } from 'vitest';
import { BATCH_SHARD_VERSION, batchShardFromJson, batchShardToJson, isBatchShardText, mergeBatchShards, type BatchShard } from '../../src/batch/batch-shard.js';

const settings = { table: { path: 't.csv', sha256: 'ab' }, scenarios: 3, members: 10, seed: 1, thresholds: [1.5, 2], baseline: [1850, 1900] as [number, number], co2Formula: 'ar6', splice: true };
const row = (index: number) => ({ index, model: 'M', scenario: `S${index}` }) as unknown as BatchShard['outcome']['rows'][number];
const shard = (index: number, rows: number[], over: Partial<typeof settings> = {}): BatchShard => ({
  settings: { ...settings, ...over },
  shard: { index, count: 2 },
  outcome: { rows: rows.map(row), errors: [] },
  notes: [],
});

describe('batch shards', () => {
  it('round-trip through JSON and are told apart from ensemble shards', () => {
    const text = batchShardToJson(shard(1, [0]));
    expect(isBatchShardText(text)).toBe(true);
    expect(isBatchShardText('{"format":"warmcast-ensemble-shard"}')).toBe(false);
    expect(batchShardFromJson(text, 's.json')).toMatchObject(shard(1, [0]));
  });

  it('refuse a shard of an earlier version (its rows lack category_agreement), saying so', () => {
    const old = batchShardToJson(shard(1, [0])).replace(`"version":${BATCH_SHARD_VERSION}`, '"version":1');
    expect(BATCH_SHARD_VERSION).toBe(2);
    expect(isBatchShardText(old)).toBe(true);
    expect(() => batchShardFromJson(old, 'old.json')).toThrow(/^old\.json: is a batch shard of version 1, written by an earlier warmcast/);
  });

  it('merge in table order whatever the order of the files', () => {
    const merged = mergeBatchShards([{ file: 'b', shard: shard(2, [1, 2]) }, { file: 'a', shard: shard(1, [0]) }]);
    expect(merged.outcome.rows.map((r) => r.index)).toEqual([0, 1, 2]);
  });

  it('refuse shards of another batch, a repeated shard and a missing one, naming the file', () => {
    expect(() => mergeBatchShards([{ file: 'a', shard: shard(1, [0]) }, { file: 'b', shard: shard(2, [1], { seed: 2 }) }])).toThrow(/^b: must be a shard of the same batch as a/);
    expect(() => mergeBatchShards([{ file: 'a', shard: shard(1, [0]) }, { file: 'b', shard: shard(2, [1], { table: { path: 'x', sha256: 'cd' } }) }])).toThrow(/same table contents/);
    expect(() => mergeBatchShards([{ file: 'a', shard: shard(1, [0]) }, { file: 'b', shard: shard(1, [0]) }])).toThrow(/repeats shard 1\/2 of a/);
    expect(() => mergeBatchShards([{ file: 'a', shard: shard(1, [0]) }])).toThrow(/missing 2\/2/);
  });
});

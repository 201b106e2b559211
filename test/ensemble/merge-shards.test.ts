import { describe, expect, it } from 'vitest';
import { mergeShards, runEnsemble, shardMerger, type EnsembleOptions } from '../../src/ensemble/index.js';
import { InputError } from '../../src/errors.js';
import { syntheticInput } from './synthetic-input.js';

const input = syntheticInput(1800, 2100);
const options: EnsembleOptions = { members: 50, seed: 5, thresholds: [1.5], baseline: [1850, 1900], keepMembers: true };
const shard = async (index: number, count = 3, extra: Partial<EnsembleOptions> = {}) =>
  ({ file: `s${index}.json`, members: (await runEnsemble(input, { ...options, ...extra, shard: { index, count } })).members! });

describe('mergeShards', () => {
  it('mergeShards puts every shard\'s members in their places, in any order, and adds their redraws', async () => {
    const whole = (await runEnsemble(input, options)).members!;
    const merged = mergeShards([await shard(3), await shard(1), await shard(2)]);
    expect(Array.from(merged.warmingK)).toEqual(Array.from(whole.warmingK));
    expect(Array.from(merged.parameters.tcrK)).toEqual(Array.from(whole.parameters.tcrK));
    expect(merged.redraws).toBe(whole.redraws);
    expect(merged.shard).toBeUndefined();
  });

  it('mergeShards refuses missing, repeated and foreign shards and whole ensembles, listing each problem (InputError)', async () => {
    const [one, two, three] = [await shard(1), await shard(2), await shard(3)];
    const seed6 = { ...(await shard(3, 3, { seed: 6 })), file: 'seed6.json' };
    const otherThresholds = { ...(await shard(3, 3, { thresholds: [2] })), file: 't.json' };
    const ofFour = await shard(4, 4);
    expect(() => mergeShards([one, three])).toThrow(/shards 2 of 3 must also be given/);
    expect(() => mergeShards([one, two, three, { ...two, file: 'again.json' }])).toThrow(/again\.json: must not repeat shard 2\/3, already given by s2\.json/);
    expect(() => mergeShards([one, two, seed6])).toThrow(/seed6\.json: must come from the same ensemble as s1\.json; it differs in seed/);
    expect(() => mergeShards([one, two, otherThresholds])).toThrow(/differs in thresholds/);
    expect(() => mergeShards([one, two, three, ofFour])).toThrow(/must be one of 3 shards like s1\.json, but is shard 4\/4/);
    const whole = { file: 'whole.json', members: (await runEnsemble(input, options)).members! };
    expect(() => mergeShards([whole])).toThrow(/whole\.json: must be a shard/);
    expect(() => mergeShards([])).toThrow(InputError);
    const error = (() => {
      try {
        mergeShards([one, { ...one, file: 'x.json' }, { ...seed6, file: 'y.json' }]);
      } catch (e) {
        return e as InputError;
      }
    })();
    expect(error?.problems.map((p) => p.file)).toEqual(['x.json', 'y.json']);
  });

  it('shardMerger takes shards one at a time with the same result as mergeShards', async () => {
    const shards = [await shard(2), await shard(1), await shard(3)];
    const merger = shardMerger();
    for (const s of shards) merger.add(s);
    expect(Array.from(merger.finish().warmingK)).toEqual(Array.from(mergeShards(shards).warmingK));
  });
});

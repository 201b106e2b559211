import { describe, expect, it } from 'vitest';
import { mergeShards, runEnsemble, shardMerger, type EnsembleOptions } from '../../src/ensemble/index.js';
import { InputError } from '../../src/errors.js';
import { ensembleInputOf, syntheticInput, syntheticPathway } from './synthetic-input.js';

const syntheticInputOf = (formula: 'ar6' | 'log') => ensembleInputOf(syntheticPathway(1800, 2100), formula);

const input = syntheticInput(1800, 2100);
const options: EnsembleOptions = { members: 50, seed: 5, thresholds: [1.5], baseline: [1850, 1900], keepMembers: true };
const shard = async (index: number, count = 3, extra: Partial<EnsembleOptions> = {}) =>
  ({ file: `s${index}.json`, members: (await runEnsemble(input, { ...options, ...extra, shard: { index, count } })).members! });

describe('mergeShards', () => {
  it('mergeShards puts every shard\'s members in their places, in any order, and adds their redraws', async () => {
    const whole = (await runEnsemble(input, options)).members!;
    const merged = mergeShards([await shard(3), await shard(1), await shard(2)]);
    expect(Array.from(merged.warmingK)).toEqual(Array.from(whole.warmingK));
    expect(Array.from(merged.parameters.values.tcr_k!)).toEqual(Array.from(whole.parameters.values.tcr_k!));
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
    expect(() => mergeShards([one, two, seed6])).toThrow(/seed6\.json: must come from the same ensemble as s1\.json; it differs in --seed \(6, not 5\)$/);
    expect(() => mergeShards([one, two, otherThresholds])).toThrow(/differs in --thresholds \(2, not 1\.5\)$/);
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

  it('mergeShards names differences by the options that set them (--members, --co2-formula, --baseline, the pathway), never by internal field names', async () => {
    const [one, two] = [await shard(1, 2), await shard(2, 2)];
    const message = (other: { file: string; members: typeof one.members }) => {
      try {
        mergeShards([one, other]);
      } catch (e) {
        return (e as InputError).message;
      }
      return '';
    };
    const members = { ...(await shard(2, 2, { members: 60, seed: 6 })), file: 'm.json' };
    expect(message(members)).toBe('m.json: must come from the same ensemble as s1.json; it differs in --seed (6, not 5) and --members (60, not 50)');
    const log = { file: 'log.json', members: (await runEnsemble(syntheticInputOf('log'), { ...options, shard: { index: 2, count: 2 } })).members! };
    // The log formula changes the CO2 forcing too, but the message names only the option.
    expect(message(log)).toBe('log.json: must come from the same ensemble as s1.json; it differs in --co2-formula (log, not ar6)');
    const baseline = { ...(await shard(2, 2, { baseline: [1850, 1880] })), file: 'b.json' };
    expect(message(baseline)).toMatch(/differs in --baseline \(1850-1880, not 1850-1900\)$/);
    const other = syntheticInput(1800, 2100);
    other.forcing.byAgent.volcanic[150] -= 1;
    const pathway = { file: 'p.json', members: (await runEnsemble(other, { ...options, shard: { index: 2, count: 2 } })).members! };
    expect(message(pathway)).toBe('p.json: must come from the same ensemble as s1.json; it differs in the pathway (another file, or its contents differ)');
    const years = { file: 'y.json', members: (await runEnsemble(syntheticInput(1800, 2150), { ...options, shard: { index: 2, count: 2 } })).members! };
    expect(message(years)).toMatch(/differs in the pathway's years \(1800-2150, not 1800-2100\)$/);
    for (const text of [message(members), message(log), message(pathway), message(years)]) expect(text).not.toMatch(/membersTotal|co2Formula|inputChecksum|yearCount|firstYear/);
    expect(two.members.config).toEqual(one.members.config);
  });

  it('mergeShards keeps the pathway origin the shards record, refuses shards whose records disagree, and merges shards without one', async () => {
    const origin = { pathway: 'Synthetic', inputs: [{ path: '/a/synthetic.csv', sha256: 'ab'.repeat(32) }], notes: ['note one'] };
    const [one, two, three] = [await shard(1), await shard(2), await shard(3)];
    const withOrigin = (s: typeof one, o: typeof origin | undefined, file = s.file) => ({ file, members: { ...s.members, ...(o ? { origin: o } : {}) } });
    // Paths may differ between the machines that ran the shards; names, hashes and notes may not.
    const moved = { ...origin, inputs: [{ path: '/b/synthetic.csv', sha256: origin.inputs[0].sha256 }] };
    expect(mergeShards([withOrigin(one, origin), withOrigin(two, moved), withOrigin(three, origin)]).origin).toEqual(origin);
    expect(mergeShards([withOrigin(one, undefined), withOrigin(two, origin), withOrigin(three, undefined)]).origin).toEqual(origin);
    expect(mergeShards([one, two, three]).origin).toBeUndefined();
    const edited = { ...origin, inputs: [{ path: '/a/synthetic.csv', sha256: 'ef'.repeat(32) }] };
    expect(() => mergeShards([withOrigin(one, origin), withOrigin(two, edited, 'e.json'), withOrigin(three, origin)])).toThrow(
      /e\.json: must come from the same pathway as s1\.json; it was made from "Synthetic" \(synthetic\.csv sha256 efefefefefef…\), not "Synthetic" \(synthetic\.csv sha256 abababababab…\)/,
    );
    expect(() => mergeShards([withOrigin(one, origin), withOrigin(two, { ...origin, pathway: 'Other' }, 'n.json'), withOrigin(three, origin)])).toThrow(/n\.json: .* made from "Other"/);
    expect(() => mergeShards([withOrigin(one, origin), withOrigin(two, { ...origin, notes: ['note two'] }, 'o.json'), withOrigin(three, origin)])).toThrow(
      /o\.json: must come from the same pathway as s1\.json; its notes on how the pathway was read differ/,
    );
  });

  it('shardMerger takes shards one at a time with the same result as mergeShards', async () => {
    const shards = [await shard(2), await shard(1), await shard(3)];
    const merger = shardMerger();
    for (const s of shards) merger.add(s);
    expect(Array.from(merger.finish().warmingK)).toEqual(Array.from(mergeShards(shards).warmingK));
  });
});

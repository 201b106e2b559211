import { describe, expect, it } from 'vitest';
import { runEnsemble, SHARD_FORMAT, shardFileBytes, shardFromJson, shardToJson } from '../../src/ensemble/index.js';
import { InputError } from '../../src/errors.js';
import { syntheticInput } from './synthetic-input.js';

const input = syntheticInput(1750, 2100);
const origin = {
  pathway: 'Synthetic',
  inputs: [{ path: '/data/synthetic.csv', sha256: 'ab'.repeat(32) }, { path: '/opt/warmcast/pathways/history.csv', sha256: 'cd'.repeat(32) }],
  notes: ['interpolated linearly from 41 rows (10-year steps)', 'spliced onto bundled history at 2025'],
};
const members = (await runEnsemble(input, { members: 120, seed: 3, thresholds: [1.5, 2], baseline: [1850, 1900], shard: { index: 2, count: 4 } })).members!;

describe('shardToJson / shardFromJson', () => {
  it('shardFromJson(shardToJson(members)) restores every value bit for bit (Float64 bit patterns in base64)', () => {
    const back = shardFromJson(shardToJson(members), 'shard.json');
    expect(back.config).toEqual(members.config);
    expect(back.shard).toEqual({ index: 2, count: 4 });
    expect(back.memberStart).toBe(30);
    expect(back.memberCount).toBe(30);
    expect(back.redraws).toBe(members.redraws);
    expect(Buffer.from(back.warmingK.buffer).equals(Buffer.from(members.warmingK.buffer))).toBe(true);
    expect(Object.keys(back.parameters.values)).toEqual(Object.keys(members.parameters.values));
    for (const [key, values] of Object.entries(members.parameters.values)) expect(Array.from(back.parameters.values[key]!), key).toEqual(Array.from(values!));
  });

  it('shardFileBytes bounds the size of the written text from above (4/3 of 8 bytes per stored value, up to 24 parameters per member, 8 kB of description)', () => {
    const predicted = shardFileBytes(members.memberCount, members.config.yearCount);
    const warmingOnly = (members.memberCount * members.config.yearCount * 8 * 4) / 3;
    for (const text of [shardToJson(members), shardToJson({ ...members, origin })]) {
      expect(text.length).toBeLessThanOrEqual(predicted);
      expect(text.length).toBeGreaterThan(warmingOnly);
    }
  });

  it('shardToJson records the pathway origin (name, input files with SHA-256, notes) and shardFromJson reads it back; a file without it reads with none', () => {
    const text = shardToJson({ ...members, origin });
    expect(JSON.parse(text).pathway).toEqual({ name: origin.pathway, inputs: origin.inputs, notes: origin.notes });
    expect(shardFromJson(text, 'o.json').origin).toEqual(origin);
    expect(shardFromJson(shardToJson(members), 'plain.json').origin).toBeUndefined();
    const doc = JSON.parse(text);
    expect(() => shardFromJson(JSON.stringify({ ...doc, pathway: { ...doc.pathway, inputs: [{ path: 'a.csv', sha256: 'xyz' }] } }), 'p.json')).toThrow(/p\.json: key "pathway": must be \{ "name": text/);
    expect(() => shardFromJson(JSON.stringify({ ...doc, pathway: 'swift' }), 'q.json')).toThrow(/key "pathway"/);
  });

  it('shardFromJson rejects what is not a shard file, with InputError naming the file and the field', () => {
    expect(() => shardFromJson('{', 'a.json')).toThrow(InputError);
    expect(() => shardFromJson('{"format":"other"}', 'a.json')).toThrow(/a\.json: must be a warmcast ensemble shard file/);
    const doc = JSON.parse(shardToJson(members));
    expect(() => shardFromJson(JSON.stringify({ ...doc, version: 9 }), 'b.json')).toThrow(/must be shard format version 3/);
    expect(() => shardFromJson(JSON.stringify({ ...doc, warming_k: doc.warming_k.slice(0, 400) }), 'c.json')).toThrow(/key "warming_k": must hold 10530 Float64 values/);
    expect(() => shardFromJson(JSON.stringify({ ...doc, member_count: -1 }), 'd.json')).toThrow(/key "member_count": must be a whole number/);
    expect(() => shardFromJson(JSON.stringify({ ...doc, config: { ...doc.config, seed: 'x' } }), 'e.json')).toThrow(/config\.seed/);
    expect(doc.format).toBe(SHARD_FORMAT);
  });
});

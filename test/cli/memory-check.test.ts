import { mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { allocationError, checkEnsembleMemory, checkMergeMemory, type MemoryLimits } from '../../src/cli/memory-check.js';
import { ConfigError } from '../../src/errors.js';

/** A small machine: 4 GB of memory, Node 20's engine limits. */
const SMALL: MemoryLimits = { totalBytes: 4e9, maxArrayLength: 2 ** 32, maxStringLength: 2 ** 29 - 24 };
const run = { years: 401, emissionDriven: false };

describe('checkEnsembleMemory', () => {
  it('checkEnsembleMemory passes a run that fits and refuses one that does not, stating the estimate and a --shard K/N that fits', () => {
    // Every member-year is held (8 bytes): 100,000 members over 401 years take about 0.35 GB.
    expect(() => checkEnsembleMemory({ ...run, members: 100_000, count: 100_000 }, SMALL)).not.toThrow();
    const refuse = () => checkEnsembleMemory({ ...run, members: 1e9, count: 1e9 }, SMALL);
    expect(refuse).toThrow(ConfigError);
    expect(refuse).toThrow(/^--members 1000000000 over 401 years would need about 3\.\d+ TB of memory, more than this machine's 4 GB; run it in slices of at most \d+ members with --shard K\/N, N at least \d+/);
    // Merging a billion members holds 3.2 TB of warming: the message says so, and how many could be merged.
    expect(refuse).toThrow(/but merging all 1000000000 members would need about 3\.\d+ TB of memory, .* \(at most about \d+ members can be merged here\)$/);
  });

  it('checkEnsembleMemory refuses a shard whose file text would exceed the longest JavaScript string, and suggests more shards', () => {
    const shard = { ...run, members: 1_000_000, count: 200_000, shard: { index: 1, count: 5 } };
    expect(() => checkEnsembleMemory(shard, { ...SMALL, totalBytes: 1e12 })).toThrow(
      /^shard 1\/5 \(200000 of 1000000 members\) over 401 years would need a shard file of \d+ MB, more than the 537 MB a JavaScript string may hold; run it in slices of at most 1\d{5} members with --shard K\/N, N at least \d+/,
    );
  });

  it('checkEnsembleMemory refuses a run whose largest array would exceed the engine\'s typed-array length', () => {
    expect(() => checkEnsembleMemory({ ...run, members: 2e8, count: 2e8 }, { ...SMALL, totalBytes: 1e15 })).toThrow(/an array of 80200000000 values, more than the 4294967296 a JavaScript typed array may hold/);
  });

  it('checkMergeMemory refuses a merge of more member-years than the machine holds, saying how many members could be merged', () => {
    expect(() => checkMergeMemory(100_000, 401, 10_000, SMALL)).not.toThrow();
    expect(() => checkMergeMemory(10_000_000, 401, 10_000, SMALL)).toThrow(/^merging 10000000 members over 401 years would need about 3\d\.\d GB of memory, .* cannot be merged on this machine \(at most about \d+ members can\)$/);
  });
});

describe('allocationError', () => {
  it('allocationError turns engine allocation failures, also as plain Errors from worker threads, into ConfigError (exit 2), and leaves other errors alone', () => {
    for (const e of [new RangeError('Array buffer allocation failed'), new RangeError('Invalid typed array length: 4294967297'), new Error('Invalid string length'), Object.assign(new Error('Cannot create a string longer than 0x1fffffe8 characters'), { code: 'ERR_STRING_TOO_LONG' })]) {
      const mapped = allocationError(e, 'an ensemble of 5 members over 401 years');
      expect(mapped).toBeInstanceOf(ConfigError);
      expect(mapped!.exitCode).toBe(2);
      expect(mapped!.message).toMatch(/^an ensemble of 5 members over 401 years ran out of memory \(.+\); use fewer members, or run it in slices with --shard K\/N/);
    }
    expect(allocationError(new RangeError('table column names must be distinct'), 'x')).toBeUndefined();
    expect(allocationError(new TypeError('x is not a function'), 'x')).toBeUndefined();
  });
});

describe('warmcast ensemble and merge refuse runs too large for the machine (exit 2, before allocating)', () => {
  it('ensemble swift --members 1e12 exits 2 with the memory estimate and a --shard suggestion instead of an internal error', async () => {
    const io = captureIo();
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-mem-'));
    expect(await main(['ensemble', 'swift', '--members', '1e12', '--out', join(dir, 'e.csv')], io)).toBe(2);
    expect(io.err).toMatch(/^warmcast: --members 1000000000000 over 401 years would need about 3\d{3} TB of memory, more than this machine's .*--shard K\/N/);
    expect(io.err).not.toMatch(/internal error/);
    expect(readdirSync(dir)).toEqual([]);
  });

  it('merge of shards that claim a trillion members exits 2 at the first shard, before allocating the merged ensemble', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-mem-'));
    expect(await main(['ensemble', 'swift', '--members', '20', '--shard', '1/2', '--out', join(dir, 's1.json')], captureIo())).toBe(0);
    const doc = JSON.parse(readFileSync(join(dir, 's1.json'), 'utf8'));
    doc.config.members_total = 1e12;
    writeFileSync(join(dir, 's1.json'), JSON.stringify(doc));
    const io = captureIo();
    expect(await main(['merge', join(dir, 's1.json'), '--out', join(dir, 'm.csv')], io)).toBe(2);
    expect(io.err).toMatch(/^warmcast: merging 1000000000000 members over 401 years would need about .* TB of memory/);
    expect(readdirSync(dir)).toEqual(['s1.json']);
  });
});

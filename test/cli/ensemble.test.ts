import { mkdtempSync, readFileSync, readdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

const tmp = () => mkdtempSync(join(tmpdir(), 'warmcast-ens-'));

describe('warmcast ensemble and merge', () => {
  it('writes DESIGN.md columns and prints crossing probabilities for 2050 and 2100 and the median crossing year', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--members', '200', '--seed', '7', '--out', join(dir, 'e.csv')], io)).toBe(0);
    const header = readFileSync(join(dir, 'e.csv'), 'utf8').split('\n')[0];
    expect(header).toBe('year,warming_p05_k,warming_p17_k,warming_p50_k,warming_p83_k,warming_p95_k,prob_above_1.5,prob_above_2,prob_above_3');
    expect(io.out).toMatch(/1\.5 K \(20-year mean\): probability of crossing by 2050 \d+ %, by 2100 \d+ %; median crossing year \d{4}/);
    expect(io.out).toMatch(/unphysical draws redrawn/);
    const meta = JSON.parse(readFileSync(join(dir, 'e.meta.json'), 'utf8'));
    expect(meta.seed).toBe(7);
    // Percentiles ordered in every year (a property of order statistics).
    const rows = Papa.parse<string[]>(readFileSync(join(dir, 'e.csv'), 'utf8').trim()).data.slice(1);
    for (const r of rows) {
      const p = r.slice(1, 6).map(Number);
      for (let k = 1; k < 5; k++) expect(p[k]).toBeGreaterThanOrEqual(p[k - 1]);
    }
  });

  it('gives byte-identical output for the same seed, and shard-and-merge equals one run bit for bit', async () => {
    const dir = tmp();
    const run = (args: string[]) => main(['ensemble', 'delayed', '--members', '150', '--seed', '11', '--no-chart', ...args], captureIo());
    expect(await run(['--out', join(dir, 'a.csv')])).toBe(0);
    expect(await run(['--out', join(dir, 'b.csv')])).toBe(0);
    for (const k of [1, 2, 3]) expect(await run(['--shard', `${k}/3`, '--out', join(dir, `s${k}.json`)])).toBe(0);
    const io = captureIo();
    expect(await main(['merge', join(dir, 's3.json'), join(dir, 's1.json'), join(dir, 's2.json'), '--out', join(dir, 'm.csv'), '--no-chart'], io)).toBe(0);
    const a = readFileSync(join(dir, 'a.csv'));
    expect(readFileSync(join(dir, 'b.csv')).equals(a)).toBe(true);
    expect(readFileSync(join(dir, 'm.csv')).equals(a)).toBe(true);
  });

  it('ensemble --baseline 1995-2014 names thresholds "above the 1995-2014 mean" and carries the baseline note on the terminal and in the files', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['ensemble', 'delayed', '--members', '50', '--baseline', '1995-2014', '--no-chart', '--out', join(dir, 'e.csv')], io)).toBe(0);
    expect(io.out).toMatch(/^  1\.5 K above the 1995-2014 mean \(20-year mean\): probability of crossing/m);
    expect(io.out).not.toMatch(/^  1\.5 K \(20-year mean\)/m);
    const note = 'IPCC AR6 global warming levels (1.5 K, 2 K) are relative to 1850-1900; with the 1995-2014 baseline';
    expect(io.out).toContain(`note: ${note}`);
    expect(JSON.parse(readFileSync(join(dir, 'e.meta.json'), 'utf8')).notes.join('\n')).toContain(note);
    const plain = captureIo();
    expect(await main(['ensemble', 'delayed', '--members', '50', '--no-chart'], plain)).toBe(0);
    expect(plain.out).not.toContain('global warming levels');
  });

  it('refuses to merge an incomplete set of shards with exit 2', async () => {
    const dir = tmp();
    expect(await main(['ensemble', 'swift', '--members', '40', '--seed', '3', '--shard', '1/2', '--out', join(dir, 's1.json')], captureIo())).toBe(0);
    const io = captureIo();
    expect(await main(['merge', join(dir, 's1.json'), '--out', join(dir, 'm.csv')], io)).toBe(2);
    expect(readdirSync(dir)).toEqual(['s1.json']);
  });

  it('rejects a malformed --shard with exit 2', async () => {
    const io = captureIo();
    expect(await main(['ensemble', 'swift', '--shard', '4/3'], io)).toBe(2);
    expect(io.err).toMatch(/K\/N/);
  });
});

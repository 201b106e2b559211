import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { verifyCommand } from '../../src/cli/verify.js';
import { WarmcastError } from '../../src/errors.js';
import { closeTo } from '../../src/verify/index.js';

const HEADER = ['check', 'source', 'published', 'warmcast', 'tolerance', 'pass'];

describe('warmcast verify', () => {
  const dir = mkdtempSync(join(tmpdir(), 'warmcast-verify-'));

  it('prints the table check, source, published, warmcast, tolerance, pass and exits 0 when every check passes; --out writes .csv, .md and .json with the same columns', async () => {
    const io = captureIo(dir);
    expect(await main(['verify', '--out', 'v.csv'], io)).toBe(0);
    expect(io.out.split('\n')[0].split(/\s{2,}/)).toEqual(HEADER);
    expect(io.out).toMatch(/(\d+) of \1 checks pass/);
    const csv = readFileSync(join(dir, 'v.csv'), 'utf8').split('\n');
    expect(csv[0]).toBe(HEADER.join(','));
    expect(csv.filter((l) => l.endsWith(',yes')).length).toBe(csv.length - 2);
    expect(JSON.parse(readFileSync(join(dir, 'v.meta.json'), 'utf8')).tool).toBe('warmcast');

    expect(await main(['verify', '--out', 'v.json'], captureIo(dir))).toBe(0);
    const doc = JSON.parse(readFileSync(join(dir, 'v.json'), 'utf8'));
    expect(doc.columns).toEqual(HEADER);
    expect(doc.rows.every((r: Record<string, string>) => r.pass === 'yes')).toBe(true);

    expect(await main(['verify', '--out', 'v.md'], captureIo(dir))).toBe(0);
    expect(readFileSync(join(dir, 'v.md'), 'utf8')).toContain(`| ${HEADER[0]} `);
  }, 120_000);

  it('exits 1 naming the failed check when any check fails (the table is still printed)', async () => {
    const io = captureIo(dir);
    const checks = [
      { id: 'good', run: () => [closeTo('agrees', 'test', 1, 1, 0.1, 'K', 2)] },
      { id: 'bad', run: () => [closeTo('disagrees', 'test', 2, 1, 0.1, 'K', 2)] },
    ];
    const run = verifyCommand(io, checks).exitOverride().parseAsync([], { from: 'user' });
    await expect(run).rejects.toSatisfy((e: unknown) => e instanceof WarmcastError && e.exitCode === 1 && /1 of 2 published checks failed: disagrees/.test(e.message));
    expect(io.out).toMatch(/agrees .* yes/);
    expect(io.out).toMatch(/disagrees .* no/);
  });

  it('refuses an --out extension it does not write, with exit 2, before running the checks', async () => {
    const io = captureIo(dir);
    // A table of checks has no chart: every format of the output registry but .svg.
    expect(await main(['verify', '--out', 'v.svg'], io)).toBe(2);
    expect(io.out).toBe('');
    expect(io.err).toMatch(/--out v.svg: the extension must be one of \.csv, \.json, \.md, \.html, \.xlsx/);
  });
});

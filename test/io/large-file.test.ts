/**
 * Opt-in (set WARMCAST_LARGE_TESTS=1): a pathway file of about 200 MB, well past MAX_PATHWAY_BYTES
 * (64 MiB), generated on the fly in a temporary folder and removed afterwards (never committed). The
 * reader must refuse it with a clear input.too-large error naming the file and the limit, before
 * reading it: so quickly, and without the resident set growing by anything near the file's size.
 *
 *   WARMCAST_LARGE_TESTS=1 npx vitest run test/io/large-file.test.ts
 */
import { closeSync, existsSync, mkdtempSync, openSync, readdirSync, rmSync, statSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { InputError } from '../../src/errors.js';
import { loadPathway, MAX_PATHWAY_BYTES, readTextFile } from '../../src/io/index.js';

/** Target size: about 200 MB (3 times the limit). */
const TARGET_BYTES = 200_000_000;
/**
 * Allowed growth of the resident set while the file is refused: 32 MiB, half the limit (common
 * practice, no source). Reading the file would add at least its 200 MB.
 */
const RSS_GROWTH_LIMIT = 32 * 1024 * 1024;

describe.skipIf(!process.env.WARMCAST_LARGE_TESTS)('a 200 MB pathway file (opt-in: WARMCAST_LARGE_TESTS=1)', () => {
  let dir = '';
  let big = '';

  beforeAll(() => {
    dir = mkdtempSync(join(tmpdir(), 'warmcast-large-'));
    big = join(dir, 'huge.csv');
    // Valid rows (decimal years 1000-2999, two columns), written in 1 MB chunks so the file never sits in memory.
    const fd = openSync(big, 'w');
    try {
      writeSync(fd, '# name: huge\nyear,co2_ppm,ch4_ppb\n');
      // Lines are 26 or 27 bytes, so at most TARGET_BYTES / 26 rows: the years stay within 1000-2999.
      const step = 1999 / Math.ceil(TARGET_BYTES / 26);
      let written = 0;
      let chunk: string[] = [];
      for (let i = 0; written < TARGET_BYTES; i++) {
        const line = `${(1000 + i * step).toFixed(7)},${(278.3 + (i % 1000) * 0.1).toFixed(2)},${(729.2 + (i % 500)).toFixed(1)}`;
        chunk.push(line);
        written += line.length + 1;
        if (chunk.length === 20_000) {
          writeSync(fd, chunk.join('\n') + '\n');
          chunk = [];
        }
      }
      if (chunk.length > 0) writeSync(fd, chunk.join('\n') + '\n');
    } finally {
      closeSync(fd);
    }
  }, 120_000);

  afterAll(() => {
    if (dir) rmSync(dir, { recursive: true, force: true });
  });

  it('the generated file is about 200 MB, past MAX_PATHWAY_BYTES', () => {
    const size = statSync(big).size;
    expect(size).toBeGreaterThanOrEqual(TARGET_BYTES);
    expect(size).toBeGreaterThan(MAX_PATHWAY_BYTES);
  });

  it('readTextFile(200 MB file) throws InputError input.too-large naming the file, the limit and the size, quickly and without reading it', () => {
    const rssBefore = process.memoryUsage().rss;
    const start = performance.now();
    let error: unknown;
    try {
      readTextFile(big);
    } catch (e) {
      error = e;
    }
    const ms = performance.now() - start;
    const growth = process.memoryUsage().rss - rssBefore;
    expect(error).toBeInstanceOf(InputError);
    const e = error as InputError;
    expect(e.code).toBe('input.too-large');
    expect(e.exitCode).toBe(2);
    expect(e.message).toContain(big);
    expect(e.message).toMatch(/must be at most 64 MiB/);
    expect(e.message).toMatch(new RegExp(`this file is ${(statSync(big).size / 1024 / 1024).toFixed(1)} MiB`));
    // A stat is a fraction of a millisecond; reading and decoding 200 MB takes far longer (common practice, no source).
    expect(ms).toBeLessThan(1000);
    expect(growth).toBeLessThan(RSS_GROWTH_LIMIT);
  });

  it('loadPathway(200 MB file) throws the same input.too-large error', () => {
    expect(() => loadPathway(big)).toThrow(/must be at most 64 MiB/);
  });

  it('warmcast run FILE --out X.csv exits 2 with the message and writes nothing', async () => {
    const out = join(dir, 'out.csv');
    const io = captureIo();
    const rssBefore = process.memoryUsage().rss;
    expect(await main(['run', big, '--out', out], io)).toBe(2);
    expect(process.memoryUsage().rss - rssBefore).toBeLessThan(RSS_GROWTH_LIMIT);
    expect(io.err).toContain(`${big}: must be at most 64 MiB`);
    expect(io.err).not.toMatch(/\n\s+at \S/);
    expect(existsSync(out)).toBe(false);
    expect(readdirSync(dir)).toEqual(['huge.csv']);
  });
});

/**
 * writeOutput through the commands that write a CSV with a `.meta.json` provenance sidecar (run,
 * compare, ensemble, merge): the two files land together or not at all.
 */
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { tempDirs } from './cli-harness.js';

const tmp = tempDirs('output');

/** Commands writing `--out <dir>/out.csv`; the merge case first writes its shard into `dir`. */
const COMMANDS: [string, (dir: string) => Promise<string[]>][] = [
  ['run swift', async () => ['run', 'swift', '--no-chart']],
  ['compare steady swift', async () => ['compare', 'steady', 'swift', '--no-chart']],
  ['ensemble swift', async () => ['ensemble', 'swift', '--members', '20', '--seed', '3', '--no-chart']],
  ['merge', async (dir) => {
    const shard = join(dir, 'shard.json');
    expect(await main(['ensemble', 'swift', '--members', '20', '--seed', '3', '--shard', '1/1', '--out', shard], captureIo())).toBe(0);
    return ['merge', shard, '--no-chart'];
  }],
];

describe('writeOutput: a CSV and its .meta.json sidecar are written all-or-nothing', () => {
  for (const [name, argsIn] of COMMANDS) {
    it(`${name} --out out.csv with out.meta.json a folder: exit 2 naming the sidecar, no out.csv, no temporary file`, async () => {
      const dir = tmp();
      const args = await argsIn(dir);
      mkdirSync(join(dir, 'out.meta.json'));
      const before = readdirSync(dir).sort();
      const io = captureIo();
      expect(await main([...args, '--out', join(dir, 'out.csv')], io)).toBe(2);
      expect(io.err).toBe(`warmcast: cannot write ${join(dir, 'out.meta.json')}: it is a folder\n`);
      expect(readdirSync(dir).sort()).toEqual(before);
    });
  }

  it('run swift --out out.csv over an existing out.csv whose sidecar is a folder leaves the old out.csv as it was', async () => {
    const dir = tmp();
    writeFileSync(join(dir, 'out.csv'), 'year,warming_k\n2030,9\n');
    mkdirSync(join(dir, 'out.meta.json'));
    expect(await main(['run', 'swift', '--no-chart', '--out', join(dir, 'out.csv')], captureIo())).toBe(2);
    expect(readFileSync(join(dir, 'out.csv'), 'utf8')).toBe('year,warming_k\n2030,9\n');
    expect(readdirSync(dir).sort()).toEqual(['out.csv', 'out.meta.json']);
  });

  it('run FILE --out X.csv whose sidecar X.meta.json is the pathway itself: refused before out.csv is written', async () => {
    const dir = tmp();
    const input = join(dir, 'x.meta.json');
    writeFileSync(input, 'year,co2_ppm\n2025,425\n2100,500\n');
    const io = captureIo();
    expect(await main(['run', input, '--no-chart', '--out', join(dir, 'x.csv')], io)).toBe(2);
    expect(io.err).toMatch(/refusing to write .*x\.meta\.json: it is an input of this run/);
    expect(readdirSync(dir)).toEqual(['x.meta.json']);
  });
});

describe('an output file that replaces an existing one', () => {
  it('run --out says which files replaced existing ones, and says nothing extra for new files', async () => {
    const dir = tmp();
    const out = join(dir, 'mine.csv');
    const first = captureIo();
    expect(await main(['run', 'swift', '--out', out, '--no-chart'], first)).toBe(0);
    expect(first.err).toBe(`wrote ${out}\nwrote ${join(dir, 'mine.meta.json')}\n`);
    writeFileSync(out, 'my own table\n');
    const again = captureIo();
    expect(await main(['run', 'swift', '--out', out, '--no-chart'], again)).toBe(0);
    expect(again.err).toBe(`wrote ${out} (replaced the existing file)\nwrote ${join(dir, 'mine.meta.json')} (replaced the existing file)\n`);
  });
});


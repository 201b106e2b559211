/**
 * The shared command-line options (src/cli/options.ts) as every command shows and reads them,
 * in-process through main(argv, captureIo()).
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

const roots: string[] = [];
afterAll(() => {
  for (const dir of roots) rmSync(dir, { recursive: true, force: true });
});

async function run(argv: string[]): Promise<{ code: number; out: string; err: string }> {
  const io = captureIo();
  const code = await main(argv, io);
  return { code, out: io.out, err: io.err };
}

/** The help entry of `flag` (its lines up to the next option), with the line wrapping undone. */
async function helpEntry(command: string, flag: string): Promise<string> {
  const { code, out } = await run([command, '--help']);
  expect(code).toBe(0);
  const entry = new RegExp(`^  ${flag} .*(?:\\n {6,}.*)*`, 'm').exec(out);
  if (!entry) return expect.fail(`${command} --help has no ${flag}`);
  return entry[0].replace(/\s+/g, ' ');
}

describe('help shows each default in the form the option accepts', () => {
  for (const command of ['run', 'compare', 'ensemble']) {
    it(`${command} --help: --baseline (default: 1850-1900)`, async () => {
      expect(await helpEntry(command, '--baseline')).toContain('(default: 1850-1900)');
    });
  }

  it('compare --help: --thresholds (default: 1.5,2); ensemble --help: --thresholds (default: 1.5,2,3)', async () => {
    expect(await helpEntry('compare', '--thresholds')).toContain('(default: 1.5,2)');
    expect(await helpEntry('ensemble', '--thresholds')).toContain('(default: 1.5,2,3)');
  });

  for (const command of ['run', 'compare', 'ensemble', 'merge', 'calibrate']) {
    it(`${command} --help: --co2-formula shows default: ar6`, async () => {
      expect(await helpEntry(command, '--co2-formula')).toContain('(choices: "ar6", "log", default: ar6)');
    });
  }

  it('the defaults as shown are accepted back: run --baseline 1850-1900 and ensemble --thresholds 1.5,2,3 exit 0', async () => {
    expect((await run(['run', 'steady', '--baseline', '1850-1900', '--to', '1900', '--no-chart'])).code).toBe(0);
    expect((await run(['ensemble', 'steady', '--members', '2', '--thresholds', '1.5,2,3', '--no-chart'])).code).toBe(0);
  });

  it('a co2_formula in the --params file still applies when --co2-formula is not given (the shown default is not forced on it)', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-options-'));
    roots.push(dir);
    const file = join(dir, 'p.json');
    writeFileSync(file, '{ "co2_formula": "log" }');
    expect(JSON.parse((await run(['calibrate', '--params', file])).out).co2_formula).toBe('log');
    expect(JSON.parse((await run(['calibrate', '--params', file, '--co2-formula', 'ar6'])).out).co2_formula).toBe('ar6');
    expect((await run(['run', 'steady', '--params', file, '--to', '1900', '--no-chart'])).out).toContain('CO2 forcing log');
  });
});

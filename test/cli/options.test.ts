/**
 * The shared command-line options (src/cli/options.ts): their coercers, and how every command shows
 * and reads them, in-process through main(argv, captureIo()).
 */
import { InvalidArgumentError } from 'commander';
import { writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { numberListOption, numberOption, wholeNumberOption, yearOption } from '../../src/cli/options.js';
import { runCli, tempDirs } from './cli-harness.js';

/** Texts that JavaScript's Number() reads as a number but that are not decimal numbers. */
const NOT_DECIMAL = ['', ' ', '\t', '0x10', '0X1f', '0b11', '0o7', 'Infinity', '-Infinity', '1_000', '1,5', '2.5.1', 'e3', '1e'];

describe('option coercers', () => {
  it('wholeNumberOption accepts decimal digits, exact exponent notation (1e6) and surrounding spaces', () => {
    const members = wholeNumberOption('--members', 1);
    expect(members('2000')).toBe(2000);
    expect(members('1e6')).toBe(1_000_000);
    expect(members('2.5e3')).toBe(2500);
    expect(members(' 16 ')).toBe(16);
    expect(wholeNumberOption('--seed', 0)('0')).toBe(0);
  });

  it('wholeNumberOption refuses hexadecimal, binary, octal, empty, blank, fractional, too small and unsafe values', () => {
    const members = wholeNumberOption('--members', 1);
    for (const text of [...NOT_DECIMAL, '1.5', '0', '-3', '1e300']) {
      expect(() => members(text), JSON.stringify(text)).toThrow(InvalidArgumentError);
    }
    expect(() => wholeNumberOption('--seed', 0)('')).toThrow(/--seed must be a whole number of at least 0 in decimal digits/);
  });

  it('numberOption, yearOption and numberListOption accept decimal text and refuse the same non-decimal texts', () => {
    expect(numberOption('--ecs')('4.5')).toBe(4.5);
    expect(numberOption('--rtol')('1e-10')).toBe(1e-10);
    expect(numberOption('--x')('-.5')).toBe(-0.5);
    expect(yearOption('2100')).toBe(2100);
    expect(numberListOption('--thresholds')('1.5, 2,3')).toEqual([1.5, 2, 3]);
    for (const text of NOT_DECIMAL) {
      expect(() => numberOption('--ecs')(text), JSON.stringify(text)).toThrow(InvalidArgumentError);
      expect(() => yearOption(text), JSON.stringify(text)).toThrow(InvalidArgumentError);
      // "1,5" is a list of two numbers.
      if (text !== '1,5') expect(() => numberListOption('--thresholds')(text), JSON.stringify(text)).toThrow(InvalidArgumentError);
    }
    expect(() => yearOption('0x7D0')).toThrow(/must be a year/);
    expect(() => numberListOption('--thresholds')('1.5,0x2')).toThrow(/decimal numbers separated by commas/);
    expect(() => numberListOption('--thresholds')('1.5,,2')).toThrow(InvalidArgumentError);
  });
});

describe('commands refuse non-decimal numbers with exit 2', () => {
  const cases: string[][] = [
    ['ensemble', 'swift', '--seed', ''],
    ['ensemble', 'swift', '--members', '0x10'],
    ['ensemble', 'swift', '--members', ' '],
    ['ensemble', 'swift', '--thresholds', '0x2'],
    ['run', 'swift', '--to', '0x834'],
    ['run', 'swift', '--rtol', ''],
    ['compare', 'steady', 'swift', '--members', '0x10'],
    ['compare', 'steady', 'swift', '--seed', ''],
  ];
  for (const argv of cases) {
    it(`${argv.map((a) => (a === '' || a.trim() === '' ? JSON.stringify(a) : a)).join(' ')} exits 2 naming the option`, async () => {
      const io = captureIo();
      expect(await main([...argv, '--no-chart'], io)).toBe(2);
      expect(io.err).toContain(`${argv[argv.length - 2]} <`);
      expect(io.err).toMatch(/decimal|must be a year/);
      expect(io.out).toBe('');
    });
  }
});

const tmp = tempDirs('options');
const run = runCli;

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

  for (const command of ['run', 'compare', 'ensemble', 'calibrate']) {
    it(`${command} --help: --co2-formula shows default: ar6`, async () => {
      expect(await helpEntry(command, '--co2-formula')).toContain('(choices: "ar6", "log", default: ar6)');
    });
  }

  it('the defaults as shown are accepted back: run --baseline 1850-1900 and ensemble --thresholds 1.5,2,3 exit 0', async () => {
    expect((await run(['run', 'steady', '--baseline', '1850-1900', '--to', '1900', '--no-chart'])).code).toBe(0);
    expect((await run(['ensemble', 'steady', '--members', '2', '--thresholds', '1.5,2,3', '--no-chart'])).code).toBe(0);
  });

  it('a co2_formula in the --params file still applies when --co2-formula is not given (the shown default is not forced on it)', async () => {
    const dir = tmp();
    const file = join(dir, 'p.json');
    writeFileSync(file, '{ "co2_formula": "log" }');
    expect(JSON.parse((await run(['calibrate', '--params', file])).out).co2_formula).toBe('log');
    expect(JSON.parse((await run(['calibrate', '--params', file, '--co2-formula', 'ar6'])).out).co2_formula).toBe('ar6');
    expect((await run(['run', 'steady', '--params', file, '--to', '1900', '--no-chart'])).out).toContain('CO2 forcing log');
  });
});

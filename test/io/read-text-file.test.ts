import { mkdtempSync, rmSync, truncateSync, writeFileSync, chmodSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError, type InputProblem } from '../../src/errors.js';
import { MAX_PATHWAY_BYTES, readTextFile } from '../../src/io/read-text-file.js';

const bad = (name: string) => fileURLToPath(new URL(`../fixtures/bad/${name}`, import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'warmcast-read-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

function problemOf(path: string, file?: string): InputProblem {
  try {
    readTextFile(path, file);
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).problems[0];
  }
  return expect.fail('expected an InputError');
}

describe('readTextFile', () => {
  it('readTextFile(bad/not-utf8.csv) points at line 2, where a Latin-1 byte (0xFC, "u-umlaut") sits', () => {
    expect(problemOf(bad('not-utf8.csv'), 'bad/not-utf8.csv')).toEqual({
      file: 'bad/not-utf8.csv', line: 2, code: 'input.not-utf8',
      message: 'must be UTF-8 text; this line holds a byte that is not UTF-8 (Latin-1 or Windows-1252?)',
      expected: 'the file saved as "CSV UTF-8"',
    });
  });

  it('readTextFile(bad/utf16.csv) recognises the UTF-16 byte-order mark FF FE (Unicode standard, ch. 23.8)', () => {
    expect(problemOf(bad('utf16.csv'), 'bad/utf16.csv')).toEqual({
      file: 'bad/utf16.csv', line: 1, code: 'input.not-utf8',
      message: 'must be UTF-8 text; this file is UTF-16', expected: 'the file saved as "CSV UTF-8"',
    });
  });

  it('readTextFile keeps the text of a UTF-8 file, multi-byte characters included', () => {
    const path = join(dir, 'ok.csv');
    writeFileSync(path, '# name: Übergang – 2050\nyear,co2_ppm\n2030,440\n');
    expect(readTextFile(path)).toBe('# name: Übergang – 2050\nyear,co2_ppm\n2030,440\n');
  });

  it('readTextFile refuses a missing file, a folder, and a file over 64 MiB', () => {
    expect(problemOf(join(dir, 'nope.csv'), 'nope.csv').code).toBe('input.not-found');
    expect(problemOf(dir, 'folder')).toEqual({
      file: 'folder', code: 'input.is-directory', message: 'must be a file, not a folder', expected: 'a CSV file',
    });
    const big = join(dir, 'big.csv');
    writeFileSync(big, '');
    truncateSync(big, MAX_PATHWAY_BYTES + 1); // sparse: costs no disk space
    expect(problemOf(big, 'big.csv')).toEqual({
      file: 'big.csv', code: 'input.too-large',
      message: 'must be at most 64 MiB to be read as a pathway (this file is 64.0 MiB)',
      expected: 'a pathway CSV file of at most 64 MiB',
    });
  });

  it.skipIf(process.getuid?.() === 0)('readTextFile reports a file without read permission as unreadable', () => {
    const path = join(dir, 'locked.csv');
    writeFileSync(path, 'year,co2_ppm\n');
    chmodSync(path, 0o000);
    expect(problemOf(path).code).toBe('input.unreadable');
  });
});

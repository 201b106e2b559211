import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { readCalibratedSet } from '../../src/io/read-calibrated-set.js';

describe('readCalibratedSet', () => {
  it('reads the bundled set with its SHA-256', () => {
    const set = readCalibratedSet();
    expect(set.count).toBeGreaterThanOrEqual(1000);
    expect(set.sha256).toMatch(/^[0-9a-f]{64}$/);
  });

  it('names the file and line of broken JSON', () => {
    const file = join(mkdtempSync(join(tmpdir(), 'wc-set-')), 'set.json');
    writeFileSync(file, '{\n "format": "x",\n "members": [1,,2]\n}\n');
    try {
      readCalibratedSet(file);
      expect.fail('no error');
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      expect((e as InputError).problems[0]).toMatchObject({ file, line: 3 });
    }
  });
});

import { mkdtempSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { unreadableReason } from '../../src/cli/unreadable-reason.js';

const thrown = (read: () => unknown): unknown => {
  try {
    read();
  } catch (e) {
    return e;
  }
  throw new Error('expected the read to fail');
};

describe('unreadableReason', () => {
  it('unreadableReason says in words why readFileSync failed: a missing file, a folder', () => {
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-unreadable-'));
    expect(unreadableReason(thrown(() => readFileSync(join(dir, 'nope.json'))))).toBe('does not exist');
    expect(unreadableReason(thrown(() => readFileSync(join(dir, 'nope', 'x.json'))))).toBe('does not exist');
    expect(unreadableReason(thrown(() => readFileSync(dir)))).toBe('is a folder, not a file');
    expect(unreadableReason(Object.assign(new Error('x'), { code: 'EIO' }))).toBe('cannot be read (EIO)');
  });
});

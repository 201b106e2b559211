import * as fs from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeEach, describe, expect, it, vi } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { writeFileAtomic } from '../../src/io/write-file-atomic.js';

// writeSync is wrapped so one test can make the disk "fail" half-way through a write; every other
// call goes to the real function.
vi.mock('node:fs', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs')>();
  return { ...real, writeSync: vi.fn(real.writeSync) };
});

const realFs = await vi.importActual<typeof import('node:fs')>('node:fs');
const dir = fs.mkdtempSync(join(tmpdir(), 'warmcast-atomic-'));
afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));
let case_ = 0;
let folder = '';
beforeEach(() => {
  folder = join(dir, `case-${case_++}`);
  fs.mkdirSync(folder);
});

function configErrorOf(f: () => void): ConfigError {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(ConfigError);
    expect((e as ConfigError).exitCode).toBe(2);
    return e as ConfigError;
  }
  return expect.fail('expected a ConfigError');
}

describe('writeFileAtomic', () => {
  it('writeFileAtomic writes the content and leaves no temporary file', () => {
    const target = join(folder, 'out.csv');
    writeFileAtomic(target, 'year,warming_k\n2030,1.5\n');
    expect(fs.readFileSync(target, 'utf8')).toBe('year,warming_k\n2030,1.5\n');
    expect(fs.readdirSync(folder)).toEqual(['out.csv']);
  });

  it('writeFileAtomic replaces an existing file whole and keeps its permission bits', () => {
    const target = join(folder, 'out.csv');
    fs.writeFileSync(target, 'old');
    fs.chmodSync(target, 0o640);
    writeFileAtomic(target, Uint8Array.of(0x6e, 0x65, 0x77));
    expect(fs.readFileSync(target, 'utf8')).toBe('new');
    expect(fs.statSync(target).mode & 0o777).toBe(0o640);
    expect(fs.readdirSync(folder)).toEqual(['out.csv']);
  });

  it('writeFileAtomic interrupted mid-write leaves no file and no temporary file', () => {
    const target = join(folder, 'out.csv');
    const content = 'x'.repeat(100_000);
    let seenDuringWrite: string[] = [];
    vi.mocked(fs.writeSync).mockImplementationOnce(((fd: number, buffer: Uint8Array, offset: number, length: number) => {
      // Half the bytes reach the temporary file, then the disk fills up.
      realFs.writeSync(fd, buffer, offset, Math.floor(length / 2));
      seenDuringWrite = fs.readdirSync(folder);
      throw Object.assign(new Error('ENOSPC: no space left on device, write'), { code: 'ENOSPC' });
    }) as unknown as typeof fs.writeSync);
    const e = configErrorOf(() => writeFileAtomic(target, content));
    // The half-written temporary file really existed beside the target...
    expect(seenDuringWrite).toHaveLength(1);
    expect(seenDuringWrite[0]).toMatch(/^\.out\.csv\.tmp-\d+-[0-9a-f]{12}$/);
    // ...and is gone afterwards, with no target created.
    expect(fs.readdirSync(folder)).toEqual([]);
    expect(e.message).toBe(`cannot write ${target}: ENOSPC: no space left on device, write`);
    expect(e.code).toBe('config.cannot-write');
  });

  it('writeFileAtomic interrupted over an existing file leaves the old content in place', () => {
    const target = join(folder, 'out.csv');
    fs.writeFileSync(target, 'old complete file\n');
    vi.mocked(fs.writeSync).mockImplementationOnce((() => {
      throw new Error('EIO: i/o error, write');
    }) as unknown as typeof fs.writeSync);
    configErrorOf(() => writeFileAtomic(target, 'new content that never lands\n'));
    expect(fs.readFileSync(target, 'utf8')).toBe('old complete file\n');
    expect(fs.readdirSync(folder)).toEqual(['out.csv']);
  });

  it('writeFileAtomic refuses to write over an input, however the path is spelled (real paths compared)', () => {
    const input = join(folder, 'plan.csv');
    fs.writeFileSync(input, 'year,co2_ppm\n2030,440\n');
    fs.symlinkSync(input, join(folder, 'link.csv'));
    for (const out of [input, join(folder, '.', '..', `case-${case_ - 1}`, 'plan.csv'), join(folder, 'link.csv')]) {
      const e = configErrorOf(() => writeFileAtomic(out, 'x', { inputs: [input] }));
      expect(e.code).toBe('config.out-is-input');
      expect(e.message).toBe(`refusing to write ${out}: it is an input of this run (${input}); choose another output file`);
    }
    expect(fs.readFileSync(input, 'utf8')).toBe('year,co2_ppm\n2030,440\n');
  });

  it('writeFileAtomic refuses a folder as target and a target in a missing folder', () => {
    expect(configErrorOf(() => writeFileAtomic(folder, 'x')).code).toBe('config.out-is-folder');
    expect(configErrorOf(() => writeFileAtomic(join(folder, 'no', 'out.csv'), 'x')).code).toBe('config.out-folder-missing');
  });

  it('writeFileAtomic("-") writes to the given stdout and touches no file', () => {
    const chunks: (string | Uint8Array)[] = [];
    writeFileAtomic('-', 'year\n2030\n', { stdout: { write: (c) => chunks.push(c) } });
    expect(chunks).toEqual(['year\n2030\n']);
    expect(fs.readdirSync(folder)).toEqual([]);
  });
});

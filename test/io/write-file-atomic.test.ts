import * as fs from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { writeFileAtomic, writeFilesAtomic } from '../../src/io/write-file-atomic.js';

// writeSync, openSync, renameSync and accessSync are wrapped so that single tests can make the disk
// fail half-way through a write, a folder refuse writing, or a rename fail; every other call goes to
// the real function.
vi.mock('node:fs', async (importOriginal) => {
  const real = await importOriginal<typeof import('node:fs')>();
  return {
    ...real,
    writeSync: vi.fn(real.writeSync),
    openSync: vi.fn(real.openSync),
    renameSync: vi.fn(real.renameSync),
    accessSync: vi.fn(real.accessSync),
  };
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
afterEach(() => {
  vi.mocked(fs.writeSync).mockReset().mockImplementation(realFs.writeSync);
  vi.mocked(fs.openSync).mockReset().mockImplementation(realFs.openSync);
  vi.mocked(fs.renameSync).mockReset().mockImplementation(realFs.renameSync);
  vi.mocked(fs.accessSync).mockReset().mockImplementation(realFs.accessSync);
});

/** A system error as node:fs throws it. */
function systemError(code: string, message: string): NodeJS.ErrnoException {
  return Object.assign(new Error(message), { code });
}

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
    expect(e.message).toBe(`cannot write ${target}: no space left on the disk`);
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

  it('writeFileAtomic into a folder it may not write says "permission denied" and names the folder, not the temporary file', () => {
    const target = join(folder, 'x.csv');
    vi.mocked(fs.openSync).mockImplementationOnce(((p: string) => {
      throw systemError('EACCES', `EACCES: permission denied, open '${p}'`);
    }) as unknown as typeof fs.openSync);
    const e = configErrorOf(() => writeFileAtomic(target, 'x'));
    expect(e.message).toBe(`cannot write ${target}: permission denied (the folder ${realFs.realpathSync(folder)} is not writable)`);
    expect(e.message).not.toMatch(/tmp-/);
    expect(e.code).toBe('config.cannot-write');
  });

  it('writeFileAtomic names a read-only file system, a full disk and an unmapped error in plain words', () => {
    const target = join(folder, 'x.csv');
    const cases: [NodeJS.ErrnoException, string][] = [
      [systemError('EROFS', "EROFS: read-only file system, open '/x/.x.csv.tmp-1-abc'"), `the folder ${realFs.realpathSync(folder)} is on a read-only file system`],
      [systemError('ENOSPC', "ENOSPC: no space left on device, open '/x/.x.csv.tmp-1-abc'"), 'no space left on the disk'],
      [systemError('EMFILE', "EMFILE: too many open files, open '/x/.x.csv.tmp-1-abc'"), 'EMFILE: too many open files'],
    ];
    for (const [error, reason] of cases) {
      vi.mocked(fs.openSync).mockImplementationOnce((() => {
        throw error;
      }) as unknown as typeof fs.openSync);
      expect(configErrorOf(() => writeFileAtomic(target, 'x')).message).toBe(`cannot write ${target}: ${reason}`);
    }
    expect(fs.readdirSync(folder)).toEqual([]);
  });

  it('writeFileAtomic told "no such file or directory" in a folder that exists says the folder takes no new files, not that it is missing', () => {
    const target = join(folder, 'x.csv');
    vi.mocked(fs.openSync).mockImplementationOnce(((p: string) => {
      throw systemError('ENOENT', `ENOENT: no such file or directory, open '${p}'`);
    }) as unknown as typeof fs.openSync);
    const e = configErrorOf(() => writeFileAtomic(target, 'x'));
    expect(e.message).toBe(`cannot write ${target}: the folder ${realFs.realpathSync(folder)} exists but takes no new files `
      + '(the system answered "no such file or directory", as virtual file systems such as /proc and /sys do); choose a folder on a disk');
  });

  it.runIf(process.platform === 'linux' && fs.existsSync('/proc/self'))('writeFileAtomic("/proc/x.csv") does not claim that /proc does not exist', () => {
    const e = configErrorOf(() => writeFileAtomic('/proc/warmcast-test-x.csv', 'x'));
    expect(e.message).toMatch(/^cannot write \/proc\/warmcast-test-x\.csv: /);
    expect(e.message).not.toMatch(/does not exist/);
  });

  it.skipIf(process.getuid?.() === 0)('writeFileAtomic into a real read-only folder refuses before writing (not testable as root)', () => {
    fs.chmodSync(folder, 0o555);
    try {
      const e = configErrorOf(() => writeFileAtomic(join(folder, 'x.csv'), 'x'));
      expect(e.message).toMatch(/permission denied \(the folder .* is not writable\)$/);
    } finally {
      fs.chmodSync(folder, 0o755);
    }
    expect(fs.readdirSync(folder)).toEqual([]);
  });
});

describe('writeFilesAtomic', () => {
  it('writeFilesAtomic writes every file and leaves no temporary or backup file', () => {
    fs.writeFileSync(join(folder, 'a.csv'), 'old a');
    writeFilesAtomic([{ path: join(folder, 'a.csv'), content: 'new a' }, { path: join(folder, 'a.meta.json'), content: '{}' }]);
    expect(fs.readFileSync(join(folder, 'a.csv'), 'utf8')).toBe('new a');
    expect(fs.readFileSync(join(folder, 'a.meta.json'), 'utf8')).toBe('{}');
    expect(fs.readdirSync(folder).sort()).toEqual(['a.csv', 'a.meta.json']);
  });

  it('writeFilesAtomic with a second target that is a folder writes nothing and keeps the first file as it was', () => {
    fs.writeFileSync(join(folder, 'a.csv'), 'old a');
    fs.mkdirSync(join(folder, 'a.meta.json'));
    const e = configErrorOf(() => writeFilesAtomic([
      { path: join(folder, 'a.csv'), content: 'new a' },
      { path: join(folder, 'a.meta.json'), content: '{}' },
    ]));
    expect(e.code).toBe('config.out-is-folder');
    expect(e.message).toBe(`cannot write ${join(folder, 'a.meta.json')}: it is a folder`);
    expect(fs.readFileSync(join(folder, 'a.csv'), 'utf8')).toBe('old a');
    expect(fs.readdirSync(folder).sort()).toEqual(['a.csv', 'a.meta.json']);
  });

  it('writeFilesAtomic checks every target before writing: an unwritable second folder leaves no file', () => {
    const other = join(folder, 'sub');
    fs.mkdirSync(other);
    const otherReal = realFs.realpathSync(other);
    // The check of the second folder fails as it would for a folder without write permission.
    vi.mocked(fs.accessSync).mockImplementation(((p: string, mode?: number) => {
      if (p === otherReal) throw systemError('EACCES', `EACCES: permission denied, access '${p}'`);
      return realFs.accessSync(p, mode);
    }) as typeof fs.accessSync);
    const e = configErrorOf(() => writeFilesAtomic([
      { path: join(folder, 'a.csv'), content: 'a' },
      { path: join(other, 'b.csv'), content: 'b' },
    ]));
    expect(e.message).toBe(`cannot write ${join(other, 'b.csv')}: permission denied (the folder ${otherReal} is not writable)`);
    expect(vi.mocked(fs.openSync)).not.toHaveBeenCalled();
    expect(fs.readdirSync(folder)).toEqual(['sub']);
  });

  it('writeFilesAtomic refuses when any target is an input, before writing the others', () => {
    const input = join(folder, 'plan.meta.json');
    fs.writeFileSync(input, 'input');
    const e = configErrorOf(() => writeFilesAtomic(
      [{ path: join(folder, 'plan.csv'), content: 'a' }, { path: input, content: 'b' }],
      { inputs: [input] },
    ));
    expect(e.code).toBe('config.out-is-input');
    expect(fs.readdirSync(folder)).toEqual(['plan.meta.json']);
    expect(fs.readFileSync(input, 'utf8')).toBe('input');
  });

  it('writeFilesAtomic with the disk failing on the second file removes the first temporary file and touches no target', () => {
    fs.writeFileSync(join(folder, 'a.csv'), 'old a');
    vi.mocked(fs.writeSync)
      .mockImplementationOnce(realFs.writeSync)
      .mockImplementationOnce((() => {
        throw systemError('ENOSPC', 'ENOSPC: no space left on device, write');
      }) as unknown as typeof fs.writeSync);
    const e = configErrorOf(() => writeFilesAtomic([
      { path: join(folder, 'a.csv'), content: 'new a' },
      { path: join(folder, 'a.meta.json'), content: '{}' },
    ]));
    expect(e.message).toBe(`cannot write ${join(folder, 'a.meta.json')}: no space left on the disk`);
    expect(fs.readdirSync(folder)).toEqual(['a.csv']);
    expect(fs.readFileSync(join(folder, 'a.csv'), 'utf8')).toBe('old a');
  });

  it('writeFilesAtomic with the second rename failing puts the first file back: old content restored, new file removed', () => {
    fs.writeFileSync(join(folder, 'a.csv'), 'old a');
    fs.writeFileSync(join(folder, 'b.csv'), 'old b');
    // First call: the rename of a.csv's temporary file (real); second: b.csv's (fails).
    vi.mocked(fs.renameSync)
      .mockImplementationOnce(realFs.renameSync)
      .mockImplementationOnce(((from: string) => {
        throw systemError('EPERM', `EPERM: operation not permitted, rename '${from}'`);
      }) as typeof fs.renameSync);
    const e = configErrorOf(() => writeFilesAtomic([
      { path: join(folder, 'a.csv'), content: 'new a' },
      { path: join(folder, 'b.csv'), content: 'new b' },
    ]));
    expect(e.message).toMatch(/^cannot write .*b\.csv: permission denied \(the existing file cannot be replaced/);
    expect(fs.readFileSync(join(folder, 'a.csv'), 'utf8')).toBe('old a');
    expect(fs.readFileSync(join(folder, 'b.csv'), 'utf8')).toBe('old b');
    expect(fs.readdirSync(folder).sort()).toEqual(['a.csv', 'b.csv']);

    // A target that did not exist before is removed again.
    fs.rmSync(join(folder, 'a.csv'));
    vi.mocked(fs.renameSync)
      .mockImplementationOnce(realFs.renameSync)
      .mockImplementationOnce((() => {
        throw systemError('EIO', 'EIO: i/o error, rename');
      }) as typeof fs.renameSync);
    configErrorOf(() => writeFilesAtomic([
      { path: join(folder, 'a.csv'), content: 'new a' },
      { path: join(folder, 'b.csv'), content: 'new b' },
    ]));
    expect(fs.readdirSync(folder)).toEqual(['b.csv']);
  });
});

import { randomBytes } from 'node:crypto';
import { closeSync, fchmodSync, fsyncSync, openSync, realpathSync, renameSync, statSync, unlinkSync, writeSync } from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { ConfigError } from '../errors.js';

/** Options of writeFileAtomic. */
export interface WriteFileAtomicOptions {
  /** Files read by this run; writing over any of them is refused (compared as resolved real paths). */
  inputs?: readonly string[];
  /** Where `-` writes (default process.stdout); tests pass a collector. */
  stdout?: { write(chunk: string | Uint8Array): unknown };
}

/**
 * Writes a whole file so that readers see either the old file or the complete new one, never a part:
 * the content goes to a temporary file in the same folder (`.<name>.tmp-<pid>-<random>`), is flushed
 * to disk, and is then renamed over the target (a rename within one folder is atomic on POSIX file
 * systems and on NTFS). If anything fails, the temporary file is removed and an existing target is
 * left untouched. A replaced file keeps its permission bits; when the path is a symbolic link, the
 * file it points to is replaced and the link kept. `-` writes to standard output instead.
 *
 * @param path - file to write, or `-` for standard output
 * @param content - text (written as UTF-8) or bytes
 * @param options - `inputs`: files this run read, which must not be overwritten; `stdout` for `-`
 * @throws ConfigError (exit 2) when the path is one of the inputs, is a folder, its folder does not
 *   exist, or the write fails (the message names the file and the system's reason)
 * @example
 * writeFileAtomic('out/warming.csv', formatCsv(table), { inputs: ['pathways/swift.csv'] });
 */
export function writeFileAtomic(path: string, content: string | Uint8Array, options: WriteFileAtomicOptions = {}): void {
  const bytes = typeof content === 'string' ? Buffer.from(content, 'utf8') : content;
  if (path === '-') {
    (options.stdout ?? process.stdout).write(typeof content === 'string' ? content : bytes);
    return;
  }

  const target = resolve(path);
  const folder = dirname(target);
  let folderReal: string;
  try {
    folderReal = realpathSync(folder);
  } catch {
    throw new ConfigError(`cannot write ${path}: the folder ${folder} does not exist`, 'out', 'config.out-folder-missing');
  }
  let existingMode: number | undefined;
  let targetReal = join(folderReal, basename(target));
  try {
    const stat = statSync(target);
    if (stat.isDirectory()) throw new ConfigError(`cannot write ${path}: it is a folder`, 'out', 'config.out-is-folder');
    existingMode = stat.mode & 0o7777;
    targetReal = realpathSync(target);
  } catch (e) {
    if (e instanceof ConfigError) throw e;
    // Not there yet: the real path is the real folder plus the name.
  }
  for (const input of options.inputs ?? []) {
    if (realPathOf(input) === targetReal) {
      throw new ConfigError(`refusing to write ${path}: it is an input of this run (${input}); choose another output file`,
        'out', 'config.out-is-input');
    }
  }

  const temp = join(folderReal, `.${basename(target)}.tmp-${process.pid}-${randomBytes(6).toString('hex')}`);
  let fd: number | undefined;
  try {
    fd = openSync(temp, 'wx', 0o666);
    if (existingMode !== undefined) fchmodSync(fd, existingMode);
    let offset = 0;
    while (offset < bytes.length) offset += writeSync(fd, bytes, offset, bytes.length - offset);
    fsyncSync(fd);
    closeSync(fd);
    fd = undefined;
    renameSync(temp, targetReal);
  } catch (e) {
    if (fd !== undefined) {
      try { closeSync(fd); } catch { /* already failing; the original error is the one to report */ }
    }
    try { unlinkSync(temp); } catch { /* never created, or already gone */ }
    const reason = e instanceof Error ? e.message : String(e);
    throw new ConfigError(`cannot write ${path}: ${reason}`, 'out', 'config.cannot-write');
  }
}

function realPathOf(path: string): string {
  try {
    return realpathSync(path);
  } catch {
    const absolute = resolve(path);
    try {
      return join(realpathSync(dirname(absolute)), basename(absolute));
    } catch {
      return absolute;
    }
  }
}

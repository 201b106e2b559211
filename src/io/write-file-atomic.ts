import { randomBytes } from 'node:crypto';
import {
  accessSync,
  closeSync,
  constants,
  fchmodSync,
  fsyncSync,
  linkSync,
  openSync,
  realpathSync,
  renameSync,
  statSync,
  unlinkSync,
  writeSync,
} from 'node:fs';
import { basename, dirname, join, resolve } from 'node:path';
import { ConfigError } from '../errors.js';

// Why not the `write-file-atomic` package (7.0.1, the last line for Node 20): it writes one file and
// renames it into place at once, so a CSV would be in place before its .meta.json sidecar is written;
// keeping the pair all-or-nothing would still need every part below (checking all targets first,
// staging both, renaming together, putting back on failure), and its errors name the temporary file.

/** Options of writeFileAtomic and writeFilesAtomic. */
export interface WriteFileAtomicOptions {
  /** Files read by this run; writing over any of them is refused (compared as resolved real paths). */
  inputs?: readonly string[];
  /** Where `-` writes (default process.stdout); tests pass a collector. writeFilesAtomic ignores it. */
  stdout?: { write(chunk: string | Uint8Array): unknown };
}

/** One file for writeFilesAtomic. */
export interface FileToWrite {
  /** Where to write, resolved against the process's working directory. */
  path: string;
  /** Text (written as UTF-8) or bytes. */
  content: string | Uint8Array;
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
 *   exist or is not writable, or the write fails (the message names the file and the reason in plain
 *   words, never the temporary name)
 * @example
 * writeFileAtomic('out/warming.csv', formatCsv(table), { inputs: ['pathways/swift.csv'] });
 */
export function writeFileAtomic(path: string, content: string | Uint8Array, options: WriteFileAtomicOptions = {}): void {
  if (path === '-') {
    (options.stdout ?? process.stdout).write(content);
    return;
  }
  writeFilesAtomic([{ path, content }], options);
}

/**
 * Writes several files as one: all of them or none. Every target is checked first (its folder exists
 * and is writable, it is not a folder, it is not one of the inputs), so that a problem with any of
 * them is reported before anything is written; then each content goes to a temporary file beside its
 * target and is flushed; only when all are written are they renamed into place. If a write fails,
 * the temporary files are removed and no target is touched. If a rename fails part-way, the targets
 * already renamed are put back (an existing file from a hard link made before the renames, a new one
 * removed), so the user's files are as they were. Each file is replaced as writeFileAtomic replaces
 * one (permission bits kept, symbolic links followed).
 *
 * @param files - the files, in the order they are renamed into place; `-` is not accepted
 * @param options - `inputs`: files this run read, which must not be overwritten
 * @throws ConfigError (exit 2) naming the first file that cannot be written and why, in plain words
 * @example
 * writeFilesAtomic([{ path: 'out.csv', content: csv }, { path: 'out.meta.json', content: meta }]);
 */
export function writeFilesAtomic(files: readonly FileToWrite[], options: WriteFileAtomicOptions = {}): void {
  const targets = files.map((f) => checkTarget(f.path, options.inputs ?? []));
  if (new Set(targets.map((t) => t.real)).size !== targets.length) {
    throw new RangeError(`writeFilesAtomic was given one file twice: ${files.map((f) => f.path).join(', ')}`);
  }
  const temps: string[] = [];
  try {
    // writeTemporary removes its own file when it fails; the ones before it are removed here.
    for (let i = 0; i < files.length; i++) temps.push(writeTemporary(files[i], targets[i]));
  } catch (e) {
    removeAll(temps);
    throw e;
  }
  commit(files, targets, temps);
}

/** What checkTarget found out about one target. */
interface Target {
  /** The target's real path (the file a symbolic link points to, or the real folder plus the name). */
  real: string;
  /** The real folder the temporary file goes in. */
  folder: string;
  /** Permission bits of the file being replaced, if there is one. */
  existingMode?: number;
}

function checkTarget(path: string, inputs: readonly string[]): Target {
  if (path === '-') throw new RangeError('writeFilesAtomic writes files; write `-` (standard output) with writeFileAtomic');
  const target = resolve(path);
  const folder = dirname(target);
  let folderReal: string;
  try {
    folderReal = realpathSync(folder);
  } catch {
    throw new ConfigError(`cannot write ${path}: the folder ${folder} does not exist`, 'out', 'config.out-folder-missing');
  }
  let existingMode: number | undefined;
  let real = join(folderReal, basename(target));
  try {
    const stat = statSync(target);
    if (stat.isDirectory()) throw new ConfigError(`cannot write ${path}: it is a folder`, 'out', 'config.out-is-folder');
    existingMode = stat.mode & 0o7777;
    real = realpathSync(target);
  } catch (e) {
    if (e instanceof ConfigError) throw e;
    // Not there yet: the real path is the real folder plus the name.
  }
  for (const input of inputs) {
    if (realPathOf(input) === real) {
      throw new ConfigError(`refusing to write ${path}: it is an input of this run (${input}); choose another output file`,
        'out', 'config.out-is-input');
    }
  }
  const realFolder = dirname(real);
  try {
    accessSync(realFolder, constants.W_OK | constants.X_OK);
  } catch (e) {
    throw cannotWrite(path, e, realFolder, 'create');
  }
  return { real, folder: realFolder, existingMode };
}

/** Writes one file's content to a new temporary file beside its target and returns the temporary's path. */
function writeTemporary(file: FileToWrite, target: Target): string {
  const bytes = typeof file.content === 'string' ? Buffer.from(file.content, 'utf8') : file.content;
  const temp = siblingName(target.real, 'tmp');
  let fd: number | undefined;
  try {
    fd = openSync(temp, 'wx', 0o666);
    if (target.existingMode !== undefined) fchmodSync(fd, target.existingMode);
    let offset = 0;
    while (offset < bytes.length) offset += writeSync(fd, bytes, offset, bytes.length - offset);
    fsyncSync(fd);
    closeSync(fd);
    return temp;
  } catch (e) {
    if (fd !== undefined) {
      try { closeSync(fd); } catch { /* already failing; the original error is the one to report */ }
    }
    try { unlinkSync(temp); } catch { /* never created, or already gone */ }
    throw cannotWrite(file.path, e, target.folder, 'create');
  }
}

/** Renames every temporary file over its target; on a failure puts back the targets already replaced. */
function commit(files: readonly FileToWrite[], targets: readonly Target[], temps: readonly string[]): void {
  // A hard link to each existing target keeps its old content reachable until all renames are done.
  const backups = targets.map((t) => {
    if (t.existingMode === undefined || targets.length === 1) return undefined;
    const backup = siblingName(t.real, 'old');
    try {
      linkSync(t.real, backup);
      return backup;
    } catch {
      return undefined; // a file system without hard links: that file cannot be put back
    }
  });
  let done = 0;
  try {
    for (; done < targets.length; done++) renameSync(temps[done], targets[done].real);
  } catch (e) {
    for (let j = 0; j < done; j++) {
      try {
        const backup = backups[j];
        if (backup !== undefined) renameSync(backup, targets[j].real);
        else if (targets[j].existingMode === undefined) unlinkSync(targets[j].real);
      } catch { /* best effort: the error below names the file that failed */ }
    }
    removeAll([...temps.slice(done), ...backups]);
    throw cannotWrite(files[done].path, e, targets[done].folder, 'replace');
  }
  removeAll(backups);
}

/**
 * The error for a failed write, with the system's reason in plain words and without the name of the
 * temporary file (which means nothing to the user).
 */
function cannotWrite(path: string, e: unknown, folder: string, stage: 'create' | 'replace'): ConfigError {
  const code = (e as NodeJS.ErrnoException | undefined)?.code;
  let reason: string;
  switch (code) {
    case 'EACCES':
    case 'EPERM':
      reason = stage === 'create'
        ? `permission denied (the folder ${folder} is not writable)`
        : 'permission denied (the existing file cannot be replaced: it may be protected or open in another program)';
      break;
    case 'EROFS':
      reason = `the folder ${folder} is on a read-only file system`;
      break;
    case 'ENOSPC':
      reason = 'no space left on the disk';
      break;
    case 'EDQUOT':
      reason = 'the disk quota is used up';
      break;
    case 'ENOENT':
    case 'ENOTDIR':
      // Also what a folder that exists answers when its file system takes no new files (/proc, /sys).
      if (!isFolder(folder)) reason = `the folder ${folder} does not exist (any more)`;
      else if (stage === 'create') {
        reason = `the folder ${folder} exists but takes no new files (the system answered "no such file or directory", `
          + 'as virtual file systems such as /proc and /sys do); choose a folder on a disk';
      } else {
        reason = `the new file could not be moved into place in ${folder} (the system answered "no such file or directory": `
          + 'the file or its temporary copy was removed while writing)';
      }
      break;
    case 'EISDIR':
      reason = 'it is a folder';
      break;
    case 'EIO':
      reason = 'the disk reported an input/output error';
      break;
    default: {
      // Unmapped: the system's own words without the paths it appends (one is the temporary file's).
      const message = e instanceof Error ? e.message : String(e);
      reason = message.replace(/, \w+ '.*$/s, '');
    }
  }
  return new ConfigError(`cannot write ${path}: ${reason}`, 'out', 'config.cannot-write');
}

function isFolder(path: string): boolean {
  try {
    return statSync(path).isDirectory();
  } catch {
    return false;
  }
}

/** `.<name>.<kind>-<pid>-<random>` in the same folder as `path`. */
function siblingName(path: string, kind: 'tmp' | 'old'): string {
  return join(dirname(path), `.${basename(path)}.${kind}-${process.pid}-${randomBytes(6).toString('hex')}`);
}

function removeAll(paths: readonly (string | undefined)[]): void {
  for (const p of paths) {
    if (p === undefined) continue;
    try { unlinkSync(p); } catch { /* already gone */ }
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

import { readFileSync, statSync } from 'node:fs';
import { InputError } from '../errors.js';

/**
 * Largest pathway file read: 64 MiB. An annual pathway from 1000 to 3000 with every column is about
 * 0.2 MB and daily dates over 300 years about 10 MB, so a larger file is taken to be the wrong
 * file (common practice, no source). Validation runs at roughly 7 MB per second, so a file at the
 * limit takes about 10 s.
 */
export const MAX_PATHWAY_BYTES = 64 * 1024 * 1024;

/**
 * Reads a file as UTF-8 text for the pathway reader, turning every way that can fail into an
 * InputError that names the file: missing, a directory, unreadable, larger than MAX_PATHWAY_BYTES,
 * UTF-16, or not valid UTF-8 (the message gives the line of the first bad byte, which is usually a
 * file saved as Latin-1 or Windows-1252).
 *
 * @param path - file to read
 * @param file - how to name it in messages (defaults to `path`)
 * @returns the file's text (a byte-order mark, if any, is kept: parsePathway drops it)
 * @throws InputError with code input.not-found, input.is-directory, input.unreadable, input.too-large or input.not-utf8
 * @example
 * readTextFile('pathways/swift.csv') // '# name: Swift transition\n...'
 */
export function readTextFile(path: string, file = path): string {
  const fail = (code: string, message: string, expected?: string, line?: number): never => {
    throw new InputError([{ file, line, code, message, expected }]);
  };
  let size = 0;
  try {
    const stat = statSync(path);
    if (stat.isDirectory()) fail('input.is-directory', 'must be a file, not a folder', 'a CSV file');
    size = stat.size;
  } catch (e) {
    if (e instanceof InputError) throw e;
    if (errnoCode(e) === 'ENOENT' || errnoCode(e) === 'ENOTDIR') fail('input.not-found', 'must be an existing file', 'a CSV file path');
    fail('input.unreadable', `must be readable: ${errorText(e)}`);
  }
  if (size > MAX_PATHWAY_BYTES) {
    fail('input.too-large', `must be at most ${MAX_PATHWAY_BYTES / 1024 / 1024} MiB to be read as a pathway (this file is `
      + `${(size / 1024 / 1024).toFixed(1)} MiB)`, 'a pathway CSV file of at most 64 MiB');
  }
  let bytes: Uint8Array = new Uint8Array(0);
  try {
    bytes = readFileSync(path);
  } catch (e) {
    fail(errnoCode(e) === 'EISDIR' ? 'input.is-directory' : 'input.unreadable', `must be readable: ${errorText(e)}`);
  }
  if (bytes.length >= 2 && ((bytes[0] === 0xff && bytes[1] === 0xfe) || (bytes[0] === 0xfe && bytes[1] === 0xff))) {
    fail('input.not-utf8', 'must be UTF-8 text; this file is UTF-16', 'the file saved as "CSV UTF-8"', 1);
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    const loose = new TextDecoder('utf-8').decode(bytes);
    const bad = loose.indexOf('\uFFFD');
    const line = loose.slice(0, bad).split(/\r\n|\r|\n/).length;
    return fail('input.not-utf8', 'must be UTF-8 text; this line holds a byte that is not UTF-8 (Latin-1 or Windows-1252?)',
      'the file saved as "CSV UTF-8"', line);
  }
}

function errnoCode(e: unknown): string | undefined {
  return typeof e === 'object' && e !== null && 'code' in e ? String((e as { code: unknown }).code) : undefined;
}

function errorText(e: unknown): string {
  return e instanceof Error ? e.message : String(e);
}

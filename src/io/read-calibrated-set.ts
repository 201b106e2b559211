import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { calibratedSetFromJson, type CalibratedSet } from '../ensemble/calibrated-set.js';
import { InputError } from '../errors.js';
import { bundledPathwaysDir } from './bundled-pathways.js';
import { jsonSyntaxError } from './json-syntax-error.js';

/** Sets already read, by path: a command that runs several pathways reads the file once. */
const cache = new Map<string, CalibratedSet>();

/**
 * Reads a calibrated parameter set (default the bundled `pathways/calibrated-members.json`).
 *
 * @param file path of the set (default the bundled one)
 * @returns the set with its SHA-256
 * @throws InputError when the file cannot be read or is not JSON (with line and column)
 * @throws ConfigError when its content is not a calibrated set
 * @example readCalibratedSet().count // 4000
 */
export function readCalibratedSet(file: string = join(bundledPathwaysDir(), 'calibrated-members.json')): CalibratedSet {
  const known = cache.get(file);
  if (known) return known;
  let bytes: Buffer;
  try {
    bytes = readFileSync(file);
  } catch (e) {
    throw new InputError([{ file, code: 'input.unreadable', message: `calibrated parameter set cannot be read (${(e as Error).message})`, expected: 'the JSON written by scripts/calibrate-ensemble.ts' }]);
  }
  const text = bytes.toString('utf8');
  let data: unknown;
  try {
    data = JSON.parse(text);
  } catch {
    const syntax = jsonSyntaxError(text);
    throw new InputError([{ file, line: syntax?.line, code: 'input.bad-json', message: `is not valid JSON${syntax ? ` at column ${syntax.column}: ${syntax.message}` : ''}` }]);
  }
  const set = calibratedSetFromJson(data, file, createHash('sha256').update(bytes).digest('hex'));
  cache.set(file, set);
  return set;
}

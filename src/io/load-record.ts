import { join } from 'node:path';
import { WarmcastError } from '../errors.js';
import { bundledPathwaysDir } from './bundled-pathways.js';
import { readTextFile } from './read-text-file.js';

/**
 * A published record bundled under `pathways/records/` (see its README for citation and licence),
 * read as numeric columns by header name: the first column is the year.
 *
 * @param file the record's file name, e.g. `hadcrut5-global-annual.csv`
 * @returns the header names and one Float64Array per column (NaN for an empty cell)
 * @throws WarmcastError (exit 1) when the installation lacks the file or a cell is not a number:
 *   bundled data, not user input, so a problem is the installation's
 * @example loadRecord('hadcrut5-global-annual.csv').columns.Time[0] // 1850
 */
export function loadRecord(file: string): { names: string[]; columns: Record<string, Float64Array> } {
  const path = join(bundledPathwaysDir(), 'records', file);
  let text: string;
  try {
    text = readTextFile(path);
  } catch (e) {
    throw new WarmcastError(`the bundled record ${path} cannot be read (${(e as Error).message}); the installation is incomplete`, 'install.missing-record', 1);
  }
  const lines = text.trim().split(/\r?\n/);
  const names = lines[0].split(',').map((h) => h.trim());
  const rows = lines.slice(1).map((line, i) =>
    line.split(',').map((cell, j) => {
      const v = cell.trim() === '' ? NaN : Number(cell);
      if (cell.trim() !== '' && !Number.isFinite(v)) throw new WarmcastError(`${path} line ${i + 2}, column ${names[j]}: must be a number, got "${cell}"`, 'install.bad-record', 1);
      return v;
    }),
  );
  const columns = Object.fromEntries(names.map((name, j) => [name, Float64Array.from(rows, (r) => r[j] ?? NaN)]));
  return { names, columns };
}

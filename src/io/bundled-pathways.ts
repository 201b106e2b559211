import { existsSync, readdirSync, readFileSync, statSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { WarmcastError } from '../errors.js';
import { PATHWAY_COLUMNS, type Pathway, type PathwayColumn } from '../pathway.js';
import { parsePathway } from './parse-pathway.js';
import { readTextFile } from './read-text-file.js';
import { toAnnual } from './to-annual.js';

/** One bundled pathway as `warmcast pathways` lists it. */
export interface BundledPathway {
  /** What to type on the command line: the file name without `.csv` (`swift`). */
  name: string;
  /** `# name:` metadata (`Swift transition`), else the same as `name`. */
  title: string;
  /** Absolute path of the CSV file. */
  file: string;
  /** `# description:` metadata, or '' when there is none. */
  description: string;
  /** First and last whole year of its annual grid. */
  firstYear: number;
  lastYear: number;
  /** Data columns the file gives, in canonical order. */
  columns: PathwayColumn[];
}

/**
 * The `pathways/` folder shipped with warmcast, found by walking up from this module (`src/io/` when
 * run from source, `dist/src/io/` when built) to the package root: the first folder holding a
 * `package.json` named "warmcast" and a `pathways/` folder.
 *
 * @returns the absolute path of the folder
 * @throws WarmcastError (exit 1) when the installation has no such folder
 * @example
 * bundledPathwaysDir() // '/usr/lib/node_modules/warmcast/pathways'
 */
export function bundledPathwaysDir(): string {
  let dir = dirname(fileURLToPath(import.meta.url));
  for (let up = 0; up < 8; up++) {
    const candidate = join(dir, 'pathways');
    if (isPackageRoot(dir) && existsSync(candidate) && statSync(candidate).isDirectory()) return candidate;
    const parent = dirname(dir);
    if (parent === dir) break;
    dir = parent;
  }
  throw new WarmcastError('warmcast cannot find its bundled pathways folder (the installation is incomplete)', 'internal.no-pathways', 1);
}

/** Names of the bundled pathways (file names without `.csv`), sorted; [] when the folder is missing. */
export function bundledPathwayNames(pathwaysDir: string = bundledPathwaysDir()): string[] {
  if (!existsSync(pathwaysDir)) return [];
  return readdirSync(pathwaysDir)
    .filter((f) => f.toLowerCase().endsWith('.csv'))
    .map((f) => f.slice(0, -4))
    .sort();
}

/**
 * Lists every bundled pathway (history.csv included) with its metadata, years and columns. Each file
 * is read and validated in full, so a broken bundled file shows up here.
 *
 * @param pathwaysDir - folder to list (defaults to bundledPathwaysDir())
 * @throws InputError when a bundled file is invalid
 * @example
 * listBundledPathways().map((p) => p.name) // ['delayed', 'history', 'steady', 'swift', ...]
 */
export function listBundledPathways(pathwaysDir: string = bundledPathwaysDir()): BundledPathway[] {
  return bundledPathwayNames(pathwaysDir).map((name) => {
    const file = join(pathwaysDir, `${name}.csv`);
    const parsed = parsePathway(readTextFile(file), file);
    const annual = toAnnual(parsed);
    return {
      name,
      title: parsed.metadata.name || name,
      file,
      description: parsed.metadata.description ?? '',
      firstYear: annual.years[0],
      lastYear: annual.years[annual.years.length - 1],
      columns: PATHWAY_COLUMNS.filter((c) => parsed.columns[c] !== undefined),
    };
  });
}

/**
 * The bundled historical pathway (`pathways/history.csv`) on its annual grid, with provenance source
 * `bundled:history`.
 *
 * @param pathwaysDir - folder holding history.csv (defaults to bundledPathwaysDir())
 * @throws InputError when the file is missing or invalid
 * @example
 * loadHistory().years[0] // 1750
 */
export function loadHistory(pathwaysDir: string = bundledPathwaysDir()): Pathway {
  const file = join(pathwaysDir, 'history.csv');
  const annual = toAnnual(parsePathway(readTextFile(file), file));
  return { ...annual, provenance: { ...annual.provenance, source: 'bundled:history' } };
}

function isPackageRoot(dir: string): boolean {
  try {
    return JSON.parse(readFileSync(join(dir, 'package.json'), 'utf8')).name === 'warmcast';
  } catch {
    return false;
  }
}

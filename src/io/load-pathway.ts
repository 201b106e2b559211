import { existsSync, realpathSync } from 'node:fs';
import { join } from 'node:path';
import { InputError } from '../errors.js';
import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { resolveEmissionForcing, type EmissionForcing } from '../forcing/emission-forcing.js';
import { splitLumpedForcing } from '../forcing/lumped-forcing.js';
import type { Pathway } from '../pathway.js';
import { bundledPathwayNames, bundledPathwaysDir, loadHistory } from './bundled-pathways.js';
import { co2UnitProblem } from './co2-unit-check.js';
import { nearestName } from './nearest-name.js';
import { parsePathway, type ParsedPathway } from './parse-pathway.js';
import { readTextFile } from './read-text-file.js';
import { spliceOntoHistory } from './splice-onto-history.js';
import { toAnnual } from './to-annual.js';

/** Options of loadPathway and readPathway. */
export interface LoadPathwayOptions {
  /** Splice the pathway onto the bundled history when it starts later (default true). */
  splice?: boolean;
  /** Folder of bundled pathways and history.csv (default: the one shipped with warmcast). */
  pathwaysDir?: string;
  /**
   * The user says a CO2 emission jump at the join with the history is meant, so a first value near
   * 12/44 of the rate diagnosed from the record is not refused as Gt C (see co2UnitProblem).
   */
  co2JumpIntended?: boolean;
  /**
   * What fills a group of short-lived species (aerosol precursors, ozone precursors, halogenated
   * gases) that an emission file gives neither as emissions nor as forcing; without it such a file
   * is refused (resolveEmissionForcing).
   */
  absentEmissions?: AbsentEmissionsRule;
}

/** Every stage of reading one pathway, for `warmcast check`. */
export interface ReadPathwayResult {
  /** The rows as read from the file. */
  parsed: ParsedPathway;
  /** The file's own values on the annual grid. */
  annual: Pathway;
  /** What a run uses: `annual` with forcing from its emissions, spliced onto the history unless that was turned off or not needed. */
  pathway: Pathway;
  /** Forcing computed from the file's emissions: where each agent comes from, the assumptions made. */
  emissionForcing: EmissionForcing;
}

/**
 * Reads a pathway and keeps each stage: the parsed rows, the file's annual values and the pathway a
 * run uses. See loadPathway for how `arg` is found and what can fail.
 *
 * @example
 * const { parsed, pathway } = readPathway('swift');
 * describePathway(parsed, pathway) // lines for `warmcast check`
 */
export function readPathway(arg: string, options: LoadPathwayOptions = {}): ReadPathwayResult {
  // Looked up only when needed, so a user's file can be read without splicing even if the bundled folder is gone.
  const pathwaysDir = () => options.pathwaysDir ?? bundledPathwaysDir();
  const { path, source } = locate(arg, pathwaysDir);
  const parsed = parsePathway(readTextFile(path), path);
  return pathwayFromParsed(parsed, { ...options, source, isHistory: isHistoryFile(path, pathwaysDir()) });
}

/**
 * The stages after reading, shared by pathway files and the scenarios of a scenario table: the
 * parsed rows put on the annual grid (toAnnual), `notes` from the reader put first in the
 * provenance, the forcing of short-lived emissions resolved against the history (with the
 * `absentEmissions` rule), lumped forcing split over its agents, and the result spliced onto the
 * bundled history (spliceOntoHistory) unless `splice` is false or the rows are the history itself.
 *
 * @param parsed rows as read (parsePathway, or one scenario of readIamcTable)
 * @param options splice and pathwaysDir as for readPathway; `source` for provenance (default the
 *   parsed file); `notes` of the reader (a table's CO2 sum, skipped regions); `isHistory`
 */
export function pathwayFromParsed(
  parsed: ParsedPathway,
  options: LoadPathwayOptions & { source?: string; notes?: string[]; isHistory?: boolean } = {},
): ReadPathwayResult {
  let annual = toAnnual(parsed);
  const source = options.source ?? parsed.file;
  if (source !== parsed.file || options.notes?.length) {
    annual = { ...annual, provenance: { ...annual.provenance, source, notes: [...(options.notes ?? []), ...annual.provenance.notes] } };
  }
  const history = options.splice !== false && !options.isHistory ? loadHistory(options.pathwaysDir ?? bundledPathwaysDir()) : undefined;
  // Forcing from the file's emissions first (it sees the lumped columns as the user wrote them), then
  // lumped aerosol_wm2 / other_wm2 become agent columns before the splice, so that the history's
  // agent columns are replaced by the file's and not added to them.
  const emissionForcing = resolveEmissionForcing(annual, history, { absent: options.absentEmissions, firstRowLine: parsed.rowLines[0] });
  let pathway = splitLumpedForcing(emissionForcing.pathway);
  if (history) {
    pathway = spliceOntoHistory(pathway, history);
    const problem = co2UnitProblem(parsed, pathway, history, options.co2JumpIntended ?? false);
    if (problem) throw new InputError([problem]);
  }
  return { parsed, annual, pathway, emissionForcing };
}

/**
 * Reads a pathway for a run. `arg` is a file path or the name of a bundled pathway (`swift` or
 * `swift.csv` for `pathways/swift.csv`); an existing file wins over a bundled name. The file is read
 * (at most MAX_PATHWAY_BYTES, UTF-8), validated (parsePathway), put on the annual grid (toAnnual),
 * its lumped `aerosol_wm2` and `other_wm2` split over their agents (splitLumpedForcing) and,
 * unless `splice: false`, spliced onto the bundled history (spliceOntoHistory) when it starts later
 * than the history. A bundled pathway's provenance source is `bundled:<name>`; a file's is its path.
 *
 * @param arg - file path or bundled pathway name
 * @param options - `splice` (default true), `pathwaysDir` (default: the bundled folder)
 * @returns the annual Pathway a run uses
 * @throws InputError (exit 2) when the file is missing and not a bundled name (the message lists the
 *   bundled names and the nearest one to a typo), a folder, unreadable, too large, not UTF-8, or
 *   invalid, or when its CO2 emissions look like Gt C (co2UnitProblem; `co2JumpIntended` says they are not)
 * @example
 * loadPathway('swift').provenance.spliceYear // 2025
 * loadPathway('my-plan.csv', { splice: false }).years[0] // the file's first year
 */
export function loadPathway(arg: string, options: LoadPathwayOptions = {}): Pathway {
  return readPathway(arg, options).pathway;
}

/** Finds the file behind `arg`: an existing path, else a bundled name. */
function locate(arg: string, pathwaysDir: () => string): { path: string; source: string } {
  if (arg !== '' && existsSync(arg)) return { path: arg, source: arg };
  let dir: string | undefined;
  try {
    dir = pathwaysDir();
  } catch {
    // A missing bundled folder must not hide the real problem: the file the user named does not exist.
  }
  if (dir !== undefined && /^[\w.-]+$/.test(arg)) {
    const name = arg.toLowerCase().endsWith('.csv') ? arg.slice(0, -4) : arg;
    const path = join(dir, `${name}.csv`);
    if (existsSync(path)) return { path, source: `bundled:${name}` };
  }
  const names = dir === undefined ? [] : bundledPathwayNames(dir);
  const guess = nearestName(arg.replace(/\.csv$/i, ''), names);
  throw new InputError([{
    file: arg,
    code: 'input.not-found',
    message: `must be an existing file or the name of a bundled pathway${guess === undefined ? '' : `; did you mean "${guess}"?`}`,
    value: arg,
    expected: names.length > 0
      ? `a CSV file path or one of the bundled pathways: ${names.join(', ')}`
      : 'a CSV file path (no bundled pathways were found)',
  }]);
}

function isHistoryFile(path: string, pathwaysDir: string): boolean {
  const history = join(pathwaysDir, 'history.csv');
  if (!existsSync(history)) return false;
  return realpathSync(path) === realpathSync(history);
}

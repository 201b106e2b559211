import { closeSync, existsSync, openSync, readFileSync, readSync, statSync } from 'node:fs';
import { extname } from 'node:path';
import { ConfigError, InputError } from '../errors.js';
import { csvSheet, xlsxSheets } from './iamc-sheets.js';
import { IAMC_ID_COLUMNS, readIamcTable, type IamcScenario, type IamcTable } from './iamc-table.js';
import { pathwayFromParsed, type LoadPathwayOptions, type ReadPathwayResult } from './load-pathway.js';
import { nearestName } from './nearest-name.js';
import { MAX_PATHWAY_BYTES, readTextFile } from './read-text-file.js';

/** Extensions read as Excel workbooks. */
const WORKBOOK = new Set(['.xlsx', '.xlsm']);

/**
 * Whether `path` is a scenario table in the IAMC layout rather than a pathway file: an .xlsx
 * workbook, or a text file whose first row (after comments) names the columns Model, Scenario,
 * Region and Variable.
 *
 * @example isScenarioTable('pathways/examples/invented-scenarios.csv') // true
 * @example isScenarioTable('pathways/swift.csv') // false
 */
export function isScenarioTable(path: string): boolean {
  if (WORKBOOK.has(extname(path).toLowerCase())) return true;
  if (!existsSync(path) || statSync(path).isDirectory()) return false;
  const fd = openSync(path, 'r');
  const head = Buffer.alloc(8192);
  let read = 0;
  try {
    read = readSync(fd, head, 0, head.length, 0);
  } finally {
    closeSync(fd);
  }
  const first = head.subarray(0, read).toString('utf8').split(/\r\n|\r|\n/).map((l) => l.trim()).find((l) => l !== '' && !l.startsWith('#'));
  if (first === undefined) return false;
  const cells = first.toLowerCase().split(/[,;\t]/).map((c) => c.trim().replace(/^"|"$/g, ''));
  return IAMC_ID_COLUMNS.slice(0, 4).every((c) => cells.includes(c));
}

/**
 * Reads a scenario table from a .csv (UTF-8 text, as pathway files) or .xlsx file: every
 * (model, scenario) with its rows read into the pathway reader's intermediate or its problems (see
 * readIamcTable).
 *
 * @param path the file
 * @param file the name to report (default `path`)
 * @throws InputError for a file that cannot be read or is no IAMC table
 */
export async function readScenarioTable(path: string, file = path): Promise<IamcTable> {
  if (WORKBOOK.has(extname(path).toLowerCase())) {
    let bytes: Buffer;
    try {
      if (statSync(path).size > MAX_PATHWAY_BYTES) {
        throw new InputError([{ file, code: 'input.too-large', message: `must be at most ${MAX_PATHWAY_BYTES / 1024 / 1024} MiB to be read as a scenario table`, expected: 'a smaller workbook, or the table as CSV' }]);
      }
      bytes = readFileSync(path);
    } catch (e) {
      if (e instanceof InputError) throw e;
      throw new InputError([{ file, code: 'input.unreadable', message: `must be an existing, readable file: ${(e as Error).message}`, expected: 'an .xlsx scenario table' }]);
    }
    return readIamcTable(file, await xlsxSheets(bytes, file));
  }
  return readIamcTable(file, [csvSheet(readTextFile(path, file), file)]);
}

/** Which scenario of a table to use: its name, and the model when several models use that name. */
export interface ScenarioChoice {
  scenario?: string;
  model?: string;
}

/**
 * The (model, scenario) of a table that `choice` names: names compared exactly, then without regard
 * to case. A table of one scenario needs no choice.
 *
 * @throws ConfigError (exit 2) when no scenario is named and the table has several (listing them),
 *   when the name matches none (with the nearest name), or when it matches several models and no
 *   `model` says which
 */
export function selectScenario(table: IamcTable, choice: ScenarioChoice): IamcScenario {
  const all = table.scenarios;
  const label = (s: IamcScenario) => `"${s.scenario}" (model "${s.model}")`;
  const listed = (list: IamcScenario[]) => list.slice(0, 20).map(label).join(', ') + (list.length > 20 ? ` and ${list.length - 20} more (see \`warmcast check ${table.file}\`)` : '');
  if (choice.scenario === undefined) {
    const candidates = choice.model === undefined ? all : all.filter((s) => same(s.model, choice.model!));
    if (candidates.length === 1) return candidates[0];
    throw new ConfigError(`${table.file} is a scenario table of ${all.length} scenarios: choose one with --scenario NAME (and --model NAME when two models use a name): ${listed(candidates.length > 0 ? candidates : all)}`, 'scenario');
  }
  const byModel = choice.model === undefined ? all : all.filter((s) => same(s.model, choice.model!));
  if (byModel.length === 0) {
    const models = [...new Set(all.map((s) => s.model))];
    const guess = nearestName(choice.model!, models);
    throw new ConfigError(`--model "${choice.model}" is not a model of ${table.file}${guess ? `; did you mean "${guess}"?` : ''} (models: ${models.join(', ')})`, 'model');
  }
  let found = byModel.filter((s) => s.scenario === choice.scenario);
  if (found.length === 0) found = byModel.filter((s) => same(s.scenario, choice.scenario!));
  if (found.length === 1) return found[0];
  if (found.length > 1) throw new ConfigError(`--scenario "${choice.scenario}" names a scenario of several models in ${table.file}: add --model NAME (${listed(found)})`, 'model');
  const guess = nearestName(choice.scenario, byModel.map((s) => s.scenario));
  throw new ConfigError(`--scenario "${choice.scenario}" is not a scenario of ${table.file}${choice.model ? ` for model "${choice.model}"` : ''}${guess ? `; did you mean "${guess}"?` : ''} (scenarios: ${listed(byModel)})`, 'scenario');
}

function same(a: string, b: string): boolean {
  return a.trim().toLowerCase() === b.trim().toLowerCase();
}

/**
 * One scenario of a table as a run uses it: its rows on the annual grid, spliced onto the bundled
 * history (pathwayFromParsed, exactly as a pathway file), with the table reader's notes first.
 *
 * @throws InputError with the scenario's problems, when it has any
 */
export function scenarioPathway(scenario: IamcScenario, options: LoadPathwayOptions = {}): ReadPathwayResult {
  if (!scenario.parsed) throw new InputError(scenario.problems);
  const source = `${scenario.parsed.file} [model "${scenario.model}", scenario "${scenario.scenario}"]`;
  return pathwayFromParsed(scenario.parsed, { ...options, source, notes: [`read from the scenario table ${source}, region World`, ...scenario.notes] });
}

import type { Command } from 'commander';
import { ConfigError } from '../errors.js';
import { isScenarioTable, readScenarioTable, scenarioPathway, selectScenario } from '../io/iamc-read.js';
import { readPathway, type LoadPathwayOptions, type ReadPathwayResult } from '../io/load-pathway.js';
import type { CliIo } from './cli-io.js';
import { pathwayArg } from './options.js';

/** `--scenario` (repeatable where a command takes several pathways) and `--model`. */
export interface ScenarioOptions {
  scenario?: string[];
  model?: string;
}

/**
 * Adds `--scenario NAME` and `--model NAME` to a command that takes pathways, so that a scenario
 * table in the IAMC layout (.csv or .xlsx) can stand where a pathway file does. With `several`,
 * `--scenario` may be repeated (each names one pathway).
 */
export function addScenarioOptions(cmd: Command, several: boolean): Command {
  return cmd
    .option(
      '--scenario <name>',
      several ? 'with a scenario table (IAMC layout, .csv or .xlsx): the scenario to use; repeat for several' : 'with a scenario table (IAMC layout, .csv or .xlsx): the scenario to use',
      (value: string, previous: string[] | undefined) => [...(previous ?? []), value],
    )
    .option('--model <name>', 'with a scenario table: the model, when several models use the scenario name');
}

/**
 * Reads the pathways a command's arguments name: pathway files and bundled names as readPathway
 * reads them, and each `--scenario` of a scenario table (or its only scenario) as scenarioPathway
 * reads it, both with the same `load` options. A table is read once however many scenarios are taken from it.
 *
 * @throws ConfigError when `--scenario` or `--model` is given without a scenario table, or a
 *   command that takes one pathway gets several scenarios; InputError for bad files or scenarios
 */
export async function readPathwayArgs(args: string[], opts: ScenarioOptions, load: LoadPathwayOptions, io: CliIo, several = true): Promise<ReadPathwayResult[]> {
  const reads: ReadPathwayResult[] = [];
  let tables = 0;
  for (const arg of args) {
    const path = pathwayArg(arg, io);
    if (!isScenarioTable(path)) {
      reads.push(readPathway(path, load));
      continue;
    }
    tables++;
    const table = await readScenarioTable(path);
    const names = opts.scenario ?? [undefined];
    if (!several && names.length > 1) throw new ConfigError('--scenario names one scenario here; to put several side by side use `warmcast compare TABLE --scenario A --scenario B`', 'scenario');
    for (const name of names) reads.push(scenarioPathway(selectScenario(table, { scenario: name, model: opts.model }), load));
  }
  if (tables === 0 && (opts.scenario !== undefined || opts.model !== undefined)) {
    throw new ConfigError(`--${opts.scenario !== undefined ? 'scenario' : 'model'} picks a scenario of a scenario table (IAMC layout: Model, Scenario, Region, Variable, Unit columns), but no table was given`, opts.scenario !== undefined ? 'scenario' : 'model');
  }
  return reads;
}

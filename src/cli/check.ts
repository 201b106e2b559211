import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { Command } from 'commander';
import { InputError, WarmcastError, type InputProblem } from '../errors.js';
import { describeAgentSources, describePathway, readPathway } from '../io/index.js';
import { describeScenarioTable } from '../io/iamc-describe.js';
import { isScenarioTable, readScenarioTable } from '../io/iamc-read.js';
import type { CliIo } from './cli-io.js';
import { pathwayArg, absentEmissionsOption, co2JumpOption } from './options.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';

/** `warmcast check FILE...`: report what each pathway file or scenario table holds, or every problem in it. */
export function checkCommand(io: CliIo): Command {
  const cmd = new Command('check')
    .description('check pathway files and scenario tables: what was read (years, columns, units, interpolation, splice, where each forcing agent comes from; for a table each scenario\'s agents given and filled) or every problem found')
    .argument('<pathway...>', 'pathway CSV files, bundled names or scenario tables (IAMC layout, .csv or .xlsx)')
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'check without splicing onto the bundled history')
    .addOption(co2JumpOption());
  addScenarioOptions(cmd, true)
    .addHelpText('after', '\nExamples:\n  warmcast check my-pathway.csv pathways/swift.csv\n  warmcast check scenarios.xlsx                      # every scenario: agents given and filled\n  warmcast check scenarios.xlsx --scenario Quick     # one scenario in full\n')
    .action(async (pathways: string[], opts: ScenarioOptions & { splice: boolean; absentEmissions?: AbsentEmissionsRule; co2JumpIntended?: boolean }) => {
      const problems: InputProblem[] = [];
      const picking = opts.scenario !== undefined || opts.model !== undefined;
      const load = { splice: opts.splice, absentEmissions: opts.absentEmissions, co2JumpIntended: opts.co2JumpIntended };
      for (const arg of pathways) {
        try {
          const path = pathwayArg(arg, io);
          if (isScenarioTable(path) && !picking) {
            const described = describeScenarioTable(await readScenarioTable(path), load);
            io.stdout(described.lines.join('\n') + '\n\n');
            problems.push(...described.problems);
            continue;
          }
          const reads = picking ? await readPathwayArgs([arg], opts, load, io) : [readPathway(path, load)];
          for (const read of reads) {
            const lines = [...describePathway(read.parsed, read.pathway), ...describeAgentSources(read.annual, read.pathway, read.emissionForcing)];
            io.stdout(lines.join('\n') + '\n\n');
          }
        } catch (e) {
          if (e instanceof InputError) problems.push(...e.problems);
          else if (e instanceof WarmcastError && e.exitCode === 2 && !picking) problems.push({ file: arg, code: e.code, message: e.message });
          else throw e;
        }
      }
      if (problems.length > 0) throw new InputError(problems);
    });
  return cmd;
}

import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { Command } from 'commander';
import { InputError, WarmcastError, type InputProblem } from '../errors.js';
import { describeAgentSources, describePathway, readPathway } from '../io/index.js';
import type { CliIo } from './cli-io.js';
import { pathwayArg, absentEmissionsOption, co2JumpOption } from './options.js';

/** `warmcast check FILE...`: report what each pathway file holds, or every problem in it. */
export function checkCommand(io: CliIo): Command {
  return new Command('check')
    .description('check pathway files: what was read (years, columns, units, interpolation, splice) or every problem found')
    .argument('<pathway...>', 'pathway CSV files or bundled names')
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'check without splicing onto the bundled history')
    .addOption(co2JumpOption())
    .addHelpText('after', '\nExample:\n  warmcast check my-pathway.csv pathways/swift.csv\n')
    .action((pathways: string[], opts: { splice: boolean; absentEmissions?: AbsentEmissionsRule; co2JumpIntended?: boolean }) => {
      const problems: InputProblem[] = [];
      for (const arg of pathways) {
        try {
          const read = readPathway(pathwayArg(arg, io), { splice: opts.splice, absentEmissions: opts.absentEmissions, co2JumpIntended: opts.co2JumpIntended });
          const lines = [...describePathway(read.parsed, read.pathway), ...describeAgentSources(read.annual, read.pathway, read.emissionForcing)];
          io.stdout(lines.join('\n') + '\n\n');
        } catch (e) {
          if (e instanceof InputError) problems.push(...e.problems);
          else if (e instanceof WarmcastError) problems.push({ file: arg, code: e.code, message: e.message });
          else throw e;
        }
      }
      if (problems.length > 0) throw new InputError(problems);
    });
}

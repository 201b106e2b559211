import { Command } from 'commander';
import { listBundledPathways } from '../io/index.js';
import type { CliIo } from './cli-io.js';

/** `warmcast pathways`: list the bundled pathways. */
export function pathwaysCommand(io: CliIo): Command {
  return new Command('pathways')
    .description('list the bundled pathways (illustrative inventions, not forecasts)')
    .addHelpText('after', '\nExample:\n  warmcast pathways\n  warmcast run swift\n')
    .action(() => {
      const list = listBundledPathways();
      const nameWidth = Math.max(4, ...list.map((p) => p.name.length));
      io.stdout(`${'name'.padEnd(nameWidth)}  years      kind            title\n`);
      for (const p of list) {
        const kind = p.columns.some((c) => c.endsWith('_gtco2') || c.endsWith('_mt')) ? 'emissions' : 'concentrations';
        io.stdout(`${p.name.padEnd(nameWidth)}  ${p.firstYear}-${p.lastYear}  ${kind.padEnd(14)}  ${p.title}\n`);
        if (p.description) io.stdout(`${' '.repeat(nameWidth)}  ${p.description}\n`);
      }
      io.stdout('\nThe futures are illustrative inventions for examples, not forecasts or published scenarios.\n');
    });
}

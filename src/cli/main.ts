import { Command, CommanderError } from 'commander';
import { WarmcastError } from '../errors.js';
import { attributeCommand } from './attribute.js';
import { batchCommand } from './batch.js';
import { budgetCommand } from './budget.js';
import { calibrateCommand } from './calibrate.js';
import { checkCommand } from './check.js';
import { compareCommand } from './compare.js';
import { ensembleCommand, mergeCommand } from './ensemble.js';
import type { CliIo } from './cli-io.js';
import { pathwaysCommand } from './pathways.js';
import { runCommand } from './run.js';
import { verifyCommand } from './verify.js';
import { packageVersion } from './version.js';

/**
 * Runs the warmcast command line in-process: parses `argv` (without the node and script entries),
 * runs the command, writes through `io`, and returns the exit code (0 ok, 1 internal or numerical
 * failure, 2 bad input or options). Errors never escape; `--debug` adds stack traces.
 *
 * @example await main(['run', 'delayed', '--out', 'delayed.csv'], processIo()) // 0
 */
export async function main(argv: string[], io: CliIo): Promise<number> {
  const debug = argv.includes('--debug');
  const program = new Command('warmcast')
    .description(
      'Year-by-year global warming projections from emission or concentration pathways ' +
        '(reduced-complexity, global mean; see the README for cautions).',
    )
    .version(packageVersion(), '-V, --version')
    .option('--debug', 'show stack traces for errors')
    .showHelpAfterError('(add --help for usage)')
    .addHelpText('after', '\nExamples:\n  warmcast run                      # the default bundled pathway\n  warmcast run swift --out swift.csv\n  warmcast compare steady delayed swift --out report.html\n  warmcast ensemble swift --members 2000 --seed 7 --out swift-ens.csv\n  warmcast batch pathways/examples/invented-scenarios.csv --out summary.csv\n  warmcast pathways\n');
  for (const make of [runCommand, compareCommand, ensembleCommand, batchCommand, attributeCommand, budgetCommand, mergeCommand, calibrateCommand, checkCommand, verifyCommand, pathwaysCommand]) {
    program.addCommand(make(io));
  }
  const configure = (cmd: Command) => {
    cmd.exitOverride().configureOutput({
      writeOut: (s) => io.stdout(s),
      writeErr: (s) => io.stderr(s),
      // Option and usage errors start like every other error of the tool.
      outputError: (s, write) => write(s.replace(/^error: /, 'warmcast: ')),
    });
    for (const sub of cmd.commands) configure(sub);
  };
  configure(program);
  try {
    await program.parseAsync(argv, { from: 'user' });
    return 0;
  } catch (e) {
    if (e instanceof CommanderError) {
      // Help and version exit with code 0 through the same path.
      return e.exitCode === 0 ? 0 : 2;
    }
    if (e instanceof WarmcastError) {
      io.stderr(`warmcast: ${e.message}\n`);
      if (debug && e.stack) io.stderr(e.stack + '\n');
      return e.exitCode;
    }
    const err = e as Error;
    io.stderr(`warmcast: internal error: ${err?.message ?? String(e)}\n`);
    io.stderr(debug && err?.stack ? err.stack + '\n' : '(run again with --debug for details, and please report it)\n');
    return 1;
  }
}

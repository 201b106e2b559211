import { extname, join } from 'node:path';
import { Command } from 'commander';
import { ConfigError, WarmcastError } from '../errors.js';
import { bundledPathwaysDir } from '../io/index.js';
import type { Table } from '../io/table.js';
import { plainTable } from '../report/plain-table.js';
import { PUBLISHED_CHECKS, runPublishedChecks, VERIFICATION_COLUMNS, type PublishedCheck, type VerificationRow } from '../verify/index.js';
import type { CliIo } from './cli-io.js';
import { announceWritten, tableRenderers, writeOutput } from './output.js';

/**
 * `warmcast verify`: runs the published checks (verify/registry.ts) on this machine and prints the
 * table `check, source, published, warmcast, tolerance, pass`; `--out` writes it as .csv (+ .meta.json),
 * .md or .json. Exit 0 when every check passes, 1 when any fails.
 *
 * @param checks the checks to run (default every published check; tests pass their own)
 */
export function verifyCommand(io: CliIo, checks: readonly PublishedCheck[] = PUBLISHED_CHECKS): Command {
  return new Command('verify')
    .description('check warmcast against published values on this machine (AR6 forcing, two-box analytic solution, calibration, Joos et al. 2013, history): exit 0 if all pass, 1 if any fails')
    .option('-o, --out <file>', 'also write the table: .csv (+ .meta.json), .json, .md')
    .addHelpText('after', '\nExamples:\n  warmcast verify\n  warmcast verify --out verify.md\n')
    .action((opts: { out?: string }) => {
      // Before the checks run: a file the command cannot write is a mistake to report at once.
      if (opts.out && opts.out !== '-' && !['.csv', '.json', '.md'].includes(extname(opts.out).toLowerCase())) {
        throw new ConfigError(`--out ${opts.out}: the extension must be one of .csv, .json, .md (it picks the format)`, 'out');
      }
      const rows = runPublishedChecks(checks);
      io.stdout(plainTable({ columns: [...VERIFICATION_COLUMNS], rows: rows.map(cells) }, ''));
      const failed = rows.filter((r) => !r.pass);
      io.stdout(`\n${rows.length - failed.length} of ${rows.length} checks pass.\n`);
      if (opts.out) {
        const written = writeOutput(opts.out, tableRenderers(verificationTable(rows)), {
          io,
          inputs: [join(bundledPathwaysDir(), 'history.csv')],
          baseline: [1850, 1900],
          notes: ['each row compares one published value with what this installation of warmcast computes; "pass" is yes when it is within the tolerance'],
        });
        announceWritten(written, io);
      }
      if (failed.length > 0) {
        throw new WarmcastError(`${failed.length} of ${rows.length} published checks failed: ${failed.map((r) => r.check).join('; ')}`, 'verify.failed', 1);
      }
    });
}

const cells = (r: VerificationRow): string[] => [r.check, r.source, r.published, r.warmcast, r.tolerance, r.pass ? 'yes' : 'no'];

/** The rows as a table of text columns for the file writers. */
function verificationTable(rows: VerificationRow[]): Table {
  const text = rows.map(cells);
  return {
    columns: [...VERIFICATION_COLUMNS],
    data: [],
    textColumns: Object.fromEntries(VERIFICATION_COLUMNS.map((name, j) => [name, text.map((row) => row[j])])),
  };
}

import { join } from 'node:path';
import { Command } from 'commander';
import { WarmcastError } from '../errors.js';
import { bundledPathwaysDir } from '../io/index.js';
import { plainTable, standardCautions, type OutputDocument, type OutputTable } from '../report/index.js';
import { PUBLISHED_CHECKS, runPublishedChecks, VERIFICATION_COLUMNS, type PublishedCheck, type VerificationRow } from '../verify/index.js';
import type { CliIo } from './cli-io.js';
import { announceWritten, checkOutExtension, writeDocument } from './output.js';

/** A verification document has no chart: its formats are the registry's without .svg. */
const NO_CHARTS = { charts: [] };

/**
 * `warmcast verify`: runs the published checks (verify/registry.ts) on this machine and prints the
 * table `check, source, published, warmcast, tolerance, pass`; `--out` writes it through the output
 * registry in every format that fits a table (.csv + .meta.json, .json, .md, .html, .xlsx). Exit 0
 * when every check passes, 1 when any fails.
 *
 * @param checks the checks to run (default every published check; tests pass their own)
 */
export function verifyCommand(io: CliIo, checks: readonly PublishedCheck[] = PUBLISHED_CHECKS): Command {
  return new Command('verify')
    .description('check warmcast against published values on this machine (AR6 forcing, two-box analytic solution, calibration, Joos et al. 2013, history): exit 0 if all pass, 1 if any fails')
    .option('-o, --out <file>', 'also write the table: .csv (+ .meta.json), .json, .md, .html, .xlsx')
    .addHelpText('after', '\nExamples:\n  warmcast verify\n  warmcast verify --out verify.md\n')
    .action(async (opts: { out?: string }) => {
      // Before the checks run: a file the command cannot write is a mistake to report at once.
      if (opts.out && opts.out !== '-') checkOutExtension(opts.out, NO_CHARTS);
      const rows = runPublishedChecks(checks);
      const table = verificationTable(rows);
      io.stdout(plainTable(table).map((l) => l.slice(2)).join('\n') + '\n');
      const failed = rows.filter((r) => !r.pass);
      const summary = `${rows.length - failed.length} of ${rows.length} checks pass.`;
      io.stdout(`\n${summary}\n`);
      if (opts.out) {
        const doc: OutputDocument = {
          command: 'verify',
          title: 'warmcast verify: published checks',
          subtitle: summary,
          baseline: [1850, 1900],
          headline: [],
          data: table,
          tables: [table],
          ...NO_CHARTS,
          notes: ['each row compares one published value with what this installation of warmcast computes; "pass" is yes when it is within the tolerance'],
          cautions: standardCautions(),
          shortCaution: '',
        };
        announceWritten(await writeDocument(opts.out, doc, { io, inputs: [join(bundledPathwaysDir(), 'history.csv')], baseline: [1850, 1900] }), io);
      }
      if (failed.length > 0) {
        throw new WarmcastError(`${failed.length} of ${rows.length} published checks failed: ${failed.map((r) => r.check).join('; ')}`, 'verify.failed', 1);
      }
    });
}

const cells = (r: VerificationRow): string[] => [r.check, r.source, r.published, r.warmcast, r.tolerance, r.pass ? 'yes' : 'no'];

/** The rows as a table of text columns (the one table model). */
function verificationTable(rows: VerificationRow[]): OutputTable {
  const text = rows.map(cells);
  return { name: 'checks', columns: VERIFICATION_COLUMNS.map((key, j) => ({ key, values: text.map((row) => row[j]) })) };
}

import { Command, InvalidArgumentError, Option } from 'commander';
import { availableParallelism } from 'node:os';
import { extname, join, resolve } from 'node:path';
import { closeSync, existsSync, mkdirSync, openSync, readFileSync, readSync } from 'node:fs';
import { BATCH_PERCENTILE_NAMES, CUMULATIVE_FROM, PEAK_YEARS } from '../batch/assess-scenario.js';
import { batchErrorTable, batchSummaryTable, medianCrossingColumn, probPeakAboveColumn } from '../batch/batch-summary.js';
import { batchShardFromJson, batchShardToJson, isBatchShardText, mergeBatchShards, type BatchSettings } from '../batch/batch-shard.js';
import { batchErrorLines, type BatchOutcome } from '../batch/run-batch.js';
import { runBatchThreads } from './batch-threads.js';
import { AR6_WARMING_CATEGORIES } from '../batch/warming-category.js';
import { CATEGORY_RESAMPLES, UNCERTAIN_AGREEMENT } from '../batch/category-agreement.js';
import { ConfigError, InputError, PartialFailureError } from '../errors.js';
import { shardRange } from '../ensemble/index.js';
import { readScenarioTable } from '../io/iamc-read.js';
import { bundledPathwaysDir, writeFilesAtomic } from '../io/index.js';
import { CALIBRATED_SET_CAUTION, csvText, shortCaution, standardCautions, type OutputDocument, type OutputTable } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { absentEmissionsOption, baselineOption, cautionsHelp, pathwayArg, thresholdsOption, wholeNumberOption } from './options.js';
import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { announceWritten, checkOutExtension, printDocument, writeDocument, type WrittenFile } from './output.js';
import { progressBar } from './progress.js';
import { sha256File } from './provenance.js';
import { resolveModelParams } from './options.js';

/** Members per scenario when `--members` is not given: enough for the 5-95 % range of a 1,000-scenario set in minutes. */
export const BATCH_DEFAULT_MEMBERS = 600;

/** Levels a batch always reports (the AR6 WG3 categories and planners' questions turn on them); --thresholds adds more. */
const ALWAYS_THRESHOLDS = [1.5, 2];

/** A batch summary has tables and no charts: every format of the output registry but .svg. */
const NO_CHARTS = { charts: [] };

interface BatchOptions {
  members: number;
  seed: number;
  thresholds: number[];
  baseline: [number, number];
  co2Formula: 'ar6' | 'log';
  out?: string;
  notes?: boolean;
  outDir?: string;
  shard?: { index: number; count: number };
  workers?: number;
  splice: boolean;
  absentEmissions?: AbsentEmissionsRule;
  prior: boolean;
}

function shardOption(text: string): { index: number; count: number } {
  const m = /^(\d+)\/(\d+)$/.exec(text.trim());
  if (!m || Number(m[1]) < 1 || Number(m[1]) > Number(m[2])) throw new InvalidArgumentError(`must be K/N with 1 <= K <= N, such as 3/20; got "${text}"`);
  return { index: Number(m[1]), count: Number(m[2]) };
}

/** `warmcast batch TABLE`: every scenario of a table through the ensemble, one summary row each. */
export function batchCommand(io: CliIo): Command {
  return new Command('batch')
    .description('assess every scenario of a scenario table (IAMC layout, .csv or .xlsx) with the ensemble: peak and 2100 warming ranges, threshold probabilities, crossing and net-zero years, AR6 WG3 category')
    .argument('<table>', 'scenario table in the IAMC layout (.csv or .xlsx)')
    .option('-n, --members <count>', 'ensemble members per scenario (every scenario uses the same members)', wholeNumberOption('--members', 1), BATCH_DEFAULT_MEMBERS)
    .option('--seed <integer>', 'random seed (a scenario\'s row equals `warmcast ensemble TABLE --scenario NAME` with the same seed and members)', wholeNumberOption('--seed', 0), 1)
    .addOption(thresholdsOption('warming levels in K for prob_peak_above_<t> and median_crossing_year_<t> (1.5 and 2 are always reported)', ALWAYS_THRESHOLDS))
    .addOption(baselineOption())
    .option('-o, --out <file>', 'write the summary: .csv (+ .meta.json, + .errors.csv), .json, .md, .html, .xlsx (the output registry; no charts, so no .svg); - for CSV on stdout; with --shard a .json shard file for `warmcast merge`')
    .option('--notes', 'print every note on how the table was read and run (files always keep them)')
    .option('--out-dir <dir>', 'also write each scenario\'s yearly warming percentiles and probabilities to DIR/<model>--<scenario>.csv (+ .meta.json)')
    .option('--shard <K/N>', 'assess only the K-th of N equal slices of the scenarios and write a shard file (--out NAME.json); combine with `warmcast merge`', shardOption)
    .option('--prior', 'draw the members from the prior of the calibrated set, unweighted by the observed record (the unconstrained spread, for comparison)', false)
    .option('--workers <count>', 'threads (default one per core; the output does not depend on it)', wholeNumberOption('--workers', 1))
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'do not splice scenarios onto the bundled history')
    .addOption(new Option('--co2-formula <name>', 'CO2 forcing: ar6 (Meinshausen et al. 2020 + AR6 adjustment) or log (Myhre et al. 1998)').choices(['ar6', 'log']).default('ar6', 'ar6'))
    .addHelpText(
      'after',
      '\nExit codes: 0 every scenario assessed; 3 some scenarios failed (the summary holds the others, the errors table lists the failures); 2 bad input or options, or no scenario could be assessed; 1 internal failure.\n' +
        '\nExamples:\n  warmcast batch pathways/examples/invented-scenarios.csv --out summary.csv\n' +
        '  warmcast batch scenarios.xlsx --members 1000 --seed 7 --thresholds 1.5,2,3 --out summary.xlsx --out-dir trajectories\n' +
        '  warmcast batch scenarios.xlsx --shard 3/20 --out shard-3.json      # one task of an array job\n' +
        '  warmcast merge shard-*.json --out summary.csv\n' +
        cautionsHelp([standardCautions()[0], batchUncertainty('the --members'), standardCautions()[2]]),
    )
    .action(async (arg: string, opts: BatchOptions) => {
      if (opts.seed >= 2 ** 32) throw new ConfigError('--seed must be below 2^32', 'seed');
      const ext = opts.out === undefined ? undefined : extname(opts.out).toLowerCase();
      if (opts.shard && ext !== '.json') throw new ConfigError('--shard writes a shard file: give --out NAME.json', 'out');
      if (!opts.shard && opts.out !== undefined && opts.out !== '-') checkOutExtension(opts.out, NO_CHARTS);
      const thresholds = [...new Set([...ALWAYS_THRESHOLDS, ...opts.thresholds])].sort((a, b) => a - b);
      const { params } = resolveModelParams({ co2Formula: opts.co2Formula }, io);
      const path = resolve(io.cwd, pathwayArg(arg, io));
      const table = await readScenarioTable(pathwayArg(arg, io));
      if (opts.shard && opts.shard.count > table.scenarios.length) {
        throw new ConfigError(`--shard ${opts.shard.index}/${opts.shard.count}: the table has only ${table.scenarios.length} scenarios; use at most ${table.scenarios.length} shards`, 'shard');
      }
      const scenarios = table.scenarios;
      const { from, to } = shardRange(scenarios.length, opts.shard);
      const outDir = opts.outDir === undefined ? undefined : resolve(io.cwd, opts.outDir);
      if (outDir) mkdirSync(outDir, { recursive: true });
      const settings: BatchSettings = {
        table: { path: arg, sha256: sha256File(path) },
        scenarios: scenarios.length,
        members: opts.members,
        seed: opts.seed,
        thresholds,
        baseline: opts.baseline,
        co2Formula: params.co2Formula,
        splice: opts.splice,
        absentEmissions: opts.absentEmissions ?? null,
        members_from: opts.prior ? 'prior of the calibrated set' : 'calibrated set',
      };
      const inputs = [path, join(bundledPathwaysDir(), 'history.csv')];
      let ensembleNotes: string[] = [];
      const trajectories: Promise<WrittenFile[]>[] = [];
      const outcome = await runBatchThreads(scenarios, from, to, {
        params,
        members: opts.members,
        seed: opts.seed,
        thresholds,
        baseline: opts.baseline,
        load: { splice: opts.splice, absentEmissions: opts.absentEmissions },
        prior: opts.prior,
        threads: opts.workers ?? availableParallelism(),
        onProgress: progressBar(io, 'scenarios', 1),
        onYearly: (index, t, notes, runNotes) => {
          if (ensembleNotes.length === 0) ensembleNotes = runNotes;
          if (!outDir) return;
          const s = scenarios[index];
          const yearly: OutputTable = { name: 'yearly', columns: t.columns.map((key) => ({ key, values: t.values[key] })) };
          const doc = batchDocument({
            title: `warmcast batch: ${s.scenario} (model ${s.model}), yearly warming`,
            subtitle: `${opts.members} members, seed ${opts.seed}; warming relative to the ${opts.baseline.join('-')} mean`,
            baseline: opts.baseline,
            data: yearly,
            tables: [],
            notes,
            members: opts.members,
          });
          trajectories.push(
            writeDocument(join(outDir, `${fileStem(s.model)}--${fileStem(s.scenario)}.csv`), doc, {
              inputs,
              parameters: { co2_formula: params.co2Formula },
              baseline: opts.baseline,
              seed: opts.seed,
              pathway: `${s.scenario} (model ${s.model})`,
              io,
            }),
          );
        },
      });
      const notes = [...table.notes.map((n) => `table: ${n}`), ...batchNotes(thresholds), ...ensembleNotes];
      await Promise.all(trajectories);
      if (outDir && trajectories.length > 0) io.stderr(`wrote ${trajectories.length} yearly trajectories to ${outDir}\n`);

      if (opts.shard) {
        const shardPath = resolve(io.cwd, opts.out!);
        const replaced = existsSync(shardPath);
        writeFilesAtomic([{ path: shardPath, content: batchShardToJson({ settings, shard: opts.shard!, outcome, notes }) }], { inputs });
        announceWritten([{ path: shardPath, replaced }], io);
        io.stderr(`shard ${opts.shard.index}/${opts.shard.count}: scenarios ${from + 1}-${to} of ${scenarios.length}; combine all shards with \`warmcast merge\`\n`);
        finish(outcome, io, to - from);
        return;
      }
      await emitBatch(outcome, { settings, notes, inputs, out: opts.out, showNotes: opts.notes, io });
    });
}

/**
 * Writes and prints a batch's summary (from one run or merged shards) and its errors, then ends
 * with exit code 3 when some scenarios failed, or 2 when none could be assessed. The summary is an
 * OutputDocument of the output registry: `data` is the summary table (CSV, JSON, the xlsx `data`
 * sheet), `tables` the short human table (the terminal's), the summary again with human digits and,
 * when some scenarios failed, the errors table (Markdown, HTML, xlsx sheets); the errors also go to JSON (`errors`) and, beside a CSV, to
 * NAME.errors.csv.
 */
export async function emitBatch(outcome: BatchOutcome, ctx: { settings: BatchSettings; notes: string[]; inputs: string[]; out?: string; showNotes?: boolean; io: CliIo }): Promise<void> {
  const { settings, io } = ctx;
  if (outcome.rows.length === 0 && outcome.errors.length > 0) throw new InputError(outcome.errors.flatMap((e) => e.problems.map((p) => (p.file === '' ? { ...p, file: settings.table.path } : p))));
  const hasErrors = outcome.errors.length > 0;
  const errors = batchErrorTable(outcome);
  const errorList = outcome.errors.map((e) => ({ model: e.model, scenario: e.scenario, code: e.code, problems: batchErrorLines(e) }));
  const rows = outcome.rows;
  const counts = AR6_WARMING_CATEGORIES.map((c) => [c.code, rows.filter((r) => r.category === c.code).length] as const).filter(([, n]) => n > 0);
  const uncertain = rows.filter((r) => r.categoryAgreement < UNCERTAIN_AGREEMENT).length;
  const summary = batchSummaryTable(outcome, settings.thresholds);
  const doc = batchDocument({
    title: `warmcast batch: ${settings.table.path}`,
    subtitle:
      `${rows.length} scenario${rows.length === 1 ? '' : 's'} assessed, ${settings.members} members each (seed ${settings.seed}); warming relative to ${settings.baseline.join('-')}; peak over ${PEAK_YEARS.join('-')}. ` +
      `AR6 WG3 categories: ${counts.map(([c, n]) => `${c} ${n}`).join(', ')}` +
      (uncertain > 0 ? `; ${uncertain} marked "?" (category_agreement below ${UNCERTAIN_AGREEMENT})` : ''),
    baseline: settings.baseline,
    data: summary,
    // Markdown and HTML show the short table, then every column (as the previous Markdown summary did), then the failures.
    tables: [batchHumanTable(outcome, settings), { ...summary, name: 'summary', caption: 'every figure per scenario' }, ...(hasErrors ? [errors] : [])],
    notes: ctx.notes,
    members: settings.members,
    ...(hasErrors ? { json: { errors: errorList } } : {}),
  });
  if (ctx.out !== undefined) {
    const written = await writeDocument(ctx.out, doc, {
      inputs: ctx.inputs,
      parameters: { co2_formula: settings.co2Formula, members: settings.members },
      baseline: settings.baseline,
      seed: settings.seed,
      io,
    });
    if (ctx.out !== '-' && extname(ctx.out).toLowerCase() === '.csv' && hasErrors) {
      const path = resolve(io.cwd, ctx.out);
      const errorsPath = path.slice(0, -4) + '.errors.csv';
      const replaced = existsSync(errorsPath);
      writeFilesAtomic([{ path: errorsPath, content: csvText(errors) }], { inputs: ctx.inputs });
      written.push({ path: errorsPath, replaced });
    }
    announceWritten(written, io);
  }
  // The terminal shows at most 20 rows when a file holds them all (more than 40), and no errors table (stderr lists them).
  const human = doc.tables[0];
  const cut = ctx.out !== undefined && rows.length > 40;
  const shown = cut ? { ...human, columns: human.columns.map((c) => ({ ...c, values: (c.values as readonly string[]).slice(0, 20) })) } : human;
  const more = cut ? [`... ${rows.length - 20} more scenarios in the file written`] : [];
  printDocument({ ...doc, tables: [shown], terminalNotes: [...more, agreementNote(outcome)] }, { out: ctx.out, notes: ctx.showNotes, chart: false }, io);
  finish(outcome, io, outcome.rows.length + outcome.errors.length);
}

/** A batch's document (the summary, or one scenario's yearly trajectory): no headline, no charts, the batch's cautions. */
function batchDocument(d: { title: string; subtitle: string; baseline: readonly [number, number]; data: OutputTable; tables: OutputTable[]; notes: string[]; members: number; json?: Record<string, unknown> }): OutputDocument {
  return {
    command: 'batch',
    title: d.title,
    subtitle: d.subtitle,
    baseline: d.baseline,
    headline: [],
    data: d.data,
    tables: d.tables,
    ...NO_CHARTS,
    notes: d.notes,
    cautions: [standardCautions()[0], batchUncertainty(d.members), standardCautions()[2]],
    shortCaution: shortCaution('batch', true),
    ...(d.json ? { json: d.json } : {}),
  };
}

/** Prints the errors table and throws PartialFailureError (exit 3) when some scenarios failed. */
function finish(outcome: BatchOutcome, io: CliIo, total: number): void {
  if (outcome.errors.length === 0) return;
  io.stderr(`\n${outcome.errors.length} scenario${outcome.errors.length === 1 ? '' : 's'} could not be assessed:\n`);
  for (const e of outcome.errors) for (const line of batchErrorLines(e)) io.stderr(`  ${line}\n`);
  throw new PartialFailureError(`${outcome.errors.length} of ${total} scenarios failed (listed above${total > outcome.errors.length ? '; the summary holds the others' : ''}); exit code 3`);
}

/** The short human table (terminal, Markdown, HTML, an xlsx sheet): one line per scenario, the figures planners read first, as text. */
function batchHumanTable(outcome: BatchOutcome, settings: BatchSettings): OutputTable {
  const rows = outcome.rows;
  const pct = (p: number) => `${Math.round(100 * p)} %`;
  const col = (key: string, label: string, values: string[]) => ({ key, label, values });
  return {
    name: 'scenarios',
    caption: 'one line per scenario',
    notes: [agreementNote(outcome)],
    columns: [
      col('model', 'model', rows.map((r) => r.model)),
      col('scenario', 'scenario', rows.map((r) => r.scenario)),
      col('category', 'cat.', rows.map((r) => (r.categoryAgreement < UNCERTAIN_AGREEMENT ? `${r.category}?` : r.category))),
      col('peak_warming_k', 'peak K (5-95 %)', rows.map((r) => `${r.peakWarmingK.p50.toFixed(2)} (${r.peakWarmingK.p05.toFixed(2)}-${r.peakWarmingK.p95.toFixed(2)})`)),
      col('peak_year_p50', 'peak yr', rows.map((r) => String(r.peakYearP50))),
      col('warming_2100_p50_k', '2100 K', rows.map((r) => (r.warming2100K ? r.warming2100K.p50.toFixed(2) : '-'))),
      col('prob_peak_above_1.5', 'P(peak>1.5)', rows.map((r) => pct(r.probPeakAbove[settings.thresholds.indexOf(1.5)].probability))),
      col('prob_peak_above_2', 'P(peak>2)', rows.map((r) => pct(r.probPeakAbove[settings.thresholds.indexOf(2)].probability))),
      col('net_zero_co2_year', 'net-zero CO2', rows.map((r) => (r.netZeroCo2Year === null ? 'not reached' : String(r.netZeroCo2Year)))),
    ],
  };
}

/** The batch's own conventions, for provenance. */
function batchNotes(thresholds: number[]): string[] {
  return [
    `peak_warming_pXX_k: percentiles across members of each member's highest annual warming over ${PEAK_YEARS.join('-')} (the 21st century, as the AR6 WG3 categories judge it); peak_year_p50: median of the members' peak years; warming_2100_pXX_k: percentiles of the members' warming in 2100 (${BATCH_PERCENTILE_NAMES.join(', ')}; Hyndman & Fan 1996 definition 7)`,
    `${thresholds.map(probPeakAboveColumn).join(', ')}: share of members whose peak warming over ${PEAK_YEARS.join('-')} exceeds the level`,
    `${thresholds.map(medianCrossingColumn).join(', ')}: first year by which half of the members' 20-year means have crossed the level (IPCC AR6 rule); empty when fewer than half cross`,
    `net_zero_co2_year: first year from ${CUMULATIVE_FROM} (or the scenario's first year, cumulative_co2_from_year) with net CO2 emissions at or below zero; cumulative_co2_to_net_zero_gtco2: the sum of the annual net CO2 emissions from that year to the year before net zero (to the end when net zero is not reached)`,
    `category: IPCC AR6 WG3 warming category (codes C1-C8), the first whose criterion the members meet; criteria recalled from memory (AR6 WG3 Table SPM.2 and Annex III): ${AR6_WARMING_CATEGORIES.map((c) => `${c.code} ${c.criterion}`).join('; ')}`,
    'filled_by: the forcing agents a scenario does not give, and how the run fills them',
    `category_agreement: share of ${CATEGORY_RESAMPLES} bootstrap resamples of the scenario's members (drawn with replacement, each keeping its peak and 2100 warming; seeded from --seed) that give the same category, 0 to 1; below ${UNCERTAIN_AGREEMENT} the category is marked "?" in the terminal, Markdown and HTML tables, as another draw of as many members (another --seed or --members) may give a neighbouring one`,
    'every scenario runs the same members (same seed), so differences between rows come from the scenarios, not from sampling; each row still carries the sampling error of its members, which category_agreement measures for the category',
  ];
}

/** What category_agreement means for this batch, and how many scenarios fall below UNCERTAIN_AGREEMENT. */
function agreementNote(outcome: BatchOutcome): string {
  const below = outcome.rows.filter((r) => r.categoryAgreement < UNCERTAIN_AGREEMENT).length;
  if (below === 0) return `every scenario's category is given by at least ${Math.round(UNCERTAIN_AGREEMENT * 100)} % of ${CATEGORY_RESAMPLES} bootstrap resamples of its members (category_agreement): no category marked "?"`;
  const n = outcome.rows.length;
  return (
    `${below} of ${n} scenario${n === 1 ? '' : 's'} ${below === 1 ? 'has its' : 'have their'} category marked "?" (category_agreement below ${UNCERTAIN_AGREEMENT}: ` +
    `fewer than ${Math.round(UNCERTAIN_AGREEMENT * 100)} % of ${CATEGORY_RESAMPLES} bootstrap resamples of the members give the same category); ` +
    'a rerun with another seed or member count may move such a scenario to a neighbouring category, so quote it with that caution'
  );
}

/** The uncertainty caution of a batch; `members` is the count, or words for it (`--help`). */
function batchUncertainty(members: number | string): string {
  return `Ranges are the spread of ${members} ensemble members per scenario, drawn from the calibrated parameter set (climate response, forcing scales and carbon cycle, constrained by the observed record); they do not include uncertainty in the scenarios or in the model structure. Categories are this model's reading of the AR6 WG3 criteria, not the IPCC's classification of these scenarios; category_agreement says how often resampling the members gives the same one. ${CALIBRATED_SET_CAUTION}`;
}


/** A name as part of a file name: letters, digits, dot, hyphen and underscore kept, the rest `_`. */
function fileStem(name: string): string {
  return name.trim().replace(/[^\w.-]+/g, '_').replace(/^\.+/, '_') || '_';
}

/**
 * Merges batch shard files (from `warmcast batch --shard K/N`) into the summary one whole batch gives;
 * called by `warmcast merge` when its files are batch shards.
 */
export async function mergeBatchFiles(files: string[], opts: { out?: string; notes?: boolean }, io: CliIo): Promise<void> {
  const shards = files.map((file) => {
    let text: string;
    try {
      text = readFileSync(resolve(io.cwd, file), 'utf8');
    } catch (e) {
      throw new InputError([{ file, code: 'input.unreadable', message: `shard file must be readable: ${(e as Error).message}`, expected: 'a shard file written by `warmcast batch --shard K/N`' }]);
    }
    return { file, shard: batchShardFromJson(text, file) };
  });
  const merged = mergeBatchShards(shards);
  await emitBatch(merged.outcome, { settings: merged.settings, notes: merged.notes, inputs: files.map((f) => resolve(io.cwd, f)), out: opts.out, showNotes: opts.notes, io });
}

/** Whether a file (as `warmcast merge` is given it) is a batch shard: its first bytes name the batch shard format. */
export function isBatchShardFile(path: string): boolean {
  try {
    const fd = openSync(path, 'r');
    try {
      const head = Buffer.alloc(200);
      const n = readSync(fd, head, 0, head.length, 0);
      return isBatchShardText(head.subarray(0, n).toString('utf8'));
    } finally {
      closeSync(fd);
    }
  } catch {
    return false;
  }
}

import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { Command, InvalidArgumentError, Option } from 'commander';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { ConfigError, InputError } from '../errors.js';
import { ensembleHeadlines, runEnsemble, shardFromJson, shardMerger, shardRange, shardToJson, summarizeEnsemble, type EnsembleOrigin, type EnsembleResult } from '../ensemble/index.js';
import { writeFilesAtomic } from '../io/index.js';
import { isBatchShardFile, mergeBatchFiles } from './batch.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';
import { ensembleInput } from '../projection/index.js';
import { CALIBRATED_SET_CAUTION, ensembleDocument, standardCautions, thresholdBaselineNote } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { baselineOption, cautionsHelp, refuseOptions, resolveModelParams, thresholdsOption, wholeNumberOption, type RefusedOption, absentEmissionsOption, co2JumpOption } from './options.js';
import { addReportOptions, announceWritten, observedRecord, pathwayInputs, printDocument, rowChoice, writeDocument, type ReportOptions } from './output.js';
import { allocationError, checkEnsembleMemory, checkMergeMemory } from './memory-check.js';
import { progressBar } from './progress.js';
import { memberSource } from './member-source.js';
import { unreadableReason } from './unreadable-reason.js';
import { buildProvenance, ensembleParameters, sha256File } from './provenance.js';

interface EnsembleCliOptions extends ReportOptions, ScenarioOptions {
  co2Formula?: 'ar6' | 'log';
  members: number;
  seed: number;
  thresholds: number[];
  baseline: [number, number];
  shard?: { index: number; count: number };
  splice: boolean;
  co2JumpIntended?: boolean;
  absentEmissions?: AbsentEmissionsRule;
  prior: boolean;
}

/** The uncertainty sentence of an ensemble's outputs, by where its members came from. */
function uncertaintyText(r: EnsembleResult): string {
  const scheme = r.config.scheme;
  const carbon = r.config.emissionDriven
    ? ' Each member also runs its own CO2 cycle, responding to its own warming, with its own multipliers on the pre-industrial iIRF100 r0 of its uptake feedback ' +
      'and on the feedback\'s warming sensitivity; CH4 and N2O follow one central run.'
    : '';
  const drawn = scheme.startsWith('calibrated set')
    ? 'drawn from the calibrated parameter set: two-box physics, a multiplier per forcing agent and carbon-cycle parameters from a broad prior, ' +
      'weighted by how well they reproduce observed warming (HadCRUT5), ocean heat uptake, the carbon sinks and the AR6 aerosol forcing'
    : scheme.startsWith('prior of calibrated set')
      ? 'drawn from the prior of the calibrated parameter set, not weighted by the observed record (the unconstrained spread, for comparison)'
      : 'whose ECS, TCR, 2xCO2 forcing and aerosol forcing were drawn to match the IPCC AR6 assessed ranges, not constrained by observed warming';
  return (
    `Ranges are the 5-95 % and 17-83 % spread of ${r.memberCount} members ${drawn}.${carbon} They do not include uncertainty in the pathway, ` +
    'year-to-year internal variability, or model structure beyond these parameters.' +
    (scheme.startsWith('calibrated set') ? ` ${CALIBRATED_SET_CAUTION}` : '')
  );
}

/** What the model options of `run` would set, and why an ensemble draws or fixes it instead. */
const SAMPLED =
  'each member takes its own feedback, heat capacities, ocean exchange, efficacy and forcing multipliers from the calibrated parameter set (or its prior with --prior)';

/** Options of `run` that `ensemble` refuses. */
const ENSEMBLE_REFUSES: RefusedOption[] = [
  { flags: '--ecs <kelvin>', why: `${SAMPLED}; for one run with a chosen ECS use \`warmcast run --ecs\`` },
  { flags: '--tcr <kelvin>', why: `${SAMPLED}; for one run with a chosen TCR use \`warmcast run --tcr\`` },
  { flags: '--params <file>', why: `${SAMPLED}, so it reads no parameters file; the CO2 formula is chosen with --co2-formula` },
];

/** Why `merge` takes no model options. */
const FROM_SHARDS = 'every setting comes from the shards (the CO2 formula they were made with; each member\'s parameters come from where the shards drew them)';
const MERGE_REFUSES: RefusedOption[] = ['--ecs <kelvin>', '--tcr <kelvin>', '--params <file>', '--co2-formula <name>'].map((flags) => ({ flags, why: FROM_SHARDS }));


function shardOption(text: string): { index: number; count: number } {
  const m = /^(\d+)\/(\d+)$/.exec(text.trim());
  if (!m || Number(m[1]) < 1 || Number(m[1]) > Number(m[2])) throw new InvalidArgumentError(`must be K/N with 1 <= K <= N, such as 3/100; got "${text}"`);
  return { index: Number(m[1]), count: Number(m[2]) };
}

/** `warmcast ensemble <pathway>`: seeded parameter ensemble, percentiles and exceedance probabilities. */
export function ensembleCommand(io: CliIo): Command {
  const cmd = new Command('ensemble')
    .description('run a seeded parameter ensemble (members drawn from the calibrated parameter set, constrained by the observed record): warming percentiles and threshold probabilities')
    .argument('<pathway>', 'pathway CSV file or bundled name');
  addReportOptions(cmd)
    .option('-n, --members <count>', 'ensemble members', wholeNumberOption('--members', 1), 1000)
    .option('--seed <integer>', 'random seed (same seed, same output on any machine, and shards merged equal one run)', wholeNumberOption('--seed', 0), 1)
    .addOption(thresholdsOption('warming levels in K above the baseline (above 0) for exceedance probabilities', [1.5, 2, 3]))
    .addOption(baselineOption())
    .addOption(absentEmissionsOption())
    .option('--shard <K/N>', 'run only the K-th of N equal slices of the members and write them as a shard file (.json) for `warmcast merge`', shardOption)
    .option('--no-splice', 'do not splice a pathway that starts late onto the bundled history')
    .addOption(co2JumpOption())
    .option('--prior', 'draw the members from the prior of the calibrated set, unweighted by the observed record: the unconstrained spread, for comparison', false)
    .addOption(new Option('--co2-formula <name>', 'CO2 forcing: ar6 (Meinshausen et al. 2020 + AR6 adjustment) or log (Myhre et al. 1998)').choices(['ar6', 'log']).default('ar6', 'ar6'));
  refuseOptions(addScenarioOptions(cmd, false), ENSEMBLE_REFUSES)
    .addHelpText(
      'after',
      '\nEach member takes its parameters from the calibrated set (pathways/calibrated-members.json), so --ecs, --tcr and --params are not taken;\n--prior draws from its prior instead, to show what the observed record adds.\n' +
        '\nExamples:\n  warmcast ensemble swift --members 2000 --seed 7 --out swift-ens.csv\n' +
        '  warmcast ensemble swift --members 1000000 --seed 7 --shard 3/100 --out shard-3.json   # one task of an array job\n' +
        '  warmcast merge shard-*.json --out swift-ens.csv\n' +
        '\nWith --shard, --out names the shard file (.json).\n' +
        cautionsHelp(standardCautions(UNCERTAINTY_HELP)),
    )
    .action(async (arg: string, opts: EnsembleCliOptions) => {
      if (opts.seed >= 2 ** 32) throw new ConfigError('--seed must be below 2^32', 'seed');
      // Before any work: a shard's members are only of use in a shard file.
      if (opts.shard && !opts.out?.toLowerCase().endsWith('.json')) throw new ConfigError('--shard writes a shard file: give --out NAME.json', 'out');
      // Central parameters: the CO2 formula, and the CH4 and N2O of an emission pathway's central run.
      const { params } = resolveModelParams({ co2Formula: opts.co2Formula }, io);
      const [read] = await readPathwayArgs([arg], opts, { splice: opts.splice, absentEmissions: opts.absentEmissions, co2JumpIntended: opts.co2JumpIntended }, io, false);
      const { input, notes } = ensembleInput(read.pathway, params, { baseline: opts.baseline });
      const inputs = pathwayInputs(read);
      const years = input.years.length;
      const emissionDriven = input.carbon !== undefined;
      const count = opts.shard ? shardSize(opts.members, opts.shard) : opts.members;
      checkEnsembleMemory({ members: opts.members, count, years, emissionDriven, shard: opts.shard });
      const result = await outOfMemoryAsInput(`an ensemble of ${count} members over ${years} years`, () =>
        runEnsemble(input, {
          members: opts.members,
          seed: opts.seed,
          thresholds: opts.thresholds,
          baseline: opts.baseline,
          shard: opts.shard,
          source: memberSource(opts.prior),
          onProgress: progressBar(io, 'members', 20_000),
        }),
      );
      // Recorded in shard files, so that a merge can say what the ensemble was made from.
      const origin: EnsembleOrigin = {
        pathway: read.pathway.name,
        inputs: inputs.map((path) => ({ path, sha256: sha256File(path) })),
        notes: [...read.pathway.provenance.notes, ...notes],
      };
      const allNotes = [...origin.notes, ...result.notes];
      if (opts.shard) {
        await outOfMemoryAsInput(`writing a shard file of ${count} members over ${years} years`, () =>
          writeFilesAtomic([{ path: resolve(io.cwd, opts.out!), content: shardToJson({ ...result.members!, origin }) }], { inputs }),
        );
        io.stderr(`wrote shard ${opts.shard.index}/${opts.shard.count} (${result.memberCount} members) to ${opts.out}; combine all shards with \`warmcast merge\`\n`);
        return;
      }
      await emitEnsemble(result, origin.pathway, opts, { inputs, notes: allNotes, pathway: origin.pathway, firstFuture: read.pathway.provenance.spliceYear, io });
    });
  return cmd;
}

/** `warmcast merge SHARD...`: combine shard files into exactly what one whole run gives. */
export function mergeCommand(io: CliIo): Command {
  const cmd = new Command('merge')
    .description('combine the shard files of one ensemble (from `warmcast ensemble --shard K/N`) into its full statistics')
    .argument('<shard...>', 'shard files (.json), all K from 1 to N of one ensemble');
  addReportOptions(cmd);
  refuseOptions(cmd, MERGE_REFUSES)
    .addHelpText(
      'after',
      '\nEvery setting (pathway, seed, members, thresholds, baseline, CO2 formula) comes from the shards.\n\nExample:\n  warmcast merge shard-*.json --out swift-ens.csv\n' +
        cautionsHelp(standardCautions(UNCERTAINTY_HELP)),
    )
    .action(async (files: string[], opts: ReportOptions) => {
      // Shards of `warmcast batch` (scenarios of a table) merge into a batch summary.
      if (isBatchShardFile(resolve(io.cwd, files[0]))) return mergeBatchFiles(files, opts, io);
      // One shard at a time, so that only the merged members and one shard's data are held.
      const merger = shardMerger();
      let checked = false;
      const merged = await outOfMemoryAsInput('merging the shards', () => {
        for (const file of files) {
          let text: string;
          try {
            text = readFileSync(resolve(io.cwd, file), 'utf8');
          } catch (e) {
            throw new InputError([{ file, code: 'input.unreadable', message: `shard file ${unreadableReason(e)}`, expected: 'a shard file written by `warmcast ensemble --shard K/N`' }]);
          }
          const members = shardFromJson(text, file);
          if (!checked && members.shard) {
            // Shards are equal to within one member; the merge allocates the whole ensemble at the first.
            checkMergeMemory(members.config.membersTotal, members.config.yearCount, members.memberCount + 1);
            checked = true;
          }
          merger.add({ file, members });
        }
        return merger.finish();
      });
      const result = summarizeEnsemble(merged);
      // Shards record the pathway since the shard file gained `pathway`; older ones merge without it.
      const origin = merged.origin;
      await emitEnsemble(result, origin?.pathway ?? 'merged ensemble (pathway not recorded in the shards)', opts, {
        inputs: files.map((f) => resolve(io.cwd, f)),
        notes: origin ? [...origin.notes, ...result.notes] : [NOT_RECORDED, ...result.notes],
        ...(origin ? { pathway: origin.pathway, pathwayInputs: origin.inputs } : {}),
        io,
      });
    });
  return cmd;
}

/** Members of one shard (`shardRange`'s slice). */
function shardSize(members: number, shard: { index: number; count: number }): number {
  const { from, to } = shardRange(members, shard);
  return to - from;
}

/**
 * Runs `work`, turning an allocation failure (engine limit or exhausted memory) into a ConfigError
 * (exit 2) that says what ran out of memory, instead of an internal error.
 */
async function outOfMemoryAsInput<T>(what: string, work: () => T | Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (e) {
    throw allocationError(e, what) ?? e;
  }
}

/** The note of a merge whose shards do not record their pathway. */
const NOT_RECORDED = "the pathway's name, input files and notes were not recorded in the shards (written by an earlier warmcast); the shards agree on its forcing (checksum)";

/** What the cautions say about an ensemble's ranges, in --help (the files carry the run's own text). */
const UNCERTAINTY_HELP =
  'Ranges are the 5-95 % and 17-83 % spread of members drawn from the calibrated parameter set (two-box physics, forcing multipliers and ' +
  'carbon cycle from a broad prior, weighted by the observed warming, ocean heat uptake, carbon sinks and AR6 aerosol forcing), or with --prior ' +
  'from that prior unweighted; they do not include uncertainty in the pathway, internal variability or the model structure. ' +
  CALIBRATED_SET_CAUTION;

/** Writes an ensemble's files (if asked) and prints its headline, table and chart. */
async function emitEnsemble(
  result: EnsembleResult,
  name: string,
  opts: ReportOptions,
  ctx: { inputs: string[]; notes: string[]; pathway?: string; pathwayInputs?: EnsembleOrigin['inputs']; firstFuture?: number; io: CliIo },
): Promise<void> {
  const { io } = ctx;
  const baseline = result.config.baseline;
  const baselineNote = thresholdBaselineNote(baseline);
  const notes = baselineNote ? [...ctx.notes, baselineNote] : [...ctx.notes];
  const observed = observedRecord(baseline, notes);
  const { years } = result;
  const first = years[0];
  const last = years[years.length - 1];
  // Where the future starts: the splice year; for merged shards, as their notes record it, else 2020
  // (the milestone rows then start at 2020 rather than at a history's 1750).
  const firstFuture = ctx.firstFuture ?? firstFutureYear(notes) ?? Math.max(first, Math.min(2020, last));
  const rows = rowChoice(opts, first, last, firstFuture);
  const doc = ensembleDocument(result, { name, rows, notes, summary: ensembleHeadlines(result), uncertainty: uncertaintyText(result), ...(observed ? { observed } : {}) });
  if (opts.out !== undefined) {
    const written = await writeDocument(opts.out, doc, {
      inputs: ctx.inputs,
      parameters: ensembleParameters(result.config),
      baseline,
      seed: result.config.seed,
      pathway: ctx.pathway,
      pathwayInputs: ctx.pathwayInputs,
      io,
    });
    announceWritten(written, io);
  }
  printDocument(doc, opts, io);
}

/** The splice year a pathway's notes record ("spliced onto bundled history at 2025"), where the future starts. */
function firstFutureYear(notes: readonly string[]): number | undefined {
  for (const n of notes) {
    const m = /spliced onto bundled history at (\d{4})/.exec(n);
    if (m) return Number(m[1]);
  }
  return undefined;
}

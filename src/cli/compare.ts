import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { basename, extname } from 'node:path';
import { Command } from 'commander';
import { ConfigError } from '../errors.js';
import { isScenarioTable } from '../io/iamc-read.js';
import type { ReadPathwayResult } from '../io/load-pathway.js';
import { comparePathways, pairedDifferenceRange, type PathwayWarming } from '../metrics/index.js';
import { runEnsemble } from '../ensemble/index.js';
import { memberSource } from './member-source.js';
import { ensembleInput, projectPathway } from '../projection/index.js';
import { CALIBRATED_SET_CAUTION, comparisonDocument, ensembleWarming, scopedNotes, standardCautions, thresholdBaselineNote, type ScopedNote } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';
import { addModelOptions, baselineOption, cautionsHelp, type ModelOptions, pathwayArg, resolveModelParams, thresholdsOption, wholeNumberOption, absentEmissionsOption, co2JumpOption } from './options.js';
import { addReportOptions, announceWritten, observedRecord, pathwayInputs, printDocument, rowChoice, writeDocument, type ReportOptions } from './output.js';
import { ensembleParameters } from './provenance.js';

interface CompareOptions extends ModelOptions, ReportOptions, ScenarioOptions {
  members?: number;
  seed: number;
  labels?: string[];
  thresholds: number[];
  baseline: [number, number];
  splice: boolean;
  co2JumpIntended?: boolean;
  absentEmissions?: AbsentEmissionsRule;
  carbonFeedback: boolean;
}

/** Labels longer than this are replaced by letters (A, B, ...) unless the user gives labels. */
const MAX_DEFAULT_LABEL = 14;

/** `warmcast compare <pathway...>`: options side by side against the first, as tables, charts and reports. */
export function compareCommand(io: CliIo): Command {
  const cmd = new Command('compare')
    .description('compare options (pathways) year by year against the first (the reference): headline, milestones, peaks, threshold crossings')
    .argument('<pathway...>', 'pathway CSV files or bundled names, each optionally as LABEL=PATH; the first is the reference')
    .option('--labels <list>', 'short labels for the options, in order, used in every header, e.g. A,B,C (default: the arguments as typed, or letters when long)', labelsOption);
  addReportOptions(cmd)
    .addOption(thresholdsOption('warming levels in K whose crossing years are reported', [1.5, 2]))
    .addOption(baselineOption())
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'do not splice pathways that start late onto the bundled history (each run then starts from zero warming in its first year)')
    .addOption(co2JumpOption())
    .option('--no-carbon-feedback', 'emission-driven runs: switch off the carbon-climate feedback on uptake')
    .option('--members <count>', 'also run a parameter ensemble of this many members per option: medians with ranges, and each difference\'s range from paired members', wholeNumberOption('--members', 2))
    .option('--seed <integer>', 'random seed of the ensembles (with --members)', wholeNumberOption('--seed', 0), 1);
  addScenarioOptions(addModelOptions(cmd), true)
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast compare steady delayed swift\n  warmcast compare scenarios.xlsx --scenario Quick --scenario Slow\n  warmcast compare now=steady plan=swift --years 2030,2050,2100 --out table.md\n' +
        '  warmcast compare steady delayed swift --labels S,D,W --members 500 --out report.html\n' +
        cautionsHelp(standardCautions(`Without --members each option is one central run, with no range; with it, ranges are the spread of the members' parameters only, not the pathway or the model structure. ${CALIBRATED_SET_CAUTION}`)),
    )
    .action(async (args: string[], opts: CompareOptions) => {
      if (opts.members !== undefined) {
        const given = (['ecs', 'tcr', 'params'] as const).filter((k) => opts[k] !== undefined).map((k) => `--${k}`);
        if (!opts.carbonFeedback) {
          throw new ConfigError('with --members every member runs the carbon-climate feedback on uptake, so --no-carbon-feedback would be ignored: leave it out, or compare without --members', 'carbonFeedback');
        }
        if (given.length > 0) {
          throw new ConfigError(`with --members each member takes its parameters from the calibrated set, so ${given.join(', ')} would be ignored: leave ${given.length > 1 ? 'them' : 'it'} out, or compare without --members`, given[0].slice(2));
        }
      }
      const reads = await readPathwayArgs(args.map((arg) => splitLabel(arg).path), opts, { splice: opts.splice, absentEmissions: opts.absentEmissions, co2JumpIntended: opts.co2JumpIntended }, io);
      const options = labelledOptions(args, reads, opts, io);
      const { params, paramsFile, notes: paramNotes, forcingScale, forcingNote } = resolveModelParams(opts, io);
      const baselineNote = thresholdBaselineNote(opts.baseline);
      const files: string[] = [];
      const scoped: ScopedNote[] = [];
      const runs = options.map(({ label, read, name }) => {
        files.push(...pathwayInputs(read));
        const p = projectPathway(read.pathway, { params, baseline: opts.baseline, carbonFeedback: opts.carbonFeedback, forcingScale });
        scoped.push(...[...p.provenance.notes, ...p.notes].map((text) => ({ pathway: label, text })));
        return { label, name: name ?? p.name, projection: p, pathway: read.pathway };
      });
      const ref = runs[0].projection;
      const pathways: PathwayWarming[] = [];
      let shared: Record<string, number | string> | undefined;
      const members: { firstYear: number; members: number; warmingK: Float64Array }[] = [];
      for (const { label, name, projection: p, pathway } of runs) {
        if (opts.members === undefined) {
          pathways.push({ label, name, years: p.years, warmingK: p.columns.warming_k, ...(p.columns.co2_gtco2 ? { co2Gtco2: p.columns.co2_gtco2 } : {}) });
          continue;
        }
        // Same seed for every option: member i draws the same parameters in each, so differences pair up.
        const { input, notes: inputNotes } = ensembleInput(pathway, params, { baseline: opts.baseline });
        const e = await runEnsemble(input, { members: opts.members, seed: opts.seed, thresholds: opts.thresholds, baseline: opts.baseline, keepMembers: true, source: memberSource(false) });
        scoped.push(...[...inputNotes, ...e.notes].map((text) => ({ pathway: label, ensemble: true, text })));
        shared ??= ensembleParameters(e.config);
        members.push({ firstYear: e.years[0], members: e.memberCount, warmingK: e.members!.warmingK });
        pathways.push({ ...ensembleWarming(e, label), name, ...(p.columns.co2_gtco2 ? { co2Gtco2: p.columns.co2_gtco2 } : {}) });
      }
      if (members.length > 1) {
        for (let j = 1; j < pathways.length; j++) pathways[j].differenceRange = pairedDifferenceRange(members[0], members[j], pathways[j].years);
      }
      const medianNote = opts.members !== undefined ? ['with --members, warming is the ensemble median of each option; its crossing years are the first years by which half of the members have crossed'] : [];
      const notes = [...paramNotes, ...(forcingNote && opts.members === undefined ? [forcingNote] : []), ...(baselineNote ? [baselineNote] : []), ...medianNote, ...scopedNotes(scoped, runs.map((r) => r.label))];
      const observed = observedRecord(opts.baseline, notes);
      const first = Math.min(...runs.map((r) => r.projection.years[0]));
      const last = Math.max(...runs.map((r) => r.projection.years[r.projection.years.length - 1]));
      const rows = rowChoice(opts, first, last, ref.provenance.spliceYear ?? ref.years[0]);
      const c = comparePathways(pathways, { milestoneYears: [...rows.years], thresholdsK: opts.thresholds, cumulativeFromYear: ref.provenance.spliceYear ?? ref.years[0] });
      const subtitle =
        opts.members === undefined
          ? `one central run each: ECS ${params.ecsK.toFixed(2)} K, TCR ${params.tcrK.toFixed(2)} K, CO2 forcing ${params.co2Formula}; warming relative to the ${opts.baseline.join('-')} mean`
          : `${opts.members} members per option, seed ${opts.seed}, members drawn from the calibrated parameter set (constrained by the observed record) and paired across options; warming relative to the ${opts.baseline.join('-')} mean`;
      const doc = comparisonDocument(c, { rows, baseline: opts.baseline, subtitle, notes, ...(observed ? { observed } : {}) });
      if (opts.out !== undefined) {
        const inputs = [...files, ...(paramsFile ? [paramsFile] : [])];
        const written = await writeDocument(opts.out, doc, {
          inputs,
          params,
          ...(shared ? { parameters: shared } : {}),
          baseline: opts.baseline,
          io,
          ...(opts.members !== undefined ? { seed: opts.seed } : {}),
        });
        announceWritten(written, io);
      }
      printDocument(doc, opts, io);
    });
  return cmd;
}

/** Coerces `A,B,C` into labels: non-empty, without commas or `=`. */
function labelsOption(text: string): string[] {
  const labels = text.split(',').map((s) => s.trim());
  if (labels.some((l) => l === '')) throw new ConfigError(`--labels must be labels separated by commas, such as A,B,C; got "${text}"`, 'labels');
  return labels;
}

/** `LABEL=PATH` split into its label and path; a plain argument has no label. */
function splitLabel(arg: string): { given?: string; path: string } {
  const m = /^([^=/\\]+)=(.+)$/.exec(arg);
  return m ? { given: m[1].trim(), path: m[2] } : { path: arg };
}

/**
 * The options a command line names, each with its read and label: one per pathway argument, and one
 * per `--scenario` of a scenario table argument (typed as the scenario name, or labelled by `LABEL=`
 * when the table gives one scenario), in the order readPathwayArgs reads them.
 *
 * @throws ConfigError as labelledArgs does, counting each scenario taken from a table as an option
 */
function labelledOptions(args: readonly string[], reads: readonly ReadPathwayResult[], opts: CompareOptions, io: CliIo): { label: string; read: ReadPathwayResult; name?: string }[] {
  const typed: { given?: string; path: string; typed: string }[] = [];
  for (const arg of args) {
    const { given, path } = splitLabel(arg);
    const scenarios = isScenarioTable(pathwayArg(path, io)) ? (opts.scenario ?? [undefined]) : [undefined];
    for (const scenario of scenarios) {
      const own = scenario ?? basename(path, extname(path));
      typed.push({ path, typed: own, ...(given !== undefined && scenarios.length === 1 ? { given } : {}) });
    }
  }
  return labelledArgs(typed, opts.labels).map((o, j) => ({ label: o.label, read: reads[j], ...(o.name !== undefined ? { name: o.name } : {}) }));
}

/**
 * The label of each option: `--labels` gives the labels (a `LABEL=` typed before a path
 * then names the option in the key line), else `LABEL=PATH`, else the argument as typed (its file name without the extension), replaced by a letter
 * when longer than 14 characters so that no header repeats long names.
 *
 * @throws ConfigError when --labels does not give one label per option, or two labels are the same
 */
function labelledArgs(args: readonly { given?: string; path: string; typed: string }[], labels?: readonly string[]): { label: string; path: string; name?: string }[] {
  if (labels && labels.length !== args.length) {
    throw new ConfigError(`--labels must give one label per option: ${args.length} options, ${labels.length} labels`, 'labels');
  }
  const out = args.map(({ given, path, typed }, j) => {
    // --labels wins over LABEL=PATH; the LABEL typed then names the option in the key line.
    const label = labels ? labels[j] : given !== undefined ? given : typed.length <= MAX_DEFAULT_LABEL ? typed : String.fromCharCode(65 + (j % 26));
    return { label, path, ...(given !== undefined && labels ? { name: given } : {}) };
  });
  const seen = new Set<string>();
  for (const { label } of out) {
    if (seen.has(label)) {
      throw new ConfigError(
        `option labels must be distinct; "${label}" appears twice (a label is the argument's file name without the extension): ` +
          'give --labels A,B,C or LABEL=PATH arguments, such as planB=b/p.csv',
        'labels',
      );
    }
    seen.add(label);
  }
  return out;
}

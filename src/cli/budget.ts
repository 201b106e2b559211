import { Command, Option } from 'commander';
import { calibratedMemberSource, calibratedSetInOrder, priorMemberSource } from '../ensemble/calibrated-set.js';
import { ConfigError } from '../errors.js';
import { readCalibratedSet } from '../io/read-calibrated-set.js';
import type { ReadPathwayResult } from '../io/load-pathway.js';
import { carbonBudget } from '../projection/carbon-budget.js';
import { BUDGET_UNCERTAINTY, budgetDocument, standardCautions } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { progressBar } from './progress.js';
import { absentEmissionsOption, cautionsHelp, numberListOption, resolveModelParams, wholeNumberOption, yearOption } from './options.js';
import { announceWritten, checkOutExtension, pathwayInputs, printDocument, writeDocument } from './output.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';

/** The bundled non-CO2 path budgets assume unless `--non-co2` names another. */
export const DEFAULT_NON_CO2 = 'budget-non-co2';

interface BudgetOptions extends ScenarioOptions {
  limit: number[];
  chance: number[];
  from?: number;
  nonCo2?: string;
  shape?: string;
  members?: number;
  seed: number;
  prior: boolean;
  out?: string;
  notes?: boolean;
  absentEmissions?: string;
}

/**
 * Reads `--chance` values given as per cents (50, 67) or fractions (0.5, 0.67): a list whose values
 * are all at most 1 is fractions (so 1 alone, a certain outcome, is refused), a list whose values
 * are all above 1 per cents; a list that mixes the two (50,0.5) is refused, as is a chance given
 * twice. Each must end up in (0, 1).
 * @throws ConfigError naming the value and how to write the list
 * @example chancesFromOption([50, 67, 83]) // [0.5, 0.67, 0.83]
 */
export function chancesFromOption(values: number[]): number[] {
  const fractions = values.every((v) => v <= 1);
  if (!fractions && values.some((v) => v <= 1)) {
    throw new ConfigError(
      `--chance ${values.join(',')} mixes per cents and fractions (${values.find((v) => v <= 1)} would be read as a fraction, ${values.find((v) => v > 1)} as a per cent): ` +
        'write every chance as a per cent (--chance 50,67,83) or every one as a fraction (--chance 0.5,0.67,0.83)',
      'chance',
    );
  }
  // 99.9 / 100 is 0.9990000000000001 in binary: twelve digits keep what was written.
  const out = values.map((v) => (fractions ? v : Number((v / 100).toPrecision(12))));
  for (let i = 0; i < out.length; i++) {
    if (!(out[i] > 0 && out[i] < 1)) throw new ConfigError(`--chance must be between 0 and 100 (per cent) or 0 and 1, got ${values[i]}`, 'chance');
  }
  refuseRepeats('--chance', values);
  return out;
}

/** Refuses a list that gives one value twice (most likely a slip for another value). */
function refuseRepeats(option: string, values: number[]): void {
  const twice = values.find((v, i) => values.indexOf(v) !== i);
  if (twice !== undefined) throw new ConfigError(`${option} ${values.join(',')} gives ${twice} twice: give each value once`, option.slice(2));
}

/** `warmcast budget`: remaining CO2 budgets for warming limits at chances, or the latest net zero for a shape. */
export function budgetCommand(io: CliIo): Command {
  const cmd = new Command('budget')
    .description('remaining CO2 budget (Gt CO2) that keeps peak warming at or below each limit with each chance, and the net-zero year of a straight-line decline that spends it')
    .addOption(new Option('--limit <K,...>', 'warming limits, K above 1850-1900').argParser(numberListOption('--limit')).default([1.5, 2], '1.5,2'))
    .addOption(
      new Option('--chance <p,...>', 'chances of staying at or below each limit, all per cents (50,67,83) or all fractions (0.5,0.67); a list mixing the two is refused')
        .argParser(numberListOption('--chance'))
        .default([50, 67, 83], '50,67,83'),
    )
    .option('--from <year>', 'count the budget from 1 January of this year (default: the first year after the history)', yearOption)
    .option('--non-co2 <file>', `non-CO2 emissions (and other forcing) the budget assumes (default: the bundled ${DEFAULT_NON_CO2} path)`)
    .option(
      '--shape <file>',
      "keep this pathway's own net CO2 shape (co2_gtco2) and find the latest net zero, stretching or compressing its decline in time; the reported cumulative CO2 counts its net CO2 up to net zero (later net-negative emissions are not subtracted, though the runs include them); its non-CO2 emissions are used unless --non-co2 is given",
    )
    .option('-n, --members <count>', 'how many members to use; fewer than the calibrated set has are drawn at random with --seed, and the budgets then move with the seed (the notes say by how much) (default: every member of the calibrated set once, in order, so the budgets do not depend on the seed)', wholeNumberOption('--members', 1))
    .option('--seed <integer>', 'random seed of a --members subsample or --prior draw, and of the bootstrap that estimates the sampling spread', wholeNumberOption('--seed', 0), 1)
    .option('--prior', 'draw the members at random from the prior, unconstrained by the observed record, instead of the calibrated set (as many as the set has, unless --members)', false)
    .option('-o, --out <file>', 'write the budget table; the extension picks the format: .csv (+ .meta.json), .json, .md, .html, .xlsx; - for stdout as CSV')
    .option('--notes', 'print every note on how the budget was made (files always keep them)')
    .addOption(absentEmissionsOption());
  addScenarioOptions(cmd, false);
  return cmd
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast budget --limit 1.5,1.7,2 --chance 50,67,83\n  warmcast budget --from 2030 --out budgets.md\n  warmcast budget --members 500 --seed 2 --notes   (a quicker random subsample; the notes give how far it moves with the seed)\n  warmcast budget --shape swift-emissions --limit 1.7 --chance 67\n  warmcast budget --shape scenarios.xlsx --scenario Quick --limit 2 --chance 67\n' +
        cautionsHelp(standardCautions(BUDGET_UNCERTAINTY)),
    )
    .action(async (opts: BudgetOptions) => {
      const chances = chancesFromOption(opts.chance);
      refuseRepeats('--limit', opts.limit);
      if (opts.out && opts.out !== '-') checkOutExtension(opts.out, { charts: [] });
      const { params, forcingScale } = resolveModelParams({}, io);
      const set = readCalibratedSet();
      const members = opts.members ?? set.count;
      if (!opts.prior && members > set.count) {
        throw new ConfigError(`--members ${members}: the calibrated set has ${set.count} members, and the default already takes every one once; more would only repeat members`, 'members');
      }
      // Every member once, in order, unless fewer are asked for (a random subsample) or --prior.
      const drawn = opts.prior ? 'prior' : members < set.count ? 'subsample' : 'whole set';
      const source = drawn === 'prior' ? priorMemberSource(set) : drawn === 'subsample' ? calibratedMemberSource(set) : calibratedSetInOrder(set);
      // The non-CO2 path is the shape's own unless --non-co2 names one; --scenario picks from whichever is a scenario table.
      const args = [opts.nonCo2 ?? opts.shape ?? DEFAULT_NON_CO2, ...(opts.shape && opts.nonCo2 ? [opts.shape] : [])];
      const reads = await readPathwayArgs(args, opts, { splice: true, absentEmissions: opts.absentEmissions as never }, io, false);
      const nonCo2Read = reads[0];
      const shapeRead = opts.shape ? reads[reads.length - 1] : undefined;
      const fromYear = opts.from ?? (nonCo2Read.pathway.provenance.historyLastYear ?? 0) + 1;
      const shape = shapeRead ? shapeFrom(shapeRead.pathway.years, shapeRead.pathway.series.co2_gtco2, fromYear, opts.shape!) : undefined;
      const result = carbonBudget(nonCo2Read.pathway, {
        limits: opts.limit,
        chances,
        fromYear: opts.from,
        members,
        seed: opts.seed,
        resampled: drawn !== 'whole set',
        params,
        forcingScale,
        source,
        shape,
        onProgress: progressBar(io, 'members', 500),
      });
      const pathNotes = nonCo2PathNotes(nonCo2Read, args[0], Boolean(opts.shape && !opts.nonCo2), fromYear);
      if (shapeRead && opts.nonCo2) pathNotes.push(...shapeFileNotes(shapeRead, opts.shape!, fromYear));
      const doc = budgetDocument(result, { notes: [...pathNotes, ...result.notes], shape: Boolean(shape), members, drawn });
      if (opts.out !== undefined) {
        const inputs = [...pathwayInputs(nonCo2Read), ...(shapeRead ? pathwayInputs(shapeRead) : [])];
        announceWritten(await writeDocument(opts.out, doc, { inputs, params, baseline: [1850, 1900], io, seed: opts.seed }), io);
      }
      printDocument(doc, { out: opts.out, notes: opts.notes, chart: false }, io);
    });
}

/** CO2 columns a pathway file gives itself (before the splice), in the order named. */
function fileCo2Columns(read: ReadPathwayResult): string[] {
  return (['co2_gtco2', 'co2_ppm'] as const).filter((c) => read.annual.series[c]?.some(Number.isFinite));
}

/**
 * The notes of the pathway the non-CO2 path comes from, said as the budget uses it: the splice's
 * notes describe a run that follows the file's CO2 (or holds the history's co2_ppm), but a budget
 * replaces CO2 after the history by its own pathways, so those parts are dropped and one note says
 * what became of the file's own CO2.
 *
 * @param read the pathway as read and spliced
 * @param name what the user called it (file or bundled name)
 * @param isShape whether its co2_gtco2 is also the --shape
 * @param fromYear the budget's first year
 */
function nonCo2PathNotes(read: ReadPathwayResult, name: string, isShape: boolean, fromYear: number): string[] {
  const co2 = ['co2_ppm', 'co2_gtco2'];
  const out: string[] = [];
  for (const note of read.pathway.provenance.notes) {
    if (/^co2_(gtco2|ppm) given instead of the history's/.test(note)) continue;
    const held = /^([a-z0-9_]+(?:, [a-z0-9_]+)*) not in file: (.*)$/s.exec(note);
    if (held) {
      const columns = held[1].split(', ').filter((c) => !co2.includes(c));
      if (columns.length > 0) out.push(`${columns.join(', ')} not in file: ${held[2]}`);
      continue;
    }
    out.push(note);
  }
  const given = fileCo2Columns(read);
  const historyEnd = read.pathway.provenance.historyLastYear;
  if (isShape) {
    out.push(`${name}: its co2_gtco2 from ${fromYear} on is used only as the shape the budget stretches in time; the runs follow the record's co2_ppm to ${historyEnd}`);
  } else if (given.length > 0) {
    out.push(`${name}: its ${given.join(' and ')} ${given.length > 1 ? 'are' : 'is'} not used; net CO2 follows the budget pathways (the record's co2_ppm to ${historyEnd}, then net CO2 emissions)`);
  }
  return out;
}

/** What a budget takes from a --shape file when --non-co2 names the non-CO2 path: its net CO2 alone. */
function shapeFileNotes(read: ReadPathwayResult, name: string, fromYear: number): string[] {
  const interpolated = read.annual.provenance.notes.filter((t) => t.startsWith('interpolated'));
  return [`--shape ${name}: only its co2_gtco2 from ${fromYear} on is used, as the shape; its other columns are not`, ...interpolated.map((t) => `--shape ${name}: ${t}`)];
}

/** A pathway's net CO2 from `fromYear` on, the shape `--shape` stretches. */
function shapeFrom(years: Float64Array, co2: Float64Array | undefined, fromYear: number, name: string): Float64Array {
  if (!co2) throw new ConfigError(`--shape ${name}: the pathway must give co2_gtco2 (net CO2 emissions)`, 'shape');
  const i = fromYear - years[0];
  if (i < 0 || i >= years.length || !Number.isFinite(co2[i])) throw new ConfigError(`--shape ${name}: the pathway must give co2_gtco2 from ${fromYear} on`, 'shape');
  return co2.slice(i);
}

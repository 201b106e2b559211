import { Command } from 'commander';
import { ConfigError } from '../errors.js';
import { carbonBudget } from '../projection/carbon-budget.js';
import { BUDGET_UNCERTAINTY, budgetDocument, standardCautions } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { memberSource } from './member-source.js';
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
  members: number;
  seed: number;
  prior: boolean;
  out?: string;
  notes?: boolean;
  absentEmissions?: string;
}

/**
 * Reads `--chance` values given as percentages (50, 67) or fractions (0.5, 0.67): a list whose
 * values are all at most 1 is fractions (so 1 alone, a certain outcome, is refused), anything else percentages; each must end up in (0, 1).
 * @example chancesFromOption([50, 67, 83]) // [0.5, 0.67, 0.83]
 */
export function chancesFromOption(values: number[]): number[] {
  const fractions = values.every((v) => v <= 1);
  const out = values.map((v) => (fractions ? v : v / 100));
  for (let i = 0; i < out.length; i++) {
    if (!(out[i] > 0 && out[i] < 1)) throw new ConfigError(`--chance must be between 0 and 100 (per cent) or 0 and 1, got ${values[i]}`, 'chance');
  }
  return out;
}

/** `warmcast budget`: remaining CO2 budgets for warming limits at chances, or the latest net zero for a shape. */
export function budgetCommand(io: CliIo): Command {
  const cmd = new Command('budget')
    .description('remaining CO2 budget (Gt CO2) that keeps peak warming at or below each limit with each chance, and the net-zero year of a straight-line decline that spends it')
    .option('--limit <K,...>', 'warming limits, K above 1850-1900', numberListOption('--limit'), [1.5, 2])
    .option('--chance <p,...>', 'chances of staying at or below each limit, per cent (50,67,83) or fractions (0.5,0.67)', numberListOption('--chance'), [50, 67, 83])
    .option('--from <year>', 'count the budget from 1 January of this year (default: the first year after the history)', yearOption)
    .option('--non-co2 <file>', `non-CO2 emissions (and other forcing) the budget assumes (default: the bundled ${DEFAULT_NON_CO2} path)`)
    .option('--shape <file>', "keep this pathway's own net CO2 shape (co2_gtco2) and find the latest net zero, stretching or compressing its decline in time; its non-CO2 emissions are used unless --non-co2 is given")
    .option('-n, --members <count>', 'members of the calibrated set', wholeNumberOption('--members', 1), 500)
    .option('--seed <integer>', 'random seed', wholeNumberOption('--seed', 0), 1)
    .option('--prior', 'draw the members from the prior, unconstrained by the observed record, instead of the calibrated set', false)
    .option('-o, --out <file>', 'write the budget table; the extension picks the format: .csv (+ .meta.json), .json, .md, .html, .xlsx; - for stdout as CSV')
    .option('--notes', 'print every note on how the budget was made (files always keep them)')
    .addOption(absentEmissionsOption());
  addScenarioOptions(cmd, false);
  return cmd
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast budget --limit 1.5,1.7,2 --chance 50,67,83\n  warmcast budget --from 2030 --out budgets.md\n  warmcast budget --shape swift-emissions --limit 1.7 --chance 67\n  warmcast budget --shape scenarios.xlsx --scenario Quick --limit 2 --chance 67\n' +
        cautionsHelp(standardCautions(BUDGET_UNCERTAINTY)),
    )
    .action(async (opts: BudgetOptions) => {
      const chances = chancesFromOption(opts.chance);
      if (opts.out && opts.out !== '-') checkOutExtension(opts.out, { charts: [] });
      const { params, forcingScale } = resolveModelParams({}, io);
      const source = memberSource(opts.prior);
      // The non-CO2 path is the shape's own unless --non-co2 names one; --scenario picks from whichever is a scenario table.
      const args = [opts.nonCo2 ?? opts.shape ?? DEFAULT_NON_CO2, ...(opts.shape && opts.nonCo2 ? [opts.shape] : [])];
      const reads = await readPathwayArgs(args, opts, { splice: true, absentEmissions: opts.absentEmissions as never }, io, false);
      const nonCo2Read = reads[0];
      const shapeRead = opts.shape ? reads[reads.length - 1] : undefined;
      const shape = shapeRead
        ? shapeFrom(shapeRead.pathway.years, shapeRead.pathway.series.co2_gtco2, opts.from ?? (shapeRead.pathway.provenance.historyLastYear ?? 0) + 1, opts.shape!)
        : undefined;
      const result = carbonBudget(nonCo2Read.pathway, { limits: opts.limit, chances, fromYear: opts.from, members: opts.members, seed: opts.seed, params, forcingScale, source, shape });
      const doc = budgetDocument(result, { notes: [...nonCo2Read.pathway.provenance.notes, ...result.notes], shape: Boolean(shape), members: opts.members });
      if (opts.out !== undefined) {
        const inputs = [...pathwayInputs(nonCo2Read), ...(shapeRead ? pathwayInputs(shapeRead) : [])];
        announceWritten(await writeDocument(opts.out, doc, { inputs, params, baseline: [1850, 1900], io, seed: opts.seed }), io);
      }
      printDocument(doc, { out: opts.out, notes: opts.notes, chart: false }, io);
    });
}

/** A pathway's net CO2 from `fromYear` on, the shape `--shape` stretches. */
function shapeFrom(years: Float64Array, co2: Float64Array | undefined, fromYear: number, name: string): Float64Array {
  if (!co2) throw new ConfigError(`--shape ${name}: the pathway must give co2_gtco2 (net CO2 emissions)`, 'shape');
  const i = fromYear - years[0];
  if (i < 0 || i >= years.length || !Number.isFinite(co2[i])) throw new ConfigError(`--shape ${name}: the pathway must give co2_gtco2 from ${fromYear} on`, 'shape');
  return co2.slice(i);
}

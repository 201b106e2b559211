import { Command } from 'commander';
import { ConfigError } from '../errors.js';
import { readPathway } from '../io/load-pathway.js';
import { carbonBudget, type CarbonBudget } from '../projection/carbon-budget.js';
import { plainTable } from '../report/index.js';
import { standardCautions } from '../report/standard-cautions.js';
import type { CliIo } from './cli-io.js';
import { notesAndCautions } from './notes-and-cautions.js';
import { numberListOption, pathwayArg, resolveModelParams, wholeNumberOption, yearOption } from './options.js';
import { memberSource } from './member-source.js';
import { announceWritten, pathwayInputs, tableRenderers, writeOutput } from './output.js';

/** The bundled non-CO2 path budgets assume unless `--non-co2` names another. */
export const DEFAULT_NON_CO2 = 'budget-non-co2';

/** What a budget's chances cover, for its cautions. */
export const BUDGET_UNCERTAINTY =
  'The chances come from the spread of the ensemble members\' climate response and carbon cycle only: the non-CO2 path is one assumed path, ' +
  'the CO2 pathway family one shape, and the model structure one model. Budgets are very sensitive to the non-CO2 assumption and to warming to date; ' +
  'compare with the remaining carbon budgets the IPCC assesses before quoting them.';

interface BudgetOptions {
  limit: number[];
  chance: number[];
  from?: number;
  nonCo2?: string;
  shape?: string;
  members: number;
  seed: number;
  prior: boolean;
  out?: string;
}

/**
 * Reads `--chance` values given as percentages (50, 67) or fractions (0.5, 0.67): a list whose
 * values are all at most 1 is fractions, anything else percentages; each must end up in (0, 1).
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
  return new Command('budget')
    .description('remaining CO2 budget (Gt CO2) that keeps peak warming at or below each limit with each chance, and the net-zero year of a straight-line decline that spends it')
    .option('--limit <K,...>', 'warming limits, K above 1850-1900', numberListOption('--limit'), [1.5, 2])
    .option('--chance <p,...>', 'chances of staying at or below each limit, per cent (50,67,83) or fractions (0.5,0.67)', numberListOption('--chance'), [50, 67, 83])
    .option('--from <year>', 'count the budget from 1 January of this year (default: the first year after the history)', yearOption)
    .option('--non-co2 <file>', `non-CO2 emissions (and other forcing) the budget assumes (default: the bundled ${DEFAULT_NON_CO2} path)`)
    .option('--shape <file>', 'keep this pathway\'s own net CO2 shape (co2_gtco2) and find the latest net zero, stretching or compressing its decline in time; its non-CO2 emissions are used unless --non-co2 is given')
    .option('-n, --members <count>', 'ensemble members', wholeNumberOption('--members', 1), 500)
    .option('--seed <integer>', 'random seed', wholeNumberOption('--seed', 0), 1)
    .option('--prior', 'draw the members from the prior, unconstrained by the observed record, instead of the calibrated set', false)
    .option('-o, --out <file>', 'write the budget table; the extension picks the format: .csv (+ .meta.json), .json, .md; - for stdout as CSV')
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast budget --limit 1.5,1.7,2 --chance 50,67,83\n  warmcast budget --from 2030 --out budgets.md\n  warmcast budget --shape swift-emissions --limit 1.7 --chance 67\n',
    )
    .action((opts: BudgetOptions) => {
      const chances = chancesFromOption(opts.chance);
      const { params, forcingScale } = resolveModelParams({}, io);
      const source = memberSource(opts.prior);
      const nonCo2Name = opts.nonCo2 ?? (opts.shape ? undefined : DEFAULT_NON_CO2);
      const nonCo2Read = readPathway(pathwayArg(nonCo2Name ?? opts.shape!, io), { splice: true });
      let shape: Float64Array | undefined;
      let shapeRead;
      if (opts.shape) {
        shapeRead = readPathway(pathwayArg(opts.shape, io), { splice: true });
        shape = shapeFrom(shapeRead.pathway.years, shapeRead.pathway.series.co2_gtco2, opts.from ?? (shapeRead.pathway.provenance.historyLastYear ?? 0) + 1, opts.shape);
      }
      const result = carbonBudget(nonCo2Read.pathway, { limits: opts.limit, chances, fromYear: opts.from, members: opts.members, seed: opts.seed, params, forcingScale, source, shape });
      const notes = [...nonCo2Read.pathway.provenance.notes, ...result.notes];
      if (opts.out !== undefined) {
        const written = writeOutput(opts.out, tableRenderers(budgetTable(result)), {
          inputs: [...pathwayInputs(nonCo2Read), ...(shapeRead ? pathwayInputs(shapeRead) : [])],
          params,
          baseline: [1850, 1900],
          notes,
          io,
        });
        announceWritten(written, io);
      }
      const write = opts.out === '-' ? io.stderr : io.stdout;
      write(budgetSummary(result, Boolean(shape)));
      write(notesAndCautions(notes, standardCautions(BUDGET_UNCERTAINTY), opts.out === '-' ? undefined : io.stdoutColumns));
    });
}

/** A pathway's net CO2 from `fromYear` on, the shape `--shape` stretches. */
function shapeFrom(years: Float64Array, co2: Float64Array | undefined, fromYear: number, name: string): Float64Array {
  if (!co2) throw new ConfigError(`--shape ${name}: the pathway must give co2_gtco2 (net CO2 emissions)`, 'shape');
  const i = fromYear - years[0];
  if (i < 0 || i >= years.length || !Number.isFinite(co2[i])) throw new ConfigError(`--shape ${name}: the pathway must give co2_gtco2 from ${fromYear} on`, 'shape');
  return co2.slice(i);
}

/** The budget table: one row per limit and chance. */
export function budgetTable(r: CarbonBudget): { columns: string[]; data: Float64Array[]; text?: string[][] } {
  const rows = r.rows;
  return {
    columns: ['limit_k', 'chance', 'budget_gtco2', 'net_zero_year'],
    data: [
      Float64Array.from(rows, (x) => x.limitK),
      Float64Array.from(rows, (x) => x.chance),
      Float64Array.from(rows, (x) => (x.met ? Math.round(x.budgetGtco2) : NaN)),
      Float64Array.from(rows, (x) => x.netZeroYear),
    ],
  };
}

/** The terminal view: budgets by limit (rows) and chance (columns), then the net-zero years. */
function budgetSummary(r: CarbonBudget, shape: boolean): string {
  const limits = [...new Set(r.rows.map((x) => x.limitK))];
  const chances = [...new Set(r.rows.map((x) => x.chance))];
  const cell = (limit: number, chance: number, what: 'budget' | 'year') => {
    const row = r.rows.find((x) => x.limitK === limit && x.chance === chance)!;
    if (!row.met) return 'not possible';
    if (what === 'year') return `${row.atLeast ? '>= ' : ''}${row.netZeroYear}`;
    return `${row.atLeast ? '>= ' : ''}${Math.round(row.budgetGtco2)}`;
  };
  const pct = (c: number) => `${Math.round(c * 100)} %`;
  const table = (what: 'budget' | 'year') =>
    plainTable({
      columns: ['peak warming at or below', ...chances.map(pct)],
      rows: limits.map((l) => [`${l} K`, ...chances.map((c) => cell(l, c, what))]),
      numeric: [false, ...chances.map(() => true)],
    }).trimEnd();
  const a = r.assumptions;
  return (
    `Remaining CO2 budget from 1 January ${r.fromYear}, Gt CO2 (chance of keeping peak warming at or below the limit)\n\n` +
    table('budget') +
    `\n\n${shape ? 'Latest net-zero year of the given shape' : 'Net-zero year of a straight-line decline from today\'s rate'} that spends it\n\n` +
    table('year') +
    `\n\n  warming to date ${a.historicalWarmingK[0].toFixed(2)} K (${a.historicalPeriod[0]}-${a.historicalPeriod[1]}), current net CO2 ${a.currentRateGtco2.toFixed(1)} Gt CO2/yr, ` +
    `non-CO2 warming at net zero ${a.nonCo2WarmingAtNetZeroK.toFixed(2)} K, zero-emissions commitment ${a.zeroEmissionsCommitmentK[0].toFixed(2)} K\n`
  );
}

import { Command } from 'commander';
import { readPathway } from '../io/load-pathway.js';
import { valueAtYear } from '../metrics/index.js';
import { attributePathway, type AttributedProjection } from '../projection/index.js';
import { attributeMembers, type AttributionRanges } from '../projection/attribute-members.js';
import { plainTable, terminalChart } from '../report/index.js';
import { standardCautions } from '../report/standard-cautions.js';
import type { CliIo } from './cli-io.js';
import { notesAndCautions } from './notes-and-cautions.js';
import { addModelOptions, baselineOption, type ModelOptions, pathwayArg, resolveModelParams, wholeNumberOption } from './options.js';
import { announceWritten, pathwayInputs, tableRenderers, writeOutput } from './output.js';
import { DEFAULT_PATHWAY } from './run.js';
import { memberSource } from './member-source.js';

interface AttributeOptions extends ModelOptions {
  out?: string;
  baseline: [number, number];
  splice: boolean;
  chart: boolean;
  members?: number;
  seed: number;
  prior: boolean;
}

/** `warmcast attribute [pathway]`: warming split by forcing agent, adding up to the total. */
export function attributeCommand(io: CliIo): Command {
  const cmd = new Command('attribute')
    .description('split a pathway\'s warming by forcing agent (the parts add up to warming_k in every year)')
    .argument('[pathway]', `pathway CSV file or bundled name (default: ${DEFAULT_PATHWAY})`)
    .option('-o, --out <file>', 'write warming_<agent>_k for every year; the extension picks the format: .csv (+ .meta.json), .json, .md; - for stdout as CSV')
    .addOption(baselineOption())
    .option('--no-splice', 'do not splice a pathway that starts late onto the bundled history')
    .option('--no-chart', 'omit the terminal chart')
    .option('-n, --members <count>', 'add 5-95 % ranges from an ensemble of this many members', wholeNumberOption('--members', 2))
    .option('--seed <integer>', 'random seed of the ensemble', wholeNumberOption('--seed', 0), 1)
    .option('--prior', 'with --members: draw from the prior, unconstrained by the observed record, instead of the calibrated set', false);
  addModelOptions(cmd)
    .addHelpText('after', '\nExamples:\n  warmcast attribute delayed\n  warmcast attribute swift-emissions --out swift-by-agent.csv\n')
    .action((pathway: string | undefined, opts: AttributeOptions) => {
      const { params, paramsFile, notes: paramNotes, forcingScale, forcingNote } = resolveModelParams(opts, io);
      const read = readPathway(pathwayArg(pathway ?? DEFAULT_PATHWAY, io), { splice: opts.splice });
      const result = attributePathway(read.pathway, { params, baseline: opts.baseline, forcingScale });
      const ranges = opts.members ? attributeMembers(read.pathway, { params, members: opts.members, seed: opts.seed, baseline: opts.baseline, source: memberSource(opts.prior) }) : undefined;
      const notes = [...read.pathway.provenance.notes, ...result.projection.notes, ...result.notes, ...(ranges?.notes ?? []), ...paramNotes, ...(forcingNote ? [forcingNote] : [])];
      if (opts.out !== undefined) {
        const table = attributionTable(result, ranges);
        const written = writeOutput(opts.out, tableRenderers(table), {
          inputs: [...pathwayInputs(read), ...(paramsFile ? [paramsFile] : [])],
          params,
          baseline: opts.baseline,
          notes,
          io,
        });
        announceWritten(written, io);
      }
      const write = opts.out === '-' ? io.stderr : io.stdout;
      write(attributionSummary(result, ranges, { chart: opts.chart, color: opts.out === '-' ? io.stderrIsTTY : io.stdoutIsTTY }));
      write(notesAndCautions(notes, standardCautions(), opts.out === '-' ? undefined : io.stdoutColumns));
    });
  return cmd;
}

/**
 * The yearly table: year, warming_k, then warming_<agent>_k per agent (no subtotals); with ranges,
 * warming_<agent>_p05_k, _p50_k and _p95_k across the members after them.
 */
export function attributionTable(r: AttributedProjection, ranges?: AttributionRanges): { columns: string[]; data: Float64Array[] } {
  const { attribution: a, projection: p } = r;
  const columns = ['year', 'warming_k', ...a.agents.map((x) => `warming_${x}_k`)];
  const data = [p.years, p.columns.warming_k, ...a.agents.map((x) => a.warmingK[x])];
  if (ranges) {
    for (const x of a.agents) {
      for (const q of ['p05', 'p50', 'p95'] as const) {
        columns.push(`warming_${x}_${q}_k`);
        data.push(ranges.byAgent[x][q]);
      }
    }
  }
  return { columns, data };
}

/** Mean of a series over inclusive years. */
function periodMean(years: Float64Array, values: Float64Array, from: number, to: number): number {
  let s = 0;
  for (let y = from; y <= to; y++) s += valueAtYear(years, values, y);
  return s / (to - from + 1);
}

/**
 * The terminal view: a table with one row per agent and one column per milestone (2010-2019 mean,
 * 2030, 2050, 2100 where the run has them), then a chart of the main agents.
 */
function attributionSummary(r: AttributedProjection, ranges: AttributionRanges | undefined, out: { chart: boolean; color: boolean }): string {
  const { attribution: a, projection: p } = r;
  const first = p.years[0];
  const last = p.years[p.years.length - 1];
  const periods: { label: string; from: number; to: number }[] = [];
  if (first <= 2010 && last >= 2019) periods.push({ label: '2010-2019', from: 2010, to: 2019 });
  for (const y of [2030, 2050, 2100]) if (y >= first && y <= last) periods.push({ label: String(y), from: y, to: y });
  const cell = (agent: string, q: { from: number; to: number }) => {
    const central = periodMean(p.years, a.warmingK[agent], q.from, q.to);
    if (!ranges) return central.toFixed(3);
    const b = ranges.byAgent[agent];
    return `${central.toFixed(2)} [${periodMean(p.years, b.p05, q.from, q.to).toFixed(2)}, ${periodMean(p.years, b.p95, q.from, q.to).toFixed(2)}]`;
  };
  const rows = a.agents.map((agent) => [agent, ...periods.map((q) => cell(agent, q))]);
  rows.push(['total (warming_k)', ...periods.map((q) => periodMean(p.years, p.columns.warming_k, q.from, q.to).toFixed(ranges ? 2 : 3))]);
  let text =
    `${p.name}: warming by forcing agent, K relative to ${p.baseline[0]}-${p.baseline[1]} (ECS ${p.params.ecsK.toFixed(2)} K, TCR ${p.params.tcrK.toFixed(2)} K)` +
    (ranges ? `\ncentral run, [5 %, 95 %] of ${ranges.members} members; each member's parts add up to its warming, the ranges of the parts do not add up` : '') +
    '\n\n' +
    plainTable({ columns: ['agent', ...periods.map((q) => q.label)], rows, numeric: [false, ...periods.map(() => true)] }).trimEnd() +
    '\n';
  if (out.chart) {
    const i0 = Math.max(0, 1850 - first);
    const years = p.years.subarray(i0);
    const sum = (agents: string[]) => {
      const v = new Float64Array(years.length);
      for (const x of agents) if (a.warmingK[x]) for (let i = 0; i < v.length; i++) v[i] += a.warmingK[x][i0 + i];
      return v;
    };
    const aerosol = a.agents.filter((x) => x.startsWith('aerosol'));
    const main = ['co2', 'ch4', 'n2o'].filter((x) => a.agents.includes(x));
    const rest = a.agents.filter((x) => !main.includes(x) && !aerosol.includes(x));
    const lines = [
      ...main.map((x) => ({ label: x.toUpperCase(), years, values: a.warmingK[x].subarray(i0) })),
      ...(aerosol.length ? [{ label: 'aerosol (all)', years, values: sum(aerosol) }] : []),
      { label: 'all other agents', years, values: sum(rest) },
    ];
    text += '\n' + terminalChart(lines, { title: `Warming by agent, ${p.name} (K)`, yLabel: 'K', height: 12, color: out.color }) + '\n';
  }
  return text;
}

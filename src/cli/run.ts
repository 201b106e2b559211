import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { Command, Option } from 'commander';
import { ConfigError } from '../errors.js';
import { projectPathway, type Projection } from '../projection/index.js';
import { thresholdBaselineNote } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';
import { addModelOptions, baselineOption, type ModelOptions, numberOption, resolveModelParams, yearOption, absentEmissionsOption } from './options.js';
import { announceWritten, clipProjection, pathwayInputs, projectionTable, tableRenderers, writeOutput } from './output.js';
import { printProjectionSummary } from './summary.js';
import { runHeadlines, runHeadlinesMarkdown } from './run-headlines.js';

/** The pathway `warmcast run` uses when none is given. */
export const DEFAULT_PATHWAY = 'delayed';

interface RunOptions extends ModelOptions, ScenarioOptions {
  out?: string;
  from?: number;
  to?: number;
  baseline: [number, number];
  splice: boolean;
  absentEmissions?: AbsentEmissionsRule;
  chart: boolean;
  carbonFeedback: boolean;
  method: 'odex' | 'exact';
  rtol: number;
  atol: number;
}

/** `warmcast run [pathway...]`: project warming for pathways; summary and chart, or a file with `--out`. */
export function runCommand(io: CliIo): Command {
  const cmd = new Command('run')
    .description('project year-by-year warming for one or more pathways (file paths or bundled names)')
    .argument('[pathway...]', `pathway CSV files or bundled names (default: ${DEFAULT_PATHWAY}; see \`warmcast pathways\`)`)
    .option('-o, --out <file>', 'write the full yearly trajectory; the extension picks the format: .csv (+ .meta.json), .json, .md; - for stdout as CSV')
    .option('--from <year>', 'first year to report (the model still starts from pre-industrial)', yearOption)
    .option('--to <year>', 'last year to report', yearOption)
    .addOption(baselineOption())
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'do not splice a pathway that starts late onto the bundled history (the run then starts from zero warming in its first year, not in equilibrium with that year\'s forcing)')
    .option('--no-carbon-feedback', 'emission-driven runs: switch off the carbon-climate feedback on uptake')
    .option('--no-chart', 'omit the terminal chart');
  addScenarioOptions(addModelOptions(cmd), true)
    .addOption(new Option('--method <name>', 'temperature stepping: exact (closed-form one-year propagator) or odex (ODE solver, the reference)').choices(['exact', 'odex']).default('exact', 'exact'))
    .option('--rtol <value>', 'odex relative tolerance', numberOption('--rtol'), 1e-10)
    .option('--atol <value>', 'odex absolute tolerance, K', numberOption('--atol'), 1e-10)
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast run                                  # the default bundled pathway\n  warmcast run my-pathway.csv --out out.csv\n  warmcast run swift --ecs 4 --tcr 2.2 --to 2100\n  warmcast run steady --params params.json --out steady.md\n  warmcast run scenarios.xlsx --scenario Quick\n',
    )
    .action(async (pathways: string[], opts: RunOptions) => {
      const args = pathways.length > 0 ? pathways : [DEFAULT_PATHWAY];
      const reads = await readPathwayArgs(args, opts, { splice: opts.splice, absentEmissions: opts.absentEmissions }, io);
      if (opts.out !== undefined && reads.length > 1) {
        throw new ConfigError('--out takes one pathway; to put several side by side use `warmcast compare`', 'out');
      }
      if (!(opts.rtol > 0 && opts.atol > 0)) throw new ConfigError('--rtol and --atol must be positive', 'rtol');
      const { params, paramsFile, notes: paramNotes, forcingScale, forcingNote } = resolveModelParams(opts, io);
      const baselineNote = thresholdBaselineNote(opts.baseline);
      const runNotes = [...paramNotes, ...(forcingNote ? [forcingNote] : []), ...(baselineNote ? [baselineNote] : [])];
      const projections: { projection: Projection; whole: Projection; files: string[] }[] = [];
      for (const read of reads) {
        const full = projectPathway(read.pathway, {
          params,
          baseline: opts.baseline,
          method: opts.method,
          carbonFeedback: opts.carbonFeedback,
          forcingScale,
          tolerances: { relativeTolerance: opts.rtol, absoluteTolerance: opts.atol, maxStepsPerUnit: 2000 },
        });
        projections.push({ projection: clipProjection(full, opts.from, opts.to), whole: full, files: pathwayInputs(read) });
      }
      const report = opts.out === '-' ? io.stderr : io.stdout;
      if (opts.out !== undefined) {
        const { projection, whole, files } = projections[0];
        const inputs = [...files, ...(paramsFile ? [paramsFile] : [])];
        const headlines = runHeadlines(projection, whole);
        const renderers = tableRenderers(projectionTable(projection), { json: { headlines }, markdownBefore: runHeadlinesMarkdown(headlines) });
        const written = writeOutput(opts.out, renderers, {
          sidecar: { headlines },
          inputs,
          params,
          baseline: opts.baseline,
          notes: [...projection.provenance.notes, ...projection.notes, ...runNotes],
          io,
        });
        announceWritten(written, io);
      }
      for (const { projection, whole } of projections) {
        printProjectionSummary(projection, { write: report, color: opts.out === '-' ? io.stderrIsTTY : io.stdoutIsTTY, chart: opts.chart, from: opts.from, notes: runNotes, whole, width: opts.out === '-' ? undefined : io.stdoutColumns });
      }
    });
  return cmd;
}

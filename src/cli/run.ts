import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { Command, Option } from 'commander';
import { ConfigError } from '../errors.js';
import { projectPathway } from '../projection/index.js';
import { runDocument, standardCautions, thresholdBaselineNote } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';
import { addModelOptions, baselineOption, cautionsHelp, type ModelOptions, numberOption, resolveModelParams, absentEmissionsOption, co2JumpOption } from './options.js';
import { addReportOptions, announceWritten, observedRecord, pathwayInputs, printDocument, rowChoice, writeDocument, type ReportOptions } from './output.js';

/** The pathway `warmcast run` uses when none is given. */
export const DEFAULT_PATHWAY = 'delayed';

interface RunOptions extends ModelOptions, ReportOptions, ScenarioOptions {
  baseline: [number, number];
  splice: boolean;
  co2JumpIntended?: boolean;
  absentEmissions?: AbsentEmissionsRule;
  carbonFeedback: boolean;
  method: 'odex' | 'exact';
  rtol: number;
  atol: number;
}

/** `warmcast run [pathway...]`: project warming for pathways; headline, table and chart, or files with `--out`. */
export function runCommand(io: CliIo): Command {
  const cmd = new Command('run')
    .description('project year-by-year warming for one or more pathways (file paths or bundled names)')
    .argument('[pathway...]', `pathway CSV files or bundled names (default: ${DEFAULT_PATHWAY}; see \`warmcast pathways\`)`);
  addReportOptions(cmd)
    .addOption(baselineOption())
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'do not splice a pathway that starts late onto the bundled history (the run then starts from zero warming in its first year, not in equilibrium with that year\'s forcing)')
    .addOption(co2JumpOption())
    .option('--no-carbon-feedback', 'emission-driven runs: switch off the carbon-climate feedback on uptake');
  addScenarioOptions(addModelOptions(cmd), true)
    .addOption(new Option('--method <name>', 'temperature stepping: exact (closed-form one-year propagator) or odex (ODE solver, the reference)').choices(['exact', 'odex']).default('exact', 'exact'))
    .option('--rtol <value>', 'odex relative tolerance', numberOption('--rtol'), 1e-10)
    .option('--atol <value>', 'odex absolute tolerance, K', numberOption('--atol'), 1e-10)
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast run                                  # the default bundled pathway\n  warmcast run my-pathway.csv --out out.csv\n  warmcast run swift --ecs 4 --tcr 2.2 --to 2100\n  warmcast run steady --out steady.xlsx\n  warmcast run scenarios.xlsx --scenario Quick\n' +
        cautionsHelp(standardCautions()),
    )
    .action(async (pathways: string[], opts: RunOptions) => {
      const args = pathways.length > 0 ? pathways : [DEFAULT_PATHWAY];
      const reads = await readPathwayArgs(args, opts, { splice: opts.splice, absentEmissions: opts.absentEmissions, co2JumpIntended: opts.co2JumpIntended }, io);
      if (opts.out !== undefined && reads.length > 1) {
        throw new ConfigError('--out takes one pathway; to put several side by side use `warmcast compare`', 'out');
      }
      if (!(opts.rtol > 0 && opts.atol > 0)) throw new ConfigError('--rtol and --atol must be positive', 'rtol');
      const { params, paramsFile, notes: paramNotes, forcingScale, forcingNote } = resolveModelParams(opts, io);
      const baselineNote = thresholdBaselineNote(opts.baseline);
      for (const read of reads) {
        const p = projectPathway(read.pathway, {
          params,
          baseline: opts.baseline,
          method: opts.method,
          carbonFeedback: opts.carbonFeedback,
          forcingScale,
          tolerances: { relativeTolerance: opts.rtol, absoluteTolerance: opts.atol, maxStepsPerUnit: 2000 },
        });
        const notes = [...paramNotes, ...(forcingNote ? [forcingNote] : []), ...(baselineNote ? [baselineNote] : [])];
        const observed = observedRecord(opts.baseline, notes);
        const rows = rowChoice(opts, p.years[0], p.years[p.years.length - 1], p.provenance.spliceYear ?? p.years[0]);
        const doc = runDocument(p, { rows, notes, ...(observed ? { observed } : {}) });
        if (opts.out !== undefined) {
          const inputs = [...pathwayInputs(read), ...(paramsFile ? [paramsFile] : [])];
          announceWritten(await writeDocument(opts.out, doc, { inputs, params, baseline: opts.baseline, io }), io);
        }
        printDocument(doc, opts, io);
      }
    });
  return cmd;
}

import { Command } from 'commander';
import { attributeMembers } from '../projection/attribute-members.js';
import { attributePathway } from '../projection/index.js';
import { attributionDocument, standardCautions } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { memberSource } from './member-source.js';
import { absentEmissionsOption, addModelOptions, baselineOption, cautionsHelp, type ModelOptions, resolveModelParams, wholeNumberOption } from './options.js';
import { addReportOptions, announceWritten, pathwayInputs, printDocument, type ReportOptions, rowChoice, writeDocument } from './output.js';
import { DEFAULT_PATHWAY } from './run.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';

interface AttributeOptions extends ModelOptions, ReportOptions, ScenarioOptions {
  baseline: [number, number];
  splice: boolean;
  members?: number;
  seed: number;
  prior: boolean;
  absentEmissions?: string;
}

/** `warmcast attribute [pathway]`: warming split by forcing agent, adding up to the total. */
export function attributeCommand(io: CliIo): Command {
  const cmd = new Command('attribute')
    .description("split a pathway's warming by forcing agent (warming_<agent>_k) and, for emission pathways, by emitted species (warming_from_<species>_k); each split adds up to warming_k in every year")
    .argument('[pathway]', `pathway CSV file or bundled name (default: ${DEFAULT_PATHWAY})`);
  addReportOptions(cmd)
    .addOption(baselineOption())
    .option('--no-splice', 'do not splice a pathway that starts late onto the bundled history')
    .option('-n, --members <count>', 'add 5-95 % ranges from this many members of the calibrated set', wholeNumberOption('--members', 2))
    .option('--seed <integer>', 'random seed of the members', wholeNumberOption('--seed', 0), 1)
    .option('--prior', 'with --members: draw from the prior, unconstrained by the observed record, instead of the calibrated set', false)
    .addOption(absentEmissionsOption());
  addScenarioOptions(cmd, false);
  addModelOptions(cmd).addHelpText('after', '\nExamples:\n  warmcast attribute delayed\n  warmcast attribute clean-air-emissions --members 500 --out by-species.csv\n  warmcast attribute scenarios.xlsx --scenario Quick\n' +
      cautionsHelp(standardCautions("Without --members one central run is shown, with no range; with it, ranges are the 5-95 % spread of the members' parameters only, not the pathway or the model structure.")));
  cmd.action((pathway: string | undefined, opts: AttributeOptions) => {
    const { params, paramsFile, notes: paramNotes, forcingScale, forcingNote } = resolveModelParams(opts, io);
    return (async () => {
      const [read] = await readPathwayArgs([pathway ?? DEFAULT_PATHWAY], opts, { splice: opts.splice, absentEmissions: opts.absentEmissions as never }, io, false);
      const result = attributePathway(read.pathway, { params, baseline: opts.baseline, forcingScale });
      const ranges = opts.members
        ? attributeMembers(read.pathway, { params, members: opts.members, seed: opts.seed, baseline: opts.baseline, source: memberSource(opts.prior), ozoneShares: result.ozoneShares })
        : undefined;
      const speciesNote = result.bySpecies || result.projection.carbon ? [] : ['by emitted species: for emission pathways (co2_gtco2) only; this pathway gives concentrations or forcing, so its warming is split by agent'];
      const notes = [...read.pathway.provenance.notes, ...result.projection.notes, ...result.notes, ...speciesNote, ...(ranges?.notes ?? []), ...paramNotes, ...(forcingNote ? [forcingNote] : [])];
      const y = result.projection.years;
      const rows = rowChoice(opts, y[0], y[y.length - 1], read.pathway.provenance.spliceYear ?? y[0]);
      const columns = opts.years || opts.every ? rows.years : undefined;
      const doc = attributionDocument(result, { notes, ...(ranges ? { ranges } : {}), from: opts.from, to: opts.to, ...(columns ? { columns } : {}) });
      if (opts.out !== undefined) {
        const inputs = [...pathwayInputs(read), ...(paramsFile ? [paramsFile] : [])];
        announceWritten(await writeDocument(opts.out, doc, { inputs, params, baseline: opts.baseline, io, ...(ranges ? { seed: opts.seed } : {}) }), io);
      }
      printDocument(doc, opts, io);
    })();
  });
  return cmd;
}

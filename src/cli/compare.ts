import type { AbsentEmissionsRule } from '../forcing/absent-emissions.js';
import { Command } from 'commander';
import { ConfigError } from '../errors.js';
import { formatCsv } from '../io/index.js';
import { comparePathways, milestoneYears, type PathwayWarming } from '../metrics/index.js';
import { runEnsemble } from '../ensemble/index.js';
import { memberSource } from './member-source.js';
import { ensembleInput, projectPathway } from '../projection/index.js';
import { comparisonCharts, comparisonHtml, comparisonJson, comparisonLongTable, comparisonSummary, comparisonMarkdown, comparisonText, comparisonUncertainty, scopedNotes, standardCautions, thresholdBaselineNote, type ScopedNote } from '../report/index.js';
import type { CliIo } from './cli-io.js';
import { addScenarioOptions, readPathwayArgs, type ScenarioOptions } from './scenario-options.js';
import { addModelOptions, baselineOption, type ModelOptions, numberListOption, resolveModelParams, thresholdsOption, wholeNumberOption, yearOption, absentEmissionsOption } from './options.js';
import { notesAndCautions } from './notes-and-cautions.js';
import { announceWritten, pathwayInputs, writeOutput } from './output.js';
import { ensembleParameters } from './provenance.js';
import { paramsToJson } from '../climate/params.js';

interface CompareOptions extends ModelOptions, ScenarioOptions {
  members?: number;
  seed: number;
  out?: string;
  years?: number[];
  thresholds: number[];
  baseline: [number, number];
  splice: boolean;
  absentEmissions?: AbsentEmissionsRule;
  chart: boolean;
  carbonFeedback: boolean;
  from?: number;
}

/** `warmcast compare <pathway...>`: pathways side by side against the first, as tables, charts and reports. */
export function compareCommand(io: CliIo): Command {
  const cmd = new Command('compare')
    .description('compare pathways year by year against the first (the reference): milestones, peaks, threshold crossings')
    .argument('<pathway...>', 'pathway CSV files or bundled names; the first is the reference')
    .option('-o, --out <file>', 'write the comparison; the extension picks the format: .md, .csv (+ .meta.json), .json, .svg, .html')
    .option('--years <list>', 'milestone years, e.g. 2030,2040,2050,2100 (default every 10 years over the future)', numberListOption('--years'))
    .addOption(thresholdsOption('warming levels in K whose crossing years are reported', [1.5, 2]))
    .addOption(baselineOption())
    .addOption(absentEmissionsOption())
    .option('--no-splice', 'do not splice pathways that start late onto the bundled history (each run then starts from zero warming in its first year)')
    .option('--no-carbon-feedback', 'emission-driven runs: switch off the carbon-climate feedback on uptake')
    .option('--members <count>', 'also run a parameter ensemble of this many members per pathway: ranges in tables and shaded in charts, median as the line', wholeNumberOption('--members', 2))
    .option('--seed <integer>', 'random seed of the ensembles (with --members)', wholeNumberOption('--seed', 0), 1)
    .option('--from <year>', 'first year of the charts (default 1850, or the first year of the pathways); the tables and files keep every year', yearOption)
    .option('--no-chart', 'omit the terminal chart');
  addScenarioOptions(addModelOptions(cmd), true)
    .addHelpText(
      'after',
      '\nExamples:\n  warmcast compare steady delayed swift\n  warmcast compare scenarios.xlsx --scenario Quick --scenario Slow\n  warmcast compare steady swift --years 2030,2050,2100 --out table.md\n  warmcast compare steady delayed swift --out report.html\n',
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
      const { params, paramsFile, notes: paramNotes, forcingScale, forcingNote } = resolveModelParams(opts, io);
      const baselineNote = thresholdBaselineNote(opts.baseline);
      const files: string[] = [];
      const scoped: ScopedNote[] = [];
      const reads = await readPathwayArgs(args, opts, { splice: opts.splice, absentEmissions: opts.absentEmissions }, io);
      const runs = reads.map((read) => {
        files.push(...pathwayInputs(read));
        const p = projectPathway(read.pathway, { params, baseline: opts.baseline, carbonFeedback: opts.carbonFeedback, forcingScale });
        scoped.push(...[...p.provenance.notes, ...p.notes].map((text) => ({ pathway: p.name, text })));
        return { projection: p, pathway: read.pathway };
      });
      const ref = runs[0].projection;
      const last = ref.years[ref.years.length - 1];
      const firstFuture = ref.provenance.spliceYear ?? ref.years[0];
      const pathways: PathwayWarming[] = [];
      // With ensembles no single parameter set was used: provenance records what the members share.
      let shared: Record<string, number | string> | undefined;
        for (const { projection: p, pathway } of runs) {
          const base: PathwayWarming = { label: p.name, years: p.years, warmingK: p.columns.warming_k, ...(p.columns.co2_gtco2 ? { co2Gtco2: p.columns.co2_gtco2 } : {}) };
          if (opts.members === undefined) {
            pathways.push(base);
            continue;
          }
          // With an ensemble, the line is its median and the ranges its percentiles (same seed per pathway).
          const { input, notes: inputNotes } = ensembleInput(pathway, params, { baseline: opts.baseline });
          const e = await runEnsemble(input, { members: opts.members, seed: opts.seed, thresholds: opts.thresholds, baseline: opts.baseline, source: memberSource(false) });
          scoped.push(...[...inputNotes, ...e.notes].map((text) => ({ pathway: p.name, ensemble: true, text })));
          shared ??= ensembleParameters(e.config);
          const pc = e.percentiles;
          const crossingOdds = e.crossings.map((x, j) => ({
            thresholdK: x.thresholdK,
            byYear: x.byMilestone,
            medianYear: x.medianYear,
            withinRun: x.probabilityWithinRun,
            lastWindowYear: x.byLastWindow.year,
            shareAbove: e.probAbove[j],
          }));
          const membersPeak = { warmingK: e.peak.warmingK, year: e.peak.year, stillRising: e.peak.stillRising };
          pathways.push({ ...base, warmingK: pc.p50, range: { p05: pc.p05, p17: pc.p17, p83: pc.p83, p95: pc.p95 }, crossingOdds, membersPeak });
        }
      const medianNote =
        opts.members !== undefined
          ? ['warming_k and the milestone values are the ensemble median of each pathway; its crossing years are the first years by which half of the members have crossed']
          : [];
      const notes = [...paramNotes, ...(forcingNote && opts.members === undefined ? [forcingNote] : []), ...(baselineNote ? [baselineNote] : []), ...medianNote, ...scopedNotes(scoped, runs.map((r) => r.projection.name))];
      const c = comparePathways(pathways, {
        milestoneYears: opts.years ? chosenYears(opts.years, runs.map((r) => r.projection.years)) : milestoneYears(firstFuture, last, 10),
        thresholdsK: opts.thresholds,
        cumulativeFromYear: firstFuture,
      });
      const baseline = `${opts.baseline[0]}-${opts.baseline[1]}`;
      const firstAny = Math.min(...runs.map((r) => r.projection.years[0]));
      if (opts.from !== undefined && !(opts.from >= firstAny && opts.from < last)) {
        throw new ConfigError(`--from ${opts.from} must lie within the years of the pathways and before their end, ${firstAny}-${last - 1}`, 'from');
      }
      const fromYear = opts.from ?? Math.max(ref.years[0], Math.min(1850, last));
      if (opts.out !== undefined) {
        const inputs = [...files, ...(paramsFile ? [paramsFile] : [])];
        const assumptions: Record<string, string> = {
          'Climate sensitivity':
            opts.members === undefined
              ? `ECS ${params.ecsK.toFixed(2)} K, TCR ${params.tcrK.toFixed(2)} K (two-box model calibrated to them)`
              : 'sampled per ensemble member (see Ensemble); each member\'s two-box model is calibrated to its own ECS and TCR',
          'CO2 forcing': params.co2Formula === 'log' ? 'Myhre et al. 1998, 5.35 ln(C/C0)' : 'Meinshausen et al. 2020 with IPCC AR6 adjustments',
          Baseline: `warming relative to the ${baseline} mean${baselineNote ? `; ${baselineNote}` : ''}`,
          ...(opts.members !== undefined
            ? {
                Ensemble:
                  `${opts.members} members per pathway, seed ${opts.seed}; lines are ensemble medians; members drawn from the calibrated parameter set ` +
                  '(constrained by the observed record, pathways/calibrated-members.json); crossing years and chances from the members',
              }
            : {}),
          'History splice': runs.map(({ projection: p }) => `${p.name}: ${p.provenance.spliceYear ? `bundled history before ${p.provenance.spliceYear}` : 'none'}`).join('; '),
          Parameters: Object.entries(shared ?? paramsToJson(params)).map(([k, v]) => `${k} ${typeof v === 'number' ? +v.toPrecision(5) : v}`).join(', '),
        };
        const written = writeOutput(
          opts.out,
          {
            '.csv': () => formatCsv(comparisonLongTable(c)),
            '.json': (p) => comparisonJson(c, p),
            '.md': (p) => comparisonMarkdown(c, { provenance: p, baseline }),
            '.svg': () => comparisonCharts(c, { fromYear, baseline })[0],
            '.html': (p) => comparisonHtml(c, { provenance: p, assumptions, baseline, fromYear }),
          },
          {
            inputs,
            params,
            ...(shared ? { parameters: shared } : {}),
            baseline: opts.baseline,
            notes,
            io,
            ...(opts.members !== undefined ? { seed: opts.seed } : {}),
            // Beside the long CSV, which holds only annual series: peaks, crossings and their odds.
            sidecar: { comparison: comparisonSummary(c) },
            caution: standardCautions(comparisonUncertainty(c, 'text')).join(' '),
          },
        );
        announceWritten(written, io);
      }
      const write = opts.out === '-' ? io.stderr : io.stdout;
      write(comparisonText(c, { color: opts.out === '-' ? io.stderrIsTTY : io.stdoutIsTTY, fromYear, baseline, noChart: !opts.chart }));
      write(notesAndCautions(notes, standardCautions(comparisonUncertainty(c, 'text')), opts.out === '-' ? undefined : io.stdoutColumns));
    });
  return cmd;
}

/**
 * The milestone years given with --years, ascending and each once.
 * @throws ConfigError for a year that is not whole or that no pathway covers
 */
function chosenYears(years: readonly number[], spans: readonly Float64Array[]): number[] {
  const first = Math.min(...spans.map((y) => y[0]));
  const last = Math.max(...spans.map((y) => y[y.length - 1]));
  const fractional = years.filter((y) => !Number.isInteger(y));
  if (fractional.length > 0) throw new ConfigError(`--years must be whole years, such as 2030,2050,2100; got ${fractional.join(', ')}`, 'years');
  const outside = years.filter((y) => y < first || y > last);
  if (outside.length > 0) throw new ConfigError(`--years ${outside.join(', ')} must lie within the years the pathways cover, ${first}-${last}`, 'years');
  return [...new Set(years)].sort((a, b) => a - b);
}

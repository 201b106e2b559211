// The README's library example, run as written.
import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import * as library from '../src/index.js';
import { calibrate, ensembleInput, forcingByAgent, loadPathway, projectPathway, runEnsemble, comparePathways, readScenarioTable, scenarioPathway, selectScenario } from '../src/index.js';

// The intended library surface (DEVELOPERS.md, "The library surface"): adding or removing a name is a
// deliberate change to one of these lists.
const VALUES = [
  'AR6_SAMPLING', 'ar6Members', 'calibratedMemberSource', 'calibratedSetInOrder', 'COLUMN_UNITS', 'priorMemberSource', 'readCalibratedSet', 'representativeParams', 'ConfigError', 'FORCING_AGENTS', 'InputError', 'NumericalError', 'PATHWAY_COLUMNS', 'WarmcastError', 'EMITTED_SPECIES',
  'calibrate', 'ch4ErfAr6', 'co2ErfAr6', 'comparePathways', 'comparisonDocument', 'crossingPeriod', 'ensembleDocument', 'OUTPUT_FORMATS', 'renderDocument', 'runDocument',
  'cumulativeToNetZero', 'diagnoseEmissions', 'energyBalance', 'ensembleInput', 'forcingByAgent', 'formatInputProblem',
  'gtcToGtco2', 'gtco2ToGtc', 'listBundledPathways', 'loadHistory', 'loadPathway', 'mergeShards', 'n2oErfAr6',
  'parsePathway', 'peak', 'projectPathway', 'PUBLISHED_CHECKS', 'runEnsemble', 'runPublishedChecks', 'shardFromJson', 'shardToJson',
  'spliceOntoHistory', 'standardCautions', 'toAnnual', 'attributeMembers', 'attributePathway', 'carbonBudget',
  'readScenarioTable', 'scenarioPathway', 'selectScenario', 'AR6_WARMING_CATEGORIES', 'warmingCategory',
];
const TYPES = [
  'BundledPathway', 'CalibratedSet', 'CalibrationTargets', 'ClimateParams', 'Co2Formula', 'Comparison', 'ComparisonOptions', 'CrossingPeriod',
  'EmittedSpecies', 'EnergyBalanceResult', 'EnsembleInput', 'EnsembleOptions', 'EnsembleResult', 'EnsembleSampling', 'ForcingAgent', 'ForcingOptions', 'InputProblem',
  'LoadPathwayOptions', 'ParsedPathway', 'Pathway', 'PathwayColumn', 'PathwayProvenance', 'Peak', 'Projection', 'ProjectionOptions',
  'MemberSource', 'OutputDocument', 'OutputFormat', 'OutputTable', 'PublishedCheck', 'VerificationRow',
  'AttributedProjection', 'AttributionRanges', 'BudgetAssumptions', 'CarbonBudget', 'CarbonBudgetOptions',
  'IamcScenario', 'IamcTable', 'ScenarioChoice', 'CategoryEvidence', 'WarmingCategory',
];

/** The names src/index.ts exports as types (`export type { A, B } from ...`), read from its text. */
function exportedTypeNames(): string[] {
  const text = readFileSync(new URL('../src/index.ts', import.meta.url), 'utf8');
  return [...text.matchAll(/^export type \{([^}]*)\}/gm)].flatMap((m) => m[1].split(',').map((s) => s.trim()).filter(Boolean));
}

describe('library surface (src/index.ts)', () => {
  it('src/index.ts exports exactly the intended values', () => {
    expect(Object.keys(library).sort()).toEqual([...VALUES].sort());
  });

  it('src/index.ts exports exactly the intended types, and nothing with export *', () => {
    expect(exportedTypeNames().sort()).toEqual([...TYPES].sort());
    expect(readFileSync(new URL('../src/index.ts', import.meta.url), 'utf8')).not.toMatch(/^export \*/m);
  });

  it('every exported value is documented where it is defined (JSDoc right before its declaration)', () => {
    const sources = readdirSync(new URL('../src/', import.meta.url), { recursive: true, encoding: 'utf8' })
      .filter((f) => f.endsWith('.ts') && !f.endsWith('.d.ts'))
      .map((f) => readFileSync(new URL(`../src/${f}`, import.meta.url), 'utf8'))
      .join('\n');
    const undocumented = VALUES.filter((name) => !new RegExp(`\\*/\\s*export (?:async )?(?:function|const|class) ${name}\\b`).test(sources));
    expect(undocumented).toEqual([]);
  });
});


describe('library surface (README example)', () => {
  it('loads a bundled pathway, calibrates, projects, and reads warming in 2100', () => {
    const pathway = loadPathway('swift');
    const params = calibrate({ ecsK: 3, tcrK: 1.8 });
    const run = projectPathway(pathway, { params });
    const y2100 = run.columns.warming_k[2100 - run.years[0]];
    expect(y2100).toBeGreaterThan(1);
    expect(y2100).toBeLessThan(3);
    expect(typeof forcingByAgent).toBe('function');
    expect(typeof runEnsemble).toBe('function');
    expect(typeof comparePathways).toBe('function');
  });

  it('runs an ensemble of the same pathway with the defaults the README states: thresholds 1.5, 2, 3 K, baseline 1850-1900', async () => {
    const pathway = loadPathway('swift');
    const params = calibrate({ ecsK: 3, tcrK: 1.8 });
    const { input } = ensembleInput(pathway, params);
    const ens = await runEnsemble(input, { members: 200, seed: 7 });
    expect(ens.crossings.map((x) => x.thresholdK)).toEqual([1.5, 2, 3]);
    expect(ens.config.baseline).toEqual([1850, 1900]);
    const i = 2100 - ens.years[0];
    expect(ens.percentiles.p05[i]).toBeLessThan(ens.percentiles.p95[i]);
    expect(ens.crossings[1].byMilestone.map((m) => m.year)).toEqual([2050, 2100]);
  });

  it('reads a scenario of the bundled IAMC example table into a pathway the projection takes (README example)', async () => {
    const table = await readScenarioTable(new URL('../pathways/examples/invented-scenarios.csv', import.meta.url).pathname);
    const { pathway } = scenarioPathway(selectScenario(table, { scenario: 'Immediate-01', model: 'Gridline 2.1' }), { absentEmissions: { kind: 'follow-co2' } });
    const run = projectPathway(pathway, { params: calibrate({ ecsK: 3, tcrK: 1.8 }) });
    // The table gives 2020 CO2 as 40366 Mt CO2/yr: read as 40.366 Gt CO2/yr.
    expect(pathway.series.co2_gtco2![pathway.years.indexOf(2020)]).toBeCloseTo(40.366, 6);
    expect(run.columns.warming_k[run.years.indexOf(2100)]).toBeGreaterThan(0.5);
  });
});

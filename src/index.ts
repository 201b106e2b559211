/**
 * warmcast's library surface: what another project needs to turn a pathway into warming, its
 * ranges and its answers. Everything here is documented where it is defined (units, sources,
 * examples). Physics and statistics are pure functions; only the pathway readers touch the file
 * system. The folders' own index files export more, for warmcast's own use; those names are not
 * part of the library and may change.
 *
 * @example
 * import { calibrate, loadPathway, projectPathway } from 'warmcast';
 * const run = projectPathway(loadPathway('swift'), { params: calibrate({ ecsK: 3, tcrK: 1.8 }) });
 * run.columns.warming_k[run.years.indexOf(2100)] // K above 1850-1900
 */

// Errors: every failure is a WarmcastError with a stable `code` and the exit code the CLI uses.
export { ConfigError, InputError, NumericalError, WarmcastError, formatInputProblem } from './errors.js';
export type { InputProblem } from './errors.js';

// Pathways: reading files (or text), the annual grid, the bundled history and pathways.
export { PATHWAY_COLUMNS, COLUMN_UNITS } from './pathway.js';
export type { Pathway, PathwayColumn, PathwayProvenance } from './pathway.js';
export { listBundledPathways, loadHistory, loadPathway, parsePathway, spliceOntoHistory, toAnnual } from './io/index.js';
export type { BundledPathway, LoadPathwayOptions, ParsedPathway } from './io/index.js';

// The model: calibration from ECS and TCR, forcing by agent, the energy balance.
export { calibrate, energyBalance } from './climate/index.js';
export type { CalibrationTargets, ClimateParams, EnergyBalanceResult } from './climate/index.js';
export { EMITTED_SPECIES, FORCING_AGENTS, ch4ErfAr6, co2ErfAr6, forcingByAgent, n2oErfAr6 } from './forcing/index.js';
export type { Co2Formula, EmittedSpecies, ForcingAgent, ForcingOptions } from './forcing/index.js';
export { diagnoseEmissions, gtcToGtco2, gtco2ToGtc } from './carbon/index.js';

// Projections and ensembles.
export { ensembleInput, projectPathway } from './projection/index.js';
export type { Projection, ProjectionOptions } from './projection/index.js';
export { AR6_SAMPLING, ar6Members, mergeShards, runEnsemble, shardFromJson, shardToJson } from './ensemble/index.js';
export type { EnsembleInput, EnsembleOptions, EnsembleResult, EnsembleSampling, MemberSource } from './ensemble/index.js';
// The calibrated parameter set (pathways/calibrated-members.json): the CLI's default ensemble members
// and, through representativeParams, its default single-run model.
export { calibratedMemberSource, calibratedSetInOrder, priorMemberSource, representativeParams } from './ensemble/calibrated-set.js';
export type { CalibratedSet } from './ensemble/calibrated-set.js';
export { readCalibratedSet } from './io/read-calibrated-set.js';

// Scenario tables (IAMC layout, .csv or .xlsx): read a table, pick a scenario, get the pathway every
// function above takes; and the IPCC AR6 WG3 warming category of a scenario's ensemble.
export { readScenarioTable, scenarioPathway, selectScenario } from './io/index.js';
export type { IamcScenario, IamcTable, ScenarioChoice } from './io/index.js';
export { AR6_WARMING_CATEGORIES, warmingCategory } from './batch/index.js';
export type { CategoryEvidence, WarmingCategory } from './batch/index.js';

// The inverse questions: remaining CO2 budgets for a limit and a chance, and warming by forcing agent
// (and, for emission pathways, by emitted species).
export { attributeMembers, attributePathway, carbonBudget } from './projection/index.js';
export type { AttributedProjection, AttributionRanges, BudgetAssumptions, CarbonBudget, CarbonBudgetOptions } from './projection/index.js';

// Answers: warming levels, peaks, comparisons, cumulative emissions.
export { comparePathways, crossingPeriod, cumulativeToNetZero, peak } from './metrics/index.js';
export type { Comparison, ComparisonOptions, CrossingPeriod, Peak } from './metrics/index.js';

// Checks: the published checks the tests make, run on the user's machine (`warmcast verify`).
export { PUBLISHED_CHECKS, runPublishedChecks } from './verify/index.js';
export type { PublishedCheck, VerificationRow } from './verify/index.js';

// Reports: a run, a comparison or an ensemble as one document (headline, tables, charts, notes,
// cautions), written in any format of OUTPUT_FORMATS; and the cautions every quoted number needs.
export { comparisonDocument, ensembleDocument, OUTPUT_FORMATS, renderDocument, runDocument, standardCautions } from './report/index.js';
export type { OutputDocument, OutputFormat, OutputTable } from './report/index.js';

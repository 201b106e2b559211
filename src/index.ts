// warmcast's library surface: pathway reading, forcing, the energy balance model, calibration and
// projections. Everything here is pure except the file readers in io/.
export * from './errors.js';
export * from './pathway.js';
export * from './forcing/index.js';
export * from './climate/index.js';
export * from './projection/index.js';
export { parsePathway, toAnnual, spliceOntoHistory, loadPathway, readPathway, loadHistory, listBundledPathways, describePathway } from './io/index.js';
export type { ParsedPathway, ReadPathwayResult, BundledPathway } from './io/index.js';
export { parseParams } from './io/index.js';
export { DEFAULT_TOLERANCES } from './numerics/integrate-steps.js';
export type { OdeTolerances } from './numerics/integrate-steps.js';
export * from './carbon/index.js';
export * from './metrics/index.js';
export { ensembleHeadlines, ensembleTable, mergeShards, runEnsemble, shardFromJson, shardToJson, summarizeEnsemble, AR6_SAMPLING, ar6Members } from './ensemble/index.js';
export type { EnsembleHeadlines, EnsembleInput, EnsembleOptions, EnsembleResult, EnsembleSampling, MemberParameters, MemberSource } from './ensemble/index.js';
export { PUBLISHED_CHECKS, runPublishedChecks } from './verify/index.js';
export type { PublishedCheck, VerificationRow } from './verify/index.js';
export { comparisonDocument, ensembleDocument, OUTPUT_FORMATS, renderDocument, runDocument, svgChart, terminalChart, terminalText, htmlReport, standardCautions } from './report/index.js';
export type { OutputDocument, OutputTable } from './report/index.js';

/**
 * Scenario sets: each scenario of a table assessed with the ensemble (peak and 2100 warming ranges,
 * threshold probabilities, crossing and net-zero years, the AR6 WG3 warming category and how stable
 * it is under the members' sampling), the summary
 * and error tables, and shard files that merge into one batch.
 */
export { assessScenario, memberFigures, BATCH_PERCENTILES, BATCH_PERCENTILE_NAMES, CUMULATIVE_FROM, PEAK_YEARS } from './assess-scenario.js';
export type { AssessOptions, BatchPercentile, ScenarioAssessment } from './assess-scenario.js';
export { runBatch, batchErrorLines } from './run-batch.js';
export type { BatchError, BatchOutcome, BatchScenario } from './run-batch.js';
export { batchSummaryTable, batchErrorTable, probPeakAboveColumn, medianCrossingColumn } from './batch-summary.js';
export { batchShardToJson, batchShardFromJson, isBatchShardText, mergeBatchShards, BATCH_SHARD_FORMAT, BATCH_SHARD_VERSION } from './batch-shard.js';
export type { BatchSettings, BatchShard } from './batch-shard.js';
export { categoryAgreement, categoryBootstrapRandom, CATEGORY_RESAMPLES, UNCERTAIN_AGREEMENT } from './category-agreement.js';
export { AR6_WARMING_CATEGORIES, categoryEvidence, warmingCategory } from './warming-category.js';
export type { CategoryEvidence, WarmingCategory } from './warming-category.js';

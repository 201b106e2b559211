import type { ClimateParams } from '../climate/params.js';
import { runEnsemble, type EnsembleResult, type MemberSource } from '../ensemble/index.js';
import { cumulativeToNetZero } from '../metrics/cumulative-to-net-zero.js';
import { quantilesInPlace } from '../numerics/quantiles.js';
import type { Pathway } from '../pathway.js';
import { ensembleInput } from '../projection/index.js';
import { categoryAgreement, categoryBootstrapRandom, CATEGORY_RESAMPLES } from './category-agreement.js';
import { categoryEvidence, warmingCategory } from './warming-category.js';

/** The percentiles a batch reports for peak warming and 2100 warming, and their names. */
export const BATCH_PERCENTILES = [0.05, 0.33, 0.5, 0.67, 0.95] as const;
export const BATCH_PERCENTILE_NAMES = ['p05', 'p33', 'p50', 'p67', 'p95'] as const;
export type BatchPercentile = (typeof BATCH_PERCENTILE_NAMES)[number];

/** The century over which peak warming is taken (the AR6 WG3 categories judge the 21st century's peak). */
export const PEAK_YEARS = [2001, 2100] as const;

/** Year from which cumulative CO2 to net zero is summed (the AR6 WG3 convention of reporting from 2020; from memory). */
export const CUMULATIVE_FROM = 2020;

/** Options of assessScenario: those of the ensemble, shared by every scenario of a batch. */
export interface AssessOptions {
  /** Central parameters (CO2 formula; CH4 and N2O of emission pathways), as `warmcast ensemble` uses. */
  params: ClimateParams;
  members: number;
  seed: number;
  /** Warming levels, K, for prob_peak_above_<t> and the median crossing years. */
  thresholds: number[];
  baseline: [number, number];
  /** Where members come from (the calibrated set, as `warmcast ensemble` uses by default); runEnsemble's default when absent. */
  source?: MemberSource;
}

/** One scenario's row of a batch summary: the figures planners classify scenarios by. */
export interface ScenarioAssessment {
  model: string;
  scenario: string;
  /** Percentiles across members of each member's peak warming over PEAK_YEARS, K relative to the baseline. */
  peakWarmingK: Record<BatchPercentile, number>;
  /** Median across members of the year of each member's peak (a year some member peaks in). */
  peakYearP50: number;
  /** Percentiles across members of the warming in 2100, K; null when the run ends before 2100. */
  warming2100K: Record<BatchPercentile, number> | null;
  /** Per threshold: share of members whose peak warming over PEAK_YEARS exceeds it. */
  probPeakAbove: { thresholdK: number; probability: number }[];
  /** Per threshold: first year by which half of the members' 20-year means have crossed it (AR6 rule); null if fewer than half cross. */
  medianCrossingYear: { thresholdK: number; year: number | null }[];
  /** First year from CUMULATIVE_FROM (or the scenario's first year) with net CO2 emissions at or below zero; null if none. */
  netZeroCo2Year: number | null;
  /** Sum of the annual net CO2 emissions from `cumulativeFromYear` to the year before net zero (to the end when none), Gt CO2. */
  cumulativeCo2ToNetZeroGtco2: number | null;
  cumulativeFromYear: number | null;
  /** AR6 WG3 warming category code (C1-C8) and its name. */
  category: string;
  categoryName: string;
  /**
   * Share of CATEGORY_RESAMPLES bootstrap resamples of the members (seeded from the batch seed) that
   * give the same category, 0 to 1: below UNCERTAIN_AGREEMENT another draw of as many members may
   * well give a neighbouring category.
   */
  categoryAgreement: number;
  /** Agents the scenario does not give, with how they were filled, in a few words each. */
  filledBy: string;
}

/**
 * Assesses one scenario with a seeded ensemble, exactly as `warmcast ensemble` runs it (the same
 * central parameters, members and seed give the same members): the percentiles of the members'
 * own peak warming over 2001-2100 and of their 2100 warming, the median peak year, the share of
 * members whose peak exceeds each threshold, the median crossing year of each (20-year means,
 * IPCC AR6), net-zero CO2 year and the cumulative CO2 to it, and the AR6 WG3 category with its
 * agreement under a bootstrap of the members (categoryAgreement).
 *
 * @param pathway the scenario as a run uses it (spliced onto the history)
 * @param ids model and scenario names, and the filled-agents text (pathwayCoverage)
 * @param options ensemble settings shared by the batch
 * @returns the row and the ensemble (for per-scenario trajectories) with the notes of the run
 */
export async function assessScenario(
  pathway: Pathway,
  ids: { model: string; scenario: string; filledBy: string },
  options: AssessOptions,
): Promise<{ assessment: ScenarioAssessment; result: EnsembleResult; notes: string[] }> {
  const { input, notes } = ensembleInput(pathway, options.params, { baseline: options.baseline });
  const result = await runEnsemble(input, {
    members: options.members,
    seed: options.seed,
    thresholds: options.thresholds,
    baseline: options.baseline,
    keepMembers: true,
    ...(options.source ? { source: options.source } : {}),
  });
  const { peakK, peakYear, warming2100K } = memberFigures(result);
  const percentiles = (values: Float64Array) => {
    const out = new Float64Array(BATCH_PERCENTILES.length);
    quantilesInPlace(values, BATCH_PERCENTILES, out);
    return Object.fromEntries(BATCH_PERCENTILE_NAMES.map((name, j) => [name, out[j]])) as Record<BatchPercentile, number>;
  };
  const evidence = categoryEvidence(peakK, warming2100K);
  const category = warmingCategory(evidence);
  const agreement = categoryAgreement(peakK, warming2100K, category.code, CATEGORY_RESAMPLES, categoryBootstrapRandom(options.seed));
  // Years by the inverse empirical distribution (Hyndman & Fan 1996, definition 1), as the ensemble's own peak year.
  const sortedYears = Float64Array.from(peakYear).sort();
  const co2 = pathway.series.co2_gtco2;
  let netZero: ReturnType<typeof cumulativeToNetZero> | undefined;
  if (co2) {
    // Emissions are NaN before the scenario's own years (the history gives concentrations there).
    let first = 0;
    while (first < co2.length && Number.isNaN(co2[first])) first++;
    if (first < co2.length) netZero = cumulativeToNetZero(pathway.years.subarray(first), co2.subarray(first), Math.max(CUMULATIVE_FROM, pathway.years[first]));
  }
  const assessment: ScenarioAssessment = {
    model: ids.model,
    scenario: ids.scenario,
    peakWarmingK: percentiles(peakK),
    peakYearP50: sortedYears[Math.max(0, Math.ceil(0.5 * sortedYears.length) - 1)],
    warming2100K: warming2100K ? percentiles(warming2100K) : null,
    probPeakAbove: options.thresholds.map((thresholdK) => ({ thresholdK, probability: evidence.peakAbove(thresholdK) })),
    medianCrossingYear: result.crossings.map((c) => ({ thresholdK: c.thresholdK, year: c.medianYear })),
    netZeroCo2Year: netZero?.year ?? null,
    cumulativeCo2ToNetZeroGtco2: netZero ? netZero.total : null,
    cumulativeFromYear: netZero ? netZero.fromYear : null,
    category: category.code,
    categoryName: category.name,
    categoryAgreement: agreement,
    filledBy: ids.filledBy,
  };
  return { assessment, result, notes };
}

/**
 * Each member's peak warming over PEAK_YEARS (clipped to the run) and its year (the first on ties),
 * and its warming in 2100 when the run reaches it, from the members' yearly warming (year-major:
 * year k of member r at k * m + r).
 */
export function memberFigures(result: EnsembleResult): { peakK: Float64Array; peakYear: Float64Array; warming2100K?: Float64Array } {
  const warming = result.members?.warmingK;
  if (!warming) throw new Error('assessScenario needs the members\' yearly warming (keepMembers)');
  const m = result.memberCount;
  const first = result.years[0];
  const n = result.years.length;
  const k0 = Math.max(0, PEAK_YEARS[0] - first);
  const k1 = Math.min(n - 1, PEAK_YEARS[1] - first);
  const peakK = new Float64Array(m).fill(-Infinity);
  const peakYear = new Float64Array(m);
  for (let k = k0; k <= k1; k++) {
    const row = k * m;
    for (let r = 0; r < m; r++) {
      if (warming[row + r] > peakK[r]) {
        peakK[r] = warming[row + r];
        peakYear[r] = first + k;
      }
    }
  }
  const k2100 = 2100 - first;
  const warming2100K = k2100 >= 0 && k2100 < n ? warming.slice(k2100 * m, (k2100 + 1) * m) : undefined;
  return { peakK, peakYear, ...(warming2100K ? { warming2100K } : {}) };
}

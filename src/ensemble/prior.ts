import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { ConfigError } from '../errors.js';
import { assessedQuantile, LIKELY_Z, VERY_LIKELY_Z, type AssessedRange } from './assessed-range.js';
import { memberGenerators } from './member-generators.js';
import { TWO_BOX_KEYS, type MemberParameters } from './member-parameters.js';
import { normalQuantile } from './normal-quantile.js';

/**
 * One quantity of the prior: a distribution given by percentiles (the quantile function linear in
 * the normal score between them, as {@link assessedQuantile}), truncated to (lower, upper) by
 * redrawing, and the source of its numbers.
 */
export interface PriorQuantity {
  /** JSON key of the member parameter (member-parameters.ts). */
  key: string;
  /** 5 / 17 / 50 / 83 / 95 % points before truncation, in the parameter's unit. */
  range: AssessedRange;
  /** Values at or below this are redrawn (physical limit). */
  lower: number;
  /** Values at or above this are redrawn (default: none). */
  upper?: number;
  /** Where the numbers come from, and whether read or recalled. */
  source: string;
}

/**
 * Keys of the carbon-cycle and methane multipliers a member carries beside the two-box parameters
 * and the forcing scales (member-parameters.ts): iIRF100 r0 and rT of Millar et al. 2017's uptake
 * feedback, and the CH4 perturbation lifetime; 1 = the model's default.
 */
export const CYCLE_KEYS = ['irf100_scale', 'uptake_warming_scale', 'ch4_lifetime_scale'] as const;

/** A member's parameter columns, one Float64Array per key (as MemberParameters['values']). */
export type MemberColumns = MemberParameters['values'];

/**
 * Every key a calibrated member carries, in storage order: the two-box parameters, `scale_<agent>`
 * per agent, then {@link CYCLE_KEYS}.
 * @example memberParameterKeys(['co2'])[5] // 'scale_co2'
 */
export function memberParameterKeys(agents: readonly string[]): string[] {
  return [...TWO_BOX_KEYS, ...agents.map((a) => `scale_${a}`), ...CYCLE_KEYS];
}

/** A prior over every member parameter, in draw order. */
export interface EnsemblePrior {
  quantities: PriorQuantity[];
}

/** A range from its 5th, 50th and 95th percentiles, the 17th and 83rd on the same normal-score lines. */
export function rangeFrom3(p05: number, p50: number, p95: number): AssessedRange {
  const f = LIKELY_Z / VERY_LIKELY_Z;
  return { p05, p17: p50 - (p50 - p05) * f, p50, p83: p50 + (p95 - p50) * f, p95 };
}

/**
 * The prior of the two-box physics and of the carbon-cycle and methane multipliers. It is built
 * from the spread of complex models and process studies, never from the assessed ECS or TCR ranges
 * (AR6 already folded the observed warming into those: using them here and then weighting by the
 * record would count the record twice). ECS and TCR are outcomes of each member's lambda, heat
 * capacities, exchange, efficacy and CO2 forcing scale.
 *
 * Numbers are broad rounded envelopes of the CMIP two-layer fits; none was read from a table in
 * this session:
 * - lambda: CMIP5 fits of Geoffroy et al. 2013a/b span about 0.6-1.7 W m-2 K-1 (from memory);
 *   CMIP6 models reach lower values (ECS above 5 K; Zelinka et al. 2020, from memory). Prior
 *   5 / 50 / 95 % = 0.55 / 1.15 / 1.9, above 0.2.
 * - C: CMIP5 mean 7.3 W yr m-2 K-1 with models about 5-9 (Geoffroy et al. 2013a Table 3/4, from
 *   memory). Prior 5 / 7.5 / 10.5, above 2.
 * - C_d: CMIP5 mean 106, models about 50-180 (from memory); CMIP6 fits similar (Cummins et al.
 *   2020, three-layer, from memory). Prior 45 / 100 / 220, above 10.
 * - gamma: CMIP5 mean 0.73 W m-2 K-1, models about 0.5-1.0 (from memory). Prior 0.4 / 0.7 / 1.2,
 *   above 0.05.
 * - epsilon: CMIP5 mean 1.28 with models about 0.8-1.8 (Geoffroy et al. 2013b, from memory). Prior
 *   0.75 / 1.25 / 1.9, above 0.3.
 * - iIRF100 multiplier: Joos et al. 2013 multi-model 52.4 ± 12.3 yr (relative ± 0.235, from memory),
 *   widened to ± 0.3 (5-95 %) so the record, not the prior, narrows it. Above 0.2.
 * - rT multiplier (warming weakening the sinks; Millar et al. 2017 give one value, 4.165 yr/K):
 *   1 ± 0.8 (5-95 %), above 0 (no source for the spread: common practice, no source).
 * - CH4 lifetime multiplier: AR6 perturbation lifetime 11.8 ± 1.8 yr (the ± read as one standard
 *   deviation, from memory) -> 1 ± 0.25 (5-95 %), above 0.3. The historical constraints here do not
 *   involve it (history is concentration-driven); members carry it for emission-driven futures.
 */
export const PHYSICS_PRIOR: PriorQuantity[] = [
  { key: 'feedback_wm2k', range: rangeFrom3(0.55, 1.15, 1.9), lower: 0.2, source: 'CMIP5 (Geoffroy et al. 2013a/b) and CMIP6 two-layer fits, broad envelope (from memory)' },
  { key: 'upper_heat_capacity', range: rangeFrom3(5, 7.5, 10.5), lower: 2, source: 'CMIP5 mean 7.3 W yr m-2 K-1, Geoffroy et al. 2013a (from memory), broadened' },
  { key: 'deep_heat_capacity', range: rangeFrom3(45, 100, 220), lower: 10, source: 'CMIP5 mean 106 W yr m-2 K-1, Geoffroy et al. 2013a; CMIP6 fits (from memory), broadened' },
  { key: 'exchange_wm2k', range: rangeFrom3(0.4, 0.7, 1.2), lower: 0.05, source: 'CMIP5 mean 0.73 W m-2 K-1, Geoffroy et al. 2013a (from memory), broadened' },
  { key: 'deep_efficacy', range: rangeFrom3(0.75, 1.25, 1.9), lower: 0.3, source: 'CMIP5 mean 1.28, Geoffroy et al. 2013b (from memory), broadened' },
];

export const CYCLE_PRIOR: PriorQuantity[] = [
  { key: 'irf100_scale', range: rangeFrom3(0.7, 1, 1.3), lower: 0.2, source: 'Joos et al. 2013 multi-model iIRF100 52.4 ± 12.3 yr (from memory), widened to ± 30 %' },
  { key: 'uptake_warming_scale', range: rangeFrom3(0.2, 1, 1.8), lower: 0, source: 'Millar et al. 2017 rT as median; spread common practice, no source' },
  { key: 'ch4_lifetime_scale', range: rangeFrom3(0.75, 1, 1.25), lower: 0.3, source: 'AR6 CH4 perturbation lifetime 11.8 ± 1.8 yr (from memory), ± read as one standard deviation' },
];

/**
 * The multiplier range of one agent's forcing from the AR6 best, 5 % and 95 % series: the
 * least-squares multipliers through the origin that carry the best series onto the 5 % and onto the
 * 95 % series over all years, sum(p x best) / sum(best^2) (for most agents AR6 gives exactly a
 * multiple, e.g. 0.88 and 1.12 for CO2; for aerosol-radiation and solar the ratio drifts with the
 * year and the fit weights the years of large forcing). Widening by `widen` multiplies both
 * distances from 1 (used for the aerosol agents, whose AR6 assessment enters again as a
 * constraint: it is counted once, there).
 *
 * @param best AR6 best-estimate series, W m-2
 * @param p05 5th-percentile series, W m-2
 * @param p95 95th-percentile series, W m-2
 * @param widen factor on the spread (default 1)
 * @returns the 5 / 50 / 95 % multipliers (median 1)
 * @throws ConfigError when the best series is all zero
 * @example forcingScaleRange([1, 2], [0.88, 1.76], [1.12, 2.24]) // p05 0.88, p95 1.12
 */
export function forcingScaleRange(best: ArrayLike<number>, p05: ArrayLike<number>, p95: ArrayLike<number>, widen = 1): AssessedRange {
  let bb = 0;
  let lo = 0;
  let hi = 0;
  for (let k = 0; k < best.length; k++) {
    bb += best[k] * best[k];
    lo += p05[k] * best[k];
    hi += p95[k] * best[k];
  }
  if (!(bb > 0)) throw new ConfigError('forcing scale range: the best-estimate series is zero throughout', 'prior');
  // A negative agent (aerosol, land use) has its 5 % series beyond the best: take the ends in order.
  const a = lo / bb;
  const b = hi / bb;
  const low = 1 - widen * (1 - Math.min(a, b));
  const high = 1 + widen * (Math.max(a, b) - 1);
  return rangeFrom3(low, 1, high);
}

/**
 * The full prior: {@link PHYSICS_PRIOR}, a multiplier per forcing agent, then {@link CYCLE_PRIOR}.
 *
 * @param scales per agent, its multiplier range (see {@link forcingScaleRange}) and source
 * @returns the prior in draw order (keys as memberParameterKeys(agents))
 */
export function ensemblePrior(scales: { agent: string; range: AssessedRange; source: string }[]): EnsemblePrior {
  const forcing = scales.map(({ agent, range, source }) => ({ key: `scale_${agent}`, range, lower: 0, source }));
  const quantities = [...PHYSICS_PRIOR, ...forcing, ...CYCLE_PRIOR];
  const keys = quantities.map((q) => q.key);
  for (const k of [...TWO_BOX_KEYS, ...CYCLE_KEYS]) if (!keys.includes(k)) throw new ConfigError(`prior lacks ${k}`, 'prior');
  return { quantities };
}

/** Consecutive failed draws of one quantity after which the prior is declared unusable. */
const MAX_ATTEMPTS = 1000;

/**
 * Draws one member from the prior, each quantity in turn from the member's own generator (a 53-bit
 * uniform, its normal score by Wichura 1988, the quantile), redrawing that quantity alone while it
 * is outside its limits. The quantities are independent in the prior.
 *
 * @param rng the member's generator (advanced)
 * @param prior the prior
 * @param out receives one value per quantity, in prior order
 * @throws ConfigError when a quantity fails 1000 draws in a row (limits that leave no room)
 */
export function drawPriorMemberInto(rng: RandomGenerator, prior: EnsemblePrior, out: Float64Array): void {
  const qs = prior.quantities;
  for (let j = 0; j < qs.length; j++) {
    const q = qs[j];
    const upper = q.upper ?? Infinity;
    let v = NaN;
    for (let attempt = 0; attempt < MAX_ATTEMPTS; attempt++) {
      v = assessedQuantile(q.range, normalQuantile(uniformFloat64(rng)));
      if (v > q.lower && v < upper) break;
      v = NaN;
    }
    if (Number.isNaN(v)) throw new ConfigError(`prior ${q.key}: ${MAX_ATTEMPTS} draws in a row fell outside (${q.lower}, ${upper})`, 'prior');
    out[j] = v;
  }
}

/**
 * Draws members start .. start + count - 1 of the prior; member i depends only on (seed, i)
 * (memberGenerators), so any slice gives the same members as the whole.
 *
 * @param seed integer in [0, 2^32)
 * @param count members
 * @param prior the prior
 * @param start first member index (default 0)
 * @returns one Float64Array per parameter key
 * @example samplePrior(7, 1000, prior).feedback_wm2k.length // 1000
 */
export function samplePrior(seed: number, count: number, prior: EnsemblePrior, start = 0): MemberColumns {
  const qs = prior.quantities;
  const columns = Object.fromEntries(qs.map((q) => [q.key, new Float64Array(count)])) as MemberColumns;
  const row = new Float64Array(qs.length);
  const next = memberGenerators(seed, start);
  for (let i = 0; i < count; i++) {
    drawPriorMemberInto(next(), prior, row);
    for (let j = 0; j < qs.length; j++) columns[qs[j].key]![i] = row[j];
  }
  return columns;
}

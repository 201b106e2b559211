import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import type { RandomGenerator } from 'pure-rand/types/RandomGenerator';
import { ConfigError } from '../errors.js';
import { forcingOfDoubling, type Co2Formula } from '../forcing/co2.js';
import { assessedQuantile, type AssessedRange } from './assessed-range.js';
import type { TwoBoxParams } from '../climate/two-box.js';
import { exchangeForTcr, tcrSolver, type TcrSolver } from './exchange-for-tcr.js';
import { memberGenerators } from './member-generators.js';
import { normalQuantile } from './normal-quantile.js';
import type { EnsembleSampling } from './sampling.js';

/** The parameters each member carries, in storage order. */
export const MEMBER_PARAMETERS = ['ecsK', 'tcrK', 'forcing2xWm2', 'aerosolScale', 'feedbackWm2K', 'exchangeWm2K', 'irf100Scale'] as const;
export type MemberParameter = (typeof MEMBER_PARAMETERS)[number];

/** JSON keys of the member parameters (DESIGN.md parameter names where they exist). */
export const MEMBER_PARAMETER_KEYS: Record<MemberParameter, string> = {
  ecsK: 'ecs_k',
  tcrK: 'tcr_k',
  forcing2xWm2: 'forcing_2x_wm2',
  aerosolScale: 'aerosol_scale',
  feedbackWm2K: 'feedback_wm2k',
  exchangeWm2K: 'exchange_wm2k',
  irf100Scale: 'irf100_scale',
};

/** One member's sampled and derived parameters. */
export interface MemberDraw {
  /** ECS, K. */
  ecsK: number;
  /** TCR, K. */
  tcrK: number;
  /** Multiplier on the formula's CO2 forcing (F2x / the formula's own F2x). */
  forcing2xScale: number;
  /** ERF of doubled CO2, W m-2. */
  forcing2xWm2: number;
  /** Multiplier on the aerosol forcing. */
  aerosolScale: number;
  /** lambda = F2x / ECS, W m-2 K-1. */
  feedbackWm2K: number;
  /** gamma giving the member's TCR, W m-2 K-1. */
  exchangeWm2K: number;
  /**
   * Multiplier on the pre-industrial iIRF100 of the carbon cycle (Millar et al. 2017's r0); drawn
   * only for emission-driven ensembles, 1 (not sampled) otherwise.
   */
  irf100Scale: number;
}

/** Everything drawing a member needs, prepared once per ensemble. */
export interface MemberSampler {
  sampling: EnsembleSampling;
  /** The CO2 formula's own 2xCO2 ERF, W m-2. */
  formulaForcing2xWm2: number;
  /** TCR evaluations for solving gamma (scratch; one sampler per thread). */
  tcr: TcrSolver;
  /** sqrt(1 - rho^2) of the ECS-TCR copula. */
  independentWeight: number;
  /** Whether members draw the carbon-cycle multiplier (emission-driven ensembles only). */
  carbon: boolean;
  /** Scratch of drawMember: the member's ocean parameters, and a drawn value with its normal score. */
  ocean: Omit<TwoBoxParams, 'exchangeWm2K'>;
  drawn: Float64Array;
}

/** Consecutive unphysical draws of one quantity after which a member gives up: the sampling is then at fault. */
const MAX_ATTEMPTS = 1000;
/**
 * TCR draws tried for one ECS before the member is drawn anew. Only an ECS deep in its low tail
 * leaves so little room: below about 0.7 K for AR6_SAMPLING, which the linear tail of the assessed
 * range below its 5th percentile gives a probability of about 2.9e-4 (z = -3.44). Each such member
 * adds about 103 discarded draws, so the redraw count of a small ensemble jumps by about 100 when
 * one member lands there (measured: 8 whole-member redraws in 20,000 members, 4e-4).
 */
const TCR_ATTEMPTS = 100;

/**
 * Prepares the sampler for an ensemble (validated sampling assumed; see validateSampling).
 * @param carbon true for an emission-driven ensemble: members also draw the carbon-cycle multiplier
 * @example drawMember(rng, memberSampler(AR6_SAMPLING, 'ar6'), draw)
 */
export function memberSampler(sampling: EnsembleSampling, co2Formula: Co2Formula, carbon = false): MemberSampler {
  return {
    carbon,
    sampling,
    formulaForcing2xWm2: forcingOfDoubling(co2Formula),
    tcr: tcrSolver(co2Formula),
    independentWeight: Math.sqrt(1 - sampling.ecsTcrCorrelation ** 2),
    ocean: { upperHeatCapacity: sampling.upperHeatCapacity, deepHeatCapacity: sampling.deepHeatCapacity, deepEfficacy: sampling.deepEfficacy, feedbackWm2K: NaN },
    drawn: new Float64Array(2),
  };
}

/**
 * Draws one member's parameters from its own generator, each quantity in turn: ECS, the 2xCO2
 * forcing multiplier and the aerosol multiplier from their assessed ranges, then TCR given ECS
 * through the copula (its normal score rho z_ECS + sqrt(1 - rho^2) z_own); lambda = F2x / ECS and
 * gamma is solved for the TCR. Each draw is a 53-bit uniform (pure-rand's uniformFloat64) turned
 * into a normal score (Wichura 1988) and mapped through its range.
 *
 * A draw that is unphysical is discarded and that quantity alone is drawn again from the same
 * stream: ECS or the forcing multiplier not positive, a negative aerosol multiplier, or a TCR that
 * is not positive, not below ECS, or out of reach of any gamma in (0, 50] W m-2 K-1 for this
 * member's lambda. Redrawing only the TCR (rather than the whole member) keeps the ECS, forcing and
 * aerosol distributions exactly as assessed and truncates TCR given ECS at the model's physical
 * limit. Only when 100 TCR draws in a row fail (an ECS deep in its low tail) is the whole member
 * drawn anew. For emission-driven ensembles (`sampler.carbon`) the multiplier on the carbon cycle's
 * pre-industrial iIRF100 is drawn after all of these (redrawn alone while not positive).
 *
 * @param rng the member's generator (advanced in place)
 * @param sampler from {@link memberSampler}
 * @param out receives the parameters
 * @returns the number of draws discarded
 * @throws ConfigError when 1000 draws of one quantity, or 1000 members in a row, are unphysical (the
 *   sampling leaves almost no room, e.g. a TCR range entirely above the ECS range)
 */
export function drawMember(rng: RandomGenerator, sampler: MemberSampler, out: MemberDraw): number {
  const s = sampler.sampling;
  const ocean = sampler.ocean;
  const drawn = sampler.drawn;
  let discarded = 0;
  for (let restart = 0; restart < MAX_ATTEMPTS; restart++) {
    // Each quantity is drawn until physical; the comparisons are written so that NaN and
    // infinities fail every test.
    discarded += drawUntil(rng, s.ecsK, POSITIVE, drawn);
    const ecsK = drawn[0];
    const zEcs = drawn[1];
    discarded += drawUntil(rng, s.forcing2xScale, POSITIVE, drawn);
    const forcing2xScale = drawn[0];
    discarded += drawUntil(rng, s.aerosolScale, NON_NEGATIVE, drawn);
    const aerosolScale = drawn[0];
    if (Number.isNaN(ecsK) || Number.isNaN(forcing2xScale) || Number.isNaN(aerosolScale)) break;
    const forcing2xWm2 = sampler.formulaForcing2xWm2 * forcing2xScale;
    const feedbackWm2K = forcing2xWm2 / ecsK;
    ocean.feedbackWm2K = feedbackWm2K;
    let tcrK = NaN;
    let exchangeWm2K = NaN;
    for (let attempt = 0; attempt < TCR_ATTEMPTS; attempt++) {
      const v = assessedQuantile(s.tcrK, s.ecsTcrCorrelation * zEcs + sampler.independentWeight * normalQuantile(uniformFloat64(rng)));
      if (v > 0 && v < ecsK && (exchangeWm2K = exchangeForTcr(sampler.tcr, ocean, forcing2xWm2, v)) > 0) {
        tcrK = v;
        break;
      }
      discarded++;
    }
    if (Number.isNaN(tcrK)) {
      // An ECS so far in its low tail that almost no TCR below it is reachable: draw the member
      // anew, discarding its ECS, forcing and aerosol draws too.
      discarded += 3;
      continue;
    }
    out.ecsK = ecsK;
    out.tcrK = tcrK;
    out.forcing2xScale = forcing2xScale;
    out.forcing2xWm2 = forcing2xWm2;
    out.aerosolScale = aerosolScale;
    out.feedbackWm2K = feedbackWm2K;
    out.exchangeWm2K = exchangeWm2K;
    // Drawn last, and only for emission-driven ensembles, so that the climate draws of every member
    // (and everything a concentration-driven ensemble computes) stay exactly as they were.
    out.irf100Scale = 1;
    if (sampler.carbon) {
      discarded += drawUntil(rng, s.irf100Scale, POSITIVE, drawn);
      out.irf100Scale = drawn[0];
      if (Number.isNaN(out.irf100Scale)) break;
    }
    return discarded;
  }
  throw new ConfigError(
    `the ensemble sampling gave ${MAX_ATTEMPTS} unphysical draws in a row; its ranges must leave room for a positive ECS and forcing and a TCR below ECS`,
    'sampling',
  );
}

/** What drawUntil accepts: values above zero, or from zero on (both finite). */
const POSITIVE = 0;
const NON_NEGATIVE = 1;

/**
 * Draws a quantity of `range` (a 53-bit uniform, its normal score, the assessed quantile) until it
 * is physical, at most MAX_ATTEMPTS times, into out[0] (NaN if never), with its normal score in
 * out[1].
 * @returns the draws discarded
 */
function drawUntil(rng: RandomGenerator, range: AssessedRange, accept: typeof POSITIVE | typeof NON_NEGATIVE, out: Float64Array): number {
  for (let attempt = 0; attempt < MAX_ATTEMPTS; attempt++) {
    const z = normalQuantile(uniformFloat64(rng));
    const v = assessedQuantile(range, z);
    if ((accept === POSITIVE ? v > 0 : v >= 0) && v < Infinity) {
      out[0] = v;
      out[1] = z;
      return attempt;
    }
  }
  out[0] = NaN;
  return MAX_ATTEMPTS;
}

/** Sampled parameters of consecutive members, one Float64Array per parameter. */
export interface SampledMembers {
  parameters: Record<MemberParameter, Float64Array>;
  /** Unphysical draws discarded in total. */
  redraws: number;
}

/**
 * Draws the parameters of members start .. start + count - 1 without running them (for checking the
 * sampling, and for reports of the parameter spread).
 *
 * @param seed integer in [0, 2^32)
 * @param count number of members
 * @param sampling validated sampling
 * @param co2Formula formula whose 2xCO2 forcing the multiplier scales (default ar6)
 * @param start first member index (default 0)
 * @param carbon draw the carbon-cycle multiplier too, as emission-driven ensembles do (default false)
 * @example sampleMembers(7, 1000, AR6_SAMPLING).parameters.ecsK // 1000 ECS values, median near 3 K
 */
export function sampleMembers(seed: number, count: number, sampling: EnsembleSampling, co2Formula: Co2Formula = 'ar6', start = 0, carbon = false): SampledMembers {
  const sampler = memberSampler(sampling, co2Formula, carbon);
  const next = memberGenerators(seed, start);
  const parameters = emptyParameters(count);
  const draw = emptyDraw();
  let redraws = 0;
  for (let i = 0; i < count; i++) {
    redraws += drawMember(next(), sampler, draw);
    storeDraw(parameters, i, draw);
  }
  return { parameters, redraws };
}

/** A MemberDraw to be filled by drawMember. */
export function emptyDraw(): MemberDraw {
  return { ecsK: NaN, tcrK: NaN, forcing2xScale: NaN, forcing2xWm2: NaN, aerosolScale: NaN, feedbackWm2K: NaN, exchangeWm2K: NaN, irf100Scale: NaN };
}

/**
 * One Float64Array of `count` per member parameter.
 * @param buffer allocates the bytes of each (default a plain ArrayBuffer; a SharedArrayBuffer for threads)
 */
export function emptyParameters(count: number, buffer: (bytes: number) => ArrayBufferLike = (bytes) => new ArrayBuffer(bytes)): Record<MemberParameter, Float64Array> {
  return Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new Float64Array(buffer(count * 8))])) as Record<MemberParameter, Float64Array>;
}

/** Writes a draw into row `i` of the parameter arrays. */
export function storeDraw(parameters: Record<MemberParameter, Float64Array>, i: number, draw: MemberDraw): void {
  for (const name of MEMBER_PARAMETERS) parameters[name][i] = draw[name];
}

import type { ForcingAgent } from '../forcing/agents.js';

/**
 * The two-box parameters every ensemble member carries, by their DESIGN.md keys: feedback lambda
 * (W m-2 K-1), upper and deep heat capacities C and C_d (W yr m-2 K-1), exchange gamma
 * (W m-2 K-1) and deep-ocean efficacy epsilon (dimensionless).
 */
export const TWO_BOX_KEYS = ['feedback_wm2k', 'upper_heat_capacity', 'deep_heat_capacity', 'exchange_wm2k', 'deep_efficacy'] as const;
export type TwoBoxKey = (typeof TWO_BOX_KEYS)[number];

/** Key of the multiplier on one forcing agent's series, `scale_<agent>` (COORDINATION.md contract). */
export type ForcingScaleKey = `scale_${ForcingAgent}`;

/**
 * The parameters of a block of ensemble members, one Float64Array per quantity with member r at
 * index r: the contract between whatever draws members (the calibrated set, a prior, the AR6
 * sampling) and the kernel that runs them.
 *
 * - The five {@link TWO_BOX_KEYS} are always present; the kernel never assumes fixed heat capacities.
 * - `scale_<agent>` multiplies that agent's forcing series (W m-2) for each member; an agent without
 *   a scale key counts with multiplier 1 for every member. A member's forcing in year k is
 *   sum over agents of scale_<agent>[r] x series_<agent>[k].
 * - Anything else is carried through unchanged: parameters other components read (for example
 *   `irf100_scale` for the carbon cycle, `ch4_lifetime_scale`) and diagnostics the summary reports
 *   (`ecs_k`, `tcr_k`, ...). Keys are DESIGN.md-style snake_case names with units in the name.
 *
 * @example
 * const block: MemberParameters = { count: 2, values: {
 *   feedback_wm2k: Float64Array.of(1.3, 1.1), upper_heat_capacity: Float64Array.of(8, 7),
 *   deep_heat_capacity: Float64Array.of(100, 110), exchange_wm2k: Float64Array.of(0.7, 0.8),
 *   deep_efficacy: Float64Array.of(1.2, 1.3), scale_aerosol_aci: Float64Array.of(0.9, 1.2) } };
 */
export interface MemberParameters {
  /** Members in the block. */
  count: number;
  /** One value per member, by key (see above). */
  values: Record<TwoBoxKey, Float64Array> & Partial<Record<string, Float64Array>>;
}

/**
 * Where an ensemble's members come from: a seeded, deterministic draw of members by index, so that
 * member i depends only on (seed, i), whichever shard or thread asks for it (DESIGN.md conventions).
 * The calibrated parameter set, a prior and the AR6-range sampling are each one MemberSource.
 */
export interface MemberSource {
  /**
   * What the members are drawn from and how, one line; recorded in shard files, and two shards
   * merge only when it is identical (so it names the data file and its SHA-256 where there is one).
   */
  scheme: string;
  /** How the members were made, one sentence each, for an output's provenance. */
  notes: string[];
  /**
   * Members [from, to) of the ensemble with this seed.
   * @param seed integer in [0, 2^32)
   * @param from first member index
   * @param to end member index, exclusive
   * @returns the members' parameters, and how many unphysical draws were discarded on the way
   */
  draw(seed: number, from: number, to: number): { parameters: MemberParameters; redraws: number };
}

/**
 * The key of an agent's forcing multiplier.
 * @example forcingScaleKey('aerosol_aci') // 'scale_aerosol_aci'
 */
export function forcingScaleKey(agent: ForcingAgent): ForcingScaleKey {
  return `scale_${agent}`;
}

/**
 * An empty block of `count` members with the given keys (every value NaN until filled).
 * @param keys the keys beyond the two-box ones
 * @example emptyMemberParameters(3, ['scale_co2']).values.scale_co2.length // 3
 */
export function emptyMemberParameters(count: number, keys: readonly string[] = []): MemberParameters {
  const values: Record<string, Float64Array> = {};
  for (const key of [...TWO_BOX_KEYS, ...keys]) values[key] = new Float64Array(count).fill(NaN);
  return { count, values: values as MemberParameters['values'] };
}

/**
 * Members [from, to) of a block, sharing its memory.
 * @example sliceMemberParameters(block, 1, 2).count // 1
 */
export function sliceMemberParameters(block: MemberParameters, from: number, to: number): MemberParameters {
  const values: Record<string, Float64Array> = {};
  for (const [key, v] of Object.entries(block.values)) if (v) values[key] = v.subarray(from, to);
  return { count: to - from, values: values as MemberParameters['values'] };
}

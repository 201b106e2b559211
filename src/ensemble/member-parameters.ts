import { FORCING_AGENTS, type ForcingAgent } from '../forcing/agents.js';

/**
 * What one ensemble member varies: the two-box physics, a multiplier per forcing agent, the carbon
 * cycle and the methane lifetime. This is the contract between the calibrated parameter set
 * (prior.ts, constrain.ts, pathways/calibrated-members.json) and the kernel that runs members: the
 * kernel takes the two-box parameters as they are (it never assumes fixed heat capacities) and the
 * member's forcing sum_a scale_a x F_a(t) ({@link memberForcingInto}).
 */
export interface MemberParameters {
  /** Climate feedback parameter lambda, W m-2 K-1 (positive = stabilising). */
  feedbackWm2K: number;
  /** Upper (mixed layer + atmosphere) heat capacity C, W yr m-2 K-1. */
  upperHeatCapacity: number;
  /** Deep-ocean heat capacity C_d, W yr m-2 K-1. */
  deepHeatCapacity: number;
  /** Heat exchange coefficient gamma between the boxes, W m-2 K-1. */
  exchangeWm2K: number;
  /** Deep-ocean heat-uptake efficacy epsilon, dimensionless. */
  deepEfficacy: number;
  /** Multiplier on each agent's ERF series (1 = the series as computed or prescribed). */
  forcingScale: Record<ForcingAgent, number>;
  /** Multiplier on the carbon cycle's pre-industrial iIRF100 r0 (Millar et al. 2017; 1 = the default). */
  irf100Scale: number;
  /** Multiplier on the warming sensitivity rT of iIRF100 (Millar et al. 2017; 1 = the default). */
  uptakeWarmingScale: number;
  /** Multiplier on the CH4 perturbation lifetime (1 = the default lifetime). */
  ch4LifetimeScale: number;
}

/** JSON keys of the two-box parameters (DESIGN.md names), in storage order. */
export const CLIMATE_KEYS = ['feedback_wm2k', 'upper_heat_capacity', 'deep_heat_capacity', 'exchange_wm2k', 'deep_efficacy'] as const;
/** JSON keys of the carbon-cycle and methane parameters, in storage order. */
export const CYCLE_KEYS = ['irf100_scale', 'uptake_warming_scale', 'ch4_lifetime_scale'] as const;

/** JSON key of an agent's forcing multiplier: `scale_<agent>`. */
export function scaleKey(agent: string): string {
  return `scale_${agent}`;
}

/**
 * Every JSON key a member carries, in storage order: the two-box parameters, `scale_<agent>` for
 * each of {@link FORCING_AGENTS}, then the cycle parameters.
 * @example memberParameterKeys()[0] // 'feedback_wm2k'
 */
export function memberParameterKeys(agents: readonly string[] = FORCING_AGENTS): string[] {
  return [...CLIMATE_KEYS, ...agents.map(scaleKey), ...CYCLE_KEYS];
}

/** Many members' parameters, one Float64Array per JSON key (member i at index i). */
export type MemberColumns = Record<string, Float64Array>;

/**
 * Member i of a column set as a {@link MemberParameters}.
 * @throws Error when a key is missing (a column set built for other agents)
 */
export function memberAt(columns: MemberColumns, i: number, agents: readonly ForcingAgent[] = FORCING_AGENTS): MemberParameters {
  const get = (key: string) => {
    const c = columns[key];
    if (!c) throw new Error(`member parameters lack ${key}`);
    return c[i];
  };
  return {
    feedbackWm2K: get('feedback_wm2k'),
    upperHeatCapacity: get('upper_heat_capacity'),
    deepHeatCapacity: get('deep_heat_capacity'),
    exchangeWm2K: get('exchange_wm2k'),
    deepEfficacy: get('deep_efficacy'),
    forcingScale: Object.fromEntries(agents.map((a) => [a, get(scaleKey(a))])) as Record<ForcingAgent, number>,
    irf100Scale: get('irf100_scale'),
    uptakeWarmingScale: get('uptake_warming_scale'),
    ch4LifetimeScale: get('ch4_lifetime_scale'),
  };
}

/**
 * A member's total forcing: sum over agents of scale_a x F_a(t), W m-2, written into `out`.
 *
 * @param byAgent ERF per agent, W m-2, one value per year
 * @param scales multiplier per agent (an agent missing from `scales` counts with 1)
 * @param out receives the total, same length as the series
 * @example memberForcingInto({ co2: [0, 2] }, { co2: 1.1 }, out) // out = [0, 2.2]
 */
export function memberForcingInto(byAgent: Partial<Record<string, ArrayLike<number>>>, scales: Partial<Record<string, number>>, out: Float64Array): Float64Array {
  out.fill(0);
  for (const [agent, series] of Object.entries(byAgent)) {
    if (!series) continue;
    const s = scales[agent] ?? 1;
    for (let k = 0; k < out.length; k++) out[k] += s * series[k];
  }
  return out;
}

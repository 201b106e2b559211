import { energyBalance } from '../climate/energy-balance.js';
import type { TwoBoxParams } from '../climate/two-box.js';
import { ConfigError } from '../errors.js';
import { rebase } from './warming-levels.js';

/** Warming by forcing agent, K above the baseline, one series per agent, adding up to the total. */
export interface Attribution {
  /** Consecutive integer years. */
  years: Float64Array;
  /** Agents in the order given. */
  agents: string[];
  /** Warming due to each agent's ERF, K above its own baseline mean, keyed by agent. */
  warmingK: Record<string, Float64Array>;
  /** Sum over agents, K: the run's warming (the energy balance is linear in forcing). */
  totalK: Float64Array;
}

/**
 * Warming by forcing agent. The two-box energy balance is linear in forcing and starts from rest, so
 * running it on each agent's ERF alone and adding the results gives the warming of the whole run
 * exactly; each part is rebased to the same baseline as the total, so the parts also add up to
 * `warming_k`. The convention for what is not linear is the ERF-based one of IPCC AR6 WG1 chapter 7
 * (the attribution of historical warming to forcing agents, section 7.3.5 and Figure 7.8; SPM.2c):
 * each agent contributes its ERF as realised in the full run. So the carbon-climate feedback's extra
 * CO2 counts as CO2's warming, and the logarithmic aerosol-cloud forcing is the aerosol-cloud agent's.
 *
 * @param params the run's two-box parameters
 * @param years consecutive integer years of the run
 * @param forcingByAgent each agent's ERF, W m-2, one value per year, in the order to report
 * @param baseline inclusive baseline years (default 1850-1900)
 * @returns warming by agent and their sum
 * @throws ConfigError when the baseline lies outside the years or a series has the wrong length
 * @example
 * const a = attributeWarming(params, years, { co2: co2Wm2, aerosol_ari: ariWm2 });
 * a.warmingK.co2[a.years.indexOf(2019)] // CO2's share of 2019 warming, K
 */
export function attributeWarming(
  params: TwoBoxParams,
  years: Float64Array,
  forcingByAgent: Record<string, ArrayLike<number>>,
  baseline: readonly [number, number] = [1850, 1900],
): Attribution {
  const n = years.length;
  const agents = Object.keys(forcingByAgent);
  const warmingK: Record<string, Float64Array> = {};
  const totalK = new Float64Array(n);
  for (const agent of agents) {
    const f = forcingByAgent[agent];
    if (f.length !== n) throw new ConfigError(`forcing of ${agent} has ${f.length} values for ${n} years`, 'forcing');
    const t = rebase(years, energyBalance(params, Float64Array.from(f), 'exact').surfaceK, baseline, agent);
    for (let i = 0; i < n; i++) totalK[i] += t[i];
    warmingK[agent] = t;
  }
  return { years, agents, warmingK, totalK };
}

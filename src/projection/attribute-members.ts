import { energyBalance } from '../climate/energy-balance.js';
import { ar6Members } from '../ensemble/ar6-members.js';
import { forcingScaleKey, type MemberSource } from '../ensemble/member-parameters.js';
import { runMembers } from '../ensemble/run-members.js';
import { AR6_SAMPLING } from '../ensemble/sampling.js';
import { FORCING_AGENTS, ghgForcingFunction, type ForcingAgent } from '../forcing/agents.js';
import { EMITTED_SPECIES, forcingBySpecies, type OzoneShares } from '../forcing/emitted-species.js';
import type { ClimateParams } from '../climate/params.js';
import { rebase } from '../metrics/warming-levels.js';
import { quantileSorted } from '../numerics/quantiles.js';
import type { Pathway } from '../pathway.js';
import { ensembleInput } from './ensemble-input.js';

/** 5 %, 50 % and 95 % of the members' warming from one agent or species, K, one value per year. */
export interface PartRange {
  p05: Float64Array;
  p50: Float64Array;
  p95: Float64Array;
}

/** Percentiles of each agent's warming across members, per year. */
export interface AttributionRanges {
  years: Float64Array;
  /** Per agent: 5 %, 50 % and 95 % of the members' warming from that agent, K, one value per year. */
  byAgent: Record<string, PartRange>;
  /** Per emitted species (with `ozoneShares`): the same for the species split (forcingBySpecies). */
  bySpecies?: Record<string, PartRange>;
  /** The same for each member's whole warming (the sum of its parts). */
  total: PartRange;
  members: number;
  /** Where the members came from (MemberSource.scheme, e.g. `calibrated set ...`). */
  scheme: string;
  notes: string[];
}

/**
 * Warming by agent across an ensemble: each member runs the pathway (emission-driven members with
 * their own carbon cycle, runMembers), then its two-box model is run on each agent's ERF as that
 * member sees it (its scale_<agent> times the agent's series; its own CO2, CH4 and N2O forcing when
 * it runs a carbon cycle), rebased to the baseline; per agent and year the 5/50/95 % of the members.
 * With `ozoneShares` the member's agents are also regrouped by emitted species (forcingBySpecies,
 * with its own ozone scale) and ranged the same way.
 * For each member the parts add up to its warming (linearity), but the percentiles of the parts do
 * not add up to the percentiles of the total.
 *
 * @param pathway annual pathway (spliced onto history)
 * @param options central parameters (for the CH4 and N2O members share), members, seed, source,
 *   baseline, and the run's ozone shares for the species split
 */
export function attributeMembers(
  pathway: Pathway,
  options: { params: ClimateParams; members: number; seed: number; source?: MemberSource; baseline?: readonly [number, number]; ozoneShares?: OzoneShares },
): AttributionRanges {
  const baseline = options.baseline ?? ([1850, 1900] as const);
  const { input, notes } = ensembleInput(pathway, options.params);
  const years = input.years;
  const n = years.length;
  const source = options.source ?? ar6Members(AR6_SAMPLING, options.params.co2Formula, input.carbon !== undefined);
  const { parameters } = source.draw(options.seed, 0, options.members);
  const m = parameters.count;
  const v = parameters.values;
  const co2 = input.carbon ? new Float64Array(m * n) : undefined;
  if (input.carbon) runMembers({ co2Formula: options.params.co2Formula, forcing: input.forcing.byAgent, carbon: input.carbon }, parameters, undefined, co2);
  const ghg = ghgForcingFunction({ co2Formula: options.params.co2Formula });
  const shares = options.ozoneShares;
  // Member-major per part: warming of member r in year k at r * n + k.
  const partsOf = (keys: readonly string[]) => Object.fromEntries(keys.map((a) => [a, new Float64Array(m * n)])) as Record<string, Float64Array>;
  const agentParts = partsOf(FORCING_AGENTS);
  const speciesParts = shares ? partsOf(EMITTED_SPECIES) : undefined;
  const own = (agent: ForcingAgent) => co2 !== undefined && input.carbon !== undefined && (agent === 'co2' || agent === 'ch4' || agent === 'n2o');
  for (let r = 0; r < m; r++) {
    const twoBox = { feedbackWm2K: v.feedback_wm2k[r], upperHeatCapacity: v.upper_heat_capacity[r], deepHeatCapacity: v.deep_heat_capacity[r], exchangeWm2K: v.exchange_wm2k[r], deepEfficacy: v.deep_efficacy[r] };
    const scaleOf = (agent: ForcingAgent) => v[forcingScaleKey(agent)]?.[r] ?? 1;
    const forcing = {} as Record<ForcingAgent, Float64Array>;
    for (const agent of FORCING_AGENTS) {
      const scale = scaleOf(agent);
      const f = new Float64Array(n);
      for (let k = 0; k < n; k++) {
        f[k] = own(agent) ? scale * ghg(co2![k * m + r], input.carbon!.ch4Ppb[k], input.carbon!.n2oPpb[k])[agent as 'co2' | 'ch4' | 'n2o'] : scale * input.forcing.byAgent[agent][k];
      }
      forcing[agent] = f;
      agentParts[agent].set(rebase(years, energyBalance(twoBox, f).surfaceK, baseline, agent), r * n);
    }
    if (!speciesParts) continue;
    const species = forcingBySpecies(forcing, shares!, scaleOf('ozone'));
    for (const s of EMITTED_SPECIES) speciesParts[s].set(rebase(years, energyBalance(twoBox, species[s]).surfaceK, baseline, s), r * n);
  }
  // Each member's warming is the sum of its agents' (linearity).
  const total = new Float64Array(m * n);
  for (const values of Object.values(agentParts)) for (let i = 0; i < m * n; i++) total[i] += values[i];
  return {
    years,
    byAgent: partRanges(agentParts, m, n),
    total: partRanges({ total }, m, n).total,
    ...(speciesParts ? { bySpecies: partRanges(speciesParts, m, n) } : {}),
    members: m,
    scheme: source.scheme,
    notes: [...notes, `ranges: 5-95 % of ${m} members (seed ${options.seed}); ${source.notes.join(' ')}`.trim()],
  };
}

/** Per part and year, the 5/50/95 % of the members (member-major arrays of m x n). */
function partRanges(parts: Record<string, Float64Array>, m: number, n: number): Record<string, PartRange> {
  const out: Record<string, PartRange> = {};
  const column = new Float64Array(m);
  for (const [key, values] of Object.entries(parts)) {
    const p05 = new Float64Array(n);
    const p50 = new Float64Array(n);
    const p95 = new Float64Array(n);
    for (let k = 0; k < n; k++) {
      for (let r = 0; r < m; r++) column[r] = values[r * n + k];
      column.sort();
      p05[k] = quantileSorted(column, 0.05);
      p50[k] = quantileSorted(column, 0.5);
      p95[k] = quantileSorted(column, 0.95);
    }
    out[key] = { p05, p50, p95 };
  }
  return out;
}

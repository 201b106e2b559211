import { FORCING_AGENTS, type ForcingAgent } from '../forcing/agents.js';
import type { EmissionForcing } from '../forcing/emission-forcing.js';
import { LUMPED_PARTS } from '../forcing/lumped-forcing.js';
import { GASES, type Gas, type Pathway } from '../pathway.js';

/**
 * What `warmcast check` says about each forcing agent after the file's first year: whether the file
 * gives it (as emissions, concentrations or forcing), the history gives it (and how it is carried on),
 * or an assumption fills it.
 *
 * @param annual the file's own annual pathway (before splicing)
 * @param pathway the pathway a run uses (after splicing, when spliced)
 * @param emissionForcing what resolveEmissionForcing made of the file
 * @returns one line per agent, indented under a heading
 * @example describeAgentSources(annual, pathway, ef)[1] // '  co2: the file (emissions); history concentrations to 2024'
 */
export function describeAgentSources(annual: Pathway, pathway: Pathway, emissionForcing: EmissionForcing): string[] {
  const s = annual.series as Record<string, Float64Array | undefined>;
  const spliced = pathway.provenance.spliceYear !== undefined;
  const last = pathway.provenance.historyLastYear;
  const history = spliced ? `the history to ${last}` : '';
  const lines = [`forcing agents${spliced ? ` after ${last}` : ''}:`];
  for (const agent of FORCING_AGENTS as readonly ForcingAgent[]) {
    lines.push(`  ${agent}: ${agentSource(agent, s, emissionForcing, spliced, history, last)}`);
  }
  return lines;
}

function agentSource(agent: ForcingAgent, s: Record<string, Float64Array | undefined>, ef: EmissionForcing, spliced: boolean, history: string, last?: number): string {
  if (agent in GASES) {
    const { concentration, emission } = GASES[agent as Gas];
    if (s[emission]) return `the file (emissions${spliced ? `; ${history} as concentrations, emissions diagnosed` : ''})`;
    if (s[concentration]) return 'the file (concentrations)';
    return spliced ? `${history}, then held at the ${last} concentration (not in the file)` : 'not given: held at its 1750 concentration';
  }
  const computed = ef.sources[agent];
  if (computed) return computed;
  if (s[`${agent}_wm2`]) return 'the file (forcing)';
  for (const [lumped, parts] of Object.entries(LUMPED_PARTS)) {
    if (s[lumped] && (parts as readonly string[]).includes(`${agent}_wm2`)) return `the file (forcing, its share of ${lumped})`;
  }
  if (!spliced) return 'not given: zero';
  if (agent === 'solar' || agent === 'volcanic') return `${history}, then continued as the splice note says (not in the file)`;
  return `${history}, then held at the ${last} value (not in the file)`;
}

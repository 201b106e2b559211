import { FORCING_AGENTS } from '../forcing/agents.js';
import { describeAgentSources } from './describe-agent-sources.js';
import type { ReadPathwayResult } from './load-pathway.js';

/**
 * The pathway columns that drive each forcing agent when a file gives them (emissions,
 * concentrations or the agent's forcing in W m-2). `*_kt` and `*_ppt` stand for any halogenated gas.
 * Agents of the current agent list that are missing here count as given only by their own
 * `<agent>_wm2` column.
 */
const DRIVERS: Readonly<Record<string, readonly string[]>> = {
  co2: ['co2_gtco2', 'co2_ppm'],
  ch4: ['ch4_mt', 'ch4_ppb'],
  n2o: ['n2o_mt', 'n2o_ppb'],
  other_ghg: ['fgas_mtco2e', '*_kt', '*_ppt', 'other_ghg_wm2'],
  other: ['other_wm2'],
  ozone: ['nox_mt', 'co_mt', 'nmvoc_mt', 'ch4_mt', 'ozone_wm2'],
  strat_h2o: ['ch4_mt', 'strat_h2o_wm2'],
  aerosol: ['so2_mt', 'bc_mt', 'oc_mt', 'nh3_mt', 'aerosol_wm2'],
  aerosol_ari: ['so2_mt', 'bc_mt', 'oc_mt', 'nh3_mt', 'aerosol_ari_wm2', 'aerosol_wm2'],
  aerosol_aci: ['so2_mt', 'bc_mt', 'oc_mt', 'aerosol_aci_wm2', 'aerosol_wm2'],
  bc_snow: ['bc_mt', 'bc_snow_wm2'],
};

/** Which forcing agents a pathway's own values give, and how the run fills the others. */
export interface PathwayCoverage {
  /** Agents the file (or table scenario) gives, each with the columns that drive it. */
  given: { agent: string; columns: string[] }[];
  /** Agents it does not give, each with the notes that say how the run fills them (history, held, assumption). */
  filled: { agent: string; how: string[] }[];
}

/**
 * Which forcing agents (FORCING_AGENTS) a pathway gives and which are filled, for `warmcast check`
 * and the `filled_by` column of a batch: an agent is given when the file's own values (before the
 * splice) hold one of its driving columns; otherwise the pathway's provenance notes that name one of
 * those columns or the agent tell how it is filled (taken from the history and held, a stated
 * assumption).
 *
 * @param read a pathway as read (readPathway or scenarioPathway)
 * @param readerNotes notes of the reader itself (a table's skipped rows), not searched
 * @example pathwayCoverage(read).filled // [{ agent: 'aerosol', how: ['aerosol_wm2, other_wm2 not in file: taken from history to 2024, then held at the 2024 value'] }, ...]
 */
export function pathwayCoverage(read: ReadPathwayResult, readerNotes: readonly string[] = []): PathwayCoverage {
  // The reader's own account of each agent (file, history, or an assumption), when it gives one.
  if (read.emissionForcing) {
    const given: PathwayCoverage['given'] = [];
    const filled: PathwayCoverage['filled'] = [];
    const own = Object.keys(read.annual.series).filter((c) => read.annual.series[c as keyof typeof read.annual.series] !== undefined);
    for (const line of describeAgentSources(read.annual, read.pathway, read.emissionForcing).slice(1)) {
      const m = /^\s*([a-z0-9_]+): (.*)$/.exec(line);
      if (!m) continue;
      const [, agent, source] = m;
      // Given: from the file's own columns, or computed from them (the run's CH4, scaled with BC emissions).
      // Filled: taken from the history and held, or computed from assumed emissions (an --absent-emissions rule).
      const assumed = /\bassumed\b/.test(source) && !/\bthe file's halogenated\b/.test(source);
      if (!assumed && !/\(not in the file\)/.test(source) && /^the file\b|\bthe file's\b|\bthe run's\b|\bscaled with\b/.test(source)) {
        const drivers = DRIVERS[agent] ?? [`${agent}_wm2`];
        const columns = own.filter((c) => drivers.some((d) => (d.startsWith('*') ? c.endsWith(d.slice(1)) : c === d)));
        given.push({ agent, columns: columns.length > 0 ? columns : [source] });
      } else filled.push({ agent, how: [source] });
    }
    return { given, filled };
  }
  const own = Object.keys(read.annual.series).filter((c) => read.annual.series[c as keyof typeof read.annual.series] !== undefined);
  const matches = (pattern: string, column: string) => (pattern.startsWith('*') ? column.endsWith(pattern.slice(1)) : column === pattern);
  const given: PathwayCoverage['given'] = [];
  const filled: PathwayCoverage['filled'] = [];
  for (const agent of FORCING_AGENTS as readonly string[]) {
    const drivers = DRIVERS[agent] ?? [`${agent}_wm2`];
    const columns = own.filter((c) => drivers.some((d) => matches(d, c)));
    if (columns.length > 0) {
      given.push({ agent, columns });
      continue;
    }
    const named = drivers.filter((d) => !d.startsWith('*'));
    const how = read.pathway.provenance.notes.filter((n) => !readerNotes.includes(n) && (named.some((d) => n.includes(d)) || n.includes(`${agent}_`)));
    filled.push({ agent, how });
  }
  return { given, filled };
}

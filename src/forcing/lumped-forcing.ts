import { ConfigError } from '../errors.js';
import { AGENT_FORCING_COLUMNS, type AgentForcingColumn, type LumpedForcingColumn, type Pathway, type PathwayColumn } from '../pathway.js';

/**
 * IPCC AR6 WG1 Annex III best-estimate ERF in 2019 relative to 1750, W m-2, of the agents a lumped
 * column stands for (pathways/records/ar6-erf-1750-2019.csv, row 2019, to the digits given there;
 * test/reference/ar6-erf-history.test.ts reads them back from the record). Their ratios are the
 * shares in which a lumped column is split.
 */
export const AR6_2019_ERF_WM2 = {
  aerosol_ari_wm2: -0.21556193839611998,
  aerosol_aci_wm2: -0.8427783283750662,
  other_ghg_wm2: 0.40806443295109895,
  ozone_wm2: 0.4744666666666666,
  strat_h2o_wm2: 0.05,
  contrails_wm2: 0.05753492821428848,
  bc_snow_wm2: 0.08,
  land_use_wm2: -0.2,
} as const satisfies Partial<Record<AgentForcingColumn, number>>;

/** The agent columns each lumped column stands for. */
export const LUMPED_PARTS: Record<LumpedForcingColumn, readonly AgentForcingColumn[]> = {
  aerosol_wm2: ['aerosol_ari_wm2', 'aerosol_aci_wm2'],
  other_wm2: ['other_ghg_wm2', 'ozone_wm2', 'strat_h2o_wm2', 'contrails_wm2', 'bc_snow_wm2', 'land_use_wm2'],
};

/**
 * Share of a lumped column that goes to one of its agents: the agent's AR6 2019 ERF over the sum of
 * the lumped agents' 2019 ERF. The shares of one lumped column add to 1; land use has a negative
 * share of `other_wm2` (-0.230), so the others add to more than 1 and every agent scales together.
 *
 * @example lumpedShare('aerosol_wm2', 'aerosol_ari_wm2') // ≈ 0.204
 */
export function lumpedShare(lumped: LumpedForcingColumn, agent: AgentForcingColumn): number {
  const parts = LUMPED_PARTS[lumped];
  if (!parts.includes(agent)) return 0;
  let sum = 0;
  for (const p of parts) sum += AR6_2019_ERF_WM2[p as keyof typeof AR6_2019_ERF_WM2];
  return AR6_2019_ERF_WM2[agent as keyof typeof AR6_2019_ERF_WM2] / sum;
}

/**
 * Splits a pathway's lumped forcing columns (`aerosol_wm2`, `other_wm2`) over their agents in the
 * shares of AR6's 2019 ERF (lumpedShare): every year, each agent gets its share of the lumped value,
 * so the sum over the agents equals the lumped column exactly. A note gives the shares. A pathway
 * without lumped columns is returned as it is.
 *
 * Why fixed 2019 shares: they are the last year of the assessed record, the split does not depend on
 * where a file starts, and it only matters where agents are scaled separately (ensembles) or
 * reported separately; a file that cares gives the agent columns itself.
 *
 * @param pathway annual pathway, possibly with lumped columns
 * @returns a new pathway with the agent columns in place of the lumped ones
 * @throws ConfigError when a pathway holds a lumped column and one of its agents (file readers refuse such files first, with the line)
 * @example splitLumpedForcing(p).series.aerosol_aci_wm2 // 0.796 x p.series.aerosol_wm2
 */
export function splitLumpedForcing(pathway: Pathway): Pathway {
  const lumpedGiven = (Object.keys(LUMPED_PARTS) as LumpedForcingColumn[]).filter((c) => pathway.series[c]);
  if (lumpedGiven.length === 0) return pathway;
  const series: Partial<Record<PathwayColumn, Float64Array>> = { ...pathway.series };
  const notes = [...pathway.provenance.notes];
  for (const lumped of lumpedGiven) {
    const values = pathway.series[lumped]!;
    const parts = LUMPED_PARTS[lumped];
    const clash = parts.find((p) => pathway.series[p]);
    if (clash) {
      throw new ConfigError(`${pathway.name}: ${lumped} and ${clash} must not both be given (${lumped} stands for ${parts.join(', ')})`, lumped, 'pathway.forcing-twice');
    }
    for (const part of parts) {
      const share = lumpedShare(lumped, part);
      series[part] = values.map((v) => share * v);
    }
    delete series[lumped];
    notes.push(`${lumped} split over ${parts.map((p) => `${p} (${(100 * lumpedShare(lumped, p)).toFixed(1)} %)`).join(', ')}: the shares of AR6's 2019 ERF`);
  }
  return { ...pathway, series, provenance: { ...pathway.provenance, notes } };
}

/**
 * The agent forcing columns a pathway's series neither give nor cover by a lumped column, in
 * AGENT_FORCING_COLUMNS order: the agents a run takes as zero.
 *
 * @example forcingColumnsNotGiven({ aerosol_wm2: x, solar_wm2: y }) // ['other_ghg_wm2', 'ozone_wm2', ..., 'volcanic_wm2'] without the aerosol agents and solar
 */
export function forcingColumnsNotGiven(series: Pathway['series']): AgentForcingColumn[] {
  const covered = new Set<AgentForcingColumn>();
  for (const lumped of Object.keys(LUMPED_PARTS) as LumpedForcingColumn[]) {
    if (series[lumped]) for (const part of LUMPED_PARTS[lumped]) covered.add(part);
  }
  return AGENT_FORCING_COLUMNS.filter((c) => !series[c] && !covered.has(c));
}

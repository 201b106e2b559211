import { HALOGEN_PRESENT_DAY_YEAR } from '../carbon/halogen-present-day.js';
import type { ClimateParams } from '../climate/params.js';
import { FORCING_AGENTS, type ForcingAgent } from '../forcing/agents.js';
import { EMITTED_SPECIES, eescSeries, forcingBySpecies, ozoneShares, type OzoneShares } from '../forcing/emitted-species.js';
import { attributeWarming, type Attribution } from '../metrics/attribution.js';
import type { Pathway } from '../pathway.js';
import { projectPathway, type Projection, type ProjectionOptions } from './project-pathway.js';

/** A projection and its warming split by forcing agent, and for emission pathways by emitted species. */
export interface AttributedProjection {
  projection: Projection;
  attribution: Attribution;
  /** Warming by emitted species (EMITTED_SPECIES), for emission-driven runs: adds up to `warming_k` too. */
  bySpecies?: Attribution;
  /** The ozone shares the species split used (unscaled), for members' ranges. */
  ozoneShares?: OzoneShares;
  /** How the split was made, for provenance. */
  notes: string[];
  /** Why an emission-driven run has no split by species (shown on the terminal too), when it has none. */
  speciesSkipped?: string;
}

/** The note on the agent convention, shared by every attribution output. */
export const AGENT_ATTRIBUTION_NOTE =
  "warming by agent: the two-box model run on each agent's ERF alone, rebased to the same baseline; the model is linear in forcing, so the parts add up to warming_k " +
  "(ERF-based attribution, IPCC AR6 WG1 chapter 7, section 7.3.5): each agent counts with its ERF as realised in the full run, so the extra CO2 the carbon-climate feedback leaves in the air is CO2's warming and the logarithmic aerosol-cloud forcing is the aerosol-cloud agent's";

/** The note on the species convention. */
export const SPECIES_ATTRIBUTION_NOTE =
  'warming by emitted species (warming_from_<species>_k): the same agents regrouped by what was emitted (emission-based attribution, as in IPCC AR6 WG1 Figure 6.12 and SPM.2c): ' +
  "ozone is shared out by AR6's linear form (7.SM.1.3.2, Thornhill et al. 2021): 1.75e-4 W m-2 per ppb of CH4 and 7.1e-4 per ppb of N2O above 1750 and -1.25e-4 per ppt of EESC, the rest to NOx, CO and NMVOC; " +
  'stratospheric water vapour is methane\'s; aerosol-radiation, aerosol-cloud and BC on snow are the aerosol precursors\' (SO2, BC, OC, NH3 together); ' +
  "not counted, because warmcast does not model them: the CO2 that fossil methane oxidises to, the effect of NOx, CO and NMVOC on methane's lifetime, and methane's and NOx's effect on aerosols";

/**
 * The ozone shares of a run (ozoneShares), with EESC from the halogenated gases' concentrations an
 * emission pathway computed (Pathway.responsiveFrom.eescPpt) where it has them, and from the
 * halogenated-gas forcing elsewhere (eescSeries).
 *
 * @returns the shares and a note on where EESC came from
 */
export function runOzoneShares(projection: Projection, responsiveFrom: Pathway['responsiveFrom']): { shares: OzoneShares; note: string } {
  const c = projection.columns;
  const computed = responsiveFrom?.eescPpt ? { fromYear: responsiveFrom.year, eescPpt: responsiveFrom.eescPpt } : undefined;
  const eesc = eescSeries(projection.years, c.forcing_other_ghg_wm2, computed);
  const note = computed
    ? `EESC for ozone's halogen share: from the halogenated gases' computed concentrations from ${computed.fromYear}; to 2019 it follows the halogenated-gas forcing, scaled to the EESC of the bundled 2019 concentrations (the history has no concentrations behind that forcing), and a straight line joins the two`
    : "EESC for ozone's halogen share: follows the halogenated-gas forcing, scaled to the EESC of the bundled 2019 concentrations (the run has no halogen concentrations of its own)";
  return { shares: ozoneShares(c.ch4_ppb, c.n2o_ppb, eesc), note };
}

/**
 * Why an emission-driven run cannot be split by emitted species, or undefined when it can. The split
 * needs the future's ozone to come from the file's emissions (ozone and aerosol precursors, or a
 * stated --absent-emissions rule): ozone given as forcing (`ozone_wm2`, or a lumped `other_wm2` split
 * in AR6's 2019 shares) has no emissions behind it to share out. It also needs the EESC of the
 * ozone-depleting gases: halogen concentrations of the run's own, or 2019 in the run to anchor the
 * bundled ones.
 */
export function speciesSplitObstacle(pathway: Pathway, years: Float64Array): string | undefined {
  const from = pathway.responsiveFrom;
  if (!from?.ozone) {
    return 'by emitted species: not made, because the file gives ozone as forcing (ozone_wm2, or other_wm2 split in AR6 shares), so there are no emissions to share its future out by; give the ozone precursors (nox_mt, co_mt, nmvoc_mt) or --absent-emissions with a file of CO2, CH4 and N2O emissions';
  }
  if (!from.eescPpt && !(years[0] <= HALOGEN_PRESENT_DAY_YEAR && years[years.length - 1] >= HALOGEN_PRESENT_DAY_YEAR)) {
    return `by emitted species: not made, because the run has neither ${HALOGEN_PRESENT_DAY_YEAR} (to anchor the ozone-depleting gases' EESC to the bundled concentrations) nor halogen concentrations of its own; splice the pathway onto the history or give halogenated-gas emissions`;
  }
  return undefined;
}

/**
 * Projects a pathway and splits its warming by forcing agent (see attributeWarming): one
 * `warming_<agent>_k` series per agent of the run, adding up to `warming_k` in every year. An
 * emission-driven run is also split by emitted species (forcingBySpecies: methane with the ozone and
 * stratospheric water vapour it makes, and so on), which adds up to `warming_k` as well.
 *
 * @param pathway annual pathway (spliced onto history as a run would be)
 * @param options the projection's parameters and baseline
 * @example attributePathway(loadPathway('delayed'), { params: calibrate() }).attribution.warmingK.co2
 */
export function attributePathway(pathway: Pathway, options: ProjectionOptions): AttributedProjection {
  const projection = projectPathway(pathway, { ...options, method: 'exact' });
  const forcing = Object.fromEntries(FORCING_AGENTS.map((a) => [a, projection.columns[`forcing_${a}_wm2`]])) as Record<ForcingAgent, Float64Array>;
  const params = projection.params as ClimateParams;
  const attribution = attributeWarming(params, projection.years, forcing, projection.baseline);
  const notes = [AGENT_ATTRIBUTION_NOTE];
  if (!projection.carbon) return { projection, attribution, notes };
  const why = speciesSplitObstacle(pathway, projection.years);
  if (why) return { projection, attribution, notes: [...notes, why], speciesSkipped: why };
  const { shares, note } = runOzoneShares(projection, pathway.responsiveFrom);
  const species = forcingBySpecies(forcing, shares, options.forcingScale?.ozone ?? 1);
  const bySpecies = attributeWarming(params, projection.years, Object.fromEntries(EMITTED_SPECIES.map((s) => [s, species[s]])), projection.baseline);
  return { projection, attribution, bySpecies, ozoneShares: shares, notes: [...notes, SPECIES_ATTRIBUTION_NOTE, note] };
}

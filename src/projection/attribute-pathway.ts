import type { ClimateParams } from '../climate/params.js';
import { FORCING_AGENTS } from '../forcing/agents.js';
import { attributeWarming, type Attribution } from '../metrics/attribution.js';
import type { Pathway } from '../pathway.js';
import { projectPathway, type Projection, type ProjectionOptions } from './project-pathway.js';

/** A projection and its warming split by forcing agent. */
export interface AttributedProjection {
  projection: Projection;
  attribution: Attribution;
  /** How the split was made, for provenance. */
  notes: string[];
}

/**
 * Projects a pathway and splits its warming by forcing agent (see attributeWarming): one
 * `warming_<agent>_k` series per agent of the run, adding up to `warming_k` in every year.
 *
 * @param pathway annual pathway (spliced onto history as a run would be)
 * @param options the projection's parameters and baseline
 * @example attributePathway(readPathway('delayed').pathway, { params: calibrate() }).attribution.warmingK.co2
 */
export function attributePathway(pathway: Pathway, options: ProjectionOptions): AttributedProjection {
  const projection = projectPathway(pathway, { ...options, method: 'exact' });
  const forcing = Object.fromEntries(FORCING_AGENTS.map((a) => [a, projection.columns[`forcing_${a}_wm2`]]));
  const attribution = attributeWarming(projection.params as ClimateParams, projection.years, forcing, projection.baseline);
  const notes = [
    'warming by agent: the two-box model run on each agent\'s ERF alone, rebased to the same baseline; the model is linear in forcing, so the parts add up to warming_k ' +
      '(ERF-based attribution, IPCC AR6 WG1 chapter 7, section 7.3.5): each agent counts with its ERF as realised in the full run, so the extra CO2 the carbon-climate feedback leaves in the air is CO2\'s warming and the logarithmic aerosol-cloud forcing is the aerosol-cloud agent\'s',
  ];
  return { projection, attribution, notes };
}

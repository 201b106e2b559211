import type { EnsembleInput } from '../ensemble/run-ensemble.js';
import type { ClimateParams } from '../climate/params.js';
import { forcingByAgent } from '../forcing/agents.js';
import { EMISSION_COLUMNS, type Pathway } from '../pathway.js';
import { projectPathway } from './project-pathway.js';

/**
 * The forcing an ensemble perturbs for a pathway: ERF by agent with the CO2 formula's own doubling
 * forcing and the aerosol series as given (members rescale both). A concentration pathway's gases
 * are used as given. An emission pathway is first run once with the central parameters (carbon
 * cycle with its feedback) and its projected concentrations are used for every member: the members
 * then sample climate parameters, not the carbon cycle, and a note says so.
 *
 * @param pathway annual pathway (spliced onto history as a run would be)
 * @param params central parameters (used for the carbon cycle of emission pathways and the formula)
 * @returns the ensemble input and the notes to carry into provenance
 */
export function ensembleInput(pathway: Pathway, params: ClimateParams): { input: EnsembleInput; notes: string[] } {
  const s = pathway.series;
  const n = pathway.years.length;
  const notes: string[] = [];
  let gases = { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb };
  if (EMISSION_COLUMNS.some((c) => s[c] !== undefined)) {
    const central = projectPathway(pathway, { params });
    gases = { co2Ppm: central.columns.co2_ppm, ch4Ppb: central.columns.ch4_ppb, n2oPpb: central.columns.n2o_ppb };
    notes.push(
      'emission-driven pathway: concentrations come from one carbon-cycle run with the central parameters ' +
        `(ECS ${params.ecsK} K, TCR ${params.tcrK.toFixed(2)} K, uptake feedback on); the members sample the climate response, not the carbon cycle, so the ranges understate the total uncertainty`,
    );
  }
  const forcing = forcingByAgent(n, { ...gases, prescribed: s }, { co2Formula: params.co2Formula });
  return { input: { years: pathway.years, forcing, co2Formula: params.co2Formula }, notes };
}

import { co2YearDrivers } from '../carbon/co2-year.js';
import type { EnsembleInput } from '../ensemble/run-ensemble.js';
import type { ClimateParams } from '../climate/params.js';
import { forcingByAgent } from '../forcing/agents.js';
import { PREINDUSTRIAL } from '../forcing/constants.js';
import { chemistryAnchor } from '../forcing/methane-chemistry.js';
import { EMISSION_COLUMNS, GASES, type Pathway } from '../pathway.js';
import { projectPathway } from './project-pathway.js';
import { startFromRestNote } from './start-from-rest-note.js';

/**
 * The forcing an ensemble perturbs for a pathway: ERF by agent with the CO2 formula's own doubling
 * forcing and the aerosol series as given (members rescale both). A concentration pathway's gases
 * are used as given. For a pathway with CO2 emissions, every member runs its own carbon cycle
 * (annual steps of the Joos et al. 2013 boxes with the Millar et al. 2017 feedback) driven by its
 * own warming and a sampled multiplier on the pre-industrial iIRF100; the pathway's history
 * concentrations, its emissions and the CH4 and N2O of one central run (gases without a climate
 * feedback in the model) are passed to the members. The central run also checks the pathway. A
 * pathway starting after 1750 gets a note that each member starts from rest then (startFromRestNote).
 *
 * @param pathway annual pathway (spliced onto history as a run would be)
 * @param params central parameters (used for the CH4 and N2O of emission pathways and the formula)
 * @param options `baseline` of the central run (default 1850-1900; a pathway run without the history
 *   splice needs one inside its own years)
 * @returns the ensemble input and the notes to carry into provenance
 */
export function ensembleInput(pathway: Pathway, params: ClimateParams, options: { baseline?: [number, number] } = {}): { input: EnsembleInput; notes: string[] } {
  const s = pathway.series;
  const n = pathway.years.length;
  const notes: string[] = [];
  let gases = { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb };
  let carbon: EnsembleInput['carbon'];
  if (EMISSION_COLUMNS.some((c) => s[c] !== undefined)) {
    const central = projectPathway(pathway, { params, ...(options.baseline ? { baseline: options.baseline } : {}) });
    gases = { co2Ppm: central.columns.co2_ppm, ch4Ppb: central.columns.ch4_ppb, n2oPpb: central.columns.n2o_ppb };
    const emissions = s[GASES.co2.emission];
    if (emissions) {
      carbon = {
        co2: co2YearDrivers(s[GASES.co2.concentration], emissions, PREINDUSTRIAL.co2Ppm),
        ch4Ppb: Float64Array.from(central.columns.ch4_ppb),
        n2oPpb: Float64Array.from(central.columns.n2o_ppb),
      };
      notes.push(
        'emission-driven pathway: each member runs its own carbon cycle (Joos et al. 2013 boxes with the Millar et al. 2017 uptake feedback, the same annual step as a single run) ' +
          'driven by its own warming and a sampled multiplier on the pre-industrial iIRF100 (median 1, 5-95 % 0.77-1.23, from the multi-model spread of Joos et al. 2013); ' +
          `CH4 and N2O concentrations come from one run with the central parameters (ECS ${params.ecsK.toFixed(2)} K, TCR ${params.tcrK.toFixed(2)} K), as they have no climate feedback in the model`,
      );
    } else {
      notes.push(
        'CH4 and N2O emissions: concentrations come from one run with the central parameters ' +
          `(ECS ${params.ecsK.toFixed(2)} K, TCR ${params.tcrK.toFixed(2)} K); they have no climate feedback in the model, so the members share them`,
      );
    }
  }
  // Members scale the forcing differently, so the note gives no one value for it.
  const fromRest = startFromRestNote(pathway, { subject: 'each member' });
  if (fromRest) notes.push(fromRest);
  const forcing = forcingByAgent(n, {
    co2Ppm: gases.co2Ppm,
    ch4Ppb: gases.ch4Ppb ?? new Float64Array(n).fill(PREINDUSTRIAL.ch4Ppb),
    n2oPpb: gases.n2oPpb ?? new Float64Array(n).fill(PREINDUSTRIAL.n2oPpb),
    prescribed: s,
    chemistry: chemistryAnchor(pathway.years, pathway.responsiveFrom),
  }, { co2Formula: params.co2Formula });
  return { input: { years: pathway.years, forcing, co2Formula: params.co2Formula, ...(carbon ? { carbon } : {}) }, notes };
}

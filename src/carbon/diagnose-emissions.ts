import type { ClimateParams } from '../climate/params.js';
import { FORCING_COLUMNS, GASES, type Pathway, type PathwayColumn } from '../pathway.js';
import { runEmissionDriven, type EmissionRunOptions, type EmissionRunResult } from './run-emission-driven.js';

/** Result of {@link diagnoseEmissions}. */
export interface DiagnosedEmissions {
  /**
   * The emission pathway: the same years and prescribed forcing columns, and for every gas the
   * pathway gives (in either form) its emission column (`co2_gtco2`, `ch4_mt`, `n2o_mt`).
   */
  emissions: Pathway;
  /** The run that diagnosed them (concentrations, warming, carbon budget). */
  run: EmissionRunResult;
}

/**
 * Diagnoses the emissions compatible with a concentration pathway: the emissions that make the
 * carbon cycle (with its climate feedback) and the CH4/N2O mass balances reproduce the given
 * concentrations, as {@link runEmissionDriven} computes them in its concentration years. Gases
 * given as emissions pass through unchanged; a gas not given stays absent.
 *
 * Each emission value is the calendar year's total that moves the stock from one 1 January
 * concentration to the next (yearStartConcentrations), so running the returned pathway forward
 * lands on the same 1 January values (to the small difference the warming makes to the feedback)
 * and on annual means within a quarter of the record's second difference of the given ones.
 *
 * @param pathway annual pathway with concentration columns
 * @param params climate parameters
 * @param options as for runEmissionDriven
 * @throws ConfigError as runEmissionDriven does
 * @example
 * const { emissions } = diagnoseEmissions(loadHistory(), calibrate(), { forcing: { co2Formula: 'ar6' } });
 * emissions.series.co2_gtco2 // Gt CO2 emitted in each calendar year, 1750-2024
 */
export function diagnoseEmissions(pathway: Pathway, params: ClimateParams, options: EmissionRunOptions): DiagnosedEmissions {
  const run = runEmissionDriven(pathway, params, options);
  const series: Partial<Record<PathwayColumn, Float64Array>> = {};
  const rates = { co2: run.co2EmissionsGtco2, ch4: run.ch4EmissionsMt, n2o: run.n2oEmissionsMt };
  for (const [gas, columns] of Object.entries(GASES) as [keyof typeof GASES, (typeof GASES)[keyof typeof GASES]][]) {
    if (pathway.series[columns.concentration] || pathway.series[columns.emission]) series[columns.emission] = rates[gas].slice();
  }
  for (const column of FORCING_COLUMNS) {
    const values = pathway.series[column];
    if (values) series[column] = values.slice();
  }
  const emissions: Pathway = {
    name: pathway.name,
    years: pathway.years.slice(),
    series,
    metadata: { ...pathway.metadata },
    provenance: {
      ...pathway.provenance,
      notes: [...pathway.provenance.notes, 'emissions diagnosed from concentrations by the carbon cycle', ...run.notes],
    },
  };
  return { emissions, run };
}

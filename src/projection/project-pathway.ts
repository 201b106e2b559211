import { runEmissionDriven, type EmissionRunResult } from '../carbon/run-emission-driven.js';
import { energyBalance, type EnergyBalanceMethod } from '../climate/energy-balance.js';
import type { ClimateParams } from '../climate/params.js';
import { ConfigError } from '../errors.js';
import { FORCING_AGENTS, forcingByAgent, type ForcingAgent, type ForcingOptions } from '../forcing/agents.js';
import { PREINDUSTRIAL } from '../forcing/constants.js';
import { chemistryAnchor } from '../forcing/methane-chemistry.js';
import { DEFAULT_TOLERANCES, type OdeTolerances } from '../numerics/integrate-steps.js';
import { forcingColumnsNotGiven } from '../forcing/lumped-forcing.js';
import { EMISSION_COLUMNS, GASES, type Pathway, type PathwayProvenance } from '../pathway.js';
import { energyBudget, energyBudgetNote } from './energy-budget.js';
import { startFromRestNote } from './start-from-rest-note.js';
import { rebase } from '../metrics/warming-levels.js';

type BudgetColumns = Parameters<typeof energyBudget>[1];

/** Options of {@link projectPathway}. */
export interface ProjectionOptions {
  /** Resolved climate parameters (see `calibrate`). */
  params: ClimateParams;
  /** Baseline period for `warming_k`, inclusive years. Default 1850-1900 (IPCC AR6 convention). */
  baseline?: readonly [number, number];
  /** Temperature stepping: the exact one-year propagator (`exact`, default) or the odex reference. */
  method?: EnergyBalanceMethod;
  /** odex tolerances. */
  tolerances?: OdeTolerances;
  /** Multiplier on prescribed aerosol forcing (1 = as given). */
  aerosolScale?: number;
  /** Carbon-climate feedback on CO2 uptake in emission-driven runs (default true). */
  carbonFeedback?: boolean;
  /**
   * Multiplier per forcing agent (1 where absent), as the calibrated set's representative member
   * carries them (ForcingOptions.agentScale, in concentration- and emission-driven runs alike); CO2
   * is scaled through `params.forcing2xWm2`.
   */
  forcingScale?: Partial<Record<ForcingAgent, number>>;
}

/**
 * Output columns of a projection, in CSV order (DESIGN.md). Emission-driven runs add `co2_gtco2`,
 * `ch4_mt`, `n2o_mt` (given or diagnosed), `cumulative_co2_gtco2` (from 1850) and `airborne_fraction`.
 */
export const PROJECTION_COLUMNS = [
  'warming_k',
  'deep_ocean_k',
  'forcing_wm2',
  'imbalance_wm2',
  'co2_ppm',
  'ch4_ppb',
  'n2o_ppb',
  ...FORCING_AGENTS.map((a) => `forcing_${a}_wm2` as const),
  'forcing_aerosol_wm2',
] as const;

/** A year-by-year warming projection for one pathway. */
export interface Projection {
  /** Pathway display name. */
  name: string;
  /** Where the pathway came from, with the splice and interpolation notes. */
  provenance: PathwayProvenance;
  /** Parameters used. */
  params: ClimateParams;
  /** Baseline period of `warming_k` and `deep_ocean_k`. */
  baseline: readonly [number, number];
  /** Consecutive integer years. */
  years: Float64Array;
  /**
   * Output series by column name: `warming_k` and `deep_ocean_k` relative to the baseline mean (K),
   * forcing and imbalance in W m-2, concentrations in ppm/ppb, and for emission-driven runs the
   * emissions, `cumulative_co2_gtco2` and `airborne_fraction`.
   */
  columns: Record<string, Float64Array>;
  /** Things the user should know about this run (gases held at 1750 values, forcing columns taken as zero, ...). */
  notes: string[];
  /** The carbon-cycle result of an emission-driven run (budget, diagnosed emissions, mass balance). */
  carbon?: EmissionRunResult;
}

/**
 * Projects warming for a pathway: concentrations -> ERF by agent (IPCC AR6 formulas) -> two-box
 * energy balance stepped by the exact one-year propagator (climate/two-box-step.ts) from rest at the first year (T = T_d = 0, the pre-industrial
 * equilibrium, whatever that year's forcing: a pathway starting after 1750 without the history
 * splice misses the warming already reached by then) -> warming relative to the baseline mean.
 * Notes name the gases held at their 1750 values and the forcing columns taken as zero, for a
 * first year after 1750 what the run starts from (startFromRestNote), and for a run covering
 * 1971-2018 its energy budget beside IPCC AR6's (energyBudgetNote).
 *
 * @param pathway annual pathway (concentrations and prescribed forcing)
 * @param options parameters, baseline, method
 * @throws ConfigError when the baseline lies outside the pathway's years
 */
export function projectPathway(pathway: Pathway, options: ProjectionOptions): Projection {
  const { params } = options;
  const baseline = options.baseline ?? ([1850, 1900] as const);
  const years = pathway.years;
  const n = years.length;
  const notes: string[] = [];
  const s = pathway.series;

  for (const [gas, cols] of Object.entries(GASES)) {
    if (!s[cols.concentration] && !s[cols.emission]) notes.push(`${gas.toUpperCase()} not given: held at its 1750 value`);
  }
  // forcingByAgent adds nothing for an absent forcing column; say so, as for the gases above.
  const zeroForcing = forcingColumnsNotGiven(s);
  if (zeroForcing.length > 0) notes.push(`${zeroForcing.join(', ')} not given: taken as zero`);
  const forcingOptions: ForcingOptions = { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2, aerosolScale: options.aerosolScale, agentScale: options.forcingScale };
  const tolerances = options.tolerances ?? DEFAULT_TOLERANCES;

  if (EMISSION_COLUMNS.some((c) => s[c] !== undefined)) {
    // Emission-driven: carbon boxes, gas burdens and temperatures advance together, a calendar year at a time.
    const r = runEmissionDriven(pathway, params, { forcing: forcingOptions, feedback: options.carbonFeedback ?? true });
    const columns: Record<string, Float64Array> = {
      warming_k: rebase(years, r.surfaceK, baseline, pathway.name),
      deep_ocean_k: rebase(years, r.deepK, baseline, pathway.name),
      forcing_wm2: r.forcing.total,
      imbalance_wm2: r.imbalanceWm2,
      co2_ppm: r.co2Ppm,
      ch4_ppb: r.ch4Ppb,
      n2o_ppb: r.n2oPpb,
    };
    for (const a of FORCING_AGENTS) columns[`forcing_${a}_wm2`] = r.forcing.byAgent[a as ForcingAgent];
    columns.forcing_aerosol_wm2 = r.forcing.aerosol;
    const fromRest = startFromRestNote(pathway, { subject: 'the run', forcingWm2: r.forcing.total[0] });
    if (fromRest) notes.push(fromRest);
    columns.co2_gtco2 = r.co2EmissionsGtco2;
    columns.ch4_mt = r.ch4EmissionsMt;
    columns.n2o_mt = r.n2oEmissionsMt;
    columns.cumulative_co2_gtco2 = r.cumulativeCo2Gtco2;
    columns.airborne_fraction = r.airborneFraction;
    const budget = energyBudget(years, columns as BudgetColumns, params);
    const budgetNotes = budget ? [energyBudgetNote(budget)] : [];
    return { name: pathway.name, provenance: pathway.provenance, params, baseline, years, columns, notes: [...notes, ...r.notes, ...budgetNotes], carbon: r };
  }

  // Ozone and strat. H2O follow a given CH4 or N2O from the join when their forcing came from emissions.
  const chemistry = chemistryAnchor(years, pathway.responsiveFrom);
  const forcing = forcingByAgent(n, {
    co2Ppm: s.co2_ppm,
    ch4Ppb: s.ch4_ppb ?? new Float64Array(n).fill(PREINDUSTRIAL.ch4Ppb),
    n2oPpb: s.n2o_ppb ?? new Float64Array(n).fill(PREINDUSTRIAL.n2oPpb),
    prescribed: s,
    chemistry,
  }, forcingOptions);
  const eb = energyBalance(params, forcing.total, options.method ?? 'exact', tolerances);
  const fromRest = startFromRestNote(pathway, { subject: 'the run', forcingWm2: forcing.total[0] });
  if (fromRest) notes.push(fromRest);

  const columns: Record<string, Float64Array> = {
    warming_k: rebase(years, eb.surfaceK, baseline, pathway.name),
    deep_ocean_k: rebase(years, eb.deepK, baseline, pathway.name),
    forcing_wm2: forcing.total,
    imbalance_wm2: eb.imbalanceWm2,
    co2_ppm: s.co2_ppm ?? new Float64Array(n).fill(PREINDUSTRIAL.co2Ppm),
    ch4_ppb: s.ch4_ppb ?? new Float64Array(n).fill(PREINDUSTRIAL.ch4Ppb),
    n2o_ppb: s.n2o_ppb ?? new Float64Array(n).fill(PREINDUSTRIAL.n2oPpb),
  };
  for (const a of FORCING_AGENTS) columns[`forcing_${a}_wm2`] = forcing.byAgent[a as ForcingAgent];
  columns.forcing_aerosol_wm2 = forcing.aerosol;
  const budget = energyBudget(years, columns as BudgetColumns, params);
  if (budget) notes.push(energyBudgetNote(budget));
  return { name: pathway.name, provenance: pathway.provenance, params, baseline, years, columns, notes };
}

/** Warming relative to a baseline period: one definition, in metrics/warming-levels.ts. */
export { rebase } from '../metrics/warming-levels.js';

import { HALOGEN_COLUMNS } from './carbon/halogen-species.js';

/**
 * The pathway data model shared by every layer: an annual grid of years with named series.
 * Readers in `io/` build it; physics in `carbon/`, `forcing/` and `climate/` consume it.
 */

/** Concentration columns: CO2 in ppm, CH4 and N2O in ppb. */
export const CONCENTRATION_COLUMNS = ['co2_ppm', 'ch4_ppb', 'n2o_ppb'] as const;
/** Emission columns: CO2 in Gt CO2 per year, CH4 in Mt CH4 per year, N2O in Mt N2O per year. */
export const EMISSION_COLUMNS = ['co2_gtco2', 'ch4_mt', 'n2o_mt'] as const;
/**
 * Prescribed effective radiative forcing columns, one per non-gas agent of FORCING_AGENTS
 * (src/forcing/agents.ts), W m-2: anthropogenic agents relative to 1750, solar and volcanic relative
 * to their long pre-industrial means as in IPCC AR6 (volcanic is positive between eruptions).
 */
export const AGENT_FORCING_COLUMNS = [
  'other_ghg_wm2',
  'ozone_wm2',
  'strat_h2o_wm2',
  'contrails_wm2',
  'aerosol_ari_wm2',
  'aerosol_aci_wm2',
  'bc_snow_wm2',
  'land_use_wm2',
  'solar_wm2',
  'volcanic_wm2',
] as const;
/**
 * Lumped forcing columns still accepted in pathway files, W m-2: `aerosol_wm2` (aerosol-radiation
 * plus aerosol-cloud interactions) and `other_wm2` (other greenhouse gases, ozone, stratospheric water
 * vapour, contrails, black carbon on snow, land use). Reading a file splits them over their agents
 * (splitLumpedForcing in src/forcing/lumped-forcing.ts).
 */
export const LUMPED_FORCING_COLUMNS = ['aerosol_wm2', 'other_wm2'] as const;
/** Every prescribed forcing column a pathway may hold, W m-2. */
export const FORCING_COLUMNS = [...AGENT_FORCING_COLUMNS, ...LUMPED_FORCING_COLUMNS] as const;
/**
 * Emissions of the short-lived aerosol and ozone precursors, Mt per year: SO2, black and organic
 * carbon, NH3, NOx (as NO2), CO, non-methane VOC (anthropogenic, on top of the 1750 background).
 */
export const PRECURSOR_COLUMNS = ['so2_mt', 'bc_mt', 'oc_mt', 'nh3_mt', 'nox_mt', 'co_mt', 'nmvoc_mt'] as const;
/** Halogenated-gas emissions, kt per year, one per gas of HALOGEN_SPECIES (`hfc134a_kt`). */
export const HALOGEN_EMISSION_COLUMNS = HALOGEN_COLUMNS.map((c) => `${c}_kt` as const);
/** Halogenated-gas concentrations, ppt, one per gas of HALOGEN_SPECIES (`hfc134a_ppt`). */
export const HALOGEN_CONCENTRATION_COLUMNS = HALOGEN_COLUMNS.map((c) => `${c}_ppt` as const);
/**
 * Columns of the short-lived precursors and halogenated gases (resolveEmissionForcing turns them into
 * forcing), including `fgas_mtco2e`: HFC, PFC, SF6 and NF3 emissions together, Mt CO2-eq per year
 * weighted by the AR6 GWP100.
 */
export const SPECIES_COLUMNS = [...PRECURSOR_COLUMNS, 'fgas_mtco2e', ...HALOGEN_EMISSION_COLUMNS, ...HALOGEN_CONCENTRATION_COLUMNS] as const;
/** Every data column a pathway file may hold, in canonical order. */
export const PATHWAY_COLUMNS = [...CONCENTRATION_COLUMNS, ...EMISSION_COLUMNS, ...FORCING_COLUMNS, ...SPECIES_COLUMNS] as const;

export type ConcentrationColumn = (typeof CONCENTRATION_COLUMNS)[number];
export type EmissionColumn = (typeof EMISSION_COLUMNS)[number];
export type ForcingColumn = (typeof FORCING_COLUMNS)[number];
export type SpeciesColumn = (typeof SPECIES_COLUMNS)[number];
export type AgentForcingColumn = (typeof AGENT_FORCING_COLUMNS)[number];
export type LumpedForcingColumn = (typeof LUMPED_FORCING_COLUMNS)[number];
export type PathwayColumn = (typeof PATHWAY_COLUMNS)[number];

/** The three well-mixed gases and their emission/concentration column pair. */
export const GASES = {
  co2: { concentration: 'co2_ppm', emission: 'co2_gtco2' },
  ch4: { concentration: 'ch4_ppb', emission: 'ch4_mt' },
  n2o: { concentration: 'n2o_ppb', emission: 'n2o_mt' },
} as const satisfies Record<string, { concentration: ConcentrationColumn; emission: EmissionColumn }>;
export type Gas = keyof typeof GASES;

/** Units of each column, for reports and `warmcast check`. */
export const COLUMN_UNITS: Record<PathwayColumn, string> = {
  co2_ppm: 'ppm',
  ch4_ppb: 'ppb',
  n2o_ppb: 'ppb',
  co2_gtco2: 'Gt CO2 yr-1',
  ch4_mt: 'Mt CH4 yr-1',
  n2o_mt: 'Mt N2O yr-1',
  other_ghg_wm2: 'W m-2',
  ozone_wm2: 'W m-2',
  strat_h2o_wm2: 'W m-2',
  contrails_wm2: 'W m-2',
  aerosol_ari_wm2: 'W m-2',
  aerosol_aci_wm2: 'W m-2',
  bc_snow_wm2: 'W m-2',
  land_use_wm2: 'W m-2',
  solar_wm2: 'W m-2',
  volcanic_wm2: 'W m-2',
  so2_mt: 'Mt SO2 yr-1',
  bc_mt: 'Mt BC yr-1',
  oc_mt: 'Mt OC yr-1',
  nh3_mt: 'Mt NH3 yr-1',
  nox_mt: 'Mt NO2 yr-1',
  co_mt: 'Mt CO yr-1',
  nmvoc_mt: 'Mt NMVOC yr-1',
  fgas_mtco2e: 'Mt CO2-eq yr-1 (AR6 GWP100)',
  ...(Object.fromEntries([
    ...HALOGEN_EMISSION_COLUMNS.map((c) => [c, 'kt yr-1']),
    ...HALOGEN_CONCENTRATION_COLUMNS.map((c) => [c, 'ppt']),
  ]) as Record<(typeof HALOGEN_EMISSION_COLUMNS)[number] | (typeof HALOGEN_CONCENTRATION_COLUMNS)[number], string>),
  aerosol_wm2: 'W m-2',
  other_wm2: 'W m-2',
};

/** Where the values of a pathway came from, carried into every output. */
export interface PathwayProvenance {
  /** Path of the file read, or `bundled:<name>`. */
  source: string;
  /** First year taken from the file when it was spliced onto the bundled history, else undefined. */
  spliceYear?: number;
  /** With a splice: the last year taken from the history (years between it and `spliceYear` are bridged). */
  historyLastYear?: number;
  /** Human-readable notes: interpolation, splice, columns held at pre-industrial values. */
  notes: string[];
  /**
   * Assumptions that fill what the file does not give (species following a chosen rule, species
   * held at present-day emissions): shown in the terminal's headline block and recorded in every file.
   */
  assumptions?: string[];
}

/**
 * A pathway on an annual grid. `years` are consecutive integers; each series has one value per year
 * (a concentration, an emission rate, or a forcing, in the column's unit).
 */
export interface Pathway {
  /** Display name (from `# name:` metadata, else the file name). */
  name: string;
  /** Consecutive integer years, ascending. */
  years: Float64Array;
  /** Series present, keyed by column name, each the same length as `years`. */
  series: Partial<Record<PathwayColumn, Float64Array>>;
  /** `# key: value` metadata lines of the file. */
  metadata: Record<string, string>;
  provenance: PathwayProvenance;
  /**
   * Set when forcing was computed from emissions (resolveEmissionForcing): from `year` on, ozone and
   * stratospheric water vapour also respond to the run's CH4 (and N2O) relative to the year before.
   * `eescPpt`, when the halogenated gases' concentrations were computed, is their EESC above
   * pre-industrial (ppt), one value per year from `year`: the split by emitted species uses it.
   */
  responsiveFrom?: { year: number; ozone: boolean; stratH2o: boolean; eescPpt?: Float64Array };
}

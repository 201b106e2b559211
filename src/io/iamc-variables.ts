import { SPECIES_RATIO, type EmissionUnitTarget } from './iamc-units.js';

/** A variable of an IAMC scenario table that warmcast reads, and the column it becomes. */
export interface IamcVariable {
  /** The variable's name as the IAMC template writes it (`Emissions|Sulfur`). */
  variable: string;
  /** Our emission column (`so2_mt`; the names of DESIGN.md and COORDINATION.md). */
  column: string;
  /** Our column's unit and the species its Unit cell may name. */
  target: EmissionUnitTarget;
  /**
   * Set for the two parts of total CO2 that are summed when a scenario gives no `Emissions|CO2`
   * (fossil and industry; agriculture, forestry and other land use).
   */
  co2Sector?: 'energy-industry' | 'afolu';
}

const one = (written: string) => ({ ratio: 1, written });

const CO2: EmissionUnitTarget = {
  tonnes: 1e9,
  unit: 'Gt CO2/yr',
  species: { co2: one('CO2'), c: { ratio: SPECIES_RATIO.co2PerC, written: 'C' } },
};
const mt = (species: EmissionUnitTarget['species'], unit: string): EmissionUnitTarget => ({ tonnes: 1e6, unit, species });

/**
 * The emission variables of the IAMC common template that warmcast reads, with our column for each
 * (variable names as the template writes them; the template is an open community standard). A
 * variable is matched without regard to case or to spaces around `|`. Alternative names some
 * teams use (`Emissions|SO2`, `Emissions|NMVOC`) are accepted too.
 */
export const IAMC_VARIABLES: readonly IamcVariable[] = [
  { variable: 'Emissions|CO2', column: 'co2_gtco2', target: CO2 },
  { variable: 'Emissions|CO2|Energy and Industrial Processes', column: 'co2_gtco2', target: CO2, co2Sector: 'energy-industry' },
  { variable: 'Emissions|CO2|AFOLU', column: 'co2_gtco2', target: CO2, co2Sector: 'afolu' },
  { variable: 'Emissions|CH4', column: 'ch4_mt', target: mt({ ch4: one('CH4') }, 'Mt CH4/yr') },
  {
    variable: 'Emissions|N2O',
    column: 'n2o_mt',
    target: mt({ n2o: one('N2O'), n2on: { ratio: SPECIES_RATIO.n2oPerN, written: 'N2O-N' }, n: { ratio: SPECIES_RATIO.n2oPerN, written: 'N' } }, 'Mt N2O/yr'),
  },
  ...['Emissions|Sulfur', 'Emissions|SO2'].map((variable) => ({
    variable,
    column: 'so2_mt',
    target: mt({ so2: one('SO2'), s: { ratio: SPECIES_RATIO.so2PerS, written: 'S' } }, 'Mt SO2/yr'),
  })),
  { variable: 'Emissions|BC', column: 'bc_mt', target: mt({ bc: one('BC') }, 'Mt BC/yr') },
  { variable: 'Emissions|OC', column: 'oc_mt', target: mt({ oc: one('OC') }, 'Mt OC/yr') },
  { variable: 'Emissions|NH3', column: 'nh3_mt', target: mt({ nh3: one('NH3'), n: { ratio: SPECIES_RATIO.nh3PerN, written: 'N' } }, 'Mt NH3/yr') },
  {
    // The template reports NOx as the mass of NO2; "Mt NOx/yr" is read the same way.
    variable: 'Emissions|NOx',
    column: 'nox_mt',
    target: mt({ no2: one('NO2'), nox: one('NOx'), n: { ratio: SPECIES_RATIO.no2PerN, written: 'N' } }, 'Mt NO2/yr'),
  },
  { variable: 'Emissions|CO', column: 'co_mt', target: mt({ co: one('CO') }, 'Mt CO/yr') },
  ...['Emissions|VOC', 'Emissions|NMVOC'].map((variable) => ({
    variable,
    column: 'nmvoc_mt',
    target: mt({ voc: one('VOC'), nmvoc: one('NMVOC') }, 'Mt NMVOC/yr'),
  })),
  {
    variable: 'Emissions|F-Gases',
    column: 'fgas_mtco2e',
    target: mt({ co2equiv: one('CO2-equiv'), co2e: one('CO2e'), co2eq: one('CO2eq') }, 'Mt CO2-equiv/yr'),
  },
];

/**
 * Halogenated gases the template names under `Emissions|HFC|`, `Emissions|PFC|`, `Emissions|` or
 * `Emissions|Montreal Gases|...`: the last part of the variable, lower case without hyphens, and our
 * column's species name where it differs (the name derived from the AR6 table, Table 7.SM.7:
 * `hfc4310mee` for HFC-43-10mee). Units are kt of the gas per year (`kt HFC134a/yr`).
 */
const HALOGENATED: Readonly<Record<string, string>> = {
  hfc23: 'hfc23', hfc32: 'hfc32', hfc125: 'hfc125', hfc134a: 'hfc134a', hfc143a: 'hfc143a', hfc152a: 'hfc152a',
  hfc227ea: 'hfc227ea', hfc236fa: 'hfc236fa', hfc245fa: 'hfc245fa', hfc365mfc: 'hfc365mfc', hfc4310: 'hfc4310mee', hfc4310mee: 'hfc4310mee',
  cf4: 'cf4', c2f6: 'c2f6', c3f8: 'c3f8', c4f10: 'c4f10', c5f12: 'c5f12', c6f14: 'c6f14', c7f16: 'c7f16', c8f18: 'c8f18', cc4f8: 'c_c4f8',
  sf6: 'sf6', nf3: 'nf3', so2f2: 'so2f2',
  cfc11: 'cfc11', cfc12: 'cfc12', cfc113: 'cfc113', cfc114: 'cfc114', cfc115: 'cfc115',
  hcfc22: 'hcfc22', hcfc141b: 'hcfc141b', hcfc142b: 'hcfc142b',
  ccl4: 'ccl4', ch3ccl3: 'ch3ccl3', ch3br: 'ch3br', ch3cl: 'ch3cl',
  halon1211: 'halon1211', halon1301: 'halon1301', halon2402: 'halon2402', halon1202: 'halon1202',
};

/** Aggregates of halogenated gases that are not read (their species or `Emissions|F-Gases` are). */
const HALOGENATED_AGGREGATES = new Set(['hfc', 'pfc', 'montrealgases', 'cfc', 'hcfc', 'halon', 'fgases']);

/** `Emissions | CO2` and `emissions|co2` compare equal. */
export function variableKey(variable: string): string {
  return variable.trim().toLowerCase().replace(/\s*\|\s*/g, '|').replace(/\s+/g, ' ');
}

const BY_KEY = new Map(IAMC_VARIABLES.map((v) => [variableKey(v.variable), v]));

/**
 * The column an IAMC variable becomes, or undefined for a variable warmcast does not read (other
 * sectors, energy, economy, aggregates of halogenated gases).
 *
 * @example iamcVariable('Emissions|Sulfur')?.column // 'so2_mt'
 * @example iamcVariable('emissions | HFC | HFC134a')?.column // 'hfc134a_kt'
 * @example iamcVariable('Primary Energy') // undefined
 */
export function iamcVariable(variable: string): IamcVariable | undefined {
  const key = variableKey(variable);
  const known = BY_KEY.get(key);
  if (known) return known;
  const parts = key.split('|');
  if (parts[0] !== 'emissions' || parts.length < 2) return undefined;
  const gas = parts[parts.length - 1].replace(/[\s_-]+/g, '');
  if (HALOGENATED_AGGREGATES.has(gas) || !Object.hasOwn(HALOGENATED, gas)) return undefined;
  // Only under a halogenated-gas group or directly under Emissions, never a sector (`Emissions|CO2|...`).
  const groups = parts.slice(1, -1).map((p) => p.replace(/[\s_-]+/g, ''));
  if (!groups.every((g) => HALOGENATED_AGGREGATES.has(g))) return undefined;
  const species = HALOGENATED[gas];
  const written = variable.split('|').pop()!.trim();
  return {
    variable: variable.trim(),
    column: `${species}_kt`,
    target: { tonnes: 1e3, unit: `kt ${written}/yr`, species: { [gas]: one(written), [species]: one(written) } },
  };
}

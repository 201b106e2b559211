import { MOLAR_MASS } from '../carbon/units.js';

/**
 * Molar masses, g mol-1, beyond those of the carbon cycle: IUPAC standard atomic weights (H 1.008,
 * N 14.007, O 15.999, S 32.06; conventional values of the 2013 table).
 */
const MOLAR = {
  ...MOLAR_MASS,
  n: 14.007,
  s: 32.06,
  so2: 32.06 + 2 * 15.999,
  no2: 14.007 + 2 * 15.999,
  nh3: 14.007 + 3 * 1.008,
} as const;

/** Tonnes in one unit of each mass prefix an IAMC table uses (Tg = Mt, Pg = Gt, Gg = kt). */
const TONNES: Readonly<Record<string, number>> = { t: 1, kt: 1e3, gg: 1e3, mt: 1e6, tg: 1e6, gt: 1e9, pg: 1e9 };

/** What an IAMC emission unit must convert to: one of our columns, its mass prefix and the species it counts. */
export interface EmissionUnitTarget {
  /** Tonnes in one unit of our column (1e9 for Gt CO2, 1e6 for Mt, 1e3 for kt). */
  tonnes: number;
  /** Our column's unit, as printed (`Gt CO2/yr`). */
  unit: string;
  /**
   * Species words the Unit column may name (lower case, without spaces or hyphens), each with the
   * mass of our species per unit mass of it (1 for our own species; 44.009/12.011 for C into CO2)
   * and the way it is usually written (`CO2`, `N2O-N`, `HFC134a`).
   */
  species: Readonly<Record<string, { ratio: number; written: string }>>;
}

/** Mass of CO2 per mass of C, N2O per N, SO2 per S, NO2 per N, NH3 per N: ratios of molar masses. */
export const SPECIES_RATIO = {
  co2PerC: MOLAR.co2 / MOLAR.c,
  n2oPerN: MOLAR.n2o / MOLAR.n2,
  so2PerS: MOLAR.so2 / MOLAR.s,
  no2PerN: MOLAR.no2 / MOLAR.n,
  nh3PerN: MOLAR.nh3 / MOLAR.n,
} as const;

/** A unit read from a table's Unit column: the factor to our column's unit, or why it was refused. */
export type UnitReading = { ok: true; factor: number } | { ok: false; known: string[] };

/** `/yr`, `/ yr`, `/year`, `/a`, ` per year`, ` yr-1` at the end of a unit. */
const PER_YEAR = /\s*(?:\/\s*(?:yr|year|a)|\s+per\s+year|\s+yr-1|\s+yr\^-1|\s+a-1)\s*$/i;

/**
 * The factor that turns a value in `unit` (the text of an IAMC table's Unit column) into our
 * column's unit: mass prefix (t, kt, Gg, Mt, Tg, Gt, Pg) times the species ratio, for an annual
 * rate (`/yr`, `/year`, ` per year`, ` yr-1`). Case and spacing do not matter (`Mt CO2/yr`,
 * `mt co2 / yr`). A unit without a per-year part, with an unknown prefix or with a species the
 * target does not take is refused, with the units the target knows.
 *
 * @param unit the Unit cell as written
 * @param target our column's unit and the species it takes
 * @returns the factor, or the known units
 * @example emissionUnitFactor('Mt C/yr', CO2_TARGET) // { ok: true, factor: 0.003664 } (1 Mt C = 3.664 Mt CO2 = 0.003664 Gt CO2)
 */
export function emissionUnitFactor(unit: string, target: EmissionUnitTarget): UnitReading {
  const text = unit.trim().replace(/\s+/g, ' ');
  const perYear = PER_YEAR.exec(text);
  if (perYear) {
    const m = /^(kt|gg|mt|tg|gt|pg|t)\s*(.+)$/i.exec(text.slice(0, perYear.index).trim());
    if (m) {
      const tonnes = TONNES[m[1].toLowerCase()];
      const species = m[2].toLowerCase().replace(/[\s_-]+/g, '');
      if (Object.hasOwn(target.species, species)) return { ok: true, factor: (tonnes / target.tonnes) * target.species[species].ratio };
    }
  }
  return { ok: false, known: knownUnits(target) };
}

/** Written forms of the units a target takes, for messages (`kt CO2/yr, Mt CO2/yr, Gt CO2/yr, ...`). */
export function knownUnits(target: EmissionUnitTarget): string[] {
  const out: string[] = [];
  for (const { written } of Object.values(target.species)) for (const p of ['kt', 'Mt', 'Gt']) out.push(`${p} ${written}/yr`);
  return out;
}

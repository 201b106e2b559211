/**
 * Builds `src/carbon/halogen-species.ts`: the halogenated gases warmcast takes as `<gas>_kt`
 * emissions or `<gas>_ppt` concentrations, with their lifetime, radiative efficiency, AGWP100 and
 * GWP100 read from the AR6 table (IPCC AR6 WG1 Table 7.SM.7, `ar6-ghg-lifetimes-efficiencies-metrics.csv`,
 * CC-BY 4.0), the molar mass computed from the formula, and the chlorine and bromine atoms counted.
 *
 * Which gases: the HFCs, PFCs, SF6, NF3, SO2F2 and the ozone-depleting substances whose
 * concentrations are monitored and enter the AR6 halogenated-gas forcing (the list below). Column
 * names come from the table's acronym (`HFC-134a` -> `hfc134a`, `Halon-1211` -> `halon1211`) or,
 * for perfluorocarbons and gases without an acronym, from the formula (`CF4` -> `cf4`,
 * `c-C4F8` -> `c_c4f8`).
 *
 * The table is read from pathways/records/ (the bundled byte-identical copy, with its citation in
 * pathways/records/README.md). Deterministic: the same table always writes the same bytes.
 *
 * Try: npx tsc -p tsconfig.build.json && node dist/scripts/build-halogen-species.js
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import Papa from 'papaparse';

const TABLE = 'ar6-ghg-lifetimes-efficiencies-metrics.csv';

/**
 * The gases, by the key the table uses (acronym, else formula), with the column name and group.
 * `label` overrides the display name (perfluorocarbons are shown by formula). `group`: `hfc`, `pfc`, `other-fluorinated` (SF6, NF3, SO2F2), `ods` (controlled by the Montreal
 * Protocol: CFCs, HCFCs, halons, CCl4, CH3CCl3, CH3Br) or `natural-ods` (CH3Cl, mostly natural).
 */
const SELECTED: readonly { key: string; column: string; group: string; label?: string }[] = [
  { key: 'HFC-23', column: 'hfc23', group: 'hfc' },
  { key: 'HFC-32', column: 'hfc32', group: 'hfc' },
  { key: 'HFC-125', column: 'hfc125', group: 'hfc' },
  { key: 'HFC-134a', column: 'hfc134a', group: 'hfc' },
  { key: 'HFC-143a', column: 'hfc143a', group: 'hfc' },
  { key: 'HFC-152a', column: 'hfc152a', group: 'hfc' },
  { key: 'HFC-227ea', column: 'hfc227ea', group: 'hfc' },
  { key: 'HFC-236fa', column: 'hfc236fa', group: 'hfc' },
  { key: 'HFC-245fa', column: 'hfc245fa', group: 'hfc' },
  { key: 'HFC-365mfc', column: 'hfc365mfc', group: 'hfc' },
  { key: 'HFC-43-10mee', column: 'hfc4310mee', group: 'hfc' },
  { key: 'CF4', column: 'cf4', group: 'pfc' },
  { key: 'C2F6', column: 'c2f6', group: 'pfc' },
  { key: 'C3F8', column: 'c3f8', group: 'pfc' },
  { key: 'cyc (-CF2CF2CF2CF2-)', column: 'c_c4f8', group: 'pfc', label: 'c-C4F8' },
  { key: 'n-C4F10', column: 'c4f10', group: 'pfc' },
  { key: 'n-C5F12', column: 'c5f12', group: 'pfc' },
  { key: 'n-C6F14', column: 'c6f14', group: 'pfc' },
  { key: 'SF6', column: 'sf6', group: 'other-fluorinated' },
  { key: 'NF3', column: 'nf3', group: 'other-fluorinated' },
  { key: 'SO2F2', column: 'so2f2', group: 'other-fluorinated' },
  { key: 'CFC-11', column: 'cfc11', group: 'ods' },
  { key: 'CFC-12', column: 'cfc12', group: 'ods' },
  { key: 'CFC-113', column: 'cfc113', group: 'ods' },
  { key: 'CFC-114', column: 'cfc114', group: 'ods' },
  { key: 'CFC-115', column: 'cfc115', group: 'ods' },
  { key: 'HCFC-22', column: 'hcfc22', group: 'ods' },
  { key: 'HCFC-141b', column: 'hcfc141b', group: 'ods' },
  { key: 'HCFC-142b', column: 'hcfc142b', group: 'ods' },
  { key: 'CCl4', column: 'ccl4', group: 'ods' },
  { key: 'CH3CCl3', column: 'ch3ccl3', group: 'ods' },
  { key: 'Halon-1211', column: 'halon1211', group: 'ods' },
  { key: 'Halon-1301', column: 'halon1301', group: 'ods' },
  { key: 'Halon-2402', column: 'halon2402', group: 'ods' },
  { key: 'CH3Br', column: 'ch3br', group: 'ods' },
  { key: 'CH3Cl', column: 'ch3cl', group: 'natural-ods' },
];

/** Standard atomic weights, g mol-1 (IUPAC 2021 abridged values; from memory). */
const ATOMIC_MASS: Record<string, number> = { C: 12.011, H: 1.008, F: 18.998, Cl: 35.45, Br: 79.904, N: 14.007, S: 32.06, O: 15.999 };

/** Element counts of a simple formula (`CH2FCF3`, `cyc (-CF2CF2CF2CF2-)`, `n-C4F10`). */
function elementCounts(formula: string): Record<string, number> {
  const plain = formula.replace(/^cyc\s*/, '').replace(/^n-/, '').replace(/[()\-\s]/g, '');
  const counts: Record<string, number> = {};
  const token = /([A-Z][a-z]?)(\d*)/g;
  let consumed = 0;
  for (const m of plain.matchAll(token)) {
    if (!(m[1] in ATOMIC_MASS)) throw new Error(`unknown element ${m[1]} in ${formula}`);
    counts[m[1]] = (counts[m[1]] ?? 0) + (m[2] === '' ? 1 : Number(m[2]));
    consumed += m[0].length;
  }
  if (consumed !== plain.length) throw new Error(`cannot read formula ${formula}`);
  return counts;
}

function main(): void {
  const source = resolve('pathways/records', TABLE);
  const text = readFileSync(source, 'utf8');
  const rows = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true }).data;
  const out: string[] = [];
  for (const { key, column, group, label } of SELECTED) {
    const row = rows.find((r) => (r.Acronym || r.Formula) === key || r.Formula === key);
    if (!row) throw new Error(`${key} is not in ${TABLE}`);
    const counts = elementCounts(row.Formula);
    let molarMass = 0;
    for (const [element, count] of Object.entries(counts)) molarMass += ATOMIC_MASS[element] * count;
    const num = (name: string) => {
      const v = Number(row[name]);
      if (!Number.isFinite(v) || row[name] === '') throw new Error(`${key}: ${name} is not a number`);
      return v;
    };
    out.push(
      `  { column: '${column}', acronym: '${row.Acronym}', label: '${label ?? (group === 'pfc' ? row.Formula.replace(/^n-/, '') : row.Acronym || row.Formula)}', name: ${JSON.stringify(row.Name)}, formula: '${row.Formula}', group: '${group}',\n`
      + `    molarMass: ${Number(molarMass.toFixed(3))}, chlorine: ${counts.Cl ?? 0}, bromine: ${counts.Br ?? 0},\n`
      + `    lifetimeYr: ${num('Lifetime (yr)')}, radiativeEfficiency: ${num('Radiative efficiency (W m-2 ppb-1)')}, `
      + `agwp100: ${num('AGWP100 (W m-2 yr kg-1)')}, gwp100: ${num('GWP100')} },`,
    );
  }
  const file = `// Generated by scripts/build-halogen-species.ts from ${TABLE}
// (IPCC AR6 WG1 Table 7.SM.7, CC-BY 4.0). Do not edit: change the script and run it again.

/** One halogenated gas: its pathway column stem, AR6 lifetime, radiative efficiency and metrics. */
export interface HalogenSpecies {
  /** Column stem: \`<column>_kt\` (emissions, kt yr-1) and \`<column>_ppt\` (concentration, ppt). */
  column: HalogenColumn;
  /** Acronym in the AR6 table ('' when it has none). */
  acronym: string;
  /** Display name: the AR6 acronym, else the formula (perfluorocarbons by formula). */
  label: string;
  /** Chemical name in the AR6 table. */
  name: string;
  formula: string;
  /** hfc, pfc, other-fluorinated (SF6, NF3, SO2F2), ods (Montreal Protocol), natural-ods (CH3Cl). */
  group: 'hfc' | 'pfc' | 'other-fluorinated' | 'ods' | 'natural-ods';
  /** Molar mass from the formula, g mol-1. */
  molarMass: number;
  /** Chlorine and bromine atoms per molecule. */
  chlorine: number;
  bromine: number;
  /** Atmospheric lifetime, yr (AR6 Table 7.SM.7). */
  lifetimeYr: number;
  /** Radiative efficiency, W m-2 ppb-1 (AR6 Table 7.SM.7). */
  radiativeEfficiency: number;
  /** Absolute global warming potential over 100 years, W m-2 yr kg-1 (AR6 Table 7.SM.7). */
  agwp100: number;
  /** GWP100 (AR6 Table 7.SM.7). */
  gwp100: number;
}

/** Column stems of the halogenated gases, in column order. */
export const HALOGEN_COLUMNS = [${SELECTED.map((s) => `'${s.column}'`).join(', ')}] as const;
export type HalogenColumn = (typeof HALOGEN_COLUMNS)[number];

/** The halogenated gases warmcast models, in column order. */
export const HALOGEN_SPECIES: readonly HalogenSpecies[] = [
${out.join('\n')}
];
`;
  const target = resolve(process.argv[2] ?? 'src/carbon/halogen-species.ts');
  writeFileSync(target, file);
  console.log(`wrote ${SELECTED.length} species to ${target} (from ${source})`);
}

main();

import { HALOGEN_SPECIES } from '../carbon/halogen-species.js';
import type { HALOGEN_CONCENTRATION_COLUMNS, HALOGEN_EMISSION_COLUMNS, SpeciesColumn } from '../pathway.js';
import type { ValueBounds } from './value-bounds.js';

const NEGATIVE = 'an emission rate cannot be negative (no process removes it on purpose)';

function precursor(max: number, what: string, unit: string, present: string): ValueBounds {
  return {
    min: 0,
    max,
    quantity: `${what} emission rate`,
    unit,
    source: `present anthropogenic emissions are about ${present} (CEDS inventories; from memory); ${NEGATIVE}; `
      + `${max} is several times the historical peak and catches a value in kt (common practice, no source)`,
  };
}

/**
 * Plausible bounds for the precursor and halogenated-gas columns (see VALUE_BOUNDS for the idea):
 * none may be negative; the upper ends catch values in the wrong unit (t or kt instead of kt or Mt).
 */
export const SPECIES_BOUNDS: Readonly<Record<SpeciesColumn, ValueBounds>> = {
  so2_mt: precursor(1000, 'an SO2', 'Mt SO2 yr-1', '80 Mt SO2 yr-1, with a peak near 130 around 1980-2005'),
  bc_mt: precursor(100, 'a black-carbon', 'Mt BC yr-1', '6 Mt BC yr-1'),
  oc_mt: precursor(300, 'an organic-carbon', 'Mt OC yr-1', '16 Mt OC yr-1'),
  nh3_mt: precursor(1000, 'an NH3', 'Mt NH3 yr-1', '60 Mt NH3 yr-1'),
  nox_mt: precursor(2000, 'an NOx (as NO2)', 'Mt NO2 yr-1', '110 Mt NO2 yr-1 (a value in Mt N would be about 3.3 times lower)'),
  co_mt: precursor(10000, 'a CO', 'Mt CO yr-1', '550 Mt CO yr-1'),
  nmvoc_mt: precursor(3000, 'an NMVOC', 'Mt NMVOC yr-1', '145 Mt NMVOC yr-1'),
  fgas_mtco2e: {
    min: 0,
    max: 50_000,
    quantity: 'a fluorinated-gas emission rate in CO2 equivalents',
    unit: 'Mt CO2-eq yr-1',
    source: `present HFC, PFC, SF6 and NF3 emissions are about 1.5 Gt CO2-eq yr-1 (from memory); ${NEGATIVE}; `
      + '50 Gt CO2-eq catches a value in kt CO2-eq (common practice, no source)',
  },
  ...(Object.fromEntries(HALOGEN_SPECIES.flatMap((g) => [
    [`${g.column}_kt`, {
      min: 0,
      max: 20_000,
      quantity: `a ${g.label} emission rate`,
      unit: 'kt yr-1',
      source: `no halogenated gas has been emitted at more than about 500 kt yr-1 (CFC-12 near 1990; from memory) `
        + `except CH3Cl, mostly natural; ${NEGATIVE}; 20,000 kt catches a value in t (common practice, no source)`,
    }],
    [`${g.column}_ppt`, {
      min: 0,
      max: 10_000,
      quantity: `a ${g.label} concentration`,
      unit: 'ppt',
      source: 'the most abundant halogenated gas, CH3Cl, is about 540 ppt and CFC-12 peaked near 545 ppt '
        + '(NOAA/AGAGE; from memory); 10,000 ppt catches a value in ppq (common practice, no source)',
    }],
  ])) as Record<(typeof HALOGEN_EMISSION_COLUMNS)[number] | (typeof HALOGEN_CONCENTRATION_COLUMNS)[number], ValueBounds>),
};

import { HALOGEN_SPECIES, type HalogenSpecies } from '../carbon/halogen-species.js';
import { nearestName } from './nearest-name.js';

/**
 * The halogenated gas a column stem most likely means (`hfc134` -> HFC-134a, `pfc14` or `cf4` -> CF4,
 * `carbontetrachloride` -> CCl4), matched against each gas's column stem, label, formula and
 * chemical name from the AR6 table; undefined when none is close (nearestName's rule).
 *
 * @example nearestHalogen('hfc134')?.column // 'hfc134a'
 */
export function nearestHalogen(stem: string): HalogenSpecies | undefined {
  const aliases = new Map<string, HalogenSpecies>();
  for (const g of HALOGEN_SPECIES) {
    for (const alias of [g.column, g.label, g.acronym, g.formula, g.name]) if (!aliases.has(alias)) aliases.set(alias, g);
  }
  const hit = nearestName(stem, [...aliases.keys()]);
  return hit === undefined ? undefined : aliases.get(hit);
}

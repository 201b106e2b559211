import { ch4ErfAr6 } from './ch4.js';
import { AR6_OZONE } from './ozone.js';
import { stratH2oErfWm2 } from './strat-h2o.js';

/** Ozone and stratospheric water vapour ERF changes caused by CH4 and N2O, W m-2. */
export interface ChemistryChange {
  ozone: number;
  stratH2o: number;
}

/**
 * The forcing that CH4 and N2O cause through chemistry, beyond their own ERF, relative to a reference
 * state (the join): tropospheric ozone from CH4 (1.75e-4 W m-2 ppb-1) and stratospheric ozone
 * loss from N2O (7.1e-4 W m-2 ppb-1; both AR6_OZONE, Thornhill et al. 2021), and stratospheric
 * water vapour from CH4 oxidation (0.092 x the CH4 ERF change, stratH2oErfWm2). Linear in the
 * changes, so the sum over years and agents stays additive.
 *
 * @param ch4Ppb, n2oPpb concentrations now, ppb
 * @param ch4RefPpb, n2oRefPpb concentrations at the reference, ppb
 * @example methaneChemistryWm2(2030, 338, 1930, 338) // ≈ { ozone: 0.0175, stratH2o: 0.0036 }
 */
export function methaneChemistryWm2(ch4Ppb: number, n2oPpb: number, ch4RefPpb: number, n2oRefPpb: number): ChemistryChange {
  return {
    ozone: AR6_OZONE.perCh4Ppb * (ch4Ppb - ch4RefPpb) + AR6_OZONE.perN2oPpb * (n2oPpb - n2oRefPpb),
    stratH2o: stratH2oErfWm2(ch4ErfAr6(ch4Ppb, n2oPpb) - ch4ErfAr6(ch4RefPpb, n2oRefPpb)),
  };
}

/**
 * The chemistry terms a run adds in year index `k` (zero before the anchor and for agents the file
 * gives itself), each times its agent's scale, which applies to them as to the rest of the agent:
 * the one place both the temperature loop and forcingByAgent take them from.
 */
export function anchoredChemistryWm2(
  chem: ChemistryAnchor,
  ch4Ppb: ArrayLike<number>,
  n2oPpb: ArrayLike<number>,
  k: number,
  scale: { ozone?: number; strat_h2o?: number } = {},
): ChemistryChange {
  if (k < chem.fromIndex) return { ozone: 0, stratH2o: 0 };
  const r = chem.refIndex;
  const c = methaneChemistryWm2(ch4Ppb[k], n2oPpb[k], ch4Ppb[r], n2oPpb[r]);
  return { ozone: chem.ozone ? (scale.ozone ?? 1) * c.ozone : 0, stratH2o: chem.stratH2o ? (scale.strat_h2o ?? 1) * c.stratH2o : 0 };
}

/** Where a run adds the CH4 and N2O chemistry terms: from `fromIndex` on, relative to the state at `refIndex`. */
export interface ChemistryAnchor {
  fromIndex: number;
  refIndex: number;
  ozone: boolean;
  stratH2o: boolean;
}

/**
 * The chemistry anchor of a pathway on its years (from `Pathway.responsiveFrom`, set by
 * resolveEmissionForcing), or undefined when the file gives ozone and strat. H2O itself.
 * The reference is the year before the first file year (the join), or the first year itself.
 * @example chemistryAnchor(years1750to2100, { year: 2025, ozone: true, stratH2o: true }) // { fromIndex: 275, refIndex: 274, ... }
 */
export function chemistryAnchor(years: Float64Array, responsiveFrom?: { year: number; ozone: boolean; stratH2o: boolean }): ChemistryAnchor | undefined {
  if (!responsiveFrom || !(responsiveFrom.ozone || responsiveFrom.stratH2o)) return undefined;
  const fromIndex = Math.max(0, responsiveFrom.year - years[0]);
  if (fromIndex >= years.length) return undefined;
  return { fromIndex, refIndex: Math.max(0, fromIndex - 1), ozone: responsiveFrom.ozone, stratH2o: responsiveFrom.stratH2o };
}

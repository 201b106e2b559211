import { HALOGEN_PRESENT_DAY, HALOGEN_PRESENT_DAY_YEAR } from '../carbon/halogen-present-day.js';
import { HALOGEN_SPECIES } from '../carbon/halogen-species.js';
import { ConfigError } from '../errors.js';
import type { ForcingAgent } from './agents.js';
import { PREINDUSTRIAL } from './constants.js';
import { eescPpt } from './eesc.js';
import { AR6_OZONE } from './ozone.js';

/**
 * What a run's forcing is attributed to when it is split by what was emitted rather than by forcing
 * agent, in output order: CO2; methane with the ozone it makes and the stratospheric water vapour of
 * its oxidation; N2O with its stratospheric ozone effect; the halogenated gases with the ozone the
 * ozone-depleting ones destroy; the other ozone precursors (NOx, CO and NMVOC together); the aerosol
 * precursors (SO2, BC, OC and NH3 together: aerosol-radiation, aerosol-cloud and BC on snow); and
 * the drivers that are not emitted gases (contrails, land use, solar, volcanic) as themselves.
 */
export const EMITTED_SPECIES = [
  'co2', 'ch4', 'n2o', 'halogens', 'nox_co_nmvoc', 'aerosol_precursors', 'contrails', 'land_use', 'solar', 'volcanic',
] as const;
export type EmittedSpecies = (typeof EMITTED_SPECIES)[number];

/** Words for each emitted species, for tables and notes. */
export const EMITTED_SPECIES_LABELS: Record<EmittedSpecies, string> = {
  co2: 'CO2',
  ch4: 'CH4 (+ ozone, strat. H2O)',
  n2o: 'N2O (+ ozone)',
  halogens: 'halogenated (+ ozone loss)',
  nox_co_nmvoc: 'NOx, CO, NMVOC (ozone)',
  aerosol_precursors: 'SO2, BC, OC, NH3',
  contrails: 'contrails',
  land_use: 'land use',
  solar: 'solar',
  volcanic: 'volcanic',
};

/** The parts of ozone ERF that AR6's linear form gives to CH4, N2O and the ozone-depleting gases, W m-2 relative to 1750, unscaled. */
export interface OzoneShares {
  ch4: Float64Array;
  n2o: Float64Array;
  halogens: Float64Array;
}

/**
 * The ozone ERF that each long-lived driver accounts for in every year, by the linear form of IPCC
 * AR6 WG1 7.SM.1.3.2 (AR6_OZONE; Thornhill et al. 2021): 1.75e-4 W m-2 per ppb of CH4 above 1750,
 * 7.1e-4 per ppb of N2O, -1.25e-4 per ppt of EESC. What is left of the run's ozone is the short-lived
 * precursors' (NOx, CO, NMVOC), the only other drivers of that form.
 *
 * @param ch4Ppb, n2oPpb the run's concentrations, one per year
 * @param eescAnomalyPpt EESC above pre-industrial, ppt, one per year (eescSeries)
 * @example ozoneShares(Float64Array.of(1866.3), Float64Array.of(332.1), Float64Array.of(0)).ch4[0] // ≈ 0.199
 */
export function ozoneShares(ch4Ppb: ArrayLike<number>, n2oPpb: ArrayLike<number>, eescAnomalyPpt: ArrayLike<number>): OzoneShares {
  const n = ch4Ppb.length;
  if (n2oPpb.length !== n || eescAnomalyPpt.length !== n) throw new ConfigError(`ozone shares need one CH4, N2O and EESC value per year (${n}, ${n2oPpb.length}, ${eescAnomalyPpt.length})`, 'forcing');
  const ch4 = new Float64Array(n);
  const n2o = new Float64Array(n);
  const halogens = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    ch4[k] = AR6_OZONE.perCh4Ppb * (ch4Ppb[k] - PREINDUSTRIAL.ch4Ppb);
    n2o[k] = AR6_OZONE.perN2oPpb * (n2oPpb[k] - PREINDUSTRIAL.n2oPpb);
    halogens[k] = AR6_OZONE.perEesc * eescAnomalyPpt[k];
  }
  return { ch4, n2o, halogens };
}

/** EESC above pre-industrial in the year of the bundled present-day halogen concentrations (2019), ppt. */
export function presentDayEescPpt(): number {
  let e = 0;
  for (const g of HALOGEN_SPECIES) e += eescPpt(g, HALOGEN_PRESENT_DAY[g.column].ppt2019 - HALOGEN_PRESENT_DAY[g.column].preindustrialPpt);
  return e;
}

/**
 * EESC above pre-industrial in every year of a run, ppt. Where the run computed the halogenated
 * gases' concentrations (an emission pathway, from its first year on: `computed`), from those. Up to
 * 2019 (the history, whose halogen forcing is AR6's total with no concentrations behind it), EESC is
 * taken to follow the run's halogenated-gas forcing (`other_ghg`), scaled to the EESC of the bundled
 * 2019 concentrations (common practice, no source: the ozone-depleting gases carry about 87 % of that
 * forcing in 2019 and nearly all of it before 1990, but EESC peaked in the late 1990s while their
 * forcing levelled later, so the proxy understates 1990s EESC by up to about a quarter; the warming it
 * moves is a few hundredths of a kelvin). Between 2019 and the first computed year it is interpolated
 * linearly, as the join itself carries the 2019 concentrations forward on their trend. A run without
 * computed concentrations follows the proxy in every year.
 *
 * @param years consecutive integer years of the run
 * @param otherGhgWm2 the run's halogenated-gas ERF, one per year
 * @param computed the EESC of computed concentrations, ppt above pre-industrial, from `fromYear` on
 *   (Pathway.responsiveFrom.eescPpt)
 * @throws ConfigError when the run has neither 2019 nor computed concentrations to anchor to, its
 *   halogen forcing at the anchor is not positive, or the computed EESC does not reach the run's end
 */
export function eescSeries(years: Float64Array, otherGhgWm2: ArrayLike<number>, computed?: { fromYear: number; eescPpt: ArrayLike<number> }): Float64Array {
  const n = years.length;
  const out = new Float64Array(n);
  const proxy = (k: number, anchor: number, anchorEesc: number) => {
    if (!(otherGhgWm2[anchor] > 0)) throw new ConfigError(`halogenated-gas forcing in ${years[anchor]} is ${otherGhgWm2[anchor]} W m-2; EESC cannot be scaled from it`, 'forcing');
    return (anchorEesc * otherGhgWm2[k]) / otherGhgWm2[anchor];
  };
  const i2019 = HALOGEN_PRESENT_DAY_YEAR - years[0];
  const has2019 = i2019 >= 0 && i2019 < n;
  let end = n;
  if (computed) {
    end = computed.fromYear - years[0];
    if (end < 0 || end >= n || computed.eescPpt.length < n - end) {
      throw new ConfigError(`computed EESC covers ${computed.fromYear}-${computed.fromYear + computed.eescPpt.length - 1}, not the run's ${years[0]}-${years[n - 1]} from ${computed.fromYear}`, 'forcing');
    }
    for (let k = end; k < n; k++) out[k] = computed.eescPpt[k - end];
  }
  if (has2019 && i2019 < end) {
    const e2019 = presentDayEescPpt();
    for (let k = 0; k <= i2019; k++) out[k] = proxy(k, i2019, e2019);
    for (let k = i2019 + 1; k < end; k++) out[k] = computed ? e2019 + ((out[end] - e2019) * (k - i2019)) / (end - i2019) : proxy(k, i2019, e2019);
  } else if (computed) {
    for (let k = 0; k < end; k++) out[k] = proxy(k, end, out[end]);
  } else if (!has2019) {
    throw new ConfigError(`EESC is anchored at ${HALOGEN_PRESENT_DAY_YEAR}, outside the run's ${years[0]}-${years[n - 1]}`, 'forcing');
  }
  return out;
}

/**
 * A run's forcing by emitted species (EMITTED_SPECIES): each agent's realised ERF given to what was
 * emitted, with ozone shared out by ozoneShares (times the ozone agent's scale in the run) and the
 * rest of ozone given to NOx, CO and NMVOC, stratospheric water vapour to CH4 (AR6: it comes from CH4
 * oxidation), and the two aerosol agents with BC on snow to the aerosol precursors. Every agent's
 * ERF goes to exactly one species or is split, so the species add up to the agents' total in every
 * year. Not counted (warmcast does not model them): the CO2 that fossil CH4 oxidises to, the
 * effect of NOx, CO and NMVOC on methane's lifetime, and CH4's and NOx's effect on aerosols.
 *
 * @param byAgent the run's ERF by agent, W m-2
 * @param shares ozone shares, unscaled (ozoneShares)
 * @param ozoneScale the factor on the ozone agent in this run (1 as published; a member's scale_ozone)
 * @returns ERF by species, W m-2, one value per year
 */
export function forcingBySpecies(byAgent: Record<ForcingAgent, ArrayLike<number>>, shares: OzoneShares, ozoneScale = 1): Record<EmittedSpecies, Float64Array> {
  const n = byAgent.co2.length;
  const out = Object.fromEntries(EMITTED_SPECIES.map((s) => [s, new Float64Array(n)])) as Record<EmittedSpecies, Float64Array>;
  for (let k = 0; k < n; k++) {
    const o3ch4 = ozoneScale * shares.ch4[k];
    const o3n2o = ozoneScale * shares.n2o[k];
    const o3hal = ozoneScale * shares.halogens[k];
    out.co2[k] = byAgent.co2[k];
    out.ch4[k] = byAgent.ch4[k] + byAgent.strat_h2o[k] + o3ch4;
    out.n2o[k] = byAgent.n2o[k] + o3n2o;
    out.halogens[k] = byAgent.other_ghg[k] + o3hal;
    out.nox_co_nmvoc[k] = byAgent.ozone[k] - o3ch4 - o3n2o - o3hal;
    out.aerosol_precursors[k] = byAgent.aerosol_ari[k] + byAgent.aerosol_aci[k] + byAgent.bc_snow[k];
    out.contrails[k] = byAgent.contrails[k];
    out.land_use[k] = byAgent.land_use[k];
    out.solar[k] = byAgent.solar[k];
    out.volcanic[k] = byAgent.volcanic[k];
  }
  return out;
}

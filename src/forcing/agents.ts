import type { AgentForcingColumn, ForcingColumn } from '../pathway.js';
import { ch4ErfAr6 } from './ch4.js';
import { co2Forcing, forcingOfDoubling, type Co2Formula } from './co2.js';
import { PREINDUSTRIAL } from './constants.js';
import { LUMPED_PARTS, lumpedShare } from './lumped-forcing.js';
import { anchoredChemistryWm2, type ChemistryAnchor } from './methane-chemistry.js';
import { n2oErfAr6 } from './n2o.js';

/**
 * Forcing agents reported separately in every output, in output order: the IPCC AR6 WG1 chapter 7
 * categories (CO2, CH4, N2O, other well-mixed greenhouse gases, ozone, stratospheric water vapour
 * from CH4, contrails and aviation-induced cirrus, aerosol-radiation and aerosol-cloud interactions,
 * black carbon on snow, land use, solar, volcanic).
 */
export const FORCING_AGENTS = [
  'co2', 'ch4', 'n2o', 'other_ghg', 'ozone', 'strat_h2o', 'contrails',
  'aerosol_ari', 'aerosol_aci', 'bc_snow', 'land_use', 'solar', 'volcanic',
] as const;
export type ForcingAgent = (typeof FORCING_AGENTS)[number];

/** Agents computed from concentrations by the gas formulas. */
export const GAS_FORCING_AGENTS = ['co2', 'ch4', 'n2o'] as const;
/** Agents given as prescribed forcing columns (`<agent>_wm2`), in FORCING_AGENTS order. */
export const PRESCRIBED_FORCING_AGENTS = FORCING_AGENTS.filter(
  (a): a is Exclude<ForcingAgent, (typeof GAS_FORCING_AGENTS)[number]> => !(GAS_FORCING_AGENTS as readonly string[]).includes(a),
);
/** The aerosol agents, whose sum is reported as `forcing_aerosol_wm2` and scaled by `aerosolScale`. */
export const AEROSOL_AGENTS = ['aerosol_ari', 'aerosol_aci'] as const;

/** The prescribed input column of a non-gas agent: `ozone` -> `ozone_wm2`. */
export function agentColumn(agent: (typeof PRESCRIBED_FORCING_AGENTS)[number]): AgentForcingColumn {
  return `${agent}_wm2`;
}

/** How greenhouse-gas forcing is computed. */
export interface ForcingOptions {
  /** CO2 expression: `ar6` (default) or `log`. */
  co2Formula: Co2Formula;
  /**
   * ERF of doubled CO2, W m-2. When given, CO2 forcing is scaled by this over the formula's own
   * doubling forcing (so ensembles can sample it); when undefined the formula stands as published.
   */
  forcing2xWm2?: number;
  /** Multiplier on prescribed aerosol forcing, both aerosol-radiation and aerosol-cloud parts (1 = as given). Ensembles sample it. */
  aerosolScale?: number;
  /**
   * Multiplier per agent other than CO2 (whose scale is `forcing2xWm2`), 1 where absent: the
   * calibrated set's representative member carries one per agent. Applies on top of `aerosolScale`.
   */
  agentScale?: Partial<Record<ForcingAgent, number>>;
}

/** Greenhouse-gas ERF at one instant, W m-2. */
export interface GhgForcing {
  co2: number;
  ch4: number;
  n2o: number;
}

/**
 * Returns a function giving the CO2, CH4 and N2O ERF (W m-2, relative to 1750) for concentrations
 * in ppm/ppb, with the CO2 scaling of `options` precomputed.
 *
 * @example ghgForcingFunction({ co2Formula: 'ar6' })(410.1, 1866.3, 332.1) // ≈ { co2: 2.160, ch4: 0.544, n2o: 0.208 }
 */
export function ghgForcingFunction(options: ForcingOptions): (co2Ppm: number, ch4Ppb: number, n2oPpb: number) => GhgForcing {
  const formula = options.co2Formula;
  const co2Scale = options.forcing2xWm2 === undefined ? 1 : options.forcing2xWm2 / forcingOfDoubling(formula);
  const ch4Scale = options.agentScale?.ch4 ?? 1;
  const n2oScale = options.agentScale?.n2o ?? 1;
  return (co2Ppm, ch4Ppb, n2oPpb) => ({
    co2: co2Scale * co2Forcing(formula, co2Ppm, n2oPpb),
    ch4: ch4Scale * ch4ErfAr6(ch4Ppb, n2oPpb),
    n2o: n2oScale * n2oErfAr6(n2oPpb, co2Ppm, ch4Ppb),
  });
}

/** Inputs of {@link forcingByAgent}: annual series on one grid; an absent gas is held at its 1750 value. */
export interface ForcingInputs {
  co2Ppm?: Float64Array;
  ch4Ppb?: Float64Array;
  n2oPpb?: Float64Array;
  /**
   * Prescribed ERF series, W m-2, by column name (`<agent>_wm2`); absent columns count as zero. A
   * lumped `aerosol_wm2` or `other_wm2` stands for its agents in the shares of lumpedShare.
   */
  prescribed?: Partial<Record<ForcingColumn, Float64Array>>;
  /**
   * From `fromIndex` on, ozone and strat. H2O also follow the CH4 and N2O series relative to their
   * values at `refIndex` (methaneChemistryWm2): set for pathways whose forcing was computed from
   * emissions (chemistryAnchor of Pathway.responsiveFrom).
   */
  chemistry?: ChemistryAnchor;
}

/** Forcing by agent and in total, W m-2, one value per year. */
export interface ForcingSeries {
  /** Sum over every agent. */
  total: Float64Array;
  byAgent: Record<ForcingAgent, Float64Array>;
  /** Aerosol-radiation plus aerosol-cloud interactions (the `forcing_aerosol_wm2` output column). */
  aerosol: Float64Array;
}

/**
 * Effective radiative forcing by agent for a pathway's annual series: CO2, CH4 and N2O from the AR6
 * formulas (Meinshausen et al. 2020 with AR6 adjustments, or CO2 by Myhre et al. 1998), every other
 * agent from its prescribed column as given (the two aerosol agents times `aerosolScale`).
 *
 * @param length number of years
 * @param inputs concentration and prescribed series, each of `length`
 * @param options formula choice and scalings
 * @returns new arrays; `total` is the sum of all agents
 */
export function forcingByAgent(length: number, inputs: ForcingInputs, options: ForcingOptions): ForcingSeries {
  const ghg = ghgForcingFunction(options);
  const byAgent = Object.fromEntries(FORCING_AGENTS.map((a) => [a, new Float64Array(length)])) as Record<ForcingAgent, Float64Array>;
  const aerosolScale = options.aerosolScale ?? 1;
  const p = inputs.prescribed ?? {};
  for (let i = 0; i < length; i++) {
    const f = ghg(
      inputs.co2Ppm ? inputs.co2Ppm[i] : PREINDUSTRIAL.co2Ppm,
      inputs.ch4Ppb ? inputs.ch4Ppb[i] : PREINDUSTRIAL.ch4Ppb,
      inputs.n2oPpb ? inputs.n2oPpb[i] : PREINDUSTRIAL.n2oPpb,
    );
    byAgent.co2[i] = f.co2;
    byAgent.ch4[i] = f.ch4;
    byAgent.n2o[i] = f.n2o;
  }
  for (const agent of PRESCRIBED_FORCING_AGENTS) {
    const out = byAgent[agent];
    const column = agentColumn(agent);
    const scale = ((AEROSOL_AGENTS as readonly string[]).includes(agent) ? aerosolScale : 1) * (options.agentScale?.[agent] ?? 1);
    const given = p[column];
    if (given) {
      for (let i = 0; i < length; i++) out[i] = scale * given[i];
      continue;
    }
    for (const lumped of ['aerosol_wm2', 'other_wm2'] as const) {
      const values = p[lumped];
      if (!values || !LUMPED_PARTS[lumped].includes(column)) continue;
      const share = scale * lumpedShare(lumped, column);
      for (let i = 0; i < length; i++) out[i] = share * values[i];
    }
  }
  const chem = inputs.chemistry;
  if (chem && inputs.ch4Ppb && inputs.n2oPpb) {
    const { ch4Ppb, n2oPpb } = inputs;
    for (let i = chem.fromIndex; i < length; i++) {
      const c = anchoredChemistryWm2(chem, ch4Ppb, n2oPpb, i, options.agentScale);
      byAgent.ozone[i] += c.ozone;
      byAgent.strat_h2o[i] += c.stratH2o;
    }
  }
  const total = new Float64Array(length);
  const aerosol = new Float64Array(length);
  for (let i = 0; i < length; i++) {
    let sum = 0;
    for (const a of FORCING_AGENTS) sum += byAgent[a][i];
    total[i] = sum;
    aerosol[i] = byAgent.aerosol_ari[i] + byAgent.aerosol_aci[i];
  }
  return { total, byAgent, aerosol };
}

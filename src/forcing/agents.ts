import type { ForcingColumn } from '../pathway.js';
import { ch4ErfAr6 } from './ch4.js';
import { co2Forcing, forcingOfDoubling, type Co2Formula } from './co2.js';
import { PREINDUSTRIAL } from './constants.js';
import { n2oErfAr6 } from './n2o.js';

/** Forcing agents reported separately in every output, in output order. */
export const FORCING_AGENTS = ['co2', 'ch4', 'n2o', 'aerosol', 'other', 'solar', 'volcanic'] as const;
export type ForcingAgent = (typeof FORCING_AGENTS)[number];

/** How greenhouse-gas forcing is computed. */
export interface ForcingOptions {
  /** CO2 expression: `ar6` (default) or `log`. */
  co2Formula: Co2Formula;
  /**
   * ERF of doubled CO2, W m-2. When given, CO2 forcing is scaled by this over the formula's own
   * doubling forcing (so ensembles can sample it); when undefined the formula stands as published.
   */
  forcing2xWm2?: number;
  /** Multiplier on prescribed aerosol forcing (1 = as given). Ensembles sample it. */
  aerosolScale?: number;
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
  return (co2Ppm, ch4Ppb, n2oPpb) => ({
    co2: co2Scale * co2Forcing(formula, co2Ppm, n2oPpb),
    ch4: ch4ErfAr6(ch4Ppb, n2oPpb),
    n2o: n2oErfAr6(n2oPpb, co2Ppm, ch4Ppb),
  });
}

/** Inputs of {@link forcingByAgent}: annual series on one grid; an absent gas is held at its 1750 value. */
export interface ForcingInputs {
  co2Ppm?: Float64Array;
  ch4Ppb?: Float64Array;
  n2oPpb?: Float64Array;
  /** Prescribed ERF series, W m-2, by column name; absent columns count as zero. */
  prescribed?: Partial<Record<ForcingColumn, Float64Array>>;
}

/** Forcing by agent and in total, W m-2, one value per year. */
export interface ForcingSeries {
  total: Float64Array;
  byAgent: Record<ForcingAgent, Float64Array>;
}

/**
 * Effective radiative forcing by agent for a pathway's annual series: CO2, CH4 and N2O from the AR6
 * formulas (Meinshausen et al. 2020 with AR6 adjustments, or CO2 by Myhre et al. 1998), prescribed
 * aerosol/other/solar/volcanic columns added as given (aerosol times `aerosolScale`).
 *
 * @param length number of years
 * @param inputs concentration and prescribed series, each of `length`
 * @param options formula choice and scalings
 * @returns new arrays; `total` is the sum of all agents
 */
export function forcingByAgent(length: number, inputs: ForcingInputs, options: ForcingOptions): ForcingSeries {
  const ghg = ghgForcingFunction(options);
  const byAgent = Object.fromEntries(FORCING_AGENTS.map((a) => [a, new Float64Array(length)])) as Record<ForcingAgent, Float64Array>;
  const total = new Float64Array(length);
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
    byAgent.aerosol[i] = p.aerosol_wm2 ? aerosolScale * p.aerosol_wm2[i] : 0;
    byAgent.other[i] = p.other_wm2 ? p.other_wm2[i] : 0;
    byAgent.solar[i] = p.solar_wm2 ? p.solar_wm2[i] : 0;
    byAgent.volcanic[i] = p.volcanic_wm2 ? p.volcanic_wm2[i] : 0;
    let sum = 0;
    for (const a of FORCING_AGENTS) sum += byAgent[a][i];
    total[i] = sum;
  }
  return { total, byAgent };
}

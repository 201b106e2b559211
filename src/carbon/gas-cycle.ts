import { MT_CH4_PER_PPB, MT_N2O_PER_PPB } from './units.js';

/**
 * A well-mixed gas removed by one first-order sink: its mass balance is
 *   m dc/dt = E_anthropogenic + E_natural - m c / tau(c),
 * with c the mole fraction (ppb), m the Mt per ppb, and a lifetime that may depend on the burden as
 *   tau(c) = tau_ref (c / c_ref)^s.
 * With s = 1 - tau_total / tau_perturbation the sink's slope at c_ref is m / tau_perturbation, so the
 * burden responds to an extra emission with the perturbation lifetime while the steady-state burden
 * follows the total lifetime (Prather et al. 2012, GRL 39, L09803, section 2, "feedback factor").
 */
export interface GasCycle {
  /** Display name. */
  name: string;
  /** Mt of the gas per ppb, Mt ppb-1. */
  mtPerPpb: number;
  /** Total atmospheric lifetime tau_ref at `referencePpb`, yr. */
  lifetimeYr: number;
  /** Concentration at which `lifetimeYr` holds, ppb. */
  referencePpb: number;
  /** s = d ln(tau) / d ln(c), dimensionless; 0 for a constant lifetime. */
  lifetimeExponent: number;
}

/**
 * CH4: total lifetime 9.1 yr (Prather et al. 2012, assessed again in IPCC AR6 WG1 section 6.2.2; from
 * memory), perturbation lifetime 11.8 yr (IPCC AR6 WG1 Table 7.15; from memory), so
 * s = 1 - 9.1 / 11.8 = 0.229; the 9.1 yr refers to the about 1800 ppb of 2010 (from memory);
 * 2.75 Mt per ppb ({@link MT_CH4_PER_PPB}). The lifetime lengthens with the burden as OH is used up.
 * Emission-driven runs use {@link withConstantLifetime} of it unless asked otherwise: extrapolated
 * back to 1750 the burden dependence gives a 7.4 yr lifetime, 271 Mt CH4 yr-1 of implied natural emissions
 * and present-day anthropogenic emissions 15 % below inventories (src/carbon/README.md).
 */
export const CH4_CYCLE: GasCycle = {
  name: 'CH4',
  mtPerPpb: MT_CH4_PER_PPB,
  lifetimeYr: 9.1,
  referencePpb: 1800,
  lifetimeExponent: 1 - 9.1 / 11.8,
};

/**
 * N2O: lifetime 109 yr, taken as constant (IPCC AR6 WG1 Table 7.15; from memory); 7.526 Mt N2O per
 * ppb ({@link MT_N2O_PER_PPB}).
 */
export const N2O_CYCLE: GasCycle = {
  name: 'N2O',
  mtPerPpb: MT_N2O_PER_PPB,
  lifetimeYr: 109,
  referencePpb: 270.1,
  lifetimeExponent: 0,
};

/**
 * The same cycle with a constant lifetime (the total lifetime at the reference burden).
 * @example withConstantLifetime(CH4_CYCLE).lifetimeExponent // 0
 */
export function withConstantLifetime(cycle: GasCycle): GasCycle {
  return { ...cycle, lifetimeExponent: 0 };
}

/**
 * CH4 after the join of an emission pathway with the concentration history: the total lifetime
 * 9.1 yr at the join's concentration, lengthening with the burden from there with the exponent of
 * {@link CH4_CYCLE}, so that a change in emissions decays with the perturbation lifetime of 11.8 yr
 * (IPCC AR6 WG1 Table 7.15; Prather et al. 2012 "feedback factor" 11.8 / 9.1 = 1.30, applied to
 * perturbations about the present-day state). Before the join the history's concentrations are
 * followed with the constant 9.1 yr lifetime, which chemistry-climate models find nearly unchanged
 * since pre-industrial times because rising NOx and CO offset the OH loss from more CH4 (Naik et al.
 * 2013, ACP 13, 5277; from memory): the natural emissions implied in 1750 (220 Mt CH4 yr-1) and the
 * anthropogenic emissions diagnosed for 2019 (373 Mt CH4 yr-1, inventories about 360-380) stay those
 * of the constant lifetime, and the sink is continuous at the join.
 *
 * @param joinPpb the concentration at the join (the last history year), ppb
 * @param lifetimeScale multiplier on the total lifetime (an ensemble's CH4 lifetime scale; default 1)
 * @example gasLifetimeYr(ch4CycleFromJoin(1930), 1930) // 9.1
 */
export function ch4CycleFromJoin(joinPpb: number, lifetimeScale = 1): GasCycle {
  return { ...CH4_CYCLE, lifetimeYr: CH4_CYCLE.lifetimeYr * lifetimeScale, referencePpb: joinPpb };
}

/**
 * Atmospheric lifetime at a concentration, yr: tau_ref (c / c_ref)^s.
 * @example gasLifetimeYr(CH4_CYCLE, 1800) // 9.1
 */
export function gasLifetimeYr(cycle: GasCycle, ppb: number): number {
  if (cycle.lifetimeExponent === 0) return cycle.lifetimeYr;
  return cycle.lifetimeYr * Math.pow(ppb / cycle.referencePpb, cycle.lifetimeExponent);
}

/**
 * Removal by the sink, Mt yr-1: m c / tau(c).
 * @example gasSinkMt(N2O_CYCLE, 270.1) // ≈ 18.65
 */
export function gasSinkMt(cycle: GasCycle, ppb: number): number {
  return (cycle.mtPerPpb * ppb) / gasLifetimeYr(cycle, ppb);
}

/**
 * Rate of change of the concentration, ppb yr-1: (E + E_natural - sink(c)) / m.
 *
 * @param ppb concentration c, ppb
 * @param emissionsMt anthropogenic emissions, Mt yr-1
 * @param naturalMt natural emissions, Mt yr-1 (the pre-industrial sink, so that the start is steady)
 */
export function gasTendencyPpbPerYr(cycle: GasCycle, ppb: number, emissionsMt: number, naturalMt: number): number {
  return (emissionsMt + naturalMt - gasSinkMt(cycle, ppb)) / cycle.mtPerPpb;
}

/**
 * The anthropogenic emissions that give a concentration change, Mt yr-1: the mass balance solved for
 * E, m dc/dt + sink(c) - E_natural.
 *
 * @param ppb concentration, ppb
 * @param tendencyPpbPerYr dc/dt, ppb yr-1
 * @param naturalMt natural emissions, Mt yr-1
 * @example gasEmissionsForTendency(N2O_CYCLE, 270.1, 0, gasSinkMt(N2O_CYCLE, 270.1)) // 0
 */
export function gasEmissionsForTendency(cycle: GasCycle, ppb: number, tendencyPpbPerYr: number, naturalMt: number): number {
  return cycle.mtPerPpb * tendencyPpbPerYr + gasSinkMt(cycle, ppb) - naturalMt;
}

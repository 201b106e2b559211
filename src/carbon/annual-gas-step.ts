import { gasLifetimeYr, type GasCycle } from './gas-cycle.js';

/** One calendar year of a single-lifetime gas: where it ends, its annual mean, its emissions. */
export interface GasYear {
  /** Concentration at 1 January of the next year, ppb. */
  endPpb: number;
  /** Annual mean over the year, ppb. */
  meanPpb: number;
  /** Anthropogenic emission total of the year, Mt (given or diagnosed). */
  emissionMt: number;
}

/**
 * Steps a single-lifetime gas over one calendar year, m dc/dt = E + E_natural - m c / tau(c), with
 * the emissions constant within the year (so the year's total is E) and the lifetime held at its
 * value for the year's middle concentration, (c_0 + c_1) / 2 (exact for a constant lifetime; for a
 * burden-dependent one the midpoint keeps the error second order in the year's change, where a
 * lifetime frozen at 1 January would turn the 11.8 yr CH4 perturbation lifetime into 12.0 yr).
 * With d = exp(-1/tau), g = tau (1 - d) and q = (E + E_natural) / m:
 *   c_1 = c_0 d + q g,   annual mean = c_0 g + q (tau - tau g).
 * Either the emissions are given (c_1 from a first pass at tau(c_0), then the step again at the
 * midpoint lifetime), or the end concentration is and E is diagnosed from it:
 * E = m (c_1 - c_0 d) / g - E_natural.
 *
 * @param cycle the gas (its Mt per ppb and lifetime)
 * @param startPpb concentration at 1 January, ppb
 * @param naturalMt natural emissions, Mt yr-1
 * @param emissionMt the year's anthropogenic emission total, Mt, or NaN to diagnose it from `endPpb`
 * @param endPpb the concentration at the next 1 January when `emissionMt` is NaN, ppb
 * @example
 * gasYear(N2O_CYCLE, 270.1, gasSinkMt(N2O_CYCLE, 270.1), 0, NaN) // { endPpb: 270.1, meanPpb: 270.1, emissionMt: 0 }
 */
export function gasYear(cycle: GasCycle, startPpb: number, naturalMt: number, emissionMt: number, endPpb: number): GasYear {
  if (Number.isNaN(emissionMt)) return step(cycle, startPpb, naturalMt, NaN, endPpb, gasLifetimeYr(cycle, 0.5 * (startPpb + endPpb)));
  const first = step(cycle, startPpb, naturalMt, emissionMt, NaN, gasLifetimeYr(cycle, startPpb));
  if (cycle.lifetimeExponent === 0) return first;
  return step(cycle, startPpb, naturalMt, emissionMt, NaN, gasLifetimeYr(cycle, 0.5 * (startPpb + first.endPpb)));
}

/** The closed-form year at a fixed lifetime tau. */
function step(cycle: GasCycle, startPpb: number, naturalMt: number, emissionMt: number, endPpb: number, tau: number): GasYear {
  const m = Math.expm1(-1 / tau);
  const d = 1 + m;
  const g = -tau * m;
  const e = Number.isNaN(emissionMt) ? (cycle.mtPerPpb * (endPpb - startPpb * d)) / g - naturalMt : emissionMt;
  const q = (e + naturalMt) / cycle.mtPerPpb;
  return { endPpb: startPpb * d + q * g, meanPpb: startPpb * g + q * (tau - tau * g), emissionMt: e };
}

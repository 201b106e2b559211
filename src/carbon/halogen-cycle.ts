import type { HalogenSpecies } from './halogen-species.js';

/**
 * Moles of dry air in the atmosphere: 5.1352e18 kg (total mass, Trenberth and Smith 2005, J. Climate
 * 18, 864; from memory) over 28.97 g mol-1. 1 ppt of a gas of molar mass M is then 0.17726 M kt.
 */
const AIR_MOLES = 5.1352e18 / 28.97e-3;

/**
 * kt of a gas per ppt of its dry-air mole fraction, kt ppt-1.
 * @example ktPerPpt(146.06) // ≈ 25.89 (SF6)
 */
export function ktPerPpt(molarMass: number): number {
  return (AIR_MOLES * 1e-12 * molarMass) / 1e9;
}

/**
 * One halogenated gas removed by a single first-order sink with its AR6 lifetime tau:
 *   m dC/dt = E + E_natural - m C / tau,
 * with C in ppt, m = ktPerPpt(M), E the emissions in kt yr-1 and E_natural = m C_pi / tau the
 * natural source that holds the pre-industrial concentration C_pi. The anomaly D = C - C_pi obeys
 * m dD/dt = E - m D / tau: the form IPCC AR6 WG1 (7.6.1.1, Table 7.SM.7) uses for the metrics.
 *
 * With emissions constant within each calendar year (the pathway convention), a year starting at
 * anomaly D0 with emission E ends at
 *   D1 = D_eq + (D0 - D_eq) exp(-1/tau),   D_eq = E tau / m,
 * and its annual mean is D_eq + (D0 - D_eq) tau (1 - exp(-1/tau)), both exact.
 *
 * @param species the gas (lifetime, molar mass)
 * @param startAnomalyPpt D on 1 January of the first year, ppt above pre-industrial
 * @param emissionsKt one emission total per year, kt yr-1
 * @returns annual-mean anomalies, ppt, one per year
 * @example
 * halogenAnomalyPpt(sf6, 0, Float64Array.of(1000)) // ≈ [0.0193] (1 Mt in one year: half a year's mean)
 */
export function halogenAnomalyPpt(species: Pick<HalogenSpecies, 'lifetimeYr' | 'molarMass'>, startAnomalyPpt: number, emissionsKt: ArrayLike<number>): Float64Array {
  const m = ktPerPpt(species.molarMass);
  const tau = species.lifetimeYr;
  const decay = Math.exp(-1 / tau);
  // tau (1 - exp(-1/tau)), written to keep precision for lifetimes of thousands of years.
  const meanFactor = -tau * Math.expm1(-1 / tau);
  const out = new Float64Array(emissionsKt.length);
  let d = startAnomalyPpt;
  for (let k = 0; k < emissionsKt.length; k++) {
    const eq = (emissionsKt[k] * tau) / m;
    out[k] = eq + (d - eq) * meanFactor;
    d = eq + (d - eq) * decay;
  }
  return out;
}

/**
 * Anthropogenic emissions that hold a concentration anomaly D changing at dD/dt, kt yr-1:
 * m (dD/dt + D / tau), the mass balance solved for E.
 * @example halogenEmissionsKt(hfc134a, 107.6, 5.5) // ≈ 238 kt yr-1 (2019, HFC-134a)
 */
export function halogenEmissionsKt(species: Pick<HalogenSpecies, 'lifetimeYr' | 'molarMass'>, anomalyPpt: number, trendPptPerYr: number): number {
  return ktPerPpt(species.molarMass) * (trendPptPerYr + anomalyPpt / species.lifetimeYr);
}

/**
 * ERF of a concentration anomaly, W m-2: radiative efficiency (W m-2 ppb-1) x anomaly (ppt) / 1000.
 * IPCC AR6 WG1 7.3.2.4 takes the ERF of halogenated gases equal to their radiative forcing (no
 * tropospheric adjustment; from memory).
 * @example halogenForcingWm2(cfc12, 503) // ≈ 0.180
 */
export function halogenForcingWm2(species: Pick<HalogenSpecies, 'radiativeEfficiency'>, anomalyPpt: number): number {
  return (species.radiativeEfficiency * anomalyPpt) / 1000;
}

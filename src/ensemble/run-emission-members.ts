import { annualCarbonState, resetAnnualCarbonState, type AnnualCarbonState } from '../carbon/annual-carbon-step.js';
import { co2YearInto, type Co2YearDrivers } from '../carbon/co2-year.js';
import type { TwoBoxPropagator } from '../climate/exact-propagator.js';
import { ghgForcingFunction } from '../forcing/agents.js';
import type { Co2Formula } from '../forcing/co2.js';
import type { ExceedanceCounter } from './exceedance-counter.js';
import { runMemberLoop } from './member-stage.js';
import type { MemberBlock, MemberTask } from './run-members.js';

/**
 * What each member of an emission-driven ensemble needs to run its own carbon cycle, as plain data
 * (sent to worker threads as is), one value per calendar year of the ensemble's grid.
 */
export interface MemberCarbonTask {
  /** The CO2 drivers of each year (co2YearDrivers): record increases, then emission totals. */
  co2: Co2YearDrivers;
  /** CH4 and N2O annual means, ppb (from the central run: they have no climate feedback). */
  ch4Ppb: Float64Array;
  n2oPpb: Float64Array;
}

/**
 * One emission-driven member's surface warming in every year (relative to the starting
 * equilibrium), written into `surfaceOut`. Year k: the carbon cycle takes the production step
 * co2YearInto (the step runEmissionDriven takes) with the member's warming of year k - 1, giving
 * the year's annual-mean CO2; its ERF with the member's 2xCO2 scaling (CH4 and N2O from the central
 * series) joins the other agents; the exact two-box propagator steps the temperatures from year
 * k - 1 with forcing linear between the years.
 *
 * @param carbon the CO2 drivers
 * @param co2Formula CO2 formula
 * @param otherWm2 ERF of every agent but CO2, CH4, N2O and aerosol, W m-2, per year
 * @param aerosolWm2 aerosol ERF per year, W m-2
 * @param prop the member's one-year propagator
 * @param co2Scale multiplier on the formula's CO2 ERF
 * @param aerosolScale multiplier on `aerosolWm2`
 * @param irf100Scale multiplier on the pre-industrial iIRF100
 * @param state carbon state (reset here)
 * @param surfaceOut receives the surface warming, K
 * @param co2Out receives the member's annual-mean CO2, ppm (optional)
 */
export function emissionMemberWarmingInto(
  carbon: MemberCarbonTask,
  co2Formula: Co2Formula,
  otherWm2: Float64Array,
  aerosolWm2: Float64Array,
  prop: TwoBoxPropagator,
  co2Scale: number,
  aerosolScale: number,
  irf100Scale: number,
  state: AnnualCarbonState,
  surfaceOut: Float64Array,
  co2Out?: Float64Array,
): void {
  const ghg = ghgForcingFunction({ co2Formula });
  const { co2: drivers, ch4Ppb, n2oPpb } = carbon;
  const n = otherWm2.length;
  resetAnnualCarbonState(state);
  const { phi, g0, g1 } = prop;
  const forcingAt = (k: number, ppm: number): number => {
    const f = ghg(ppm, ch4Ppb[k], n2oPpb[k]);
    return co2Scale * f.co2 + f.ch4 + f.n2o + aerosolScale * aerosolWm2[k] + otherWm2[k];
  };
  let t = 0;
  let d = 0;
  let ppm = co2YearInto(state, drivers, 0, t, irf100Scale);
  let f0 = forcingAt(0, ppm);
  surfaceOut[0] = 0;
  if (co2Out) co2Out[0] = ppm;
  for (let k = 1; k < n; k++) {
    ppm = co2YearInto(state, drivers, k, t, irf100Scale);
    const f1 = forcingAt(k, ppm);
    const df = f1 - f0;
    const tn = phi[0] * t + phi[1] * d + g0[0] * f0 + g1[0] * df;
    d = phi[2] * t + phi[3] * d + g0[1] * f0 + g1[1] * df;
    t = tn;
    surfaceOut[k] = t;
    if (co2Out) co2Out[k] = ppm;
    f0 = f1;
  }
}

/**
 * runMembersInto for an emission-driven task: draws each member (with its carbon-cycle multiplier)
 * from its own stream, runs {@link emissionMemberWarmingInto} and stores the warming relative to the
 * member's baseline mean (summed in year order, as `rebase` does).
 *
 * @returns unphysical draws discarded in total
 */
export function runEmissionMembersInto(
  task: MemberTask,
  carbon: MemberCarbonTask,
  from: number,
  to: number,
  block: MemberBlock,
  onProgress?: (done: number) => void,
  exceedance?: ExceedanceCounter,
): number {
  const n = task.otherWm2.length;
  const state = annualCarbonState();
  return runMemberLoop(task, n, from, to, block, true, onProgress, exceedance, (draw, prop, rows, offset) => {
    const row = rows.subarray(offset, offset + n);
    emissionMemberWarmingInto(carbon, task.co2Formula, task.otherWm2, task.aerosolWm2, prop, draw.forcing2xScale, draw.aerosolScale, draw.irf100Scale, state, row);
  });
}

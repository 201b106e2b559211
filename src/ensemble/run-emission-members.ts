import { annualCarbonState, annualCarbonStepForIncreaseInto, annualCarbonStepInto, atmosphericGtc, type AnnualCarbonState } from '../carbon/annual-carbon-step.js';
import { GTC_PER_PPM } from '../carbon/units.js';
import type { TwoBoxPropagator } from '../climate/exact-propagator.js';
import { ghgForcingFunction } from '../forcing/agents.js';
import type { Co2Formula } from '../forcing/co2.js';
import type { ExceedanceCounter } from './exceedance-counter.js';
import { runMemberLoop } from './member-stage.js';
import type { MemberBlock, MemberTask } from './run-members.js';

/**
 * What each member of an emission-driven ensemble needs to run its own carbon cycle, as plain data
 * (sent to worker threads as is). Node values on the ensemble's annual grid.
 */
export interface MemberCarbonTask {
  /** CO2 concentration at nodes where it is given (the spliced history), ppm; NaN where emissions are. */
  co2Ppm: Float64Array;
  /** CO2 emission rate at nodes where it is given, Gt C yr-1; NaN where the concentration is. */
  co2EmissionGtcPerYr: Float64Array;
  /** CO2 of the starting equilibrium, ppm (the first node's, or pre-industrial when it is an emission node). */
  co2StartPpm: number;
  /** CH4 and N2O concentrations at every node, ppb (from the central run: they have no climate feedback). */
  ch4Ppb: Float64Array;
  n2oPpb: Float64Array;
}

/**
 * One emission-driven member's surface warming at every node (relative to the starting
 * equilibrium), written into `surfaceOut`. Year k -> k+1: the carbon cycle steps with the warming at
 * node k (annualCarbonStepInto; in concentration years annualCarbonStepForIncreaseInto, which
 * diagnoses the emission that reproduces the given concentration), the CO2 ERF at node k+1 follows
 * from the new concentration with the member's 2xCO2 scaling (CH4 and N2O from the central series),
 * and the exact two-box propagator steps the temperatures with forcing linear over the year.
 * Emission years use the mean of the node rates (the integral of emissions linear between nodes);
 * the year after the last concentration node uses the mean of the last diagnosed rate and the first
 * given one, as runEmissionDriven joins them.
 *
 * @param carbon the CO2 drivers
 * @param co2Formula CO2 formula
 * @param otherWm2 ERF of every agent but CO2, CH4 and N2O, W m-2, per node
 * @param prop the member's one-year propagator
 * @param co2Scale multiplier on the formula's CO2 ERF
 * @param aerosolScale multiplier on `aerosolWm2`
 * @param aerosolWm2 aerosol ERF per node, W m-2
 * @param irf100Scale multiplier on the pre-industrial iIRF100
 * @param state carbon state (reset here)
 * @param surfaceOut receives the surface warming, K
 * @param co2Out receives the member's CO2, ppm (optional)
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
  const { co2Ppm: given, co2EmissionGtcPerYr: emission, co2StartPpm, ch4Ppb, n2oPpb } = carbon;
  const n = otherWm2.length;
  state.boxesGtc.fill(0);
  state.uptakeGtc = 0;
  state.emittedGtc = 0;
  state.alpha = 1;
  const { phi, g0, g1 } = prop;
  const forcingAt = (k: number, ppm: number): number => {
    const f = ghg(ppm, ch4Ppb[k], n2oPpb[k]);
    return co2Scale * f.co2 + f.ch4 + f.n2o + aerosolScale * aerosolWm2[k] + otherWm2[k];
  };
  let t = 0;
  let d = 0;
  let ppm = Number.isNaN(given[0]) ? co2StartPpm : given[0];
  let f0 = forcingAt(0, ppm);
  let lastRate = 0;
  surfaceOut[0] = 0;
  if (co2Out) co2Out[0] = ppm;
  for (let k = 0; k + 1 < n; k++) {
    if (!Number.isNaN(given[k + 1])) {
      lastRate = annualCarbonStepForIncreaseInto(state, t, irf100Scale, GTC_PER_PPM * (given[k + 1] - given[k]));
      ppm = given[k + 1];
    } else {
      const start = Number.isNaN(emission[k]) ? lastRate : emission[k];
      annualCarbonStepInto(state, t, irf100Scale, 0.5 * (start + emission[k + 1]));
      ppm = co2StartPpm + atmosphericGtc(state) / GTC_PER_PPM;
    }
    const f1 = forcingAt(k + 1, ppm);
    const df = f1 - f0;
    const tn = phi[0] * t + phi[1] * d + g0[0] * f0 + g1[0] * df;
    d = phi[2] * t + phi[3] * d + g0[1] * f0 + g1[1] * df;
    t = tn;
    surfaceOut[k + 1] = t;
    if (co2Out) co2Out[k + 1] = ppm;
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

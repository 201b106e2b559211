import type { Co2Formula } from '../forcing/co2.js';
import type { ExceedanceCounter } from './exceedance-counter.js';
import type { MemberParameter } from './sample-members.js';
import { runMemberLoop } from './member-stage.js';
import { runEmissionMembersInto, type MemberCarbonTask } from './run-emission-members.js';
import type { EnsembleSampling } from './sampling.js';

/**
 * Everything a member run needs, as plain data (it is sent to worker threads as is).
 *
 * Concentration-driven runs: a member's forcing is its CO2 multiplier times the CO2 agent, its
 * aerosol multiplier times the aerosol agent, plus the sum of the other agents, all precomputed once
 * per pathway. Emission-driven runs carry `carbon`: each member then steps its own CO2 concentration
 * with the annual carbon-cycle step (run-emission-members.ts), driven by its own warming and its
 * carbon-cycle multiplier (drawn after its climate parameters, so the climate draws of member i
 * stay the same); `co2Wm2` is then unused and `otherWm2` holds the agents other than CO2.
 */
export interface MemberTask {
  seed: number;
  sampling: EnsembleSampling;
  /** Formula the CO2 agent was computed with, at its own 2xCO2 forcing. */
  co2Formula: Co2Formula;
  /** CO2 ERF at each year, W m-2 (unscaled). */
  co2Wm2: Float64Array;
  /** Aerosol ERF at each year, W m-2 (unscaled). */
  aerosolWm2: Float64Array;
  /** Sum of every other agent's ERF at each year, W m-2. */
  otherWm2: Float64Array;
  /** Indices of the first and last baseline years (inclusive). */
  baselineFrom: number;
  baselineTo: number;
  /** Emission-driven runs: the CO2 drivers of each member's carbon cycle (absent for concentration runs). */
  carbon?: MemberCarbonTask;
}

/**
 * Where member results go: a block of `memberCount` members starting at member `blockStart`, stored
 * year-major (all members of year 0, then of year 1, ...), the layout per-year statistics read.
 */
export interface MemberBlock {
  /** Global index of the block's first member. */
  blockStart: number;
  /** Members in the block (the length of each year's row). */
  memberCount: number;
  /** Warming relative to the baseline mean, K: year k of member blockStart + r at k * memberCount + r. */
  warmingK: Float64Array;
  /** Parameters of each member, indexed by r. */
  parameters: Record<MemberParameter, Float64Array>;
}

/** How often (in members) a member run reports progress. */
export const PROGRESS_EVERY = 250;

/**
 * Runs members [from, to): draws each member's parameters from its own stream (so the result of
 * member i depends only on the seed and i), builds its exact one-year propagator (the closed-form
 * modal one, equal to `twoBoxPropagator` to rounding) and steps the two-box model from equilibrium
 * exactly as `propagateTwoBoxInto` does, assembling the member's forcing year by year on the way,
 * then stores the surface warming relative to the member's own baseline mean.
 *
 * @param task the shared inputs
 * @param from first member (global index)
 * @param to end member, exclusive
 * @param block receives members from..to-1 (which must lie within it)
 * @param onProgress called with the number of members done so far in this call
 * @param exceedance receives each member's threshold exceedances, counted while its row is in cache (optional)
 * @returns unphysical draws discarded in total
 */
export function runMembersInto(
  task: MemberTask,
  from: number,
  to: number,
  block: MemberBlock,
  onProgress?: (done: number) => void,
  exceedance?: ExceedanceCounter,
): number {
  if (task.carbon) return runEmissionMembersInto(task, task.carbon, from, to, block, onProgress, exceedance);
  const n = task.co2Wm2.length;
  const { co2Wm2, aerosolWm2, otherWm2 } = task;
  return runMemberLoop(task, n, from, to, block, false, onProgress, exceedance, (draw, prop, stage, row) => {
    const { phi, g0, g1 } = prop;
    const co2Scale = draw.forcing2xScale;
    const aerosolScale = draw.aerosolScale;
    // propagateTwoBoxInto (src/climate/exact-propagator.ts) with the member's forcing assembled as it
    // goes, operation for operation, so that no forcing or deep-ocean series is stored.
    const p00 = phi[0];
    const p01 = phi[1];
    const p10 = phi[2];
    const p11 = phi[3];
    const g0t = g0[0];
    const g0d = g0[1];
    const g1t = g1[0];
    const g1d = g1[1];
    let t = 0;
    let d = 0;
    let f0 = co2Scale * co2Wm2[0] + aerosolScale * aerosolWm2[0] + otherWm2[0];
    stage[row] = 0;
    for (let k = 0; k + 1 < n; k++) {
      const f1 = co2Scale * co2Wm2[k + 1] + aerosolScale * aerosolWm2[k + 1] + otherWm2[k + 1];
      const df = f1 - f0;
      const tn = p00 * t + p01 * d + g0t * f0 + g1t * df;
      d = p10 * t + p11 * d + g0d * f0 + g1d * df;
      t = tn;
      stage[row + k + 1] = t;
      f0 = f1;
    }
  });
}


import { annualCarbonState } from '../carbon/annual-carbon-step.js';
import { co2YearInto, type Co2YearDrivers } from '../carbon/co2-year.js';
import { emptyTwoBoxSteps, stepTwoBoxInto, twoBoxStepsInto, type TwoBoxSteps } from '../climate/two-box-step.js';
import { FORCING_AGENTS, ghgForcingFunction, type ForcingAgent } from '../forcing/agents.js';
import type { Co2Formula } from '../forcing/co2.js';
import { forcingScaleKey, sliceMemberParameters, type MemberParameters } from './member-parameters.js';

/**
 * What each member of an emission-driven ensemble needs to run its own carbon cycle, as plain data,
 * one value per calendar year of the ensemble's grid.
 */
export interface MemberCarbonTask {
  /** The CO2 drivers of each year (co2YearDrivers): record increases, then emission totals. */
  co2: Co2YearDrivers;
  /** CH4 and N2O annual means, ppb (from the central run: they have no climate feedback). */
  ch4Ppb: Float64Array;
  n2oPpb: Float64Array;
}

/** The forcing members share, as plain data. */
export interface MemberTask {
  /** Formula the CO2 agent was computed with (at its own 2xCO2 forcing). */
  co2Formula: Co2Formula;
  /** ERF of each agent at each year node, W m-2, unscaled. */
  forcing: Record<ForcingAgent, Float64Array>;
  /**
   * Emission-driven runs: the drivers of each member's own carbon cycle. Members then compute their
   * CO2, CH4 and N2O forcing from their own CO2 and the central CH4 and N2O (`forcing`'s values of
   * those three agents are not used).
   */
  carbon?: MemberCarbonTask;
}

/** The greenhouse gases an emission-driven member computes itself. */
const OWN_GASES: readonly ForcingAgent[] = ['co2', 'ch4', 'n2o'];

/**
 * Members stepped together through all the years before the next ones start: their step
 * coefficients, state and forcing (about 14 values each, 56 kB) then stay in the processor's cache.
 */
const BLOCK_MEMBERS = 512;

/**
 * Runs every member from rest through the years: year by year, each member's forcing is the sum over
 * agents of its `scale_<agent>` times the agent's series (members of an emission-driven run first
 * step their own carbon cycle, see {@link MemberTask}), then the one two-box step of
 * src/climate/two-box-step.ts advances the members together. Members go in blocks of 512.
 *
 * @param task the forcing the members share
 * @param members the members' parameters (two-box keys, scale_<agent>, `irf100_scale` for carbon)
 * @param onProgress called after each block with the members done
 * @param co2Out emission-driven runs: receives each member's CO2, ppm, in the same layout (optional)
 * @returns the surface temperature anomaly from rest, K, year-major: year k of member r at k * count + r
 * @example runMembers(task, members)[k * members.count + r] // member r in year k
 */
export function runMembers(task: MemberTask, members: MemberParameters, onProgress?: (done: number) => void, co2Out?: Float64Array): Float64Array {
  const m = members.count;
  const n = task.forcing.co2.length;
  const surfaceK = new Float64Array(m * n);
  for (let r0 = 0; r0 < m; r0 += BLOCK_MEMBERS) {
    const r1 = Math.min(m, r0 + BLOCK_MEMBERS);
    const block = sliceMemberParameters(members, r0, r1);
    // Year k of the block's member j goes to k * m + r0 + j.
    const store = (k: number, t: Float64Array) => surfaceK.set(t, k * m + r0);
    if (task.carbon) runWithCarbon(task, block, store, co2Out && ((k, ppm) => co2Out.set(ppm, k * m + r0)));
    else runBlock(task, block, store);
    onProgress?.(r1);
  }
  return surfaceK;
}

/** The block's two-box step coefficients. */
function blockSteps(block: MemberParameters): TwoBoxSteps {
  const v = block.values;
  return twoBoxStepsInto(
    { feedbackWm2K: v.feedback_wm2k, upperHeatCapacity: v.upper_heat_capacity, deepHeatCapacity: v.deep_heat_capacity, exchangeWm2K: v.exchange_wm2k, deepEfficacy: v.deep_efficacy },
    emptyTwoBoxSteps(block.count),
  );
}

/**
 * The forcing of the block's members in year k, into `out`: agents without a scale add the same to
 * every member (one sum per year, made once); the others are scaled member by member. Agents in
 * `skip` are left out (the gases emission-driven members compute themselves).
 */
function blockForcing(task: MemberTask, block: MemberParameters, skip: readonly ForcingAgent[]): (k: number, out: Float64Array) => void {
  const n = task.forcing.co2.length;
  const shared = new Float64Array(n);
  const scaled: { series: Float64Array; scale: Float64Array }[] = [];
  for (const agent of FORCING_AGENTS) {
    if (skip.includes(agent)) continue;
    const scale = block.values[forcingScaleKey(agent)];
    if (scale) scaled.push({ series: task.forcing[agent], scale });
    else for (let k = 0; k < n; k++) shared[k] += task.forcing[agent][k];
  }
  return (k, out) => {
    out.fill(shared[k]);
    for (const { series, scale } of scaled) {
      const f = series[k];
      for (let r = 0; r < out.length; r++) out[r] += scale[r] * f;
    }
  };
}

/** The year loop of concentration-driven members: forcing, then the two-box step. */
function runBlock(task: MemberTask, block: MemberParameters, store: (k: number, t: Float64Array) => void): void {
  const n = task.forcing.co2.length;
  const steps = blockSteps(block);
  const forcingInto = blockForcing(task, block, []);
  let start = new Float64Array(block.count);
  let end = new Float64Array(block.count);
  const t = new Float64Array(block.count);
  const d = new Float64Array(block.count);
  forcingInto(0, start);
  for (let k = 0; k + 1 < n; k++) {
    forcingInto(k + 1, end);
    stepTwoBoxInto(steps, start, end, t, d);
    store(k + 1, t);
    [start, end] = [end, start];
  }
}

/**
 * The year loop of emission-driven members. Year k: each member's carbon cycle takes the production
 * step co2YearInto (the step runEmissionDriven takes) with its warming of year k - 1, giving its
 * annual-mean CO2; its CO2, CH4 and N2O ERF of year k follow from its own CO2 (scaled by its
 * scale_co2, scale_ch4, scale_n2o), then the two-box step from year k - 1 to year k.
 */
function runWithCarbon(
  task: MemberTask,
  block: MemberParameters,
  store: (k: number, t: Float64Array) => void,
  storeCo2?: (k: number, ppm: Float64Array) => void,
): void {
  const carbon = task.carbon!;
  const m = block.count;
  const n = carbon.ch4Ppb.length;
  const v = block.values;
  const steps = blockSteps(block);
  const otherForcingInto = blockForcing(task, block, OWN_GASES);
  const ones = new Float64Array(m).fill(1);
  const irf100 = v.irf100_scale ?? ones;
  // The carbon cycle sees the member's warming times its multiplier on the uptake's warming sensitivity rT (calibrated set).
  const uptakeWarming = v.uptake_warming_scale ?? ones;
  const [co2Scale, ch4Scale, n2oScale] = OWN_GASES.map((a) => v[forcingScaleKey(a)] ?? ones);
  const ghg = ghgForcingFunction({ co2Formula: task.co2Formula });
  const { co2: drivers, ch4Ppb, n2oPpb } = carbon;
  const states = Array.from({ length: m }, () => annualCarbonState());
  const ppm = new Float64Array(m);
  let start = new Float64Array(m);
  let end = new Float64Array(m);
  const t = new Float64Array(m);
  const d = new Float64Array(m);
  // Year k's carbon step (with each member's warming of year k - 1, now in t), then its forcing.
  const yearInto = (k: number, out: Float64Array) => {
    for (let r = 0; r < m; r++) ppm[r] = co2YearInto(states[r], drivers, k, uptakeWarming[r] * t[r], irf100[r]);
    storeCo2?.(k, ppm);
    otherForcingInto(k, out);
    for (let r = 0; r < m; r++) {
      const f = ghg(ppm[r], ch4Ppb[k], n2oPpb[k]);
      out[r] += co2Scale[r] * f.co2 + ch4Scale[r] * f.ch4 + n2oScale[r] * f.n2o;
    }
  };
  yearInto(0, start);
  for (let k = 0; k + 1 < n; k++) {
    yearInto(k + 1, end);
    stepTwoBoxInto(steps, start, end, t, d);
    store(k + 1, t);
    [start, end] = [end, start];
  }
}

import { forcingOfDoubling, type Co2Formula } from '../forcing/co2.js';
import { solverTransientResponse, tcrSolver } from './exchange-for-tcr.js';
import type { MemberParameters } from './member-parameters.js';

/**
 * Each member's ECS and TCR, K, from its two-box parameters and its CO2 forcing multiplier:
 * ECS = F2x x scale_co2 / lambda (the model's equilibrium), TCR = the mean warming over years 61-80
 * of its own 1 %/yr CO2 run (as transientResponse defines it, evaluated from the step's modes by
 * solverTransientResponse). Members whose source already carries `ecs_k` and `tcr_k` keep them.
 *
 * @param members the members' parameters
 * @param co2Formula formula whose own 2xCO2 forcing `scale_co2` multiplies
 * @returns `ecs_k` and `tcr_k`, one value per member
 * @example memberSensitivities(block, 'ar6').ecs_k[0] // ≈ 3.934 / feedback_wm2k[0]
 */
export function memberSensitivities(members: MemberParameters, co2Formula: Co2Formula): { ecs_k: Float64Array; tcr_k: Float64Array } {
  const v = members.values;
  if (v.ecs_k && v.tcr_k) return { ecs_k: v.ecs_k, tcr_k: v.tcr_k };
  const f2x = forcingOfDoubling(co2Formula);
  const solver = tcrSolver(co2Formula);
  const ecs = new Float64Array(members.count);
  const tcr = new Float64Array(members.count);
  for (let r = 0; r < members.count; r++) {
    const forcing2xWm2 = f2x * (v.scale_co2?.[r] ?? 1);
    const p = {
      feedbackWm2K: v.feedback_wm2k[r],
      upperHeatCapacity: v.upper_heat_capacity[r],
      deepHeatCapacity: v.deep_heat_capacity[r],
      exchangeWm2K: v.exchange_wm2k[r],
      deepEfficacy: v.deep_efficacy[r],
    };
    ecs[r] = forcing2xWm2 / p.feedbackWm2K;
    tcr[r] = solverTransientResponse(solver, p, forcing2xWm2);
  }
  return { ecs_k: ecs, tcr_k: tcr };
}

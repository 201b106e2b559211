import { AEROSOL_AGENTS } from '../forcing/agents.js';
import type { Co2Formula } from '../forcing/co2.js';
import { memberGenerators, MEMBER_STREAM_SCHEME } from './member-generators.js';
import { emptyMemberParameters, forcingScaleKey, type MemberSource } from './member-parameters.js';
import { drawMember, emptyDraw, memberSampler } from './sample-members.js';
import { describeSampling, validateSampling, type EnsembleSampling } from './sampling.js';

/** Version of the draw layout (see drawMember). */
const DRAW_LAYOUT = 'draws in turn: ECS, 2xCO2 ERF, aerosol, TCR given ECS, each redrawn alone until physical; v1';
/** What emission-driven members draw after the climate quantities. */
const CARBON_DRAW_LAYOUT = 'then the carbon-cycle iIRF100 multiplier, redrawn alone until positive; annual carbon step v1';

/** Keys the AR6-range members carry beyond the two-box ones. */
const AR6_KEYS = ['scale_co2', ...AEROSOL_AGENTS.map(forcingScaleKey), 'ecs_k', 'tcr_k', 'forcing_2x_wm2', 'irf100_scale'];

/**
 * Members drawn from assessed ranges of ECS, TCR, 2xCO2 forcing and aerosol forcing (AR6_SAMPLING
 * by default; see sampling.ts and drawMember): lambda = F2x / ECS, gamma solved per member for its
 * TCR, heat capacities and efficacy as the sampling fixes them. The 2xCO2 multiplier becomes
 * `scale_co2` and the aerosol multiplier the scale of both aerosol agents (`scale_aerosol_ari`,
 * `scale_aerosol_aci`); `ecs_k`, `tcr_k` and `forcing_2x_wm2`
 * are carried as diagnostics, `irf100_scale` for emission-driven runs (1 otherwise).
 *
 * @param sampling the ranges (validated here)
 * @param co2Formula formula whose own 2xCO2 forcing the multiplier scales
 * @param carbon true for an emission-driven ensemble: members also draw the carbon-cycle multiplier
 * @throws ConfigError for an invalid sampling
 * @example ar6Members(AR6_SAMPLING, 'ar6').draw(7, 0, 1000).parameters.values.ecs_k // median near 3 K
 */
export function ar6Members(sampling: EnsembleSampling, co2Formula: Co2Formula, carbon = false): MemberSource {
  validateSampling(sampling);
  return {
    scheme: `${MEMBER_STREAM_SCHEME}; ${DRAW_LAYOUT}${carbon ? `; ${CARBON_DRAW_LAYOUT}` : ''}; ranges ${JSON.stringify(sampling)}`,
    notes: describeSampling(sampling, carbon),
    draw(seed, from, to) {
      const sampler = memberSampler(sampling, co2Formula, carbon);
      const next = memberGenerators(seed, from);
      const block = emptyMemberParameters(to - from, AR6_KEYS);
      const v = block.values as Record<string, Float64Array>;
      const draw = emptyDraw();
      let redraws = 0;
      for (let r = 0; r < to - from; r++) {
        redraws += drawMember(next(), sampler, draw);
        v.feedback_wm2k[r] = draw.feedbackWm2K;
        v.exchange_wm2k[r] = draw.exchangeWm2K;
        v.upper_heat_capacity[r] = sampling.upperHeatCapacity;
        v.deep_heat_capacity[r] = sampling.deepHeatCapacity;
        v.deep_efficacy[r] = sampling.deepEfficacy;
        v.scale_co2[r] = draw.forcing2xScale;
        for (const agent of AEROSOL_AGENTS) v[forcingScaleKey(agent)][r] = draw.aerosolScale;
        v.ecs_k[r] = draw.ecsK;
        v.tcr_k[r] = draw.tcrK;
        v.forcing_2x_wm2[r] = draw.forcing2xWm2;
        v.irf100_scale[r] = draw.irf100Scale;
      }
      return { parameters: block, redraws };
    },
  };
}

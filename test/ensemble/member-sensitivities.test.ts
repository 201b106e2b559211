import { describe, expect, it } from 'vitest';
import { calibrate, transientResponse } from '../../src/climate/index.js';
import { emptyMemberParameters } from '../../src/ensemble/index.js';
import { memberSensitivities } from '../../src/ensemble/member-sensitivities.js';
import { forcingOfDoubling } from '../../src/forcing/co2.js';
import { expectClose } from '../asserts.js';

describe('memberSensitivities', () => {
  it('gives back the ECS and TCR members were calibrated to (F2x x scale_co2 / lambda; years 61-80 of 1 %/yr CO2, IPCC AR6 WG1 Box 7.1)', () => {
    const targets = [[2, 1.2], [3, 1.8], [4.5, 2.3]] as const;
    const block = emptyMemberParameters(targets.length, ['scale_co2']);
    const v = block.values;
    targets.forEach(([ecsK, tcrK], r) => {
      const scale = 0.9 + 0.1 * r;
      const p = calibrate({ ecsK, tcrK, upperHeatCapacity: 6 + r, deepHeatCapacity: 90 + 20 * r, deepEfficacy: 1 + 0.2 * r, forcing2xWm2: scale * forcingOfDoubling('ar6') });
      v.feedback_wm2k[r] = p.feedbackWm2K;
      v.exchange_wm2k[r] = p.exchangeWm2K;
      v.upper_heat_capacity[r] = p.upperHeatCapacity;
      v.deep_heat_capacity[r] = p.deepHeatCapacity;
      v.deep_efficacy[r] = p.deepEfficacy;
      v.scale_co2![r] = scale;
      expectClose(transientResponse(p), tcrK, 1e-9);
    });
    const s = memberSensitivities(block, 'ar6');
    targets.forEach(([ecsK, tcrK], r) => {
      expectClose(s.ecs_k[r], ecsK, 1e-9, `ECS ${r}`);
      expectClose(s.tcr_k[r], tcrK, 1e-9, `TCR ${r}`);
    });
  });

  it('keeps the values a source carries', () => {
    const block = emptyMemberParameters(1, ['ecs_k', 'tcr_k']);
    block.values.ecs_k![0] = 3.3;
    block.values.tcr_k![0] = 1.9;
    expect(memberSensitivities(block, 'ar6')).toEqual({ ecs_k: Float64Array.of(3.3), tcr_k: Float64Array.of(1.9) });
  });
});

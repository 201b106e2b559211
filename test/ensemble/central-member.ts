// One ensemble member with the deterministic run's parameters (every forcing multiplier 1), for
// tests that check the member code against the single run.
import type { TwoBoxParams } from '../../src/climate/two-box.js';
import type { MemberParameters } from '../../src/ensemble/index.js';

export function centralMember(p: TwoBoxParams, extra: Record<string, number> = {}): MemberParameters {
  const one = (x: number) => Float64Array.of(x);
  return {
    count: 1,
    values: {
      feedback_wm2k: one(p.feedbackWm2K),
      upper_heat_capacity: one(p.upperHeatCapacity),
      deep_heat_capacity: one(p.deepHeatCapacity),
      exchange_wm2k: one(p.exchangeWm2K),
      deep_efficacy: one(p.deepEfficacy),
      ...Object.fromEntries(Object.entries(extra).map(([k, v]) => [k, one(v)])),
    },
  };
}

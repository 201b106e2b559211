import { describe, expect, it } from 'vitest';
import { expectClose } from '../asserts.js';
import { historyResponses, OCEAN_HEAT_SHARE, ZJ_PER_WYR_M2 } from '../../src/ensemble/constrain-history.js';
import { memberParameterKeys, type MemberColumns } from '../../src/ensemble/prior.js';
import { abruptResponse } from '../../src/climate/two-box.js';
import { GTC_PER_PPM, gtcToGtco2 } from '../../src/carbon/units.js';

const physics = { feedback_wm2k: 1.2, upper_heat_capacity: 8, deep_heat_capacity: 100, exchange_wm2k: 0.7, deep_efficacy: 1.3 };

function oneMember(overrides: Record<string, number> = {}): MemberColumns {
  const keys = memberParameterKeys(['co2']);
  const values: Record<string, number> = { ...physics, scale_co2: 1, irf100_scale: 1, uptake_warming_scale: 1, ch4_lifetime_scale: 1, ...overrides };
  return Object.fromEntries(keys.map((k) => [k, Float64Array.of(values[k])])) as MemberColumns;
}

/** A step forcing of 4 W m-2 from 1751 on, CO2 constant at 278.3 ppm, 1750-2030. */
function stepDrivers() {
  const n = 281;
  const years = Float64Array.from({ length: n }, (_, k) => 1750 + k);
  const co2 = new Float64Array(n).fill(278.3);
  const f = new Float64Array(n).fill(4);
  f[0] = 0;
  return { years, byAgent: { co2: f }, co2Ppm: co2 };
}

const targets = { baseline: [1850, 1900] as [number, number], periods: [[1990, 2000]] as [number, number][], oceanHeat: [1971, 2018] as [number, number], aerosol: [2005, 2014] as [number, number], emissions: [1850, 2019] as [number, number] };

describe('historyResponses', () => {
  it('gives period warming of a step forcing as the analytic two-box response (Geoffroy et al. 2013a eq. 15), within the ramp of the first year', () => {
    const r = historyResponses(oneMember(), stepDrivers(), targets, 0, 1);
    let period = 0;
    let base = 0;
    for (let y = 1990; y <= 2000; y++) period += abruptResponse({ feedbackWm2K: 1.2, upperHeatCapacity: 8, deepHeatCapacity: 100, exchangeWm2K: 0.7, deepEfficacy: 1.3 }, 4, y - 1750.5).surfaceK / 11;
    for (let y = 1850; y <= 1900; y++) base += abruptResponse({ feedbackWm2K: 1.2, upperHeatCapacity: 8, deepHeatCapacity: 100, exchangeWm2K: 0.7, deepEfficacy: 1.3 }, 4, y - 1750.5).surfaceK / 51;
    // The forcing ramps from 0 to 4 over 1750-1751 (linear within the year), close to a step at 1750.5; 2e-3 K covers the difference.
    expectClose(r.periodWarmingK[0], period - base, 2e-3, '1990-2000 vs 1850-1900, K');
  });

  it('counts ocean heat as 91 % of the change in C T + C_d T_d (AR6 Box 7.2 share), in ZJ', () => {
    const r = historyResponses(oneMember(), stepDrivers(), targets, 0, 1);
    const p = { feedbackWm2K: 1.2, upperHeatCapacity: 8, deepHeatCapacity: 100, exchangeWm2K: 0.7, deepEfficacy: 1.3 };
    const h = (y: number) => {
      const s = abruptResponse(p, 4, y - 1750.5);
      return 8 * s.surfaceK + 100 * s.deepK;
    };
    expectClose(r.oceanHeatZj[0], OCEAN_HEAT_SHARE * ZJ_PER_WYR_M2 * (h(2018) - h(1971)), 0.5, 'ZJ');
  });

  it('diagnoses zero emissions for constant CO2 and no uptake-warming sensitivity, and the atmospheric increase plus uptake otherwise', () => {
    const still = historyResponses(oneMember({ uptake_warming_scale: 0 }), stepDrivers(), targets, 0, 1);
    expectClose(still.emissionsGtco2[0], 0, 1e-9, 'Gt CO2');
    const d = stepDrivers();
    for (let k = 0; k < d.co2Ppm.length; k++) d.co2Ppm[k] = 278.3 + 0.5 * Math.max(0, k - 100);
    const rising = historyResponses(oneMember(), d, targets, 0, 1);
    // 1850-2019 raises CO2 by 0.5 ppm a year for 170 years: 85 ppm in the air; sinks add more.
    expect(rising.emissionsGtco2[0]).toBeGreaterThan(gtcToGtco2(85 * GTC_PER_PPM));
  });
});

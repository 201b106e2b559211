import { describe, expect, it } from 'vitest';
import { EARTH_AREA_M2, energyBudget, energyBudgetNote } from '../../src/projection/energy-budget.js';
import { expectClose } from '../asserts.js';

const years = Float64Array.from({ length: 2020 - 1960 + 1 }, (_, i) => 1960 + i);
const linear = (perYear: number) => years.map((y) => perYear * (y - 1960));

describe('energyBudget', () => {
  it('EARTH_AREA_M2 is 5.10e14 m2 (4 pi R^2, R = 6371 km)', () => expectClose(EARTH_AREA_M2 / 1e14, 5.1006, 0.0001));

  it('heat gain is (C dT + Cd dTd) over the Earth\'s area: 1 K in an 8 W yr m-2 K-1 box is 8 x 3.15576e7 x 5.1006e14 J = 128.8 ZJ', () => {
    // 47 years (1971 to 2018) at 1/47 K a year: the upper box warms by exactly 1 K, the deep box not at all.
    const b = energyBudget(years, { warming_k: linear(1 / 47), deep_ocean_k: new Float64Array(years.length), imbalance_wm2: new Float64Array(years.length).fill(0.5) }, { upperHeatCapacity: 8, deepHeatCapacity: 100 })!;
    expectClose(b.heatGainZj, (8 * 3.15576e7 * EARTH_AREA_M2) / 1e21, 1e-9);
    expectClose(b.heatGainZj, 128.8, 0.05);
    expectClose(b.oceanHeatGainZj, 0.91 * b.heatGainZj, 1e-12);
    expectClose(b.imbalanceWm2, 0.5, 1e-15);
  });

  it('a steady imbalance N accumulates N x 47 years of heat when the boxes take it up (energy conservation)', () => {
    // Deep box only: Cd dTd/dt = N, so Td rises by N/Cd a year and the heat over 1971-2018 is N x 47 W yr m-2.
    const n = 0.8;
    const b = energyBudget(years, { warming_k: new Float64Array(years.length), deep_ocean_k: linear(n / 100), imbalance_wm2: new Float64Array(years.length).fill(n) }, { upperHeatCapacity: 8, deepHeatCapacity: 100 })!;
    expectClose(b.heatGainZj, (n * 47 * 3.15576e7 * EARTH_AREA_M2) / 1e21, 1e-9);
  });

  it('is undefined for a run that does not cover 1971-2018', () => {
    const short = years.subarray(20);
    const cols = { warming_k: new Float64Array(short.length), deep_ocean_k: new Float64Array(short.length), imbalance_wm2: new Float64Array(short.length) };
    expect(energyBudget(short, cols, { upperHeatCapacity: 8, deepHeatCapacity: 100 })).toBeUndefined();
  });

  it('energyBudgetNote states the figures beside AR6\'s', () => {
    expect(energyBudgetNote({ imbalanceWm2: 1.016, heatGainZj: 474.2, oceanHeatGainZj: 431.5 })).toBe(
      'energy budget: top-of-atmosphere imbalance 2006-2018 1.02 W m-2 (IPCC AR6: 0.79, very likely 0.52-1.06); heat gained 1971-2018 474 ZJ '
        + 'by the two boxes (the whole climate system), of which the ocean\'s 91 % (AR6) is 432 ZJ (AR6 ocean heat content record: 395 ZJ, 1 sigma 31)',
    );
  });
});

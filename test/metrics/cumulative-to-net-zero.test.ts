import { describe, expect, it } from 'vitest';
import { cumulativeToNetZero } from '../../src/metrics/cumulative-to-net-zero.js';
import { expectClose } from '../asserts.js';

describe('cumulativeToNetZero', () => {
  it('cumulativeToNetZero of a linear decline from 40 Gt CO2/yr in 2020 by 2 per year is the arithmetic series 40 + 38 + ... + 2 = 420 Gt CO2, net zero in 2040 (analytic)', () => {
    const years = Float64Array.from({ length: 61 }, (_, i) => 2020 + i);
    const e = years.map((y) => 40 - 2 * (y - 2020));
    const z = cumulativeToNetZero(years, e);
    expect(z.year).toBe(2040);
    expect(z.fromYear).toBe(2020);
    expect(z.toYear).toBe(2039);
    // Arithmetic series: n (first + last) / 2 = 20 x (40 + 2) / 2.
    expectClose(z.total, 420, 1e-9);
  });

  it('cumulativeToNetZero starts at fromYear and reports the total to the end when net zero is not reached', () => {
    const years = Float64Array.from({ length: 11 }, (_, i) => 2020 + i);
    const e = new Float64Array(11).fill(10);
    expect(cumulativeToNetZero(years, e, 2025)).toEqual({ year: undefined, total: 60, fromYear: 2025, toYear: 2030 });
  });

  it('cumulativeToNetZero is 0 with net zero in fromYear when emissions are already at or below zero there', () => {
    const years = Float64Array.of(2050, 2051);
    expect(cumulativeToNetZero(years, Float64Array.of(-1, -2))).toEqual({ year: 2050, total: 0, fromYear: 2050, toYear: 2049 });
  });
});

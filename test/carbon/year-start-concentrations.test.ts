import { describe, expect, it } from 'vitest';
import { JOIN_TREND_YEARS, trailingSlope, yearStartConcentrations } from '../../src/carbon/year-start-concentrations.js';
import { loadHistory } from '../../src/io/index.js';
import { expectClose } from '../asserts.js';

describe('yearStartConcentrations', () => {
  it('starts at the first annual mean, puts 1 January midway between annual means, and ends on the trend', () => {
    expect(yearStartConcentrations(Float64Array.of(400, 402, 404), 2)).toEqual(Float64Array.of(400, 401, 403, 405));
  });

  it('a linear record gives a linear path whose annual means are the record (the midway rule is exact for a straight line)', () => {
    const c = Float64Array.from({ length: 20 }, (_, k) => 300 + 1.7 * k);
    const b = yearStartConcentrations(c, 19);
    for (let k = 1; k < 20; k++) expectClose((b[k] + b[k + 1]) / 2, c[k], 1e-12);
  });

  it('the history\'s last year (2024) grows at the 2020-2024 least-squares slope, 2.54 ppm, not its El Niño rise of 3.43 ppm', () => {
    const history = loadHistory();
    const c = history.series.co2_ppm!;
    const last = c.length - 1;
    const b = yearStartConcentrations(c, last);
    expect(JOIN_TREND_YEARS).toBe(5);
    // Slope by hand: sum (k - 2)(c_k - mean) / 10 over 2020-2024.
    const y = Array.from({ length: 5 }, (_, i) => c[last - 4 + i]);
    const mean = y.reduce((s, v) => s + v, 0) / 5;
    const slope = y.reduce((s, v, i) => s + (i - 2) * (v - mean), 0) / 10;
    expectClose(b[last + 1] - b[last], slope, 1e-12);
    expectClose(slope, 2.539, 0.001);
    expectClose(c[last] - c[last - 1], 3.43, 0.001);
  });
});

describe('trailingSlope', () => {
  it('is 0 for one value and the exact slope of a line', () => {
    expect(trailingSlope([5], 0, 5)).toBe(0);
    expectClose(trailingSlope([1, 3, 5, 7, 9, 11], 5, 5), 2, 1e-12);
    expectClose(trailingSlope([1, 2, 4, 5], 3, 5), 1.4, 1e-12);
  });
});

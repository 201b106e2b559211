import { scaleLinear } from 'd3-scale';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { valueAtYear } from '../../src/metrics/value-at-year.js';
import { expectClose } from '../asserts.js';

describe('valueAtYear', () => {
  it('valueAtYear agrees with d3-scale piecewise-linear interpolation inside the years (reference library)', () => {
    fc.assert(
      fc.property(
        fc.uniqueArray(fc.integer({ min: 1850, max: 2300 }), { minLength: 2, maxLength: 30 }),
        fc.array(fc.double({ min: -3, max: 6, noNaN: true }), { minLength: 30, maxLength: 30 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (rawYears, rawValues, where) => {
          const years = Float64Array.from(rawYears.sort((a, b) => a - b));
          const values = Float64Array.from(rawValues.slice(0, years.length));
          const year = years[0] + where * (years[years.length - 1] - years[0]);
          const d3 = scaleLinear(Array.from(years), Array.from(values));
          // Tolerance: both interpolate in double precision over values of order 1.
          expectClose(valueAtYear(years, values, year), d3(year), 1e-12);
        },
      ),
    );
  });

  it('valueAtYear is exact at a listed year and NaN outside the years (no extrapolation)', () => {
    const years = Float64Array.of(2020, 2030, 2050);
    const values = Float64Array.of(1.2, 1.5, 1.9);
    expect(valueAtYear(years, values, 2030)).toBe(1.5);
    expect(valueAtYear(years, values, 2050)).toBe(1.9);
    expect(valueAtYear(years, values, 2019.9)).toBeNaN();
    expect(valueAtYear(years, values, 2051)).toBeNaN();
    expect(valueAtYear(new Float64Array(0), new Float64Array(0), 2000)).toBeNaN();
  });
});

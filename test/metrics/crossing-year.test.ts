import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crossingPeriod, crossingYear, lastCrossingYear } from '../../src/metrics/crossing-year.js';

const span = (from: number, to: number) => Float64Array.from({ length: to - from + 1 }, (_, i) => from + i);

describe('crossingYear', () => {
  it('crossingYear on a step built to cross in the 20-year period 2041-2060 is 2050, its earlier middle year (by construction)', () => {
    // 0 K before 2041, 2 K from 2041: the mean of s..s+19 is 2 K x (years from 2041 in the period) / 20,
    // which first exceeds 1.9 K when all 20 years are from 2041 on: the period 2041-2060.
    const years = span(2000, 2100);
    const values = years.map((y) => (y >= 2041 ? 2 : 0));
    expect(crossingPeriod(years, values, 1.9)).toEqual({ year: 2050, firstYear: 2041, lastYear: 2060, mean: 2, atStart: false });
    // 1.0 K is exceeded once 11 of the 20 years are 2 K: period 2032-2051 (2041..2051 is 11 years).
    expect(crossingPeriod(years, values, 1.0)).toMatchObject({ year: 2041, firstYear: 2032, lastYear: 2051 });
    expect(crossingYear(years, values, 1.0)).toBe(2041);
  });

  it('crossingYear is undefined when no complete 20-year period exceeds the threshold, even if the last years do', () => {
    // Last year 2100, 3 K only from 2090: the final period 2081-2100 averages 1.65 K.
    const years = span(2000, 2100);
    const values = years.map((y) => (y >= 2090 ? 3 : 0));
    expect(crossingYear(years, values, 2)).toBeUndefined();
    expect(crossingYear(years, values, 1.6)).toBe(2090);
  });

  it('crossingYear counts a period only when its mean exceeds the level strictly (a mean equal to it does not cross)', () => {
    const years = span(2000, 2039);
    const values = new Float64Array(40).fill(1.5);
    expect(crossingYear(years, values, 1.5)).toBeUndefined();
    expect(crossingYear(years, values, 1.4999)).toBe(2009);
  });

  it('crossingPeriod marks a level already exceeded in the first complete period with atStart', () => {
    const years = span(2020, 2060);
    const values = new Float64Array(41).fill(1.7);
    expect(crossingPeriod(years, values, 1.5)).toMatchObject({ year: 2029, firstYear: 2020, lastYear: 2039, atStart: true });
  });

  it('crossingYear with a window of 1 is the first year above the level (the rule reduces to annual values)', () => {
    const years = span(2000, 2010);
    expect(crossingYear(years, years.map((y) => (y === 2004 ? 2.1 : 1)), 2, 1)).toBe(2004);
  });

  it('crossingYear is the year nearest the moment a linear trend passes the level, for any rate and level (analytic)', () => {
    // T(t) = a (t - 2000): it passes L at t* = 2000 + L / a. The mean over s..s+19 is T(s + 9.5), so
    // the first exceeding period has s + 9.5 in (t*, t* + 1] and the reported s + 9 lies in (t* - 0.5, t* + 0.5].
    fc.assert(
      fc.property(fc.double({ min: 0.005, max: 0.05, noNaN: true }), fc.double({ min: 0.3, max: 2.5, noNaN: true }), (rate, level) => {
        const years = span(1990, 2700);
        const values = years.map((y) => rate * (y - 2000));
        const tStar = 2000 + level / rate;
        const year = crossingYear(years, values, level);
        expect(year).toBeDefined();
        // 1e-6 yr slack for rounding in the 20-term sum when t* falls on a half year.
        expect(Math.abs(year! - tStar)).toBeLessThanOrEqual(0.5 + 1e-6);
      }),
    );
  });
});

describe('lastCrossingYear', () => {
  it('lastCrossingYear is the label crossingPeriod gives the last complete period: 2090 for data to 2100 (20-year periods), also for odd windows', () => {
    expect(lastCrossingYear(2100)).toBe(2090);
    for (const window of [20, 21, 5]) {
      const years = Float64Array.from({ length: 60 }, (_, i) => 2041 + i);
      // A step above 1 K in the last year only: the first period above 0 K is the last one.
      const values = years.map((y) => (y === 2100 ? 1 : 0));
      expect(crossingPeriod(years, values, 0, window)!.year, `window ${window}`).toBe(lastCrossingYear(2100, window));
    }
  });
});


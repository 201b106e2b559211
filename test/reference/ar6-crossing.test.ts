// Crossing years of global warming levels against the IPCC AR6 WG1 convention: a level counts as
// reached in the middle of the first 20-year period whose mean global surface temperature change
// exceeds it (AR6 WG1 Cross-Chapter Box 2.3 and chapter 4, section 4.3.4; Table 4.5 lists the
// crossings as 20-year periods). Status C in REFERENCES.md ("crossing a warming level: defined on
// 20-year means").
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { crossingPeriod, crossingYear } from '../../src/metrics/crossing-year.js';
import { runningMean } from '../../src/metrics/running-mean.js';

const span = (from: number, to: number) => Float64Array.from({ length: to - from + 1 }, (_, i) => from + i);

describe('AR6 20-year-mean rule for crossing a global warming level', () => {
  it('a series built so that 2025-2044 is the first 20-year period above 1.5 K crosses in that period, reported as 2034 (AR6 Table 4.5 gives 2025-2044, centred on 2034.5, for SSP1-1.9 at 1.5 K; quoted by Meinshausen, Nicholls and Forster 2021, RealClimate, status C2)', () => {
    // By construction: 1.0 K before 2025 and 1.51 K from 2025 on. A 20-year period holding any year
    // before 2025 averages below 1.5 K, so the first period above it is the first lying wholly in
    // 2025 and after: 2025-2044.
    const years = span(1990, 2100);
    const values = years.map((y) => (y < 2025 ? 1.0 : 1.51));
    const p = crossingPeriod(years, values, 1.5);
    expect(p).toMatchObject({ firstYear: 2025, lastYear: 2044, year: 2034, atStart: false });
    // The reported year is the earlier of the two middle years: 2034.5 - 0.5.
    expect(p!.year).toBe((p!.firstYear + p!.lastYear) / 2 - 0.5);
  });

  it('one year above the level is not a crossing: a 0.3 K spike to 1.62 K in a 1.32 K plateau leaves 1.5 K uncrossed (AR6: levels are 20-year means, not single years)', () => {
    const years = span(2000, 2060);
    const values = years.map((y) => (y === 2030 ? 1.62 : 1.32));
    expect(Math.max(...values)).toBeGreaterThan(1.5);
    expect(crossingYear(years, values, 1.5)).toBeUndefined();
  });

  it('the reported year is the middle of the first period whose 20-year mean exceeds the level, and no earlier period exceeds it (definition, random series)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 3, noNaN: true }), { minLength: 20, maxLength: 120 }),
        fc.double({ min: 0.5, max: 2.5, noNaN: true }),
        (raw, level) => {
          const years = Float64Array.from(raw, (_, i) => 1950 + i);
          const values = Float64Array.from(raw);
          const p = crossingPeriod(years, values, level);
          // Independent recomputation: mean of every window of 20 consecutive years, first above level.
          let first = -1;
          for (let s = 0; s + 20 <= raw.length && first < 0; s++) {
            let sum = 0;
            for (let k = s; k < s + 20; k++) sum += raw[k];
            if (sum / 20 > level) first = s;
          }
          if (first < 0) expect(p).toBeUndefined();
          else expect(p).toMatchObject({ firstYear: 1950 + first, lastYear: 1969 + first, year: 1959 + first });
        },
      ),
    );
  });

  it('the 20-year mean at the crossing year is the mean of the years first..last of the period (the window Y-9..Y+10)', () => {
    const years = span(1990, 2100);
    const values = years.map((y) => 0.9 + 0.025 * (y - 2000) + 0.1 * Math.sin(y));
    const p = crossingPeriod(years, values, 1.5)!;
    const means = runningMean(values, 20);
    expect(means[p.year - 1990]).toBe(p.mean);
    expect(p.year - p.firstYear).toBe(9);
    expect(p.lastYear - p.year).toBe(10);
  });
});

import { describe, expect, it } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { comparePathways } from '../../src/metrics/compare-pathways.js';
import { crossingYear } from '../../src/metrics/crossing-year.js';
import { expectClose } from '../asserts.js';

const years = Float64Array.from({ length: 101 }, (_, i) => 2000 + i);
const steady = { label: 'steady', years, warmingK: years.map((y) => 1.0 + 0.02 * (y - 2000)) };
const swift = {
  label: 'swift',
  years: years.subarray(10),
  warmingK: years.subarray(10).map((y) => 1.2 + 0.3 * (1 - Math.exp(-(y - 2010) / 20))),
  co2Gtco2: years.subarray(10).map((y) => 40 - 1.6 * (y - 2010)),
};

describe('comparePathways', () => {
  const c = comparePathways([steady, swift], { milestoneYears: [2005, 2050, 2100] });

  it('comparePathways reports each milestone warming and its difference from the first pathway, 0 for the reference', () => {
    expect(c.reference).toBe('steady');
    const [ref, other] = c.pathways;
    expect(ref.milestones.map((m) => m.differenceK)).toEqual([0, 0, 0]);
    expectClose(ref.milestones[1].warmingK, 2.0, 1e-12);
    // swift starts in 2010: 2005 is outside it.
    expect(other.milestones[0].warmingK).toBeNaN();
    expect(other.milestones[0].differenceK).toBeNaN();
    const w2050 = 1.2 + 0.3 * (1 - Math.exp(-2));
    expectClose(other.milestones[1].warmingK, w2050, 1e-12);
    expectClose(other.milestones[1].differenceK, w2050 - 2.0, 1e-12);
  });

  it('comparePathways takes the peak, crossings (AR6 20-year rule, defaults 1.5 and 2 K) and key years 2050, 2100 per pathway', () => {
    const [ref, other] = c.pathways;
    expect(ref.peak.year).toBe(2100);
    expect(ref.stillRising).toBe(true);
    expect(c.thresholdsK).toEqual([1.5, 2]);
    expect(ref.crossings.map((x) => x.period?.year)).toEqual([crossingYear(years, steady.warmingK, 1.5), crossingYear(years, steady.warmingK, 2)]);
    // 1.0 + 0.02 (t - 2000) passes 1.5 K at t = 2025 and 2 K at 2050 exactly (analytic; see crossingPeriod).
    expect(ref.crossings.map((x) => x.period?.year)).toEqual([2025, 2050]);
    // swift tends to 1.5 K from below: never above it.
    expect(other.crossings.map((x) => x.period)).toEqual([undefined, undefined]);
    expect(other.keyYears.map((k) => k.year)).toEqual([2050, 2100]);
  });

  it('comparePathways sums CO2 to net zero for emission-driven pathways only: 40 - 1.6 (t - 2010) reaches 0 in 2035 after 25 x (40 + 1.6) / 2 = 520 Gt CO2 (analytic)', () => {
    expect(c.pathways[0].netZero).toBeUndefined();
    const z = c.pathways[1].netZero!;
    expect(z.year).toBe(2035);
    expectClose(z.total, 520, 1e-9);
  });

  it('comparePathways rejects an empty list and repeated names', () => {
    expect(() => comparePathways([], { milestoneYears: [] })).toThrow(ConfigError);
    expect(() => comparePathways([steady, steady], { milestoneYears: [] })).toThrow(/must be distinct; "steady" appears twice\. .*give one of them a line such as "# name: Plan B"$/);
  });

  it('comparePathways attaches an ensemble\'s odds to the crossing of the same level, and refuses odds that lack a threshold', () => {
    const years = Float64Array.from({ length: 41 }, (_, i) => 2020 + i);
    const warmingK = years.map(() => 1);
    const odds = (thresholdK: number) => ({ thresholdK, byYear: [], medianYear: null, withinRun: 0, lastWindowYear: 2050, shareAbove: new Float64Array(41), crossedBy: new Float64Array(41) });
    const c = comparePathways([{ label: 'e', years, warmingK, crossingOdds: [odds(2), odds(1.5)] }], { milestoneYears: [] });
    expect(c.pathways[0].crossings.map((x) => [x.thresholdK, x.odds?.thresholdK])).toEqual([[1.5, 1.5], [2, 2]]);
    expect(() => comparePathways([{ label: 'e', years, warmingK, crossingOdds: [odds(1.5)] }], { milestoneYears: [] })).toThrow(/no crossing odds for 2 K/);
  });
});

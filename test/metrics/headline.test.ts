import { describe, expect, it } from 'vitest';
import { comparePathways } from '../../src/metrics/compare-pathways.js';
import { headlines } from '../../src/metrics/headline.js';
import { oddsComparison } from '../report/comparison-fixture.js';

describe('headlines', () => {
  it('headlines of a linear run: warming at 2030/2050/2100 read off the line, the peak its last year, 1.5 K crossed in 2035 (the trend passes 1.5 K in 2035; AR6 20-year rule, analytic)', () => {
    const years = Float64Array.from({ length: 91 }, (_, i) => 2010 + i);
    const c = comparePathways([{ label: 'line', years, warmingK: years.map((y) => 1 + 0.02 * (y - 2010)) }], { milestoneYears: [], thresholdsK: [1.5, 3] });
    const [h] = headlines(c);
    expect(h.members).toBeUndefined();
    expect(h.atYears.map((a) => [a.year, +a.warmingK.toFixed(10)])).toEqual([[2030, 1.4], [2050, 1.8], [2100, 2.8]]);
    expect(h.peak).toEqual({ warmingK: 1 + 0.02 * 90, year: 2100, stillRising: true });
    expect(h.crossings).toEqual([
      { thresholdK: 1.5, year: 2035, orEarlier: false, lastVisibleYear: 2090 },
      { thresholdK: 3, year: null, orEarlier: false, lastVisibleYear: 2090 },
    ]);
  });

  it('with members, the shares crossed by the headline years are the per-year crossed-by series at those years (the crossed_by_<t> columns), null where the run cannot show them, with the share by the last visible year', () => {
    const c = oddsComparison();
    const [, h] = headlines(c);
    const odds = c.pathways[1].crossings.find((x) => x.thresholdK === 1.5)!.odds!;
    const x = h.crossings.find((k) => k.thresholdK === 1.5)!;
    expect(x.year).toBe(odds.medianYear);
    expect(x.crossedBy).toEqual([
      { year: 2030, share: odds.crossedBy[30] },
      { year: 2050, share: odds.crossedBy[50] },
      { year: 2100, share: null },
    ]);
    expect(x.crossedByLastVisible).toBe(odds.crossedBy[90]);
    // The members' own peak, not the median line's.
    expect(h.peak).toEqual({ warmingK: 1.95, year: 2088, stillRising: false, range: { p05: 1.52, p95: 2.61 }, shareStillRising: 0.4 });
  });
});

import { describe, expect, it } from 'vitest';
import { comparePathways } from '../../src/metrics/index.js';
import { comparisonHeadlines } from '../../src/report/comparison-headlines.js';
import { oddsComparison } from './comparison-fixture.js';

describe('comparisonHeadlines', () => {
  it('comparisonHeadlines gives one sentence per pathway with peak, crossings and the last key year', () => {
    const years = Float64Array.from({ length: 81 }, (_, i) => 2020 + i);
    const c = comparePathways(
      [
        { label: 'steady', years, warmingK: years.map((y) => 1.2 + 0.02 * (y - 2020)) },
        { label: 'swift', years, warmingK: years.map((y) => 1.2 + 0.25 * (1 - Math.exp(-(y - 2020) / 10))) },
      ],
      { milestoneYears: [] },
    );
    // steady passes 1.5 K at 2035 and 2 K at 2060 (linear trend; see crossingPeriod).
    expect(comparisonHeadlines(c)).toEqual([
      'steady: peak 2.80 K in 2100 (still rising); reaches 1.5 K in 2035 and 2 K in 2060; 2.80 K in 2100.',
      'swift: peak 1.45 K in 2100 (still rising); 1.5 K and 2 K not crossed by 2090; 1.45 K in 2100.',
    ]);
  });

  it('comparisonHeadlines speaks of the members\' own peak, the members\' odds and the median line for a pathway with an ensemble, and of the line for one without', () => {
    // single: 1 + 0.0082 (y - 2000) K; the window s..s+19 has mean 1 + 0.0082 (s + 9.5 - 2000), above 1.5 K first for s = 2052
    // (1.504 K), labelled 2061; the last window's mean, 1.742 K, stays below 2 K (analytic).
    expect(comparisonHeadlines(oddsComparison())).toEqual([
      'single: peak 1.82 K in 2100 (still rising); reaches 1.5 K in 2061; 2 K not crossed by 2090; 1.41 K in 2050.',
      "ensemble: members' median peak 1.95 K [1.52 to 2.61] in 2088 (40 % still rising in 2100); 1.5 K: probability of crossing 62 % by 2050, " +
        'by 2100 n/a (the run ends in 2100; by 2090, its last 20-year mean: 97 %), median crossing year 2046; 2 K: probability of crossing 30 % by 2050, ' +
        'by 2100 n/a (the run ends in 2100; by 2090, its last 20-year mean: 45 %), fewer than half of the members cross it by 2090; median 1.41 K in 2050.',
    ]);
  });

  it('comparisonHeadlines falls back to the median line\'s peak for an ensemble pathway given without its members\' peaks', () => {
    const c = oddsComparison();
    delete c.pathways[1].membersPeak;
    expect(comparisonHeadlines(c)[1]).toMatch(/^ensemble: median peaks at 1\.82 K in 2100 \(still rising\); /);
  });

  it('comparisonHeadlines names each level with the baseline when it is not 1850-1900', () => {
    expect(comparisonHeadlines(oddsComparison(), '1995-2014')[0]).toBe(
      'single: peak 1.82 K in 2100 (still rising); reaches 1.5 K above the 1995-2014 mean in 2061; 2 K above the 1995-2014 mean not crossed by 2090; 1.41 K in 2050.',
    );
  });
});

import { describe, expect, it } from 'vitest';
import { comparePathways } from '../../src/metrics/index.js';
import { comparisonHeadlines } from '../../src/report/comparison-headlines.js';

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
      'swift: peak 1.45 K in 2100 (still rising); does not reach 1.5 K or 2 K by 2100; 1.45 K in 2100.',
    ]);
  });
});

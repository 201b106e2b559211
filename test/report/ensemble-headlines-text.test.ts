import { describe, expect, it } from 'vitest';
import { ensembleHeadlineLines, medianCrossingText, percentText } from '../../src/report/ensemble-headlines-text.js';
import { headlinesFixture } from './ensemble-headlines-fixture.js';

describe('ensembleHeadlineLines', () => {
  it('ensembleHeadlineLines states per level the crossing probabilities by milestone and the median crossing, or that half are above at the start', () => {
    const { sampled, thresholds } = ensembleHeadlineLines(headlinesFixture());
    expect(sampled).toEqual(['  sampled ECS 3.00 K [2.00 to 4.00], TCR 1.80 K [0.80 to 2.80] (median [5-95 %]); ECS-TCR correlation 0.64']);
    expect(thresholds).toEqual([
      '  1.5 K (20-year mean): probability of crossing by 2050 81 %, by 2100 97 %; median crossing year 2031',
      '  0.05 K (20-year mean): probability of crossing by 2050 100 %, by 2100 100 %; median crossing year 1915; 30 % of members already above it at the start (1750-1769)',
      '  0.001 K (20-year mean): probability of crossing by 2050 100 %, by 2100 100 %; median crossing: already above at the start (the first 20-year mean, 1750-1769)',
      '  3 K (20-year mean): probability of crossing by 2050 <1 %, by 2100 n/a (the run ends in 2150; by 2140, its last 20-year mean: 4 %); fewer than half of the members cross it by 2140',
    ]);
  });

  it('ensembleHeadlineLines gives the members\' own peak: median peak warming with likely and very likely ranges, median peak year with its likely range, share still rising', () => {
    expect(ensembleHeadlineLines(headlinesFixture()).peak).toBe(
      "  peak warming (members' own): median 1.98 K (likely 1.70 to 2.35, very likely 1.45 to 2.70), in 2079 (likely 2065 to 2150); 31 % of members still rising in 2150",
    );
  });

  it('ensembleHeadlineLines prints a missing correlation as n/a and the carbon-cycle multiplier when sampled', () => {
    const h = headlinesFixture({ ecs_tcr_correlation: null });
    h.sampled.irf100_scale = { p05: 0.77, p17: 0.88, p50: 1, p83: 1.12, p95: 1.23 };
    const { sampled } = ensembleHeadlineLines(h);
    expect(sampled[0]).toMatch(/ECS-TCR correlation n\/a \(fewer than 3 members\)$/);
    expect(sampled[1]).toBe('  sampled carbon-cycle multiplier on the pre-industrial iIRF100 r0 1.00 [0.77 to 1.23] (median [5-95 %])');
  });

  it('percentText rounds to whole percent, never rounds a share that is neither none nor all to 0 % or 100 %, and says why for null', () => {
    expect(percentText(0.814)).toBe('81 %');
    expect(percentText(null)).toBe('n/a (run too short)');
    expect(percentText(0.004)).toBe('<1 %');
    expect(percentText(0.996)).toBe('>99 %');
    expect(percentText(0)).toBe('0 %');
    expect(medianCrossingText(headlinesFixture().thresholds[0], headlinesFixture())).toBe('2031');
  });
});

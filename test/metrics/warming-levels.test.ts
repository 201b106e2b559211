import { describe, expect, it } from 'vitest';
import { RUNNING_MEAN_WINDOW } from '../../src/ensemble/running-mean.js';
import { crossingPeriod, lastCrossingYear } from '../../src/metrics/crossing-year.js';
import { AR6_BASELINE, firstWindow, isAr6Baseline, lastVisibleYear, rebase, WARMING_LEVEL_WINDOW } from '../../src/metrics/warming-levels.js';
import { expectAllClose } from '../asserts.js';

describe('warming-level conventions (one home)', () => {
  it('WARMING_LEVEL_WINDOW is the 20-year window of IPCC AR6 WG1 (Cross-Chapter Box 2.3), y-9..y+10, and the ensemble counts on the same window', () => {
    expect(WARMING_LEVEL_WINDOW).toEqual({ years: 20, before: 9, after: 10 });
    expect(WARMING_LEVEL_WINDOW.before + WARMING_LEVEL_WINDOW.after + 1).toBe(WARMING_LEVEL_WINDOW.years);
    expect(RUNNING_MEAN_WINDOW).toEqual({ before: WARMING_LEVEL_WINDOW.before, after: WARMING_LEVEL_WINDOW.after });
  });

  it('AR6_BASELINE is 1850-1900 (IPCC AR6 WG1 SPM A.1.2), and only that period counts as the AR6 footing', () => {
    expect(AR6_BASELINE).toEqual([1850, 1900]);
    expect(isAr6Baseline([1850, 1900])).toBe(true);
    expect(isAr6Baseline([1995, 2014])).toBe(false);
  });

  it('lastVisibleYear(2100) is 2090: the last complete 20-year window, 2081-2100, is labelled 2090; it agrees with lastCrossingYear and crossingPeriod', () => {
    expect(lastVisibleYear(2100)).toBe(2090);
    expect(lastVisibleYear(2150)).toBe(lastCrossingYear(2150));
    // A step above the level only in the data's last 20 years is seen, labelled lastVisibleYear.
    const years = Float64Array.from({ length: 101 }, (_, i) => 2000 + i);
    const values = years.map((y) => (y >= 2081 ? 2 : 0));
    expect(crossingPeriod(years, values, 1.9)?.year).toBe(lastVisibleYear(2100));
    expect(firstWindow(1750)).toEqual([1750, 1769]);
  });

  it('rebase subtracts the baseline mean (analytic: a line a + b t rebased on [t0, t1] is b (t - (t0 + t1) / 2)), and refuses a baseline outside the data', () => {
    const years = Float64Array.from({ length: 251 }, (_, i) => 1850 + i);
    const values = years.map((y) => 0.3 + 0.01 * (y - 1850));
    expectAllClose(rebase(years, values, [1850, 1900]), years.map((y) => 0.01 * (y - 1875)), 1e-12, 'rebased line');
    expect(() => rebase(years, values, [1750, 1800], 'x')).toThrow(/baseline 1750-1800 must lie within the years of x, 1850-2100/);
  });
});

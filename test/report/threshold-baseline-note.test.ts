import { describe, expect, it } from 'vitest';
import { AR6_REFERENCE_PERIOD, isAr6Baseline, thresholdBaselineNote } from '../../src/report/threshold-baseline-note.js';

describe('thresholdBaselineNote', () => {
  it('AR6_REFERENCE_PERIOD is 1850-1900, the reference of the AR6 global warming levels (IPCC AR6 WG1 SPM, from memory)', () => {
    expect(AR6_REFERENCE_PERIOD).toEqual([1850, 1900]);
    expect(isAr6Baseline([1850, 1900])).toBe(true);
    expect(isAr6Baseline([1850, 1899])).toBe(false);
  });

  it('thresholdBaselineNote([1850, 1900]) is undefined: thresholds there are the AR6 levels', () => {
    expect(thresholdBaselineNote([1850, 1900])).toBeUndefined();
  });

  it('thresholdBaselineNote([1995, 2014]) says the thresholds are read against 1995-2014, not as AR6 levels, and how to compare with them', () => {
    expect(thresholdBaselineNote([1995, 2014])).toBe(
      'IPCC AR6 global warming levels (1.5 K, 2 K) are relative to 1850-1900; with the 1995-2014 baseline the thresholds here are read ' +
        'against the 1995-2014 mean, so they are not AR6 levels; use the default baseline (1850-1900) to compare with AR6 levels',
    );
  });
});

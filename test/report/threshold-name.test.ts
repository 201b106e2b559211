import { describe, expect, it } from 'vitest';
import { thresholdName } from '../../src/report/threshold-name.js';

describe('thresholdName', () => {
  it('thresholdName(1.5, 1850-1900) is "1.5 K": on the AR6 baseline a threshold is an AR6 warming level', () => {
    expect(thresholdName(1.5, [1850, 1900])).toBe('1.5 K');
    expect(thresholdName(2, [1850, 1900])).toBe('2 K');
  });

  it('thresholdName(1.5, 1995-2014) names the baseline: "1.5 K above the 1995-2014 mean"', () => {
    expect(thresholdName(1.5, [1995, 2014])).toBe('1.5 K above the 1995-2014 mean');
    expect(thresholdName(3, [1850, 1899])).toBe('3 K above the 1850-1899 mean');
  });
});

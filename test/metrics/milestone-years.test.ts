import { describe, expect, it } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { milestoneYears } from '../../src/metrics/milestone-years.js';

describe('milestoneYears', () => {
  it('milestoneYears(2024, 2100) is the decades 2030..2100', () => {
    expect(milestoneYears(2024, 2100)).toEqual([2030, 2040, 2050, 2060, 2070, 2080, 2090, 2100]);
  });

  it('milestoneYears includes a first future year that is itself on the grid, and stops before a last year off it', () => {
    expect(milestoneYears(2030, 2075, 20)).toEqual([2040, 2060]);
    expect(milestoneYears(2020, 2055)).toEqual([2020, 2030, 2040, 2050]);
  });

  it('milestoneYears is empty when no multiple of the step falls in the span, and rejects a bad step', () => {
    expect(milestoneYears(2031, 2039)).toEqual([]);
    expect(() => milestoneYears(2020, 2100, 0)).toThrow(ConfigError);
  });
});

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

describe('reportYears', () => {
  it('reportYears gives every 10 years to 2100, every 25 after, and the last year (common practice, no source: the years planners quote)', async () => {
    const { reportYears } = await import('../../src/metrics/milestone-years.js');
    expect(reportYears(1750, 2150, 2025)).toEqual([2030, 2040, 2050, 2060, 2070, 2080, 2090, 2100, 2125, 2150]);
    expect(reportYears(1750, 2100, 2025)).toEqual([2030, 2040, 2050, 2060, 2070, 2080, 2090, 2100]);
    expect(reportYears(1750, 2113, 2025).slice(-2)).toEqual([2100, 2113]);
    expect(reportYears(1750, 2150, 2025, { every: 5 }).slice(0, 3)).toEqual([2025, 2030, 2035]);
    expect(reportYears(1750, 2150, 2025, { years: [2100, 2030, 2100, 1700] })).toEqual([2030, 2100]);
  });
});

import { describe, expect, it } from 'vitest';
import { describeTimeSteps, isAnnualGrid } from '../../src/io/time-steps.js';

describe('describeTimeSteps', () => {
  it('describeTimeSteps names equal, fractional and irregular steps', () => {
    expect(describeTimeSteps(Float64Array.of(2025, 2030, 2035))).toBe('5-year steps');
    expect(describeTimeSteps(Float64Array.of(2025, 2026))).toBe('1-year steps');
    expect(describeTimeSteps(Float64Array.of(2025, 2025.5, 2026))).toBe('steps of 0.5 years');
    expect(describeTimeSteps(Float64Array.of(2025, 2030, 2040))).toBe('irregular steps of 5 to 10 years');
    expect(describeTimeSteps(Float64Array.of(2025))).toBe('a single row');
  });

  it('describeTimeSteps ignores rounding far below a day (0.1-year steps written as decimals)', () => {
    const t = Float64Array.from({ length: 11 }, (_, i) => 2025 + i * 0.1);
    expect(describeTimeSteps(t)).toBe('steps of 0.1 years');
  });
});

describe('isAnnualGrid', () => {
  it('isAnnualGrid is true only for consecutive whole years', () => {
    expect(isAnnualGrid(Float64Array.of(2025, 2026, 2027))).toBe(true);
    expect(isAnnualGrid(Float64Array.of(2025, 2027))).toBe(false);
    expect(isAnnualGrid(Float64Array.of(2025.5, 2026.5))).toBe(false);
  });
});

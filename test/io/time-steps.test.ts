import { describe, expect, it } from 'vitest';
import { describeTimeSteps, formatDecimalYear, formatStepLength, isAnnualGrid } from '../../src/io/time-steps.js';

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

describe('describeTimeSteps for people', () => {
  it('describeTimeSteps gives years with at most two decimals (5 to 11 years, not 5 to 10.997)', () => {
    expect(describeTimeSteps(Float64Array.of(2025, 2030, 2040.997))).toBe('irregular steps of 5 to 11 years');
    expect(describeTimeSteps(Float64Array.of(2025, 2025.333, 2025.666))).toBe('steps of 0.33 years');
  });

  it('describeTimeSteps gives steps under a tenth of a year in whole days (monthly dates: 28 to 31 days)', () => {
    // 15 January to 15 February 2025 is 31 days, 15 February to 15 March 28 days (2025 is a common year).
    const t = Float64Array.of(2025 + 14.5 / 365, 2025 + 45.5 / 365, 2025 + 73.5 / 365);
    expect(describeTimeSteps(t)).toBe('irregular steps of 28 to 31 days');
    expect(describeTimeSteps(Float64Array.of(2025, 2025 + 7 / 365, 2026))).toBe('irregular steps of 7 days to 0.98 years');
  });

  it('describeTimeSteps says "about" when two different steps print the same', () => {
    expect(describeTimeSteps(Float64Array.of(2025, 2030, 2034.999))).toBe('steps of about 5 years');
  });
});

describe('formatDecimalYear and formatStepLength', () => {
  it('formatDecimalYear keeps at most two decimals and drops trailing zeros', () => {
    expect(formatDecimalYear(2050.4986)).toBe('2050.5');
    expect(formatDecimalYear(2024.5397)).toBe('2024.54');
    expect(formatDecimalYear(2030)).toBe('2030');
  });

  it('formatStepLength says 1 day and 1 year in the singular', () => {
    expect(formatStepLength(1 / 365.2425)).toBe('1 day');
    expect(formatStepLength(31 / 365)).toBe('31 days');
    expect(formatStepLength(1)).toBe('1 year');
    expect(formatStepLength(10.997)).toBe('11 years');
  });
});

describe('isAnnualGrid', () => {
  it('isAnnualGrid is true only for consecutive whole years', () => {
    expect(isAnnualGrid(Float64Array.of(2025, 2026, 2027))).toBe(true);
    expect(isAnnualGrid(Float64Array.of(2025, 2027))).toBe(false);
    expect(isAnnualGrid(Float64Array.of(2025.5, 2026.5))).toBe(false);
  });
});

import { describe, expect, it } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { absentEmissionsFactor, describeAbsentEmissionsRule, parseAbsentEmissionsRule } from '../../src/forcing/absent-emissions.js';

const years = Float64Array.from({ length: 6 }, (_, i) => 2025 + i);

describe('absent-emissions rules', () => {
  it('parses hold, follow-co2 and zero-by-YEAR, and refuses anything else naming the choices', () => {
    expect(parseAbsentEmissionsRule('hold')).toEqual({ kind: 'hold' });
    expect(parseAbsentEmissionsRule('Follow-CO2')).toEqual({ kind: 'follow-co2' });
    expect(parseAbsentEmissionsRule('zero-by-2050')).toEqual({ kind: 'zero-by', year: 2050 });
    expect(() => parseAbsentEmissionsRule('freeze')).toThrow(/hold, follow-co2, zero-by-YEAR/);
  });

  it('zero-by falls linearly from 1 in the first year to 0 in the named year', () => {
    const r = absentEmissionsFactor({ kind: 'zero-by', year: 2030 }, years);
    [1, 0.8, 0.6, 0.4, 0.2, 0].forEach((x, i) => expect(r[i]).toBeCloseTo(x, 14));
  });

  it('follow-co2 is the CO2 ratio to the first year, never negative; it needs CO2 emissions', () => {
    const co2 = Float64Array.of(40, 30, 20, 0, -5, -10);
    expect(Array.from(absentEmissionsFactor({ kind: 'follow-co2' }, years, co2))).toEqual([1, 0.75, 0.5, 0, 0, 0]);
    expect(() => absentEmissionsFactor({ kind: 'follow-co2' }, years)).toThrow(ConfigError);
  });

  it('each rule reads as words for the headline', () => {
    expect(describeAbsentEmissionsRule({ kind: 'hold' })).toMatch(/present-day/);
  });
});

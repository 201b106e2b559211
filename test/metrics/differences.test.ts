import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { differences } from '../../src/metrics/differences.js';

const series = fc
  .record({ start: fc.integer({ min: 1990, max: 2030 }), values: fc.array(fc.double({ min: -4, max: 6, noNaN: true }), { minLength: 0, maxLength: 60 }) })
  .map(({ start, values }) => ({ years: Float64Array.from(values, (_, i) => start + i), values: Float64Array.from(values) }));

describe('differences', () => {
  it('differences(a, b) is exactly minus differences(b, a) on the same years (antisymmetry)', () => {
    fc.assert(
      fc.property(series, series, (a, b) => {
        const ab = differences(a, b);
        const ba = differences(b, a);
        expect(Array.from(ab.years)).toEqual(Array.from(ba.years));
        // Equal as numbers: where a and b agree, a - b is +0 and -(b - a) is -0, which compare equal.
        for (let i = 0; i < ab.values.length; i++) expect(ab.values[i] === -ba.values[i], `year ${ab.years[i]}`).toBe(true);
      }),
    );
  });

  it('differences(a, a) is zero on every year of a', () => {
    fc.assert(
      fc.property(series, (a) => {
        const d = differences(a, a);
        expect(Array.from(d.years)).toEqual(Array.from(a.years));
        expect(d.values.every((v) => v === 0)).toBe(true);
      }),
    );
  });

  it('differences keeps only the years both series hold and subtracts reference from other', () => {
    const d = differences(
      { years: Float64Array.of(2030, 2040, 2050), values: Float64Array.of(1.5, 1.7, 1.9) },
      { years: Float64Array.of(2040, 2050, 2060), values: Float64Array.of(1.6, 2.0, 2.2) },
    );
    expect(Array.from(d.years)).toEqual([2040, 2050]);
    expect(d.values[0]).toBe(1.6 - 1.7);
    expect(d.values[1]).toBe(2.0 - 1.9);
  });
});

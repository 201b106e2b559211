import fc from 'fast-check';
import { max } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { peak } from '../../src/metrics/peak.js';

describe('peak', () => {
  it('peak(years, values).value is mathjs max, at the first year holding it (reference library)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -300, max: 300 }), { minLength: 1, maxLength: 80 }), (ints) => {
        const values = Float64Array.from(ints, (v) => v / 100);
        const years = Float64Array.from(ints, (_, i) => 1900 + i);
        const p = peak(years, values);
        expect(p.value).toBe(max(Array.from(values)));
        expect(p.index).toBe(Array.from(values).indexOf(p.value));
        expect(p.year).toBe(1900 + p.index);
      }),
    );
  });

  it('peak skips NaN and gives NaN fields for an empty or all-NaN series', () => {
    expect(peak([2000, 2001, 2002], [NaN, 1.2, NaN])).toEqual({ year: 2001, value: 1.2, index: 1 });
    expect(peak([], [])).toEqual({ year: NaN, value: NaN, index: -1 });
    expect(peak([2000], [NaN]).index).toBe(-1);
  });

  it('peak of a rise-then-fall series is at the turning point (by construction)', () => {
    const years = Float64Array.from({ length: 101 }, (_, i) => 2000 + i);
    const values = years.map((y) => 2 - ((y - 2063) / 30) ** 2);
    expect(peak(years, values)).toEqual({ year: 2063, value: 2, index: 63 });
  });
});

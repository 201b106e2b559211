import { quantileSeq } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { pairedDifferenceRange } from '../../src/metrics/paired-differences.js';

/** Year-major member values: year k of member r at k * m + r. */
function members(years: number, m: number, value: (k: number, r: number) => number): Float64Array {
  return Float64Array.from({ length: years * m }, (_, i) => value(Math.floor(i / m), i % m));
}

describe('pairedDifferenceRange', () => {
  const m = 101;
  const years = Float64Array.from({ length: 30 }, (_, k) => 2000 + k);

  it('an option that shifts every member by the same 0.3 K has a difference range of exactly 0.3 K at every percentile, however wide the members spread', () => {
    const a = members(30, m, (k, r) => 1 + 0.02 * k + 0.05 * r);
    const b = members(30, m, (k, r) => 1.3 + 0.02 * k + 0.05 * r);
    const d = pairedDifferenceRange({ firstYear: 2000, members: m, warmingK: a }, { firstYear: 2000, members: m, warmingK: b }, years);
    for (const p of [d.p05, d.p17, d.p50, d.p83, d.p95]) for (const v of p) expect(v).toBeCloseTo(0.3, 12);
  });

  it('percentiles of the paired differences agree with mathjs quantileSeq (outside reference library, Hyndman & Fan definition 7), and years one option lacks are NaN', () => {
    const a = members(30, m, (k, r) => Math.sin(r * 1.3 + k) + 0.01 * k);
    const b = members(25, m, (k, r) => Math.cos(r * 0.7) + 0.02 * (k + 5));
    const d = pairedDifferenceRange({ firstYear: 2000, members: m, warmingK: a }, { firstYear: 2005, members: m, warmingK: b }, years);
    for (const k of [5, 12, 29]) {
      const diffs = Array.from({ length: m }, (_, r) => b[(k - 5) * m + r] - a[k * m + r]);
      expect(d.p05[k]).toBeCloseTo(quantileSeq(diffs, 0.05) as number, 12);
      expect(d.p50[k]).toBeCloseTo(quantileSeq(diffs, 0.5) as number, 12);
      expect(d.p95[k]).toBeCloseTo(quantileSeq(diffs, 0.95) as number, 12);
    }
    expect(Number.isNaN(d.p50[4])).toBe(true);
  });
});

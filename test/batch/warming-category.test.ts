// The AR6 WG3 warming categories (IPCC AR6 WG3 Table SPM.2 and Annex III; criteria recalled from
// memory) on constructed members: shares of members above the levels decide the category.
import { describe, expect, it } from 'vitest';
import { categoryEvidence, warmingCategory } from '../../src/batch/warming-category.js';

/** 100 members whose peaks are `peak(i)` and whose 2100 warming is `end(i)`, i = 0..99. */
function members(peak: (i: number) => number, end?: (i: number) => number) {
  const peaks = Float64Array.from({ length: 100 }, (_, i) => peak(i));
  const ends = end ? Float64Array.from({ length: 100 }, (_, i) => end(i)) : undefined;
  return warmingCategory(categoryEvidence(peaks, ends)).code;
}

describe('warmingCategory (AR6 WG3 criteria, from memory)', () => {
  it('C1: peak above 1.5 K for at most 67 % of members and 2100 below 1.5 K for more than half', () => {
    // 67 members peak above 1.5 K (<= 67 %), 60 end below 1.5 K.
    expect(members((i) => (i < 67 ? 1.6 : 1.4), (i) => (i < 60 ? 1.3 : 1.6))).toBe('C1');
  });

  it('C2: peak above 1.5 K for more than 67 % of members, back below 1.5 K in 2100 for more than half', () => {
    expect(members((i) => (i < 68 ? 1.7 : 1.4), (i) => (i < 51 ? 1.4 : 1.6))).toBe('C2');
  });

  it('without 2100 below 1.5 K for more than half, a low peak is C3, not C1', () => {
    // Exactly half below 1.5 K in 2100 is not "more than 50 %".
    expect(members((i) => (i < 50 ? 1.6 : 1.4), (i) => (i < 50 ? 1.4 : 1.6))).toBe('C3');
    // A run that ends before 2100 cannot show it either.
    expect(members((i) => (i < 50 ? 1.6 : 1.4))).toBe('C3');
  });

  it('C3 needs peak below 2 K for more than 67 % of members; 67 % exactly is C4', () => {
    expect(members((i) => (i < 32 ? 2.1 : 1.9), () => 1.8)).toBe('C3');
    expect(members((i) => (i < 33 ? 2.1 : 1.9), () => 1.8)).toBe('C4');
  });

  it('C4 to C8 follow the median peak: below 2, 2.5, 3, 4 K, else C8', () => {
    const median = (p: number) => members((i) => p - 0.5 + i / 100, () => p);
    expect(median(1.99)).toBe('C4');
    expect(median(2.3)).toBe('C5');
    expect(median(2.8)).toBe('C6');
    expect(median(3.5)).toBe('C7');
    expect(median(4.2)).toBe('C8');
  });

  it('exactly half the members above 2 K is not "below 2 K with more than 50 %": C5', () => {
    expect(members((i) => (i < 50 ? 2.2 : 1.8), () => 2)).toBe('C5');
  });
});

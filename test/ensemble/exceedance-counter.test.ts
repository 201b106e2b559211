import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ExceedanceCounter, exceedanceCountsLength } from '../../src/ensemble/index.js';
import { largestSumNotAbove } from '../../src/ensemble/exceedance-counter.js';
import { runningMeanInto } from '../../src/ensemble/running-mean.js';

describe('ExceedanceCounter', () => {
  it('ExceedanceCounter counts, year by year, the members whose 20-year mean exceeds each threshold and their first crossings, as a direct count on runningMeanInto does (IPCC AR6 convention; thresholds in any order, jumps over two levels at once)', () => {
    const n = 200;
    // Square waves and steps that jump over several thresholds in one year, up and down.
    const members = [
      Float64Array.from({ length: n }, (_, k) => (Math.floor(k / 35) % 2 === 0 ? 0 : 3)),
      Float64Array.from({ length: n }, (_, k) => (k < 60 ? 0 : k < 120 ? 2.5 : 0.2)),
      Float64Array.from({ length: n }, (_, k) => 0.02 * k),
      Float64Array.from({ length: n }, () => 1), // exactly at a threshold: not above it
    ];
    const thresholds = [2, 0.5, 1];
    const counter = new ExceedanceCounter(thresholds, n);
    const rows = new Float64Array(members.length * n);
    members.forEach((m, r) => rows.set(m, r * n));
    members.forEach((_, r) => counter.addMember(rows, r * n));
    const counts = new Float64Array(exceedanceCountsLength(thresholds.length, n));
    counter.addCountsTo(counts);

    const means = members.map((m) => {
      const out = new Float64Array(n);
      runningMeanInto(m, out);
      return out;
    });
    thresholds.forEach((t, j) => {
      for (let c = 9; c + 10 < n; c++) {
        expect(counts[j * n + c], `above ${t} in year ${c}`).toBe(means.filter((mean) => mean[c] > t).length);
        const firsts = means.filter((mean) => mean.findIndex((v) => v > t) === c).length;
        expect(counts[(thresholds.length + j) * n + c], `first above ${t} in year ${c}`).toBe(firsts);
      }
      // Years whose window leaves the run get nothing.
      for (const c of [0, 8, n - 10, n - 1]) expect(counts[j * n + c]).toBe(0);
    });
  });

  it('largestSumNotAbove(t, 20) splits the doubles exactly: s / 20 > t whenever s is above it and never otherwise (IEEE 754 division is correctly rounded, hence monotone)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.integer({ min: -40, max: 40 }), (t, ulps) => {
        const s = largestSumNotAbove(t, 20);
        expect(s / 20 > t).toBe(false);
        // Doubles a few ulps around the split, and the split's neighbour above.
        const above = s + Math.abs(s) * Number.EPSILON * 0.5 + Number.MIN_VALUE;
        expect(above > s && above / 20 > t).toBe(true);
        const probe = t * 20 * (1 + ulps * Number.EPSILON);
        expect(probe / 20 > t).toBe(probe > s);
      }),
    );
    expect(largestSumNotAbove(Infinity, 20)).toBe(Infinity);
    expect(largestSumNotAbove(-Infinity, 20)).toBe(-Infinity);
  });
});

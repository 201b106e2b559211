import { describe, expect, it } from 'vitest';
import { emptyMemberPeaks, memberPeaksInto, runEnsemble } from '../../src/ensemble/index.js';
import { peak } from '../../src/metrics/peak.js';
import { ensembleInputOf, syntheticPathway } from './synthetic-input.js';

describe('memberPeaksInto', () => {
  it('memberPeaksInto gives each member its highest value and the first year of it on ties (the JSDoc example)', () => {
    const out = emptyMemberPeaks(2);
    memberPeaksInto(Float64Array.of(0.1, 0.5, 0.9, 0.2, 0.4, 0.2), 2, 3, 0, 2, out);
    expect(Array.from(out.warmingK)).toEqual([0.9, 0.5]);
    expect(Array.from(out.yearIndex)).toEqual([1, 0]);
    // A flat series peaks in its first year; one still rising, in its last.
    const flat = emptyMemberPeaks(2);
    memberPeaksInto(Float64Array.of(1, 0, 1, 1, 1, 2), 2, 3, 0, 2, flat);
    expect(Array.from(flat.yearIndex)).toEqual([0, 2]);
  });

  it('memberPeaksInto agrees with peak() (metrics) on every member of random year-major values, and touches only members [from, to)', () => {
    const m = 37;
    const n = 50;
    let x = 99;
    const random = () => ((x = (Math.imul(x, 1103515245) + 12345) >>> 0) / 2 ** 32);
    // Values rounded to tenths, so that ties occur.
    const values = Float64Array.from({ length: m * n }, () => Math.round(10 * random()) / 10);
    const out = emptyMemberPeaks(m);
    memberPeaksInto(values, m, n, 3, 30, out);
    const years = Float64Array.from({ length: n }, (_, k) => k);
    for (let r = 0; r < m; r++) {
      if (r < 3 || r >= 30) {
        expect(out.yearIndex[r]).toBe(-1);
        continue;
      }
      const top = peak(years, Float64Array.from({ length: n }, (_, k) => values[k * m + r]));
      expect([out.warmingK[r], out.yearIndex[r]], `member ${r}`).toEqual([top.value, top.index]);
    }
  });
});

describe('members\' own peaks in runEnsemble', () => {
  // The synthetic pathway's forcing rises to a peak around 2060 and falls after it (its CO2 declines),
  // so members with a moderate response peak inside the run; the run goes on to 2150.
  const pathway = syntheticPathway(1750, 2150);
  const input = ensembleInputOf(pathway);
  const options = { members: 400, seed: 3, thresholds: [1.5, 2], baseline: [1850, 1900] as [number, number], keepMembers: true };

  it('every member\'s peak is one of its yearly values and at least each of them; percentiles of peak warming and peak year are ordered', async () => {
    const r = await runEnsemble(input, options);
    const { warmingK, memberCount: m } = r.members!;
    const n = r.years.length;
    const { peaks } = r.memberParameters;
    const wrong: string[] = [];
    for (let i = 0; i < m; i++) {
      const k = peaks.yearIndex[i];
      if (!(Number.isInteger(k) && k >= 0 && k < n) || peaks.warmingK[i] !== warmingK[k * m + i]) wrong.push(`member ${i}: not one of its values`);
      for (let j = 0; j < n; j++) if (warmingK[j * m + i] > peaks.warmingK[i]) wrong.push(`member ${i}: year ${j} above its peak`);
      // The first such year: no earlier year reaches the peak.
      for (let j = 0; j < k; j++) if (warmingK[j * m + i] >= peaks.warmingK[i]) wrong.push(`member ${i}: year ${j} reaches its peak before ${k}`);
    }
    expect(wrong).toEqual([]);
    const { warmingK: w, year } = r.peak;
    expect(w.p05 <= w.p17 && w.p17 <= w.p50 && w.p50 <= w.p83 && w.p83 <= w.p95).toBe(true);
    expect(year.p05 <= year.p17 && year.p17 <= year.p50 && year.p50 <= year.p83 && year.p83 <= year.p95).toBe(true);
    // The members' median peak is at least the median line's value in any year (each member's peak is
    // at least its value in that year, and percentiles are monotone).
    let medianLinePeak = -Infinity;
    for (let k = 0; k < n; k++) medianLinePeak = Math.max(medianLinePeak, r.percentiles.p50[k]);
    expect(w.p50).toBeGreaterThanOrEqual(medianLinePeak);
  });

  it('with forcing that rises then falls, the members\' peak years are interior (after the forcing starts rising, before the run\'s end) and few members are still rising', async () => {
    const r = await runEnsemble(input, options);
    const last = r.years[r.years.length - 1];
    expect(r.peak.year.p05).toBeGreaterThan(2000);
    expect(r.peak.year.p50).toBeLessThan(last);
    expect(r.peak.stillRising).toBeLessThan(0.5);
    // Still rising means the peak is in the last year.
    const { peaks } = r.memberParameters;
    const rising = Array.from(peaks.yearIndex).filter((k) => k === r.years.length - 1).length;
    expect(r.peak.stillRising).toBe(rising / r.memberCount);
  });

  it('with forcing still rising at the end, every member peaks in the last year (still rising 100 %)', async () => {
    const rising = syntheticPathway(1750, 2050);
    const r = await runEnsemble(ensembleInputOf(rising), { ...options, members: 50 });
    expect(r.peak.stillRising).toBe(1);
    expect(r.peak.year.p05).toBe(2050);
  });
});

describe('the percentiles of the members\' peak years', () => {
  it('runEnsemble gives every peak-year percentile as a year some member peaks in (Hyndman & Fan 1996, definition 1)', async () => {
    const pathway = syntheticPathway();
    const result = await runEnsemble(ensembleInputOf(pathway), { members: 200, seed: 11, keepMembers: true });
    const peakYears = new Set(Array.from(result.memberParameters.peaks!.yearIndex, (k) => result.years[0] + k));
    for (const [name, year] of Object.entries(result.peak.year)) expect(peakYears.has(year), `${name} ${year}`).toBe(true);
  });
});

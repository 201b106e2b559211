import { describe, expect, it } from 'vitest';
import { comparisonSummary } from '../../src/report/comparison-json.js';

/** The summary as its JSON files hold it, after a provenance. */
const comparisonJson = (c: Parameters<typeof comparisonSummary>[0], provenance: object) => JSON.stringify({ provenance, ...comparisonSummary(c) }, null, 2) + '\n';
import { fixtureComparison, oddsComparison, provenance } from './comparison-fixture.js';

describe('comparisonSummary', () => {
  const c = fixtureComparison();
  const text = comparisonJson(c, provenance);
  const doc = JSON.parse(text);

  it('comparisonJson carries the provenance unchanged, first', () => {
    expect(doc.provenance).toEqual(provenance);
    expect(Object.keys(doc)[0]).toBe('provenance');
  });

  it('comparisonJson numbers are the comparison\'s at full precision: milestones, peaks, crossings, milestones and crossings', () => {
    c.pathways.forEach((p, k) => {
      const j = doc.pathways[k];
      expect(j.pathway).toBe(p.label);
      expect(j.peak).toEqual({ year: p.peak.year, warming_k: p.peak.value, still_rising: p.stillRising });
      expect(j.milestones.map((m: { warming_k: number }) => m.warming_k)).toEqual(p.milestones.map((m) => m.warmingK));
      expect(j.milestones.map((m: { difference_k: number }) => m.difference_k)).toEqual(p.milestones.map((m) => m.differenceK));
      expect(j.crossings.map((x: { year: number }) => x.year)).toEqual(p.crossings.map((x) => x.period!.year));
    });
    expect(doc.pathways[2].net_zero).toEqual({ year: 2047, cumulative_co2_gtco2: 553.5, from_year: 2020, to_year: 2046 });
    expect(doc.pathways[0].net_zero).toBeUndefined();
  });

  it('comparisonJson writes NaN and "not crossed" as null, ', () => {
    const cc = { ...c, pathways: c.pathways.map((p) => ({ ...p, crossings: [{ thresholdK: 5, period: undefined }], milestones: [{ year: 2200, warmingK: NaN, differenceK: NaN }] })) };
    const j = JSON.parse(comparisonJson(cc, {}));
    expect(j.pathways[0].crossings[0].year).toBeNull();
    expect(j.pathways[0].milestones[0].warming_k).toBeNull();
    expect(text.endsWith('}\n')).toBe(true);
  });

  it('comparisonJson marks an ensemble pathway\'s central estimate as its median and carries the members\' odds and prob_above series', () => {
    const doc = JSON.parse(comparisonJson(oddsComparison(), {}));
    expect(doc.pathways.map((p: { central_estimate: string }) => p.central_estimate)).toEqual(['single run', 'ensemble median']);
    const [c15, c2] = doc.pathways[1].crossings;
    expect(c15.year).toBe(2046);
    expect(c15.odds).toEqual({ by_year: [{ year: 2050, probability: 0.62 }, { year: 2100, probability: null }], within_run: 0.97, last_window_year: 2090 });
    // The median line (1 + 0.0082 (y - 2000) K) has its own first 20-year period above 1.5 K: 2052-2071, labelled 2061.
    expect(c15.median_line).toMatchObject({ year: 2061, period_first_year: 2052, period_last_year: 2071 });
    expect(c2.year).toBeNull();
    expect(doc.pathways[0].crossings[0].year).toBe(2061);
    expect(doc.pathways[0].crossings[0].odds).toBeUndefined();
    // The members' own peaks beside the median line's.
    expect(doc.pathways[1].members_peak).toEqual({
      warming_k: { p05: 1.52, p17: 1.7, p50: 1.95, p83: 2.3, p95: 2.61 },
      year: { p05: 2061, p17: 2072.3, p50: 2087.6, p83: 2100, p95: 2100 },
      still_rising: 0.4,
    });
    expect(doc.pathways[0].members_peak).toBeUndefined();
  });
});

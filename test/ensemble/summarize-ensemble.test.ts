import { describe, expect, it } from 'vitest';
import { FEW_MEMBERS, fewMembersWarning, PERCENTILES, summarizeEnsemble, TWO_BOX_KEYS, type EnsembleMembers } from '../../src/ensemble/index.js';
import { runningMeanInto } from '../../src/ensemble/running-mean.js';
import { quantileSorted } from '../../src/numerics/quantiles.js';

/** Random-walk members on 1900-2000 (year-major), for checking the statistics by brute force. */
function members(m: number, thresholds = [0.5, 1, 1.5]): EnsembleMembers {
  const n = 101;
  const warmingK = new Float64Array(m * n);
  let x = 12345;
  const random = () => ((x = (Math.imul(x, 1103515245) + 12345) >>> 0) / 2 ** 32);
  for (let r = 0; r < m; r++) {
    let v = 0;
    const drift = 0.03 * random();
    for (let k = 0; k < n; k++) warmingK[k * m + r] = v += drift + 0.1 * (random() - 0.5);
  }
  return {
    config: { scheme: 'test', seed: 0, membersTotal: m, firstYear: 1900, yearCount: n, baseline: [1900, 1910], thresholds, milestones: [1950, 1990, 1995, 2000], co2Formula: 'ar6', sourceNotes: ['test members'], emissionDriven: false, inputChecksum: '' },
    memberStart: 0,
    memberCount: m,
    warmingK,
    parameters: { count: m, values: Object.fromEntries([...TWO_BOX_KEYS, 'ecs_k', 'tcr_k'].map((p) => [p, Float64Array.from({ length: m }, () => random())])) as EnsembleMembers['parameters']['values'] },
    redraws: 3,
  };
}

const series = (e: EnsembleMembers, r: number) => Float64Array.from({ length: e.config.yearCount }, (_, k) => e.warmingK[k * e.memberCount + r]);

describe('summarizeEnsemble', () => {
  const e = members(1500);
  const result = summarizeEnsemble(e);
  const n = e.config.yearCount;

  it('summarizeEnsemble percentiles equal quantileSorted of each year\'s sorted member values, bit for bit (Hyndman & Fan 1996, definition 7)', () => {
    for (let k = 0; k < n; k++) {
      const column = Float64Array.from({ length: e.memberCount }, (_, r) => e.warmingK[k * e.memberCount + r]).sort();
      PERCENTILES.forEach((p, j) => expect(result.percentiles[(['p05', 'p17', 'p50', 'p83', 'p95'] as const)[j]][k]).toBe(quantileSorted(column, p)));
    }
  });

  it('summarizeEnsemble exceedance and crossing statistics equal a member-by-member count on 20-year means (IPCC AR6 convention, years y-9..y+10)', () => {
    const means = Array.from({ length: e.memberCount }, (_, r) => {
      const out = new Float64Array(n);
      runningMeanInto(series(e, r), out);
      return out;
    });
    e.config.thresholds.forEach((t, j) => {
      for (let k = 0; k < n; k++) {
        const complete = k >= 9 && k + 10 < n;
        const share = means.filter((mean) => mean[k] > t).length / e.memberCount;
        if (complete) expect(result.probAbove[j][k]).toBe(share);
        else expect(result.probAbove[j][k]).toBeNaN();
      }
      const crossing = means.map((mean) => {
        const k = mean.findIndex((v) => v > t);
        return k < 0 ? Infinity : 1900 + k;
      });
      // crossed_by_<t>: the share of members whose first 20-year mean above t is labelled in or before the year.
      for (let k = 9; k + 10 < n; k++) expect(result.crossedBy[j][k]).toBe(crossing.filter((y) => y <= 1900 + k).length / e.memberCount);
      const c = result.crossings[j];
      for (const { year, probability } of c.byMilestone) {
        if (year + 10 > 2000) expect(probability).toBeNull();
        else expect(probability).toBe(crossing.filter((y) => y <= year).length / e.memberCount);
      }
      const sorted = [...crossing].sort((x, y) => x - y);
      const median = sorted[Math.ceil(e.memberCount / 2) - 1];
      expect(c.medianYear).toBe(Number.isFinite(median) ? median : null);
      expect(c.probabilityWithinRun).toBe(crossing.filter(Number.isFinite).length / e.memberCount);
      expect(c.aboveAtStart).toBe(means.filter((mean) => mean[9] > t).length / e.memberCount);
    });
  });

  it('summarizeEnsemble counts the members already above a level in the first 20-year window (aboveAtStart); at least half of them makes the median crossing year the first window\'s year', () => {
    const low = members(400, [-1, 0.25, 5]);
    const r = summarizeEnsemble(low);
    const firstMeans = Array.from({ length: 400 }, (_, i) => {
      const out = new Float64Array(low.config.yearCount);
      runningMeanInto(series(low, i), out);
      return out[9];
    });
    expect(r.crossings[0].aboveAtStart).toBe(1);
    expect(r.crossings[0].medianYear).toBe(1909);
    const share = firstMeans.filter((v) => v > 0.25).length / 400;
    expect(share).toBeGreaterThan(0);
    expect(share).toBeLessThan(0.5);
    expect(r.crossings[1].aboveAtStart).toBe(share);
    expect(r.crossings[1].medianYear).toBeGreaterThan(1909);
    expect(r.crossings[2].aboveAtStart).toBe(0);
  });

  it('summarizeEnsemble orders its percentiles and its exceedance probabilities (quantiles are monotone in p; a higher level is exceeded no more often)', () => {
    for (let k = 0; k < n; k++) {
      const q = result.percentiles;
      expect(q.p05[k]).toBeLessThanOrEqual(q.p17[k]);
      expect(q.p17[k]).toBeLessThanOrEqual(q.p50[k]);
      expect(q.p50[k]).toBeLessThanOrEqual(q.p83[k]);
      expect(q.p83[k]).toBeLessThanOrEqual(q.p95[k]);
      if (k >= 9 && k + 10 < n) {
        expect(result.probAbove[1][k]).toBeLessThanOrEqual(result.probAbove[0][k]);
        expect(result.probAbove[2][k]).toBeLessThanOrEqual(result.probAbove[1][k]);
      }
    }
  });

  it('summarizeEnsemble reports the redraws, parameter quantiles and conventions it used', () => {
    expect(result.redraws).toBe(3);
    const ecs = Float64Array.from(e.parameters.values.ecs_k!).sort();
    expect(result.parameters.ecs_k.p50).toBe(quantileSorted(ecs, 0.5));
    expect(result.notes.join('\n')).toMatch(/20-year mean/);
    expect(result.notes.join('\n')).toMatch(/3 unphysical parameter draws were redrawn/);
  });
});

describe('fewMembersWarning', () => {
  it('fewMembersWarning(n) warns below 100 members with the binomial standard error 0.5/sqrt(n) of a probability near 50 % (common practice, no source)', () => {
    expect(fewMembersWarning(25)).toMatch(/^only 25 members: .* about 10 percentage points, 0\.5\/sqrt\(25\)/);
    expect(fewMembersWarning(1)).toMatch(/^only 1 member: .* about 50 percentage points/);
    expect(fewMembersWarning(FEW_MEMBERS - 1)).toBeDefined();
    expect(fewMembersWarning(FEW_MEMBERS)).toBeUndefined();
  });

  it('summarizeEnsemble notes the warning for an ensemble of fewer than 100 members, and not for 100', () => {
    expect(summarizeEnsemble(members(30)).notes.filter((n) => n.startsWith('warning: only 30 members'))).toHaveLength(1);
    expect(summarizeEnsemble(members(100)).notes.some((n) => n.startsWith('warning:'))).toBe(false);
  });
});


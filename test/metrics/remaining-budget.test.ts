import { describe, expect, it } from 'vitest';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { normalQuantile } from '../../src/ensemble/normal-quantile.js';
import {
  BUDGET_TOLERANCE_GTCO2,
  budgetSamplingSpread,
  remainingBudget,
  straightLineDecline,
  straightLineFamily,
  stretchedShapeFamily,
  type BudgetMember,
  type RemainingBudget,
} from '../../src/metrics/remaining-budget.js';
import { expectClose } from '../asserts.js';

const years = Float64Array.from({ length: 2300 - 1750 + 1 }, (_, i) => 1750 + i);
const fromYear = 2025;
const fromIndex = fromYear - 1750;

/**
 * A member whose warming is exactly proportional to cumulative CO2 (the TCRE relation, IPCC AR6 WG1
 * SPM D.1: warming is near-linear in cumulative CO2) plus a constant non-CO2 part: warming in year y
 * = historical + tcre x (CO2 emitted from fromYear through y) + nonCo2. Its budget follows by hand:
 * (limit - historical - nonCo2) / tcre.
 */
function tcreMember(historicalK: number, tcreKPerGtco2: number, nonCo2K: number): BudgetMember {
  return {
    warming(future) {
      const w = new Float64Array(years.length).fill(historicalK + nonCo2K);
      let cum = 0;
      for (let i = 0; i < future.length; i++) {
        cum += future[i];
        w[fromIndex + i] = historicalK + nonCo2K + tcreKPerGtco2 * cum;
      }
      return w;
    },
  };
}

describe('straightLineDecline', () => {
  it('adds up to rate x D / 2 (the area of the triangle), also for a fractional D', () => {
    expectClose(straightLineDecline(40, 25.3, 100).reduce((a, b) => a + b, 0), (40 * 25.3) / 2, 1e-9, 'sum');
    expect(Array.from(straightLineDecline(40, 2, 3))).toEqual([30, 10, 0]);
  });
});

describe('remainingBudget on constructed members (TCRE relation, AR6 WG1 SPM D.1)', () => {
  it('one member: budget = (limit - historical - non-CO2) / TCRE, by hand', () => {
    // 1.1 K to date, TCRE 0.45 K per 1000 Gt CO2 (AR6 central value), 0.1 K non-CO2: (1.5 - 1.2) / 0.00045 = 666.7 Gt CO2.
    const r = remainingBudget([tcreMember(1.1, 0.00045, 0.1)], straightLineFamily(40, fromYear, 200), { years, fromYear, limits: [1.5], chances: [0.5] });
    expectClose(r.rows[0].budgetGtco2, 0.3 / 0.00045, BUDGET_TOLERANCE_GTCO2, 'budget, Gt CO2 (found to the stated tolerance)');
    expect(r.rows[0].budgetGtco2).toBeLessThanOrEqual(0.3 / 0.00045 + 1e-9);
    // Net zero of the straight line that spends it: 2025 + 2 x 666.7 / 40 = 2058.3 -> reached during 2058.
    expect(r.rows[0].netZeroYear).toBe(2058);
  });

  it('the budget at chance p is the (1 - p) quantile of the members\' budgets', () => {
    // Five members with TCRE 0.3 ... 0.7 K per 1000 Gt CO2: budgets 0.4 / TCRE = 1333, 1000, 800, 667, 571 Gt CO2.
    const tcres = [0.0003, 0.0004, 0.0005, 0.0006, 0.0007];
    const members = tcres.map((t) => tcreMember(1.1, t, 0));
    const r = remainingBudget(members, straightLineFamily(40, fromYear, 200), { years, fromYear, limits: [1.5], chances: [0.5, 0.75] });
    const sorted = tcres.map((t) => 0.4 / t).sort((a, b) => a - b);
    expectClose(r.rows[0].budgetGtco2, sorted[2], 0.5, '50 %: the median member');
    // 75 %: the 25th percentile, h = 4 x 0.25 = 1: the second smallest.
    expectClose(r.rows[1].budgetGtco2, sorted[1], 0.5, '75 %');
  });

  it('a limit already exceeded at that chance is said so, not given as a negative budget', () => {
    const members = [tcreMember(1.6, 0.00045, 0), tcreMember(1.6, 0.00045, 0), tcreMember(1.0, 0.00045, 0)];
    const r = remainingBudget(members, straightLineFamily(40, fromYear, 200), { years, fromYear, limits: [1.5], chances: [0.5, 0.33] });
    expect(r.rows[0].met).toBe(false);
    expect(Number.isNaN(r.rows[0].budgetGtco2)).toBe(true);
    expect(r.members[0].filter((m) => m.status === 'exceeded')).toHaveLength(2);
  });

  it('a member that never reaches the limit gives a lower bound', () => {
    const r = remainingBudget([tcreMember(0.5, 0.000001, 0)], straightLineFamily(40, fromYear, 200), { years, fromYear, limits: [2], chances: [0.5] });
    expect(r.rows[0].atLeast).toBe(true);
    expect(r.members[0][0].status).toBe('beyond');
  });

  it('refuses a chance outside (0, 1) and a non-positive rate', () => {
    expect(() => remainingBudget([tcreMember(1, 0.0004, 0)], straightLineFamily(40, fromYear, 200), { years, fromYear, limits: [1.5], chances: [50] })).toThrow(/between 0 and 1/);
    expect(() => straightLineFamily(-1, fromYear, 200)).toThrow(/positive/);
  });

  it('a stretched shape: the stretch that spends the by-hand budget, its cumulative CO2 and net-zero year', () => {
    // Shape: 40 Gt CO2 a year for 10 years, then zero (400 Gt to net zero in 2035). TCRE member with 666.7 Gt left:
    // stretch x = 666.7 / 400 = 1.667, net zero at 2025 + 16.67 -> 2041.
    const shape = Float64Array.from({ length: 100 }, (_, i) => (i < 10 ? 40 : 0));
    const family = stretchedShapeFamily(shape, fromYear, [0.1, 5]);
    expectClose(family.path(2, 40).reduce((a, b) => a + b, 0), 800, 1e-9, 'a stretch of 2 doubles the total');
    const r = remainingBudget([tcreMember(1.1, 0.00045, 0.1)], family, { years, fromYear, limits: [1.5], chances: [0.5] });
    expectClose(r.rows[0].budgetGtco2, 0.3 / 0.00045, 0.5, 'cumulative CO2 to net zero');
    expect(r.rows[0].netZeroYear).toBe(2041);
  });

  it('a shape that never reaches net zero is refused', () => {
    expect(() => stretchedShapeFamily([40, 30, 20], fromYear, [0.1, 5])).toThrow(/never reaches zero/);
  });
});

describe('remainingBudget: brackets shared between limits', () => {
  it('several limits give each the budget of that limit alone (TCRE relation, AR6 WG1 SPM D.1)', () => {
    const member = tcreMember(1.1, 0.00045, 0.1);
    const together = remainingBudget([member], straightLineFamily(40, fromYear, 200), { years, fromYear, limits: [1.5, 1.7, 2], chances: [0.5] });
    for (const [i, limit] of [1.5, 1.7, 2].entries()) {
      expectClose(together.rows[i].budgetGtco2, (limit - 1.2) / 0.00045, BUDGET_TOLERANCE_GTCO2, `${limit} K`);
      expect(together.rows[i].x).toBeCloseTo((2 * together.rows[i].budgetGtco2) / 40, 9);
    }
  });
});

describe('budgetSamplingSpread (bootstrap, Efron 1979)', () => {
  /** A result whose n members' budgets are the n quantiles of a normal distribution, mean 1000 and sd 100 Gt CO2. */
  function normalBudgets(n: number, chances: number[]): { result: RemainingBudget; family: ReturnType<typeof straightLineFamily> } {
    const family = straightLineFamily(40, fromYear, 200);
    // Cumulative CO2 = 20 x along this family, so x = budget / 20.
    const xs = Array.from({ length: n }, (_, i) => (1000 + 100 * normalQuantile((i + 0.5) / n)) / 20);
    const result: RemainingBudget = {
      members: [xs.map((x) => ({ x, status: 'found' as const }))],
      rows: chances.map((chance) => ({ limitK: 2, chance, budgetGtco2: NaN, netZeroYear: NaN, x: NaN, met: true, atLeast: false })),
    };
    return { result, family };
  }

  it('the spread of a quantile matches its asymptotic standard error sqrt(p (1 - p) / n) / f(q) (Serfling 1980, sect. 2.3; from memory)', () => {
    const n = 400;
    const { result, family } = normalBudgets(n, [0.5, 0.83]);
    const rng = xoroshiro128plus(42);
    const spread = budgetSamplingSpread(result, family, 1000, () => uniformFloat64(rng));
    const density = (z: number) => Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI) / 100;
    for (const [j, chance] of [0.5, 0.83].entries()) {
      const p = 1 - chance;
      const asymptotic = Math.sqrt((p * (1 - p)) / n) / density(normalQuantile(p));
      // The members are exact normal quantiles, not a random sample, so what remains is the noise of
      // 1000 resamples (about 2 %) and a quantile's discreteness; 20 % is allowed (a factor sqrt(2) would fail).
      expectClose(spread[j].sdGtco2, asymptotic, 0.2 * asymptotic, `chance ${chance}: ${asymptotic.toFixed(1)} Gt CO2`);
      expect(spread[j].notPossibleShare).toBe(0);
    }
  });

  it('shrinks as 1 / sqrt(n): four times the members, half the spread (Serfling 1980; from memory)', () => {
    const sd = (n: number) => {
      const { result, family } = normalBudgets(n, [0.5]);
      const rng = xoroshiro128plus(7);
      return budgetSamplingSpread(result, family, 1000, () => uniformFloat64(rng))[0].sdGtco2;
    };
    expectClose(sd(400) / sd(1600), 2, 0.3, 'ratio');
  });

  it('counts the resamples in which a budget is not possible', () => {
    // 10 members exceed the limit at once and 10 keep below it: the median is possible in about half the resamples.
    const family = straightLineFamily(40, fromYear, 200);
    const members = [...Array(10).fill({ x: -Infinity, status: 'exceeded' }), ...Array.from({ length: 10 }, (_, i) => ({ x: 10 + i, status: 'found' as const }))];
    const result: RemainingBudget = { members: [members], rows: [{ limitK: 1.5, chance: 0.5, budgetGtco2: NaN, netZeroYear: NaN, x: -Infinity, met: false, atLeast: false }] };
    const rng = xoroshiro128plus(3);
    const [s] = budgetSamplingSpread(result, family, 2000, () => uniformFloat64(rng));
    // The median of 20 draws rests on order statistic floor(19 / 2) = 9: -Infinity when 10 or more draws are -Infinity, P = 0.588 (binomial, by hand).
    expectClose(s.notPossibleShare, 0.588, 0.04, 'share not possible (2000 resamples: +/- 2 binomial sd)');
  });
});

/** carbonBudget on the bundled non-CO2 path: which budget the assumptions belong to, seed independence, refusals. */
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/calibrate.js';
import { calibratedMemberSource, calibratedSetInOrder } from '../../src/ensemble/calibrated-set.js';
import { ConfigError } from '../../src/errors.js';
import { readCalibratedSet } from '../../src/io/read-calibrated-set.js';
import { readPathway } from '../../src/io/load-pathway.js';
import { carbonBudget, chanceText, type CarbonBudgetOptions } from '../../src/projection/carbon-budget.js';
import { expectWithin } from '../asserts.js';

const params = calibrate();
const set = readCalibratedSet();
const nonCo2 = readPathway('budget-non-co2').pathway;
const inOrder = calibratedSetInOrder(set);
const base: CarbonBudgetOptions = { limits: [2], chances: [0.5], members: 24, seed: 1, params, source: inOrder, resampled: false };

describe('chanceText', () => {
  it('writes the chance as given, never rounded to a whole per cent', () => {
    expect(chanceText(0.5)).toBe('50 %');
    expect(chanceText(0.667)).toBe('66.7 %');
    expect(chanceText(0.999)).toBe('99.9 %');
    expect(chanceText(1 - 0.67)).toBe('33 %');
  });
});

describe('carbonBudget assumptions', () => {
  it('are read along the first possible budget asked for, with that budget\'s net-zero year', () => {
    // 1.1 K is below the warming to date (about 1.2 K, the record), so no member can keep under it.
    const r = carbonBudget(nonCo2, { ...base, limits: [1.1, 2], chances: [0.5, 0.83] });
    expect(r.rows[0].met).toBe(false);
    const ref = r.assumptions.reference!;
    const first = r.rows.find((x) => x.met)!;
    expect([ref.limitK, ref.chance]).toEqual([first.limitK, first.chance]);
    expect(ref.netZeroYear).toBe(first.netZeroYear);
    expect(r.notes.join('\n')).toContain(`along the pathway of the 2 K, 50 % budget`);
  });

  it('are left out, with a statement, when no budget asked for is possible', () => {
    const r = carbonBudget(nonCo2, { ...base, limits: [1.1] });
    expect(r.assumptions.reference).toBeUndefined();
    expect(r.notes.join('\n')).toMatch(/not given, as no budget asked for is possible/);
    expectWithin(r.assumptions.historicalWarmingK[0], 1.0, 1.4, 'warming to date still given (AR6 WG1 SPM A.1.2: 1.09 K in 2011-2020; from memory)');
  });

  it('with a shape that goes net negative after net zero, the zero-emissions commitment leaves the removals out', () => {
    // 40 Gt CO2 a year for 15 years, then removals of 40 Gt CO2 a year: counted, 50 years of them
    // (2000 Gt CO2) would cool by the order of TCRE x 2000 Gt = 0.9 K (AR6 WG1 SPM D.1.1, from memory),
    // less the ocean's and land's release of carbon as the air's CO2 falls.
    const shape = Float64Array.from({ length: 300 }, (_, i) => (i < 15 ? 40 : -40));
    const r = carbonBudget(nonCo2, { ...base, shape });
    const zec = r.assumptions.reference!.zeroEmissionsCommitmentK[0];
    // AR6 WG1 chapter 4.7.1.1: the zero-emissions commitment 50 years after net zero is likely -0.3 to +0.3 K (from memory).
    expectWithin(zec, -0.3, 0.3, 'median zero-emissions commitment, K');
    expect(r.notes.join('\n')).toMatch(/net-negative emissions, if any\) is left out of this figure/);
  });
});

describe('carbonBudget members', () => {
  it('the whole set in order gives the same budgets for every seed; a random draw does not', () => {
    const a = carbonBudget(nonCo2, { ...base, seed: 1 });
    const b = carbonBudget(nonCo2, { ...base, seed: 2 });
    expect(b.rows.map((x) => x.budgetGtco2)).toEqual(a.rows.map((x) => x.budgetGtco2));
    expect(a.notes.join('\n')).toMatch(/do not depend on the seed/);
    const drawn = { ...base, source: calibratedMemberSource(set), resampled: true };
    const c = carbonBudget(nonCo2, { ...drawn, seed: 1 });
    const d = carbonBudget(nonCo2, { ...drawn, seed: 2 });
    expect(d.rows[0].budgetGtco2).not.toBe(c.rows[0].budgetGtco2);
    expect(c.notes.join('\n')).toMatch(/random draw \(seed 1\), so each budget moves with the seed/);
    expect(c.spread[0].sdGtco2).toBeGreaterThan(0);
  });
});

describe('carbonBudget refusals', () => {
  it('refuses a --from that leaves fewer than 50 years of the non-CO2 path, saying what the path covers', () => {
    expect(() => carbonBudget(nonCo2, { ...base, fromYear: 2260 })).toThrow(ConfigError);
    expect(() => carbonBudget(nonCo2, { ...base, fromYear: 2500 })).toThrow(/covers 2025-2300.*at least 50 years after --from, to 2549: give --from 2251 or earlier/);
  });

  it('says when the non-CO2 path is held past its end', () => {
    const short = readPathway('swift-emissions').pathway;
    const r = carbonBudget(short, { ...base, members: 4 });
    expect(r.notes.join('\n')).toMatch(/ends in 2150: its 2150 values are held to 2275/);
  });
});

describe('carbonBudget progress', () => {
  it('reports each member as its search starts, ending at all of them (for the CLI progress bar)', () => {
    const seen: number[] = [];
    carbonBudget(nonCo2, { ...base, onProgress: (done, total) => {
      expect(total).toBe(24);
      seen.push(done);
    } });
    expect(Math.max(...seen)).toBe(24);
    expect(seen.every((d, i) => i === 0 || d >= seen[i - 1])).toBe(true);
  });
});

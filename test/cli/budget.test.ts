/** `warmcast budget` in-process: chance parsing, the table's columns, and what cannot be met. */
import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { chancesFromOption } from '../../src/cli/budget.js';
import { runCli, tempDirs } from './cli-harness.js';

const tmp = tempDirs('budget');

describe('chancesFromOption', () => {
  it('reads 50,67,83 and 0.5,0.67,0.83 alike, and refuses 0, 100 and 1', () => {
    expect(chancesFromOption([50, 67, 83])).toEqual([0.5, 0.67, 0.83]);
    expect(chancesFromOption([0.5, 0.67, 0.83])).toEqual([0.5, 0.67, 0.83]);
    expect(() => chancesFromOption([100])).toThrow(/between 0 and 100/);
    expect(() => chancesFromOption([1])).toThrow(/between 0 and 100/);
    expect(() => chancesFromOption([0])).toThrow(/between 0 and 100/);
  });
});

describe('warmcast budget', () => {
  it('writes limit_k, chance, budget_gtco2, net_zero_year; budgets shrink as the chance rises and grow with the limit', async () => {
    const dir = tmp();
    const r = await runCli(['budget', '--limit', '1.7,2', '--chance', '50,83', '--members', '60', '--out', 'b.csv'], dir);
    expect(r.code, r.err).toBe(0);
    const [header, ...rows] = readFileSync(join(dir, 'b.csv'), 'utf8').trim().split('\n');
    expect(header).toBe('limit_k,chance,budget_gtco2,net_zero_year,status');
    const v = rows.map((x) => x.split(',').map((s) => (s === '' ? NaN : Number(s))));
    expect(v).toHaveLength(4);
    const b = (limit: number, chance: number) => v.find((x) => x[0] === limit && x[1] === chance)![2];
    // Common practice, no source: a higher chance can only need a smaller budget, a higher limit a larger one.
    if (Number.isFinite(b(2, 0.83))) expect(b(2, 0.83)).toBeLessThanOrEqual(b(2, 0.5));
    if (Number.isFinite(b(1.7, 0.5))) expect(b(1.7, 0.5)).toBeLessThanOrEqual(b(2, 0.5));
    expect(r.out).toContain('Remaining CO2 budgets from 1 January 2025');
  });

  it('a limit already exceeded says "not possible" with exit 0, not a negative budget', async () => {
    const r = await runCli(['budget', '--limit', '1.1', '--chance', '83', '--members', '40']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toContain('not possible');
    expect(r.out).toMatch(/not possible/);
    const all = await runCli(['budget', '--limit', '1.1', '--chance', '83', '--members', '40', '--notes']);
    expect(all.out).toMatch(/1\.1 K with 83 % chance cannot be met/);
  });

  it('--shape with a file that lacks precursors: refused with the --absent-emissions hint, which budget accepts', async () => {
    const dir = tmp();
    writeFileSync(join(dir, 's.csv'), 'year,co2_gtco2,ch4_mt,n2o_mt\n2025,40,380,11\n2050,0,300,10\n2100,0,250,9\n');
    const refused = await runCli(['budget', '--shape', 's.csv', '--limit', '1.7', '--chance', '67', '--members', '40'], dir);
    expect(refused.code).toBe(2);
    expect(refused.err).toMatch(/--absent-emissions/);
    const held = await runCli(['budget', '--shape', 's.csv', '--limit', '1.7', '--chance', '67', '--members', '40', '--absent-emissions', 'hold'], dir);
    expect(held.code, held.err).toBe(0);
    expect(held.out).toMatch(/net-zero year of the stretched shape/);
  });

  it('--shape TABLE --scenario NAME --model NAME takes the shape from a scenario table', async () => {
    const r = await runCli(['budget', '--shape', 'pathways/examples/invented-scenarios.csv', '--scenario', 'Immediate-01', '--model', 'Gridline 2.1', '--limit', '2', '--chance', '50', '--members', '40']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/2 K\s+\d+ \(\d{4}\)/);
  });
});

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

  it('refuses a list that mixes per cents and fractions, saying how to write it, and a chance given twice', () => {
    expect(() => chancesFromOption([50, 0.5])).toThrow(/mixes per cents and fractions.*--chance 50,67,83.*--chance 0\.5,0\.67,0\.83/);
    expect(() => chancesFromOption([1, 50])).toThrow(/mixes/);
    expect(() => chancesFromOption([50, 67, 50])).toThrow(/gives 50 twice/);
    expect(chancesFromOption([66.7, 99.9])).toEqual([0.667, 0.999]);
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

  it('a mixed --chance list, a repeated --limit and --members beyond the calibrated set exit 2 with the reason', async () => {
    const mixed = await runCli(['budget', '--chance', '50,0.5']);
    expect(mixed.code).toBe(2);
    expect(mixed.err).toMatch(/--chance 50,0\.5 mixes per cents and fractions/);
    const twice = await runCli(['budget', '--limit', '2,2']);
    expect(twice.code).toBe(2);
    expect(twice.err).toMatch(/--limit 2,2 gives 2 twice/);
    const many = await runCli(['budget', '--members', '5000']);
    expect(many.code).toBe(2);
    expect(many.err).toMatch(/the calibrated set has 4000 members/);
  });

  it('heads the columns with the chance as given (66.7 %, not 67 %) and keeps it in the files', async () => {
    const dir = tmp();
    const r = await runCli(['budget', '--limit', '2', '--chance', '66.7,99.9', '--members', '30', '--out', 'b.csv'], dir);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/66\.7 %\s+99\.9 %/);
    expect(r.out).not.toMatch(/\b67 %/);
    const rows = readFileSync(join(dir, 'b.csv'), 'utf8').trim().split('\n').slice(1);
    expect(rows.map((x) => x.split(',')[1])).toEqual(['0.667', '0.999']);
  });

  it('the summary names the budget its net-zero assumptions belong to, with the net-zero year the table gives it', async () => {
    const dir = tmp();
    const r = await runCli(['budget', '--limit', '1.1,2', '--chance', '50', '--members', '30', '--out', 'b.csv'], dir);
    expect(r.code, r.err).toBe(0);
    const year = readFileSync(join(dir, 'b.csv'), 'utf8').trim().split('\n').find((x) => x.startsWith('2,'))!.split(',')[3];
    expect(r.out.replace(/\s+/g, ' ')).toContain(`along the 2 K, 50 % pathway (net zero ${year}): non-CO2 warming at net zero`);
    const none = await runCli(['budget', '--limit', '1.1', '--chance', '83', '--members', '30']);
    expect(none.out.replace(/\s+/g, ' ')).toContain('no budget asked for is possible');
    expect(none.out).not.toMatch(/zero-emissions commitment -?\d/);
  });

  it('a --members subsample says that the budgets move with the seed, and by how much', async () => {
    const r = await runCli(['budget', '--limit', '2', '--chance', '50', '--members', '40', '--notes']);
    expect(r.code, r.err).toBe(0);
    const text = r.out.replace(/\s+/g, ' ');
    expect(text).toMatch(/40 members drawn at random: the budgets move with --seed \(a standard deviation of up to about \d+ Gt CO2/);
    expect(text).toMatch(/random draw \(seed 1\), so each budget moves with the seed, by about this from one draw to another: 2 K 50 % ±\d+ Gt CO2/);
  });

  it('--from leaving too few years of the non-CO2 path exits 2 and says what the path covers', async () => {
    const r = await runCli(['budget', '--from', '2500']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--from 2500: the non-CO2 path \(the bundled budget-non-co2 path\) covers 2025-2300/);
    expect(r.out).toBe('');
  });

  it('notes say what becomes of a non-CO2 file\'s own CO2: an emission file\'s and a concentration file\'s are not used', async () => {
    const emissions = await runCli(['budget', '--non-co2', 'swift-emissions', '--limit', '2', '--chance', '50', '--members', '20', '--notes']);
    expect(emissions.code, emissions.err).toBe(0);
    const e = emissions.out.replace(/\s+/g, ' ');
    expect(e).toContain('swift-emissions: its co2_gtco2 is not used; net CO2 follows the budget pathways');
    expect(e).not.toMatch(/computes co2_ppm from the given co2_gtco2/);
    const concentrations = await runCli(['budget', '--non-co2', 'steady', '--limit', '2', '--chance', '50', '--members', '20', '--notes']);
    expect(concentrations.code, concentrations.err).toBe(0);
    expect(concentrations.out.replace(/\s+/g, ' ')).toContain('steady: its co2_ppm is not used');
    const held = await runCli(['budget', '--limit', '2', '--chance', '50', '--members', '20', '--notes']);
    expect(held.out).not.toMatch(/co2_ppm[^\n]*not in file/);
  });

  it('--shape: the notes say the reported cumulative CO2 stops at net zero and the commitment holds net CO2 at zero', async () => {
    const r = await runCli(['budget', '--shape', 'swift-emissions', '--limit', '2', '--chance', '50', '--members', '20', '--notes']);
    expect(r.code, r.err).toBe(0);
    const text = r.out.replace(/\s+/g, ' ');
    expect(text).toContain("the cumulative CO2 is the shape's net CO2 up to its net zero: net-negative emissions after it are not subtracted");
    expect(text).toContain('with net CO2 held at zero from then on');
    expect(text).toContain('swift-emissions: its co2_gtco2 from 2025 on is used only as the shape');
  });
});

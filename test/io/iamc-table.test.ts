import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { csvSheet, xlsxSheets } from '../../src/io/iamc-sheets.js';
import { readIamcTable, type IamcTable } from '../../src/io/iamc-table.js';
import { FIXTURE_YEARS, inventedScenario, longCsv, wideCsv, xlsxBytes, type FixtureRow } from './iamc-fixture.js';

const fromCsv = (text: string, file = 'table.csv') => readIamcTable(file, [csvSheet(text, file)]);
const rows = [...inventedScenario('Model A', 'Quick', 1), ...inventedScenario('Model A', 'Slow', 0.3), ...inventedScenario('Model B', 'Quick', 0.6, { sectors: true })];

/** Everything a run takes from a table, without the file name: names, years, columns, notes. */
function content(table: IamcTable) {
  return table.scenarios.map((s) => ({
    model: s.model,
    scenario: s.scenario,
    name: s.parsed?.name,
    times: Array.from(s.parsed?.times ?? []),
    columns: Object.fromEntries(Object.entries(s.parsed?.columns ?? {}).map(([k, v]) => [k, Array.from(v)])),
    notes: s.notes,
    problems: s.problems.map((p) => p.code),
  }));
}

describe('readIamcTable', () => {
  it('reads every (model, scenario) of a wide CSV table into pathway rows in our units', () => {
    const table = fromCsv(wideCsv(rows));
    expect(table.layout).toBe('wide');
    expect(table.scenarios.map((s) => [s.model, s.scenario])).toEqual([['Model A', 'Quick'], ['Model A', 'Slow'], ['Model B', 'Quick']]);
    const quick = table.scenarios[0].parsed!;
    expect(Array.from(quick.times)).toEqual(FIXTURE_YEARS);
    // 41,000 Mt CO2/yr is 41 Gt CO2/yr; 10,500 kt N2O/yr is 10.5 Mt N2O/yr (mass prefixes).
    expect(quick.columns.co2_gtco2![0]).toBeCloseTo(41, 12);
    expect(quick.columns.n2o_mt![0]).toBeCloseTo(10.5, 12);
    expect(quick.columns.ch4_mt![0]).toBe(380);
    // The same scenario name under two models is told apart by its model.
    expect(quick.name).toBe('Quick (Model A)');
    expect(table.scenarios[1].parsed!.name).toBe('Slow');
  });

  it('ignores rows of regions other than World, with a note', () => {
    const table = fromCsv(wideCsv(rows));
    const quick = table.scenarios[0];
    // The R5ASIA CO2 row (15 Gt in 2020) would otherwise give a duplicate or a different total.
    expect(quick.parsed!.columns.co2_gtco2![0]).toBeCloseTo(41, 12);
    expect(quick.notes.some((n) => n.startsWith('rows of other regions skipped (R5ASIA)'))).toBe(true);
  });

  it('sums Emissions|CO2|Energy and Industrial Processes and Emissions|CO2|AFOLU when no total is given, and says so', () => {
    const b = fromCsv(wideCsv(rows)).scenarios[2];
    const energy = rows.find((r) => r.model === 'Model B' && r.variable.endsWith('Processes'))!;
    const afolu = rows.find((r) => r.model === 'Model B' && r.variable.endsWith('AFOLU'))!;
    FIXTURE_YEARS.forEach((y, i) => expect(b.parsed!.columns.co2_gtco2![i]).toBeCloseTo((energy.values[y]! + afolu.values[y]!) / 1000, 12));
    expect(b.notes.some((n) => n.startsWith('total CO2 is the sum of Emissions|CO2|Energy and Industrial Processes and Emissions|CO2|AFOLU'))).toBe(true);
  });

  it('gives identical scenarios from the wide and long layouts, and from CSV and xlsx', async () => {
    const wide = content(fromCsv(wideCsv(rows)));
    const long = content(fromCsv(longCsv(rows)));
    expect(long.map((s) => s.notes)).toEqual(wide.map((s) => s.notes));
    expect(long).toEqual(wide);
    expect(content(readIamcTable('t.xlsx', await xlsxSheets(await xlsxBytes(rows, 'wide'), 't.xlsx')))).toEqual(wide);
    expect(content(readIamcTable('t.xlsx', await xlsxSheets(await xlsxBytes(rows, 'long'), 't.xlsx')))).toEqual(wide);
  });

  it('skips a workbook sheet that is not a table, with a note', async () => {
    const table = readIamcTable('t.xlsx', await xlsxSheets(await xlsxBytes(rows, 'wide'), 't.xlsx'));
    expect(table.notes.some((n) => n.startsWith('sheet "readme" skipped'))).toBe(true);
  });

  it('refuses an unknown unit with the units it knows, naming file, row, column, model, scenario and variable', () => {
    const bad = rows.map((r) => (r.model === 'Model A' && r.scenario === 'Slow' && r.variable === 'Emissions|CH4' && r.region === 'World' ? { ...r, unit: 'Mt CH4-equiv' } : r));
    const table = fromCsv(wideCsv(bad));
    const slow = table.scenarios[1];
    expect(slow.parsed).toBeUndefined();
    expect(slow.problems).toHaveLength(1);
    const p = slow.problems[0];
    expect(p).toMatchObject({ file: 'table.csv', line: 16, column: 'Unit', model: 'Model A', scenario: 'Slow', variable: 'Emissions|CH4', code: 'input.iamc-unit', value: 'Mt CH4-equiv' });
    expect(p.expected).toContain('Mt CH4/yr');
    // The other scenarios are still read.
    expect(table.scenarios[0].parsed).toBeDefined();
    expect(new InputError(slow.problems).message).toBe(
      'table.csv:16: column "Unit": model "Model A", scenario "Slow", variable "Emissions|CH4": must be a unit known for Emissions|CH4 (got "Mt CH4-equiv"; expected one of kt CH4/yr, Mt CH4/yr, Gt CH4/yr)',
    );
  });

  it('names the sheet and row of a problem in a workbook', async () => {
    const bytes = await xlsxBytes(rows.map((r, i) => (i === 1 ? { ...r, unit: 'Mt/yr' } : r)), 'wide');
    const s = readIamcTable('t.xlsx', await xlsxSheets(bytes, 't.xlsx')).scenarios[0];
    expect(s.problems[0]).toMatchObject({ file: 't.xlsx', sheet: 'data', line: 3, column: 'Unit', variable: 'Emissions|CH4' });
    expect(new InputError(s.problems).message).toMatch(/^t\.xlsx \[sheet "data"\] row 3: column "Unit": model "Model A", scenario "Quick", variable "Emissions\|CH4": /);
  });

  it('refuses a scenario with one CO2 sector only, or no CO2, and a value out of bounds once converted', () => {
    const oneSector = rows.filter((r) => !(r.model === 'Model B' && r.variable.endsWith('AFOLU')));
    expect(fromCsv(wideCsv(oneSector)).scenarios[2].problems.map((p) => p.code)).toEqual(['input.iamc-co2-sector']);
    const noCo2 = rows.filter((r) => !(r.scenario === 'Slow' && r.variable === 'Emissions|CO2'));
    expect(fromCsv(wideCsv(noCo2)).scenarios[1].problems.map((p) => p.code)).toEqual(['input.iamc-no-co2']);
    // 41,000 written in a Gt CO2/yr row: 41,000 Gt CO2/yr is far above any plausible rate.
    const gt = rows.map((r) => (r.scenario === 'Slow' && r.variable === 'Emissions|CO2' && r.region === 'World' ? { ...r, unit: 'Gt CO2/yr' } : r));
    const p = fromCsv(wideCsv(gt)).scenarios[1].problems[0];
    expect(p).toMatchObject({ code: 'input.out-of-range', line: 15, column: '2020', variable: 'Emissions|CO2' });
  });

  it('refuses a near-present World total far from today\'s: Gt values under a Mt unit (a factor 1000)', () => {
    // 41 written under "Mt CO2/yr" is 0.041 Gt CO2/yr in 2020, against about 40 today (from memory).
    const slip = rows.map((r) => (r.scenario === 'Slow' && r.variable === 'Emissions|CO2' && r.region === 'World' ? { ...r, values: Object.fromEntries(Object.entries(r.values).map(([y, v]) => [y, v === null ? null : v / 1000])) } : r));
    const p = fromCsv(wideCsv(slip)).scenarios[1].problems;
    expect(p.map((x) => x.code)).toEqual(['input.iamc-implausible-total']);
    expect(p[0]).toMatchObject({ line: 15, column: '2020', variable: 'Emissions|CO2' });
    expect(p[0].message).toContain('is 0.041 Gt CO2/yr in 2020 once converted from "Mt CO2/yr"');
  });

  it('refuses a table without the IAMC columns, or with both layouts', () => {
    expect(() => fromCsv('Model,Scenario,Variable,Unit,2020\nA,B,Emissions|CO2,Mt CO2/yr,1\n')).toThrow(/missing Region/);
    expect(() => fromCsv('Model,Scenario,Region,Variable,Unit,Year,Value,2020\n')).toThrow(/not both/);
  });

  it('interpolates a variable missing a year others give, and drops years not every variable covers, with notes', () => {
    const sparse: FixtureRow[] = inventedScenario('M', 'S', 0.5).map((r) =>
      r.variable === 'Emissions|CH4' ? { ...r, values: { ...r.values, 2040: null, 2100: null } } : r,
    );
    const s = fromCsv(wideCsv(sparse)).scenarios[0];
    expect(Array.from(s.parsed!.times)).toEqual(FIXTURE_YEARS.slice(0, -1));
    const ch4 = sparse.find((r) => r.variable === 'Emissions|CH4')!.values;
    expect(s.parsed!.columns.ch4_mt![2]).toBeCloseTo((ch4[2030]! + ch4[2050]!) / 2, 12);
    expect(s.notes.some((n) => n.startsWith('years 2100 dropped'))).toBe(true);
    expect(s.notes.some((n) => n.includes('Emissions|CH4 in 2040'))).toBe(true);
  });
});

// Short-lived forcer and halogenated-gas columns (so2_mt, bc_mt, ..., hfc134a_kt, fgas_mtco2e): the
// table reader maps them always; pathways take them once the pathway model has the columns. The
// tests for each state switch on by themselves when those columns arrive.
import { describe, expect, it } from 'vitest';
import { csvSheet } from '../../src/io/iamc-sheets.js';
import { readIamcTable } from '../../src/io/iamc-table.js';
import { PATHWAY_COLUMNS } from '../../src/pathway.js';
import { inventedScenario, wideCsv, type FixtureRow } from './iamc-fixture.js';

const taken = (column: string) => (PATHWAY_COLUMNS as readonly string[]).includes(column);
const extra = (variable: string, unit: string, value: number): FixtureRow => ({
  model: 'M', scenario: 'S', region: 'World', variable, unit, values: { 2020: value, 2030: value, 2040: value, 2050: value, 2060: value, 2070: value, 2080: value, 2090: value, 2100: value },
});
const rows = [
  ...inventedScenario('M', 'S', 0.5).map((r) => (r.variable === 'Emissions|NOx' ? { ...r, unit: 'Mt N/yr', values: { ...r.values, 2020: 30 } } : r)),
  extra('Emissions|HFC|HFC134a', 'kt HFC134a/yr', 250),
];
const scenario = () => readIamcTable('t.csv', [csvSheet(wideCsv(rows), 't.csv')]).scenarios[0];

describe('short-lived forcer and halogenated-gas variables', () => {
  it.runIf(taken('so2_mt'))('become our columns in our units: SO2 as given, NOx from Mt N to Mt NO2 (x 46.005/14.007), HFC-134a in kt', () => {
    const c = scenario().parsed!.columns as Record<string, Float64Array>;
    expect(c.so2_mt[0]).toBeCloseTo(80, 10);
    expect(c.bc_mt[0]).toBe(7);
    expect(c.nox_mt[0]).toBeCloseTo((30 * 46.005) / 14.007, 9);
    if (taken('hfc134a_kt')) expect(c.hfc134a_kt[0]).toBe(250);
    if (taken('fgas_mtco2e')) expect(c.fgas_mtco2e[0]).toBe(1500);
  });

  it.skipIf(taken('so2_mt'))('are named in a note, not used, while pathways have no such columns', () => {
    const s = scenario();
    expect(s.parsed).toBeDefined();
    expect(s.notes.find((n) => n.startsWith('read but not used'))).toContain('Emissions|Sulfur (so2_mt)');
  });
});

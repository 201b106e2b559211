// The calendar-year conventions end to end (DESIGN.md, Conventions; README "Years, dates and
// totals"): a row is a calendar year and an emission value is that year's total, so every
// cumulative figure a user sees is a sum of rows. Checks from arithmetic (the sums themselves), no
// model constants involved.
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/index.js';
import { readPathway } from '../../src/io/index.js';
import { parsePathway } from '../../src/io/parse-pathway.js';
import { toAnnual } from '../../src/io/to-annual.js';
import { comparePathways, cumulativeToNetZero } from '../../src/metrics/index.js';
import { projectPathway } from '../../src/projection/index.js';
import { expectClose } from '../asserts.js';
import { runCli } from '../cli/cli-harness.js';

const params = calibrate();
const dir = mkdtempSync(join(tmpdir(), 'warmcast-calendar-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('cumulative_co2_gtco2 is the sum of the rows', () => {
  it('a history-length file of annual emissions: the 2019 row holds exactly the sum of the values for 1850..2019', () => {
    // An invented file whose 1850-2019 values sum to 2390 Gt CO2 (the AR6 total, as in the example).
    const lines = ['year,co2_gtco2'];
    const values: number[] = [];
    for (let y = 1850; y <= 2030; y++) {
      const v = y <= 2019 ? (2390 / 170) * (0.2 + 1.6 * ((y - 1850) / 169)) : 40;
      values.push(v);
      lines.push(`${y},${v}`);
    }
    const path = join(dir, 'annual.csv');
    writeFileSync(path, lines.join('\n') + '\n');
    // A CO2-only emission file must say what the other species do (the assumption does not touch CO2).
    const p = projectPathway(readPathway(path, { splice: false, absentEmissions: { kind: 'hold' } }).pathway, { params });
    let sum = 0;
    for (let y = 1850; y <= 2019; y++) sum += values[y - 1850];
    expectClose(sum, 2390, 1e-9);
    expect(p.columns.cumulative_co2_gtco2[2019 - 1850]).toBe(sum);
  });

  it('swift-emissions: run\'s column and compare\'s "CO2 to net zero" are the same sum of calendar years', () => {
    const { pathway } = readPathway('swift-emissions');
    const run = projectPathway(pathway, { params });
    const years = run.years;
    const from = pathway.provenance.spliceYear!;
    const netZero = cumulativeToNetZero(years, run.columns.co2_gtco2, from);
    const cumulative = run.columns.cumulative_co2_gtco2;
    const at = (y: number) => y - years[0];
    expectClose(cumulative[at(netZero.toYear)] - cumulative[at(from - 1)], netZero.total, 1e-9);
    const compared = comparePathways([{ label: 'swift', years, warmingK: run.columns.warming_k, co2Gtco2: run.columns.co2_gtco2 }], { milestoneYears: [2050], cumulativeFromYear: from });
    expect(compared.pathways[0].netZero!.total).toBe(netZero.total);
  });

  it('the command line: run --out .csv and compare --out .json give the same CO2 to net zero for swift-emissions', async () => {
    const csv = join(dir, 'swift.csv');
    const json = join(dir, 'swift-compare.json');
    expect((await runCli(['run', 'swift-emissions', '--out', csv])).code).toBe(0);
    expect((await runCli(['compare', 'swift-emissions', '--no-chart', '--out', json])).code).toBe(0);
    const table = parsePathwayLikeCsv(csv);
    const compare = JSON.parse(readFileSync(json, 'utf8'));
    const netZero = findNetZero(compare);
    const row = (y: number) => table.get(y)!;
    expectClose(row(netZero.toYear) - row(2024), netZero.total, 1e-6);
  });
});

describe('dates on one day of the year name calendar years', () => {
  it('a file dated 1 January every 10 years reads 2050-01-01 as the year 2050 and ends in 2110', () => {
    const text = ['date,co2_gtco2', '2030-01-01,40', '2040-01-01,30', '2050-01-01,480', '2060-01-01,10', '2110-01-01,0'].join('\n');
    const p = toAnnual(parsePathway(text, 'planner.csv'));
    expect(p.years[0]).toBe(2030);
    expect(p.years[p.years.length - 1]).toBe(2110);
    expect(p.series.co2_gtco2![2050 - 2030]).toBe(480);
    expect(p.provenance.notes[0]).toMatch(/every date falls on 1 January: each row is read as its calendar year \(2030-01-01 is the year 2030\)/);
  });

  it('dates that vary within years keep their meaning (annual means centred on the date)', () => {
    const text = ['date,co2_ppm', '2030-01-01,440', '2031-03-15,442', '2032-07-02,444'].join('\n');
    const parsed = parsePathway(text, 'mixed.csv');
    const p = toAnnual(parsed);
    expect(p.years[0]).toBe(2030);
    expect(p.provenance.notes.some((n) => n.startsWith('every date falls on'))).toBe(false);
    expect(parsed.times[0]).toBeCloseTo(2029.5 + 0.5 / 365, 12);
  });
});

describe('a file in 5-year steps', () => {
  it('conserves the totals its rows imply: the run emits the sum of the straight-line annual totals, (Y2 - Y1)(v1 + v2)/2 per step plus half of each end row', () => {
    const rows: [number, number][] = [[2025, 41.6], [2030, 34.5], [2035, 27.5], [2040, 20.5], [2045, 13.5], [2050, 6.5], [2055, 0], [2060, -3]];
    const text = ['year,co2_gtco2', ...rows.map(([y, v]) => `${y},${v}`)].join('\n');
    const annual = toAnnual(parsePathway(text, 'steps.csv'));
    const run = projectPathway(annual, { params, baseline: [2025, 2030] });
    let implied = (rows[0][1] + rows[rows.length - 1][1]) / 2;
    for (let j = 0; j + 1 < rows.length; j++) implied += ((rows[j + 1][0] - rows[j][0]) * (rows[j][1] + rows[j + 1][1])) / 2;
    const cumulative = run.columns.cumulative_co2_gtco2;
    expectClose(cumulative[cumulative.length - 1], implied, 1e-9);
    // Each row's year carries exactly the row's total.
    for (const [y, v] of rows) expect(run.columns.co2_gtco2[y - 2025]).toBe(v);
  });
});

/** year -> cumulative_co2_gtco2 of a run's CSV output. */
function parsePathwayLikeCsv(path: string): Map<number, number> {
  const lines = readFileSync(path, 'utf8').split('\n').filter((l: string) => l && !l.startsWith('#'));
  const header = lines[0].split(',');
  const iy = header.indexOf('year');
  const ic = header.indexOf('cumulative_co2_gtco2');
  const out = new Map<number, number>();
  for (const line of lines.slice(1)) {
    const cells = line.split(',');
    out.set(Number(cells[iy]), Number(cells[ic]));
  }
  return out;
}

/** The net-zero entry of compare's JSON (report/comparison-json.ts) for its only pathway. */
function findNetZero(compare: { comparison: { pathways: { net_zero: { cumulative_co2_gtco2: number; to_year: number } }[] } }): { total: number; toYear: number } {
  const nz = compare.comparison.pathways[0].net_zero;
  return { total: nz.cumulative_co2_gtco2, toYear: nz.to_year };
}

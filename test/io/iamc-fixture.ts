// Invented scenario tables in the IAMC layout (scenarios of our own, not published ones), written as
// wide or long CSV text or as .xlsx bytes, for the reader's and batch's tests.
import ExcelJS from 'exceljs';

/** One row of an IAMC table: identifiers and values by year (null for an empty cell). */
export interface FixtureRow {
  model: string;
  scenario: string;
  region: string;
  variable: string;
  unit: string;
  values: Record<number, number | null>;
}

/** Years of the invented tables: 2020 then every 10 years to 2100 (a common IAMC reporting grid). */
export const FIXTURE_YEARS = [2020, 2030, 2040, 2050, 2060, 2070, 2080, 2090, 2100];

/**
 * An invented scenario: CO2 (in Mt CO2/yr, split into its two sectors when `sectors`), CH4 (Mt),
 * N2O (kt), the aerosol and ozone precursors (Mt), F-gases (Mt CO2-equiv), declining from 2020 levels by `cut` (0 = flat, 1 = to zero by 2100), plus an
 * R5 region row that must be skipped.
 */
export function inventedScenario(model: string, scenario: string, cut: number, options: { sectors?: boolean } = {}): FixtureRow[] {
  const path = (start: number, floor: number) =>
    Object.fromEntries(FIXTURE_YEARS.map((y) => [y, +(start + (floor - start) * cut * Math.min(1, (y - 2020) / 60)).toFixed(3)]));
  const row = (variable: string, unit: string, values: Record<number, number | null>, region = 'World'): FixtureRow => ({ model, scenario, region, variable, unit, values });
  const rows: FixtureRow[] = [];
  if (options.sectors) {
    rows.push(row('Emissions|CO2|Energy and Industrial Processes', 'Mt CO2/yr', path(37_000, -2_000)));
    rows.push(row('Emissions|CO2|AFOLU', 'Mt CO2/yr', path(4_000, -1_000)));
  } else {
    rows.push(row('Emissions|CO2', 'Mt CO2/yr', path(41_000, -3_000)));
  }
  rows.push(row('Emissions|CH4', 'Mt CH4/yr', path(380, 150)));
  rows.push(row('Emissions|N2O', 'kt N2O/yr', path(10_500, 6_000)));
  rows.push(row('Emissions|Sulfur', 'Mt SO2/yr', path(80, 10)));
  rows.push(row('Emissions|BC', 'Mt BC/yr', path(7, 2)));
  rows.push(row('Emissions|OC', 'Mt OC/yr', path(30, 12)));
  rows.push(row('Emissions|NH3', 'Mt NH3/yr', path(60, 55)));
  rows.push(row('Emissions|NOx', 'Mt NO2/yr', path(110, 35)));
  rows.push(row('Emissions|CO', 'Mt CO/yr', path(800, 300)));
  rows.push(row('Emissions|VOC', 'Mt VOC/yr', path(180, 90)));
  rows.push(row('Emissions|F-Gases', 'Mt CO2-equiv/yr', path(1_500, 400)));
  rows.push(row('Primary Energy', 'EJ/yr', path(600, 500)));
  rows.push(row('Emissions|CO2', 'Mt CO2/yr', path(15_000, 0), 'R5ASIA'));
  return rows;
}

const HEADER = ['Model', 'Scenario', 'Region', 'Variable', 'Unit'];

/** The rows as a wide CSV table (one column per year). */
export function wideCsv(rows: FixtureRow[], years = FIXTURE_YEARS): string {
  const lines = [[...HEADER, ...years].join(',')];
  for (const r of rows) lines.push([r.model, r.scenario, r.region, r.variable, r.unit, ...years.map((y) => r.values[y] ?? '')].map(cell).join(','));
  return lines.join('\n') + '\n';
}

/** The rows as a long CSV table (Year and Value columns), headers in lower case. */
export function longCsv(rows: FixtureRow[], years = FIXTURE_YEARS): string {
  const lines = [[...HEADER.map((h) => h.toLowerCase()), 'year', 'value'].join(',')];
  for (const r of rows) for (const y of years) if (r.values[y] !== null && r.values[y] !== undefined) lines.push([r.model, r.scenario, r.region, r.variable, r.unit, y, r.values[y]].map(cell).join(','));
  return lines.join('\n') + '\n';
}

/** The rows as an .xlsx workbook (sheet "data", numbers as numbers), wide or long, with an unrelated first sheet. */
export async function xlsxBytes(rows: FixtureRow[], layout: 'wide' | 'long', years = FIXTURE_YEARS): Promise<Buffer> {
  const workbook = new ExcelJS.Workbook();
  workbook.addWorksheet('readme').addRow(['Invented scenarios for warmcast tests']);
  const sheet = workbook.addWorksheet('data');
  if (layout === 'wide') {
    sheet.addRow([...HEADER, ...years]);
    for (const r of rows) sheet.addRow([r.model, r.scenario, r.region, r.variable, r.unit, ...years.map((y) => r.values[y] ?? null)]);
  } else {
    sheet.addRow([...HEADER, 'Year', 'Value']);
    for (const r of rows) for (const y of years) if (r.values[y] !== null && r.values[y] !== undefined) sheet.addRow([r.model, r.scenario, r.region, r.variable, r.unit, y, r.values[y]]);
  }
  return Buffer.from(await workbook.xlsx.writeBuffer());
}

function cell(v: string | number): string {
  const s = String(v);
  return /[",]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

// Every command that projects writes every format of the output registry (report/output-formats.ts),
// each read back with an independent reader: papaparse (CSV), JSON.parse, a GFM table reader
// (Markdown), an XML well-formedness check (SVG, HTML's inline charts) and exceljs (xlsx).
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { OUTPUT_FORMATS } from '../../src/report/output-formats.js';
import { readGfmTables } from '../report/gfm-table.js';
import { xmlProblems } from '../report/xml-well-formed.js';
import { runCli, tempDirs } from './cli-harness.js';

const tempDir = tempDirs('formats');

const COMMANDS: [string, string[]][] = [
  ['run', ['run', 'swift']],
  ['ensemble', ['ensemble', 'swift', '--members', '40', '--seed', '3']],
  ['compare', ['compare', 'steady', 'swift', '--members', '20']],
];

describe('every command writes every format', () => {
  it('the registry has the six formats of issue 16: .csv (+ .meta.json), .json, .md, .svg, .html, .xlsx', () => {
    expect(Object.keys(OUTPUT_FORMATS)).toEqual(['.csv', '.json', '.md', '.svg', '.html', '.xlsx']);
  });

  for (const [name, argv] of COMMANDS) {
    it(`${name} writes .csv + .meta.json, .json, .md, .svg, .html and .xlsx, each readable, all carrying the same headline`, async () => {
      const dir = tempDir();
      for (const ext of Object.keys(OUTPUT_FORMATS)) {
        const r = await runCli([...argv, '--out', `out${ext}`], dir);
        expect(r.code, `${name} ${ext}: ${r.err}`).toBe(0);
      }
      const csv = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'out.csv'), 'utf8'), { header: true, skipEmptyLines: true });
      expect(csv.errors).toEqual([]);
      expect(Object.keys(csv.data[0])).toContain('year');
      const meta = JSON.parse(readFileSync(join(dir, 'out.meta.json'), 'utf8'));
      const json = JSON.parse(readFileSync(join(dir, 'out.json'), 'utf8'));
      expect(json.headline).toEqual(meta.headline);
      expect(json.command).toBe(name);
      expect(json.rows.length).toBe(csv.data.length);
      // The sidecar: the provenance at the top level, then what the JSON holds besides its rows.
      expect(meta.tool).toBe('warmcast');
      expect(meta.inputs.length).toBeGreaterThan(0);
      expect(meta.cautions.length).toBe(3);
      const md = readFileSync(join(dir, 'out.md'), 'utf8');
      const tables = readGfmTables(md);
      expect(tables.length).toBeGreaterThanOrEqual(2);
      // The Markdown shows milestone years, not every year.
      expect(tables[1].rows.length).toBeLessThan(20);
      expect(md).toContain('## Cautions');
      const svg = readFileSync(join(dir, 'out.svg'), 'utf8');
      expect(xmlProblems(svg)).toEqual([]);
      const html = readFileSync(join(dir, 'out.html'), 'utf8');
      expect(html).toContain('<figure><svg');
      const wb = new ExcelJS.Workbook();
      await wb.xlsx.load(readFileSync(join(dir, 'out.xlsx')) as unknown as ArrayBuffer);
      expect(wb.worksheets.map((w) => w.name).slice(0, 3)).toEqual(['headline', 'data', 'milestones']);
      const data = wb.getWorksheet('data')!;
      // Every year of the CSV, at full precision, numbers as numbers.
      expect(data.rowCount).toBe(csv.data.length + 1);
      const header = (data.getRow(1).values as unknown[]).slice(1);
      const col = header.indexOf(Object.keys(csv.data[0])[1]) + 1;
      expect(data.getRow(2).getCell(col).value).toBe(Number(csv.data[0][Object.keys(csv.data[0])[1]]));
    }, 120_000);
  }

  it('an extension outside the registry is refused with exit 2 naming the formats, and nothing is written', async () => {
    const dir = tempDir();
    const r = await runCli(['run', 'swift', '--out', 'out.txt'], dir);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/\.csv, \.json, \.md, \.svg, \.html, \.xlsx/);
  });
});

describe('attribute and budget write every format that fits them', () => {
  it('attribute writes .csv + .meta.json, .json, .md, .svg, .html and .xlsx, each readable', async () => {
    const dir = tempDir();
    for (const ext of Object.keys(OUTPUT_FORMATS)) {
      const r = await runCli(['attribute', 'swift', '--out', `a${ext}`, '--no-chart'], dir);
      expect(r.code, `attribute ${ext}: ${r.err}`).toBe(0);
    }
    const csv = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'a.csv'), 'utf8'), { header: true, skipEmptyLines: true });
    expect(csv.errors).toEqual([]);
    expect(Object.keys(csv.data[0])).toContain('warming_co2_k');
    expect(JSON.parse(readFileSync(join(dir, 'a.json'), 'utf8')).command).toBe('attribute');
    expect(readGfmTables(readFileSync(join(dir, 'a.md'), 'utf8')).length).toBeGreaterThanOrEqual(1);
    expect(xmlProblems(readFileSync(join(dir, 'a.svg'), 'utf8'))).toEqual([]);
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.load(readFileSync(join(dir, 'a.xlsx')) as unknown as ArrayBuffer);
    expect(wb.getWorksheet('data')).toBeDefined();
  });

  it('budget writes .csv + .meta.json, .json, .md, .html and .xlsx, and refuses .svg (it has no chart) before any work', async () => {
    const dir = tempDir();
    for (const ext of ['.csv', '.json', '.md', '.html', '.xlsx']) {
      const r = await runCli(['budget', '--limit', '2', '--chance', '50', '--members', '20', '--out', `b${ext}`], dir);
      expect(r.code, `budget ${ext}: ${r.err}`).toBe(0);
    }
    const csv = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'b.csv'), 'utf8'), { header: true, skipEmptyLines: true });
    expect(Object.keys(csv.data[0])).toEqual(['limit_k', 'chance', 'budget_gtco2', 'net_zero_year', 'status']);
    const svg = await runCli(['budget', '--out', 'b.svg'], dir);
    expect(svg.code).toBe(2);
    expect(svg.err).toMatch(/--out .*b\.svg: the extension must be one of/);
  });
});

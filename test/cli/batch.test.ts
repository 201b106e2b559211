import ExcelJS from 'exceljs';
import { existsSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { execFileSync, spawnSync } from 'node:child_process';
import { beforeAll, describe, expect, it } from 'vitest';
import { inventedScenario, wideCsv, xlsxBytes } from '../io/iamc-fixture.js';
import { runCli, tempDirs } from './cli-harness.js';

const tempDir = tempDirs('batch');
const rows = [...inventedScenario('Model A', 'Quick', 1), ...inventedScenario('Model A', 'Slow', 0.2), ...inventedScenario('Model B', 'Quick', 0.6, { sectors: true })];
const SETTINGS = ['--members', '30', '--seed', '5'];

/** A folder holding the invented table as table.csv (wide) and table.xlsx (long). */
async function tables(bad = false): Promise<string> {
  const dir = tempDir();
  const r = bad ? rows.map((x) => (x.scenario === 'Slow' && x.variable === 'Emissions|CH4' && x.region === 'World' ? { ...x, unit: 'Mt CH4 equivalent/yr' } : x)) : rows;
  writeFileSync(join(dir, 'table.csv'), wideCsv(r));
  writeFileSync(join(dir, 'table.xlsx'), await xlsxBytes(r, 'long'));
  return dir;
}

const json = (dir: string, file: string) => JSON.parse(readFileSync(join(dir, file), 'utf8'));

describe('warmcast batch', () => {
  it('gives each scenario the row it gets alone: `warmcast ensemble TABLE --scenario` with the same seed has the same peak and crossing', async () => {
    const dir = await tables();
    const batch = await runCli(['batch', 'table.csv', ...SETTINGS, '--out', 'all.json'], dir);
    expect(batch.code, batch.err).toBe(0);
    const all = json(dir, 'all.json');
    expect(all.rows.map((r: { model: string; scenario: string }) => [r.model, r.scenario])).toEqual([['Model A', 'Quick'], ['Model A', 'Slow'], ['Model B', 'Quick']]);
    for (const [model, i] of [['Model A', 1], ['Model B', 2]] as const) {
      const scenario = all.rows[i].scenario;
      const alone = await runCli(['ensemble', 'table.csv', '--scenario', scenario, '--model', model, ...SETTINGS, '--thresholds', '1.5,2', '--out', `alone-${i}.json`, '--no-chart'], dir);
      expect(alone.code, alone.err).toBe(0);
      const h = json(dir, `alone-${i}.json`).ensemble;
      // The ensemble's members' own peak is over the whole run; warming peaks after 2001, so it is the batch's 2001-2100 peak.
      expect(all.rows[i].peak_warming_p05_k).toBe(h.peak.warming_k.p05);
      expect(all.rows[i].peak_warming_p50_k).toBe(h.peak.warming_k.p50);
      expect(all.rows[i].peak_warming_p95_k).toBe(h.peak.warming_k.p95);
      expect(all.rows[i].peak_year_p50).toBe(h.peak.year.p50);
      expect(all.rows[i]['median_crossing_year_1.5']).toBe(h.thresholds[0].median_crossing_year);
    }
  });

  it('gives each category its agreement under a bootstrap of the members (0 to 1, last column), marks one below 0.9 "?" in the terminal and Markdown only, and counts them in a note', async () => {
    const dir = await tables();
    const r = await runCli(['batch', 'table.csv', ...SETTINGS, '--out', 'summary.csv'], dir);
    expect(r.code, r.err).toBe(0);
    const lines = readFileSync(join(dir, 'summary.csv'), 'utf8').trim().split('\n');
    const header = lines[0].split(',');
    expect(header.at(-1)).toBe('category_agreement');
    const agreement = lines.slice(1).map((l) => Number(l.split(',').at(-1)));
    expect(agreement).toHaveLength(3);
    for (const a of agreement) {
      expect(a).toBeGreaterThanOrEqual(0);
      expect(a).toBeLessThanOrEqual(1);
      // A share of 200 resamples.
      expect(Number.isInteger(Math.round(a * 200 * 1e9) / 1e9)).toBe(true);
    }
    // The CSV's category column stays a bare code.
    for (const l of lines.slice(1)) expect(l.split(',')[2]).toMatch(/^C[1-8]$/);
    const below = agreement.filter((a) => a < 0.9).length;
    expect(r.out).toMatch(below === 0 ? /no category marked "\?"/ : new RegExp(`${below} of 3 scenarios (has its|have their) category marked "\\?"`));
    // Terminal rows (after the table's rule line): "C3?" exactly where the agreement is below 0.9.
    const out = r.out.split('\n');
    const rule = out.findIndex((l) => /^ {2}-+ {2}-/.test(l));
    const cells = out.slice(rule + 1, rule + 4).map((l) => l.trim().split(/ {2,}/));
    expect(cells.map((c) => c[1])).toEqual(['Quick', 'Slow', 'Quick']);
    expect(cells.map((c) => c[2].endsWith('?'))).toEqual(agreement.map((a) => a < 0.9));
    const md = await runCli(['batch', 'table.csv', ...SETTINGS, '--out', 'summary.md'], dir);
    expect(md.code).toBe(0);
    const text = readFileSync(join(dir, 'summary.md'), 'utf8');
    expect(text).toContain('category_agreement');
    expect(text).toMatch(/bootstrap resamples of the (scenario's )?members/);
  });

  it('shards merged equal one batch, row for row and error for error', async () => {
    const dir = await tables(true);
    expect((await runCli(['batch', 'table.csv', ...SETTINGS, '--out', 'all.json'], dir)).code).toBe(3);
    for (const k of [1, 2, 3]) expect((await runCli(['batch', 'table.csv', ...SETTINGS, '--shard', `${k}/3`, '--out', `s${k}.json`], dir)).code).toBe(k === 2 ? 3 : 0);
    const merged = await runCli(['merge', 's3.json', 's1.json', 's2.json', '--out', 'merged.json'], dir);
    expect(merged.code).toBe(3);
    const a = json(dir, 'all.json');
    const m = json(dir, 'merged.json');
    expect(m.columns).toEqual(a.columns);
    expect(m.rows).toEqual(a.rows);
    expect(m.rows.every((row: { category_agreement: number }) => row.category_agreement >= 0 && row.category_agreement <= 1)).toBe(true);
    expect(m.errors).toEqual(a.errors);
    // A missing shard is refused.
    const partial = await runCli(['merge', 's1.json', 's2.json', '--out', 'partial.json'], dir);
    expect(partial.code).toBe(2);
    expect(partial.err).toMatch(/missing 3\/3/);
  });

  it('a bad scenario does not stop the batch: the others are summarised, the errors table names it, exit code 3', async () => {
    const dir = await tables(true);
    const r = await runCli(['batch', 'table.csv', ...SETTINGS, '--out', 'summary.csv'], dir);
    expect(r.code).toBe(3);
    expect(r.err).toContain('1 of 3 scenarios failed');
    expect(r.err).toContain('table.csv:16: column "Unit": model "Model A", scenario "Slow", variable "Emissions|CH4": must be a unit known for Emissions|CH4');
    const summary = readFileSync(join(dir, 'summary.csv'), 'utf8').trim().split('\n');
    expect(summary).toHaveLength(3);
    expect(summary[0].split(',').slice(0, 3)).toEqual(['model', 'scenario', 'category']);
    const errors = readFileSync(join(dir, 'summary.errors.csv'), 'utf8').trim().split('\n');
    expect(errors[0]).toBe('model,scenario,file,sheet,row,column,variable,code,problem');
    expect(errors[1]).toMatch(/^Model A,Slow,.*table\.csv,,16,Unit,Emissions\|CH4,input\.iamc-unit,/);
  });

  it('reads the same table as .xlsx (long layout) and as .csv (wide) to the same summary, and writes .xlsx and trajectories', async () => {
    const dir = await tables();
    expect((await runCli(['batch', 'table.csv', ...SETTINGS, '--out', 'csv.json'], dir)).code).toBe(0);
    const x = await runCli(['batch', 'table.xlsx', ...SETTINGS, '--out', 'summary.xlsx', '--out-dir', 'years'], dir);
    expect(x.code, x.err).toBe(0);
    expect((await runCli(['batch', 'table.xlsx', ...SETTINGS, '--out', 'xlsx.json'], dir)).code).toBe(0);
    expect(json(dir, 'xlsx.json').rows).toEqual(json(dir, 'csv.json').rows);
    const workbook = new ExcelJS.Workbook();
    await workbook.xlsx.readFile(join(dir, 'summary.xlsx'));
    // The output registry's workbook: the summary at full precision in its data sheet, the short table in its own.
    const sheet = workbook.getWorksheet('data')!;
    expect(workbook.getWorksheet('scenarios')).toBeDefined();
    expect(sheet.getRow(1).getCell(1).value).toBe('model');
    expect(sheet.getRow(2).getCell(7).value).toBe(json(dir, 'csv.json').rows[0].peak_warming_p50_k);
    expect(readdirSync(join(dir, 'years')).sort()).toEqual(['Model_A--Quick.csv', 'Model_A--Quick.meta.json', 'Model_A--Slow.csv', 'Model_A--Slow.meta.json', 'Model_B--Quick.csv', 'Model_B--Quick.meta.json']);
    expect(readFileSync(join(dir, 'years', 'Model_A--Slow.csv'), 'utf8').split('\n')[0]).toMatch(/^year,warming_p05_k,.*warming_p95_k,crossed_by_1\.5,prob_above_1\.5,crossed_by_2,prob_above_2$/);
  });

  it('a scenario without aerosol precursors fails unless --absent-emissions states an assumption, which filled_by then names', async () => {
    const dir = tempDir();
    const precursors = ['Emissions|Sulfur', 'Emissions|BC', 'Emissions|OC', 'Emissions|NH3'];
    writeFileSync(join(dir, 't.csv'), wideCsv([...inventedScenario('A', 'Full', 0.5), ...inventedScenario('A', 'Bare', 0.5).filter((r) => !precursors.includes(r.variable))]));
    const without = await runCli(['batch', 't.csv', ...SETTINGS, '--out', 'without.json'], dir);
    expect(without.code).toBe(3);
    expect(json(dir, 'without.json').errors[0].scenario).toBe('Bare');
    const withRule = await runCli(['batch', 't.csv', ...SETTINGS, '--absent-emissions', 'follow-co2', '--out', 'with.json'], dir);
    expect(withRule.code, withRule.err).toBe(0);
    const bare = json(dir, 'with.json').rows[1];
    expect(bare.scenario).toBe('Bare');
    expect(bare.filled_by).toMatch(/aerosol_ari: [^;]*assumed precursor emissions \(follow the file's CO2 emissions/);
    expect(json(dir, 'with.json').rows[0].filled_by).not.toMatch(/aerosol/);
  });

  it('refuses a table without the IAMC columns (exit 2) and --shard without a .json --out, before any work', async () => {
    const dir = tempDir();
    writeFileSync(join(dir, 'plain.csv'), 'year,co2_gtco2\n2030,30\n');
    expect((await runCli(['batch', 'plain.csv', '--out', 'x.csv'], dir)).code).toBe(2);
    const shard = await runCli(['batch', 'plain.csv', '--shard', '1/2', '--out', 'x.csv'], dir);
    expect(shard.code).toBe(2);
    expect(shard.err).toContain('--shard writes a shard file');
    expect(existsSync(join(dir, 'x.csv'))).toBe(false);
    // A summary has no chart: .svg is refused by the output registry's check, before any scenario runs.
    const svg = await runCli(['batch', 'plain.csv', '--out', 'x.svg'], dir);
    expect(svg.code).toBe(2);
    expect(svg.err).toContain('the extension must be one of .csv, .json, .md, .html, .xlsx');
  });
});

describe('--scenario and check TABLE', () => {
  it('run, compare and check take TABLE --scenario NAME; an ambiguous name asks for --model', async () => {
    const dir = await tables();
    const run = await runCli(['run', 'table.csv', '--scenario', 'Slow', '--no-chart', '--notes'], dir);
    expect(run.code, run.err).toBe(0);
    expect(run.out).toContain('read from the scenario table');
    const ambiguous = await runCli(['run', 'table.csv', '--scenario', 'quick'], dir);
    expect(ambiguous.code).toBe(2);
    expect(ambiguous.err).toContain('add --model NAME');
    const compare = await runCli(['compare', 'table.xlsx', '--scenario', 'Slow', '--scenario', 'Quick', '--model', 'Model A', '--no-chart'], dir);
    expect(compare.code, compare.err).toBe(0);
    // Each scenario taken from the table is an option of its own, labelled by its name.
    expect(compare.out).toContain('Comparison of 2 options against Slow');
    expect(compare.out).toMatch(/^ {2}Quick +\d\.\d\d/m);
    const notTable = await runCli(['run', 'swift', '--scenario', 'Slow'], dir);
    expect(notTable.code).toBe(2);
    expect(notTable.err).toContain('--scenario picks a scenario of a scenario table');
    const unknown = await runCli(['ensemble', 'table.csv', '--scenario', 'Slowe', '--members', '10'], dir);
    expect(unknown.code).toBe(2);
    expect(unknown.err).toContain('did you mean "Slow"?');
    const none = await runCli(['run', 'table.csv'], dir);
    expect(none.code).toBe(2);
    expect(none.err).toContain('choose one with --scenario NAME');
  });

  it('check TABLE lists every scenario with the agents it gives and those filled, and the problems of a bad one', async () => {
    const dir = await tables(true);
    const r = await runCli(['check', 'table.csv'], dir);
    expect(r.code).toBe(2);
    expect(r.out).toContain('scenario table: IAMC wide layout, 3 scenarios from 2 models');
    expect(r.out).toMatch(/scenario "Quick", model "Model B"\n.*\n  gives: co2 \(Emissions\|CO2\|Energy and Industrial Processes \+ Emissions\|CO2\|AFOLU\); ch4 \(Emissions\|CH4\); n2o \(Emissions\|N2O\)/);
    expect(r.out).toMatch(/  filled: [a-z_, ]*solar[a-z_, ]*: /);
    expect(r.out).toContain('1 of 3 scenarios have problems (listed above); the others can be run');
  });
});

describe('warmcast batch, the built binary (black box)', () => {
  const bin = join(process.cwd(), 'dist/src/cli/bin.js');
  // Built afresh: worker threads exist only in the compiled files, and a stale build would test old code.
  beforeAll(() => void execFileSync('npx', ['tsc', '-p', 'tsconfig.build.json'], { stdio: 'inherit' }), 120_000);

  it('two worker threads give exactly the rows of one thread in-process', async () => {
    const dir = await tables(true);
    const threads = spawnSync(process.execPath, [bin, 'batch', 'table.xlsx', ...SETTINGS, '--workers', '2', '--out', 'threads.json'], { cwd: dir, encoding: 'utf8' });
    expect(threads.status, threads.stderr).toBe(3);
    expect((await runCli(['batch', 'table.xlsx', ...SETTINGS, '--out', 'one.json'], dir)).code).toBe(3);
    expect(json(dir, 'threads.json').rows).toEqual(json(dir, 'one.json').rows);
    // The in-process run names the table by its absolute path, the binary as typed.
    const errors = (file: string) => JSON.stringify(json(dir, file).errors).replaceAll(join(dir, 'table.xlsx'), 'table.xlsx');
    expect(errors('threads.json')).toBe(errors('one.json'));
    expect(json(dir, 'one.json').errors[0].problems).toHaveLength(1);
  });
});

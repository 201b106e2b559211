import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { calibrate, paramsToJson } from '../../src/climate/index.js';

const tmp = () => mkdtempSync(join(tmpdir(), 'warmcast-run-'));

describe('warmcast run (in-process)', () => {
  it('projects the default bundled pathway and prints the headline lines, a chart and the caution', async () => {
    const io = captureIo();
    const code = await main(['run'], io);
    expect(io.err).toBe('');
    expect(code).toBe(0);
    expect(io.out).toMatch(/warming in 2030: \d\.\d\d K, 2050: \d\.\d\d K, 2100: \d\.\d\d K/);
    expect(io.out).toMatch(/peak warming \d\.\d\d K in \d{4}/);
    expect(io.out).toMatch(/history spliced in/);
    expect(io.out).toMatch(/reduced-complexity, global-mean estimate/i);
  });

  it('writes the full yearly trajectory to CSV with a provenance sidecar, full precision and DESIGN.md columns', async () => {
    const dir = tmp();
    const out = join(dir, 'out.csv');
    const io = captureIo();
    expect(await main(['run', 'swift', '--out', out], io)).toBe(0);
    const parsed = Papa.parse<string[]>(readFileSync(out, 'utf8').trim());
    const header = parsed.data[0];
    expect(header.slice(0, 8)).toEqual(['year', 'warming_k', 'deep_ocean_k', 'forcing_wm2', 'imbalance_wm2', 'co2_ppm', 'ch4_ppb', 'n2o_ppb']);
    expect(header).toContain('forcing_co2_wm2');
    expect(header).toContain('forcing_aerosol_wm2');
    const years = parsed.data.slice(1).map((r) => Number(r[0]));
    expect(years[0]).toBe(1750);
    expect(years[years.length - 1]).toBe(2150);
    const meta = JSON.parse(readFileSync(join(dir, 'out.meta.json'), 'utf8'));
    expect(meta.tool).toBe('warmcast');
    expect(meta.inputs[0].sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(meta.parameters.ecs_k).toBe(3);
    expect(meta.baseline).toBe('1850-1900');
  });

  it('gives the same warming with --method exact as with odex (to 1e-6 K)', async () => {
    const dir = tmp();
    await main(['run', 'steady', '--out', join(dir, 'a.json')], captureIo());
    await main(['run', 'steady', '--method', 'exact', '--out', join(dir, 'b.json')], captureIo());
    const a = JSON.parse(readFileSync(join(dir, 'a.json'), 'utf8'));
    const b = JSON.parse(readFileSync(join(dir, 'b.json'), 'utf8'));
    const wa = rowsOf(a).map((r) => r.warming_k);
    const wb = rowsOf(b).map((r) => r.warming_k);
    expect(wa.length).toBe(wb.length);
    for (let i = 0; i < wa.length; i++) expect(Math.abs(wa[i] - wb[i])).toBeLessThan(1e-6);
  });

  it('reads --params files with any subset of keys, and rejects unknown keys with exit 2 naming the line', async () => {
    const dir = tmp();
    const good = join(dir, 'p.json');
    writeFileSync(good, JSON.stringify({ ecs_k: 4, tcr_k: 2.2 }));
    const io = captureIo();
    expect(await main(['run', 'swift', '--params', good, '--no-chart'], io)).toBe(0);
    expect(io.out).toMatch(/ECS 4\.00 K, TCR 2\.20 K/);
    const bad = join(dir, 'bad.json');
    writeFileSync(bad, '{\n  "ecs_k": 3,\n  "ecs": 4\n}\n');
    const io2 = captureIo();
    expect(await main(['run', 'swift', '--params', bad], io2)).toBe(2);
    expect(io2.err).toMatch(/bad\.json:3: column "ecs": is not a parameter; did you mean "ecs_k"\?/);
  });
});

describe('warmcast run --out FILE.md', () => {
  it('lists the notes as a Markdown bullet list, one note per item, in the order the JSON provenance holds them', async () => {
    const dir = tmp();
    expect(await main(['run', 'swift', '--out', join(dir, 'swift.md')], captureIo())).toBe(0);
    expect(await main(['run', 'swift', '--out', join(dir, 'swift.json')], captureIo())).toBe(0);
    const md = readFileSync(join(dir, 'swift.md'), 'utf8');
    const notes: string[] = JSON.parse(readFileSync(join(dir, 'swift.json'), 'utf8')).provenance.notes;
    expect(notes.length).toBeGreaterThan(1);
    const block = /\n\nNotes:\n\n((?:- .*\n)+)\n/.exec(md);
    expect(block, md).not.toBeNull();
    expect(block![1].trimEnd().split('\n')).toEqual(notes.map((n) => `- ${n.replace(/</g, '\\<')}`));
  });
});

describe('warmcast calibrate', () => {
  it('prints only the parameter JSON on stdout, which --params reads back to the same model', async () => {
    const io = captureIo();
    expect(await main(['calibrate', '--ecs', '3', '--tcr', '1.8'], io)).toBe(0);
    const json = JSON.parse(io.out);
    expect(json).toEqual(paramsToJson(calibrate({ ecsK: 3, tcrK: 1.8 })));
    expect(io.err).toMatch(/gives TCR 1\.8000 K/);
  });

  it('exits 2 with a clear message when TCR is not below ECS', async () => {
    const io = captureIo();
    expect(await main(['calibrate', '--ecs', '2', '--tcr', '2.5'], io)).toBe(2);
    expect(io.err).toMatch(/tcr_k .* must be below ecs_k/);
  });
});

describe('bad pathway files', () => {
  const cases: [string, string, RegExp][] = [
    ['text in a number cell', '# name: bad\nyear,co2_ppm\n2030,420\n2040,abc\n', /:4: column "co2_ppm"/],
    ['an unknown column', '# a comment\n# another\nyear,co2ppm\n2030,420\n', /:3: column "co2ppm".*co2_ppm/],
    ['a duplicate year', 'year,co2_ppm\n2030,420\n2030,425\n', /:3: /],
    ['a negative concentration', 'year,ch4_ppb\n2030,1900\n2040,-5\n', /:3: column "ch4_ppb"/],
  ];
  for (const [what, text, message] of cases) {
    it(`${what}: exit 2, the real line number, and no output file`, async () => {
      const dir = tmp();
      const file = join(dir, 'in.csv');
      writeFileSync(file, text);
      const io = captureIo();
      const code = await main(['run', file, '--out', join(dir, 'out.csv')], io);
      expect(code).toBe(2);
      expect(io.err).toMatch(message);
      expect(io.err).not.toMatch(/\n\s+at /); // no stack trace without --debug
      expect(readdirSync(dir)).toEqual(['in.csv']);
    });
  }

  it('refuses to write the output over its own input file', async () => {
    const dir = tmp();
    const file = join(dir, 'in.csv');
    writeFileSync(file, 'year,co2_ppm\n2030,420\n2040,430\n');
    const io = captureIo();
    expect(await main(['run', file, '--out', file], io)).toBe(2);
    expect(readFileSync(file, 'utf8')).toBe('year,co2_ppm\n2030,420\n2040,430\n');
  });
});

describe('the built binary (black box)', () => {
  const bin = join(process.cwd(), 'dist/src/cli/bin.js');
  beforeAll(() => {
    if (!existsSync(bin)) execFileSync('npx', ['tsc', '-p', 'tsconfig.build.json'], { stdio: 'inherit' });
  });

  it('--version prints the package version', () => {
    const r = spawnSync(process.execPath, [bin, '--version'], { encoding: 'utf8' });
    expect(r.status).toBe(0);
    expect(r.stdout.trim()).toBe(JSON.parse(readFileSync('package.json', 'utf8')).version);
  });

  it('run on a missing file exits 2 with the file named', () => {
    const r = spawnSync(process.execPath, [bin, 'run', 'no-such-file.csv'], { encoding: 'utf8' });
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/no-such-file\.csv/);
  });

  it('every command has --help with an example', () => {
    for (const cmd of ['run', 'compare', 'ensemble', 'merge', 'calibrate', 'check', 'pathways']) {
      const r = spawnSync(process.execPath, [bin, cmd, '--help'], { encoding: 'utf8' });
      expect(r.status, cmd).toBe(0);
      expect(r.stdout, cmd).toMatch(/Example/);
    }
  });
});

function rowsOf(json: { rows?: Record<string, number>[]; columns?: unknown }): Record<string, number>[] {
  if (Array.isArray(json.rows)) return json.rows;
  throw new Error('unexpected JSON layout: ' + Object.keys(json).join(','));
}

describe('working directory', () => {
  it('resolves a relative pathway path against the io working directory of an in-process caller', async () => {
    const dir = tmp();
    writeFileSync(join(dir, 'in.csv'), 'year,co2_ppm\n2030,440\n2040,460\n');
    const io = captureIo(dir);
    expect(await main(['run', 'in.csv', '--out', 'out.csv', '--no-chart'], io)).toBe(0);
    expect(existsSync(join(dir, 'out.csv'))).toBe(true);
  });
});

describe('an emission file that starts a few years after the history', () => {
  it('runs end to end with dates, holding the first emissions over the gap, and writes the carbon columns', async () => {
    const dir = tmp();
    const file = join(dir, 'plan.csv');
    writeFileSync(file, '# name: My plan\ndate,co2_gtco2,ch4_mt\n2030-07-02,38,360\n2050-07-02,0,250\n2100-07-02,-5,200\n');
    const io = captureIo();
    expect(await main(['run', file, '--out', join(dir, 'out.csv'), '--no-chart'], io)).toBe(0);
    expect(io.out).toMatch(/co2_gtco2, ch4_mt held at the file's 2030 value over 2025-2029/);
    const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'out.csv'), 'utf8').trim(), { header: true }).data;
    const at = (y: number) => rows.find((r) => Number(r.year) === y)!;
    expect(Number(at(2027).co2_gtco2)).toBe(38);
    expect(Number(at(2100).cumulative_co2_gtco2)).toBeGreaterThan(Number(at(2019).cumulative_co2_gtco2));
    expect(Number.isFinite(Number(at(2100).airborne_fraction))).toBe(true);
  });
});

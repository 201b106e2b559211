import { execFileSync, spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { beforeAll, describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { calibrate, paramsToJson } from '../../src/climate/index.js';
import { representativeParams } from '../../src/ensemble/calibrated-set.js';
import { readCalibratedSet } from '../../src/io/read-calibrated-set.js';

/** The calibrated set's heat capacities, efficacy and CO2 forcing: what ECS and TCR targets are solved with by default. */
function setPhysics() {
  const { feedbackWm2K: _lambda, exchangeWm2K: _gamma, ...physics } = representativeParams(readCalibratedSet()).targets;
  return physics;
}

const tmp = () => mkdtempSync(join(tmpdir(), 'warmcast-run-'));

describe('warmcast run (in-process)', () => {
  it('projects the default bundled pathway and prints the headline lines, a chart and the caution', async () => {
    const io = captureIo();
    const code = await main(['run'], io);
    expect(io.err).toBe('');
    expect(code).toBe(0);
    expect(io.out).toMatch(/^ {2}warming {3}2030: \d\.\d\d K {3}2050: \d\.\d\d K {3}2100: \d\.\d\d K$/m);
    expect(io.out).toMatch(/^ {2}peak {6}\d\.\d\d K in \d{4}/m);
    expect(io.out).toMatch(/years before 2025 from the bundled history/);
    expect(io.out).toMatch(/caution: a reduced-complexity global-mean estimate/);
    expect(io.out).toMatch(/warmcast run --help/);
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
    // The default model is the calibrated set's representative member (posterior medians).
    expect(meta.parameters).toEqual(paramsToJson(calibrate(representativeParams(readCalibratedSet()).targets)));
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
    expect(io2.err).toMatch(/bad\.json:3: key "ecs": is not a parameter; did you mean "ecs_k"\?/);
  });
});

describe('warmcast run thresholds and the baseline', () => {
  const NOTE = 'IPCC AR6 global warming levels (1.5 K, 2 K) are relative to 1850-1900; with the 1995-2014 baseline the thresholds here are read against the 1995-2014 mean';

  it('run --baseline 1995-2014 names each threshold "above the 1995-2014 mean", not the AR6 rule, and prints the baseline note', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--baseline', '1995-2014', '--no-chart'], io)).toBe(0);
    expect(io.out.replace(/\n {12}/g, ' ')).toMatch(/^ {2}reached {3}1\.5 K above the 1995-2014 mean in \d{4}, 2 K above the 1995-2014 mean (?:in \d{4}|not reached by \d{4}) \(20-year means\)$/m);
    expect(io.out).not.toMatch(/(?<![\d.])(1\.5|2) K in/);
    expect(io.out).not.toContain('IPCC AR6 rule');
    const notes = captureIo();
    expect(await main(['run', 'delayed', '--baseline', '1995-2014', '--no-chart', '--notes'], notes)).toBe(0);
    expect(notes.out.replace(/\n {8}/g, ' ')).toContain(`note: ${NOTE}`);
  });

  it('run --baseline 1995-2014 --out writes the baseline note into .md, .json and the .csv sidecar', async () => {
    const dir = tmp();
    for (const ext of ['md', 'json', 'csv']) {
      expect(await main(['run', 'steady', '--baseline', '1995-2014', '--no-chart', '--out', join(dir, `out.${ext}`)], captureIo())).toBe(0);
    }
    expect(readFileSync(join(dir, 'out.md'), 'utf8')).toContain(NOTE);
    expect(JSON.parse(readFileSync(join(dir, 'out.json'), 'utf8')).provenance.notes.join('\n')).toContain(NOTE);
    expect(JSON.parse(readFileSync(join(dir, 'out.meta.json'), 'utf8')).notes.join('\n')).toContain(NOTE);
  });

  it('run on the default 1850-1900 baseline names thresholds as AR6 levels ("1.5 K: ...; the IPCC AR6 20-year-mean rule") with no baseline note', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--no-chart'], io)).toBe(0);
    expect(io.out).toMatch(/^ {2}reached {3}1\.5 K in \d{4}, 2 K in \d{4} \(20-year means, the IPCC AR6 rule\)$/m);
    expect(io.out).not.toContain('global warming levels');
  });

  it('run says "not crossed by" the last year a 20-year mean of the run stands for, for a threshold the run never crosses', async () => {
    const io = captureIo();
    expect(await main(['run', 'swift', '--no-chart'], io)).toBe(0);
    // The run ends in 2150, so its last 20-year mean, 2131-2150, stands for 2140.
    expect(io.out).toMatch(/^ {2}reached {3}1\.5 K in \d{4}, 2 K not reached by 2140 /m);
    const other = captureIo();
    expect(await main(['run', 'swift', '--baseline', '1995-2014', '--no-chart'], other)).toBe(0);
    expect(other.out.replace(/\n {12}/g, ' ')).toMatch(/2 K above the 1995-2014 mean not reached by 2140/);
  });
});

describe('warmcast run --params with --ecs', () => {
  it('calibrate --ecs 3 --tcr 1.8 > params.json, then run --params params.json --ecs 4 runs ECS 4 K, TCR 1.8 K and notes the re-derivation', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['calibrate', '--ecs', '3', '--tcr', '1.8'], io)).toBe(0);
    writeFileSync(join(dir, 'params.json'), io.out);
    const r = captureIo(dir);
    expect(await main(['run', 'delayed', '--params', 'params.json', '--ecs', '4', '--no-chart', '--notes', '--out', 'out.json'], r)).toBe(0);
    expect(r.out).toContain('ECS 4.00 K, TCR 1.80 K');
    expect(r.out.replace(/\n {8}/g, ' ')).toMatch(/note: --ecs 4 overrides the ECS target of params\.json, so the feedback_wm2k and exchange_wm2k it gives/);
    const meta = JSON.parse(readFileSync(join(dir, 'out.json'), 'utf8')).provenance;
    expect(meta.parameters).toEqual(paramsToJson(calibrate({ ...setPhysics(), ecsK: 4, tcrK: 1.8 })));
    expect(meta.notes.some((n: string) => n.includes('re-derived for ECS 4 K and TCR 1.8 K'))).toBe(true);
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
    const block = /\n## Notes\n\n((?:- .*\n)+)\n/.exec(md);
    expect(block, md).not.toBeNull();
    expect(block![1].trimEnd().split('\n')).toEqual(notes.map((n) => `- ${n.replace(/[\\|<*]/g, (c) => `\\${c}`)}`));
  });
});

describe('warmcast calibrate', () => {
  it('prints only the parameter JSON on stdout, which --params reads back to the same model', async () => {
    const io = captureIo();
    expect(await main(['calibrate', '--ecs', '3', '--tcr', '1.8'], io)).toBe(0);
    const json = JSON.parse(io.out);
    expect(json).toEqual(paramsToJson(calibrate({ ...setPhysics(), ecsK: 3, tcrK: 1.8 })));
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

  it('stops quietly, exit 0, when the reader of its output goes away (a pipe into head)', () => {
    const r = spawnSync('bash', ['-c', '"$0" "$1" run --out - | head -c 100 >/dev/null; echo "exit ${PIPESTATUS[0]}" >&2; "$0" "$1" ensemble swift --members 500 --out - 2>&1 | head -c 100 >/dev/null; echo "exit ${PIPESTATUS[0]}" >&2', process.execPath, bin], { encoding: 'utf8' });
    expect(r.stderr).not.toMatch(/EPIPE|Unhandled|internal error/);
    expect(r.stderr.match(/^exit \d+$/gm)).toEqual(['exit 0', 'exit 0']);
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
    expect(await main(['run', file, '--out', join(dir, 'out.csv'), '--no-chart', '--notes', '--absent-emissions', 'follow-co2'], io)).toBe(0);
    expect(io.out.replace(/\n {8}/g, ' ')).toMatch(/co2_gtco2, ch4_mt held at the file's 2030 value over 2025-2029/);
    const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'out.csv'), 'utf8').trim(), { header: true }).data;
    const at = (y: number) => rows.find((r) => Number(r.year) === y)!;
    expect(Number(at(2027).co2_gtco2)).toBe(38);
    expect(Number(at(2100).cumulative_co2_gtco2)).toBeGreaterThan(Number(at(2019).cumulative_co2_gtco2));
    expect(Number.isFinite(Number(at(2100).airborne_fraction))).toBe(true);
  });
});

describe('notes of an emission file spliced onto the concentration history', () => {
  it('run EMISSIONS.csv says how each gas is joined (concentrations computed, emissions diagnosed), never "NaN", and the CSV has numbers there', async () => {
    const dir = tmp();
    const file = join(dir, 'emis.csv');
    writeFileSync(file, '# name: My emissions\nyear,co2_gtco2,ch4_mt,n2o_mt\n2025,40,380,11\n2050,0,250,9\n2100,-5,200,8\n');
    const io = captureIo();
    expect(await main(['run', file, '--out', join(dir, 'out.csv'), '--no-chart', '--notes', '--absent-emissions', 'hold'], io)).toBe(0);
    const notes = io.out.replace(/\n {8}/g, ' ').split('\n').filter((l) => l.startsWith('  note: '));
    expect(notes.filter((n) => /NaN/.test(n))).toEqual([]);
    expect(notes).toContain(
      "  note: co2_gtco2 given instead of the history's co2_ppm: a run follows the history's co2_ppm to 2024, diagnosing co2_gtco2 from it, and from 2025 computes co2_ppm from the given co2_gtco2",
    );
    const rows = Papa.parse<Record<string, string>>(readFileSync(join(dir, 'out.csv'), 'utf8').trim(), { header: true }).data;
    for (const column of ['co2_ppm', 'co2_gtco2', 'ch4_ppb', 'ch4_mt', 'n2o_ppb', 'n2o_mt']) {
      expect(rows.every((r) => Number.isFinite(Number(r[column]))), column).toBe(true);
    }
    const meta = JSON.parse(readFileSync(join(dir, 'out.meta.json'), 'utf8'));
    expect(meta.notes.filter((n: string) => /NaN/.test(n))).toEqual([]);
  });
});

describe('warmcast run --from/--to', () => {
  /** Years of the short table's rows in a run summary. */
  const tableYears = (out: string) => out.split('\n').filter((l) => /^ {2}\d{4} {2,}/.test(l)).map((l) => Number(l.trim().slice(0, 4)));

  it('run delayed --from 2100 --to 2050 exits 2 saying the order is wrong', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--from', '2100', '--to', '2050'], io)).toBe(2);
    expect(io.err).toBe('warmcast: --from (2100) must not be after --to (2050)\n');
  });

  it('run delayed --to 1700 (before the run) still names the run\'s years', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--to', '1700'], io)).toBe(2);
    expect(io.err).toMatch(/must lie within the years of the run, 1750-2150/);
  });

  it('run delayed --from 2000 starts the short table at 2000, before the 2025 splice year', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--from', '2000', '--no-chart'], io)).toBe(0);
    const years = tableYears(io.out);
    expect(years.slice(0, 4)).toEqual([2000, 2010, 2020, 2030]);
    expect(years[years.length - 1]).toBe(2150);
  });

  it('--every 5 and --years choose the short table\'s rows the same way; --every takes only 5 or 10', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--every', '5', '--to', '2050', '--no-chart'], io)).toBe(0);
    expect(tableYears(io.out)).toEqual([2025, 2030, 2035, 2040, 2045, 2050]);
    const years = captureIo();
    expect(await main(['run', 'delayed', '--years', '2100,2030,2050', '--no-chart'], years)).toBe(0);
    expect(tableYears(years.out)).toEqual([2030, 2050, 2100]);
    const bad = captureIo();
    expect(await main(['run', 'delayed', '--every', '7'], bad)).toBe(2);
    expect(bad.err).toMatch(/--every must be 5 or 10/);
  });

  it('run steady reports the same headline (crossings, peak) whatever --from/--to window it shows: the headline describes the whole run', async () => {
    const headline = async (argv: string[]) => {
      const io = captureIo();
      expect(await main(['run', 'steady', ...argv, '--no-chart'], io)).toBe(0);
      return io.out.match(/^ {2}(peak|reached) .*$/gm);
    };
    const whole = await headline([]);
    expect(whole).toHaveLength(2);
    for (const window of [['--from', '2040', '--to', '2050'], ['--from', '2040'], ['--to', '2035']]) {
      expect(await headline(window), window.join(' ')).toEqual(whole);
    }
  });

  it('run delayed without --from starts the short table at the first milestone after the 2025 splice year', async () => {
    const io = captureIo();
    expect(await main(['run', 'delayed', '--no-chart'], io)).toBe(0);
    // The default rows: every 10 years from the splice (2025) to 2100, every 25 after.
    expect(tableYears(io.out)).toEqual([2030, 2040, 2050, 2060, 2070, 2080, 2090, 2100, 2125, 2150]);
  });
});

describe('run\'s headline figures in its files', () => {
  it('run --out .json, .csv (+ .meta.json) and .md carry the headlines the terminal prints: warming at 2030/2050/2100, the peak, the crossings', async () => {
    const dir = tmp();
    const io = captureIo();
    expect(await main(['run', 'steady', '--out', join(dir, 'r.json'), '--no-chart'], io)).toBe(0);
    const [h] = JSON.parse(readFileSync(join(dir, 'r.json'), 'utf8')).headline;
    expect(h.atYears.map((a: { year: number }) => a.year)).toEqual([2030, 2050, 2100]);
    expect(io.out).toContain(`  warming   2030: ${h.atYears[0].warmingK.toFixed(2)} K`);
    expect(io.out).toContain(`  reached   1.5 K in ${h.crossings[0].year}, `);
    expect(io.out).toContain(`  peak      ${h.peak.warmingK.toFixed(2)} K in ${h.peak.year}`);
    expect(await main(['run', 'steady', '--out', join(dir, 'r.csv'), '--no-chart'], captureIo())).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, 'r.meta.json'), 'utf8')).headline).toEqual([h]);
    expect(readFileSync(join(dir, 'r.csv'), 'utf8').split('\n')[0]).toMatch(/^year,warming_k,/);
    expect(await main(['run', 'steady', '--out', join(dir, 'r.md'), '--no-chart'], captureIo())).toBe(0);
    const md = readFileSync(join(dir, 'r.md'), 'utf8');
    expect(md).toContain('**Headline: warming relative to 1850-1900**');
    expect(md).toMatch(new RegExp(`\\| +${h.atYears[0].warmingK.toFixed(2)} \\|`));
    expect(md).toMatch(new RegExp(`\\| +${h.crossings[0].year} \\|`));
  });
});

describe('the splice line of run\'s heading', () => {
  it('run FILE starting in 2030 says which years come from the history and which are bridged (the history ends in 2024)', async () => {
    const dir = tmp();
    const file = join(dir, 'late.csv');
    writeFileSync(file, 'year,co2_ppm\n2030,440\n2050,470\n');
    const io = captureIo();
    expect(await main(['run', file, '--no-chart'], io)).toBe(0);
    expect(io.out.replace(/\n {2}/g, ' ')).toContain("years to 2024 from the bundled history, 2025-2029 bridged to the file's first year, 2030");
    const next = captureIo();
    expect(await main(['run', 'delayed', '--no-chart'], next)).toBe(0);
    expect(next.out.replace(/\n {2}/g, ' ')).toContain('years before 2025 from the bundled history');
  });
});

describe('warmcast run --no-splice', () => {
  it('run FILE --no-splice notes the forcing columns taken as zero, beside the gases held at 1750', async () => {
    const dir = tmp();
    const file = join(dir, 'sparse.csv');
    writeFileSync(file, '# name: My sparse pathway\nyear,co2_ppm,aerosol_wm2\n2030,440,-0.8\n2050,470,-0.6\n2100,450,-0.3\n');
    const io = captureIo();
    expect(await main(['run', file, '--no-splice', '--baseline', '2030-2040', '--no-chart', '--notes'], io)).toBe(0);
    expect(io.out.replace(/\n {8}/g, ' ')).toContain('  note: other_ghg_wm2, ozone_wm2, strat_h2o_wm2, contrails_wm2, bc_snow_wm2, land_use_wm2, solar_wm2, volcanic_wm2 not given: taken as zero\n');
    expect(io.out).toContain('  note: CH4 not given: held at its 1750 value\n');
  });

  it('run --help says --no-splice starts from zero warming in the first year, not in equilibrium', async () => {
    const io = captureIo();
    expect(await main(['run', '--help'], io)).toBe(0);
    expect(io.out.replace(/\s+/g, ' ')).toContain("the run then starts from zero warming in its first year, not in equilibrium with that year's forcing");
  });
});

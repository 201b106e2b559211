/**
 * The command line under bad input, in-process (main(argv, captureIo())): what goes to stdout and
 * what to stderr, exit codes (0 ok, 2 bad input or options: DESIGN.md), messages that name the
 * file, line or key at fault, stack traces only with --debug, and no output file after a failure.
 */
import { mkdirSync, readdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';
import { runCli, tempDirs } from './cli-harness.js';

const tmp = tempDirs('robust');

/** A line of a JavaScript stack trace (V8 format: "    at fn (file:line:col)"). */
const STACK_LINE = /\n\s+at \S/;

const run = runCli;

function escapeRegExp(text: string): string {
  return text.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
}

describe('warmcast run --out - (CSV on stdout, everything else on stderr)', () => {
  it('run swift --out - writes only the CSV table to stdout: every line has the header\'s cells, all numbers (read back with papaparse)', async () => {
    const r = await run(['run', 'swift', '--out', '-']);
    expect(r.code).toBe(0);
    const parsed = Papa.parse<string[]>(r.out, { skipEmptyLines: false });
    expect(parsed.errors).toEqual([]);
    const [header, ...rows] = parsed.data;
    // The final "\n" leaves one empty record at the end; nothing else may follow the table.
    expect(rows.pop()).toEqual(['']);
    expect(header.slice(0, 2)).toEqual(['year', 'warming_k']);
    expect(rows.length).toBe(2150 - 1750 + 1);
    for (const row of rows) {
      expect(row.length).toBe(header.length);
      for (const cell of row) expect(Number.isFinite(Number(cell)) && cell.trim() !== '', `cell "${cell}"`).toBe(true);
    }
    expect(r.err).toMatch(/^ {2}peak {6}\d\.\d\d K in \d{4}/m);
    expect(r.err).toMatch(/caution:/);
    expect(r.out).not.toMatch(/peak|caution|note|wrote/);
  });

  it('run swift --out - prints the same CSV as run swift --out FILE.csv writes', async () => {
    const dir = tmp();
    const file = join(dir, 'swift.csv');
    expect((await run(['run', 'swift', '--out', file])).code).toBe(0);
    const r = await run(['run', 'swift', '--out', '-']);
    expect(r.out).toBe(readFileSync(file, 'utf8'));
  });

  it('run swift --to 2000 (a report ending before the 2025 splice year) shows no NaN in its summary', async () => {
    const r = await run(['run', 'swift', '--to', '2000', '--no-chart']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/\n\s+2000\s+-?\d\.\d\d/);
    expect(r.out).not.toMatch(/NaN/);
  });
});

describe('warmcast run with a path that is not a readable file', () => {
  it('run MISSING.csv exits 2 naming the path, without a stack trace', async () => {
    const missing = join(tmp(), 'no-such-pathway.csv');
    const r = await run(['run', missing, '--no-chart']);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${missing}: must be an existing file`);
    expect(r.err).not.toMatch(STACK_LINE);
    expect(r.out).toBe('');
  });

  it('run DIRECTORY exits 2 naming it as a folder', async () => {
    const dir = tmp();
    const r = await run(['run', dir]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${dir}: must be a file, not a folder`);
  });

  it('run swift --params MISSING.json and --params DIRECTORY exit 2 naming the path', async () => {
    const dir = tmp();
    const missing = join(dir, 'none.json');
    const a = await run(['run', 'swift', '--params', missing]);
    expect(a.code).toBe(2);
    expect(a.err).toContain(`${missing}: parameters file does not exist`);
    const b = await run(['run', 'swift', '--params', dir]);
    expect(b.code).toBe(2);
    expect(b.err).toContain(`${dir}: parameters file is a folder, not a file`);
  });
});

describe('warmcast run --params with bad parameter files', () => {
  // Each must be refused before anything is written: exit 2, a message naming the key.
  const cases: [what: string, json: string, key: string][] = [
    ['an unknown key', '{ "ecs_k": 3, "climate_sensitivity": 3 }', 'climate_sensitivity'],
    ['a misspelt key', '{ "upper_heat_capacty": 8 }', 'upper_heat_capacty'],
    ['a string for a number', '{ "ecs_k": "3.0" }', 'ecs_k'],
    ['null for a number', '{ "deep_efficacy": null }', 'deep_efficacy'],
    ['an unknown CO2 formula', '{ "co2_formula": "linear" }', 'co2_formula'],
    ['a negative upper_heat_capacity', '{ "upper_heat_capacity": -8 }', 'upper_heat_capacity'],
    ['a negative deep_heat_capacity', '{ "deep_heat_capacity": -100 }', 'deep_heat_capacity'],
    ['tcr_k above ecs_k', '{ "ecs_k": 2, "tcr_k": 2.5 }', 'tcr_k'],
    ['feedback_wm2k of 0 (no stabilising feedback)', '{ "feedback_wm2k": 0 }', 'feedback_wm2k'],
    ['a negative exchange_wm2k', '{ "exchange_wm2k": -0.5 }', 'exchange_wm2k'],
    ['a zero forcing_2x_wm2', '{ "forcing_2x_wm2": 0 }', 'forcing_2x_wm2'],
  ];
  for (const [what, json, key] of cases) {
    it(`${what}: exit 2, the message names "${key}", no stack trace, no output file`, async () => {
      const dir = tmp();
      const params = join(dir, 'params.json');
      writeFileSync(params, json);
      const r = await run(['run', 'swift', '--params', params, '--out', join(dir, 'out.csv')]);
      expect(r.code).toBe(2);
      expect(r.err).toContain(key);
      expect(r.err).not.toMatch(STACK_LINE);
      expect(readdirSync(dir)).toEqual(['params.json']);
    });
  }

  it('with --debug (before or after the command) the same error adds its stack trace and still exits 2', async () => {
    const dir = tmp();
    const params = join(dir, 'params.json');
    writeFileSync(params, '{ "upper_heat_capacity": -8 }');
    for (const argv of [['--debug', 'run', 'swift', '--params', params], ['run', 'swift', '--params', params, '--debug']]) {
      const r = await run(argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.err).toContain('upper_heat_capacity');
      expect(r.err, argv.join(' ')).toMatch(STACK_LINE);
    }
  });
});

describe('warmcast run --out with an extension that picks no format', () => {
  for (const name of ['out.txt', 'out.xls', 'out', 'out.csv.bak']) {
    it(`--out ${name}: exit 2 naming the file, and no file (nor temporary file) left`, async () => {
      const dir = tmp();
      const r = await run(['run', 'swift', '--out', join(dir, name)]);
      expect(r.code).toBe(2);
      expect(r.err).toContain(join(dir, name));
      expect(r.err).toMatch(/extension must be one of \.csv, \.json, \.md/);
      expect(readdirSync(dir)).toEqual([]);
    });
  }
});

describe('every bad fixture through warmcast run FILE --out X.csv', () => {
  const fixturesDir = 'test/fixtures/bad';
  const readme = readFileSync('test/fixtures/README.md', 'utf8');
  const badSection = readme.slice(readme.indexOf('## `bad/`'), readme.indexOf('## `awkward/`'));
  // README rows: | `file` | problem (line N, column) | code |. The lines a message must carry are the
  // "line N" of the problem column, except "names line N" and "on line N" (earlier rows it refers to).
  const documented = new Map<string, number[]>();
  for (const m of badSection.matchAll(/^\| `([^`]+)` \| (.*?) \| .*\|$/gm)) {
    documented.set(m[1], [...m[2].matchAll(/(?<!(?:names|on) )line (\d+)/g)].map((l) => Number(l[1])));
  }
  const files = readdirSync(fixturesDir).filter((f) => !f.startsWith('.')).sort();

  it('the fixture README documents every file in test/fixtures/bad/ (and no others)', () => {
    expect([...documented.keys()].sort()).toEqual(files);
  });

  for (const name of files) {
    const lines = documented.get(name) ?? [];
    it(`${name}: exit 2, message names the file${lines.length ? ` at :${lines.join(', :')}` : ''}, no output file`, async () => {
      const dir = tmp();
      const path = join(fixturesDir, name);
      const r = await run(['run', path, '--out', join(dir, 'out.csv')]);
      expect(r.code).toBe(2);
      expect(r.err).toContain(path);
      for (const line of lines) expect(r.err).toMatch(new RegExp(`${escapeRegExp(path)}:${line}: `));
      if (lines.length === 0) expect(r.err).toMatch(new RegExp(`${escapeRegExp(path)}: `));
      expect(r.err).not.toMatch(STACK_LINE);
      expect(readdirSync(dir)).toEqual([]);
    });
  }
});

describe('warmcast check on several files', () => {
  it('check BAD1 GOOD BAD2 BAD3 MISSING reports the problems of every bad file in one run and describes the good one', async () => {
    const dir = tmp();
    const missing = join(dir, 'missing.csv');
    const bad = ['nan-cell.csv', 'empty.csv', 'three-problems.csv', 'not-utf8.csv'].map((f) => join('test/fixtures/bad', f));
    const r = await run(['check', bad[0], 'swift', bad[1], bad[2], bad[3], missing]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${bad[0]}:3: column "ch4_ppb"`);
    expect(r.err).toContain(`${bad[1]}: must not be empty`);
    expect(r.err).toContain(`${bad[2]}:7: column "co2_ppm"`);
    expect(r.err).toContain(`${bad[2]}:10: column "year"`);
    expect(r.err).toContain(`${bad[2]}:11: column "ch4_ppb"`);
    expect(r.err).toContain(`${bad[3]}:2: must be UTF-8 text`);
    expect(r.err).toContain(`${missing}: must be an existing file`);
    expect(r.err).not.toMatch(STACK_LINE);
    expect(r.out).toMatch(/name: Swift transition/);
  });

  it('check on a folder and a missing file names both', async () => {
    const dir = tmp();
    const sub = join(dir, 'sub');
    mkdirSync(sub);
    const r = await run(['check', sub, join(dir, 'gone.csv')]);
    expect(r.code).toBe(2);
    expect(r.err).toContain(`${sub}: must be a file, not a folder`);
    expect(r.err).toContain(`${join(dir, 'gone.csv')}: must be an existing file`);
  });
});

describe('prescribed forcing out of its plausible range', () => {
  it('check and run refuse aerosol_wm2 -50 and volcanic_wm2 -20 / solar_wm2 5 with exit 2, file:line and column, and no output file', async () => {
    const dir = tmp();
    const aerosol = join(dir, 'bigaer.csv');
    writeFileSync(aerosol, 'year,aerosol_wm2\n2030,-50\n2050,0\n');
    const volcanic = join(dir, 'bigvol.csv');
    writeFileSync(volcanic, 'year,volcanic_wm2,solar_wm2\n2030,-20,5\n2050,0,0\n');
    const checked = await run(['check', aerosol, volcanic]);
    expect(checked.code).toBe(2);
    expect(checked.err).toContain(`${aerosol}:2: column "aerosol_wm2": must be a plausible value for an aerosol effective radiative forcing (got "-50"; expected a value from -5 to 1 W m-2)`);
    expect(checked.err).toContain(`${volcanic}:2: column "volcanic_wm2": must be a plausible value for a volcanic effective radiative forcing (got "-20"; expected a value from -15 to 1 W m-2)`);
    expect(checked.err).toContain(`${volcanic}:2: column "solar_wm2"`);
    const ran = await run(['run', aerosol, '--out', join(dir, 'out.csv')]);
    expect(ran.code).toBe(2);
    expect(ran.err).toContain(`${aerosol}:2: column "aerosol_wm2": must be a plausible value`);
    expect(ran.out).toBe('');
    expect(readdirSync(dir).sort()).toEqual(['bigaer.csv', 'bigvol.csv']);
  });
});

describe('warmcast compare with two files of the same name', () => {
  it('compare a/p.csv b/p.csv exits 2 and says how to tell them apart (a "# name:" line); with one, the comparison runs', async () => {
    const dir = tmp();
    for (const sub of ['a', 'b']) {
      mkdirSync(join(dir, sub));
      writeFileSync(join(dir, sub, 'p.csv'), `year,co2_ppm\n2025,425\n2100,${sub === 'a' ? 450 : 550}\n`);
    }
    const same = await run(['compare', join(dir, 'a', 'p.csv'), join(dir, 'b', 'p.csv'), '--no-chart']);
    expect(same.code).toBe(2);
    expect(same.err).toBe(
      'warmcast: option labels must be distinct; "p" appears twice (a label is the argument\'s file name without the extension): '
        + 'give --labels A,B,C or LABEL=PATH arguments, such as planB=b/p.csv\n',
    );
    writeFileSync(join(dir, 'b', 'p.csv'), '# name: Plan B\nyear,co2_ppm\n2025,425\n2100,550\n');
    const named = await run(['compare', join(dir, 'a', 'p.csv'), `planB=${join(dir, 'b', 'p.csv')}`, '--no-chart']);
    expect(named.code).toBe(0);
    expect(named.out).toContain('planB = Plan B');
  });
});

describe('option and usage errors', () => {
  it('an unknown option and a bad option value start with "warmcast:" like every other error, and exit 2', async () => {
    for (const argv of [['run', 'swift', '--bogus'], ['run', 'swift', '--method', 'euler'], ['frobnicate']]) {
      const r = await run(argv);
      expect(r.code, argv.join(' ')).toBe(2);
      expect(r.err, argv.join(' ')).toMatch(/^warmcast: /);
    }
  });
});


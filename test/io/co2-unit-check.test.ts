import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { loadPathway, readPathway } from '../../src/io/load-pathway.js';
import { runCli } from '../cli/cli-harness.js';

// bad/co2-in-gtc.csv is the bundled swift-emissions pathway with co2_gtco2 multiplied by 12/44, the
// slip the check exists for (1 Gt C = 44/12 Gt CO2, from the molar masses of CO2 and C).
const fixture = fileURLToPath(new URL('../fixtures/bad/co2-in-gtc.csv', import.meta.url));

function problemOf(arg: string) {
  try {
    loadPathway(arg);
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).problems[0];
  }
  return expect.fail('expected an InputError');
}

describe('co2UnitProblem (through loadPathway, against the bundled history)', () => {
  it('loadPathway refuses CO2 emissions typed in Gt C, naming the file, the first row after the history (line 4), the column and the fix', () => {
    const p = problemOf(fixture);
    expect(p).toMatchObject({ file: fixture, line: 4, column: 'co2_gtco2', code: 'input.co2-in-gtc', value: '11.35' });
    expect(p.message).toMatch(/^must be in Gt CO2 per year, but the first value after the history \(11\.35 for 2025\) is 1\/\d\.\d\d of the \d+\.\d\d Gt CO2 the record implies for 2024, near 12\/44: the column looks like Gt C\. Multiply it by 44\/12 = 3\.664 \(11\.35 Gt C is 41\.59 Gt CO2\)$/);
    expect(p.expected).toContain('--co2-jump-intended');
  });

  it('loadPathway accepts the same file when the user says the jump is meant (option or "# co2-jump: intended")', () => {
    expect(loadPathway(fixture, { co2JumpIntended: true }).series.co2_gtco2).toBeDefined();
    const text = readFileSync(fixture, 'utf8');
    expect(text).not.toContain('co2-jump');
  });

  it('loadPathway accepts the bundled emission pathways in Gt CO2, and any file run without the history', () => {
    for (const name of ['swift-emissions', 'steady-emissions', 'delayed-emissions']) expect(() => loadPathway(name)).not.toThrow();
    expect(() => readPathway(fixture, { splice: false })).not.toThrow();
  });

  it('warmcast run on the Gt C file exits 2 with the message and writes nothing; --co2-jump-intended runs it', async () => {
    const refused = await runCli(['run', fixture, '--no-chart']);
    expect(refused.code).toBe(2);
    expect(refused.err).toContain('co2-in-gtc.csv:4: column "co2_gtco2": must be in Gt CO2 per year');
    expect(refused.out).toBe('');
    const meant = await runCli(['run', fixture, '--no-chart', '--co2-jump-intended']);
    expect(meant.code).toBe(0);
  });

  it('warmcast check reports the same problem (exit 2)', async () => {
    const r = await runCli(['check', fixture]);
    expect(r.code).toBe(2);
    expect(r.err).toContain('looks like Gt C');
  });
});

describe('co2UnitProblem and the "# co2-jump: intended" line', () => {
  it('loadPathway accepts a Gt C-sized first value when the file itself says the jump is intended', async () => {
    const { mkdtempSync, writeFileSync, rmSync } = await import('node:fs');
    const { tmpdir } = await import('node:os');
    const { join } = await import('node:path');
    const dir = mkdtempSync(join(tmpdir(), 'warmcast-co2jump-'));
    try {
      const path = join(dir, 'meant.csv');
      writeFileSync(path, `# co2-jump: intended\n${readFileSync(fixture, 'utf8')}`);
      expect(() => loadPathway(path)).not.toThrow();
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});

describe('co2UnitProblem: a global pathway does not start at a tenth or at ten times the world\'s CO2 (common practice, no source)', () => {
  const write = async (name: string, text: string) => {
    const { mkdtempSync, writeFileSync } = await import('node:fs');
    const { tmpdir } = await import('node:os');
    const { join } = await import('node:path');
    const path = join(mkdtempSync(join(tmpdir(), 'warmcast-jump-')), name);
    writeFileSync(path, text);
    return path;
  };
  const opts = { absentEmissions: { kind: 'hold' } as const };
  const codeOf = (path: string, more = {}) => {
    try {
      loadPathway(path, { ...opts, ...more });
    } catch (e) {
      return (e as InputError).problems[0].code;
    }
    return undefined;
  };

  it('refuses a first value 9 times the record (a country\'s Mt typed as Gt), naming the likely slip', async () => {
    const path = await write('up.csv', 'year,co2_gtco2,ch4_mt,n2o_mt\n2025,400,2,0.1\n2050,0,1,0.1\n');
    expect(codeOf(path)).toBe('input.co2-jump-up');
    expect(codeOf(path, { co2JumpIntended: true })).toBeUndefined();
  });
  it("refuses a first value of 1/100 of the record (a country's emissions read as the world's)", async () => {
    const path = await write('down.csv', 'year,co2_gtco2,ch4_mt,n2o_mt\n2025,0.4,2,0.1\n2050,0,1,0.1\n');
    expect(codeOf(path)).toBe('input.co2-jump-down');
    const r = await runCli(['run', path, '--absent-emissions', 'hold', '--no-chart']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/looks like a country's or a sector's emissions/);
  });
  it('accepts an immediate stop (0 in the first year) and a file that starts more than 5 years after the record', async () => {
    expect(codeOf(await write('stop.csv', 'year,co2_gtco2,ch4_mt,n2o_mt\n2025,0,300,9\n2050,0,250,9\n'))).toBeUndefined();
    expect(codeOf(await write('late.csv', 'year,co2_gtco2,ch4_mt,n2o_mt\n2035,5,300,9\n2060,0,250,9\n'))).toBeUndefined();
  });
});

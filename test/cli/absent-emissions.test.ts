import { existsSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { captureIo } from '../../src/cli/cli-io.js';
import { main } from '../../src/cli/main.js';

const dir = mkdtempSync(join(tmpdir(), 'warmcast-absent-'));
const co2Only = join(dir, 'net-zero.csv');
writeFileSync(co2Only, '# name: Net zero by 2050\nyear,co2_gtco2,ch4_mt,n2o_mt\n2025,40,380,11\n2050,0,250,9\n2150,0,250,9\n');

describe('an emission file without aerosol or ozone precursors or halogenated gases', () => {
  it('is refused (exit 2, no output file) with the choices listed', async () => {
    const io = captureIo();
    const out = join(dir, 'refused.csv');
    expect(await main(['run', co2Only, '--out', out, '--no-chart'], io)).toBe(2);
    expect(io.err).toMatch(/net-zero\.csv: gives CO2 emissions but no aerosol precursors/);
    expect(io.err).toMatch(/--absent-emissions hold \| follow-co2 \| zero-by-YEAR/);
    expect(existsSync(out)).toBe(false);
  });

  it('runs with --absent-emissions follow-co2: the assumption heads the terminal output and is in the file\'s notes; the aerosol forcing goes with CO2', async () => {
    const io = captureIo();
    const out = join(dir, 'follow.csv');
    expect(await main(['run', co2Only, '--out', out, '--no-chart', '--absent-emissions', 'follow-co2'], io), io.err).toBe(0);
    const rows = Papa.parse<Record<string, string>>(readFileSync(out, 'utf8').split('\n').filter((l) => !l.startsWith('#')).join('\n').trim(), { header: true }).data;
    const at = (y: number) => rows.find((r) => Number(r.year) === y)!;
    expect(Number(at(2024).forcing_aerosol_wm2)).toBeLessThan(-0.5);
    expect(Math.abs(Number(at(2060).forcing_aerosol_wm2))).toBeLessThan(1e-9);
    const meta = readFileSync(out.replace(/\.csv$/, '.meta.json'), 'utf8');
    expect(meta).toMatch(/assumption: aerosol precursors, ozone precursors, halogenated gases not in the file: emissions follow the file's CO2 emissions/);

    const terminal = captureIo();
    expect(await main(['run', co2Only, '--no-chart', '--absent-emissions', 'follow-co2'], terminal)).toBe(0);
    // Lines fit the terminal: a wrapped assumption continues under its text.
    const head = terminal.out.replace(/\n {14}/g, ' ').split('\n').slice(0, 6).join('\n');
    expect(head).toMatch(/ {2}assumption: aerosol precursors, ozone precursors, halogenated gases not in the file: emissions follow/);
  });

  it('an unknown rule is refused naming the choices', async () => {
    const io = captureIo();
    expect(await main(['run', co2Only, '--absent-emissions', 'freeze', '--no-chart'], io)).toBe(2);
    expect(io.err).toMatch(/hold, follow-co2, zero-by-YEAR/);
  });

  it('warmcast check says per agent whether the file, the history or an assumption gives it', async () => {
    const io = captureIo();
    expect(await main(['check', co2Only, '--absent-emissions', 'zero-by-2060'], io), io.err).toBe(0);
    expect(io.out).toMatch(/forcing agents after 2024:/);
    expect(io.out).toMatch(/ {2}co2: the file \(emissions; the history to 2024 as concentrations, emissions diagnosed\)/);
    expect(io.out).toMatch(/ {2}aerosol_aci: history to 2024, then assumed precursor emissions \(fall linearly from the join to zero in 2060\)/);
    expect(io.out).toMatch(/ {2}contrails: the history to 2024, then held at the 2024 value \(not in the file\)/);
  });

  it('the bundled planner table clean-air-emissions runs with no forcing columns at all', async () => {
    const io = captureIo();
    expect(await main(['run', 'clean-air-emissions', '--no-chart', '--notes'], io), io.err).toBe(0);
    expect(io.out.replace(/\n {8}/g, ' ')).toMatch(/aerosol forcing from precursor emissions, anchored at the history's 2024 value/);
  });
});

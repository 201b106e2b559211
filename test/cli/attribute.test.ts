/** `warmcast attribute` in-process: the terminal table and the yearly file whose parts add up to warming_k. */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { FORCING_AGENTS } from '../../src/forcing/agents.js';
import { EMITTED_SPECIES } from '../../src/forcing/emitted-species.js';
import { runCli, tempDirs } from './cli-harness.js';

const tmp = tempDirs('attribute');

describe('warmcast attribute', () => {
  it('prints one row per agent at 2010-2019, 2030, 2050 and 2100, and a total', async () => {
    const r = await runCli(['attribute', 'delayed', '--no-chart']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/agent\s+2010-2019\s+2030\s+2050\s+2100/);
    for (const agent of FORCING_AGENTS) expect(r.out).toMatch(new RegExp(`^\\s+${agent}\\s`, 'm'));
    expect(r.out).toContain('total (warming_k)');
  });

  it('--out x.csv: warming_<agent>_k for every agent adds up to warming_k in every year (linearity of the two-box model)', async () => {
    const dir = tmp();
    const r = await runCli(['attribute', 'swift', '--out', 'a.csv', '--no-chart'], dir);
    expect(r.code).toBe(0);
    const [header, ...rows] = readFileSync(join(dir, 'a.csv'), 'utf8').trim().split('\n');
    const cols = header.split(',');
    expect(cols).toEqual(['year', 'warming_k', ...FORCING_AGENTS.map((a) => `warming_${a}_k`)]);
    for (const row of rows) {
      const v = row.split(',').map(Number);
      const parts = v.slice(2).reduce((a, b) => a + b, 0);
      expect(Math.abs(parts - v[1])).toBeLessThan(1e-9);
    }
  });
});

describe('warmcast attribute, emission pathways: also by emitted species', () => {
  it('prints the species table under the agents table, methane with its ozone and strat. H2O above the CH4 agent', async () => {
    const r = await runCli(['attribute', 'clean-air-emissions', '--no-chart'], tmp());
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/Warming by emitted species/);
    const agentCh4 = Number(/^\s+ch4\s+(-?\d\.\d+)/m.exec(r.out)![1]);
    const speciesCh4 = Number(/^\s+CH4 \(\+ ozone, strat\. H2O\)\s+(-?\d\.\d+)/m.exec(r.out)![1]);
    expect(speciesCh4).toBeGreaterThan(agentCh4);
  });

  it('--out x.csv: warming_from_<species>_k add up to warming_k in every year, as the agents do', async () => {
    const dir = tmp();
    const r = await runCli(['attribute', 'clean-air-emissions', '--out', 'e.csv', '--no-chart'], dir);
    expect(r.code, r.err).toBe(0);
    const [header, ...rows] = readFileSync(join(dir, 'e.csv'), 'utf8').trim().split('\n');
    const cols = header.split(',');
    const speciesCols = EMITTED_SPECIES.map((x) => cols.indexOf(`warming_from_${x}_k`));
    expect(Math.min(...speciesCols)).toBeGreaterThan(0);
    for (const row of rows) {
      const v = row.split(',').map(Number);
      expect(Math.abs(speciesCols.reduce((t, i) => t + v[i], 0) - v[1])).toBeLessThan(1e-9);
    }
  });

  it('a concentration pathway has no species columns, and a note says why', async () => {
    const dir = tmp();
    const r = await runCli(['attribute', 'swift', '--out', 'c.csv', '--no-chart', '--notes'], dir);
    expect(r.code, r.err).toBe(0);
    expect(readFileSync(join(dir, 'c.csv'), 'utf8')).not.toContain('warming_from_');
    expect(r.out).toMatch(/by emitted species: for emission pathways/);
  });

  it('an emission pathway that gives ozone as forcing (lumped other_wm2) is split by agent only, and the terminal says why', async () => {
    const r = await runCli(['attribute', 'swift-emissions', '--no-chart'], tmp());
    expect(r.code, r.err).toBe(0);
    expect(r.out).not.toMatch(/Warming by emitted species/);
    expect(r.out).toMatch(/by emitted species: not made, because the file gives ozone as forcing/);
  });

  it('an emission pathway not spliced onto the history (no 2019 to anchor EESC to) is split by agent, and the terminal says why not by species', async () => {
    const r = await runCli(['attribute', 'swift-emissions', '--no-splice', '--baseline', '2025-2030', '--no-chart'], tmp());
    expect(r.code, r.err).toBe(0);
    expect(r.out).not.toMatch(/Warming by emitted species/);
    expect(r.out).toMatch(/by emitted species: not made/);
  });

  it('--scenario picks a scenario of a scenario table', async () => {
    const r = await runCli(['attribute', 'pathways/examples/invented-scenarios.csv', '--scenario', 'Immediate-01', '--model', 'Gridline 2.1', '--no-chart']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/Warming by emitted species/);
  });
});

describe('warmcast attribute: years and their checks', () => {
  it('--years picks the columns of the tables (the files keep every year)', async () => {
    const r = await runCli(['attribute', 'clean-air-emissions', '--years', '2030,2040', '--no-chart']);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/agent\s+2030\s+2040\s*$/m);
    expect(r.out).not.toMatch(/2010-2019/);
  });
  it('--from after --to is refused with exit 2, not an empty table', async () => {
    const r = await runCli(['attribute', 'clean-air-emissions', '--from', '2100', '--to', '2050', '--no-chart']);
    expect(r.code).toBe(2);
    expect(r.err).toMatch(/--from \(2100\) must not be after --to \(2050\)/);
  });
});

describe('warmcast attribute --members', () => {
  it('adds warming_<agent>_p05/p50/p95_k with p05 <= p50 <= p95 in every year, and ranges in the terminal table', async () => {
    const dir = tmp();
    const r = await runCli(['attribute', 'clean-air-emissions', '--members', '40', '--out', 'm.csv', '--no-chart'], dir);
    expect(r.code, r.err).toBe(0);
    expect(r.out).toMatch(/co2\s+0\.\d\d \[0\.\d\d, \d\.\d\d\]/);
    expect(r.out).toMatch(/ranges from 40 members/);
    expect(r.out).toMatch(/total \(warming_k\)\s+\d\.\d\d \[\d\.\d\d, \d\.\d\d\]/);
    const [header, ...rows] = readFileSync(join(dir, 'm.csv'), 'utf8').trim().split('\n');
    const cols = header.split(',');
    for (const key of ['', ...FORCING_AGENTS.map((x) => `${x}_`), ...EMITTED_SPECIES.map((x) => `from_${x}_`)]) {
      const [i05, i50, i95] = ['p05', 'p50', 'p95'].map((q) => cols.indexOf(`warming_${key}${q}_k`));
      expect(i05).toBeGreaterThan(0);
      for (const row of rows) {
        const v = row.split(',').map(Number);
        expect(v[i05]).toBeLessThanOrEqual(v[i50] + 1e-12);
        expect(v[i50]).toBeLessThanOrEqual(v[i95] + 1e-12);
      }
    }
  });
});

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { bundledPathwayNames, bundledPathwaysDir, listBundledPathways, loadHistory } from '../../src/io/bundled-pathways.js';

const repoRoot = fileURLToPath(new URL('../../', import.meta.url));
const dir = mkdtempSync(join(tmpdir(), 'warmcast-bundled-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
writeFileSync(join(dir, 'history.csv'), '# name: Tiny history\nyear,co2_ppm,solar_wm2\n2000,370,0.1\n2001,371,0.2\n');
writeFileSync(join(dir, 'plan.csv'), '# name: A plan\n# description: Two rows\nyear,co2_gtco2,aerosol_wm2\n2005,40,-1\n2015,20,-0.5\n');
writeFileSync(join(dir, 'README.md'), 'not a pathway\n');

describe('bundled pathways', () => {
  it('bundledPathwaysDir() walks up from src/io to the package root and returns its pathways folder', () => {
    expect(bundledPathwaysDir()).toBe(resolve(repoRoot, 'pathways'));
  });

  it('bundledPathwayNames lists the .csv files without extension, sorted', () => {
    expect(bundledPathwayNames(dir)).toEqual(['history', 'plan']);
    expect(bundledPathwayNames(join(dir, 'missing'))).toEqual([]);
  });

  it('listBundledPathways reads each file\'s name, description, years and columns', () => {
    expect(listBundledPathways(dir)).toEqual([
      { name: 'history', title: 'Tiny history', file: join(dir, 'history.csv'), description: '', firstYear: 2000, lastYear: 2001, columns: ['co2_ppm', 'solar_wm2'] },
      { name: 'plan', title: 'A plan', file: join(dir, 'plan.csv'), description: 'Two rows', firstYear: 2005, lastYear: 2015, columns: ['co2_gtco2', 'aerosol_wm2'] },
    ]);
  });

  it('loadHistory gives the history on its annual grid with source bundled:history', () => {
    const h = loadHistory(dir);
    expect(Array.from(h.years)).toEqual([2000, 2001]);
    expect(h.provenance.source).toBe('bundled:history');
  });

  it('listBundledPathways() validates every shipped pathway; history.csv runs 1750-2024 as DESIGN.md says', () => {
    const list = listBundledPathways();
    const history = list.find((p) => p.name === 'history');
    expect(history).toMatchObject({ firstYear: 1750, lastYear: 2024 });
    for (const p of list.filter((q) => q.name !== 'history')) {
      expect(p.firstYear, p.name).toBe(2025);
      expect(p.lastYear, p.name).toBe(2150);
    }
  });
});

describe('bundled futures and the pre-industrial natural background', () => {
  it('every bundled future carries solar -0.0127 and volcanic +0.035 W m-2 (1850-1900 means of the AR6 series) from 2034, ramped from the history\'s 2024 values', async () => {
    const { loadPathway } = await import('../../src/io/load-pathway.js');
    const history = loadHistory();
    const at = (s: Float64Array, years: Float64Array, y: number) => s[y - years[0]];
    for (const name of bundledPathwayNames().filter((n) => n !== 'history')) {
      const p = loadPathway(name);
      for (const [column, background] of [['solar_wm2', -0.0127], ['volcanic_wm2', 0.035]] as const) {
        const s = p.series[column]!;
        const h2024 = at(history.series[column]!, history.years, 2024);
        expect(at(s, p.years, 2024), `${name} ${column} 2024`).toBe(h2024);
        // Half-way through the 10-year ramp.
        expect(at(s, p.years, 2029), `${name} ${column} 2029`).toBeCloseTo((h2024 + background) / 2, 12);
        for (const y of [2034, 2100, 2150]) expect(at(s, p.years, y), `${name} ${column} ${y}`).toBeCloseTo(background, 12);
      }
      expect(p.provenance.notes.some((n) => n.startsWith('solar_wm2, volcanic_wm2 not in file: taken from history to 2024, then ramped linearly over 10 years'))).toBe(true);
    }
  });
});

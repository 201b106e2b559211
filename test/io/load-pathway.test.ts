import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { afterAll, describe, expect, it } from 'vitest';
import { InputError, type InputProblem } from '../../src/errors.js';
import { loadPathway, readPathway } from '../../src/io/load-pathway.js';

const dir = mkdtempSync(join(tmpdir(), 'warmcast-load-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
const pathwaysDir = join(dir, 'pathways');
mkdirSync(pathwaysDir);
writeFileSync(join(pathwaysDir, 'history.csv'),
  'year,co2_ppm,solar_wm2,volcanic_wm2\n2020,410,0.1,-0.2\n2021,412,0.2,-0.1\n2022,414,0.3,0\n');
writeFileSync(join(pathwaysDir, 'calm.csv'), '# name: Calm\nyear,co2_ppm\n2023,416\n2033,436\n');
const userFile = join(dir, 'mine.csv');
// Aerosol and other forcing given, so that the emission file is not refused for leaving them out.
writeFileSync(userFile, 'year,co2_gtco2,aerosol_wm2,other_wm2\n2023,40,-1,0.9\n2025,36,-0.9,0.9\n');

function problemOf(arg: string, options = { pathwaysDir }): InputProblem {
  try {
    loadPathway(arg, options);
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).problems[0];
  }
  return expect.fail('expected an InputError');
}

describe('loadPathway', () => {
  it('loadPathway(bundled name) reads pathways/<name>.csv, interpolates and splices onto history', () => {
    const p = loadPathway('calm', { pathwaysDir });
    expect(Array.from(p.years)).toEqual([2020, 2021, 2022, 2023, 2024, 2025, 2026, 2027, 2028, 2029, 2030, 2031, 2032, 2033]);
    // History 410-414 to 2022; then the file: 416 + 2 ppm per year from 2023.
    expect(Array.from(p.series.co2_ppm!)).toEqual([410, 412, 414, 416, 418, 420, 422, 424, 426, 428, 430, 432, 434, 436]);
    expect(p.provenance).toEqual({
      source: 'bundled:calm',
      spliceYear: 2023,
      historyLastYear: 2022,
      notes: [
        'interpolated linearly from 2 rows (10-year steps) to 11 annual values',
        'spliced onto bundled history at 2023 (2020-2022 from history.csv)',
        'solar_wm2, volcanic_wm2 not in file: taken from history to 2022, then ramped linearly over 10 years (to 2032) to the pre-industrial background, the 1850-1900 mean of the IPCC AR6 series '
          + '(solar_wm2 -0.013, volcanic_wm2 0.035 W m-2; volcanic forcing is relative to the long pre-industrial mean, so this stands for eruptions at the rate of those years, not a quiet stratosphere)',
      ],
    });
    expect(loadPathway('calm.csv', { pathwaysDir }).provenance.source).toBe('bundled:calm');
  });

  it('loadPathway(file path) keeps the path as source; splice: false leaves the file as it is', () => {
    const spliced = loadPathway(userFile, { pathwaysDir });
    expect(spliced.provenance.source).toBe(userFile);
    expect(spliced.years[0]).toBe(2020);
    expect(Array.from(spliced.series.co2_ppm!)).toEqual([410, 412, 414, NaN, NaN, NaN]);
    const alone = loadPathway(userFile, { pathwaysDir, splice: false });
    expect(Array.from(alone.years)).toEqual([2023, 2024, 2025]);
    expect(Array.from(alone.series.co2_gtco2!)).toEqual([40, 38, 36]);
  });

  it('loadPathway(history) is not spliced onto itself', () => {
    const h = loadPathway('history', { pathwaysDir });
    expect(h.provenance.spliceYear).toBeUndefined();
    expect(h.years[0]).toBe(2020);
  });

  it('loadPathway(swfit) suggests the bundled swift (a swap of two letters is one edit)', () => {
    expect(problemOf('swfit', { pathwaysDir: fileURLToPath(new URL('../../pathways', import.meta.url)) }).message)
      .toBe('must be an existing file or the name of a bundled pathway; did you mean "swift"?');
  });

  it('loadPathway of an unknown name lists the bundled names', () => {
    expect(problemOf('clam')).toEqual({
      file: 'clam', code: 'input.not-found', value: 'clam',
      message: 'must be an existing file or the name of a bundled pathway; did you mean "calm"?',
      expected: 'a CSV file path or one of the bundled pathways: calm, history',
    });
    expect(problemOf(join(dir, 'no', 'such.csv')).code).toBe('input.not-found');
  });

  it('loadPathway of a folder is an input error', () => {
    expect(problemOf(dir).code).toBe('input.is-directory');
  });

  it('loadPathway passes file validation problems through with the path as file', () => {
    const bad = fileURLToPath(new URL('../fixtures/bad/duplicate-year.csv', import.meta.url));
    expect(problemOf(bad)).toMatchObject({ file: bad, line: 5, code: 'input.duplicate-time' });
  });

  it('readPathway returns the parsed rows, the file\'s annual values and the spliced pathway', () => {
    const { parsed, annual, pathway } = readPathway('calm', { pathwaysDir });
    expect(parsed.file).toBe(join(pathwaysDir, 'calm.csv'));
    expect(Array.from(parsed.rowLines)).toEqual([3, 4]);
    expect(annual.years[0]).toBe(2023);
    expect(pathway.years[0]).toBe(2020);
  });

  it('loadPathway(swift) with the shipped files starts at 1750 and splices at 2025 (DESIGN.md data flow)', () => {
    const p = loadPathway('swift');
    expect(p.years[0]).toBe(1750);
    expect(p.years[p.years.length - 1]).toBe(2150);
    expect(p.provenance.spliceYear).toBe(2025);
    expect(p.provenance.notes).toContain('spliced onto bundled history at 2025 (1750-2024 from history.csv)');
  });
});

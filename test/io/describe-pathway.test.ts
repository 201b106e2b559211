import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { describePathway } from '../../src/io/describe-pathway.js';
import { readPathway } from '../../src/io/load-pathway.js';

const dir = mkdtempSync(join(tmpdir(), 'warmcast-describe-'));
afterAll(() => rmSync(dir, { recursive: true, force: true }));
writeFileSync(join(dir, 'history.csv'), 'year,co2_ppm,ch4_ppb,solar_wm2\n2020,410,1870,0.1\n2021,412,1880,0.2\n2022,414,1890,0.3\n');
writeFileSync(join(dir, 'calm.csv'),
  '# name: Calm\n# description: A short test pathway\nyear,co2_gtco2,aerosol_wm2,other_wm2\n2023,40,-1.1,0.9\n2028,30,-0.9,0.9\n2033,20,-0.5,0.9\n');

describe('describePathway', () => {
  it('describePathway lists file, rows, years, steps, columns with units, splice, notes, missing gases and forcing taken as zero', () => {
    const { parsed, pathway } = readPathway('calm', { pathwaysDir: dir });
    expect(describePathway(parsed, pathway)).toEqual([
      `file: ${join(dir, 'calm.csv')}`,
      'name: Calm',
      'description: A short test pathway',
      'rows read: 3 (lines 4-6)',
      'time column: year',
      'years in file: 2023 to 2033',
      'steps: 5-year steps, interpolated to annual',
      'columns:',
      '  co2_gtco2 (Gt CO2 yr-1): 20 to 40',
      '  aerosol_wm2 (W m-2): -1.1 to -0.5',
      '  other_wm2 (W m-2): 0.9',
      'splice: spliced onto bundled history at 2023 (2020-2022 from history.csv)',
      'run covers: 2020 to 2033 (14 years)',
      "note: aerosol_wm2 split over aerosol_ari_wm2 (20.4 %), aerosol_aci_wm2 (79.6 %): the shares of AR6's 2019 ERF",
      "note: other_wm2 split over other_ghg_wm2 (46.9 %), ozone_wm2 (54.5 %), strat_h2o_wm2 (5.7 %), contrails_wm2 (6.6 %), bc_snow_wm2 (9.2 %), land_use_wm2 (-23.0 %): the shares of AR6's 2019 ERF",
      'note: ch4_ppb not in file: taken from history to 2022, then held at the 2022 value',
      'note: solar_wm2 not in file: taken from history to 2022, then ramped linearly over 10 years (to 2032) to the pre-industrial background, the 1850-1900 mean of the IPCC AR6 series (solar_wm2 -0.013 W m-2)',
      "note: co2_gtco2 given instead of the history's co2_ppm: a run follows the history's co2_ppm to 2022, diagnosing co2_gtco2 from it, and from 2023 computes co2_ppm from the given co2_gtco2",
      'note: other_ghg_wm2, ozone_wm2, strat_h2o_wm2, contrails_wm2, aerosol_ari_wm2, aerosol_aci_wm2, bc_snow_wm2, land_use_wm2 not in history: NaN before 2023',
      'gases not given (held at pre-industrial): N2O',
      'forcing not given (taken as zero): volcanic_wm2',
    ]);
  });

  it('describePathway of a one-row file says "line 4" and "year in file", gives no steps and one value per column', () => {
    writeFileSync(join(dir, 'single.csv'), '# one row\n\nyear,co2_ppm\n2023,415\n');
    const { parsed, pathway } = readPathway(join(dir, 'single.csv'), { pathwaysDir: dir });
    const lines = describePathway(parsed, pathway);
    expect(lines).toContain('rows read: 1 (line 4)');
    expect(lines).toContain('year in file: 2023');
    expect(lines.filter((l) => l.startsWith('steps:'))).toEqual([]);
    expect(lines).toContain('  co2_ppm (ppm): 415');
  });

  it('describePathway gives decimal years with at most two decimals (2025.5 to 2030.5, not 2030.499)', () => {
    // Dates on different days keep their place in the year (two dates on one day would name calendar years).
    writeFileSync(join(dir, 'dated.csv'), 'date,co2_ppm\n2025-12-31,420\n2030-12-30,430\n');
    const { parsed, pathway } = readPathway(join(dir, 'dated.csv'), { pathwaysDir: dir });
    expect(describePathway(parsed, pathway)).toContain('years in file: 2025.5 to 2030.5');
  });

  it('describePathway of a file dated 31 December every year names calendar years', () => {
    writeFileSync(join(dir, 'year-ends.csv'), 'date,co2_ppm\n2025-12-31,420\n2030-12-31,430\n');
    const { parsed, pathway } = readPathway(join(dir, 'year-ends.csv'), { pathwaysDir: dir });
    const lines = describePathway(parsed, pathway);
    expect(lines).toContain('years in file: 2025 to 2030');
    expect(lines).toContain('time column: date (ISO 8601; every date on 31 December, so each names its calendar year)');
  });

  it('describePathway says "no interpolation" and "splice: none" for an annual file read without splicing', () => {
    const { parsed, pathway } = readPathway('history', { pathwaysDir: dir, splice: false });
    const lines = describePathway(parsed, pathway);
    expect(lines).toContain('steps: 1-year steps on whole years (no interpolation)');
    expect(lines).toContain('splice: none');
    expect(lines).toContain('gases not given (held at pre-industrial): N2O');
  });
});

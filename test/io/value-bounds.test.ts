import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { bundledPathwaysDir, bundledPathwayNames } from '../../src/io/bundled-pathways.js';
import { parsePathway } from '../../src/io/parse-pathway.js';
import { outOfBounds, VALUE_BOUNDS } from '../../src/io/value-bounds.js';
import { FORCING_COLUMNS, PATHWAY_COLUMNS } from '../../src/pathway.js';

/** The problems parsePathway reports for `text`, or [] when it reads. */
function problemsOf(text: string) {
  try {
    parsePathway(text, 'plan.csv');
    return [];
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    return (e as InputError).problems;
  }
}

describe('VALUE_BOUNDS', () => {
  it('VALUE_BOUNDS of the prescribed forcing columns: per agent, plus aerosol -5..1, other -5..10, solar -3..3, volcanic -15..1 W m-2 (common practice, no source)', () => {
    const ranges = Object.fromEntries(FORCING_COLUMNS.map((c) => [c, [VALUE_BOUNDS[c].min, VALUE_BOUNDS[c].max]]));
    expect(ranges).toEqual({
      other_ghg_wm2: [-1, 5], ozone_wm2: [-2, 3], strat_h2o_wm2: [-0.5, 1], contrails_wm2: [-0.5, 1], aerosol_ari_wm2: [-3, 1], aerosol_aci_wm2: [-4, 1],
      bc_snow_wm2: [-0.5, 1], land_use_wm2: [-2, 1], solar_wm2: [-3, 3], volcanic_wm2: [-15, 1], aerosol_wm2: [-5, 1], other_wm2: [-5, 10],
    });
    for (const c of FORCING_COLUMNS) expect(VALUE_BOUNDS[c].source).toMatch(/common practice, no source/);
  });

  it('VALUE_BOUNDS hold every value of every bundled pathway and of history.csv', () => {
    const dir = bundledPathwaysDir();
    for (const name of [...bundledPathwayNames(dir), 'history']) {
      const file = join(dir, `${name}.csv`);
      const parsed = parsePathway(readFileSync(file, 'utf8'), file);
      for (const column of PATHWAY_COLUMNS) {
        for (const v of parsed.columns[column] ?? []) {
          expect(v >= VALUE_BOUNDS[column].min && v <= VALUE_BOUNDS[column].max, `${name} ${column} ${v}`).toBe(true);
        }
      }
    }
  });

  it('parsePathway accepts each forcing column at both of its bounds (inclusive) and rejects a step beyond, naming line and column', () => {
    for (const column of FORCING_COLUMNS) {
      const { min, max } = VALUE_BOUNDS[column];
      expect(problemsOf(`year,${column}\n2030,${min}\n2040,${max}\n`), column).toEqual([]);
      const problems = problemsOf(`# a comment line\nyear,${column}\n2030,${min - 0.5}\n2040,${max + 0.5}\n`);
      expect(problems.map((p) => [p.line, p.column, p.code, p.value, p.expected])).toEqual([
        [3, column, 'input.out-of-range', String(min - 0.5), `a value from ${min} to ${max} W m-2`],
        [4, column, 'input.out-of-range', String(max + 0.5), `a value from ${min} to ${max} W m-2`],
      ]);
    }
  });

  it('parsePathway rejects aerosol_wm2 -50 (the value that once passed and gave -9.69 K)', () => {
    const [p] = problemsOf('year,aerosol_wm2\n2030,-50\n2050,0\n');
    expect(p).toMatchObject({ line: 2, column: 'aerosol_wm2', message: 'must be a plausible value for an aerosol effective radiative forcing' });
  });
});

describe('outOfBounds: a value 1000 times too large', () => {
  it('names the next smaller unit (Mt CO2 in the Gt CO2 column), and stays plain for other values out of range', () => {
    expect(outOfBounds('co2_gtco2', 40000)!.message).toMatch(/looks 1000 times too large.*divide the column by 1000/);
    expect(outOfBounds('co2_gtco2', 4e7)!.message).not.toMatch(/1000 times/);
    expect(outOfBounds('co2_gtco2', 40)).toBeUndefined();
    expect(outOfBounds('solar_wm2', 1361)!.message).not.toMatch(/1000 times/); // irradiance, not a unit slip
  });
});

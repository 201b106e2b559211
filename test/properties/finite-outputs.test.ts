/**
 * Property: any pathway the reader accepts can be projected. Random valid files (1- to 10-year steps,
 * whole or decimal start years, any subset of concentration and prescribed-forcing columns, values
 * anywhere within the reader's VALUE_BOUNDS) are read with parsePathway + toAnnual and projected with
 * the default calibration, standalone or spliced onto the bundled history; the run must not throw and
 * every output column must be finite in every year.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory, spliceOntoHistory } from '../../src/io/index.js';
import { PROJECTION_COLUMNS, projectPathway, type Projection } from '../../src/projection/index.js';
import { pathwayCsv, pathwayRows, readAnnual } from './pathway-arbitraries.js';

const params = calibrate();
const history = loadHistory();

/** Every column listed in DESIGN.md is present, one value per year, and every value is finite. */
function expectFiniteProjection(p: Projection): void {
  const n = p.years.length;
  for (let i = 1; i < n; i++) expect(p.years[i] - p.years[i - 1], 'consecutive years').toBe(1);
  for (const name of PROJECTION_COLUMNS) expect(p.columns[name], name).toBeDefined();
  for (const [name, values] of Object.entries(p.columns)) {
    expect(values.length, `${name} length`).toBe(n);
    const bad = values.findIndex((v) => !Number.isFinite(v));
    expect(bad, `${name}: first non-finite value at ${p.years[bad]} (${values[bad]})`).toBe(-1);
  }
}

describe('projectPathway on random valid pathways (fast-check, seed 42)', () => {
  it('projectPathway(toAnnual(parsePathway(random file)), { baseline: [first, first + 10] }) is finite in every column and year', () => {
    fc.assert(
      fc.property(pathwayRows(), (rows) => {
        const annual = readAnnual(pathwayCsv(rows));
        const first = annual.years[0];
        expectFiniteProjection(projectPathway(annual, { params, baseline: [first, first + 10] }));
      }),
      { seed: 42, numRuns: 250 },
    );
  });

  it('projectPathway(spliceOntoHistory(random file starting 1890-2300, history)) is finite with the 1850-1900 baseline', () => {
    fc.assert(
      fc.property(pathwayRows({ firstMin: 1890, firstMax: 2300 }), (rows) => {
        const spliced = spliceOntoHistory(readAnnual(pathwayCsv(rows)), history);
        expect(spliced.years[0]).toBe(history.years[0]);
        expectFiniteProjection(projectPathway(spliced, { params }));
      }),
      { seed: 42, numRuns: 150 },
    );
  });
});

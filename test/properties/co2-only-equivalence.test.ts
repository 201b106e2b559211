/**
 * Property: scaling all non-CO2 forcing to zero gives the same run as a CO2-only file. File A has a
 * random CO2 column and any subset of the other columns with CH4 and N2O at their 1750 values
 * (729.2 and 270.1 ppb, IPCC AR6 WG1 7.SM.1.1; from memory, REFERENCES.md M✓) and every prescribed
 * forcing column multiplied by zero; file B has only `year` and `co2_ppm`, so the run holds CH4 and
 * N2O at those same 1750 values. CH4 and N2O ERF are then zero by construction, as each formula has the
 * factor (sqrt M - sqrt M0) or (sqrt N - sqrt N0) (Meinshausen et al. 2020, Table 3, as used by AR6),
 * and CO2 ERF, which depends on N2O through band overlap (the c1 sqrt N term), sees the same N2O in
 * both files. Warming, deep-ocean temperature, forcing and imbalance must agree to 1e-12 (from the
 * task; common practice, no source).
 */
import fc from 'fast-check';
import { describe, it } from 'vitest';
import { calibrate } from '../../src/climate/index.js';
import { projectPathway } from '../../src/projection/index.js';
import { FORCING_AGENTS } from '../../src/forcing/agents.js';
import { FORCING_COLUMNS } from '../../src/pathway.js';
import { expectAllClose } from '../asserts.js';
import { pathwayCsv, pathwayRows, readAnnual, type PathwayRows } from './pathway-arbitraries.js';

const TOLERANCE = 1e-12;
/** 1750 values, IPCC AR6 WG1 7.SM.1.1 (from memory, REFERENCES.md M✓), written as a user would type them. */
const CH4_1750_PPB = 729.2;
const N2O_1750_PPB = 270.1;

/** A (with every non-CO2 column neutralised) and B (CO2 only) on the same rows. */
const pairs = pathwayRows({}, ['co2_ppm']).map((rows): { a: PathwayRows; b: PathwayRows } => {
    const zeroed: PathwayRows['columns'] = { co2_ppm: rows.columns.co2_ppm };
    const n = rows.times.length;
    if (rows.columns.ch4_ppb) zeroed.ch4_ppb = new Array<number>(n).fill(CH4_1750_PPB);
    if (rows.columns.n2o_ppb) zeroed.n2o_ppb = new Array<number>(n).fill(N2O_1750_PPB);
    for (const c of FORCING_COLUMNS) {
      const v = rows.columns[c];
      if (v) zeroed[c] = v.map((x) => 0 * x);
    }
    return { a: { times: rows.times, columns: zeroed }, b: { times: rows.times, columns: { co2_ppm: rows.columns.co2_ppm } } };
  });

describe('zero non-CO2 forcing equals a CO2-only file (fast-check, seed 42)', () => {
  it('projectPathway(A: CH4/N2O at 1750 values, prescribed x 0) equals projectPathway(B: co2_ppm only) to 1e-12', () => {
    const params = calibrate();
    fc.assert(
      fc.property(pairs, ({ a, b }) => {
        const pa = readAnnual(pathwayCsv(a, 'zeroed'));
        const pb = readAnnual(pathwayCsv(b, 'co2-only'));
        const first = pa.years[0];
        const ra = projectPathway(pa, { params, baseline: [first, first + 10] });
        const rb = projectPathway(pb, { params, baseline: [first, first + 10] });
        for (const column of ['warming_k', 'deep_ocean_k', 'forcing_wm2', 'imbalance_wm2', 'forcing_co2_wm2']) {
          expectAllClose(ra.columns[column], rb.columns[column], TOLERANCE, column);
        }
        for (const column of [...FORCING_AGENTS.filter((agent) => agent !== 'co2').map((agent) => `forcing_${agent}_wm2`), 'forcing_aerosol_wm2']) {
          expectAllClose(ra.columns[column], new Float64Array(ra.years.length), TOLERANCE, column);
        }
      }),
      { seed: 42, numRuns: 200 },
    );
  });
});

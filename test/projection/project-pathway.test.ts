import { describe, expect, it } from 'vitest';
import { calibrate, energyBalance, forcingByAgent } from '../../src/index.js';
import { ConfigError } from '../../src/errors.js';
import type { Pathway } from '../../src/pathway.js';
import { projectPathway, rebase } from '../../src/projection/index.js';
import { expectAllClose, expectClose } from '../asserts.js';

function pathway(years: number[], series: Pathway['series']): Pathway {
  return { name: 'test', years: Float64Array.from(years), series, metadata: {}, provenance: { source: 'memory', notes: [] } };
}

const params = calibrate();
const years = Array.from({ length: 351 }, (_, i) => 1750 + i);

describe('projectPathway', () => {
  it('is the energy balance of the summed forcing, rebased to the 1850-1900 mean', () => {
    const co2 = Float64Array.from(years, (y) => 278.3 * Math.exp(Math.max(0, y - 1850) * 0.004));
    const aerosol = Float64Array.from(years, (y) => -0.005 * Math.max(0, y - 1900));
    const run = projectPathway(pathway(years, { co2_ppm: co2, aerosol_wm2: aerosol }), { params });
    const f = forcingByAgent(years.length, { co2Ppm: co2, prescribed: { aerosol_wm2: aerosol } }, { co2Formula: 'ar6', forcing2xWm2: params.forcing2xWm2 });
    const eb = energyBalance(params, f.total);
    expectAllClose(run.columns.forcing_wm2, f.total, 1e-12, 'forcing');
    expectAllClose(run.columns.warming_k, rebase(Float64Array.from(years), eb.surfaceK, [1850, 1900]), 1e-12, 'warming');
    let mean = 0;
    for (let y = 1850; y <= 1900; y++) mean += run.columns.warming_k[y - 1750] / 51;
    expectClose(mean, 0, 1e-12, 'baseline mean is zero');
  });

  it('holds a gas that is not given at its 1750 value and says so', () => {
    const run = projectPathway(pathway(years, { co2_ppm: new Float64Array(years.length).fill(400) }), { params });
    expect(run.notes.join(' ')).toMatch(/CH4 not given: held at its 1750 value/);
    expectAllClose(run.columns.forcing_ch4_wm2, new Float64Array(years.length), 1e-15);
  });

  it('takes a forcing column that is not given as zero and says which, in one note; none when all are given', () => {
    const n = years.length;
    const run = projectPathway(pathway(years, { co2_ppm: new Float64Array(n).fill(400), aerosol_wm2: new Float64Array(n).fill(-0.5) }), { params });
    expect(run.notes).toContain('other_ghg_wm2, ozone_wm2, strat_h2o_wm2, contrails_wm2, bc_snow_wm2, land_use_wm2, solar_wm2, volcanic_wm2 not given: taken as zero');
    for (const agent of ['other_ghg', 'ozone', 'land_use', 'solar', 'volcanic']) expectAllClose(run.columns[`forcing_${agent}_wm2`], new Float64Array(n), 0, agent);
    expectAllClose(run.columns.forcing_aerosol_wm2, new Float64Array(n).fill(-0.5), 1e-15, 'aerosol');
    const zero = () => new Float64Array(n);
    const all = projectPathway(
      pathway(years, { co2_ppm: new Float64Array(n).fill(400), aerosol_wm2: zero(), other_wm2: zero(), solar_wm2: zero(), volcanic_wm2: zero() }),
      { params },
    );
    expect(all.notes.filter((note) => note.includes('taken as zero'))).toEqual([]);
  });

  it('notes that a run from 2030 starts from rest, with the forcing and the start concentrations the run really uses', () => {
    const later = Array.from({ length: 41 }, (_, i) => 2030 + i);
    const n = later.length;
    const emissions = projectPathway(
      pathway(later, { co2_gtco2: new Float64Array(n).fill(35), ch4_ppb: new Float64Array(n).fill(1900), n2o_mt: new Float64Array(n).fill(10) }),
      { params, baseline: [2030, 2040] },
    );
    const note = emissions.notes.find((text) => text.startsWith('the run starts from rest in 2030'));
    expect(note).toBeDefined();
    expect(emissions.carbon!.surfaceK[0]).toBe(0);
    expect(emissions.carbon!.deepK[0]).toBe(0);
    expect(note).toContain(`whatever that year's forcing (${emissions.columns.forcing_wm2[0].toFixed(2)} W m-2)`);
    // The values the note names are the run's own start, 1 January 2030 (AR6 1750 values,
    // forcing/constants.ts): the first year's annual mean adds half of that year's emissions to them.
    expect(note).toContain('(CO2 278.3 ppm, N2O 270.1 ppb)');
    const firstYearMean = emissions.columns.co2_ppm[0];
    expect(firstYearMean).toBeGreaterThan(278.3);
    expect(firstYearMean).toBeLessThan(278.3 + 35 / 3.664 / 2.124 / 2);
    expect(emissions.columns.ch4_ppb[0]).toBe(1900);

    const concentrations = projectPathway(pathway(later, { co2_ppm: new Float64Array(n).fill(440) }), { params, baseline: [2030, 2040] });
    expect(concentrations.notes).toContain(
      `the run starts from rest in 2030: zero warming at the surface and in the deep ocean, as in 1750, whatever that year's forcing (${concentrations.columns.forcing_wm2[0].toFixed(2)} W m-2), `
      + 'so any warming reached before 2030 is missing; spliced onto the history, the run would start from the record in 1750 instead',
    );
  });

  it('adds no starting note to a run from 1750', () => {
    const run = projectPathway(pathway(years, { co2_ppm: new Float64Array(years.length).fill(300) }), { params });
    expect(run.notes.filter((text) => text.includes('starts from rest'))).toEqual([]);
  });

  it('throws ConfigError when the baseline lies outside the years', () => {
    const short = years.filter((y) => y >= 1950);
    expect(() => projectPathway(pathway(short, { co2_ppm: new Float64Array(short.length).fill(400) }), { params })).toThrow(ConfigError);
  });
});

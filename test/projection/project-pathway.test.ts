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

  it('takes a forcing column that is not given as zero and says which, in one note; none when all four are given', () => {
    const n = years.length;
    const run = projectPathway(pathway(years, { co2_ppm: new Float64Array(n).fill(400), aerosol_wm2: new Float64Array(n).fill(-0.5) }), { params });
    expect(run.notes).toContain('other_wm2, solar_wm2, volcanic_wm2 not given: taken as zero');
    for (const agent of ['other', 'solar', 'volcanic']) expectAllClose(run.columns[`forcing_${agent}_wm2`], new Float64Array(n), 0, agent);
    const zero = () => new Float64Array(n);
    const all = projectPathway(
      pathway(years, { co2_ppm: new Float64Array(n).fill(400), aerosol_wm2: zero(), other_wm2: zero(), solar_wm2: zero(), volcanic_wm2: zero() }),
      { params },
    );
    expect(all.notes.filter((note) => note.includes('taken as zero'))).toEqual([]);
  });

  it('throws ConfigError when the baseline lies outside the years', () => {
    const short = years.filter((y) => y >= 1950);
    expect(() => projectPathway(pathway(short, { co2_ppm: new Float64Array(short.length).fill(400) }), { params })).toThrow(ConfigError);
  });
});

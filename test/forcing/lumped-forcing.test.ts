import { describe, expect, it } from 'vitest';
import { forcingByAgent, forcingColumnsNotGiven, LUMPED_PARTS, lumpedShare, splitLumpedForcing } from '../../src/forcing/index.js';
import type { Pathway } from '../../src/pathway.js';
import { expectAllClose, expectClose } from '../asserts.js';

const pathway = (series: Pathway['series']): Pathway => ({
  name: 'plan', years: Float64Array.of(2030, 2031), series, metadata: {}, provenance: { source: 'plan.csv', notes: [] },
});

describe('lumpedShare', () => {
  it('the shares of each lumped column add to 1 (so a split keeps the total)', () => {
    for (const lumped of ['aerosol_wm2', 'other_wm2'] as const) {
      const sum = LUMPED_PARTS[lumped].reduce((a, p) => a + lumpedShare(lumped, p), 0);
      expectClose(sum, 1, 1e-12, lumped);
    }
  });

  it('aerosol-cloud interactions take 79.7 % of aerosol_wm2 (AR6 2019: -0.843 of -1.058 W m-2)', () => {
    expectClose(lumpedShare('aerosol_wm2', 'aerosol_aci_wm2'), 0.843 / 1.058, 0.001);
  });

  it('land use has a negative share of other_wm2 (AR6 2019: -0.20 of 0.870 W m-2)', () => {
    expectClose(lumpedShare('other_wm2', 'land_use_wm2'), -0.2 / 0.870, 0.001);
  });
});

describe('splitLumpedForcing', () => {
  it('replaces aerosol_wm2 and other_wm2 by their agents, summing to the lumped values, and notes the shares', () => {
    const split = splitLumpedForcing(pathway({ aerosol_wm2: Float64Array.of(-1, -0.5), other_wm2: Float64Array.of(0.9, 1), solar_wm2: Float64Array.of(0, 0) }));
    expect(split.series.aerosol_wm2).toBeUndefined();
    expect(split.series.other_wm2).toBeUndefined();
    const sum = (cols: readonly string[]) => Float64Array.of(0, 1).map((_, i) => cols.reduce((a, c) => a + split.series[c as 'ozone_wm2']![i], 0));
    expectAllClose(sum(LUMPED_PARTS.aerosol_wm2), Float64Array.of(-1, -0.5), 1e-12, 'aerosol');
    expectAllClose(sum(LUMPED_PARTS.other_wm2), Float64Array.of(0.9, 1), 1e-12, 'other');
    expect(split.provenance.notes[0]).toMatch(/^aerosol_wm2 split over aerosol_ari_wm2 \(20\.4 %\), aerosol_aci_wm2 \(79\.6 %\): the shares of AR6's 2019 ERF$/);
  });

  it('leaves a pathway without lumped columns as it is', () => {
    const p = pathway({ ozone_wm2: Float64Array.of(0.5, 0.5) });
    expect(splitLumpedForcing(p)).toBe(p);
  });

  it('refuses a lumped column given with one of its agents', () => {
    expect(() => splitLumpedForcing(pathway({ aerosol_wm2: Float64Array.of(-1, -1), aerosol_aci_wm2: Float64Array.of(-1, -1) }))).toThrow(/aerosol_wm2 and aerosol_aci_wm2 must not both be given/);
  });

  it('forcingByAgent gives the same agents for a lumped column as for its split', () => {
    const lumped = pathway({ aerosol_wm2: Float64Array.of(-1, -0.5), other_wm2: Float64Array.of(0.9, 1) });
    const a = forcingByAgent(2, { prescribed: lumped.series }, { co2Formula: 'ar6', aerosolScale: 1.5 });
    const b = forcingByAgent(2, { prescribed: splitLumpedForcing(lumped).series }, { co2Formula: 'ar6', aerosolScale: 1.5 });
    for (const agent of Object.keys(a.byAgent) as (keyof typeof a.byAgent)[]) expectAllClose(a.byAgent[agent], b.byAgent[agent], 1e-15, agent);
    expectAllClose(a.aerosol, Float64Array.of(-1.5, -0.75), 1e-12, 'scaled aerosol');
  });
});

describe('forcingColumnsNotGiven', () => {
  it('counts a lumped column as giving its agents', () => {
    expect(forcingColumnsNotGiven({ aerosol_wm2: Float64Array.of(1), solar_wm2: Float64Array.of(0) })).toEqual([
      'other_ghg_wm2', 'ozone_wm2', 'strat_h2o_wm2', 'contrails_wm2', 'bc_snow_wm2', 'land_use_wm2', 'volcanic_wm2',
    ]);
  });
});

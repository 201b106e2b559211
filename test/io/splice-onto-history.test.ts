import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { spliceOntoHistory } from '../../src/io/splice-onto-history.js';
import type { Pathway, PathwayColumn } from '../../src/pathway.js';

function pathway(first: number, series: Partial<Record<PathwayColumn, number[]>>, source: string): Pathway {
  const length = Object.values(series)[0]!.length;
  return {
    name: source,
    years: Float64Array.from({ length }, (_, i) => first + i),
    series: Object.fromEntries(Object.entries(series).map(([k, v]) => [k, Float64Array.from(v!)])),
    metadata: {},
    provenance: { source, notes: [] },
  };
}

/** History 2000-2004: CO2 370-374 ppm, solar 0.1-0.5, ozone -1.0 to -1.4 W m-2. */
const history = pathway(2000, {
  co2_ppm: [370, 371, 372, 373, 374],
  ozone_wm2: [-1.0, -1.1, -1.2, -1.3, -1.4],
  solar_wm2: [0.1, 0.2, 0.3, 0.4, 0.5],
}, 'bundled:history');

const values = (p: Pathway, c: PathwayColumn) => Array.from(p.series[c]!);

describe('spliceOntoHistory', () => {
  it('spliceOntoHistory puts history before the first future year and the future from it on', () => {
    const future = pathway(2005, { co2_ppm: [380, 381, 382], ozone_wm2: [-0.5, -0.4, -0.3] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    expect(Array.from(s.years)).toEqual([2000, 2001, 2002, 2003, 2004, 2005, 2006, 2007]);
    expect(values(s, 'co2_ppm')).toEqual([370, 371, 372, 373, 374, 380, 381, 382]);
    expect(values(s, 'ozone_wm2')).toEqual([-1.0, -1.1, -1.2, -1.3, -1.4, -0.5, -0.4, -0.3]);
    expect(s.provenance.source).toBe('plan.csv');
    expect(s.provenance.spliceYear).toBe(2005);
    expect(s.name).toBe('plan.csv');
  });

  it('spliceOntoHistory continues a column the future lacks from history, then holds its last value, or for solar ramps over 10 years to its pre-industrial background (the 1850-1900 mean of the AR6 series)', () => {
    const future = pathway(2005, { co2_ppm: Array.from({ length: 12 }, (_, i) => 380 + i) }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    const ramp = (k: number) => 0.5 + ((-0.0127 - 0.5) * k) / 10;
    expect(values(s, 'solar_wm2').map((v) => +v.toFixed(12))).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, ...Array.from({ length: 10 }, (_, k) => +ramp(k + 1).toFixed(12)), -0.0127, -0.0127]);
    expect(s.provenance.notes).toEqual([
      'spliced onto bundled history at 2005 (2000-2004 from history.csv)',
      'ozone_wm2 not in file: taken from history to 2004, then held at the 2004 value',
      'solar_wm2 not in file: taken from history to 2004, then ramped linearly over 10 years (to 2014) to the pre-industrial background, the 1850-1900 mean of the IPCC AR6 series (solar_wm2 -0.013 W m-2)',
    ]);
  });

  it('spliceOntoHistory splits a lumped aerosol_wm2 over the agents it stands for, which replace the history\'s', () => {
    const agents = pathway(2000, { co2_ppm: [370, 371, 372, 373, 374], aerosol_ari_wm2: [-0.2, -0.2, -0.2, -0.2, -0.2], aerosol_aci_wm2: [-0.8, -0.8, -0.8, -0.8, -0.8] }, 'bundled:history');
    const s = spliceOntoHistory(pathway(2005, { co2_ppm: [380, 381], aerosol_wm2: [-0.5, -0.5] }, 'plan.csv'), agents);
    expect(s.series.aerosol_wm2).toBeUndefined();
    const total = Array.from(s.years, (_, i) => s.series.aerosol_ari_wm2![i] + s.series.aerosol_aci_wm2![i]);
    expect(total.map((v) => +v.toFixed(12))).toEqual([-1, -1, -1, -1, -1, -0.5, -0.5]);
    expect(s.provenance.notes[0]).toMatch(/^aerosol_wm2 split over aerosol_ari_wm2 \(20\.4 %\), aerosol_aci_wm2 \(79\.6 %\)/);
  });

  it('spliceOntoHistory notes a volcanic column in the quiet-stratosphere convention (0 between eruptions) with the AR6 convention the history follows', () => {
    const quiet = pathway(2000, { co2_ppm: [370, 371, 372, 373, 374], volcanic_wm2: [0.2, 0.2, 0.2, 0.2, 0.2] }, 'bundled:history');
    const s = spliceOntoHistory(pathway(2005, { co2_ppm: [380, 381], volcanic_wm2: [0, 0] }, 'plan.csv'), quiet);
    expect(s.provenance.notes).toContain(
      'volcanic_wm2 steps at the join: the history gives 0.200 W m-2 for 2004, the file 0.000 W m-2 for 2005 (0.200 W m-2 lower; a step of more than 0.1 W m-2 is noted); '
        + 'the history follows IPCC AR6, where volcanic forcing is relative to the long pre-industrial mean: about +0.2 W m-2 in years without eruptions, 0.035 for eruptions at the 1850-1900 rate, not 0',
    );
  });

  it('spliceOntoHistory keeps both forms when the future gives CO2 emissions and history concentrations', () => {
    const future = pathway(2005, { co2_gtco2: [40, 38, 36] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    const nan = NaN;
    expect(values(s, 'co2_ppm')).toEqual([370, 371, 372, 373, 374, nan, nan, nan]);
    expect(values(s, 'co2_gtco2')).toEqual([nan, nan, nan, nan, nan, 40, 38, 36]);
    expect(s.provenance.notes).toContain(
      "co2_gtco2 given instead of the history's co2_ppm: a run follows the history's co2_ppm to 2004, "
      + 'diagnosing co2_gtco2 from it, and from 2005 computes co2_ppm from the given co2_gtco2',
    );
  });

  it('spliceOntoHistory notes a concentration future after an emission history in data terms (a run needs the other order)', () => {
    const emissionHistory = pathway(2000, { co2_gtco2: [30, 31, 32, 33, 34] }, 'bundled:history');
    const future = pathway(2005, { co2_ppm: [380, 381] }, 'plan.csv');
    const s = spliceOntoHistory(future, emissionHistory);
    expect(s.provenance.notes).toContain("co2_ppm given instead of the history's co2_gtco2: the history's co2_gtco2 is used to 2004 and the file's co2_ppm from 2005");
  });

  it('spliceOntoHistory lets a future that starts inside the history win from its first year', () => {
    const future = pathway(2002, { co2_ppm: [400, 401, 402, 403, 404, 405] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    expect(Array.from(s.years)).toEqual([2000, 2001, 2002, 2003, 2004, 2005, 2006, 2007]);
    expect(values(s, 'co2_ppm')).toEqual([370, 371, 400, 401, 402, 403, 404, 405]);
    expect(values(s, 'solar_wm2').map((v) => +v.toFixed(12))).toEqual([0.1, 0.2, 0.3, 0.4, 0.5, 0.44873, 0.39746, 0.34619]);
    expect(s.provenance.notes[0]).toBe('spliced onto bundled history at 2002 (2000-2001 from history.csv)');
  });

  it('spliceOntoHistory of a future ending inside history ends with the future and holds nothing', () => {
    const future = pathway(2001, { co2_ppm: [400, 401] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    expect(Array.from(s.years)).toEqual([2000, 2001, 2002]);
    expect(values(s, 'solar_wm2')).toEqual([0.1, 0.2, 0.3]);
    expect(s.provenance.notes).toContain('ozone_wm2, solar_wm2 not in file: taken from history');
  });

  it('spliceOntoHistory notes a concentration that steps by more than 2 % at the join, with the history\'s and the file\'s value for the same year', () => {
    // 400 against the history's 371 ppm for 2001: 29 / 371 = 7.8 % higher.
    const s = spliceOntoHistory(pathway(2001, { co2_ppm: [400, 401] }, 'plan.csv'), history);
    expect(s.provenance.notes).toContain(
      'co2_ppm steps at the join: the history gives 371.00 ppm for 2001, the file 400.00 ppm (7.8 % higher; a step of more than 2 % is noted)',
    );
    expect(values(s, 'co2_ppm')).toEqual([370, 400, 401]);
  });

  it('spliceOntoHistory compares a file starting the year after the history with the history\'s last year', () => {
    // 360 in 2005 against 374 ppm in 2004: 14 / 374 = 3.7 % lower.
    const s = spliceOntoHistory(pathway(2005, { co2_ppm: [360, 361] }, 'plan.csv'), history);
    expect(s.provenance.notes).toContain(
      'co2_ppm steps at the join: the history gives 374.00 ppm for 2004, the file 360.00 ppm for 2005 (3.7 % lower; a step of more than 2 % is noted)',
    );
  });

  it('spliceOntoHistory says nothing of steps within 2 % (concentrations) or 0.1 W m-2 (forcing), nor across a bridged gap', () => {
    // 380 against 374 ppm is 1.6 %; -1.45 against -1.4 W m-2 is 0.05 W m-2.
    const near = spliceOntoHistory(pathway(2005, { co2_ppm: [380, 381], ozone_wm2: [-1.45, -1.4] }, 'plan.csv'), history);
    expect(near.provenance.notes.filter((n) => n.includes('at the join'))).toEqual([]);
    // 2005-2006 are bridged from 374 to 400 ppm: a slope, not a step.
    const gap = spliceOntoHistory(pathway(2007, { co2_ppm: [400, 401] }, 'plan.csv'), history);
    expect(gap.provenance.notes.filter((n) => n.includes('at the join'))).toEqual([]);
  });

  it('spliceOntoHistory notes a forcing column that steps by more than 0.1 W m-2 at the join', () => {
    const s = spliceOntoHistory(pathway(2005, { co2_ppm: [380, 381], ozone_wm2: [-0.5, -0.4] }, 'plan.csv'), history);
    expect(s.provenance.notes).toContain(
      'ozone_wm2 steps at the join: the history gives -1.400 W m-2 for 2004, the file -0.500 W m-2 for 2005 (0.900 W m-2 higher; a step of more than 0.1 W m-2 is noted)',
    );
  });

  it('spliceOntoHistory returns a future starting at or before the history unchanged', () => {
    const same = pathway(2000, { co2_ppm: [1, 2] }, 'a.csv');
    const earlier = pathway(1990, { co2_ppm: [1, 2] }, 'b.csv');
    expect(spliceOntoHistory(same, history)).toBe(same);
    expect(spliceOntoHistory(earlier, history)).toBe(earlier);
  });

  it('spliceOntoHistory leaves a column in neither absent and a future-only column NaN before the splice', () => {
    const future = pathway(2005, { co2_ppm: [380, 381], land_use_wm2: [-0.4, -0.5] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    expect(s.series.ch4_ppb).toBeUndefined();
    expect(values(s, 'land_use_wm2')).toEqual([NaN, NaN, NaN, NaN, NaN, -0.4, -0.5]);
    expect(s.provenance.notes).toContain('land_use_wm2 not in history: NaN before 2005');
  });

  it('spliceOntoHistory bridges a gap between history and future linearly', () => {
    const future = pathway(2007, { co2_ppm: [383, 384] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    // From (2004, 374) to (2007, 383): 3 ppm per year, so 377 and 380 in 2005 and 2006.
    expect(values(s, 'co2_ppm')).toEqual([370, 371, 372, 373, 374, 377, 380, 383, 384]);
    expect(s.provenance.notes).toContain("2005-2006 bridged linearly from the history's 2004 value to the file's 2007 value (co2_ppm)");
  });

  it('spliceOntoHistory names a one-year bridge by its year alone (2005, not 2005-2005)', () => {
    const s = spliceOntoHistory(pathway(2006, { co2_ppm: [380, 381] }, 'plan.csv'), history);
    expect(s.provenance.notes).toContain("2005 bridged linearly from the history's 2004 value to the file's 2006 value (co2_ppm)");
    const emissions = spliceOntoHistory(pathway(2006, { co2_gtco2: [40, 38] }, 'plan.csv'), history);
    expect(emissions.provenance.notes.some((n) => n.startsWith("co2_gtco2 held at the file's 2006 value over 2005: "))).toBe(true);
  });

  it('spliceOntoHistory holds emissions at their first value over a gap after a concentration history (the carbon cycle joins them)', () => {
    const future = pathway(2007, { co2_gtco2: [40, 38] }, 'plan.csv');
    const s = spliceOntoHistory(future, history);
    const nan = NaN;
    expect(values(s, 'co2_gtco2')).toEqual([nan, nan, nan, nan, nan, 40, 40, 40, 38]);
    expect(values(s, 'co2_ppm')).toEqual([370, 371, 372, 373, 374, nan, nan, nan, nan]);
    expect(s.provenance.notes).toContain(
      "co2_gtco2 held at the file's 2007 value over 2005-2006: the history gives that gas as a concentration, which cannot be bridged linearly to an emission rate",
    );
    expect(s.provenance.notes).toContain(
      "co2_gtco2 given instead of the history's co2_ppm: a run follows the history's co2_ppm to 2004, diagnosing co2_gtco2 from it, and from 2005 computes co2_ppm from the given co2_gtco2",
    );
  });

  it('spliceOntoHistory refuses a gap it cannot bridge (a column the history has in neither form)', () => {
    const noAerosol = { ...history, series: { co2_ppm: history.series.co2_ppm } };
    const future = pathway(2007, { co2_ppm: [383, 384], ozone_wm2: [-1, -1] }, 'plan.csv');
    expect(() => spliceOntoHistory(future, noAerosol)).toThrow(InputError);
    expect(() => spliceOntoHistory(future, noAerosol)).toThrow(
      'plan.csv: column "ozone_wm2": must start by 2005 to follow the history, which ends in 2004',
    );
  });
});

import { describe, expect, it } from 'vitest';
import { diagnoseEmissions, JOOS_2013, runEmissionDriven, type EmissionRunOptions } from '../../src/carbon/index.js';
import { calibrate } from '../../src/climate/index.js';
import { ConfigError, NumericalError } from '../../src/errors.js';
import { loadHistory, spliceOntoHistory } from '../../src/io/index.js';
import type { Pathway } from '../../src/pathway.js';
import { expectAllClose, expectClose } from '../asserts.js';
import { expectMassConserved } from './mass-conserved.js';

const params = calibrate();
const options: EmissionRunOptions = { forcing: { co2Formula: 'ar6', forcing2xWm2: params.forcing2xWm2 } };
const C0 = 278.3;
const GTC_PER_PPM = 2.124;
const GTCO2_PER_GTC = 44.009 / 12.011;

function pathway(firstYear: number, length: number, series: Pathway['series'], name = 'test'): Pathway {
  const years = Float64Array.from({ length }, (_, i) => firstYear + i);
  return { name, years, series, metadata: {}, provenance: { source: name, notes: [] } };
}
const filled = (length: number, f: (i: number) => number) => Float64Array.from({ length }, (_, i) => f(i));

describe('runEmissionDriven against analytic solutions', () => {
  it('a constant emission from 1 January of the first year gives E [a0 t + sum a_i tau_i (1 - exp(-t/tau_i))] without the feedback, as year-end values and as annual means (Joos et al. 2013 response)', () => {
    const e = 10; // Gt C per year
    const n = 301;
    const run = runEmissionDriven(pathway(1850, n, { co2_gtco2: filled(n, () => e * GTCO2_PER_GTC) }), params, { ...options, feedback: false });
    const { fractions, timescalesYr } = JOOS_2013;
    // The stock at time t after the start, and its mean over year k (t from k to k + 1), integrated by hand.
    const stock = (t: number) => fractions[0] * t + [1, 2, 3].reduce((sum, i) => sum + fractions[i] * timescalesYr[i] * (1 - Math.exp(-t / timescalesYr[i])), 0);
    const yearMean = (k: number) =>
      fractions[0] * (k + 0.5) + [1, 2, 3].reduce((sum, i) => sum + fractions[i] * timescalesYr[i] * (1 - timescalesYr[i] * (Math.exp(-k / timescalesYr[i]) - Math.exp(-(k + 1) / timescalesYr[i]))), 0);
    // Closed-form steps: only rounding separates them from the formula (1e-9 ppm on ~1000 ppm).
    expectAllClose(run.co2YearEndPpm, filled(n, (k) => C0 + (e * stock(k + 1)) / GTC_PER_PPM), 1e-9, 'year-end co2');
    expectAllClose(run.co2Ppm, filled(n, (k) => C0 + (e * yearMean(k)) / GTC_PER_PPM), 1e-9, 'annual-mean co2');
    expectMassConserved(run);
  });

  it('each year emits exactly its row and cumulativeCo2Gtco2 is the running sum of the rows from 1850 (calendar-year totals, DESIGN.md conventions)', () => {
    const n = 120;
    const rate = filled(n, (i) => 3 + 20 * Math.sin(i / 9) ** 2 - (i > 90 ? 30 : 0));
    const run = runEmissionDriven(pathway(1900, n, { co2_gtco2: rate }), params, options);
    for (let k = 1; k < n; k++) {
      expectClose(run.carbonBudget.emittedGtc[k] - run.carbonBudget.emittedGtc[k - 1], rate[k] / GTCO2_PER_GTC, 1e-9, `year ${1900 + k}`);
    }
    expect(run.co2EmissionsGtco2).toEqual(rate);
    let sum = 0;
    for (let k = 0; k < n; k++) {
      sum += rate[k];
      expect(run.cumulativeCo2Gtco2[k]).toBe(sum);
    }
    expectMassConserved(run);
  });

  const ch4Pulse = (ch4Lifetime: 'join' | 'burden' | 'constant') => {
    const n = 61;
    const run = (pulseMt: number) =>
      runEmissionDriven(
        pathway(2000, n, {
          ch4_ppb: filled(n, (i) => (i === 0 ? 1800 : NaN)),
          ch4_mt: filled(n, (i) => (i === 0 ? NaN : i === 1 ? pulseMt : 0)),
          co2_gtco2: filled(n, () => 0),
        }),
        params,
        { ...options, ch4Lifetime },
      );
    const base = run(0);
    const pulsed = run(10);
    // The start is a steady state at 1800 ppb, so with no anthropogenic emissions it stays there.
    expectAllClose(base.ch4Ppb, filled(n, () => 1800), 1e-8, 'steady state');
    expectMassConserved(pulsed);
    const d = (t: number) => pulsed.ch4Ppb[t] - base.ch4Ppb[t];
    return 30 / Math.log(d(10) / d(40));
  };

  it('by default (lifetime from the join) a CH4 perturbation after the join decays in 11.8 yr (IPCC AR6 WG1 Table 7.15; from memory)', () => {
    // A 10 Mt pulse (3.6 ppb) changes the lifetime by about 0.05 %; 0.5 % allows for that.
    expectClose(ch4Pulse('join'), 11.8, 0.06);
  });

  it('with the burden-dependent lifetime from 1750, a CH4 perturbation at 1800 ppb also decays in 11.8 yr', () => {
    expectClose(ch4Pulse('burden'), 11.8, 0.06);
  });

  it('with the constant lifetime a CH4 perturbation decays in the 9.1 yr total lifetime (Prather et al. 2012; from memory)', () => {
    expectClose(ch4Pulse('constant'), 9.1, 1e-4);
  });

  it('the N2O perturbation decays with its 109 yr lifetime (IPCC AR6 WG1 Table 7.15; from memory)', () => {
    const n = 201;
    const series = (pulse: number): Pathway['series'] => ({ n2o_mt: filled(n, (i) => (i === 1 ? pulse : 0)) });
    const base = runEmissionDriven(pathway(1750, n, series(0)), params, options);
    const pulsed = runEmissionDriven(pathway(1750, n, series(10)), params, options);
    const d = (t: number) => pulsed.n2oPpb[t] - base.n2oPpb[t];
    expectClose(150 / Math.log(d(20) / d(170)), 109, 1e-4);
    expectAllClose(base.n2oPpb, filled(n, () => 270.1), 1e-8, 'steady state');
    expectMassConserved(pulsed);
    // The natural emissions are said in the project's unit style, naming the gas (Mt N2O yr-1, not Mt/yr).
    expect(base.notes).toContain(`N2O natural emissions ${base.naturalEmissionsMt.n2o.toFixed(2)} Mt N2O yr-1 (implied by the steady state at the start)`);
  });
});

describe('runEmissionDriven in concentration years', () => {
  const history = loadHistory();

  it('reports the given concentrations while diagnosing emissions, and its year-end CO2 is midway between annual means', () => {
    const run = runEmissionDriven(history, params, options);
    expect(run.co2Ppm).toEqual(history.series.co2_ppm!);
    expect(run.ch4Ppb).toEqual(history.series.ch4_ppb!);
    expect(run.n2oPpb).toEqual(history.series.n2o_ppb!);
    const c = history.series.co2_ppm!;
    for (let k = 0; k + 1 < c.length; k++) expectClose(run.co2YearEndPpm[k], (c[k] + c[k + 1]) / 2, 1e-9, `1 January ${1751 + k}`);
    expect(run.diagnosedUntil).toBe(2024);
    expectMassConserved(run);
  });

  it('lets each gas be given its own way: CO2 as emissions with CH4 and N2O as concentrations', () => {
    const n = history.years.length;
    const { emissions } = diagnoseEmissions(history, params, options);
    const { co2_ppm: _concentration, ...others } = history.series;
    const mixed: Pathway = { ...history, series: { ...others, co2_gtco2: emissions.series.co2_gtco2 } };
    const run = runEmissionDriven(mixed, params, options);
    expectAllClose(run.ch4Ppb, history.series.ch4_ppb!, 1e-7, 'ch4 as given');
    expectAllClose(run.n2oPpb, history.series.n2o_ppb!, 1e-7, 'n2o as given');
    // CO2 now follows from the emissions: each year's total lands the stock on the same 1 January
    // value (the round trip, to rounding), and the annual means differ from the record by the
    // within-year shape: the linear path between 1 January values misses a record's annual mean by a
    // quarter of its second difference (yearStartConcentrations), and the path under constant
    // emissions is not quite linear (0.05 ppm allowed for that; measured below 0.02 ppm).
    const forward = runEmissionDriven(history, params, options);
    // Not to rounding: the feedback sees the warming of the computed annual means, which differ from
    // the record's by < 0.1 ppm (measured: 1.4e-3 ppm at most).
    expectAllClose(run.co2YearEndPpm, forward.co2YearEndPpm, 0.01, 'year-end co2');
    const c = history.series.co2_ppm!;
    for (let k = 1; k + 1 < n; k++) {
      expectClose(run.co2Ppm[k], c[k], Math.abs(c[k + 1] - 2 * c[k] + c[k - 1]) / 4 + 0.05, `annual-mean co2 ${1750 + k}`);
    }
    expect(n).toBe(275);
    expect(run.diagnosedUntil).toBeUndefined();
    expectMassConserved(run);
  });

  it('cumulativeCo2Gtco2 counts the rows from 1850 (zero before) and the airborne fraction is NaN while cumulative emissions are ~0', () => {
    const run = runEmissionDriven(history, params, options);
    const i1850 = 1850 - 1750;
    for (let k = 0; k < i1850; k++) expect(run.cumulativeCo2Gtco2[k]).toBe(0);
    const e = run.carbonBudget.emittedGtc;
    let rows = 0;
    for (let k = i1850; k < e.length; k++) {
      rows += run.co2EmissionsGtco2[k];
      expect(run.cumulativeCo2Gtco2[k]).toBe(rows);
      expectClose(run.cumulativeCo2Gtco2[k], (e[k] - e[i1850 - 1]) * GTCO2_PER_GTC, 1e-9);
    }
    expect(Number.isNaN(run.airborneFraction[0])).toBe(true);
    const last = e.length - 1;
    expectClose(run.airborneFraction[last], run.carbonBudget.atmosphericGtc[last] / e[last], 1e-15);
  });
});

describe('runEmissionDriven joining history and a future emission pathway', () => {
  const history = loadHistory();
  const hn = history.years.length;
  const futureYears = 2100 - 2024;

  // A smooth future concentration path continuing from 2024; its compatible emissions become the
  // future emission file, so the join must reproduce it (common practice, no source).
  const co2Future = (y: number) => 422.8 + 2.4 * (y - 2024) - 0.012 * (y - 2024) ** 2;
  const futureFile = (co2Gtco2: Float64Array) => pathway(2025, futureYears, { co2_gtco2: co2Gtco2 }, 'future');
  // The concentration run shares everything else with the spliced pathway (however io holds the
  // columns the file lacks), with CO2 given as concentrations throughout.
  const full = (() => {
    const spliced = spliceOntoHistory(futureFile(new Float64Array(futureYears)), history);
    const { co2_gtco2: _emissions, ...others } = spliced.series;
    const co2 = filled(spliced.years.length, (i) => (i < hn ? history.series.co2_ppm![i] : co2Future(1750 + i)));
    return { ...spliced, name: 'full', series: { ...others, co2_ppm: co2 } };
  })();
  const compatible = diagnoseEmissions(full, params, options).emissions.series.co2_gtco2!;

  it('continues from the diagnosed carbon-cycle state: the spliced run follows the concentration run', () => {
    const run = runEmissionDriven(spliceOntoHistory(futureFile(compatible.slice(hn)), history), params, options);
    const reference = runEmissionDriven(full, params, options);
    expect(run.diagnosedUntil).toBe(2024);
    expect(run.notes.some((note) => note.startsWith('CO2 emissions at the join'))).toBe(true);
    // Units in the project's one style (W m-2, Gt CO2 yr-1), never "/yr".
    expect(run.notes.find((note) => note.startsWith('CO2 emissions at the join'))).toMatch(
      /^CO2 emissions at the join: -?\d+\.\d\d Gt CO2 diagnosed for 2024 \(its growth taken as the 2020-2024 least-squares trend of the concentration\), -?\d+\.\d\d Gt CO2 given for 2025$/,
    );
    expect(run.notes.filter((note) => note.includes('/yr'))).toEqual([]);
    // Up to 2023 both runs diagnose the same emissions from the same record; 2024 differs by the
    // growth rule at the end of a record (trend against the next year's value).
    for (let k = 0; k < hn - 1; k++) expect(run.carbonBudget.emittedGtc[k]).toBeCloseTo(reference.carbonBudget.emittedGtc[k], 6);
    // From 2024 on they differ only in what was emitted: the spliced run takes 2024's growth from the
    // 2020-2024 trend, where the full record has the next year's concentration to go by. The
    // consequences are bounded by the size of that
    // difference: each Gt C raises the air by at most 1 Gt C (airborne fraction <= 1), and warms
    // by at most 0.29 K per 100 Gt C (Joos et al. 2013: 0.19 +/- 0.10 K within 20 years of a
    // 100 Gt C pulse, upper end).
    let emittedDifference = 0;
    for (let k = 0; k < run.co2Ppm.length; k++) {
      emittedDifference = Math.max(emittedDifference, Math.abs(run.carbonBudget.emittedGtc[k] - reference.carbonBudget.emittedGtc[k]));
    }
    expect(emittedDifference).toBeLessThan(2.124); // below one ppm's worth: the join is consistent
    expectAllClose(run.co2Ppm, full.series.co2_ppm, emittedDifference / 2.124, 'co2');
    expectAllClose(run.surfaceK, reference.surfaceK, 0.0029 * emittedDifference, 'warming');
    expectMassConserved(run);
  });

  it('a pathway restarted from an empty carbon cycle in 2025 would not: the boxes carry the history', () => {
    // Guard against a join that forgets the state: the same future emissions from pre-industrial
    // boxes give a very different concentration.
    const alone = runEmissionDriven(futureFile(compatible.slice(hn)), params, options);
    expect(Math.abs(alone.co2Ppm[futureYears - 1] - co2Future(2100))).toBeGreaterThan(50);
    expectMassConserved(alone);
  });
});

describe('runEmissionDriven carbon-climate feedback', () => {
  const n = 151;
  const emissions = pathway(1850, n, { co2_gtco2: filled(n, () => 10 * GTCO2_PER_GTC) });
  const sensitive = calibrate({ ecsK: 4.5, tcrK: 2.2 });
  const insensitive = calibrate({ ecsK: 2, tcrK: 1.4 });

  it('with the feedback, a more sensitive climate leaves more CO2 in the air (weaker sinks as it warms)', () => {
    const hot = runEmissionDriven(emissions, sensitive, { ...options, forcing: { co2Formula: 'ar6' } });
    const cool = runEmissionDriven(emissions, insensitive, { ...options, forcing: { co2Formula: 'ar6' } });
    expect(hot.co2Ppm[n - 1]).toBeGreaterThan(cool.co2Ppm[n - 1] + 5);
    expectMassConserved(hot);
    expectMassConserved(cool);
  });

  it('without it, the concentration does not depend on the climate', () => {
    const off = { forcing: { co2Formula: 'ar6' as const }, feedback: false };
    const hot = runEmissionDriven(emissions, sensitive, off);
    const cool = runEmissionDriven(emissions, insensitive, off);
    expectAllClose(hot.co2Ppm, cool.co2Ppm, 1e-8, 'co2');
    expectMassConserved(hot);
  });
});

describe('runEmissionDriven input checks', () => {
  const base = (series: Pathway['series']) => pathway(2000, 3, series, 'bad.csv');

  it('rejects a gas given both ways in one year', () => {
    const p = base({ co2_ppm: Float64Array.of(400, 401, 402), co2_gtco2: Float64Array.of(NaN, 40, 40) });
    expect(() => runEmissionDriven(p, params, options)).toThrow(/co2_ppm and co2_gtco2 are both given for 2001/);
  });

  it('rejects a year with neither form', () => {
    const p = base({ ch4_ppb: Float64Array.of(1900, NaN, NaN), ch4_mt: Float64Array.of(NaN, NaN, 300) });
    expect(() => runEmissionDriven(p, params, options)).toThrow(ConfigError);
    expect(() => runEmissionDriven(p, params, options)).toThrow(/CH4 has no value for 2001/);
  });

  it('rejects a concentration after emissions started', () => {
    const p = base({ n2o_ppb: Float64Array.of(NaN, NaN, 330), n2o_mt: Float64Array.of(10, 10, NaN) });
    expect(() => runEmissionDriven(p, params, options)).toThrow(/concentrations must come before emissions/);
  });

  it('stops with a NumericalError naming the year when emissions drive CO2 below zero', () => {
    const p = pathway(2000, 3, { co2_gtco2: Float64Array.of(-5000, -5000, -5000) }, 'removal.csv');
    expect(() => runEmissionDriven(p, params, options)).toThrow(NumericalError);
    expect(() => runEmissionDriven(p, params, options)).toThrow(/^removal.csv: the run left the physical range in 200[0-2] \(CO2 -/);
  });

  it('rejects a prescribed forcing that is not a number', () => {
    const p = base({ co2_gtco2: Float64Array.of(40, 40, 40), aerosol_wm2: Float64Array.of(-1, NaN, -1) });
    expect(() => runEmissionDriven(p, params, options)).toThrow(/aerosol_wm2 must be a number in every year/);
  });
});

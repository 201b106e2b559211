import { describe, expect, it } from 'vitest';
import { annualCarbonState, annualCarbonStepForIncreaseInto, annualCarbonStepInto, atmosphericGtc } from '../../src/carbon/annual-carbon-step.js';
import { runEmissionDriven, type EmissionRunOptions } from '../../src/carbon/run-emission-driven.js';
import { calibrate } from '../../src/climate/calibrate.js';
import { loadHistory, loadPathway } from '../../src/io/index.js';
import { oracleEmissionRun } from './coupled-ode-oracle.js';

const params = calibrate();
// The oracle's CH4 has one lifetime scheme for the whole run: compare with the constant lifetime (the
// lifetime from the join is checked by the CH4 pulse tests in run-emission-driven.test.ts).
const options: EmissionRunOptions = { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 }, ch4Lifetime: 'constant' };
const maxDifference = (a: ArrayLike<number>, b: ArrayLike<number>) => {
  let worst = 0;
  for (let k = 0; k < a.length; k++) worst = Math.max(worst, Math.abs(a[k] - b[k]));
  return worst;
};

// The production scheme (annual closed-form steps, runEmissionDriven) against its oracle (the same
// model integrated by odex with the feedback and lifetimes following the state continuously,
// coupled-ode-oracle.ts). Tolerances come from the scheme's approximations: the feedback frozen over
// each year (a lag of at most a year of its own change) and the temperature taken at year nodes
// (forcing linear between annual means) rather than averaged over the year; each bound is one year
// of the quantity's own largest change (common practice, no source). Measured figures in the README.
describe('production carbon scheme against the odex oracle', () => {
  for (const name of ['swift-emissions', 'delayed-emissions', 'steady-emissions']) {
    it(`${name}: emission totals, CO2 and warming follow the oracle over 1750-2150`, () => {
      const pathway = loadPathway(name);
      const run = runEmissionDriven(pathway, params, options);
      const oracle = oracleEmissionRun(pathway, params, options);
      const yearStep = (x: ArrayLike<number>) => {
        let step = 0;
        for (let k = 1; k < x.length; k++) step = Math.max(step, Math.abs(x[k] - x[k - 1]));
        return step;
      };
      expect(maxDifference(run.co2EmissionsGtco2, oracle.co2EmissionsGtco2)).toBeLessThan(yearStep(oracle.co2EmissionsGtco2));
      expect(maxDifference(run.co2Ppm, oracle.co2Ppm)).toBeLessThan(yearStep(oracle.co2Ppm));
      expect(maxDifference(run.co2YearEndPpm, oracle.co2YearEndPpm)).toBeLessThan(yearStep(oracle.co2YearEndPpm));
      expect(maxDifference(run.surfaceK, oracle.surfaceK)).toBeLessThan(yearStep(oracle.surfaceK));
    });
  }

  // 1 % (common practice, no source): a tenth of AR6's +/- 10 % on the 1850-2019 total; the
  // one-year lag of the feedback makes the production sinks a little stronger.
  it('the history: 1850-2019 diagnosed emissions and the 2010-2019 sink agree with the oracle to 1 %', () => {
    const history = loadHistory();
    const run = runEmissionDriven(history, params, options);
    const oracle = oracleEmissionRun(history, params, options);
    const at = (y: number) => y - history.years[0];
    const sum = (x: ArrayLike<number>) => {
      let s = 0;
      for (let y = 1850; y <= 2019; y++) s += x[at(y)];
      return s;
    };
    expect(Math.abs(sum(run.co2EmissionsGtco2) / sum(oracle.co2EmissionsGtco2) - 1)).toBeLessThan(0.01);
    const sink = (u: ArrayLike<number>) => (u[at(2019)] - u[at(2009)]) / 10;
    expect(Math.abs(sink(run.carbonBudget.uptakeGtc) / sink(oracle.uptakeGtc) - 1)).toBeLessThan(0.01);
  });
});

describe('annualCarbonStepInto mass balance', () => {
  it('emitted = atmospheric increase + uptake to 1e-9 relative over 400 years of varied emissions and warming (conservation of mass)', () => {
    const s = annualCarbonState();
    let worst = 0;
    for (let k = 0; k < 400; k++) {
      const e = 10 * Math.sin(k / 40) + 2; // Gt C yr-1, positive and negative
      annualCarbonStepInto(s, 0.01 * k, 0.8 + 0.4 * ((k % 7) / 7), e);
      const scale = Math.max(Math.abs(s.emittedGtc), Math.abs(s.uptakeGtc), Math.abs(atmosphericGtc(s)));
      worst = Math.max(worst, Math.abs(s.emittedGtc - atmosphericGtc(s) - s.uptakeGtc) / scale);
    }
    expect(worst).toBeLessThan(1e-9);
  });

  it('annualCarbonStepForIncreaseInto diagnoses the emission that gives the increase exactly, and keeps mass balance', () => {
    const s = annualCarbonState();
    for (let k = 0; k < 200; k++) {
      const before = atmosphericGtc(s);
      const increase = 2.124 * (0.02 * k);
      annualCarbonStepForIncreaseInto(s, 0.005 * k, 1, increase);
      expect(Math.abs(atmosphericGtc(s) - before - increase)).toBeLessThan(1e-9 * Math.max(1, Math.abs(before)));
    }
    expect(Math.abs(s.emittedGtc - atmosphericGtc(s) - s.uptakeGtc)).toBeLessThan(1e-9 * s.emittedGtc);
  });

  it('annualCarbonStepInto from equilibrium gives each box the closed-form solution of dR/dt = a E - R / (alpha tau) (Joos et al. 2013, Table 5 coefficients)', () => {
    // A 1-year constant emission of 1 Gt C, then none: box i holds a_i alpha tau_i (1 - e^{-1/(alpha tau_i)}) e^{-(t-1)/(alpha tau_i)}.
    const s = annualCarbonState();
    annualCarbonStepInto(s, 0, 1, 1);
    const alpha = s.alpha;
    const taus = [Infinity, 394.4, 36.54, 4.304];
    const a = [0.2173, 0.224, 0.2824, 0.2763];
    const expected = a.map((ai, i) => (taus[i] === Infinity ? ai : ai * alpha * taus[i] * (1 - Math.exp(-1 / (alpha * taus[i])))));
    for (let i = 0; i < 4; i++) expect(s.boxesGtc[i]).toBeCloseTo(expected[i], 14);
  });
});

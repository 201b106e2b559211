import { describe, expect, it } from 'vitest';
import { annualCarbonState, annualCarbonStepForIncreaseInto, annualCarbonStepInto, atmosphericGtc } from '../../src/carbon/annual-carbon-step.js';
import { runEmissionDriven } from '../../src/carbon/run-emission-driven.js';
import { calibrate } from '../../src/climate/calibrate.js';
import { runMembers } from '../../src/ensemble/run-members.js';
import { centralMember } from '../ensemble/central-member.js';
import { loadPathway } from '../../src/io/index.js';
import { ensembleInput } from '../../src/projection/ensemble-input.js';

const params = calibrate();

/** The annual-step run of a bundled emission pathway with the central parameters (ensemble member code). */
function annualRun(name: string) {
  const pathway = loadPathway(name);
  const { input } = ensembleInput(pathway, params);
  const co2Ppm = new Float64Array(pathway.years.length);
  const surfaceK = runMembers({ co2Formula: 'ar6', forcing: input.forcing.byAgent, carbon: input.carbon }, centralMember(params), undefined, co2Ppm);
  return { pathway, surfaceK, co2Ppm };
}

describe('annualCarbonStepInto', () => {
  for (const name of ['swift-emissions', 'delayed-emissions', 'steady-emissions']) {
    it(`${name}: annual steps follow the odex reference (runEmissionDriven) over 1750-2150`, () => {
      const { pathway, surfaceK, co2Ppm } = annualRun(name);
      const ref = runEmissionDriven(pathway, params, { forcing: { co2Formula: 'ar6' } });
      let dc = 0;
      let dt = 0;
      for (let k = 0; k < pathway.years.length; k++) {
        dc = Math.max(dc, Math.abs(co2Ppm[k] - ref.co2Ppm[k]));
        dt = Math.max(dt, Math.abs(surfaceK[k] - ref.surfaceK[k]));
      }
      // Tolerance from the scheme's one approximation, the feedback's time scales frozen over each
      // year (a one-year lag of the state): it cannot move the trajectory by more than one year of
      // its own change (common practice, no source). Measured: swift 0.09 ppm / 6e-4 K, delayed
      // 0.16 ppm / 9e-4 K, steady 0.87 ppm / 2.9e-3 K.
      let stepC = 0;
      let stepT = 0;
      for (let k = 1; k < pathway.years.length; k++) {
        stepC = Math.max(stepC, Math.abs(ref.co2Ppm[k] - ref.co2Ppm[k - 1]));
        stepT = Math.max(stepT, Math.abs(ref.surfaceK[k] - ref.surfaceK[k - 1]));
      }
      expect(dc).toBeLessThan(stepC);
      expect(dt).toBeLessThan(stepT);
    });
  }
});

describe('annualCarbonStepForIncreaseInto on the history', () => {
  it('diagnoses 1850-2019 emissions within one year of emissions of the odex reference, and the 5-95 % iIRF100 multipliers bracket the AR6 2390 Gt CO2 (from memory)', () => {
    const pathway = loadPathway('swift-emissions');
    const ref = runEmissionDriven(pathway, params, { forcing: { co2Formula: 'ar6' } });
    const c = pathway.series.co2_ppm!;
    const diagnosed = (scale: number) => {
      const s = annualCarbonState();
      let from = 0;
      let lastRate = 0;
      for (let k = 0; 1750 + k < 2019; k++) {
        if (1750 + k === 1850) from = s.emittedGtc;
        lastRate = annualCarbonStepForIncreaseInto(s, ref.surfaceK[k], scale, 2.124 * (c[k + 1] - c[k]));
      }
      return { gtco2: (s.emittedGtc - from) * 3.664, lastRateGtco2: lastRate * 3.664 };
    };
    const central = diagnosed(1);
    // One year's lag of the feedback moves the total by less than one year of emissions (common practice, no source).
    expect(Math.abs(central.gtco2 - ref.cumulativeCo2Gtco2[2019 - 1750])).toBeLessThan(central.lastRateGtco2);
    // AR6 WG1 SPM: 2390 ± 240 Gt CO2 for 1850-2019 (from memory). Measured: 2605 (x 0.765), 2258 (x 1), 1949 (x 1.235).
    expect(diagnosed(0.765).gtco2).toBeGreaterThan(2390);
    expect(diagnosed(1.235).gtco2).toBeLessThan(2390 - 240);
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

// Reference checks of the emission-driven model against IPCC AR6 WG1 carbon-cycle assessments:
// historical cumulative emissions, TCRE and the zero-emissions commitment. Default configuration
// (ECS 3 K, TCR 1.8 K, carbon-climate feedback on), figures reported, nothing tuned.
import { describe, expect, it } from 'vitest';
import { runEmissionDriven, type EmissionRunOptions, type EmissionRunResult } from '../../src/carbon/index.js';
import { calibrate } from '../../src/climate/index.js';
import { loadHistory } from '../../src/io/index.js';
import type { Pathway } from '../../src/pathway.js';
import { expectWithin } from '../asserts.js';
import { expectMassConserved } from '../carbon/mass-conserved.js';

const params = calibrate();
const options: EmissionRunOptions = { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 } };
const GTCO2_PER_GTC = 44.009 / 12.011;

function pathway(series: Pathway['series'], length: number, name: string): Pathway {
  const years = Float64Array.from({ length }, (_, i) => 1850 + i);
  return { name, years, series, metadata: {}, provenance: { source: name, notes: [] } };
}
const mean = (a: Float64Array, from: number, to: number) => a.slice(from, to + 1).reduce((s, v) => s + v, 0) / (to - from + 1);

describe('historical cumulative CO2 emissions diagnosed from the bundled history', () => {
  const history = loadHistory();
  const run = runEmissionDriven(history, params, options);
  const at = (year: number) => year - history.years[0];

  it('summed over the calendar years 1850-2019 they are within 2390 +/- 240 Gt CO2 (IPCC AR6 WG1 SPM; from memory)', () => {
    let sum = 0;
    for (let y = 1850; y <= 2019; y++) sum += run.co2EmissionsGtco2[at(y)];
    expectWithin(sum, 2390 - 240, 2390 + 240, 'sum of annual emissions');
  });

  it('cumulativeCo2Gtco2 at 2019 (the running sum of the rows from 1850) is within 2390 +/- 240 Gt CO2 (IPCC AR6 WG1 SPM)', () => {
    expectWithin(run.cumulativeCo2Gtco2[at(2019)], 2390 - 240, 2390 + 240, 'cumulative output');
    expectMassConserved(run);
  });
});

describe('TCRE in the 1 %/yr CO2 run with compatible emissions diagnosed', () => {
  const n = 141;
  const run = runEmissionDriven(pathway({ co2_ppm: Float64Array.from({ length: n }, (_, t) => 278.3 * 1.01 ** t) }, n, '1pctCO2'), params, options);
  // TCRE: warming at CO2 doubling (year 70; mean of years 61-80, as for TCR) per cumulative emission
  // to year 70 (IPCC AR6 WG1 Box 5.2 / glossary).
  let warming = 0;
  for (let k = 60; k < 80; k++) warming += 0.5 * (run.surfaceK[k] + run.surfaceK[k + 1]);
  warming /= 20;
  const tcrePerTtc = (1000 * warming) / run.carbonBudget.emittedGtc[70];

  it('is within the AR6 likely range 1.0-2.3 K per 1000 Pg C (IPCC AR6 WG1 SPM D.1.1; secondary source)', () => {
    expectWithin(tcrePerTtc, 1.0, 2.3, 'K per 1000 Pg C');
    expectMassConserved(run);
  });

  it('is within 0.27-0.63 K per 1000 Gt CO2 (the same range in CO2 mass)', () => {
    expectWithin(tcrePerTtc / GTCO2_PER_GTC, 0.27, 0.63, 'K per 1000 Gt CO2');
  });
});

describe('zero-emissions commitment (ZECMIP protocol, MacDougall et al. 2020, BG 17, 2987)', () => {
  // 1 %/yr CO2 with emissions diagnosed until 1000 Pg C have been emitted, then zero emissions.
  // ZEC50: mean warming over years 40-59 after cessation minus the 1 %/yr run's mean over the 20 years
  // centred on cessation (MacDougall et al. 2020, section 2; from memory).
  const n = 300;
  const ramp = Float64Array.from({ length: n }, (_, t) => 278.3 * 1.01 ** t);
  const onePercent = runEmissionDriven(pathway({ co2_ppm: ramp }, n, '1pctCO2'), params, options);
  const emitted = onePercent.carbonBudget.emittedGtc;
  // Cessation after the year whose end brings the emitted total closest to 1000 Pg C (the budget
  // holds each year's end).
  let stop = 1;
  const atStop = (k: number) => emitted[k];
  while (Math.abs(atStop(stop + 1) - 1000) < Math.abs(atStop(stop) - 1000)) stop++;
  const zero = runEmissionDriven(
    pathway({ co2_ppm: ramp.map((v, k) => (k <= stop ? v : NaN)), co2_gtco2: ramp.map((_, k) => (k <= stop ? NaN : 0)) }, n, 'esm-1pct-brch-1000PgC'),
    params,
    options,
  );
  const zec50 = mean(zero.surfaceK, stop + 40, stop + 59) - mean(onePercent.surfaceK, stop - 10, stop + 9);

  it('emits about 1000 Pg C in all and the concentration falls once emissions stop', () => {
    expectWithin(zero.carbonBudget.emittedGtc[n - 1], 990, 1010, 'cumulative Pg C');
    for (let k = stop + 2; k < n; k++) expect(zero.co2Ppm[k]).toBeLessThan(zero.co2Ppm[k - 1]);
    expectMassConserved(zero);
  });

  it('ZEC50 is within the AR6 likely range -0.3 to +0.3 K (IPCC AR6 WG1 SPM D.1.1; from memory)', () => {
    expectWithin(zec50, -0.3, 0.3, 'ZEC50 K');
  });

  it('ZEC50 is within the ZECMIP inter-model range -0.36 to +0.29 K (MacDougall et al. 2020, abstract)', () => {
    expectWithin(zec50, -0.36, 0.29, 'ZEC50 K');
  });
});

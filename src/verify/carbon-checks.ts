import { co2PulseResponse, pd100Background } from '../carbon/pulse-response.js';
import { runEmissionDriven } from '../carbon/run-emission-driven.js';
import type { EmissionRunOptions } from '../carbon/run-emission-driven.js';
import { calibrate } from '../climate/calibrate.js';
import { loadHistory } from '../io/bundled-pathways.js';
import type { Pathway } from '../pathway.js';
import { withinRange, type PublishedCheck } from './published-check.js';


/** Options for the emission-driven runs below: the AR6 best estimates ECS 3 K, TCR 1.8 K (calibrate's defaults), feedback on. */
function defaults(): { params: ReturnType<typeof calibrate>; options: EmissionRunOptions } {
  const params = calibrate();
  return { params, options: { forcing: { co2Formula: params.co2Formula, forcing2xWm2: params.forcing2xWm2 } } };
}

function pathwayFrom1850(series: Pathway['series'], length: number, name: string): Pathway {
  const years = Float64Array.from({ length }, (_, i) => 1850 + i);
  return { name, years, series, metadata: {}, provenance: { source: name, notes: [] } };
}

const mean = (a: Float64Array, from: number, to: number) => a.slice(from, to + 1).reduce((s, v) => s + v, 0) / (to - from + 1);

/**
 * The airborne fraction of a 100 Gt C pulse on a 389 ppm background (the PD100 protocol of Joos et
 * al. 2013, ACP 13, 2793: history to 2010, then 389 ppm; pulse in 2015), model with ECS 3 K, TCR 1.8 K and the
 * carbon-climate feedback, against the multi-model means ± spreads 0.60 ± 0.14 (20 yr), 0.41 ± 0.13
 * (100 yr), 0.25 ± 0.09 (1000 yr) (quoted by secondary sources).
 */
export const joosPulse: PublishedCheck = {
  id: 'joos-2013-pulse',
  run: () => {
    const background = pd100Background(loadHistory());
    const { params, options } = defaults();
    const r = co2PulseResponse(background, 2015, params, { ...options, feedback: true, pulseGtc: 100 });
    const source = 'Joos et al. 2013, ACP 13, 2793 (multi-model mean ± spread)';
    return [
      [20, 0.6, 0.14],
      [100, 0.41, 0.13],
      [1000, 0.25, 0.09],
    ].map(([y, m, s]) => withinRange(`airborne fraction ${y} yr after a 100 Gt C pulse on 389 ppm`, source, `${m} ± ${s}`, r.airborneFraction[y], +(m - s).toFixed(2), +(m + s).toFixed(2), '', 3));
  },
};

/**
 * Cumulative CO2 emissions 1850-2019 diagnosed by the ECS 3 K, TCR 1.8 K model from the bundled history's
 * concentrations (the carbon sinks the history implies), against 2390 ± 240 Gt CO2 (IPCC AR6 WG1
 * SPM; from memory).
 */
export const historicalEmissions: PublishedCheck = {
  id: 'historical-emissions',
  run: () => {
    const history = loadHistory();
    const { params, options } = defaults();
    const run = runEmissionDriven(history, params, options);
    const at = (year: number) => year - history.years[0];
    let sum = 0;
    for (let y = 1850; y <= 2019; y++) sum += run.co2EmissionsGtco2[at(y)];
    let recent = 0;
    for (let y = 2010; y <= 2019; y++) recent += run.co2EmissionsGtco2[at(y)] / 10;
    const uptake = run.carbonBudget.uptakeGtc;
    const sink = (uptake[at(2019)] - uptake[at(2009)]) / 10;
    const gcb = (parts: string) => `Global Carbon Budget 2010-2019, ${parts} (from memory)`;
    return [
      withinRange('cumulative CO2 emissions 1850-2019 diagnosed from the history (carbon sinks)', 'IPCC AR6 WG1 SPM (from memory)', '2390 ± 240', sum, 2150, 2630, 'Gt CO2', 0),
      withinRange('mean CO2 emissions 2010-2019 diagnosed from the history', gcb('fossil 9.6 + land use 1.6 Gt C yr-1'), '41.0', recent, 38, 44, 'Gt CO2 yr-1', 1),
      withinRange('land + ocean CO2 sink 2010-2019 (the model has no land/ocean split)', gcb('land 3.4 + ocean 2.5'), '5.9 ± 1.0', sink, 4.9, 6.9, 'Gt C yr-1', 2),
    ];
  },
};

/**
 * TCRE of the model with ECS 3 K, TCR 1.8 K: warming over years 61-80 of the 1 %/yr CO2 run per cumulative
 * emission to year 70 (IPCC AR6 WG1 Box 5.2), against the AR6 likely range 1.0-2.3 K per 1000 Pg C.
 */
export const tcre: PublishedCheck = {
  id: 'tcre',
  run: () => {
    const n = 141;
    const { params, options } = defaults();
    const run = runEmissionDriven(pathwayFrom1850({ co2_ppm: Float64Array.from({ length: n }, (_, t) => 278.3 * 1.01 ** t) }, n, '1pctCO2'), params, options);
    let warming = 0;
    for (let k = 60; k < 80; k++) warming += 0.5 * (run.surfaceK[k] + run.surfaceK[k + 1]);
    warming /= 20;
    const perTtc = (1000 * warming) / run.carbonBudget.emittedGtc[70];
    return [withinRange('TCRE, model with the AR6 best-estimate ECS 3 K and TCR 1.8 K (1 %/yr CO2, compatible emissions)', 'IPCC AR6 WG1 SPM D.1.1 (likely range)', '1.65 [1.0-2.3]', perTtc, 1.0, 2.3, 'K per 1000 Pg C', 2)];
  },
};

/**
 * The zero-emissions commitment 50 years after 1000 Pg C have been emitted along 1 %/yr CO2
 * (ZECMIP protocol, MacDougall et al. 2020, BG 17, 2987), model with ECS 3 K and TCR 1.8 K, against the AR6 likely
 * range -0.3 to +0.3 K (SPM D.1.1; from memory).
 */
export const zeroEmissionsCommitment: PublishedCheck = {
  id: 'zec50',
  run: () => {
    const n = 300;
    const { params, options } = defaults();
    const ramp = Float64Array.from({ length: n }, (_, t) => 278.3 * 1.01 ** t);
    const onePercent = runEmissionDriven(pathwayFrom1850({ co2_ppm: ramp }, n, '1pctCO2'), params, options);
    const emitted = onePercent.carbonBudget.emittedGtc;
    // The budget holds each calendar year's end: stop after the year that brings it closest to 1000 Pg C.
    const atStop = (k: number) => emitted[k];
    let stop = 1;
    while (Math.abs(atStop(stop + 1) - 1000) < Math.abs(atStop(stop) - 1000)) stop++;
    const zero = runEmissionDriven(
      pathwayFrom1850({ co2_ppm: ramp.map((v, k) => (k <= stop ? v : NaN)), co2_gtco2: ramp.map((_, k) => (k <= stop ? NaN : 0)) }, n, 'esm-1pct-brch-1000PgC'),
      params,
      options,
    );
    const zec50 = mean(zero.surfaceK, stop + 40, stop + 59) - mean(onePercent.surfaceK, stop - 10, stop + 9);
    return [withinRange('zero-emissions commitment ZEC50 after 1000 Pg C, model with ECS 3 K and TCR 1.8 K', 'IPCC AR6 WG1 SPM D.1.1 (likely range; from memory); MacDougall et al. 2020', 'about 0 [-0.3 to 0.3]', zec50, -0.3, 0.3, 'K', 3)];
  },
};

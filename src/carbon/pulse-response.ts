import type { ClimateParams } from '../climate/params.js';
import { ConfigError } from '../errors.js';
import type { Pathway } from '../pathway.js';
import { runEmissionDriven, type EmissionRunOptions } from './run-emission-driven.js';
import { GTC_PER_PPM, gtcToGtco2 } from './units.js';

/** Options of {@link co2PulseResponse}: the run options plus the size of the pulse. */
export interface PulseOptions extends EmissionRunOptions {
  /** Pulse size, Gt C (Joos et al. 2013 use 100). Default 100. */
  pulseGtc?: number;
}

/** Response to a CO2 emission pulse, from the pulse year on. */
export interface PulseResponse {
  /** Years since the pulse (0 at the pulse year). */
  yearsSincePulse: Float64Array;
  /** Extra atmospheric CO2 over the pulse, dimensionless (the impulse response function). */
  airborneFraction: Float64Array;
  /** Extra surface warming, K. */
  surfaceK: Float64Array;
  /** Extra CO2 concentration, ppm. */
  co2Ppm: Float64Array;
}

/**
 * The protocol of Joos et al. 2013, section 2.2: a background run follows a CO2 concentration
 * pathway with its emissions diagnosed; from the pulse year on, two emission-driven runs continue
 * from the same state, one with the diagnosed emissions and one with the pulse added. The impulse
 * response is their difference in atmospheric carbon over the pulse, so the small difference
 * between the background concentrations and the emission-driven reference cancels out.
 *
 * The pulse is added to the pulse year's emission total, so it is emitted evenly over that calendar
 * year (centred on its middle), and the response is read in annual means: year t after the pulse is
 * the mean over the calendar year whose middle is t years after the pulse's.
 *
 * @param background pathway with `co2_ppm` in every year (and any CH4, N2O and forcing columns,
 *   which both runs share)
 * @param pulseYear year of the pulse, after the first year and not after the last
 * @param params climate parameters
 * @param options run options and pulse size
 * @throws ConfigError when the pulse year is outside the pathway or the background lacks co2_ppm
 * @example
 * const r = co2PulseResponse(background389, 2015, calibrate(), { forcing: { co2Formula: 'ar6' } });
 * r.airborneFraction[20] // the share of the pulse still airborne 20 years on
 */
export function co2PulseResponse(background: Pathway, pulseYear: number, params: ClimateParams, options: PulseOptions): PulseResponse {
  const pulseGtc = options.pulseGtc ?? 100;
  const years = background.years;
  const n = years.length;
  const p = pulseYear - years[0];
  if (!(Number.isInteger(p) && p >= 1 && p < n)) {
    throw new ConfigError(`pulse year must be a year after ${years[0]} and not after ${years[n - 1]}, got ${pulseYear}`, 'pulseYear');
  }
  const ppm = background.series.co2_ppm;
  if (!ppm || ppm.some((v) => !Number.isFinite(v))) {
    throw new ConfigError(`${background.name}: the pulse background must give co2_ppm in every year`, 'pathway');
  }
  if (!(Number.isFinite(pulseGtc) && pulseGtc !== 0)) throw new ConfigError(`pulseGtc must be a non-zero number, got ${pulseGtc}`, 'pulseGtc');

  const control = runEmissionDriven(background, params, options);
  const continued = (extraGtcPerYr: number): Pathway => {
    const co2Ppm = ppm.map((v, k) => (k < p ? v : NaN));
    const co2Gtco2 = control.co2EmissionsGtco2.map((v, k) => (k < p ? NaN : v));
    co2Gtco2[p] += gtcToGtco2(extraGtcPerYr);
    return { ...background, series: { ...background.series, co2_ppm: co2Ppm, co2_gtco2: co2Gtco2 } };
  };
  const reference = runEmissionDriven(continued(0), params, options);
  const pulsed = runEmissionDriven(continued(pulseGtc), params, options);

  const m = n - p;
  const out: PulseResponse = {
    yearsSincePulse: new Float64Array(m),
    airborneFraction: new Float64Array(m),
    surfaceK: new Float64Array(m),
    co2Ppm: new Float64Array(m),
  };
  for (let t = 0; t < m; t++) {
    const dPpm = pulsed.co2Ppm[p + t] - reference.co2Ppm[p + t];
    out.yearsSincePulse[t] = t;
    out.co2Ppm[t] = dPpm;
    out.airborneFraction[t] = (dPpm * GTC_PER_PPM) / pulseGtc;
    out.surfaceK[t] = pulsed.surfaceK[p + t] - reference.surfaceK[p + t];
  }
  return out;
}

/**
 * The background of the Joos et al. 2013 PD100 experiment (section 2.2; from memory): the recorded
 * CO2 of `history` to 2010, then held at 389 ppm, to 1000 years after a pulse in 2015. Only CO2 is
 * given, so the other gases stay at their 1750 values.
 *
 * @param history the bundled history (loadHistory), whose co2_ppm is read
 * @returns a concentration pathway from the history's first year to 3015
 * @example co2PulseResponse(pd100Background(loadHistory()), 2015, calibrate(), { forcing: { co2Formula: 'ar6' }, pulseGtc: 100 })
 */
export function pd100Background(history: Pathway): Pathway {
  const first = history.years[0];
  const length = 2015 + 1000 - first + 1;
  const years = Float64Array.from({ length }, (_, i) => first + i);
  const recorded = history.series.co2_ppm!;
  const co2 = years.map((y) => (y <= 2010 ? recorded[y - first] : 389));
  return { name: 'PD100 background', years, series: { co2_ppm: co2 }, metadata: {}, provenance: { source: 'Joos et al. 2013 PD100 protocol', notes: [] } };
}

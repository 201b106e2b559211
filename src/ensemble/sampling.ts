import { CALIBRATION_DEFAULTS } from '../climate/params.js';
import { ConfigError } from '../errors.js';
import { normalRange, type AssessedRange } from './assessed-range.js';

/**
 * What an ensemble samples, and what it holds fixed. Each member draws ECS and TCR (jointly, through
 * a Gaussian copula with correlation `ecsTcrCorrelation` between their normal scores), a multiplier
 * on the CO2 formula's 2xCO2 forcing and a multiplier on the pathway's aerosol forcing, each from an
 * {@link AssessedRange}; the feedback is then lambda = F2x / ECS and the exchange coefficient gamma
 * is solved so that the member's own 1 %/yr CO2 run gives its TCR (as `calibrate` does).
 */
export interface EnsembleSampling {
  /** Equilibrium climate sensitivity, K. */
  ecsK: AssessedRange;
  /** Transient climate response, K. */
  tcrK: AssessedRange;
  /** Multiplier on the CO2 formula's own 2xCO2 ERF (1 = the formula as published, 3.934 W m-2 for ar6). */
  forcing2xScale: AssessedRange;
  /** Multiplier on the pathway's aerosol ERF series (1 = as given). */
  aerosolScale: AssessedRange;
  /**
   * Multiplier on the carbon cycle's pre-industrial iIRF100 r0 (Millar et al. 2017; 1 = 32.4 yr).
   * Drawn only by emission-driven ensembles.
   */
  irf100Scale: AssessedRange;
  /** Correlation of the normal scores of ECS and TCR, in (-1, 1). */
  ecsTcrCorrelation: number;
  /** Upper heat capacity C, W yr m-2 K-1, held fixed. */
  upperHeatCapacity: number;
  /** Deep-ocean heat capacity C_d, W yr m-2 K-1, held fixed. */
  deepHeatCapacity: number;
  /** Deep-ocean heat-uptake efficacy epsilon, held fixed. */
  deepEfficacy: number;
}

/**
 * The default sampling, matched to the IPCC AR6 WG1 assessments:
 * - ECS best 3 K, likely 2.5-4 K, very likely 2-5 K (AR6 WG1 SPM A.4.4 and chapter 7.5; confirmed).
 * - TCR best 1.8 K, likely 1.4-2.2 K, very likely 1.2-2.4 K (AR6 WG1 chapter 7.5; best estimate
 *   confirmed, ranges from memory).
 * - ERF of 2xCO2 3.93 ± 0.47 W m-2 (AR6 WG1 7.3.2.1; confirmed), read as a normal 5-95 % range (from
 *   memory), applied as a multiplier 1 ± 0.47 / 3.93 on the formula's own doubling forcing.
 * - Aerosol ERF 1750-2014 -1.3 [-2.0 to -0.6] W m-2 (AR6 WG1 7.3.3; best estimate confirmed, range from
 *   memory), read as a normal 5-95 % range and applied as a multiplier with median 1 and 5-95 %
 *   [0.6 / 1.3, 2.0 / 1.3] on the pathway's aerosol series. Its spread matches AR6 when the pathway's
 *   own 1750-2014 aerosol forcing is the AR6 best estimate.
 * - ECS-TCR correlation 0.64: the value at which the exchange coefficient gamma that calibration
 *   solves per member is uncorrelated (Spearman) with the feedback lambda. Ocean heat uptake and
 *   atmospheric feedbacks are separate processes, so this is the correlation the two-box model,
 *   calibrated member by member, implies when neither is allowed to inform the other (treating them
 *   as independent is an assumption: common practice, no source). Found by bisection on 100,000
 *   draws (0.6397, standard error about 0.003); test/ensemble/sample-members.test.ts re-checks it.
 * - Carbon cycle (emission-driven ensembles only): a multiplier on the pre-industrial iIRF100 r0 of
 *   Millar et al. 2017 with median 1 and 5-95 % 1 ± 12.3 / 52.4 (0.765-1.235), the relative spread
 *   across models of the 100-year time-integrated CO2 impulse response in Joos et al. 2013 (ACP 13,
 *   2793, Table 4: 52.4 ± 12.3 yr for the present-day 100 Gt C pulse, the ± read as a 5-95 % range;
 *   from memory). It is consistent with the same paper's AGWP100 range (92.7, 5-95 % 68-117 x 1e-15
 *   yr W m-2 kg-1, about ±26 %, which also holds the radiative-efficiency uncertainty). Applying the
 *   present-day relative spread to the pre-industrial r0 is an assumption (common practice, no
 *   source). It is drawn after every climate quantity, so concentration-driven ensembles draw
 *   exactly what they drew before it existed.
 * - Heat capacities and efficacy: the deterministic model's (CALIBRATION_DEFAULTS), held fixed;
 *   the spread of the ocean's response enters through gamma.
 */
export const AR6_SAMPLING: EnsembleSampling = {
  ecsK: { p05: 2, p17: 2.5, p50: 3, p83: 4, p95: 5 },
  tcrK: { p05: 1.2, p17: 1.4, p50: 1.8, p83: 2.2, p95: 2.4 },
  forcing2xScale: normalRange(1, 0.47 / 3.93),
  aerosolScale: normalRange(1, 0.7 / 1.3),
  irf100Scale: normalRange(1, 12.3 / 52.4),
  ecsTcrCorrelation: 0.64,
  upperHeatCapacity: CALIBRATION_DEFAULTS.upperHeatCapacity,
  deepHeatCapacity: CALIBRATION_DEFAULTS.deepHeatCapacity,
  deepEfficacy: CALIBRATION_DEFAULTS.deepEfficacy,
};

const RANGE_KEYS = ['ecsK', 'tcrK', 'forcing2xScale', 'aerosolScale', 'irf100Scale'] as const;
const FIXED_KEYS = ['upperHeatCapacity', 'deepHeatCapacity', 'deepEfficacy'] as const;

/**
 * Checks a sampling description once, before any member is drawn.
 * @throws ConfigError when a range is not finite and non-decreasing, the correlation is outside
 *   (-1, 1) or a fixed parameter is not positive
 */
export function validateSampling(s: EnsembleSampling): void {
  for (const key of RANGE_KEYS) {
    const r = s[key];
    const values = [r?.p05, r?.p17, r?.p50, r?.p83, r?.p95];
    if (!values.every((v) => typeof v === 'number' && Number.isFinite(v))) {
      throw new ConfigError(`sampling ${key} must give five finite percentiles p05, p17, p50, p83, p95`, `sampling.${key}`);
    }
    for (let i = 1; i < values.length; i++) {
      if (values[i]! < values[i - 1]!) {
        throw new ConfigError(`sampling ${key} percentiles must not decrease (p05 <= p17 <= p50 <= p83 <= p95), got ${values.join(', ')}`, `sampling.${key}`);
      }
    }
  }
  if (!(Number.isFinite(s.ecsTcrCorrelation) && s.ecsTcrCorrelation > -1 && s.ecsTcrCorrelation < 1)) {
    throw new ConfigError(`sampling ecsTcrCorrelation must be a number between -1 and 1 (exclusive), got ${s.ecsTcrCorrelation}`, 'sampling.ecsTcrCorrelation');
  }
  for (const key of FIXED_KEYS) {
    if (!(Number.isFinite(s[key]) && s[key] > 0)) throw new ConfigError(`sampling ${key} must be a positive number, got ${s[key]}`, `sampling.${key}`);
  }
}

/**
 * One line per sampled quantity, for the provenance of an output; the carbon-cycle multiplier only
 * when `carbon` (an emission-driven ensemble, the only kind that draws it).
 * @example describeSampling(AR6_SAMPLING)[0] // 'ECS: 2 / 2.5 / 3 / 4 / 5 K (5 / 17 / 50 / 83 / 95 %)'
 */
export function describeSampling(s: EnsembleSampling, carbon = false): string[] {
  const five = (r: AssessedRange, unit: string) => `${[r.p05, r.p17, r.p50, r.p83, r.p95].map((v) => +v.toPrecision(4)).join(' / ')}${unit} (5 / 17 / 50 / 83 / 95 %)`;
  return [
    `sampled ECS: ${five(s.ecsK, ' K')}`,
    `sampled TCR: ${five(s.tcrK, ' K')}`,
    `sampled 2xCO2 ERF multiplier: ${five(s.forcing2xScale, '')}`,
    `sampled aerosol ERF multiplier: ${five(s.aerosolScale, '')}`,
    ...(carbon ? [`sampled carbon-cycle pre-industrial iIRF100 multiplier: ${five(s.irf100Scale, '')}`] : []),
    `ECS-TCR normal-score correlation the draws aim at: ${s.ecsTcrCorrelation}`,
    `fixed for every member: upper heat capacity ${s.upperHeatCapacity}, deep heat capacity ${s.deepHeatCapacity} W yr m-2 K-1, deep efficacy ${s.deepEfficacy}; gamma solved per member from its TCR`,
  ];
}

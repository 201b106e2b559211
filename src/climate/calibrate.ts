import { ConfigError, NumericalError } from '../errors.js';
import { co2Forcing, forcingOfDoubling } from '../forcing/co2.js';
import { PREINDUSTRIAL } from '../forcing/constants.js';
import { findRoot } from '../numerics/find-root.js';
import { propagateTwoBoxInto } from './two-box-step.js';
import { CALIBRATION_DEFAULTS, PARAM_KEYS, type ClimateParams } from './params.js';
import type { TwoBoxParams } from './two-box.js';

/** Length of the idealised 1 %/yr CO2 run, years (CO2 doubles near year 70). */
const ONE_PERCENT_YEARS = 140;

/**
 * Forcing of the idealised 1 %/yr CO2 experiment, W m-2 at year nodes 0..years: CO2 = C0 x 1.01^t,
 * other gases at 1750 values, scaled so that 2xCO2 gives `forcing2xWm2`.
 */
export function onePercentForcing(formula: ClimateParams['co2Formula'], forcing2xWm2: number, years = ONE_PERCENT_YEARS): Float64Array {
  const scale = forcing2xWm2 / forcingOfDoubling(formula);
  const f = new Float64Array(years + 1);
  for (let t = 0; t <= years; t++) f[t] = scale * co2Forcing(formula, PREINDUSTRIAL.co2Ppm * 1.01 ** t, PREINDUSTRIAL.n2oPpb);
  return f;
}

/**
 * Transient climate response of a parameter set: mean surface warming over years 61-80 of the
 * 1 %/yr CO2 run, K (the standard definition, IPCC AR6 WG1 Box 7.1 / glossary).
 *
 * @example transientResponse(defaultParams()) // ≈ 1.8
 */
export function transientResponse(p: TwoBoxParams & Pick<ClimateParams, 'co2Formula' | 'forcing2xWm2'>): number {
  const f = onePercentForcing(p.co2Formula, p.forcing2xWm2);
  const t = new Float64Array(f.length);
  const d = new Float64Array(f.length);
  propagateTwoBoxInto(p, f, t, d);
  // Year 1 of the experiment ends at node 1; years 61-80 are the annual means around nodes 60.5-79.5,
  // taken as the mean of the node-centred averages (t[k] + t[k+1]) / 2 for k = 60..79.
  let sum = 0;
  for (let k = 60; k < 80; k++) sum += 0.5 * (t[k] + t[k + 1]);
  return sum / 20;
}

/**
 * Inputs of {@link calibrate}: the sensitivity targets, the fixed choices, and optionally explicit
 * physical parameters; any omitted take {@link CALIBRATION_DEFAULTS}.
 */
export type CalibrationTargets = Partial<ClimateParams>;

const POSITIVE_KEYS = ['ecsK', 'tcrK', 'upperHeatCapacity', 'deepHeatCapacity', 'deepEfficacy', 'forcing2xWm2'] as const;

/** Bracket for the exchange coefficient gamma, W m-2 K-1. */
const GAMMA_RANGE = [1e-6, 50] as const;

/**
 * Largest difference, K, between a sensitivity target and what the calibrated model achieves that
 * still counts as rounding (the root finder stops at 1e-12 W m-2 K-1 in gamma, a few 1e-13 K in
 * TCR); anything larger is a failed calibration. Common practice, no source.
 */
const TARGET_TOLERANCE_K = 1e-9;

/**
 * Derives a full parameter set from ECS and TCR: lambda = F2x / ECS (the equilibrium of the two-box
 * model is T = F / lambda), then gamma solved by Brent's method so that the model's own 1 %/yr CO2
 * run gives the TCR target. The returned `ecsK` and `tcrK` are the targets exactly as given (the
 * model is checked to reach them within 1e-9 K). A physical parameter given explicitly
 * (`feedbackWm2K`, `exchangeWm2K`) wins over the targets; the returned `ecsK` and `tcrK` are then
 * the values the resolved model actually has (F2x / lambda and its 1 %/yr-run TCR), or the targets
 * where it meets them within 1e-9 K (a calibrated parameter file read back).
 *
 * @param targets ECS, TCR, the fixed choices (heat capacities, efficacy, F2x, formula) and any
 *   explicit physical parameters
 * @returns the resolved parameters
 * @throws ConfigError when a value is unphysical (non-positive heat capacity, TCR >= ECS, ...) or
 *   no exchange coefficient in (0, 50] W m-2 K-1 reaches the TCR with these heat capacities
 * @throws NumericalError when the solved model misses a target by more than 1e-9 K
 * @example calibrate({ ecsK: 3, tcrK: 1.8 }).exchangeWm2K // ≈ 1.018
 */
export function calibrate(targets: CalibrationTargets = {}): ClimateParams {
  const co2Formula = targets.co2Formula ?? CALIBRATION_DEFAULTS.co2Formula;
  const base = {
    ecsK: targets.ecsK ?? CALIBRATION_DEFAULTS.ecsK,
    tcrK: targets.tcrK ?? CALIBRATION_DEFAULTS.tcrK,
    upperHeatCapacity: targets.upperHeatCapacity ?? CALIBRATION_DEFAULTS.upperHeatCapacity,
    deepHeatCapacity: targets.deepHeatCapacity ?? CALIBRATION_DEFAULTS.deepHeatCapacity,
    deepEfficacy: targets.deepEfficacy ?? CALIBRATION_DEFAULTS.deepEfficacy,
    forcing2xWm2: targets.forcing2xWm2 ?? forcingOfDoubling(co2Formula),
    co2Formula,
  };
  for (const key of POSITIVE_KEYS) {
    if (!(Number.isFinite(base[key]) && base[key] > 0)) {
      throw new ConfigError(`${PARAM_NAMES[key]} must be a positive number, got ${base[key]}`, PARAM_NAMES[key]);
    }
  }
  if (targets.feedbackWm2K !== undefined && !(Number.isFinite(targets.feedbackWm2K) && targets.feedbackWm2K > 0)) {
    throw new ConfigError(`feedback_wm2k must be a positive number (a stable climate), got ${targets.feedbackWm2K}`, 'feedback_wm2k');
  }
  if (targets.exchangeWm2K !== undefined && !(Number.isFinite(targets.exchangeWm2K) && targets.exchangeWm2K >= 0)) {
    throw new ConfigError(`exchange_wm2k must be a number >= 0, got ${targets.exchangeWm2K}`, 'exchange_wm2k');
  }
  const feedbackWm2K = targets.feedbackWm2K ?? base.forcing2xWm2 / base.ecsK;
  const withExchange = (exchangeWm2K: number): ClimateParams => ({ ...base, feedbackWm2K, exchangeWm2K });
  const resolved = (exchangeWm2K: number): ClimateParams => {
    const p = withExchange(exchangeWm2K);
    return { ...p, ecsK: p.forcing2xWm2 / p.feedbackWm2K, tcrK: transientResponse(p) };
  };
  if (targets.exchangeWm2K !== undefined) {
    // Explicit physics wins; targets it meets to rounding (a calibrated file read back) stay as written.
    const p = resolved(targets.exchangeWm2K);
    return { ...p, ecsK: nearTarget(p.ecsK, targets.ecsK), tcrK: nearTarget(p.tcrK, targets.tcrK) };
  }
  const ecsK = base.forcing2xWm2 / feedbackWm2K;
  if (!(base.tcrK < ecsK)) {
    throw new ConfigError(`tcr_k (${base.tcrK} K) must be below ecs_k (${ecsK} K): the transient response cannot exceed the equilibrium`, 'tcr_k');
  }
  const tcrAt = (gamma: number) => transientResponse(withExchange(gamma)) - base.tcrK;
  const [gammaMin, gammaMax] = GAMMA_RANGE;
  const atMin = tcrAt(gammaMin);
  const atMax = tcrAt(gammaMax);
  if (atMin < 0) {
    throw new ConfigError(
      `tcr_k ${base.tcrK} K is out of reach: with ECS ${ecsK.toFixed(3)} K and an upper heat capacity of ${base.upperHeatCapacity} W yr m-2 K-1 the largest TCR is ${(atMin + base.tcrK).toFixed(3)} K; lower upper_heat_capacity or raise ecs_k`,
      'tcr_k',
    );
  }
  if (atMax > 0) {
    throw new ConfigError(
      `tcr_k ${base.tcrK} K is out of reach: even an exchange of ${gammaMax} W m-2 K-1 gives ${(atMax + base.tcrK).toFixed(3)} K; raise deep_heat_capacity or tcr_k`,
      'tcr_k',
    );
  }
  const achieved = resolved(findRoot(tcrAt, gammaMin, gammaMax, 1e-12));
  // TCR, and ECS unless an explicit feedback made it a result, are targets the model was solved for:
  // report them as asked (no 1.8000000000000604), after checking the model reaches them.
  return {
    ...achieved,
    ecsK: targets.feedbackWm2K === undefined ? metTarget('ecs_k', achieved.ecsK, base.ecsK) : nearTarget(achieved.ecsK, targets.ecsK),
    tcrK: metTarget('tcr_k', achieved.tcrK, base.tcrK),
  };
}

/**
 * A target the calibration solved for, once the model is checked to reach it.
 *
 * @param name JSON key, for the message
 * @param achievedK what the calibrated model gives, K
 * @param targetK what was asked, K
 * @returns `targetK` exactly
 * @throws NumericalError when the model misses it by more than {@link TARGET_TOLERANCE_K}
 */
function metTarget(name: string, achievedK: number, targetK: number): number {
  if (!(Math.abs(achievedK - targetK) <= TARGET_TOLERANCE_K)) {
    throw new NumericalError(
      `calibration failed: the solved model gives ${name} ${achievedK} K, not the target ${targetK} K ` +
        `(more than ${TARGET_TOLERANCE_K} K off); please report this with the parameters used`,
      'numerical.calibration',
    );
  }
  return targetK;
}

/** The target when the model meets it to rounding, else what the model gives (explicit physics won). */
function nearTarget(achievedK: number, targetK: number | undefined): number {
  return targetK !== undefined && Math.abs(achievedK - targetK) <= TARGET_TOLERANCE_K ? targetK : achievedK;
}

/** JSON key of each parameter, for messages that name what the user wrote. */
const PARAM_NAMES = Object.fromEntries(Object.entries(PARAM_KEYS).map(([json, field]) => [field, json])) as Record<keyof ClimateParams, string>;

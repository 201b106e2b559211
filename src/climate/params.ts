import type { Co2Formula } from '../forcing/co2.js';

/**
 * Parameters of the two-box energy balance model (Held et al. 2010; Geoffroy et al. 2013a,b),
 * with the sensitivity targets they were calibrated to. JSON keys are the snake_case names of
 * DESIGN.md; this is the resolved, complete set.
 */
export interface ClimateParams {
  /** Equilibrium climate sensitivity target, K (informational once the physics is fixed). */
  ecsK: number;
  /** Transient climate response target, K. */
  tcrK: number;
  /** Upper (mixed layer + atmosphere) heat capacity C, W yr m-2 K-1. */
  upperHeatCapacity: number;
  /** Deep-ocean heat capacity C_d, W yr m-2 K-1. */
  deepHeatCapacity: number;
  /** Climate feedback parameter lambda (positive = stabilising), W m-2 K-1. */
  feedbackWm2K: number;
  /** Heat exchange coefficient gamma between the boxes, W m-2 K-1. */
  exchangeWm2K: number;
  /** Deep-ocean heat-uptake efficacy epsilon, dimensionless. */
  deepEfficacy: number;
  /** ERF of doubled CO2 used for lambda = F2x / ECS and to scale CO2 forcing, W m-2. */
  forcing2xWm2: number;
  /** CO2 forcing expression. */
  co2Formula: Co2Formula;
}

/** The JSON form read by `--params` and printed by `warmcast calibrate` (DESIGN.md key names). */
export interface ClimateParamsJson {
  ecs_k?: number;
  tcr_k?: number;
  upper_heat_capacity?: number;
  deep_heat_capacity?: number;
  feedback_wm2k?: number;
  exchange_wm2k?: number;
  deep_efficacy?: number;
  forcing_2x_wm2?: number;
  co2_formula?: Co2Formula;
}

/** Mapping from JSON keys to {@link ClimateParams} fields. */
export const PARAM_KEYS = {
  ecs_k: 'ecsK',
  tcr_k: 'tcrK',
  upper_heat_capacity: 'upperHeatCapacity',
  deep_heat_capacity: 'deepHeatCapacity',
  feedback_wm2k: 'feedbackWm2K',
  exchange_wm2k: 'exchangeWm2K',
  deep_efficacy: 'deepEfficacy',
  forcing_2x_wm2: 'forcing2xWm2',
  co2_formula: 'co2Formula',
} as const satisfies Record<keyof ClimateParamsJson, keyof ClimateParams>;

/**
 * Fixed choices behind the default calibration, each with its source.
 * - ECS 3.0 K and TCR 1.8 K: IPCC AR6 WG1 best estimates (ECS confirmed, TCR confirmed).
 * - Upper heat capacity 8 W yr m-2 K-1: a mixed layer of about 87 m over the 71 % ocean fraction
 *   (1025 kg m-3 x 3990 J kg-1 K-1 x 87 m x 0.71 / 3.156e7 s yr-1 = 8.0); close to the CMIP5 mean
 *   of Geoffroy et al. 2013a, Table 4 (about 7-8, from memory).
 * - Deep heat capacity 100 W yr m-2 K-1: of the order of the CMIP5 mean in Geoffroy et al. 2013a
 *   (about 100-110, from memory).
 * - Deep-ocean efficacy 1.0: the plain two-box model of Held et al. 2010; set it above 1 (CMIP5 mean
 *   about 1.3, Geoffroy et al. 2013b, from memory) to represent the pattern effect.
 * - lambda = F2x / ECS; gamma solved so the model's 1 %/yr CO2 run gives the TCR target.
 */
export const CALIBRATION_DEFAULTS = {
  ecsK: 3.0,
  tcrK: 1.8,
  upperHeatCapacity: 8.0,
  deepHeatCapacity: 100.0,
  deepEfficacy: 1.0,
  co2Formula: 'ar6' as Co2Formula,
} as const;

/**
 * The parameters as the JSON `--params` reads and `warmcast calibrate` prints (DESIGN.md keys).
 * @example paramsToJson(calibrate()).ecs_k // 3
 */
export function paramsToJson(p: ClimateParams): Required<ClimateParamsJson> {
  return {
    ecs_k: p.ecsK,
    tcr_k: p.tcrK,
    upper_heat_capacity: p.upperHeatCapacity,
    deep_heat_capacity: p.deepHeatCapacity,
    feedback_wm2k: p.feedbackWm2K,
    exchange_wm2k: p.exchangeWm2K,
    deep_efficacy: p.deepEfficacy,
    forcing_2x_wm2: p.forcing2xWm2,
    co2_formula: p.co2Formula,
  };
}

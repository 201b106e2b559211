/**
 * The carbon layer: emissions -> concentrations. CO2 boxes with a carbon-climate feedback on uptake,
 * single-lifetime CH4 and N2O mass balances, and the emission-driven run that steps them with the
 * two-box energy balance one calendar year at a time (the production scheme; the continuous coupled
 * model integrated by odex is its test oracle).
 */
export { co2ImpulseResponse, CO2_BOX_COUNT, integratedImpulseResponse, integratedImpulseResponseSlope, JOOS_2013 } from './co2-impulse-response.js';
export { COUPLED_STATE, coupledModel } from './coupled-model.js';
export type { CoupledModel, CoupledModelSpec, GasStepInput } from './coupled-model.js';
export { diagnoseEmissions } from './diagnose-emissions.js';
export type { DiagnosedEmissions } from './diagnose-emissions.js';
export {
  CH4_CYCLE,
  ch4CycleFromJoin,
  gasEmissionsForTendency,
  gasLifetimeYr,
  gasSinkMt,
  gasTendencyPpbPerYr,
  N2O_CYCLE,
  withConstantLifetime,
} from './gas-cycle.js';
export type { GasCycle } from './gas-cycle.js';
export { co2PulseResponse } from './pulse-response.js';
export type { PulseOptions, PulseResponse } from './pulse-response.js';
export { runEmissionDriven } from './run-emission-driven.js';
export type { CarbonBudget, EmissionRunOptions, EmissionRunResult } from './run-emission-driven.js';
export {
  GTC_PER_PPM,
  GTCO2_PER_GTC,
  gtcToGtco2,
  gtcToPpm,
  gtco2ToGtc,
  MOLAR_MASS,
  MT_CH4_PER_PPB,
  MT_N2O_PER_PPB,
  MT_N_PER_PPB_N2O,
  mtCh4ToPpb,
  mtN2oToPpb,
  ppbToMtCh4,
  ppbToMtN2o,
  ppmToGtc,
} from './units.js';
export { CARBON_CYCLE, irf100Target, MILLAR_2017, uptakeTimescaleScaling } from './uptake-feedback.js';
export type { CarbonCycleParams } from './uptake-feedback.js';
export { annualCarbonState, annualCarbonStepForIncreaseInto, annualCarbonStepInto, annualTimescaleScaling, atmosphericGtc, resetAnnualCarbonState } from './annual-carbon-step.js';
export { gasYear } from './annual-gas-step.js';
export type { GasYear } from './annual-gas-step.js';
export { co2YearDrivers, co2YearInto } from './co2-year.js';
export type { Co2YearDrivers } from './co2-year.js';
export { CARBON_TARGETS, carbonRecordFigures, fitCarbonCycle } from './fit-carbon-cycle.js';
export type { CarbonCycleFit, CarbonRecordFigures } from './fit-carbon-cycle.js';
export { JOIN_TREND_YEARS, yearStartConcentrations } from './year-start-concentrations.js';
export type { AnnualCarbonState } from './annual-carbon-step.js';
export { halogenAnomalyPpt, halogenEmissionsKt, halogenForcingWm2, ktPerPpt } from './halogen-cycle.js';
export { HALOGEN_PRESENT_DAY, HALOGEN_PRESENT_DAY_YEAR } from './halogen-present-day.js';
export { HALOGEN_COLUMNS, HALOGEN_SPECIES } from './halogen-species.js';
export type { HalogenColumn, HalogenSpecies } from './halogen-species.js';

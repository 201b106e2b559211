export { AEROSOL_AGENTS, FORCING_AGENTS, GAS_FORCING_AGENTS, PRESCRIBED_FORCING_AGENTS, agentColumn, forcingByAgent, ghgForcingFunction } from './agents.js';
export type { ForcingAgent, ForcingInputs, ForcingOptions, ForcingSeries, GhgForcing } from './agents.js';
export { ch4ErfAr6 } from './ch4.js';
export { co2ErfAr6, co2Forcing, co2ForcingLog, co2SarfMeinshausen, forcingOfDoubling } from './co2.js';
export type { Co2Formula } from './co2.js';
export { AR6_ERF_OVER_SARF, MEINSHAUSEN_2020, MYHRE_1998_CO2_COEFFICIENT, PREINDUSTRIAL } from './constants.js';
export { AR6_2019_ERF_WM2, LUMPED_PARTS, forcingColumnsNotGiven, lumpedShare, splitLumpedForcing } from './lumped-forcing.js';
export { n2oErfAr6 } from './n2o.js';
export { NATURAL_BACKGROUND_WM2, NATURAL_BACKGROUND_YEARS } from './natural-background.js';

export { PROJECTION_COLUMNS, projectPathway, rebase } from './project-pathway.js';
export type { Projection, ProjectionOptions } from './project-pathway.js';
export { ensembleInput } from './ensemble-input.js';
export { AR6_ENERGY_BUDGET, EARTH_AREA_M2, OCEAN_SHARE_OF_HEAT_GAIN, energyBudget, energyBudgetNote } from './energy-budget.js';
export type { EnergyBudget } from './energy-budget.js';

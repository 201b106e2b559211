export { PROJECTION_COLUMNS, projectPathway, rebase } from './project-pathway.js';
export type { Projection, ProjectionOptions } from './project-pathway.js';
export { ensembleInput } from './ensemble-input.js';
export { attributePathway } from './attribute-pathway.js';
export type { AttributedProjection } from './attribute-pathway.js';

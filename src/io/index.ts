/**
 * The io layer: reading and validating pathway files, putting them on the annual grid, splicing them
 * onto the bundled history, and writing files atomically (the formats themselves are report/'s writers). Only this folder
 * and `cli/` touch the file system.
 */
export { parsePathway, type ParsedPathway } from './parse-pathway.js';
export { VALUE_BOUNDS, type ValueBounds } from './value-bounds.js';
export { isoDateToYear, type IsoDateYear } from './iso-date-year.js';
export { editDistance, nearestName } from './nearest-name.js';
export { describeTimeSteps } from './time-steps.js';
export { toAnnual } from './to-annual.js';
export { spliceOntoHistory } from './splice-onto-history.js';
export { readTextFile, MAX_PATHWAY_BYTES } from './read-text-file.js';
export {
  bundledPathwaysDir,
  bundledPathwayNames,
  listBundledPathways,
  loadHistory,
  type BundledPathway,
} from './bundled-pathways.js';
export { loadPathway, readPathway, type LoadPathwayOptions, type ReadPathwayResult } from './load-pathway.js';
export { describePathway } from './describe-pathway.js';
export { loadObservedRecord, HADCRUT5_CITATION, type ObservedRecord } from './observed-record.js';
export { writeFileAtomic, writeFilesAtomic, type FileToWrite, type WriteFileAtomicOptions } from './write-file-atomic.js';
export { parseParams, PARAMS_FILE_KEYS } from './read-params.js';
export { pathwayFromParsed } from './load-pathway.js';
export { isScenarioTable, readScenarioTable, scenarioPathway, selectScenario, type ScenarioChoice } from './iamc-read.js';
export { readIamcTable, IAMC_ID_COLUMNS, IAMC_REGION, type IamcScenario, type IamcTable } from './iamc-table.js';
export { csvSheet, xlsxSheets, type IamcSheet, type SheetCell } from './iamc-sheets.js';
export { iamcVariable, IAMC_VARIABLES, type IamcVariable } from './iamc-variables.js';
export { emissionUnitFactor, knownUnits, SPECIES_RATIO, type EmissionUnitTarget, type UnitReading } from './iamc-units.js';
export { describeScenarioTable } from './iamc-describe.js';
export { pathwayCoverage, type PathwayCoverage } from './iamc-coverage.js';
export { describeAgentSources } from './describe-agent-sources.js';

export { closeTo, VERIFICATION_COLUMNS, withinRange } from './published-check.js';
export type { PublishedCheck, VerificationRow } from './published-check.js';
export { PUBLISHED_CHECKS, runPublishedChecks } from './registry.js';

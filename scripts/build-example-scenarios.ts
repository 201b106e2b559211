// Writes pathways/examples/invented-scenarios.csv: 50 invented scenarios (three invented models, six
// storyline families) in the IAMC wide layout, the example `warmcast batch` assesses. Deterministic:
// running it again gives the same file.
//
// Try: npm run build && node dist/scripts/build-example-scenarios.js
import { writeFileSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { inventedScenarioSet, inventedTableCsv } from './invented-scenarios.js';

const root = join(dirname(fileURLToPath(import.meta.url)), '..', '..');
const out = join(root, 'pathways', 'examples', 'invented-scenarios.csv');
writeFileSync(
  out,
  inventedTableCsv(inventedScenarioSet(50), [
    'Invented scenarios for warmcast examples (scripts/build-example-scenarios.ts, seed 2026): not published scenarios, not forecasts.',
    'IAMC layout: Model, Scenario, Region, Variable, Unit, one column per year; emissions per year in the units of the Unit column.',
  ]),
);
console.log(`wrote ${out}`);

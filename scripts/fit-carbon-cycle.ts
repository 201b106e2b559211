/**
 * Fits warmcast's default carbon cycle to published totals and writes the result to
 * src/carbon/fitted-carbon-cycle.ts.
 *
 * What it does: runs the production carbon scheme (runEmissionDriven) on the bundled concentration
 * history (pathways/history.csv) with the central climate parameters, diagnosing the CO2 emitted in
 * each calendar year, and chooses the uptake coefficient rC of the Millar et al. 2017 feedback
 * (iIRF100 = r0 + rC x cumulative uptake + rT x warming) so that the diagnosed emissions sum to
 * AR6's 2390 +/- 240 Gt CO2 over 1850-2019 and average the Global Carbon Budget's 41.0 +/- 3 Gt CO2
 * per year over 2010-2019 (fitCarbonCycle: weighted least squares, golden-section search, no
 * randomness). It prints the figures with Millar et al.'s published rC and with the fitted one,
 * including the land + ocean sink against the budget's 5.9 Gt C per year.
 *
 * Deterministic: the same history and code always write the same bytes; a test regenerates the
 * module and compares. Rerun it whenever the history or the carbon scheme changes.
 *
 * Usage: node dist/scripts/fit-carbon-cycle.js [output.ts]   (default: src/carbon/fitted-carbon-cycle.ts
 * under the current directory)
 */
import { writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { CARBON_TARGETS, fitCarbonCycle, fittedCarbonCycleModule, type CarbonRecordFigures } from '../src/carbon/fit-carbon-cycle.js';
import { calibrate } from '../src/climate/index.js';
import { loadHistory } from '../src/io/index.js';

const output = resolve(process.argv[2] ?? 'src/carbon/fitted-carbon-cycle.ts');
const fit = fitCarbonCycle(loadHistory(), calibrate());
writeFileSync(output, fittedCarbonCycleModule(fit));

const t = CARBON_TARGETS;
const show = (label: string, f: CarbonRecordFigures) =>
  console.log(
    `${label.padEnd(30)} 1850-2019 ${f.cumulative1850to2019Gtco2.toFixed(0)} Gt CO2 | 2010-2019 ${f.mean2010to2019Gtco2PerYr.toFixed(2)} Gt CO2/yr | `
      + `sink ${f.sink2010to2019GtcPerYr.toFixed(2)} Gt C/yr | last year ${f.lastYearGtco2.toFixed(2)} Gt CO2`,
  );
console.log(`targets: 1850-2019 ${t.cumulative1850to2019Gtco2.value} +/- ${t.cumulative1850to2019Gtco2.sigma} Gt CO2 (AR6 WG1 SPM); `
  + `2010-2019 ${t.mean2010to2019Gtco2PerYr.value.toFixed(2)} +/- ${t.mean2010to2019Gtco2PerYr.sigma} Gt CO2/yr; sink ${t.sink2010to2019GtcPerYr} Gt C/yr (GCB, check only)`);
show('Millar et al. 2017 (rC 0.019)', fit.before);
show(`fitted (rC ${fit.cycle.rUptakeYrPerGtc})`, fit.after);
console.log(`chi-square ${fit.chiSquare.toFixed(3)}; wrote ${output}`);

// Try: npx tsc -p tsconfig.build.json && node dist/scripts/fit-carbon-cycle.js

// Shows how fast `warmcast batch` assesses a scenario set: 100 invented scenarios (IAMC layout,
// emission-driven, spliced onto the history so each runs 1750-2100) x 600 members, read, run and
// summarised exactly as the command does (without writing files). Reports scenario-members per
// second of wall time and of CPU time, and the projected wall time for 1,000 scenarios x 600
// members (target: under 3 minutes on a 2-core machine). Wall time depends on what else the machine
// runs: the load average is printed beside it, and CPU time per scenario-member is the steadier figure.
// The category bootstrap (category_agreement, part of every row) is also timed alone on the same
// number of 600-member scenarios, as a share of the batch's CPU time (target: under 10 %).
//
// Try: npm run bench:batch             (or: node dist/scripts/bench-batch.js --scenarios 20 --workers 1)
import { availableParallelism, loadavg } from 'node:os';
import { performance } from 'node:perf_hooks';
import { categoryAgreement, categoryBootstrapRandom, CATEGORY_RESAMPLES } from '../src/batch/category-agreement.js';
import { runBatch } from '../src/batch/run-batch.js';
import { calibrate } from '../src/climate/calibrate.js';
import { batchScenario } from '../src/cli/batch-scenario.js';
import { runBatchThreads } from '../src/cli/batch-threads.js';
import { memberSource } from '../src/cli/member-source.js';
import { scenarioPathway } from '../src/io/iamc-read.js';
import { csvSheet } from '../src/io/iamc-sheets.js';
import { readIamcTable } from '../src/io/iamc-table.js';
import { inventedScenarioSet, inventedTableCsv } from './invented-scenarios.js';

function option(name: string, fallback: number): number {
  const i = process.argv.indexOf(name);
  return i >= 0 ? Number(process.argv[i + 1]) : fallback;
}

const scenarioCount = option('--scenarios', 100);
const members = option('--members', 600);
const workers = option('--workers', availableParallelism());

const wall0 = performance.now();
const cpu0 = process.cpuUsage();
const table = readIamcTable('bench.csv', [csvSheet(inventedTableCsv(inventedScenarioSet(scenarioCount)), 'bench.csv')]);
const options = { params: calibrate({}), members, seed: 1, thresholds: [1.5, 2], baseline: [1850, 1900] as [number, number] };
const outcome = await runBatchThreads(table.scenarios, 0, table.scenarios.length, { ...options, prior: false, load: {}, threads: workers });
if (outcome.errors.length > 0) throw new Error(`${outcome.errors.length} invented scenarios failed: ${outcome.errors[0].problems[0].message}`);
const wallS = (performance.now() - wall0) / 1000;
const cpu = process.cpuUsage(cpu0);
const cpuS = (cpu.user + cpu.system) / 1e6;
const done = scenarioCount * members;
const perWall = done / wallS;
const perCpu = done / cpuS;
const target = 1000 * 600;
const years = scenarioPathway(table.scenarios[0]).pathway.years.length;

// The threads change nothing: the first three rows again, in this thread alone.
const alone = await runBatch(table.scenarios.slice(0, 3).map((s, i) => batchScenario(s, i, {})), { ...options, source: memberSource(false) });
if (JSON.stringify(alone.rows) !== JSON.stringify(outcome.rows.slice(0, 3))) throw new Error('rows from threads differ from rows run in one thread');
console.log(`${scenarioCount} scenarios x ${members} members, ${years} years each (emission-driven), ${workers} thread${workers === 1 ? '' : 's'}; load average ${loadavg()[0].toFixed(1)} on ${availableParallelism()} cores`);
console.log(`wall ${wallS.toFixed(1)} s: ${perWall.toFixed(0)} scenario-members/s; projected 1,000 x 600: ${(target / perWall).toFixed(0)} s`);
console.log(`CPU ${cpuS.toFixed(1)} s: ${perCpu.toFixed(0)} scenario-members per CPU-second; 1,000 x 600 is ${(target / perCpu).toFixed(0)} CPU-s, ${(target / perCpu / availableParallelism()).toFixed(0)} s on ${availableParallelism()} idle cores`);

// The bootstrap alone, on members whose peaks straddle 2 K (every category test runs on each resample).
const peak = Float64Array.from({ length: members }, (_, i) => 1.6 + (0.8 * i) / members);
const end = Float64Array.from(peak, (p) => p - 0.2);
const boot0 = process.cpuUsage();
for (let s = 0; s < scenarioCount; s++) categoryAgreement(peak, end, 'C4', CATEGORY_RESAMPLES, categoryBootstrapRandom(s));
const bootCpu = process.cpuUsage(boot0);
const bootS = (bootCpu.user + bootCpu.system) / 1e6;
console.log(`category bootstrap (${CATEGORY_RESAMPLES} resamples per scenario): ${bootS.toFixed(2)} CPU-s for ${scenarioCount} scenarios, ${((100 * bootS) / cpuS).toFixed(1)} % of the batch's CPU time (target: under 10 %)`);

/**
 * Benchmark of `warmcast budget`'s default: remaining CO2 budgets for 1.5, 1.7 and 2 K at 50, 67 and
 * 83 % from every member of the calibrated set once, in order (carbonBudget with calibratedSetInOrder,
 * the bundled budget-non-co2 path). Each member runs its carbon cycle and two-box model about a dozen
 * times (two bracket ends, a few regula falsi steps per limit, one run for the assumptions), so the
 * time is members x runs per member x one run's time.
 *
 * Printed: the wall time of the whole set and of its first 500 members, milliseconds per member for
 * each (equal when the cost is linear in the members), and the budgets, so a faster search can be
 * checked to give the same numbers (to the 0.5 Gt CO2 each member's budget is found to).
 *
 * Try: npm run build && node dist/scripts/bench-budget.js
 */
import { performance } from 'node:perf_hooks';
import { calibrate } from '../src/climate/index.js';
import { calibratedSetInOrder, representativeParams } from '../src/ensemble/calibrated-set.js';
import { readCalibratedSet } from '../src/io/read-calibrated-set.js';
import { readPathway } from '../src/io/load-pathway.js';
import { carbonBudget } from '../src/projection/carbon-budget.js';

const set = readCalibratedSet();
// The central parameters `warmcast budget` uses: the calibrated set's representative member.
const { targets, forcingScale } = representativeParams(set);
const params = calibrate(targets);
const nonCo2 = readPathway('budget-non-co2').pathway;
const source = calibratedSetInOrder(set);

for (const members of [500, set.count]) {
  const t0 = performance.now();
  const r = carbonBudget(nonCo2, { limits: [1.5, 1.7, 2], chances: [0.5, 0.67, 0.83], members, seed: 1, params, forcingScale, source, resampled: members < set.count });
  const seconds = (performance.now() - t0) / 1000;
  const budgets = r.rows.map((x) => `${x.limitK} K ${Math.round(x.chance * 100)} %: ${x.met ? Math.round(x.budgetGtco2) : 'not possible'}`).join(', ');
  console.log(`${members} members: ${seconds.toFixed(1)} s, ${((1000 * seconds) / members).toFixed(2)} ms per member`);
  console.log(`  ${budgets}`);
}

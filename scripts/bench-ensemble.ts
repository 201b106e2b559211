// Shows how fast parameter ensembles run: 10,000 members over 1750-2300 for one pathway (the bundled
// "swift" pathway on the bundled history, held at its 2150 values to 2300), reported as member-years
// per second for
//   (a) the full ensemble path, runEnsemble as `warmcast ensemble` calls it (sampling, calibration of
//       gamma per member, member runs, percentiles and exceedance statistics), first call in the
//       process (cold, as the command runs) and best of three further calls (warm), and on 1 and 2
//       worker threads;
//   (b) the bare propagator kernel, propagateTwoBoxInto over the same members' prebuilt propagators,
//       in this process, single-threaded (and, for comparison, with the matrix-exponential
//       twoBoxPropagator built per member);
//   (c) the odex path (energyBalance 'odex') on 100 of the members;
// and the ratio a/b, with where the time of (a) goes on one thread: solving gamma alone, sampling
// (which includes it), the member runs (sampling included), and the summary statistics. Worker threads need the compiled build, so run it from dist/.
import { availableParallelism } from 'node:os';
import { energyBalance } from '../src/climate/energy-balance.js';
import { propagateTwoBoxInto, twoBoxPropagator } from '../src/climate/exact-propagator.js';
import type { TwoBoxParams } from '../src/climate/two-box.js';
import {
  AR6_SAMPLING,
  emptyTwoBoxPropagator,
  exchangeForTcr,
  MEMBER_PARAMETERS,
  modalTwoBoxPropagatorInto,
  runEnsemble,
  runMembersInto,
  sampleMembers,
  summarizeEnsemble,
  tcrSolver,
  type EnsembleInput,
  type EnsembleOptions,
  type MemberBlock,
  type MemberTask,
} from '../src/ensemble/index.js';
import { forcingByAgent } from '../src/forcing/agents.js';
import { forcingOfDoubling } from '../src/forcing/co2.js';
import { loadPathway } from '../src/io/load-pathway.js';
import { PATHWAY_COLUMNS, type Pathway } from '../src/pathway.js';

const MEMBERS = 10_000;
const LAST_YEAR = 2300;

/** The pathway on 1750-LAST_YEAR: its own values, then held at its last year's. */
function extended(p: Pathway, lastYear: number): Pathway {
  const n0 = p.years.length;
  const n = lastYear - p.years[0] + 1;
  const series: Pathway['series'] = {};
  for (const c of PATHWAY_COLUMNS) {
    const s = p.series[c];
    if (s) series[c] = Float64Array.from({ length: n }, (_, k) => s[Math.min(k, n0 - 1)]);
  }
  return { ...p, years: Float64Array.from({ length: n }, (_, k) => p.years[0] + k), series };
}

const pathway = extended(loadPathway('swift'), LAST_YEAR);
const s = pathway.series;
const n = pathway.years.length;
const forcing = forcingByAgent(n, { co2Ppm: s.co2_ppm, ch4Ppb: s.ch4_ppb, n2oPpb: s.n2o_ppb, prescribed: s }, { co2Formula: 'ar6' });
const input: EnsembleInput = { years: pathway.years, forcing, co2Formula: 'ar6' };
const options: EnsembleOptions = { members: MEMBERS, seed: 7, thresholds: [1.5, 2, 3], baseline: [1850, 1900] };
const memberYears = MEMBERS * n;
const rate = (years: number, ms: number) => `${((years / ms) * 1000 / 1e6).toFixed(2)} M member-years/s`;

async function timed<T>(run: () => Promise<T> | T): Promise<{ ms: number; value: T }> {
  const t0 = performance.now();
  const value = await run();
  return { ms: performance.now() - t0, value };
}

console.log(`ensemble benchmark: ${MEMBERS} members x ${n} years (${pathway.years[0]}-${LAST_YEAR}), ${availableParallelism()} cores, node ${process.version}`);

// (a) the full path, first cold (as the command runs it), then warm.
const cold = await timed(() => runEnsemble(input, options));
console.log(`(a) runEnsemble, default threads (${cold.value.workersUsed}), cold: ${cold.ms.toFixed(0)} ms wall, ${rate(memberYears, cold.ms)}`);
const warm: Record<number, number> = {};
for (const workers of [1, 2]) {
  let best = Infinity;
  for (let i = 0; i < 3; i++) best = Math.min(best, (await timed(() => runEnsemble(input, { ...options, workers }))).ms);
  warm[workers] = best;
  console.log(`(a) runEnsemble, ${workers} thread${workers > 1 ? 's' : ''}, warm best of 3: ${best.toFixed(0)} ms wall, ${rate(memberYears, best)}`);
}

// (b) the bare kernel on the same members' parameters and one shared forcing series.
const p = cold.value.memberParameters.parameters;
const params = (i: number): TwoBoxParams => ({ upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1, feedbackWm2K: p.feedbackWm2K[i], exchangeWm2K: p.exchangeWm2K[i] });
const props = Array.from({ length: MEMBERS }, (_, i) => modalTwoBoxPropagatorInto(params(i), emptyTwoBoxPropagator()));
const total = forcing.total;
const surface = new Float64Array(n);
const deep = new Float64Array(n);
let kernelMs = Infinity;
for (let rep = 0; rep < 5; rep++) {
  const { ms } = await timed(() => {
    for (let i = 0; i < MEMBERS; i++) propagateTwoBoxInto(props[i], total, surface, deep);
  });
  kernelMs = Math.min(kernelMs, ms);
}
console.log(`(b) bare kernel propagateTwoBoxInto, 1 thread, best of 5: ${kernelMs.toFixed(1)} ms, ${rate(memberYears, kernelMs)}`);
const withExpm = await timed(() => {
  for (let i = 0; i < MEMBERS; i++) propagateTwoBoxInto(twoBoxPropagator(params(i)), total, surface, deep);
});
const withModal = await timed(() => {
  const prop = emptyTwoBoxPropagator();
  for (let i = 0; i < MEMBERS; i++) propagateTwoBoxInto(modalTwoBoxPropagatorInto(params(i), prop), total, surface, deep);
});
console.log(`    kernel + propagator built per member: modal ${withModal.ms.toFixed(0)} ms (${rate(memberYears, withModal.ms)}), expm twoBoxPropagator ${withExpm.ms.toFixed(0)} ms (${rate(memberYears, withExpm.ms)})`);

// (c) the odex path on 100 members, each with its own forcing.
const ODEX_MEMBERS = 100;
const f2x = forcingOfDoubling('ar6');
const odex = await timed(() => {
  for (let i = 0; i < ODEX_MEMBERS; i++) {
    const f = Float64Array.from({ length: n }, (_, k) => (p.forcing2xWm2[i] / f2x) * forcing.byAgent.co2[k] + p.aerosolScale[i] * forcing.byAgent.aerosol[k] + (total[k] - forcing.byAgent.co2[k] - forcing.byAgent.aerosol[k]));
    energyBalance(params(i), f, 'odex');
  }
});
console.log(`(c) odex energyBalance, ${ODEX_MEMBERS} members: ${odex.ms.toFixed(0)} ms, ${rate(ODEX_MEMBERS * n, odex.ms)}`);

// Where the time of (a) goes, one thread, best of 3 each.
async function bestOf3(run: () => unknown): Promise<number> {
  let ms = Infinity;
  for (let i = 0; i < 3; i++) ms = Math.min(ms, (await timed(run)).ms);
  return ms;
}
const solver = tcrSolver('ar6');
const gammaMs = await bestOf3(() => {
  for (let i = 0; i < MEMBERS; i++) exchangeForTcr(solver, { upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1, feedbackWm2K: p.feedbackWm2K[i] }, p.forcing2xWm2[i], p.tcrK[i]);
});
const samplingMs = await bestOf3(() => sampleMembers(options.seed, MEMBERS, AR6_SAMPLING));
const a = forcing.byAgent;
const task: MemberTask = {
  seed: options.seed,
  sampling: AR6_SAMPLING,
  co2Formula: 'ar6',
  co2Wm2: a.co2,
  aerosolWm2: a.aerosol,
  otherWm2: a.ch4.map((v, k) => v + a.n2o[k] + a.other[k] + a.solar[k] + a.volcanic[k]),
  baselineFrom: options.baseline[0] - pathway.years[0],
  baselineTo: options.baseline[1] - pathway.years[0],
};
const membersMs = await bestOf3(() => {
  const block: MemberBlock = {
    blockStart: 0,
    memberCount: MEMBERS,
    warmingK: new Float64Array(MEMBERS * n),
    parameters: Object.fromEntries(MEMBER_PARAMETERS.map((name) => [name, new Float64Array(MEMBERS)])) as MemberBlock['parameters'],
  };
  runMembersInto(task, 0, MEMBERS, block);
});
const summaryMs = await bestOf3(() => summarizeEnsemble(cold.value.memberParameters, 1, undefined));
console.log(
  `    (a) on 1 thread in parts: gamma solves ${gammaMs.toFixed(0)} ms, sampling with them ${samplingMs.toFixed(0)} ms, member runs with sampling ${membersMs.toFixed(0)} ms, summary statistics ${summaryMs.toFixed(0)} ms`,
);

const best = Math.min(warm[1], warm[2]);
console.log(`a/b: cold ${(kernelMs / cold.ms).toFixed(3)}, warm best ${(kernelMs / best).toFixed(3)} (target 0.5); wall for ${MEMBERS} x ${n}: cold ${cold.ms.toFixed(0)} ms, warm ${best.toFixed(0)} ms (target under 1000 ms)`);

// Try: npm run build && node dist/scripts/bench-ensemble.js

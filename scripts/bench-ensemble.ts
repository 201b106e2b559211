// Shows how fast parameter ensembles run: 10,000 members over 1750-2300 for one pathway (the bundled
// "swift" pathway on the bundled history, held at its 2150 values to 2300), reported as member-years
// per second for
//   (a) the full ensemble path, runEnsemble as `warmcast ensemble` calls it (sampling, calibration of
//       gamma per member, member runs, percentiles and exceedance statistics): the first call in the
//       process (cold, as the command runs it, on the threads it picks), then the best of five further
//       calls on one thread, on two threads started afresh per call, and on two threads of a pool
//       started once (startEnsembleThreads);
//   (b) the bare propagator kernel, propagateTwoBoxInto over the same members' prebuilt propagators
//       and one shared forcing series, in this process, single-threaded;
//   (c) the odex path (energyBalance 'odex') on 100 of the members;
// the ratios a/b, and where the time of (a) goes on one thread (the same code run in parts: drawing
// members with their gamma solve and baseline pass, stepping them through the years with the
// exceedance counts and peaks, the percentiles of every year). Worker threads need the compiled build, so run it
// from dist/.
import { availableParallelism } from 'node:os';
import { energyBalance } from '../src/climate/energy-balance.js';
import { propagateTwoBoxInto } from '../src/climate/exact-propagator.js';
import type { TwoBoxParams } from '../src/climate/two-box.js';
import {
  AR6_SAMPLING,
  emptyTwoBoxPropagator,
  modalTwoBoxPropagatorInto,
  PERCENTILES,
  runEnsemble,
  startEnsembleThreads,
  type EnsembleInput,
  type EnsembleOptions,
  type MemberTask,
} from '../src/ensemble/index.js';
import { emptyMemberPeaks } from '../src/ensemble/member-peaks.js';
import { MemberStream, STREAM_BLOCK_YEARS, streamRows } from '../src/ensemble/member-stream.js';
import { emptyParameters } from '../src/ensemble/sample-members.js';
import { YearPercentiles } from '../src/ensemble/summarize-ensemble.js';
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
const options = { members: MEMBERS, seed: 7, thresholds: [1.5, 2, 3], baseline: [1850, 1900] as const } satisfies EnsembleOptions;
const memberYears = MEMBERS * n;
const rate = (years: number, ms: number) => `${((years / ms) * 1000 / 1e6).toFixed(1)} M member-years/s`;

async function timed<T>(run: () => Promise<T> | T): Promise<{ ms: number; value: T }> {
  const t0 = performance.now();
  const value = await run();
  return { ms: performance.now() - t0, value };
}

async function bestOf(times: number, run: () => unknown): Promise<number> {
  let ms = Infinity;
  for (let i = 0; i < times; i++) ms = Math.min(ms, (await timed(run)).ms);
  return ms;
}

console.log(`ensemble benchmark: ${MEMBERS} members x ${n} years (${pathway.years[0]}-${LAST_YEAR}), ${availableParallelism()} cores, node ${process.version}`);

// (a) the full path: first cold (as the command runs it), then warm.
const cold = await timed(() => runEnsemble(input, options));
console.log(`(a) runEnsemble, cold, ${cold.value.workersUsed} thread(s) as chosen by run size: ${cold.ms.toFixed(0)} ms wall, ${rate(memberYears, cold.ms)}`);
const oneThread = await bestOf(5, () => runEnsemble(input, { ...options, workers: 1 }));
console.log(`(a) runEnsemble, 1 thread, warm best of 5: ${oneThread.toFixed(1)} ms wall, ${rate(memberYears, oneThread)}`);
const freshTwo = await bestOf(5, () => runEnsemble(input, { ...options, workers: 2 }));
console.log(`(a) runEnsemble, 2 threads started per call, best of 5: ${freshTwo.toFixed(1)} ms wall, ${rate(memberYears, freshTwo)}`);
const threads = startEnsembleThreads(2);
let pooledTwo: number;
try {
  await runEnsemble(input, { ...options, threads });
  pooledTwo = await bestOf(5, () => runEnsemble(input, { ...options, threads }));
} finally {
  await threads.close();
}
console.log(`(a) runEnsemble, 2 threads of a started pool, warm best of 5: ${pooledTwo.toFixed(1)} ms wall, ${rate(memberYears, pooledTwo)}`);

// (b) the bare kernel on the same members' parameters and one shared forcing series.
const p = cold.value.memberParameters.parameters;
const params = (i: number): TwoBoxParams => ({ upperHeatCapacity: 8, deepHeatCapacity: 100, deepEfficacy: 1, feedbackWm2K: p.feedbackWm2K[i], exchangeWm2K: p.exchangeWm2K[i] });
const props = Array.from({ length: MEMBERS }, (_, i) => modalTwoBoxPropagatorInto(params(i), emptyTwoBoxPropagator()));
const total = forcing.total;
const surface = new Float64Array(n);
const deep = new Float64Array(n);
const kernelMs = await bestOf(5, () => {
  for (let i = 0; i < MEMBERS; i++) propagateTwoBoxInto(props[i], total, surface, deep);
});
console.log(`(b) bare kernel propagateTwoBoxInto, 1 thread, best of 5: ${kernelMs.toFixed(1)} ms, ${rate(memberYears, kernelMs)}`);

// (c) the odex path on 100 members, each with its own forcing.
const ODEX_MEMBERS = 100;
const f2x = forcingOfDoubling('ar6');
const odex = await timed(() => {
  for (let i = 0; i < ODEX_MEMBERS; i++) {
    const f = Float64Array.from({ length: n }, (_, k) => (p.forcing2xWm2[i] / f2x) * forcing.byAgent.co2[k] + p.aerosolScale[i] * forcing.aerosol[k] + (total[k] - forcing.byAgent.co2[k] - forcing.aerosol[k]));
    energyBalance(params(i), f, 'odex');
  }
});
console.log(`(c) odex energyBalance, ${ODEX_MEMBERS} members: ${odex.ms.toFixed(0)} ms, ${rate(ODEX_MEMBERS * n, odex.ms)}`);

// Where the time of (a) goes on one thread: the streamed run's parts, best of 3 each.
const a = forcing.byAgent;
const task: MemberTask = {
  seed: options.seed,
  sampling: AR6_SAMPLING,
  co2Formula: 'ar6',
  co2Wm2: a.co2,
  aerosolWm2: forcing.aerosol,
  otherWm2: total.map((v, k) => v - a.co2[k] - forcing.aerosol[k]),
  baselineFrom: options.baseline[0] - pathway.years[0],
  baselineTo: options.baseline[1] - pathway.years[0],
};
const rowCount = streamRows(n, false);
const rows = new Float64Array(rowCount * MEMBERS);
const parts = { draw: Infinity, advance: Infinity, percentiles: Infinity };
for (let rep = 0; rep < 3; rep++) {
  const stream = new MemberStream(task, 0, MEMBERS, 0, MEMBERS, rows, rowCount, emptyParameters(MEMBERS), options.thresholds, emptyMemberPeaks(MEMBERS));
  const years = new YearPercentiles(MEMBERS);
  const out = PERCENTILES.map(() => new Float64Array(n));
  parts.draw = Math.min(parts.draw, (await timed(() => stream.draw())).ms);
  let advance = 0;
  let percentiles = 0;
  for (let y0 = 0; y0 < n; y0 += STREAM_BLOCK_YEARS) {
    const y1 = Math.min(n, y0 + STREAM_BLOCK_YEARS);
    advance += (await timed(() => stream.advance(y0, y1))).ms;
    percentiles += (
      await timed(() => {
        years.into(rows, y0, y1, out, rowCount);
      })
    ).ms;
  }
  parts.advance = Math.min(parts.advance, advance);
  parts.percentiles = Math.min(parts.percentiles, percentiles);
}
console.log(
  `    (a) on 1 thread in parts: drawing members (gamma solves, propagators, baseline pass) ${parts.draw.toFixed(1)} ms, ` +
    `stepping them with the exceedance counts and peaks ${parts.advance.toFixed(1)} ms, percentiles of every year ${parts.percentiles.toFixed(1)} ms; ` +
    `rows held ${((rowCount * MEMBERS * 8) / 1e6).toFixed(1)} MB (every year would be ${((n * MEMBERS * 8) / 1e6).toFixed(0)} MB)`,
);

const ratio = (ms: number) => (kernelMs / ms).toFixed(2);
console.log(
  `a/b: cold ${ratio(cold.ms)}, 1 thread ${ratio(oneThread)}, 2 fresh threads ${ratio(freshTwo)}, 2 pooled threads ${ratio(pooledTwo)} (target 0.5); ` +
    `wall for ${MEMBERS} x ${n}: cold ${cold.ms.toFixed(0)} ms, best ${Math.min(oneThread, freshTwo, pooledTwo).toFixed(0)} ms (target under 1000 ms)`,
);

// Try: npm run bench:ensemble

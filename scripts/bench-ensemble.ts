// Shows what an ensemble costs beyond its kernel: 10,000 members over 1750-2300 for one pathway (the
// bundled "swift" pathway on the bundled history, held at its 2150 values to 2300), each member with
// the full parameter set (its own feedback, both heat capacities, exchange and efficacy, and a
// multiplier on every forcing agent), timed in this process as
//   (a) the whole ensemble, runEnsemble as `warmcast ensemble` calls it (members handed over by a
//       member source, the year loop, rebasing, percentiles per year, exceedance counts, peaks and
//       the parameter summary),
//   (b) the bare kernel: runMembers on the same members (forcing sums and the two-box step),
// best of five each after one warm-up call, and the ratio a/b (target: at most 1.5); then, once each,
// the default AR6-range sampling (gamma solved per member from its TCR) and an emission-driven
// ensemble (every member its own carbon cycle), and the odex reference on 100 members.
import { energyBalance } from '../src/climate/energy-balance.js';
import { ar6Members, AR6_SAMPLING, runEnsemble, runMembers, type EnsembleInput, type MemberParameters, type MemberSource } from '../src/ensemble/index.js';
import { forcingScaleKey } from '../src/ensemble/member-parameters.js';
import { FORCING_AGENTS, forcingByAgent } from '../src/forcing/agents.js';
import { loadPathway } from '../src/io/load-pathway.js';
import { PATHWAY_COLUMNS, type Pathway } from '../src/pathway.js';
import { ensembleInput } from '../src/projection/ensemble-input.js';
import { calibrate } from '../src/climate/calibrate.js';

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
const options = { members: MEMBERS, seed: 7, thresholds: [1.5, 2, 3], baseline: [1850, 1900] as const };

// The full parameter set: AR6-range members, with heat capacities, efficacy and every agent's
// multiplier varied too (invented spreads: only the cost matters here).
const drawn = ar6Members(AR6_SAMPLING, 'ar6').draw(7, 0, MEMBERS).parameters;
const v = drawn.values as Record<string, Float64Array>;
const wave = (r: number, k: number, spread: number) => 1 + spread * Math.sin(1.7 * r + 0.9 * k);
for (let r = 0; r < MEMBERS; r++) {
  v.upper_heat_capacity[r] = 8 * wave(r, 1, 0.2);
  v.deep_heat_capacity[r] = 100 * wave(r, 2, 0.3);
  v.deep_efficacy[r] = 1.2 * wave(r, 3, 0.15);
}
for (const [k, agent] of FORCING_AGENTS.entries()) v[forcingScaleKey(agent)] ??= Float64Array.from({ length: MEMBERS }, (_, r) => wave(r, 10 + k, 0.1));
const full: MemberParameters = drawn;
const source: MemberSource = { scheme: 'benchmark members', notes: [], draw: () => ({ parameters: full, redraws: 0 }) };

async function bestOf(times: number, run: () => unknown): Promise<number> {
  await run();
  let best = Infinity;
  for (let i = 0; i < times; i++) {
    const t0 = performance.now();
    await run();
    best = Math.min(best, performance.now() - t0);
  }
  return best;
}
const rate = (memberYears: number, ms: number) => `${(memberYears / ms / 1000).toFixed(0)} M member-years/s`;

console.log(`ensemble benchmark: ${MEMBERS} members x ${n} years (${pathway.years[0]}-${LAST_YEAR}), ${Object.keys(full.values).length} parameters per member, node ${process.version}`);
const whole = await bestOf(5, () => runEnsemble(input, { ...options, source }));
const bare = await bestOf(5, () => runMembers({ co2Formula: 'ar6', forcing: forcing.byAgent }, full));
console.log(`(a) whole ensemble (runEnsemble), best of 5: ${whole.toFixed(1)} ms, ${rate(MEMBERS * n, whole)}`);
console.log(`(b) bare kernel (runMembers), best of 5: ${bare.toFixed(1)} ms, ${rate(MEMBERS * n, bare)}`);
console.log(`a/b = ${(whole / bare).toFixed(2)} (target at most 1.5)`);

const t0 = performance.now();
await runEnsemble(input, options);
console.log(`default AR6-range sampling (gamma solved per member), once: ${(performance.now() - t0).toFixed(0)} ms`);

const emissions = ensembleInput(loadPathway('swift-emissions'), calibrate());
const t1 = performance.now();
await runEnsemble(emissions.input, options);
console.log(`emission-driven (swift-emissions, ${emissions.input.years.length} years, own carbon cycle per member), once: ${(performance.now() - t1).toFixed(0)} ms`);

const ODEX_MEMBERS = 100;
const t2 = performance.now();
for (let r = 0; r < ODEX_MEMBERS; r++) {
  const p = { upperHeatCapacity: v.upper_heat_capacity[r], deepHeatCapacity: v.deep_heat_capacity[r], feedbackWm2K: v.feedback_wm2k[r], exchangeWm2K: v.exchange_wm2k[r], deepEfficacy: v.deep_efficacy[r] };
  energyBalance(p, forcing.total, 'odex');
}
const odexMs = performance.now() - t2;
console.log(`odex reference, ${ODEX_MEMBERS} members: ${odexMs.toFixed(0)} ms, ${((odexMs / ODEX_MEMBERS) * MEMBERS / bare).toFixed(0)} times the kernel per member`);

// Try: npm run bench:ensemble

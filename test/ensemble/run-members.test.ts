import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { energyBalance, type TwoBoxParams } from '../../src/climate/index.js';
import { FORCING_AGENTS } from '../../src/forcing/agents.js';
import { emptyMemberParameters, forcingScaleKey, runMembers, sliceMemberParameters, type MemberParameters } from '../../src/ensemble/index.js';
import { expectAllClose } from '../asserts.js';
import { expmTwoBoxRun } from '../climate/expm-propagator.js';
import { syntheticInput } from './synthetic-input.js';

const input = syntheticInput(1750, 2150);
const n = input.years.length;
const a = input.forcing.byAgent;
const task = { co2Formula: 'ar6' as const, forcing: a };

/**
 * Members drawn with every two-box parameter and a multiplier on every agent varied (C 3-15, C_d
 * 30-300, lambda 0.4-2.5, gamma 0.1-3, efficacy 0.7-1.8, scales 0-2): the full parameter set.
 */
const member = fc.record({
  upper_heat_capacity: fc.double({ min: 3, max: 15, noNaN: true }),
  deep_heat_capacity: fc.double({ min: 30, max: 300, noNaN: true }),
  feedback_wm2k: fc.double({ min: 0.4, max: 2.5, noNaN: true }),
  exchange_wm2k: fc.double({ min: 0.1, max: 3, noNaN: true }),
  deep_efficacy: fc.double({ min: 0.7, max: 1.8, noNaN: true }),
  scales: fc.array(fc.double({ min: 0, max: 2, noNaN: true }), { minLength: FORCING_AGENTS.length, maxLength: FORCING_AGENTS.length }),
});
type Drawn = { upper_heat_capacity: number; deep_heat_capacity: number; feedback_wm2k: number; exchange_wm2k: number; deep_efficacy: number; scales: number[] };

function block(drawn: Drawn[]): MemberParameters {
  const b = emptyMemberParameters(drawn.length, FORCING_AGENTS.map(forcingScaleKey));
  drawn.forEach((d, r) => {
    for (const key of ['upper_heat_capacity', 'deep_heat_capacity', 'feedback_wm2k', 'exchange_wm2k', 'deep_efficacy'] as const) b.values[key][r] = d[key];
    FORCING_AGENTS.forEach((agent, j) => (b.values[forcingScaleKey(agent)]![r] = d.scales[j]));
  });
  return b;
}

const twoBox = (d: Drawn): TwoBoxParams => ({
  upperHeatCapacity: d.upper_heat_capacity,
  deepHeatCapacity: d.deep_heat_capacity,
  feedbackWm2K: d.feedback_wm2k,
  exchangeWm2K: d.exchange_wm2k,
  deepEfficacy: d.deep_efficacy,
});

/** The member's forcing, the sum over agents of its scale times the agent's series, computed apart. */
const forcingOf = (d: Drawn) => Float64Array.from({ length: n }, (_, k) => FORCING_AGENTS.reduce((sum, agent, j) => sum + d.scales[j] * a[agent][k], 0));

/** Member r's series from the year-major result. */
const series = (w: Float64Array, m: number, r: number) => Float64Array.from({ length: n }, (_, k) => w[k * m + r]);

describe('runMembers', () => {
  it('runMembers follows the odex integration of the two-box ODE to 1e-6 K and the matrix-exponential run (Van Loan 1978) to 1e-9 K, each member with its own parameters and agent scales', () => {
    fc.assert(
      fc.property(fc.array(member, { minLength: 1, maxLength: 6 }), (drawn) => {
        const w = runMembers(task, block(drawn));
        drawn.forEach((d, r) => {
          const ours = series(w, drawn.length, r);
          expectAllClose(ours, expmTwoBoxRun(twoBox(d), forcingOf(d)).surfaceK, 1e-9, `member ${r} vs expm`);
          expectAllClose(ours, energyBalance(twoBox(d), forcingOf(d), 'odex').surfaceK, 1e-6, `member ${r} vs odex`);
        });
      }),
      { numRuns: 10 },
    );
  });

  it('runMembers gives a member the same numbers, bit for bit, alone or among 1,300 others (blocks of 512 do not mix members)', () => {
    const drawn = fc.sample(member, { numRuns: 1300, seed: 5 });
    const all = block(drawn);
    const w = runMembers(task, all);
    for (const r of [0, 511, 512, 1299]) {
      const alone = runMembers(task, sliceMemberParameters(all, r, r + 1));
      expect(series(w, 1300, r)).toEqual(alone);
    }
  });

  it('runMembers treats an agent without a scale key as scaled by 1', () => {
    const d = fc.sample(member, { numRuns: 1, seed: 9 })[0];
    d.scales = d.scales.map(() => 1);
    const withScales = runMembers(task, block([d]));
    const b = block([d]);
    for (const agent of FORCING_AGENTS) delete b.values[forcingScaleKey(agent)];
    expectAllClose(runMembers(task, b), withScales, 1e-12, 'no scale keys');
  });
});

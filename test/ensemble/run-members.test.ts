import { describe, expect, it } from 'vitest';
import { energyBalance, propagateTwoBoxInto, twoBoxMatrix, type TwoBoxParams } from '../../src/climate/index.js';
import { MEMBER_PARAMETERS, runMembersInto, type MemberBlock } from '../../src/ensemble/index.js';
import { expm, matrix } from 'mathjs';
import { forcingOfDoubling } from '../../src/forcing/co2.js';
import { expectAllClose } from '../asserts.js';
import { syntheticInput, syntheticTask } from './synthetic-input.js';

const input = syntheticInput(1750, 2150);
const n = input.years.length;
const a = input.forcing.byAgent;
const task = syntheticTask(31);

function run(from: number, to: number): MemberBlock {
  const count = to - from;
  const block: MemberBlock = {
    blockStart: from,
    memberCount: count,
    warmingK: new Float64Array(count * n),
    parameters: Object.fromEntries(MEMBER_PARAMETERS.map((p) => [p, new Float64Array(count)])) as MemberBlock['parameters'],
  };
  runMembersInto(task, from, to, block);
  return block;
}

/** Member r's series from the year-major block. */
const series = (b: MemberBlock, r: number) => Float64Array.from({ length: n }, (_, k) => b.warmingK[k * b.memberCount + r]);

/** The member's forcing and rebased warming computed independently of run-members.ts. */
function reference(p: TwoBoxParams, co2Scale: number, aerosolScale: number, surface: (f: Float64Array) => Float64Array): Float64Array {
  const f = Float64Array.from({ length: n }, (_, k) => co2Scale * a.co2[k] + aerosolScale * (a.aerosol_ari[k] + a.aerosol_aci[k]) + a.ch4[k] + a.n2o[k] + a.other_ghg[k] + a.ozone[k] + a.strat_h2o[k] + a.contrails[k] + a.bc_snow[k] + a.land_use[k] + a.solar[k] + a.volcanic[k]);
  const t = surface(f);
  let sum = 0;
  for (let k = 100; k <= 150; k++) sum += t[k];
  return t.map((v) => v - sum / 51);
}

describe('runMembersInto', () => {
  const block = run(0, 25);
  const params = (r: number): TwoBoxParams => ({
    upperHeatCapacity: 8,
    deepHeatCapacity: 100,
    deepEfficacy: 1,
    feedbackWm2K: block.parameters.feedbackWm2K[r],
    exchangeWm2K: block.parameters.exchangeWm2K[r],
  });
  // The member's CO2 multiplier: its 2xCO2 forcing over the formula's own.
  const co2Scale = (r: number) => block.parameters.forcing2xWm2[r] / forcingOfDoubling('ar6');

  it('runMembersInto matches the odex integration of the two-box ODE (energyBalance "odex") to 1e-6 K on every one of 25 drawn members', () => {
    for (let r = 0; r < 25; r++) {
      const ode = reference(params(r), co2Scale(r), block.parameters.aerosolScale[r], (f) => energyBalance(params(r), f, 'odex').surfaceK);
      expectAllClose(series(block, r), ode, 1e-6, `member ${r}`);
    }
  });

  it('runMembersInto matches a run with the propagator from mathjs expm (outside reference library) to 1e-9 K', () => {
    for (let r = 0; r < 25; r += 3) {
      const { a: A, b } = twoBoxMatrix(params(r));
      const e = (expm(matrix([[A[0], A[1], b[0], 0], [A[2], A[3], b[1], 0], [0, 0, 0, 1], [0, 0, 0, 0]])).toArray() as number[][]).flat();
      const prop = { phi: Float64Array.of(e[0], e[1], e[4], e[5]), g0: Float64Array.of(e[2], e[6]), g1: Float64Array.of(e[3], e[7]) };
      const viaMathjs = reference(params(r), co2Scale(r), block.parameters.aerosolScale[r], (f) => {
        const t = new Float64Array(n);
        propagateTwoBoxInto(prop, f, t, new Float64Array(n));
        return t;
      });
      expectAllClose(series(block, r), viaMathjs, 1e-9, `member ${r}`);
    }
  });

  it('runMembersInto gives the same member the same numbers whether run alone or with others (member i depends only on seed and i)', () => {
    const part = run(10, 14);
    for (let r = 0; r < 4; r++) expect(Array.from(series(part, r))).toEqual(Array.from(series(block, r + 10)));
  });
});

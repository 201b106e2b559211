import fc from 'fast-check';
import { expm, matrix } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { emptyTwoBoxSteps, energyBalance, propagateTwoBoxInto, rampGain, stepTwoBoxInto, twoBoxMatrix, twoBoxStepsInto, type TwoBoxParams } from '../../src/climate/index.js';
import { expectAllClose, expectClose } from '../asserts.js';
import { expmTwoBoxRun, twoBoxPropagator } from './expm-propagator.js';

/**
 * Parameter sets drawn over the published range of CMIP two-layer fits and beyond (Geoffroy et al.
 * 2013a, Table 4: C about 7-8, C_d about 100, gamma about 0.7, efficacy about 1.3, from memory;
 * drawn here over C 2-20, C_d 20-400, lambda 0.3-3, gamma 0.05-5, efficacy 0.6-2).
 */
const params = fc.record({
  upperHeatCapacity: fc.double({ min: 2, max: 20, noNaN: true }),
  deepHeatCapacity: fc.double({ min: 20, max: 400, noNaN: true }),
  feedbackWm2K: fc.double({ min: 0.3, max: 3, noNaN: true }),
  exchangeWm2K: fc.double({ min: 0.05, max: 5, noNaN: true }),
  deepEfficacy: fc.double({ min: 0.6, max: 2, noNaN: true }),
});

/** A forcing ramp with wiggles and a volcanic dip, W m-2 at 300 year nodes. */
const forcing = Float64Array.from({ length: 300 }, (_, i) => 0.02 * i + 0.5 * Math.sin(i / 3) - (i === 140 ? 3 : 0));

function stepsOf(p: TwoBoxParams) {
  const arrays = Object.fromEntries(Object.entries(p).map(([k, v]) => [k, [v]])) as unknown as Parameters<typeof twoBoxStepsInto>[0];
  return twoBoxStepsInto(arrays, emptyTwoBoxSteps(1));
}

/** The propagator read off mathjs's exponential of the augmented matrix (Van Loan 1978), an outside reference library. */
function mathjsPropagator(p: TwoBoxParams) {
  const { a, b } = twoBoxMatrix(p);
  const e = (expm(matrix([[a[0], a[1], b[0], 0], [a[2], a[3], b[1], 0], [0, 0, 0, 1], [0, 0, 0, 0]])).toArray() as number[][]).flat();
  return { phi: [e[0], e[1], e[4], e[5]], g0: [e[2], e[6]], g1: [e[3], e[7]] };
}

describe('twoBoxStepsInto (closed-form modal step, Geoffroy et al. 2013a,b)', () => {
  it('equals the matrix exponential of the augmented matrix (Van Loan 1978; numerics/expm and mathjs expm) to 1e-11 on drawn parameter sets', () => {
    fc.assert(
      fc.property(params, (p) => {
        const s = stepsOf(p);
        for (const oracle of [twoBoxPropagator(p), mathjsPropagator(p)]) {
          expectAllClose([s.tFromT[0], s.tFromD[0], s.dFromT[0], s.dFromD[0]], oracle.phi, 1e-11, 'phi');
          expectAllClose([s.tLevel[0], s.dLevel[0]], oracle.g0, 1e-11 * Math.abs(oracle.g0[0]), 'level');
          expectAllClose([s.tRamp[0], s.dRamp[0]], oracle.g1, 1e-11 * Math.abs(oracle.g1[0]), 'ramp');
        }
      }),
      { numRuns: 200 },
    );
  });

  it('with no exchange (gamma = 0) is the upper box alone: the matrix exponential, deep box untouched', () => {
    const p: TwoBoxParams = { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.3, exchangeWm2K: 0, deepEfficacy: 1.2 };
    const s = stepsOf(p);
    const oracle = twoBoxPropagator(p);
    expectAllClose([s.tFromT[0], s.tFromD[0], s.dFromT[0], s.dFromD[0]], oracle.phi, 1e-13, 'phi');
    expectAllClose([s.tLevel[0], s.dLevel[0], s.tRamp[0], s.dRamp[0]], [oracle.g0[0], oracle.g0[1], oracle.g1[0], oracle.g1[1]], 1e-13, 'gains');
  });

  it('rampGain(h) = 1 - (1 - e^-h) / h (analytic): its Taylor series h/2 - h^2/6 + h^3/24 - ... below h = 0.01, the closed form above', () => {
    // Below 1e-2 the closed form cancels (error about 1e-16 / h), so the reference is the series to h^8.
    const series = (h: number) => h / 2 - h ** 2 / 6 + h ** 3 / 24 - h ** 4 / 120 + h ** 5 / 720 - h ** 6 / 5040 + h ** 7 / 40320 - h ** 8 / 362880;
    for (const h of [1e-6, 1e-4, 1e-3, 9.99e-3]) expectClose(rampGain(h), series(h), 1e-15 * series(h));
    for (const h of [1.001e-2, 0.1, 1, 10]) expectClose(rampGain(h), 1 - (1 - Math.exp(-h)) / h, 1e-13);
  });
});

describe('propagateTwoBoxInto (the one step, one member)', () => {
  it('follows odex (energyBalance odex, rtol 1e-10) to 1e-7 K and the matrix-exponential run to 1e-10 K on drawn parameter sets', () => {
    fc.assert(
      fc.property(params, (p) => {
        const t = new Float64Array(forcing.length);
        const d = new Float64Array(forcing.length);
        propagateTwoBoxInto(p, forcing, t, d);
        const byExpm = expmTwoBoxRun(p, forcing);
        expectAllClose(t, byExpm.surfaceK, 1e-10, 'surface vs expm');
        expectAllClose(d, byExpm.deepK, 1e-10, 'deep vs expm');
        const ode = energyBalance(p, forcing, 'odex');
        expectAllClose(t, ode.surfaceK, 1e-7, 'surface vs odex');
        expectAllClose(d, ode.deepK, 1e-7, 'deep vs odex');
      }),
      { numRuns: 25 },
    );
  });

  it('reaches the equilibrium F / lambda under constant forcing (steady state of the model)', () => {
    const p: TwoBoxParams = { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.31, exchangeWm2K: 0.7, deepEfficacy: 1.3 };
    const f = new Float64Array(20_000).fill(3.93);
    f[0] = 0;
    const t = new Float64Array(f.length);
    const d = new Float64Array(f.length);
    propagateTwoBoxInto(p, f, t, d);
    expectClose(t[f.length - 1], 3.93 / 1.31, 1e-9);
    expectClose(d[f.length - 1], 3.93 / 1.31, 1e-9);
  });
});

describe('stepTwoBoxInto (many members)', () => {
  it('steps each member as its own single run does, bit for bit (members do not interact)', () => {
    const members: TwoBoxParams[] = [
      { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: 1.31, exchangeWm2K: 0.7, deepEfficacy: 1.3 },
      { upperHeatCapacity: 5, deepHeatCapacity: 250, feedbackWm2K: 0.8, exchangeWm2K: 1.2, deepEfficacy: 1 },
      { upperHeatCapacity: 12, deepHeatCapacity: 60, feedbackWm2K: 2.1, exchangeWm2K: 0, deepEfficacy: 1.1 },
    ];
    const arrays = Object.fromEntries(Object.keys(members[0]).map((k) => [k, members.map((m) => m[k as keyof TwoBoxParams])])) as unknown as Parameters<typeof twoBoxStepsInto>[0];
    const s = twoBoxStepsInto(arrays, emptyTwoBoxSteps(3));
    const t = new Float64Array(3);
    const d = new Float64Array(3);
    const scale = [1, 0.5, 2];
    const runs = members.map((p, r) => {
      const out = { t: new Float64Array(forcing.length), d: new Float64Array(forcing.length) };
      propagateTwoBoxInto(p, forcing.map((f) => scale[r] * f), out.t, out.d);
      return out;
    });
    for (let k = 0; k + 1 < forcing.length; k++) {
      stepTwoBoxInto(s, Float64Array.from(scale, (x) => x * forcing[k]), Float64Array.from(scale, (x) => x * forcing[k + 1]), t, d);
      for (let r = 0; r < 3; r++) {
        expect(t[r]).toBe(runs[r].t[k + 1]);
        expect(d[r]).toBe(runs[r].d[k + 1]);
      }
    }
  });
});

import { expm, matrix } from 'mathjs';
import { describe, it } from 'vitest';
import { twoBoxMatrix, twoBoxPropagator, type TwoBoxParams } from '../../src/climate/index.js';
import { emptyTwoBoxPropagator, modalTwoBoxPropagatorInto } from '../../src/ensemble/modal-propagator.js';
import { AR6_SAMPLING, sampleMembers } from '../../src/ensemble/index.js';
import { expectAllClose } from '../asserts.js';

/** The propagator read off mathjs's exponential of the augmented matrix (Van Loan 1978). */
function mathjsPropagator(p: TwoBoxParams) {
  const { a, b } = twoBoxMatrix(p);
  const e = (expm(matrix([[a[0], a[1], b[0], 0], [a[2], a[3], b[1], 0], [0, 0, 0, 1], [0, 0, 0, 0]])).toArray() as number[][]).flat();
  return { phi: [e[0], e[1], e[4], e[5]], g0: [e[2], e[6]], g1: [e[3], e[7]] };
}

function expectSamePropagator(ours: ReturnType<typeof emptyTwoBoxPropagator>, theirs: { phi: ArrayLike<number>; g0: ArrayLike<number>; g1: ArrayLike<number> }, tol: number, what: string) {
  expectAllClose(ours.phi, theirs.phi, tol, `${what} phi`);
  expectAllClose(ours.g0, theirs.g0, tol * Math.abs(theirs.g0[0]), `${what} g0`);
  expectAllClose(ours.g1, theirs.g1, tol * Math.abs(theirs.g1[0]), `${what} g1`);
}

describe('modalTwoBoxPropagatorInto', () => {
  it('equals twoBoxPropagator (Van Loan 1978 matrix exponential) to 1e-12 over lambda 0.5-4, gamma 0.01-50, efficacy 1-1.3', () => {
    const out = emptyTwoBoxPropagator();
    for (const feedbackWm2K of [0.5, 1, 1.31, 2, 4]) {
      for (const exchangeWm2K of [0.01, 0.1, 0.7, 1, 3, 10, 50]) {
        for (const deepEfficacy of [1, 1.3]) {
          const p: TwoBoxParams = { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K, exchangeWm2K, deepEfficacy };
          expectSamePropagator(modalTwoBoxPropagatorInto(p, out), twoBoxPropagator(p), 1e-12, `lambda ${feedbackWm2K} gamma ${exchangeWm2K}`);
        }
      }
    }
  });

  it('equals mathjs expm of the augmented matrix (outside reference library) on every member of a 40-member AR6 ensemble', () => {
    const { parameters: s } = sampleMembers(11, 40, AR6_SAMPLING);
    const out = emptyTwoBoxPropagator();
    for (let i = 0; i < 40; i++) {
      const p: TwoBoxParams = { upperHeatCapacity: 8, deepHeatCapacity: 100, feedbackWm2K: s.feedbackWm2K[i], exchangeWm2K: s.exchangeWm2K[i], deepEfficacy: 1 };
      // mathjs's Padé expm is accurate to about 1e-13 relative on these matrices.
      expectSamePropagator(modalTwoBoxPropagatorInto(p, out), mathjsPropagator(p), 1e-11, `member ${i}`);
    }
  });
});

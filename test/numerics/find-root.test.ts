import { describe, expect, it } from 'vitest';
import { NumericalError } from '../../src/errors.js';
import { findRoot } from '../../src/numerics/find-root.js';
import { expectClose } from '../asserts.js';

describe('findRoot', () => {
  it('finds sqrt(2) (analytic)', () => expectClose(findRoot((x) => x * x - 2, 0, 2, 1e-14), Math.SQRT2, 1e-13));
  it('finds the root of cos(x) - x, the Dottie number 0.7390851332151607 (handbook constant)', () =>
    expectClose(findRoot((x) => Math.cos(x) - x, 0, 1, 1e-15), 0.7390851332151607, 1e-14));
  it('throws NumericalError when the bracket has no sign change', () => {
    expect(() => findRoot((x) => x * x + 1, -1, 1)).toThrow(NumericalError);
  });
});

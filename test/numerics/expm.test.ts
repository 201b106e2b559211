import { expm as mathjsExpm, matrix } from 'mathjs';
import { describe, it } from 'vitest';
import { expm } from '../../src/numerics/expm.js';
import { expectAllClose } from '../asserts.js';

describe('expm', () => {
  it('is the rotation matrix for [[0, 1], [-1, 0]] (analytic: exp of a skew matrix)', () => {
    expectAllClose(expm(Float64Array.of(0, 1, -1, 0), 2), [Math.cos(1), Math.sin(1), -Math.sin(1), Math.cos(1)], 1e-15);
  });

  it('agrees with mathjs expm on augmented two-box matrices (outside reference library)', () => {
    const cases = [
      [-0.3, 0.15, 0.125, 0, 0.01, -0.01, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0],
      [-2.5, 2.25, 0.25, 0, 0.0017, -0.0017, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0],
      [-40, 30, 20, 0, 0.5, -0.5, 0, 0, 0, 0, 0, 1, 0, 0, 0, 0],
    ];
    for (const c of cases) {
      const ours = expm(Float64Array.from(c), 4);
      const rows = [0, 1, 2, 3].map((i) => c.slice(4 * i, 4 * i + 4));
      const theirs = (mathjsExpm(matrix(rows)).toArray() as number[][]).flat();
      // Both are double-precision Padé implementations: agreement to ~1e-13 relative.
      expectAllClose(ours, theirs, 1e-12 * Math.max(1, ...theirs.map(Math.abs)));
    }
  });
});

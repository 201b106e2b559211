import { erf } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { normalQuantile } from '../../src/ensemble/normal-quantile.js';
import { expectClose } from '../asserts.js';

describe('normalQuantile', () => {
  it('normalQuantile gives the tabulated standard normal percentage points (Abramowitz & Stegun 1964, Table 26.5)', () => {
    // Tolerance 1e-9: the table's values are given to 9 decimals.
    expectClose(normalQuantile(0.95), 1.644853627, 1e-9, 'z 0.95');
    expectClose(normalQuantile(0.975), 1.959963985, 1e-9, 'z 0.975');
    expectClose(normalQuantile(0.99), 2.326347874, 1e-9, 'z 0.99');
    expectClose(normalQuantile(0.999), 3.090232306, 1e-9, 'z 0.999');
    expect(normalQuantile(0.5)).toBe(0);
  });

  it('normalQuantile inverts the normal CDF 0.5 (1 + erf(z / sqrt 2)) of mathjs (outside reference library)', () => {
    for (let i = 1; i < 1000; i++) {
      const p = i / 1000;
      const z = normalQuantile(p);
      // AS 241 is accurate to about 1e-16 relative (Wichura 1988); the CDF through erf adds rounding.
      expectClose(0.5 * (1 + erf(z / Math.SQRT2)), p, 2e-15, `p = ${p}`);
    }
  });

  it('normalQuantile is odd about 0.5 and monotone, with infinite ends and NaN outside [0, 1] (properties of Phi^-1)', () => {
    for (const p of [1e-300, 1e-12, 1e-6, 0.01, 0.2, 0.4]) expect(normalQuantile(p)).toBeLessThan(normalQuantile(p * 1.001));
    // 1 - p is exact enough in double precision from p = 1e-6 on.
    for (const p of [1e-6, 0.01, 0.2, 0.4]) expectClose(normalQuantile(1 - p) + normalQuantile(p), 0, 1e-9);
    expect(normalQuantile(0)).toBe(-Infinity);
    expect(normalQuantile(1)).toBe(Infinity);
    expect(normalQuantile(-0.1)).toBeNaN();
    expect(normalQuantile(1.1)).toBeNaN();
  });
});

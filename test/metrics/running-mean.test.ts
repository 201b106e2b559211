import fc from 'fast-check';
import { mean } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { ConfigError } from '../../src/errors.js';
import { runningMean } from '../../src/metrics/running-mean.js';
import { expectAllClose, expectClose } from '../asserts.js';

describe('runningMean', () => {
  it('runningMean(values, w) equals mathjs mean over each window Y-9..Y+10 for w = 20 (reference library)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 20, maxLength: 60 }), (values) => {
        const out = runningMean(values, 20);
        for (let i = 0; i < values.length; i++) {
          if (i < 9 || i + 10 >= values.length) expect(Number.isNaN(out[i])).toBe(true);
          // Tolerance: 20 additions of values up to 5 in magnitude, in double precision.
          else expectClose(out[i], mean(values.slice(i - 9, i + 11)), 1e-13, `index ${i}`);
        }
      }),
    );
  });

  it('runningMean(values, w, "trailing") equals mathjs mean over Y-w+1..Y (reference library)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 1, maxLength: 40 }), fc.integer({ min: 1, max: 25 }), (values, w) => {
        const out = runningMean(values, w, 'trailing');
        for (let i = 0; i < values.length; i++) {
          if (i < w - 1) expect(Number.isNaN(out[i])).toBe(true);
          else expectClose(out[i], mean(values.slice(i - w + 1, i + 1)), 1e-13, `index ${i}`);
        }
      }),
    );
  });

  it('runningMean of a linear series is the series at the window centre: Y + 0.5 for an even window, Y for an odd one (analytic)', () => {
    const years = Array.from({ length: 50 }, (_, i) => 2000 + i);
    const line = years.map((y) => 0.5 + 0.03 * (y - 2000));
    const even = runningMean(line, 20);
    const odd = runningMean(line, 21);
    for (let i = 10; i < 39; i++) {
      expectClose(even[i], 0.5 + 0.03 * (years[i] + 0.5 - 2000), 1e-12, `even window at ${years[i]}`);
      expectClose(odd[i], line[i], 1e-12, `odd window at ${years[i]}`);
    }
  });

  it('runningMean(values, 1) is the series itself', () => {
    expectAllClose(runningMean([0.1, 0.7, -0.2], 1), [0.1, 0.7, -0.2], 0);
  });

  it('runningMean gives all NaN when the window is longer than the data, and NaN for a window holding a NaN', () => {
    expect(Array.from(runningMean([1, 2, 3], 4)).every(Number.isNaN)).toBe(true);
    const out = runningMean([1, 2, NaN, 4, 5, 6], 3);
    expect([out[1], out[2], out[3]].every(Number.isNaN)).toBe(true);
    expectClose(out[4], 5, 1e-15);
  });

  it('runningMean throws ConfigError for a window that is not a positive whole number', () => {
    expect(() => runningMean([1, 2], 0)).toThrow(ConfigError);
    expect(() => runningMean([1, 2], 2.5)).toThrow(/must be a positive whole number/);
  });
});

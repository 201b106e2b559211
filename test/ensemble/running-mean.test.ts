import { describe, expect, it } from 'vitest';
import { runningMean } from '../../src/metrics/running-mean.js';
import { runningMeanInto } from '../../src/ensemble/running-mean.js';
import { expectAllClose } from '../asserts.js';

describe('runningMeanInto', () => {
  it('runningMeanInto of 0, 1, 2, ... is the window centre y + 0.5 over y-9..y+10, NaN where the window leaves the series (analytic: mean of an arithmetic run)', () => {
    const values = Float64Array.from({ length: 30 }, (_, i) => i);
    const out = new Float64Array(30);
    runningMeanInto(values, out);
    for (let y = 0; y < 30; y++) {
      if (y < 9 || y > 19) expect(out[y]).toBeNaN();
      else expect(out[y]).toBe(y + 0.5);
    }
  });

  it('runningMeanInto agrees with the freshly summed 20-year centred mean of src/metrics to rounding (sliding sums drift by < 1e-13)', () => {
    const values = Float64Array.from({ length: 551 }, (_, i) => Math.sin(i / 7) + i / 200);
    const out = new Float64Array(551);
    runningMeanInto(values, out);
    const theirs = runningMean(values, 20, 'centred');
    expectAllClose(out.subarray(9, 541), theirs.subarray(9, 541), 1e-13);
    expect(Number.isNaN(theirs[8]) && Number.isNaN(out[8]) && Number.isNaN(out[541]) && Number.isNaN(theirs[541])).toBe(true);
  });
});

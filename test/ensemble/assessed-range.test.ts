import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { assessedQuantile, LIKELY_Z, normalRange, pointRange, VERY_LIKELY_Z } from '../../src/ensemble/assessed-range.js';
import { expectClose } from '../asserts.js';

const ecs = { p05: 2, p17: 2.5, p50: 3, p83: 4, p95: 5 };

describe('assessedQuantile', () => {
  it('LIKELY_Z and VERY_LIKELY_Z are the normal scores of the 83rd and 95th percentiles (standard normal tables)', () => {
    expectClose(LIKELY_Z, 0.954165, 1e-6);
    expectClose(VERY_LIKELY_Z, 1.644854, 1e-6);
  });

  it('assessedQuantile hits the five assessed percentiles at their normal scores (definition of the quantile map)', () => {
    expectClose(assessedQuantile(ecs, -VERY_LIKELY_Z), 2, 1e-14);
    expectClose(assessedQuantile(ecs, -LIKELY_Z), 2.5, 1e-14);
    expect(assessedQuantile(ecs, 0)).toBe(3);
    expectClose(assessedQuantile(ecs, LIKELY_Z), 4, 1e-14);
    expectClose(assessedQuantile(ecs, VERY_LIKELY_Z), 5, 1e-14);
  });

  it('assessedQuantile(normalRange(mu, h), z) is the normal quantile mu + z h / 1.645 (a normal is linear in its normal score)', () => {
    const r = normalRange(3.93, 0.47);
    for (let z = -5; z <= 5; z += 0.25) expectClose(assessedQuantile(r, z), 3.93 + (z * 0.47) / VERY_LIKELY_Z, 1e-12, `z = ${z}`);
  });

  it('assessedQuantile never decreases in z and is constant for a point range (quantile functions are monotone)', () => {
    fc.assert(
      fc.property(fc.double({ min: -8, max: 8, noNaN: true }), fc.double({ min: 0, max: 2, noNaN: true }), (z, dz) => {
        expect(assessedQuantile(ecs, z + dz)).toBeGreaterThanOrEqual(assessedQuantile(ecs, z));
        expect(assessedQuantile(pointRange(1.8), z)).toBe(1.8);
      }),
    );
  });
});

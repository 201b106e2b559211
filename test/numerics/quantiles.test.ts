import fc from 'fast-check';
import { quantileSeq } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { quantile as d3quantile } from 'd3-array';
import { quantileSorted, quantilesInPlace, selectInPlace } from '../../src/numerics/quantiles.js';
import { expectClose } from '../asserts.js';

const P = [0, 0.05, 0.17, 0.5, 0.83, 0.95, 1];

describe('quantileSorted', () => {
  it('quantileSorted([1, 2, 3, 4], p) interpolates between order statistics (Hyndman & Fan 1996, definition 7)', () => {
    // h = (n - 1) p: p = 0.5 -> h = 1.5 -> 2.5; p = 0.25 -> h = 0.75 -> 1.75.
    expect(quantileSorted([1, 2, 3, 4], 0.5)).toBe(2.5);
    expect(quantileSorted([1, 2, 3, 4], 0.25)).toBe(1.75);
    expect(quantileSorted([1, 2, 3, 4], 0)).toBe(1);
    expect(quantileSorted([1, 2, 3, 4], 1)).toBe(4);
    expect(quantileSorted([], 0.5)).toBeNaN();
  });

  it('quantileSorted agrees with mathjs quantileSeq (outside reference library, same definition 7)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -1e3, max: 1e3, noNaN: true }), { minLength: 1, maxLength: 60 }), fc.integer({ min: 0, max: 1000 }), (xs, permille) => {
        const p = permille / 1000;
        const sorted = Float64Array.from(xs).sort();
        const theirs = quantileSeq(xs, p) as number;
        // Both interpolate linearly; they may round differently in the last place.
        expectClose(quantileSorted(sorted, p), theirs, 1e-12 * Math.max(1, Math.abs(theirs)));
      }),
    );
  });
});

describe('quantilesInPlace', () => {
  it('quantilesInPlace equals quantileSorted of the sorted sample, bit for bit, for small and bucketed samples (selection finds order statistics exactly)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 1, maxLength: 3000 }),
        fc.integer({ min: 0, max: 5 }),
        (xs, ties) => {
          // Repeated values stress the partitioning.
          const values = Float64Array.from(xs, (x) => (ties > 0 ? Math.round(x / ties) : x));
          const sorted = values.slice().sort();
          const out = new Float64Array(P.length);
          quantilesInPlace(values.slice(), P, out);
          // Equal as numbers (=== does not tell -0 from 0, which compare equal and may swap places).
          P.forEach((p, i) => expect(out[i] === quantileSorted(sorted, p), `p = ${p}`).toBe(true));
        },
      ),
      { numRuns: 200 },
    );
  });

  it('quantilesInPlace on 100,000 values with an outlier and many ties equals the sorted quantiles (many ties, one far outlier)', () => {
    const values = Float64Array.from({ length: 100_000 }, (_, i) => Math.floor(Math.sin(i * 12.9898) * 437.585) / 100);
    values[123] = 1e9;
    const sorted = values.slice().sort();
    const out = new Float64Array(P.length);
    quantilesInPlace(values, P, out);
    P.forEach((p, i) => expect(out[i]).toBe(quantileSorted(sorted, p)));
  });

  it('quantilesInPlace gives NaN for an empty sample', () => {
    const out = new Float64Array(1);
    quantilesInPlace(new Float64Array(0), [0.5], out);
    expect(out[0]).toBeNaN();
  });

  it('quantilesInPlace equals d3-array quantile (outside reference library, the same definition 7), bit for bit, on samples the size of ensembles', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 1, maxLength: 12_000 }), (xs) => {
        const out = new Float64Array(P.length);
        quantilesInPlace(Float64Array.from(xs), P, out);
        P.forEach((p, i) => expect(out[i] === d3quantile(xs, p), `p = ${p}`).toBe(true));
      }),
      { numRuns: 40 },
    );
  });
});

describe('selectInPlace', () => {
  it('selectInPlace places the k-th smallest value at k with none larger before and none smaller after (Floyd & Rivest 1975)', () => {
    fc.assert(
      fc.property(fc.array(fc.integer({ min: -20, max: 20 }), { minLength: 1, maxLength: 2000 }), fc.nat(), (xs, seed) => {
        const a = Float64Array.from(xs);
        const k = seed % a.length;
        selectInPlace(a, k, 0, a.length - 1);
        expect(a[k]).toBe(Float64Array.from(xs).sort()[k]);
        for (let i = 0; i < k; i++) expect(a[i]).toBeLessThanOrEqual(a[k]);
        for (let i = k + 1; i < a.length; i++) expect(a[i]).toBeGreaterThanOrEqual(a[k]);
      }),
      { numRuns: 100 },
    );
  });
});

import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { editDistance, nearestName } from '../../src/io/nearest-name.js';

describe('editDistance (optimal string alignment)', () => {
  it('editDistance(kitten, sitting) is 3 (the textbook Levenshtein example; from memory)', () => {
    expect(editDistance('kitten', 'sitting')).toBe(3);
  });

  it('editDistance(ca, abc) is 3: OSA may not edit a swapped pair again (unrestricted Damerau gives 2; from memory)', () => {
    expect(editDistance('ca', 'abc')).toBe(3);
  });

  it('editDistance counts a swap of adjacent characters as one edit', () => {
    expect(editDistance('n2o_pbb', 'n2o_ppb')).toBe(1);
    expect(editDistance('ab', 'ba')).toBe(1);
  });

  it('editDistance is 0 only for equal strings, symmetric, and between |len a - len b| and max(len)', () => {
    fc.assert(fc.property(fc.string({ maxLength: 12 }), fc.string({ maxLength: 12 }), (a, b) => {
      const d = editDistance(a, b);
      expect(d === 0).toBe(a === b);
      expect(editDistance(b, a)).toBe(d);
      expect(d).toBeGreaterThanOrEqual(Math.abs(a.length - b.length));
      expect(d).toBeLessThanOrEqual(Math.max(a.length, b.length));
    }), { numRuns: 300 });
  });
});

describe('nearestName', () => {
  const columns = ['year', 'date', 'co2_ppm', 'ch4_ppb', 'n2o_ppb', 'co2_gtco2', 'ch4_mt', 'n2o_mt', 'aerosol_wm2'];

  it('nearestName maps typos to the column meant', () => {
    expect(nearestName('co2ppm', columns)).toBe('co2_ppm');
    expect(nearestName('CO2 (ppm)', columns)).toBe('co2_ppm');
    expect(nearestName('aerosols_wm2', columns)).toBe('aerosol_wm2');
    expect(nearestName('Yaer', columns)).toBe('year');
  });

  it('nearestName gives nothing for words that are no plausible typo', () => {
    expect(nearestName('temperature', columns)).toBeUndefined();
    expect(nearestName('gdp', columns)).toBeUndefined();
  });
});

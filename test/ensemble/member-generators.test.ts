import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plus } from 'pure-rand/generator/xoroshiro128plus';
import { describe, expect, it } from 'vitest';
import { memberGenerators } from '../../src/ensemble/member-generators.js';

const draws = (g: { next(): number }, k = 8) => Array.from({ length: k }, () => g.next());

describe('memberGenerators', () => {
  it('memberGenerators(seed, start) gives member i the stream of xoroshiro128plus(seed) after i + 1 jumps (pure-rand), whatever the start', () => {
    const reference = xoroshiro128plus(7);
    const expected: number[][] = [];
    for (let i = 0; i < 12; i++) {
      reference.jump();
      expected.push(draws(reference.clone()));
    }
    const fromZero = memberGenerators(7, 0);
    const fromFive = memberGenerators(7, 5);
    for (let i = 0; i < 12; i++) expect(draws(fromZero())).toEqual(expected[i]);
    for (let i = 5; i < 12; i++) expect(draws(fromFive())).toEqual(expected[i]);
  });

  it('memberGenerators streams differ between members and between seeds, and give uniforms in [0, 1) (pure-rand uniformFloat64)', () => {
    const a = memberGenerators(7, 0);
    const b = memberGenerators(8, 0);
    const seen = new Set<number>();
    for (let i = 0; i < 100; i++) {
      const u = uniformFloat64(a());
      const v = uniformFloat64(b());
      expect(u).toBeGreaterThanOrEqual(0);
      expect(u).toBeLessThan(1);
      expect(u).not.toBe(v);
      seen.add(u);
    }
    expect(seen.size).toBe(100);
  });
});

import { uniformFloat64 } from 'pure-rand/distribution/uniformFloat64';
import { xoroshiro128plusFromState } from 'pure-rand/generator/xoroshiro128plus';
import { describe, expect, it } from 'vitest';
import { memberGenerators, memberState } from '../../src/ensemble/member-generators.js';

const draws = (g: { next(): number }, k = 8) => Array.from({ length: k }, () => g.next());

describe('memberGenerators', () => {
  it('memberGenerators(seed, start) gives member i the pure-rand xoroshiro128+ stream from memberState(seed, i), whatever the start', () => {
    const fromZero = memberGenerators(7, 0);
    const fromFive = memberGenerators(7, 5);
    for (let i = 0; i < 12; i++) expect(draws(fromZero())).toEqual(draws(xoroshiro128plusFromState(memberState(7, i))));
    for (let i = 5; i < 12; i++) expect(draws(fromFive())).toEqual(draws(xoroshiro128plusFromState(memberState(7, i))));
    // A member far down the list costs nothing to reach and is still its own stream.
    expect(draws(memberGenerators(7, 999_999)())).toEqual(draws(xoroshiro128plusFromState(memberState(7, 999_999))));
  });

  it('memberState gives every member its own value of every state word (fmix32 is one-to-one), also above 2^32', () => {
    for (let w = 0; w < 4; w++) {
      const seen = new Set<number>();
      for (let i = 0; i < 100_000; i++) seen.add(memberState(7, i)[w]);
      expect(seen.size).toBe(100_000);
    }
    expect(memberState(7, 2 ** 32)).not.toEqual(memberState(7, 0));
    expect(memberState(8, 0)).not.toEqual(memberState(7, 0));
  });

  it('the first uniform (pure-rand uniformFloat64) of 100,000 consecutive members has mean 1/2 and no correlation between neighbours, within 4 standard errors', () => {
    const m = 100_000;
    const u = new Float64Array(m);
    const next = memberGenerators(7, 0);
    for (let i = 0; i < m; i++) u[i] = uniformFloat64(next());
    let mean = 0;
    for (const v of u) mean += v / m;
    // Uniform on [0, 1): variance 1/12, so the standard error of the mean is sqrt(1 / (12 m)).
    expect(Math.abs(mean - 0.5)).toBeLessThan(4 * Math.sqrt(1 / (12 * m)));
    let lag = 0;
    for (let i = 1; i < m; i++) lag += (u[i] - 0.5) * (u[i - 1] - 0.5);
    // Lag-1 correlation of independent draws: mean 0, standard error about 1 / sqrt(m).
    expect(Math.abs(lag / (m - 1) / (1 / 12))).toBeLessThan(4 / Math.sqrt(m));
    for (const v of u) expect(v >= 0 && v < 1).toBe(true);
  });

  it('memberGenerators streams differ between seeds', () => {
    const a = memberGenerators(7, 0);
    const b = memberGenerators(8, 0);
    for (let i = 0; i < 100; i++) expect(uniformFloat64(a())).not.toBe(uniformFloat64(b()));
  });
});

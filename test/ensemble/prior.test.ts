import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { expectClose } from '../asserts.js';
import { ensemblePrior, forcingScaleRange, memberParameterKeys, PHYSICS_PRIOR, rangeFrom3, samplePrior } from '../../src/ensemble/prior.js';

/** Columns of an AR6 ERF file (the shared copy of IPCC AR6 WG1 Annex III; Smith et al. 2021). */
function ar6Column(file: string, name: string): number[] {
  const lines = readFileSync(`/work/shared/data/${file}`, 'utf8').trim().split('\n');
  const j = lines[0].split(',').indexOf(name);
  return lines.slice(1).map((l) => Number(l.split(',')[j]));
}

const prior = ensemblePrior([
  { agent: 'co2', range: rangeFrom3(0.88, 1, 1.12), source: 'test' },
  { agent: 'aerosol', range: rangeFrom3(0.2, 1, 2), source: 'test' },
]);

describe('forcingScaleRange', () => {
  it('gives 0.88-1.12 for CO2: the AR6 5-95 % CO2 ERF is the best estimate times 0.88 and 1.12 (AR6 ERF files)', () => {
    const r = forcingScaleRange(ar6Column('ar6-erf-1750-2019.csv', 'co2'), ar6Column('ar6-erf-1750-2019-p05.csv', 'co2'), ar6Column('ar6-erf-1750-2019-p95.csv', 'co2'));
    expectClose(r.p05, 0.88, 1e-3, 'p05');
    expectClose(r.p95, 1.12, 1e-3, 'p95');
    expect(r.p50).toBe(1);
  });

  it('orders the ends of a negative agent and widens both distances from 1', () => {
    const r = forcingScaleRange([-1, -2], [-1.5, -3], [-0.5, -1], 2);
    expectClose(r.p05, 0, 1e-12, 'p05');
    expectClose(r.p95, 2, 1e-12, 'p95');
  });
});

describe('samplePrior', () => {
  it('gives the same members for the same seed, and a slice equals the same members of the whole', () => {
    const whole = samplePrior(11, 50, prior);
    const again = samplePrior(11, 50, prior);
    const slice = samplePrior(11, 20, prior, 30);
    for (const key of memberParameterKeys(['co2', 'aerosol'])) {
      expect(Array.from(again[key]!)).toEqual(Array.from(whole[key]!));
      expect(Array.from(slice[key]!)).toEqual(Array.from(whole[key]!.subarray(30)));
    }
    expect(Array.from(samplePrior(12, 50, prior).feedback_wm2k)).not.toEqual(Array.from(whole.feedback_wm2k));
  });

  it('reproduces the prior median and 5-95 % of the feedback within sampling error (20,000 draws; truncation at 0.2 W m-2 K-1 is below the 5th percentile)', () => {
    const lambda = Float64Array.from(samplePrior(3, 20_000, prior).feedback_wm2k).sort();
    const q = PHYSICS_PRIOR[0].range;
    // Standard error of a sample quantile p: sqrt(p(1-p)/n)/density, about 0.005-0.01 here; 0.03 is 3-6 of them.
    expectClose(lambda[10_000], q.p50, 0.03, 'median');
    expectClose(lambda[1000], q.p05, 0.03, 'p05');
    expectClose(lambda[19_000], q.p95, 0.03, 'p95');
    expect(lambda[0]).toBeGreaterThan(0.2);
  });
});

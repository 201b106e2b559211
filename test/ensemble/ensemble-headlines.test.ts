import { describe, expect, it } from 'vitest';
import { ensembleHeadlines, runEnsemble } from '../../src/ensemble/index.js';
import { syntheticInput } from './synthetic-input.js';

const options = { seed: 5, baseline: [1850, 1900] as const };

describe('ensembleHeadlines', () => {
  it('ensembleHeadlines restates the result: crossing probabilities by milestone, median crossing year, share above at the start, ECS/TCR percentiles, correlation', async () => {
    const r = await runEnsemble(syntheticInput(), { ...options, members: 300, thresholds: [1.5, 2, 0.01, 6], keepMembers: true });
    const h = ensembleHeadlines(r);
    expect(h).toMatchObject({ members: 300, seed: 5, baseline: '1850-1900', first_window: '1750-1769', last_year: 2150 });
    expect(h.thresholds.map((t) => t.threshold_k)).toEqual([1.5, 2, 0.01, 6]);
    r.crossings.forEach((x, j) => {
      const t = h.thresholds[j];
      expect(t.probability_crossed_by).toEqual({ 2050: x.byMilestone[0].probability, 2100: x.byMilestone[1].probability });
      expect(t.above_at_start).toBe(x.aboveAtStart);
    });
    expect(h.thresholds[0]).toMatchObject({ median_crossing: 'crosses', median_crossing_year: r.crossings[0].medianYear });
    // 6 K is out of reach of the synthetic pathway's members.
    expect(h.thresholds[3]).toMatchObject({ median_crossing: 'fewer-than-half-cross', median_crossing_year: null });
    expect(h.sampled.ecs_k).toEqual({ p05: r.parameters.ecs_k.p05, p17: r.parameters.ecs_k.p17, p50: r.parameters.ecs_k.p50, p83: r.parameters.ecs_k.p83, p95: r.parameters.ecs_k.p95 });
    expect(h.sampled.tcr_k.p50).toBe(r.parameters.tcr_k.p50);
    expect(h.sampled.irf100_scale).toBeUndefined();
    expect(h.ecs_tcr_correlation).toBe(r.ecsTcrCorrelation);
    // JSON has no NaN or Infinity: the headlines must survive a round trip unchanged.
    expect(JSON.parse(JSON.stringify(h))).toEqual(h);
  });

  it('ensembleHeadlines gives no median crossing year when at least half of the members are above the level at the start', async () => {
    const r = await runEnsemble(syntheticInput(), { ...options, members: 200, thresholds: [0.5] });
    const at = (aboveAtStart: number) => ensembleHeadlines({ ...r, crossings: [{ ...r.crossings[0], medianYear: 1759, aboveAtStart }] }).thresholds[0];
    expect(at(0.5)).toMatchObject({ median_crossing: 'already-above-at-start', median_crossing_year: null, above_at_start: 0.5 });
    expect(at(0.495)).toMatchObject({ median_crossing: 'crosses', median_crossing_year: 1759, above_at_start: 0.495 });
  });

  it('ensembleHeadlines has a null ECS-TCR correlation below 3 members, and the carbon-cycle multiplier only for emission-driven ensembles', async () => {
    for (const members of [1, 2]) {
      const r = await runEnsemble(syntheticInput(), { ...options, members, thresholds: [1.5] });
      expect(ensembleHeadlines(r).ecs_tcr_correlation).toBeNull();
    }
    const r = await runEnsemble(syntheticInput(), { ...options, members: 3, thresholds: [1.5] });
    expect(ensembleHeadlines(r).ecs_tcr_correlation).toBe(r.ecsTcrCorrelation);
    const emission = { ...r, config: { ...r.config, emissionDriven: true } };
    expect(ensembleHeadlines(emission).sampled.irf100_scale).toEqual({ p05: 1, p17: 1, p50: 1, p83: 1, p95: 1 });
  });
});

import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/calibrate.js';
import { AR6_SAMPLING, pointRange, runEnsemble, shardToJson, type EnsembleSampling } from '../../src/ensemble/index.js';
import { loadPathway } from '../../src/io/index.js';
import { ensembleInput } from '../../src/projection/ensemble-input.js';
import { projectPathway } from '../../src/projection/project-pathway.js';

const params = calibrate();
const pathway = loadPathway('swift-emissions');
const { input } = ensembleInput(pathway, params);
const years = pathway.years;
const n = years.length;
const at = (y: number) => y - years[0];
const options = { seed: 11, thresholds: [1.5, 2], baseline: [1850, 1900] as const, keepMembers: true };

/** The single run's warming (runEmissionDriven, the same production carbon step as the members). */
function deterministicWarming(): Float64Array {
  return projectPathway(pathway, { params }).columns.warming_k;
}

const central = (irf100Scale: EnsembleSampling['irf100Scale']): EnsembleSampling => ({
  ...AR6_SAMPLING,
  ecsK: pointRange(params.ecsK),
  tcrK: pointRange(params.tcrK),
  forcing2xScale: pointRange(params.forcing2xWm2 / 3.934168323890023),
  aerosolScale: pointRange(1),
  irf100Scale,
});

describe('runEnsemble on an emission pathway', () => {
  it('a member with the central climate and carbon multiplier 1 equals the single run (runEmissionDriven; to 1e-9 K)', async () => {
    const r = await runEnsemble(input, { ...options, members: 2, sampling: central(pointRange(1)) });
    const ref = deterministicWarming();
    for (let k = 0; k < n; k++) expect(Math.abs(r.members!.warmingK[k * 2] - ref[k])).toBeLessThan(1e-9);
  });

  it('a wider carbon-cycle spread widens the 2100 warming range (more uptake uncertainty, more warming uncertainty)', async () => {
    const narrow = await runEnsemble(input, { ...options, members: 400, sampling: central(pointRange(1)) });
    const wide = await runEnsemble(input, { ...options, members: 400, sampling: central({ p05: 0.7, p17: 0.85, p50: 1, p83: 1.15, p95: 1.3 }) });
    const k = at(2100);
    const spread = (x: typeof narrow) => x.percentiles.p95[k] - x.percentiles.p05[k];
    expect(spread(narrow)).toBeLessThan(1e-9);
    expect(spread(wide)).toBeGreaterThan(0.05);
    // A larger iIRF100 keeps more CO2 airborne: warming rises with the multiplier (Millar et al. 2017, eq. 7).
    const p = wide.members!.parameters.values.irf100_scale!;
    const hi = p.indexOf(Math.max(...p));
    const lo = p.indexOf(Math.min(...p));
    expect(wide.members!.warmingK[k * 400 + hi]).toBeGreaterThan(wide.members!.warmingK[k * 400 + lo]);
  });

  it('the same seed gives the same bytes (shard file of the whole ensemble)', async () => {
    const a = await runEnsemble(input, { ...options, members: 50 });
    const b = await runEnsemble(input, { ...options, members: 50 });
    expect(shardToJson(a.members!)).toBe(shardToJson(b.members!));
    expect(a.config.emissionDriven).toBe(true);
    expect(a.parameters.irf100_scale.p95).toBeGreaterThan(a.parameters.irf100_scale.p05);
  });

  it('shards of an emission ensemble merge into exactly the whole run', async () => {
    const { mergeShards, shardFromJson, summarizeEnsemble } = await import('../../src/ensemble/index.js');
    const whole = await runEnsemble(input, { ...options, members: 30 });
    const parts = await Promise.all([1, 2, 3].map((index) => runEnsemble(input, { ...options, members: 30, shard: { index, count: 3 } })));
    const merged = summarizeEnsemble(mergeShards(parts.map((p, i) => ({ file: `s${i}.json`, members: shardFromJson(shardToJson(p.members!), `s${i}.json`) }))));
    expect(merged.members!.warmingK).toEqual(whole.members!.warmingK);
    expect(merged.percentiles.p50).toEqual(whole.percentiles.p50);
  });
});

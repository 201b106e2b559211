// The README's library example, run as written.
import { describe, expect, it } from 'vitest';
import { calibrate, ensembleInput, forcingByAgent, loadPathway, projectPathway, runEmissionDriven, runEnsemble, comparePathways } from '../src/index.js';

describe('library surface (README example)', () => {
  it('loads a bundled pathway, calibrates, projects, and reads warming in 2100', () => {
    const pathway = loadPathway('swift');
    const params = calibrate({ ecsK: 3, tcrK: 1.8 });
    const run = projectPathway(pathway, { params });
    const y2100 = run.columns.warming_k[2100 - run.years[0]];
    expect(y2100).toBeGreaterThan(1);
    expect(y2100).toBeLessThan(3);
    expect(typeof forcingByAgent).toBe('function');
    expect(typeof runEmissionDriven).toBe('function');
    expect(typeof runEnsemble).toBe('function');
    expect(typeof comparePathways).toBe('function');
  });

  it('runs an ensemble of the same pathway with the defaults the README states: thresholds 1.5, 2, 3 K, baseline 1850-1900', async () => {
    const pathway = loadPathway('swift');
    const params = calibrate({ ecsK: 3, tcrK: 1.8 });
    const { input } = ensembleInput(pathway, params);
    const ens = await runEnsemble(input, { members: 200, seed: 7 });
    expect(ens.crossings.map((x) => x.thresholdK)).toEqual([1.5, 2, 3]);
    expect(ens.config.baseline).toEqual([1850, 1900]);
    const i = 2100 - ens.years[0];
    expect(ens.percentiles.p05[i]).toBeLessThan(ens.percentiles.p95[i]);
    expect(ens.crossings[1].byMilestone.map((m) => m.year)).toEqual([2050, 2100]);
  });
});


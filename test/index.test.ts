// The README's library example, run as written.
import { describe, expect, it } from 'vitest';
import { calibrate, forcingByAgent, loadPathway, projectPathway, runEmissionDriven, runEnsemble, comparePathways } from '../src/index.js';

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
});

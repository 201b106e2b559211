import { describe, expect, it } from 'vitest';
import { calibrate } from '../../src/climate/calibrate.js';
import { FORCING_AGENTS } from '../../src/forcing/agents.js';
import { readPathway } from '../../src/io/load-pathway.js';
import { attributeWarming } from '../../src/metrics/attribution.js';
import { projectPathway } from '../../src/projection/project-pathway.js';
import { expectAllClose } from '../asserts.js';

describe('attributeWarming', () => {
  it('the parts add up to the run\'s warming_k in every year (linearity of the two-box model, Geoffroy et al. 2013)', () => {
    const params = calibrate();
    const p = projectPathway(readPathway('delayed').pathway, { params, method: 'exact' });
    const forcing = Object.fromEntries(FORCING_AGENTS.map((a) => [a, p.columns[`forcing_${a}_wm2`]]));
    const a = attributeWarming(params, p.years, forcing);
    expectAllClose(a.totalK, p.columns.warming_k, 1e-9, 'sum of parts vs warming_k');
    expect(a.agents).toEqual([...FORCING_AGENTS]);
  });
});

import { describe, expect, it } from 'vitest';
import { ensembleTable, probAboveColumn, runEnsemble } from '../../src/ensemble/index.js';
import { syntheticInput } from './synthetic-input.js';

describe('ensembleTable', () => {
  it('ensembleTable lists year, warming_p05_k .. warming_p95_k, then crossed_by_<t> and prob_above_<t> per threshold (DESIGN.md)', async () => {
    const r = await runEnsemble(syntheticInput(1850, 2100), { members: 40, seed: 1, thresholds: [1.5, 2, 3, 0.25], baseline: [1850, 1900] });
    const t = ensembleTable(r);
    expect(t.columns).toEqual([
      'year',
      'warming_p05_k',
      'warming_p17_k',
      'warming_p50_k',
      'warming_p83_k',
      'warming_p95_k',
      'crossed_by_1.5',
      'prob_above_1.5',
      'crossed_by_2',
      'prob_above_2',
      'crossed_by_3',
      'prob_above_3',
      'crossed_by_0.25',
      'prob_above_0.25',
    ]);
    expect(t.values['crossed_by_2']).toBe(r.crossedBy[1]);
    expect(t.values.year[0]).toBe(1850);
    expect(t.values.warming_p50_k).toBe(r.percentiles.p50);
    expect(t.values['prob_above_0.25']).toBe(r.probAbove[3]);
    expect(probAboveColumn(1.5)).toBe('prob_above_1.5');
  });
});

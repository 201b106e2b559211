import { describe, expect, it } from 'vitest';
import { closeTo, PUBLISHED_CHECKS, runPublishedChecks, withinRange } from '../../src/verify/index.js';

describe('runPublishedChecks', () => {
  const rows = runPublishedChecks();

  it('every published check passes with the default model (the values the reference tests check, each with its source)', () => {
    for (const row of rows) {
      expect(row.pass, `${row.check}: ${row.warmcast} (${row.published}, ${row.tolerance})`).toBe(true);
      expect(row.source.length, row.check).toBeGreaterThan(0);
    }
  });

  it('covers forcing, the two-box analytic solution, the calibration round trip, Joos et al. 2013, the carbon cycle and the history', () => {
    const ids = PUBLISHED_CHECKS.map((c) => c.id);
    for (const id of ['forcing-2019', 'two-box-analytic', 'two-box-odex', 'calibration-round-trip', 'joos-2013-pulse', 'historical-emissions', 'tcre', 'zec50', 'ar6-erf-history', 'history-observed', 'hadcrut5-fit']) expect(ids).toContain(id);
    expect(new Set(ids).size).toBe(ids.length);
  });

  it('a check that throws gives one failing row naming it, and the others still run', () => {
    const out = runPublishedChecks([
      { id: 'broken', run: () => { throw new Error('no data'); } },
      { id: 'fine', run: () => [closeTo('x', 'test', 1, 1, 0, '', 0)] },
    ]);
    expect(out.map((r) => [r.check, r.pass])).toEqual([['broken', false], ['x', true]]);
    expect(out[0].warmcast).toMatch(/no data/);
  });
});

describe('withinRange / closeTo', () => {
  it('include the ends of the range and the tolerance, and fail outside them', () => {
    expect(withinRange('a', 's', '1 [0-2]', 2, 0, 2, 'K', 1).pass).toBe(true);
    expect(withinRange('a', 's', '1 [0-2]', 2.01, 0, 2, 'K', 1).pass).toBe(false);
    expect(withinRange('a', 's', '1 [0-2]', NaN, 0, 2, 'K', 1).pass).toBe(false);
    expect(closeTo('b', 's', 1.005, 1, 0.005, 'K', 3).pass).toBe(true);
    expect(closeTo('b', 's', 1.0051, 1, 0.005, 'K', 3).pass).toBe(false);
    expect(closeTo('b', 's', NaN, 1, 0.005, 'K', 3).pass).toBe(false);
  });
});

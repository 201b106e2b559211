import { describe, expect, it } from 'vitest';
import { memberFigures } from '../../src/batch/assess-scenario.js';
import type { EnsembleResult } from '../../src/ensemble/index.js';

/** A result holding only what memberFigures reads: years and year-major member warming. */
function fakeResult(firstYear: number, rows: number[][]): EnsembleResult {
  const m = rows[0].length;
  const warmingK = Float64Array.from(rows.flat());
  return { years: Float64Array.from(rows, (_, k) => firstYear + k), memberCount: m, members: { warmingK } } as unknown as EnsembleResult;
}

describe('memberFigures', () => {
  it('takes each member\'s peak over 2001-2100 only (a warmer 2000 or 2101 does not count), the first year on ties, and its 2100 warming', () => {
    // Years 2000, 2001, 2050, ..., as consecutive rows: build 1999..2101.
    const years = Array.from({ length: 103 }, (_, k) => 1999 + k);
    const rows = years.map((y) => [y === 2000 ? 9 : y === 2101 ? 9 : y === 2050 || y === 2060 ? 2 : 1, y === 2100 ? 3 : 0.5]);
    const f = memberFigures(fakeResult(1999, rows));
    expect(Array.from(f.peakK)).toEqual([2, 3]);
    expect(Array.from(f.peakYear)).toEqual([2050, 2100]);
    expect(Array.from(f.warming2100K!)).toEqual([1, 3]);
  });

  it('gives no 2100 warming for a run that ends before 2100', () => {
    const f = memberFigures(fakeResult(2090, [[1], [1.2], [1.1]]));
    expect(f.warming2100K).toBeUndefined();
    expect(Array.from(f.peakYear)).toEqual([2091]);
  });
});

import { describe, expect, it } from 'vitest';
import { tableColumns } from '../../src/io/table.js';

describe('tableColumns', () => {
  const years = Float64Array.of(2030, 2030);
  const warming = Float64Array.of(1.5, 1.6);
  const names = ['swift', 'delayed'];

  it('tableColumns reads data holding only the number columns, in column order', () => {
    const t = tableColumns({ columns: ['pathway', 'year', 'warming_k'], data: [years, warming], textColumns: { pathway: names } });
    expect(t.rows).toBe(2);
    expect(t.columns.map((c) => [c.name, c.kind, [...c.values]])).toEqual([
      ['pathway', 'text', names], ['year', 'number', [2030, 2030]], ['warming_k', 'number', [1.5, 1.6]],
    ]);
  });

  it('tableColumns reads data aligned index for index with columns (text slots ignored)', () => {
    const t = tableColumns({
      columns: ['year', 'pathway', 'warming_k'],
      data: [years, new Float64Array(0), warming],
      textColumns: { pathway: names },
    });
    expect(t.columns.map((c) => c.kind)).toEqual(['number', 'text', 'number']);
    expect([...t.columns[2].values]).toEqual([1.5, 1.6]);
  });

  it('tableColumns throws RangeError on malformed tables', () => {
    expect(() => tableColumns({ columns: ['a', 'a'], data: [years, years] })).toThrow(RangeError);
    expect(() => tableColumns({ columns: ['a', 'b'], data: [years] })).toThrow('table.data must hold 2 or 2 arrays, not 1');
    expect(() => tableColumns({ columns: ['a', 'b'], data: [years, Float64Array.of(1)] })).toThrow('table column "b" has 1 rows, expected 2');
    expect(() => tableColumns({ columns: ['a'], data: [years], textColumns: { b: names } })).toThrow('text column "b" must be listed');
  });
});

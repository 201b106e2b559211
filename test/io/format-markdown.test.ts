import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatMarkdown } from '../../src/io/format-markdown.js';

/** Splits a pipe-table line into trimmed cells (no escaped pipes in these tables). */
const cells = (line: string) => line.slice(2, -2).split(' | ').map((c) => c.trim());

describe('formatMarkdown', () => {
  it('formatMarkdown writes an aligned pipe table: right-aligned numbers, left-aligned text, year without decimals', () => {
    const md = formatMarkdown({
      columns: ['pathway', 'year', 'share'],
      data: [Float64Array.of(2030, 2050), Float64Array.of(1.5234, 2.1)],
      textColumns: { pathway: ['swift', 'delayed'] },
    }, 2);
    expect(md).toBe(
      '| pathway | year | share |\n'
      + '| :------ | ---: | ----: |\n'
      + '| swift   | 2030 |  1.52 |\n'
      + '| delayed | 2050 |  2.10 |\n',
    );
  });

  it('formatMarkdown rounds by the unit in a column\'s name (ppm 2, K and W m-2 3, Gt CO2 2), whatever the default digits', () => {
    const columns = ['year', 'co2_ppm', 'ch4_ppb', 'warming_k', 'warming_p05_k', 'forcing_wm2', 'co2_gtco2', 'ch4_mt', 'airborne_fraction', 'prob_above_1.5'];
    const md = formatMarkdown({ columns, data: [2020, 412.44, 1878.7234, 1.23456, 0.98765, 2.71828, 39.1234, 380.26, 0.44444, 0.12345].map((x) => Float64Array.of(x)) }, 4);
    expect(md.split('\n')[2].split('|').slice(1, -1).map((c) => c.trim())).toEqual(
      ['2020', '412.44', '1878.72', '1.235', '0.988', '2.718', '39.12', '380.26', '0.444', '0.1235'],
    );
  });

  it('formatMarkdown numbers parse back to the values rounded to the printed digits (property)', () => {
    fc.assert(fc.property(
      fc.array(fc.double({ min: -1e6, max: 1e6, noNaN: true }), { minLength: 1, maxLength: 30 }),
      fc.integer({ min: 0, max: 6 }),
      (xs, digits) => {
        const values = Float64Array.from(xs);
        const lines = formatMarkdown({ columns: ['value'], data: [values] }, digits).trimEnd().split('\n');
        const width = lines[0].length;
        for (const line of lines) expect(line.length).toBe(width);
        values.forEach((x, i) => {
          const printed = cells(lines[i + 2])[0];
          expect(printed.split('.')[1]?.length ?? 0).toBe(digits);
          // toFixed rounds the exact binary value (ECMA-262 Number.prototype.toFixed); 0 == -0 here.
          expect(Number(printed) === Number(x.toFixed(digits))).toBe(true);
        });
      },
    ), { numRuns: 200 });
  });

  it('formatMarkdown prints NaN as an empty cell and a value rounding to zero without a minus sign', () => {
    const md = formatMarkdown({ columns: ['x'], data: [Float64Array.of(NaN, -0.0001, -0.0006)] }, 3);
    expect(md.split('\n').slice(2, 5).map(cells)).toEqual([[''], ['0.000'], ['-0.001']]);
  });

  it('formatMarkdown escapes pipes and flattens line breaks in text, and takes per-column digits', () => {
    const md = formatMarkdown({
      columns: ['note', 'co2_ppm'],
      data: [Float64Array.of(415.26)],
      textColumns: { note: ['a|b\nc'] },
    }, 3, { co2_ppm: 1 });
    expect(md.split('\n')[2]).toBe('| a\\|b c |   415.3 |');
  });
});

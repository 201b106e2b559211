/**
 * Properties of putting a pathway on the annual grid (toAnnual) and writing it out (csvText):
 *
 * - the annual pathway written as CSV and read again gives the same annual values, bit for bit
 *   (csvText writes each number as its shortest round-trip text, ECMAScript Number::toString, and
 *   an annual file needs no interpolation);
 * - sub-sampling the annual values at the original rows (whole years) gives back the original rows,
 *   bit for bit, because linear interpolation passes through its nodes;
 * - every interpolated value lies between the values of the two rows around it (linear interpolation
 *   is a convex combination of its neighbours).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { parsePathway, toAnnual } from '../../src/io/index.js';
import { csvText } from '../../src/report/write-csv.js';
import type { Pathway, PathwayColumn } from '../../src/pathway.js';
import { expectAllClose } from '../asserts.js';
import { pathwayCsv, pathwayRows, readAnnual, type PathwayRows } from './pathway-arbitraries.js';

/** The annual pathway as a table for csvText: `year` then its series. */
function annualCsv(p: Pathway): string {
  const columns = Object.keys(p.series) as PathwayColumn[];
  return csvText({ name: 'data', columns: [{ key: 'year', values: p.years }, ...columns.map((c) => ({ key: c, values: p.series[c]! }))] });
}

function expectSameSeries(actual: Pathway, expected: Pathway): void {
  expectAllClose(actual.years, expected.years, 0, 'years');
  expect(Object.keys(actual.series)).toEqual(Object.keys(expected.series));
  for (const c of Object.keys(expected.series) as PathwayColumn[]) expectAllClose(actual.series[c]!, expected.series[c]!, 0, c);
}

describe('toAnnual and csvText round trips (fast-check, seed 42)', () => {
  it('toAnnual(parsePathway(csvText(toAnnual(random file)))) has the same years and values, exactly, and no interpolation note', () => {
    fc.assert(
      fc.property(pathwayRows(), (rows) => {
        const annual = readAnnual(pathwayCsv(rows));
        const again = toAnnual(parsePathway(annualCsv(annual), 'annual.csv'));
        expectSameSeries(again, annual);
        expect(again.provenance.notes).toEqual([]);
      }),
      { seed: 42, numRuns: 300 },
    );
  });

  it('the annual values of a whole-year file, sub-sampled at its rows, are its rows exactly (and re-interpolate to the same annual values)', () => {
    fc.assert(
      fc.property(pathwayRows({ decimalStart: false }), (rows) => {
        const parsed = parsePathway(pathwayCsv(rows), 'rows.csv');
        const annual = toAnnual(parsed);
        const sub: PathwayRows = { times: rows.times, columns: {} };
        for (const c of Object.keys(annual.series) as PathwayColumn[]) {
          sub.columns[c] = rows.times.map((t) => annual.series[c]![t - annual.years[0]]);
        }
        const reparsed = parsePathway(pathwayCsv(sub), 'sub.csv');
        expectAllClose(reparsed.times, parsed.times, 0, 'times');
        for (const c of Object.keys(parsed.columns) as PathwayColumn[]) expectAllClose(reparsed.columns[c]!, parsed.columns[c]!, 0, c);
        expectSameSeries(toAnnual(reparsed), annual);
      }),
      { seed: 42, numRuns: 300 },
    );
  });

  it('toAnnual(random file): each annual value lies between the values of the rows around its year', () => {
    fc.assert(
      fc.property(pathwayRows(), (rows) => {
        const annual = readAnnual(pathwayCsv(rows));
        const t = rows.times;
        const outside: string[] = [];
        annual.years.forEach((year, i) => {
          // Rows bracketing the year (the end rows for a year up to a day outside them, see toAnnual).
          let k = 0;
          while (k < t.length - 2 && t[k + 1] <= year) k++;
          for (const c of Object.keys(annual.series) as PathwayColumn[]) {
            const v = annual.series[c]![i];
            const [a, b] = [rows.columns[c]![k], rows.columns[c]![k + 1]];
            if (!(v >= Math.min(a, b) && v <= Math.max(a, b))) outside.push(`${c} in ${year}: ${v} outside [${a}, ${b}]`);
          }
        });
        expect(outside).toEqual([]);
      }),
      { seed: 42, numRuns: 300 },
    );
  });
});

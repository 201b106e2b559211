import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors.js';
import { isoDateToYear } from '../../src/io/iso-date-year.js';
import { parsePathway } from '../../src/io/parse-pathway.js';
import { toAnnual } from '../../src/io/to-annual.js';
import { expectAllClose, expectClose } from '../asserts.js';

const awkward = (name: string) => {
  const path = fileURLToPath(new URL(`../fixtures/awkward/${name}`, import.meta.url));
  return parsePathway(readFileSync(path, 'utf8'), `awkward/${name}`);
};

describe('toAnnual', () => {
  it('toAnnual(awkward/year-gaps.csv) interpolates 5- and 10-year gaps linearly (hand-computed values)', () => {
    const p = toAnnual(awkward('year-gaps.csv'));
    expect(p.years[0]).toBe(2025);
    expect(p.years.length).toBe(26);
    const at = (y: number) => p.series.co2_gtco2![y - 2025];
    // Between (2025, 40) and (2030, 35): 40 - 5 * 2/5 = 38 in 2027.
    expect(at(2027)).toBe(38);
    // Between (2030, 35) and (2040, 20): 35 - 15 * 3/10 = 30.5 in 2033.
    expect(at(2033)).toBe(30.5);
    // Between (2040, 20) and (2050, 0): 10 in 2045.
    expect(at(2045)).toBe(10);
    // Rows land exactly on their years.
    expect([at(2025), at(2030), at(2040), at(2050)]).toEqual([40, 35, 20, 0]);
    // Between (2030, 9.5) and (2040, 8): 9.5 - 1.5 * 7/10 = 8.45 in 2037 (rounding of one step: 1 ulp-scale).
    expectClose(p.series.n2o_mt![2037 - 2025], 8.45, 1e-12, 'n2o_mt 2037');
    expect(p.provenance).toEqual({
      source: 'awkward/year-gaps.csv',
      notes: ['interpolated linearly from 4 rows (irregular steps of 5 to 10 years) to 26 annual values'],
    });
    expect(p.name).toBe('Emission steps');
  });

  it('toAnnual on 26 rows in 5-year steps 2025-2150 gives 126 annual values and says so', () => {
    const rows = Array.from({ length: 26 }, (_, i) => `${2025 + 5 * i},${420 + 2 * i}`).join('\n');
    const p = toAnnual(parsePathway(`year,co2_ppm\n${rows}\n`, 'steps.csv'));
    expect(p.years.length).toBe(126);
    expect(p.years[125]).toBe(2150);
    // Row i is (2025 + 5i, 420 + 2i): between (2145, 468) and (2150, 470), 468 + 2 * 4/5 = 469.6 in 2149.
    expectClose(p.series.co2_ppm![124], 469.6, 1e-12, '2149');
    expect(p.provenance.notes).toEqual(['interpolated linearly from 26 rows (5-year steps) to 126 annual values']);
  });

  it('toAnnual(awkward/decimal-years.csv) puts mid-year rows 2025.5..2027.5 on 2026 and 2027 (midpoints 421, 423)', () => {
    const p = toAnnual(awkward('decimal-years.csv'));
    expect(Array.from(p.years)).toEqual([2026, 2027]);
    expect(Array.from(p.series.co2_ppm!)).toEqual([421, 423]);
    expect(p.provenance.notes).toEqual(['interpolated linearly from 3 rows (1-year steps) to 2 annual values']);
  });

  it('toAnnual(awkward/dates.csv) gives 2030-2032 exactly the rows\' values: mid-year dates need no interpolation, leap year included', () => {
    const p = toAnnual(awkward('dates.csv'));
    expect(Array.from(p.years)).toEqual([2030, 2031, 2032]);
    expect(Array.from(p.series.co2_ppm!)).toEqual([440, 442, 444]);
    expect(p.provenance.notes).toEqual([]);
  });

  it('toAnnual of 1 July dates (2020-07-01, 2030-07-01, 2040-07-01) gives 2030 exactly 440, not 440.004, and 2025 exactly 430', () => {
    const p = toAnnual(parsePathway('date,co2_ppm\n2020-07-01,420\n2030-07-01,440\n2040-07-01,460\n', 'july.csv'));
    expect(p.years[0]).toBe(2020);
    expect(p.years[p.years.length - 1]).toBe(2040);
    expect(p.series.co2_ppm![2030 - 2020]).toBe(440);
    expect(p.series.co2_ppm![2025 - 2020]).toBe(430);
  });

  it('toAnnual copies a file already on consecutive whole years unchanged, with no note', () => {
    const parsed = parsePathway('year,co2_ppm,solar_wm2\n2025,420.1,0.01\n2026,422.3,-0.02\n', 'annual.csv');
    const p = toAnnual(parsed);
    expect(Array.from(p.series.co2_ppm!)).toEqual([420.1, 422.3]);
    expect(Array.from(p.series.solar_wm2!)).toEqual([0.01, -0.02]);
    expect(p.provenance.notes).toEqual([]);
  });

  it('toAnnual reproduces a straight line exactly at every year, for any row spacing (property)', () => {
    fc.assert(fc.property(
      fc.uniqueArray(fc.integer({ min: 0, max: 400 }), { minLength: 2, maxLength: 20 }),
      fc.double({ min: -5, max: 5, noNaN: true }),
      (quarters, slope) => {
        const times = quarters.sort((a, b) => a - b).map((q) => 2000 + q / 4);
        const line = (t: number) => 1000 + slope * (t - 2000); // stays within 500-1500 ppm
        const text = `year,co2_ppm\n${times.map((t) => `${t},${line(t)}`).join('\n')}\n`;
        const parsed = parsePathway(text, 'line.csv');
        if (Math.ceil(times[0]) > Math.floor(times[times.length - 1])) {
          expect(() => toAnnual(parsed)).toThrow(InputError);
          return;
        }
        const p = toAnnual(parsed);
        expect(p.years[0]).toBe(Math.ceil(times[0]));
        expect(p.years[p.years.length - 1]).toBe(Math.floor(times[times.length - 1]));
        expectAllClose(p.series.co2_ppm!, Array.from(p.years, line), 1e-9, 'straight line');
      },
    ), { numRuns: 200 });
  });

  it('toAnnual refuses rows that span no whole year', () => {
    const parsed = parsePathway('year,co2_ppm\n2030.2,440\n2030.7,441\n', 'short.csv');
    expect(() => toAnnual(parsed)).toThrow(InputError);
    expect(() => toAnnual(parsed)).toThrow('short.csv:2: column "year": must span at least one whole year: the rows run from 2030.2 to 2030.7');
  });

  it('toAnnual of a single row on a whole year gives that one year', () => {
    const p = toAnnual(parsePathway('year,co2_ppm\n2030,440\n', 'one.csv'));
    expect(Array.from(p.years)).toEqual([2030]);
    expect(Array.from(p.series.co2_ppm!)).toEqual([440]);
  });

  it('toAnnual says "1 annual value" in the singular, and a single row a day off mid-year in words of its own', () => {
    const two = toAnnual(parsePathway('year,co2_ppm\n2029.6,440\n2030.4,441\n', 'two.csv'));
    expect(two.provenance.notes[0]).toBe('interpolated linearly from 2 rows (steps of 0.8 years) to 1 annual value');
    const one = toAnnual(parsePathway('date,co2_ppm\n2030-07-03,440\n', 'one.csv'));
    expect(Array.from(one.years)).toEqual([2030]);
    expect(one.provenance.notes).toEqual(["the single row lies within a day of the middle of 2030 and gives that year's values"]);
  });
});

describe('toAnnual of rows less than a year apart', () => {
  const monthly = Array.from({ length: 24 }, (_, i) => {
    const year = 2025 + Math.floor(i / 12);
    const month = String((i % 12) + 1).padStart(2, '0');
    return `${year}-${month}-15,${420 + 0.2 * i}`;
  });

  it('toAnnual of monthly dates says each row is read as an annual mean centred on its date, and keeps the interpolated numbers', () => {
    const p = toAnnual(parsePathway(`date,co2_ppm\n${monthly.join('\n')}\n`, 'monthly.csv'));
    expect(p.provenance.notes).toContain(
      'rows are less than a year apart (irregular steps of 28 to 31 days): each row is read as an annual mean centred on its date '
      + 'and each year takes the value interpolated between the rows either side of its middle, not the average of the rows within it; '
      + 'if these are monthly or seasonal values, give one annual mean per year instead',
    );
    // The numbers are as before the note: 2026 (its middle) lies between 2026-06-15 (423.4) and 2026-07-15 (423.6).
    const t0 = (isoDateToYear('2026-06-15') as { year: number }).year;
    const t1 = (isoDateToYear('2026-07-15') as { year: number }).year;
    expectClose(p.series.co2_ppm![p.years.indexOf(2026)], 423.4 + (0.2 * (2026 - t0)) / (t1 - t0), 1e-9, '2026');
  });

  it('toAnnual names the shortest step and its lines when only some rows are less than 0.9 years apart', () => {
    const p = toAnnual(parsePathway('# two rows in one year\nyear,co2_ppm\n2030,440\n2030.5,441\n2035,445\n2040,450\n', 'part.csv'));
    expect(p.provenance.notes[1]).toMatch(
      /^1 of the 3 steps between rows is under 0\.9 years \(the shortest, 0\.5 years, between lines 3 and 4\): each row is read as an annual mean centred on its year value/,
    );
  });

  it('toAnnual adds no such note for steps of 0.9 years or more', () => {
    const p = toAnnual(parsePathway('year,co2_ppm\n2030,440\n2030.9,441\n2032,445\n', 'ok.csv'));
    expect(p.provenance.notes.filter((n) => n.includes('less than a year') || n.includes('under 0.9'))).toEqual([]);
  });
});

describe('toAnnual with dates all on one day of the year (calendar years)', () => {
  it('1 January dates land in their own year, to the last row, with a note', () => {
    const p = toAnnual(parsePathway('date,co2_gtco2\n2030-01-01,40\n2040-01-01,30\n2110-01-01,0\n', 'jan.csv'));
    expect([p.years[0], p.years[p.years.length - 1]]).toEqual([2030, 2110]);
    expect(p.series.co2_gtco2![10]).toBe(30);
    expect(p.provenance.notes[0]).toBe(
      'every date falls on 1 January: each row is read as its calendar year (2030-01-01 is the year 2030), its emissions that year\'s total and its other values that year\'s means',
    );
  });

  it('31 December dates (with a time of day and an offset) name their calendar year as written', () => {
    const p = toAnnual(parsePathway('date,co2_ppm\n2030-12-31T23:00+05:00,440\n2031-12-31T23:00+05:00,442\n', 'dec.csv'));
    expect(Array.from(p.years)).toEqual([2030, 2031]);
    expect(p.provenance.notes[0]).toMatch(/^every date falls on 31 December/);
  });

  it('mid-year dates need no note (they already name their years), and a single dated row keeps its own label', () => {
    expect(toAnnual(awkward('dates.csv')).provenance.notes).toEqual([]);
    expect(() => toAnnual(parsePathway('date,co2_ppm\n2030-01-01,440\n', 'one.csv'))).toThrow(InputError);
  });
});

describe('toAnnual with dates mostly on one day of the year', () => {
  it('notes the date that breaks the pattern (a probable typo) and keeps every date as the centre of an annual mean', () => {
    const parsed = parsePathway('date,co2_gtco2\n2030-01-01,40\n2040-01-02,30\n2050-01-01,20\n', 'typo.csv');
    const p = toAnnual(parsed);
    expect(parsed.datesOnDay).toBeUndefined();
    expect(p.years[0]).toBe(2030); // 2029.5014 rounds up to its first whole year
    expect(p.provenance.notes[0]).toBe(
      '2 of the 3 dates fall on 1 January but the date on line 3 does not, so every date is read as the centre of an annual mean '
        + "(a date on 1 January stands half a year before its year's middle); if the dates name calendar years, put all of them on 1 January",
    );
  });
});

import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { InputError, type InputProblem } from '../../src/errors.js';
import { parsePathway } from '../../src/io/parse-pathway.js';
import { CONCENTRATION_COLUMNS, EMISSION_COLUMNS, FORCING_COLUMNS, PRECURSOR_COLUMNS } from '../../src/pathway.js';

// Line numbers below were counted in the fixture files by hand (and with `grep -n ''`): comment and
// blank lines count, the first line is 1. test/fixtures/README.md lists every fixture.
const fixture = (path: string) => fileURLToPath(new URL(`../fixtures/${path}`, import.meta.url));
const read = (path: string) => readFileSync(fixture(path), 'utf8');

function problemsOf(text: string, file: string): InputProblem[] {
  try {
    parsePathway(text, file);
  } catch (e) {
    expect(e).toBeInstanceOf(InputError);
    expect((e as InputError).exitCode).toBe(2);
    return (e as InputError).problems;
  }
  return expect.fail(`${file}: expected an InputError`);
}

const NUMBER = 'a number such as 415.2, with a decimal point and without units or thousands separators';
const LISTED = [...CONCENTRATION_COLUMNS, ...EMISSION_COLUMNS, ...FORCING_COLUMNS, ...PRECURSOR_COLUMNS, 'fgas_mtco2e', '<gas>_kt', '<gas>_ppt (halogenated gases)'].join(', ');
const KNOWN = `one of year, date, ${LISTED}`;

type Expected = Omit<InputProblem, 'file'>;
const badCases: [fixture: string, problem: Expected][] = [
  ['empty.csv', {
    code: 'input.empty', message: 'must not be empty',
    expected: 'a header row such as "year,co2_ppm" followed by one row per year',
  }],
  ['only-comments.csv', {
    code: 'input.no-header', message: 'must have a header row (the file holds only comments and blank lines)',
    expected: 'a header row such as "year,co2_ppm" followed by one row per year',
  }],
  ['header-only.csv', {
    code: 'input.no-rows', line: 2, message: 'must have at least one data row after the header',
    expected: 'one row per year, such as "2030,440"',
  }],
  ['duplicate-year.csv', {
    code: 'input.duplicate-time', line: 5, column: 'year', value: '2030',
    message: 'must not repeat a year: the same year is on line 4',
    expected: 'each year once, increasing down the file',
  }],
  ['out-of-order.csv', {
    code: 'input.time-order', line: 4, column: 'year', value: '2030',
    message: 'must increase down the file: this row comes after 2035 on line 3',
    expected: 'years in increasing order',
  }],
  ['missing-time-column.csv', {
    code: 'input.no-time-column', line: 2, message: 'must have a time column',
    expected: 'a column named "year" (whole or decimal years) or "date" (ISO 8601 dates such as 2030-07-01; 1 or 2 July means that whole year)',
  }],
  ['both-year-and-date.csv', {
    code: 'input.two-time-columns', line: 1, column: 'date', value: 'date',
    message: 'must have one time column, not both "year" and "date"',
    expected: 'either a "year" or a "date" column',
  }],
  ['unknown-column.csv', {
    code: 'input.unknown-column', line: 2, column: 'co2ppm', value: 'co2ppm',
    message: 'must be a known column name; did you mean "co2_ppm"?', expected: KNOWN,
  }],
  ['gtc-column.csv', {
    code: 'input.unknown-column', line: 1, column: 'co2_gtc', value: 'co2_gtc',
    // 44/12 = 3.664: molar masses of CO2 and C (IUPAC standard atomic weights, rounded; common practice).
    message: 'must be a known column name; give co2_gtco2 (Gt CO2 per year: multiply Gt C by 44/12 = 3.664)',
    expected: KNOWN,
  }],
  ['gas-twice.csv', {
    code: 'input.gas-twice', line: 1, column: 'co2_gtco2', value: 'co2_gtco2',
    message: 'must give CO2 either as a concentration (co2_ppm) or as emissions (co2_gtco2), not both',
    expected: 'one column per gas: co2_ppm or co2_gtco2',
  }],
  ['forcing-twice.csv', {
    code: 'input.forcing-twice', line: 2, column: 'aerosol_wm2', value: 'aerosol_wm2',
    message: 'must give aerosol_wm2 or its agent columns (aerosol_ari_wm2, aerosol_aci_wm2), not both',
    expected: 'either aerosol_wm2 alone or agent columns only',
  }],
  ['duplicate-column.csv', {
    code: 'input.duplicate-column', line: 1, column: 'CO2_ppm', value: 'CO2_ppm',
    message: 'must name each column once: header cells 2 and 3 are both "co2_ppm"', expected: 'each column once',
  }],
  ['no-data-columns.csv', {
    code: 'input.no-data-columns', line: 1, message: 'must have at least one data column besides the time column',
    expected: `one or more of ${LISTED}`,
  }],
  ['text-in-number.csv', {
    code: 'input.bad-number', line: 3, column: 'co2_ppm', value: 'about 430', message: 'must be a number', expected: NUMBER,
  }],
  ['decimal-comma-in-comma-file.csv', {
    code: 'input.bad-number', line: 2, column: 'co2_ppm', value: '420,5', message: 'must be a number', expected: NUMBER,
  }],
  ['nan-cell.csv', {
    code: 'input.not-finite', line: 3, column: 'ch4_ppb', value: 'NaN', message: 'must be a finite number',
    expected: 'a number such as 415.2',
  }],
  ['infinity-cell.csv', {
    code: 'input.not-finite', line: 3, column: 'aerosol_wm2', value: '-Infinity', message: 'must be a finite number',
    expected: 'a number such as 415.2',
  }],
  ['empty-cell.csv', {
    code: 'input.empty-cell', line: 3, column: 'co2_ppm', value: '', message: 'must not be empty',
    expected: 'a number such as 415.2 in every cell',
  }],
  ['wrong-cell-count.csv', {
    code: 'input.cell-count', line: 3, value: '2030,430',
    message: 'must have 3 cells like the header on line 1, found 2', expected: '3 cells separated by ","',
  }],
  ['negative-concentration.csv', {
    code: 'input.out-of-range', line: 3, column: 'co2_ppm', value: '-430',
    message: 'must be a plausible value for a CO2 concentration', expected: 'a value from 100 to 5000 ppm',
  }],
  ['irradiance-in-forcing.csv', {
    code: 'input.out-of-range', line: 3, column: 'solar_wm2', value: '1361.2',
    message: 'must be a plausible value for a solar effective radiative forcing anomaly (not an irradiance)',
    expected: 'a value from -3 to 3 W m-2',
  }],
  ['bad-date.csv', {
    code: 'input.bad-date', line: 3, column: 'date', value: '2030-02-30',
    // In plain words, not luxon's explanation ("you specified 30 (of type number) as a day").
    message: 'must be an ISO 8601 date: 2030-02-30 is not a calendar date (February 2030 has 28 days)',
    expected: 'a full date such as 2030-07-01 (1 or 2 July means that whole year)',
  }],
  ['partial-date.csv', {
    code: 'input.bad-date', line: 2, column: 'date', value: '2025-07',
    message: 'must be an ISO 8601 date: a year, month or week alone is not a date', expected: 'a full date such as 2030-07-01 (1 or 2 July means that whole year)',
  }],
  ['year-out-of-range.csv', {
    code: 'input.bad-year', line: 3, column: 'year', value: '20300', message: 'must be a year from 1000 to 3000',
    expected: 'a year such as 2030 or 2030.5',
  }],
  ['year-not-finite.csv', {
    code: 'input.not-finite', line: 3, column: 'year', value: 'Infinity', message: 'must be a finite number',
    expected: 'a year such as 2030 or 2030.5',
  }],
  ['unterminated-quote.csv', {
    code: 'input.bad-quotes', line: 2, value: '2025,"420', message: 'must close every quoted cell on the same line',
    expected: 'cells such as 415.2 or "415.2" (a quote inside a quoted cell written "")',
  }],
];

describe('parsePathway on bad fixtures', () => {
  it.each(badCases)('parsePathway(bad/%s) throws one InputError naming the line, column, value and expected form', (name, expected) => {
    const file = `bad/${name}`;
    expect(problemsOf(read(file), file)).toEqual([{ file, ...expected }]);
  });

  it('parsePathway(bad/three-problems.csv) reports all three problems at their physical lines 7, 10 and 11', () => {
    const file = 'bad/three-problems.csv';
    expect(problemsOf(read(file), file)).toEqual([
      { file, code: 'input.bad-number', line: 7, column: 'co2_ppm', value: '43O', message: 'must be a number', expected: NUMBER },
      {
        file, code: 'input.duplicate-time', line: 10, column: 'year', value: '2035',
        message: 'must not repeat a year: the same year is on line 9', expected: 'each year once, increasing down the file',
      },
      {
        file, code: 'input.out-of-range', line: 11, column: 'ch4_ppb', value: '19.9',
        message: 'must be a plausible value for a CH4 concentration', expected: 'a value from 100 to 20000 ppb',
      },
    ]);
  });

  it('parsePathway error message formats as file:line: column "x": message (got ...; expected ...)', () => {
    const file = 'bad/duplicate-year.csv';
    expect(() => parsePathway(read(file), file)).toThrow(
      'bad/duplicate-year.csv:5: column "year": must not repeat a year: the same year is on line 4 '
      + '(got "2030"; expected each year once, increasing down the file)',
    );
  });

  it('parsePathway caps a flood of problems at 1000 plus one summary', () => {
    const rows = Array.from({ length: 1500 }, (_, i) => `${2000 + i * 0.5},x`).join('\n');
    const problems = problemsOf(`year,co2_ppm\n${rows}\n`, 'flood.csv');
    expect(problems).toHaveLength(1001);
    expect(problems[999].line).toBe(1001);
    expect(problems[1000]).toEqual({
      file: 'flood.csv', code: 'input.too-many-problems', message: '500 more problems not listed (the first 1000 are above)',
    });
  });

  it('parsePathway keeps checking rows after a header problem', () => {
    const problems = problemsOf('year,co2ppm,ch4_ppb\n2030,440,x\n', 'h.csv');
    expect(problems.map((p) => [p.code, p.line, p.column])).toEqual([
      ['input.unknown-column', 1, 'co2ppm'],
      ['input.bad-number', 2, 'ch4_ppb'],
    ]);
  });

  it('parsePathway quotes the earlier date as written when dates go backwards', () => {
    const [p] = problemsOf('date,co2_ppm\n2030-07-02,440\n2029-07-02,430\n', 'd.csv');
    expect(p).toMatchObject({ line: 3, value: '2029-07-02', message: 'must increase down the file: this row comes after 2030-07-02 on line 2' });
  });

  it('parsePathway says two different dates on 1 and 2 July stand for the same year, and a repeated date is the same date', () => {
    const [p] = problemsOf('date,co2_ppm\n2030-07-01,440\n2030-07-02,441\n', 'd.csv');
    expect(p).toMatchObject({ line: 3, value: '2030-07-02', message: 'must not repeat a year: 2030-07-01 on line 2 stands for the same year (1 and 2 July both mean the middle of their year)' });
    const [q] = problemsOf('date,co2_ppm\n2030-07-01,440\n2030-07-01,441\n', 'd.csv');
    expect(q).toMatchObject({ line: 3, message: 'must not repeat a date: the same date is on line 2' });
  });

  it('parsePathway gives no unit hint for header names that happen to be Object properties', () => {
    const [p] = problemsOf('year,co2_ppm,constructor\n2030,440,1\n', 'o.csv');
    expect(p.message).toBe('must be a known column name');
  });

  it('parsePathway names the nearest column only when it is a plausible typo', () => {
    const [typo] = problemsOf('year,N2O_PBB\n2030,330\n', 't.csv');
    expect(typo.message).toBe('must be a known column name; did you mean "n2o_ppb"?');
    const [far] = problemsOf('year,co2_ppm,temperature\n2030,440,1\n', 't.csv');
    expect(far.message).toBe('must be a known column name');
  });
});

describe('parsePathway on awkward but valid fixtures', () => {
  const parse = (name: string) => parsePathway(read(`awkward/${name}`), `awkward/${name}`);

  it('parsePathway(awkward/bom.csv) drops the UTF-8 byte-order mark from the first header name', () => {
    const p = parse('bom.csv');
    expect(Array.from(p.times)).toEqual([2025, 2026]);
    expect(Array.from(p.columns.co2_ppm!)).toEqual([420, 421.5]);
    expect(p.headerLine).toBe(1);
  });

  it('parsePathway(awkward/crlf.csv) reads CRLF line endings with lines counted once each', () => {
    const p = parse('crlf.csv');
    expect(p.name).toBe('Windows line endings');
    expect(Array.from(p.rowLines)).toEqual([3, 4]);
    expect(Array.from(p.columns.ch4_ppb!)).toEqual([1900, 1950]);
  });

  it('parsePathway(awkward/cr-only.csv) reads bare CR line endings', () => {
    const p = parse('cr-only.csv');
    expect(Array.from(p.times)).toEqual([2025, 2030]);
    expect(Array.from(p.rowLines)).toEqual([3, 4]);
  });

  it('parsePathway(awkward/semicolon-decimal-comma.csv) detects ";" and reads 420,5 as 420.5', () => {
    const p = parse('semicolon-decimal-comma.csv');
    expect(Array.from(p.columns.co2_ppm!)).toEqual([420.5, 430]);
    expect(Array.from(p.columns.aerosol_wm2!)).toEqual([-1.1, -0.95]);
  });

  it('parsePathway(awkward/excel-export.csv) reads BOM + CRLF + ";" + decimal commas and skips ";;" rows', () => {
    const p = parse('excel-export.csv');
    expect(Array.from(p.times)).toEqual([2025, 2030]);
    expect(Array.from(p.columns.co2_ppm!)).toEqual([420.1, 432.7]);
    expect(Array.from(p.columns.ch4_ppb!)).toEqual([1900.5, 1950]);
  });

  it('parsePathway(awkward/tab-separated.csv) detects tabs and accepts a decimal comma', () => {
    const p = parse('tab-separated.csv');
    expect(Array.from(p.columns.co2_ppm!)).toEqual([420, 430.5]);
  });

  it('parsePathway(awkward/quoted-fields.csv) unquotes headers and cells, exponent form included', () => {
    const p = parse('quoted-fields.csv');
    expect(p.name).toBe('"Quoted" cells');
    expect(Array.from(p.columns.co2_ppm!)).toEqual([420.25, 430]);
    expect(Array.from(p.columns.n2o_ppb!)).toEqual([336, 340]);
  });

  it('parsePathway(awkward/trailing-empty-lines.csv) ignores empty lines at the end', () => {
    const p = parse('trailing-empty-lines.csv');
    expect(Array.from(p.times)).toEqual([2025, 2030]);
    expect(p.name).toBe('trailing-empty-lines');
  });

  it('parsePathway(awkward/blank-lines-middle.csv) skips blank lines but counts them: rows on lines 4 and 7', () => {
    const p = parse('blank-lines-middle.csv');
    expect(p.headerLine).toBe(3);
    expect(Array.from(p.rowLines)).toEqual([4, 7]);
    expect(Array.from(p.columns.co2_ppm!)).toEqual([420, 430]);
  });

  it('parsePathway(awkward/messy-header.csv) trims and lower-cases header names and cells', () => {
    const p = parse('messy-header.csv');
    expect(Object.keys(p.columns)).toEqual(['co2_ppm', 'aerosol_wm2']);
    expect(Array.from(p.columns.aerosol_wm2!)).toEqual([-1.1, -1.0]);
  });

  it('parsePathway(awkward/year-gaps.csv) accepts gaps of 5 and 10 years (interpolated later)', () => {
    const p = parse('year-gaps.csv');
    expect(Array.from(p.times)).toEqual([2025, 2030, 2040, 2050]);
    expect(Array.from(p.columns.n2o_mt!)).toEqual([10, 9.5, 8, 7]);
  });

  it('parsePathway(awkward/decimal-years.csv) keeps decimal years as given', () => {
    expect(Array.from(parse('decimal-years.csv').times)).toEqual([2025.5, 2026.5, 2027.5]);
  });

  it('parsePathway(awkward/dates.csv) maps mid-year dates (2 July) to exactly their whole years, the leap year 2032 too', () => {
    const p = parse('dates.csv');
    expect(p.timeColumn).toBe('date');
    // Rule in isoDateToYear: 1 or 2 July of year Y is the middle of Y, leap year or not.
    expect(Array.from(p.times)).toEqual([2030, 2031, 2032]);
  });

  it('parsePathway(awkward/metadata.csv) collects "# key: value" lines anywhere, keys lower-cased', () => {
    const p = parse('metadata.csv');
    expect(p.metadata).toEqual({
      name: 'Metadata everywhere',
      description: 'keys are lower-cased; values trimmed',
      'unit-basis': 'AR6 concentrations',
    });
    expect(p.name).toBe('Metadata everywhere');
    expect(Array.from(p.rowLines)).toEqual([5, 7]);
  });
});

describe('parsePathway hints for common slips', () => {
  it('parsePathway(bad/units-row.csv) names line 3 as a units row once, instead of a bad number per cell', () => {
    const file = 'bad/units-row.csv';
    expect(problemsOf(read(file), file)).toEqual([{
      file, code: 'input.units-row', line: 3, value: 'yr,ppm,ppb',
      message: 'must hold numbers: this looks like a row of units under the header on line 2; delete it or start it with # '
        + '(units are in the column names: co2_ppm is ppm, co2_gtco2 Gt CO2 per year)',
      expected: 'the first data row, such as "2030,440"',
    }]);
  });

  it('parsePathway(bad/thousands-separators.csv) refuses 1.234,5 and, in a decimal-comma file, 37.500, at their lines', () => {
    const file = 'bad/thousands-separators.csv';
    expect(problemsOf(read(file), file).map((p) => [p.code, p.line, p.column, p.value])).toEqual([
      ['input.thousands-separator', 3, 'co2_gtco2', '37.500'],
      ['input.thousands-separator', 4, 'ch4_mt', '1.234,5'],
    ]);
  });

  it('parsePathway accepts 37.500 in a semicolon file that uses no decimal comma (nothing to be confused with)', () => {
    expect(parsePathway('year;co2_gtco2\n2030;37.500\n', 's.csv').columns.co2_gtco2).toEqual(Float64Array.of(37.5));
  });

  it('parsePathway(bad/dates-mixed-up.csv) explains a time after a space and day/month order', () => {
    const file = 'bad/dates-mixed-up.csv';
    expect(problemsOf(read(file), file).map((p) => [p.line, p.message])).toEqual([
      [3, 'must be an ISO 8601 date without a time after a space: 2030-07-01 00:00:00 carries a time of day, as spreadsheets export dates; '
        + 'give the date alone (2030-07-01), or join a time with T (2030-07-01T12:00)'],
      [4, 'must be an ISO 8601 date (year-month-day): 31/12/2031 reads as day/month/year; write 2031-12-31'],
    ]);
  });

  it('parsePathway says a date in a year column belongs in a date column', () => {
    const [p] = problemsOf('year,co2_ppm\n2030-07-01,440\n', 'y.csv');
    expect(p).toMatchObject({ code: 'input.date-in-year-column', line: 2, column: 'year',
      message: 'must be a year: 2030-07-01 is a date; name the column "date" (ISO 8601 dates such as 2030-07-01) or give years' });
  });

  it('parsePathway asks "co2_ppm or co2_gtco2?" for a bare co2 header', () => {
    const [p] = problemsOf('year,co2\n2030,440\n', 'c.csv');
    expect(p.message).toBe('must be a known column name; did you mean "co2_ppm" (ppm) or "co2_gtco2" (Gt CO2 yr-1)?');
  });
});

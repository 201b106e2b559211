import { describe, expect, it } from 'vitest';
import { ambiguousDecimalPoint, columnSuggestion, dateHint, looksLikeUnitsRow, thousandsSeparated } from '../../src/io/input-hints.js';
import { COLUMN_UNITS, PATHWAY_COLUMNS, type PathwayColumn } from '../../src/pathway.js';

// The slips below are what spreadsheets export and people type (common practice, no source).
const known = ['year', 'date', ...PATHWAY_COLUMNS];
const unitOf = (c: string) => COLUMN_UNITS[c as PathwayColumn];

describe('columnSuggestion', () => {
  it('columnSuggestion(co2) offers both CO2 columns with their units, since only the writer knows which was meant', () => {
    expect(columnSuggestion('co2', known, unitOf)).toBe('did you mean "co2_ppm" (ppm) or "co2_gtco2" (Gt CO2 yr-1)?');
    expect(columnSuggestion('CH4', known, unitOf)).toBe('did you mean "ch4_ppb" (ppb) or "ch4_mt" (Mt CH4 yr-1)?');
  });

  it('columnSuggestion reads "emissions" and "concentration" words to pick one form of the gas', () => {
    expect(columnSuggestion('CO2 emissions', known, unitOf)).toBe('did you mean "co2_gtco2" (Gt CO2 yr-1)?');
    expect(columnSuggestion('N2O concentration', known, unitOf)).toBe('did you mean "n2o_ppb" (ppb)?');
  });

  it('columnSuggestion prefers a plausible typo, and stays silent for unrelated words', () => {
    expect(columnSuggestion('co2ppm', known, unitOf)).toBe('did you mean "co2_ppm"?');
    expect(columnSuggestion('temperature', known, unitOf)).toBeUndefined();
    expect(columnSuggestion('gdp', known, unitOf)).toBeUndefined();
  });

  it('columnSuggestion says to divide by 1000 when the near name is in Gt and the header in Mt (co2_mtco2)', () => {
    expect(columnSuggestion('co2_mtco2', known, unitOf)).toBe('did you mean "co2_gtco2"? (in Gt CO2 per year: divide Mt CO2 by 1000)');
  });

  it('columnSuggestion sends a comment column to "#" lines', () => {
    for (const h of ['comment', 'Notes', 'source']) expect(columnSuggestion(h, known, unitOf)).toMatch(/put comments on lines starting with "#"/);
  });
});

describe('dateHint', () => {
  it('dateHint names a time of day after a space and gives the date alone', () => {
    expect(dateHint('2030-07-01 00:00:00')).toBe('must be an ISO 8601 date without a time after a space: 2030-07-01 00:00:00 carries a time of day, '
      + 'as spreadsheets export dates; give the date alone (2030-07-01), or join a time with T (2030-07-01T12:00)');
  });

  it('dateHint reads an unambiguous day/month or month/day order and writes it the ISO way', () => {
    expect(dateHint('31/12/2030')).toBe('must be an ISO 8601 date (year-month-day): 31/12/2030 reads as day/month/year; write 2030-12-31');
    expect(dateHint('12/31/2030')).toBe('must be an ISO 8601 date (year-month-day): 12/31/2030 reads as month/day/year; write 2030-12-31');
    expect(dateHint('2030-31-12')).toBe('must be an ISO 8601 date (year-month-day): 2030-31-12 has the day before the month; write 2030-12-31');
  });

  it('dateHint gives both readings when day and month could swap', () => {
    expect(dateHint('01.07.2030')).toBe('must be an ISO 8601 date (year-month-day): 01.07.2030 could be day/month or month/day; write 2030-07-01 or 2030-01-07');
  });

  it('dateHint has nothing to add for text that is no date', () => {
    expect(dateHint('soon')).toBeUndefined();
    expect(dateHint('2030-02-30')).toBeUndefined();
  });
});

describe('thousandsSeparated and ambiguousDecimalPoint', () => {
  it('thousandsSeparated strips the separator of each notation', () => {
    expect(thousandsSeparated('1.234,5', true)).toBe('1234,5');
    expect(thousandsSeparated('12.345.678', true)).toBe('12345678');
    expect(thousandsSeparated('1,234.5', false)).toBe('1234.5');
    expect(thousandsSeparated('415,2', true)).toBeUndefined();
    expect(thousandsSeparated('12,34', false)).toBeUndefined();
  });

  it('ambiguousDecimalPoint flags a dot before exactly three digits only', () => {
    expect(ambiguousDecimalPoint('37.500')).toBe(true);
    expect(ambiguousDecimalPoint('37.5')).toBe(false);
    expect(ambiguousDecimalPoint('3750.0')).toBe(false);
  });
});

describe('looksLikeUnitsRow', () => {
  const isNumber = (c: string) => /^[+-]?\d+(\.\d+)?$/.test(c);
  it('looksLikeUnitsRow recognises rows of units and leaves data rows and rows of bad numbers alone', () => {
    expect(looksLikeUnitsRow(['yr', 'ppm', 'Gt CO2/yr'], isNumber)).toBe(true);
    expect(looksLikeUnitsRow(['', '[ppm]', 'W m-2'], isNumber)).toBe(true);
    expect(looksLikeUnitsRow(['2030', 'ppm'], isNumber)).toBe(false);
    expect(looksLikeUnitsRow(['', ''], isNumber)).toBe(false);
  });
});

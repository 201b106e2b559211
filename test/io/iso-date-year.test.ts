import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { calendarDay, commonDayOfDates, isoDateToYear } from '../../src/io/iso-date-year.js';

/**
 * Independent oracle: the same convention computed with the JavaScript Date's UTC day arithmetic
 * instead of luxon. 1 or 2 July of year Y is exactly Y; any other day is
 * year + (noon of the day - 1 Jan) / (length of the year) - 0.5.
 */
function oracle(y: number, month: number, day: number): number {
  if (month === 7 && (day === 1 || day === 2)) return y;
  const start = Date.UTC(y, 0, 1);
  const length = Date.UTC(y + 1, 0, 1) - start;
  return y + (Date.UTC(y, month - 1, day) + 12 * 3_600_000 - start) / length - 0.5;
}

const year = (text: string) => {
  const r = isoDateToYear(text);
  if (!r.ok) return expect.fail(`${text}: ${r.reason}`);
  return r.year;
};

describe('isoDateToYear', () => {
  it('isoDateToYear(2030-07-01) and (2030-07-02) are exactly 2030: the middle of a 365-day year is noon of 2 July', () => {
    // 31+28+31+30+31+30 = 181 days before 1 July; noon of 2 July is 182.5 days in; 182.5/365 = 0.5.
    expect(year('2030-07-01')).toBe(2030);
    expect(year('2030-07-02')).toBe(2030);
  });

  it('isoDateToYear(2032-07-01) and (2032-07-02) are exactly 2032 in a leap year: its middle is midnight between them (183 of 366 days)', () => {
    expect(year('2032-07-01')).toBe(2032);
    expect(year('2032-07-02')).toBe(2032);
  });

  it('isoDateToYear of 1 or 2 July at any time of day, as written in its own offset, is the whole year (a spreadsheet\'s T00:00:00 too)', () => {
    expect(year('2030-07-01T00:00:00')).toBe(2030);
    expect(year('2030-07-02T23:59:59Z')).toBe(2030);
    expect(year('2032-07-01T01:00:00+02:00')).toBe(2032);
  });

  it('isoDateToYear keeps the fractional year of a date off mid-year: 2030-07-03 is 2030 + 1/365, 2030-06-30 is 2030 - 2/365 (hand computation)', () => {
    expect(year('2030-07-03')).toBeCloseTo(2030 + 1 / 365, 12);
    expect(year('2030-06-30')).toBeCloseTo(2030 - 2 / 365, 12);
    expect(year('2032-07-03')).toBeCloseTo(2032 + 184.5 / 366 - 0.5, 12);
  });

  it('isoDateToYear(2030-01-01) is 2029.5 + 0.5/365: a mean centred on New Year', () => {
    expect(year('2030-01-01')).toBeCloseTo(2029.5 + 0.5 / 365, 12);
  });

  it('isoDateToYear reads a time and offset as an instant off mid-year: 14:00+02:00 on 3 July is noon UTC, 2030 + 1/365', () => {
    expect(year('2030-07-03T14:00:00+02:00')).toBeCloseTo(2030 + 1 / 365, 12);
  });

  it('isoDateToYear reads ordinal (2030-183) and week (2030-W27-2) dates as 2 July 2030 (ISO 8601 calendar, hand-checked)', () => {
    // 2030-01-01 is a Tuesday, so ISO week 1 starts Monday 2029-12-31 and week 27 on Monday 1 July.
    expect(year('2030-183')).toBe(2030);
    expect(year('2030-W27-2')).toBe(2030);
    expect(year('2030-184')).toBeCloseTo(2030 + 1 / 365, 12);
  });

  it('isoDateToYear agrees with Date.UTC day arithmetic for any calendar date from 1000 to 2999', () => {
    fc.assert(fc.property(fc.date({ min: new Date(Date.UTC(1000, 0, 1)), max: new Date(Date.UTC(2999, 11, 31)), noInvalidDate: true }), (d) => {
      const y = d.getUTCFullYear();
      const m = d.getUTCMonth() + 1;
      const day = d.getUTCDate();
      const text = `${String(y).padStart(4, '0')}-${String(m).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
      expect(Math.abs(year(text) - oracle(y, m, day))).toBeLessThan(1e-9);
    }), { numRuns: 300 });
  });

  it('isoDateToYear refuses a year, month or week alone (they name spans, not centres)', () => {
    for (const text of ['2030', '2030-07', '2030-W27']) {
      expect(isoDateToYear(text)).toEqual({ ok: false, reason: 'a year, month or week alone is not a date' });
    }
  });

  it('isoDateToYear refuses impossible and non-ISO dates', () => {
    for (const text of ['2030-13-01', '2031-02-29', '02/07/2030', 'soon', '']) expect(isoDateToYear(text).ok).toBe(false);
  });

  it('isoDateToYear says in plain words why a date is refused, with the days of that month or year (Gregorian calendar)', () => {
    const reason = (text: string) => {
      const r = isoDateToYear(text);
      return r.ok ? expect.fail(`accepted ${text}`) : r.reason;
    };
    expect(reason('2030-02-30')).toBe('2030-02-30 is not a calendar date (February 2030 has 28 days)');
    expect(reason('2032-02-30')).toBe('2032-02-30 is not a calendar date (February 2032 has 29 days)');
    expect(reason('2030-04-31')).toBe('2030-04-31 is not a calendar date (April 2030 has 30 days)');
    expect(reason('2040-13-01')).toBe('2040-13-01 is not a calendar date (there is no month 13)');
    expect(reason('2030-02-00')).toBe('2030-02-00 is not a calendar date (there is no day 00)');
    expect(reason('2030-366')).toBe('2030-366 is not a date (day 366 of a year with 365 days)');
    // 2030 has 52 ISO weeks (it starts on a Tuesday and is not a leap year).
    expect(reason('2030-W53-1')).toBe('2030-W53-1 is not a date (week 53 of a year with 52 ISO weeks)');
    expect(reason('2030-07-01T25:00')).toMatch(/^2030-07-01T25:00 has a time of day or an offset out of range/);
    expect(reason('2050/07/01')).toBe('2050/07/01 cannot be read as one (write year-month-day with hyphens, such as 2030-07-01; a time of day follows a T)');
    for (const text of ['2030-02-30', '2040-13-01', '2050/07/01', '2030-07-01T12:61']) expect(reason(text)).not.toMatch(/you specified|of type|can't be parsed/);
  });
});

describe('calendarDay', () => {
  it('gives the year and MM-DD as written, in the date\'s own offset, ignoring the time of day', () => {
    expect(calendarDay('2030-01-01')).toEqual({ year: 2030, monthDay: '01-01' });
    expect(calendarDay('2030-12-31T23:30-08:00')).toEqual({ year: 2030, monthDay: '12-31' });
    expect(calendarDay('2030-W01-2')).toEqual({ year: 2030, monthDay: '01-01' });
    expect(calendarDay('2030-07')).toBeUndefined();
    expect(calendarDay('2030-02-30')).toBeUndefined();
  });
});

describe('commonDayOfDates', () => {
  it('finds the shared day and the calendar years, the first date off it, and nothing for one date', () => {
    expect(commonDayOfDates(['2030-01-01', '2040-01-01'])).toEqual({ monthDay: '01-01', count: 2, years: [2030, 2040], firstOther: -1 });
    expect(commonDayOfDates(['2030-01-01', '2040-01-02', '2050-01-01'])).toEqual({ monthDay: '01-01', count: 2, years: [2030, 2040, 2050], firstOther: 1 });
    expect(commonDayOfDates(['2030-01-01'])).toBeUndefined();
  });
});

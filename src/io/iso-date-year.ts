import { DateTime } from 'luxon';

/** Result of {@link isoDateToYear}: a year label, or why the text is not an accepted date. */
export type IsoDateYear = { ok: true; year: number } | { ok: false; reason: string };

/** Reduced-precision forms (a year, a month, a week) that name a span rather than a date. */
const REDUCED_PRECISION = /^[+-]?\d{4}(-?\d{2})?$|^\d{4}-?W\d{2}$/i;

/**
 * Converts an ISO 8601 date (parsed with luxon, read as UTC unless it carries an offset) into the
 * decimal year label used on warmcast's annual grid.
 *
 * Convention: a pathway value is an annual mean, and a date says where that mean is centred. A
 * `year` column's whole year Y labels the mean over calendar year Y, whose centre is mid-year.
 * - A date on 1 or 2 July of year Y, at any time of day, means exactly Y. The middle of the year is
 *   noon on 2 July in a common year and midnight between 1 and 2 July in a leap year (183 of 366
 *   days), so both days name it however the leap day falls, and a mid-year file lands on its whole
 *   years with no interpolation.
 * - Any other date is placed in its calendar year as the fraction
 *   f = (instant - 1 January 00:00 UTC) / (length of that year), and the label is Y + f - 0.5.
 *   A date without a time of day stands for its own centre, 12:00 UTC.
 *   2030-01-01 gives 2029 + 0.5/365 + 0.5 = 2029.50137: a mean centred on New Year;
 *   2030-07-03 gives 2030 + 1/365 = 2030.00274.
 *
 * A year, month or week alone (`2030`, `2030-07`, `2030-W27`) is refused: it names a span, not the
 * centre of one (write a `year` column instead).
 *
 * This is the label of one date on its own. A file whose dates all fall on the same day of the year
 * (all 1 January, say) names calendar years instead: parsePathway labels each row with its date's
 * calendar year (commonDayOfDates; 2030-01-01 is the year 2030).
 *
 * @param text - an ISO 8601 calendar, ordinal or week date, optionally with a time and offset
 * @returns `{ ok: true, year }` with the decimal year label, or `{ ok: false, reason }`
 * @example
 * isoDateToYear('2030-07-01') // { ok: true, year: 2030 }
 * isoDateToYear('2032-07-02') // { ok: true, year: 2032 }
 * isoDateToYear('2030-02-30') // { ok: false, reason: '2030-02-30 is not a calendar date (February 2030 has 28 days)' }
 */
export function isoDateToYear(text: string): IsoDateYear {
  const trimmed = text.trim();
  if (REDUCED_PRECISION.test(trimmed)) {
    return { ok: false, reason: 'a year, month or week alone is not a date' };
  }
  // The calendar day as written (in its own offset), for the mid-year rule.
  const written = DateTime.fromISO(trimmed, { zone: 'utc', setZone: true });
  if (!written.isValid) return { ok: false, reason: invalidDateReason(trimmed, written.invalidReason) };
  if (written.month === 7 && (written.day === 1 || written.day === 2)) return { ok: true, year: written.year };
  const instant = (/t/i.test(trimmed) ? written : written.plus({ hours: 12 })).toUTC();
  const y = instant.year;
  const start = DateTime.utc(y, 1, 1).toMillis();
  const end = DateTime.utc(y + 1, 1, 1).toMillis();
  return { ok: true, year: y + (instant.toMillis() - start) / (end - start) - 0.5 };
}

/**
 * The calendar day an ISO 8601 date names, as written (in its own offset; a time of day is ignored):
 * its year and its month and day as `MM-DD`. Used to tell a file whose dates all fall on one day of
 * the year, which names calendar years (toAnnual), from one whose dates vary within years.
 *
 * @param text - a date isoDateToYear accepts
 * @returns the year and `MM-DD`, or undefined when the text is not such a date
 * @example calendarDay('2030-01-01') // { year: 2030, monthDay: '01-01' }
 */
export function calendarDay(text: string): { year: number; monthDay: string } | undefined {
  const trimmed = text.trim();
  if (REDUCED_PRECISION.test(trimmed)) return undefined;
  const written = DateTime.fromISO(trimmed, { zone: 'utc', setZone: true });
  if (!written.isValid) return undefined;
  return { year: written.year, monthDay: `${String(written.month).padStart(2, '0')}-${String(written.day).padStart(2, '0')}` };
}

/**
 * The day of the year most of a file's dates fall on, how many do, and the first date that does not:
 * when every date falls on it (and there are at least two), the dates name calendar years
 * (2030-01-01 is the year 2030); when most but not all do, a date is probably mistyped.
 *
 * @param texts - the dates of a file's rows, each accepted by isoDateToYear
 * @returns the most common day as `MM-DD` (the earliest row's on a tie), its count, each date's
 *   calendar year, and the index of the first date on another day (-1 when all share it);
 *   undefined for fewer than two dates
 * @example commonDayOfDates(['2030-01-01', '2040-01-01']) // { monthDay: '01-01', count: 2, years: [2030, 2040], firstOther: -1 }
 */
export function commonDayOfDates(texts: readonly string[]): { monthDay: string; count: number; years: number[]; firstOther: number } | undefined {
  if (texts.length < 2) return undefined;
  const days = texts.map(calendarDay);
  if (days.some((d) => d === undefined)) return undefined;
  const counts = new Map<string, number>();
  for (const d of days) counts.set(d!.monthDay, (counts.get(d!.monthDay) ?? 0) + 1);
  let monthDay = days[0]!.monthDay;
  for (const [day, count] of counts) if (count > counts.get(monthDay)!) monthDay = day;
  return { monthDay, count: counts.get(monthDay)!, years: days.map((d) => d!.year), firstOther: days.findIndex((d) => d!.monthDay !== monthDay) };
}

/**
 * `01-01` -> `1 January`.
 * @example dayOfYearName('12-31') // '31 December'
 */
export function dayOfYearName(monthDay: string): string {
  const [month, day] = monthDay.split('-').map(Number);
  return `${day} ${MONTHS[month - 1]}`;
}

const MONTHS = ['January', 'February', 'March', 'April', 'May', 'June', 'July', 'August', 'September', 'October', 'November', 'December'];

/** Calendar (2030-02-30), ordinal (2030-366) and week (2030-W54-1) dates, with or without hyphens, before any time. */
const CALENDAR = /^([+-]?\d{4})-?(\d{2})-?(\d{2})(?:T|$)/i;
const ORDINAL = /^([+-]?\d{4})-?(\d{3})(?:T|$)/i;
const WEEK = /^([+-]?\d{4})-?W(\d{2})(?:-?\d)?(?:T|$)/i;

/**
 * Why luxon refused a date, in plain words (luxon's own explanation names its internals: "you
 * specified 30 (of type number) as a day").
 */
function invalidDateReason(text: string, luxonReason: string | null): string {
  if (luxonReason !== 'unit out of range') {
    return `${text} cannot be read as one (write year-month-day with hyphens, such as 2030-07-01; a time of day follows a T)`;
  }
  const calendar = CALENDAR.exec(text);
  if (calendar) {
    const [year, month, day] = [Number(calendar[1]), Number(calendar[2]), Number(calendar[3])];
    if (month < 1 || month > 12) return `${text} is not a calendar date (there is no month ${calendar[2]})`;
    const days = DateTime.utc(year, month, 1).daysInMonth ?? 31;
    if (day < 1) return `${text} is not a calendar date (there is no day ${calendar[3]})`;
    if (day > days) return `${text} is not a calendar date (${MONTHS[month - 1]} ${year} has ${days} days)`;
  }
  const ordinal = ORDINAL.exec(text);
  if (ordinal) {
    const year = Number(ordinal[1]);
    const days = DateTime.utc(year, 1, 1).daysInYear;
    const day = Number(ordinal[2]);
    if (day < 1 || day > days) return `${text} is not a date (day ${ordinal[2]} of a year with ${days} days)`;
  }
  const week = WEEK.exec(text);
  if (week) {
    const year = Number(week[1]);
    const weeks = DateTime.fromObject({ weekYear: year, weekNumber: 1, weekday: 1 }, { zone: 'utc' }).weeksInWeekYear;
    const number = Number(week[2]);
    if (number < 1 || number > weeks) return `${text} is not a date (week ${week[2]} of a year with ${weeks} ISO weeks)`;
  }
  return `${text} has a time of day or an offset out of range (hours 0-23, minutes and seconds 0-59)`;
}

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
 * `year` column's whole year Y labels the mean over calendar year Y, whose centre is mid-year. So the
 * date's instant is placed in its calendar year as the fraction
 * f = (instant - 1 January 00:00 UTC) / (length of that year), and the label is Y + f - 0.5.
 * A date without a time of day stands for its own centre, 12:00 UTC.
 * - 2030-07-02 (common year: 182.5 of 365 days have passed at its noon, f = 0.5) gives exactly 2030;
 *   dates of mid-year annual means therefore land on the whole-year labels.
 * - 2032-07-02 (leap year) gives 2032 + 183.5/366 - 0.5 = 2032.00137, half a day past the label;
 *   the annual interpolation tolerates one day (see toAnnual).
 * - 2030-01-01 gives 2029 + 0.5/365 + 0.5 = 2029.50137: a mean centred on New Year.
 *
 * A year, month or week alone (`2030`, `2030-07`, `2030-W27`) is refused: it names a span, not the
 * centre of one (write a `year` column instead).
 *
 * @param text - an ISO 8601 calendar, ordinal or week date, optionally with a time and offset
 * @returns `{ ok: true, year }` with the decimal year label, or `{ ok: false, reason }`
 * @example
 * isoDateToYear('2030-07-02') // { ok: true, year: 2030 }
 * isoDateToYear('2030-02-30') // { ok: false, reason: 'you specified 30 (of type number) as a day, which is invalid' }
 */
export function isoDateToYear(text: string): IsoDateYear {
  const trimmed = text.trim();
  if (REDUCED_PRECISION.test(trimmed)) {
    return { ok: false, reason: 'a year, month or week alone is not a date' };
  }
  let instant = DateTime.fromISO(trimmed, { zone: 'utc' });
  if (!instant.isValid) {
    return { ok: false, reason: instant.invalidExplanation ?? instant.invalidReason ?? 'not an ISO 8601 date' };
  }
  if (!/t/i.test(trimmed)) instant = instant.plus({ hours: 12 });
  const y = instant.year;
  const start = DateTime.utc(y, 1, 1).toMillis();
  const end = DateTime.utc(y + 1, 1, 1).toMillis();
  return { ok: true, year: y + (instant.toMillis() - start) / (end - start) - 0.5 };
}

/**
 * Hints for the slips a pathway file commonly holds: what the writer probably meant, in words, so a
 * refused file says how to fix it. Each function returns undefined when it has nothing better to say
 * than the plain "must be" message. The patterns are common practice (what spreadsheets export and
 * what people type), no source.
 */
import { nearestName } from './nearest-name.js';

/**
 * Suggestions for an unknown header: the nearest known name when it is a plausible typo
 * (`co2ppm` -> `co2_ppm`), or, for a bare quantity with its unit left off (`co2`, `aerosol`), every
 * known column of that quantity with its unit, so the writer chooses (`co2_ppm` or `co2_gtco2`).
 *
 * @param header - the header cell as written
 * @param known - the known column names
 * @param unitOf - the unit of a known column, when there is one to show
 * @returns `did you mean "co2_ppm" (ppm) or "co2_gtco2" (Gt CO2 yr-1)?`, or undefined
 * @example
 * columnSuggestion('co2', ['year', 'co2_ppm', 'co2_gtco2'], (c) => UNITS[c]) // 'did you mean "co2_ppm" (ppm) or "co2_gtco2" (Gt CO2 yr-1)?'
 */
export function columnSuggestion(header: string, known: readonly string[], unitOf: (column: string) => string | undefined): string | undefined {
  const key = header.trim().toLowerCase();
  if (/^(comments?|notes?|remarks?|descriptions?|sources?|references?)$/.test(key)) {
    return 'warmcast reads numbers only: delete this column, and put comments on lines starting with "#" (for example "# note: ...")';
  }
  const near = nearestName(key, known);
  if (near !== undefined) {
    // co2_mtco2 -> co2_gtco2: the name is near, but the unit is a thousand times smaller.
    const mtForGt = /(^|_)mt/.test(key) && /_gt/.test(near);
    return `did you mean "${near}"?${mtForGt ? ' (in Gt CO2 per year: divide Mt CO2 by 1000)' : ''}`;
  }
  // A quantity without its unit: every known name that is the quantity plus `_unit`.
  const quantity = key.replace(/[^a-z0-9]+/g, '_').replace(/^_|_$/g, '');
  const words = quantity.split('_');
  const gas = words[0];
  let matches = known.filter((c) => c.startsWith(`${quantity}_`));
  if (matches.length === 0 && words.length > 1) {
    // `co2 emissions`, `CO2 concentration`: the gas, then a word that says which form.
    const forms = known.filter((c) => c.startsWith(`${gas}_`));
    const emissions = words.some((w) => w.startsWith('emis'));
    const concentration = words.some((w) => w.startsWith('conc'));
    matches = forms.filter((c) => {
      const unit = unitOf(c) ?? '';
      if (emissions) return /yr-1|per year/.test(unit);
      if (concentration) return /^pp[mbt]$/.test(unit);
      return false;
    });
  }
  if (matches.length === 0) return undefined;
  const named = matches.map((c) => {
    const unit = unitOf(c);
    return unit === undefined ? `"${c}"` : `"${c}" (${unit})`;
  });
  const list = named.length === 1 ? named[0] : `${named.slice(0, -1).join(', ')} or ${named[named.length - 1]}`;
  return `did you mean ${list}?`;
}

/** yyyy-mm-dd followed by a space and a time of day, as spreadsheets export a date cell. */
const DATE_SPACE_TIME = /^(\d{4}-\d{2}-\d{2})[ ]+\d{1,2}:\d{2}(?::\d{2}(?:\.\d+)?)?(?:\s*[ap]m)?$/i;
/** d/m/y or m/d/y with `/`, `.` or `-` between the parts, the year last. */
const YEAR_LAST = /^(\d{1,2})[/.-](\d{1,2})[/.-](\d{4})(?:[ T]+\d{1,2}:\d{2}(?::\d{2})?)?$/;
/** yyyy-dd-mm: a year first but a "month" above 12. */
const YEAR_DAY_MONTH = /^(\d{4})-(\d{2})-(\d{2})$/;

/**
 * What a date cell that is not ISO 8601 probably means: a time of day after a space (as
 * spreadsheets export dates), a day/month/year or month/day/year order, or a year-day-month order.
 *
 * @param cell - the date cell as written (trimmed)
 * @returns a message such as `must be an ISO 8601 date: 31/12/2030 is day/month/year; write 2030-12-31`, or undefined
 * @example
 * dateHint('2030-07-01 00:00:00') // 'must be an ISO 8601 date without a time after a space: ...'
 * dateHint('01/07/2030') // 'must be an ISO 8601 date (year-month-day): 01/07/2030 could be 1 July or 7 January; write 2030-07-01 or 2030-01-07'
 */
export function dateHint(cell: string): string | undefined {
  const spaced = DATE_SPACE_TIME.exec(cell);
  if (spaced) {
    return `must be an ISO 8601 date without a time after a space: ${cell} carries a time of day, as spreadsheets export dates; `
      + `give the date alone (${spaced[1]}), or join a time with T (${spaced[1]}T12:00)`;
  }
  const pad = (n: number) => String(n).padStart(2, '0');
  const yearLast = YEAR_LAST.exec(cell);
  if (yearLast) {
    const [a, b, year] = [Number(yearLast[1]), Number(yearLast[2]), yearLast[3]];
    const time = /\d:\d/.test(cell) ? ' (and no time after a space)' : '';
    if (a > 12 && b <= 12) return `must be an ISO 8601 date (year-month-day)${time}: ${cell} reads as day/month/year; write ${year}-${pad(b)}-${pad(a)}`;
    if (b > 12 && a <= 12) return `must be an ISO 8601 date (year-month-day)${time}: ${cell} reads as month/day/year; write ${year}-${pad(a)}-${pad(b)}`;
    if (a <= 12 && b <= 12) {
      return a === b
        ? `must be an ISO 8601 date (year-month-day)${time}: write ${year}-${pad(a)}-${pad(b)}`
        : `must be an ISO 8601 date (year-month-day)${time}: ${cell} could be day/month or month/day; write ${year}-${pad(b)}-${pad(a)} or ${year}-${pad(a)}-${pad(b)}`;
    }
    return undefined;
  }
  const ydm = YEAR_DAY_MONTH.exec(cell);
  if (ydm && Number(ydm[2]) > 12 && Number(ydm[3]) >= 1 && Number(ydm[3]) <= 12) {
    return `must be an ISO 8601 date (year-month-day): ${cell} has the day before the month; write ${ydm[1]}-${ydm[3]}-${ydm[2]}`;
  }
  return undefined;
}

/** Digits grouped by threes with `.` (decimal comma files) or `,` (decimal point files), optional decimals. */
const GROUPED_DOTS = /^[+-]?\d{1,3}(?:\.\d{3})+(?:,\d+)?$/;
const GROUPED_COMMAS = /^[+-]?\d{1,3}(?:,\d{3})+(?:\.\d+)?$/;

/**
 * The plain number a cell with thousands separators stands for (`1.234,5` in a file with decimal
 * commas, `"1,234.5"` in one with decimal points), or undefined when the cell is not such a number.
 *
 * @param cell - the cell as written (trimmed)
 * @param decimalComma - whether the file's numbers use a decimal comma (`;` or tab delimited)
 * @example
 * thousandsSeparated('1.234,5', true) // '1234,5'
 * thousandsSeparated('1,234.5', false) // '1234.5'
 */
export function thousandsSeparated(cell: string, decimalComma: boolean): string | undefined {
  if (decimalComma && GROUPED_DOTS.test(cell)) return cell.replace(/\./g, '');
  if (!decimalComma && GROUPED_COMMAS.test(cell)) return cell.replace(/,/g, '');
  return undefined;
}

/**
 * Whether a dot-separated cell in a file with decimal commas could be a thousands separator
 * (`37.500`: 37500 in the file's own notation, 37.5 if read with a decimal point).
 */
export function ambiguousDecimalPoint(cell: string): boolean {
  return /^[+-]?\d{1,3}(?:\.\d{3})+$/.test(cell);
}

/** A unit written under a header: letters with the characters units use (`ppm`, `Gt CO2/yr`, `W m-2`, `[Mt]`). */
const UNIT_TEXT = /^[\s[(]*[a-zµ%][a-z0-9µ%\s/.^*·\-()[\]]*$/i;

/**
 * Whether a data row is a row of units under the header (`year,co2_ppm` then `-,ppm` or
 * `yr,ppm`): no cell is a number and at least one holds text that reads as a unit.
 *
 * @param cells - the row's cells, trimmed
 * @param isNumber - whether a cell reads as a number in the file's notation
 */
export function looksLikeUnitsRow(cells: readonly string[], isNumber: (cell: string) => boolean): boolean {
  if (cells.some(isNumber)) return false;
  return cells.some((c) => c !== '' && UNIT_TEXT.test(c));
}

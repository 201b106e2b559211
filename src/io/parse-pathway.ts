import Papa from 'papaparse';
import { InputError, type InputProblem } from '../errors.js';
import { LUMPED_PARTS } from '../forcing/lumped-forcing.js';
import { HALOGEN_COLUMNS } from '../carbon/halogen-species.js';
import { COLUMN_UNITS, GASES, HALOGEN_CONCENTRATION_COLUMNS, HALOGEN_EMISSION_COLUMNS, LUMPED_FORCING_COLUMNS, PATHWAY_COLUMNS, type Gas, type PathwayColumn } from '../pathway.js';
import { commonDayOfDates, isoDateToYear } from './iso-date-year.js';
import { ambiguousDecimalPoint, columnSuggestion, dateHint, looksLikeUnitsRow, thousandsSeparated } from './input-hints.js';
import { nearestHalogen } from './nearest-halogen.js';
import { outOfBounds } from './value-bounds.js';

/** A pathway file as read, before interpolation: one entry per data row, in file order. */
export interface ParsedPathway {
  /** File path as given (used in every message). */
  file: string;
  /** `# name:` metadata, else the file's base name without its extension. */
  name: string;
  /** Every `# key: value` comment line, keys lower-cased (a later line with the same key wins). */
  metadata: Record<string, string>;
  /** Which time column the file uses. */
  timeColumn: 'year' | 'date';
  /**
   * Decimal year label of each row, strictly ascending: dates converted by isoDateToYear, or, when
   * every date falls on the same day of the year, each date's calendar year (sameDayCalendarYears).
   */
  times: Float64Array;
  /** With dates all on one day of the year: that day as `MM-DD` (the rows are then calendar years). */
  datesOnDay?: string;
  /**
   * With at least half of the dates (two or more) on one day of the year but not all: that day, how
   * many, and the line of the first date on another day (toAnnual notes a probable typo).
   */
  datesMostlyOnDay?: { monthDay: string; count: number; otherLine: number };
  /** Data columns present, canonical lower-case names, one value per row in the column's unit. */
  columns: Partial<Record<PathwayColumn, Float64Array>>;
  /** 1-based physical line of each row in the file (comment and blank lines counted). */
  rowLines: Int32Array;
  /** 1-based physical line of the header row. */
  headerLine: number;
}

/** Time labels must lie in this span of years (common practice, no source: catches typos such as 20300). */
const YEAR_MIN = 1000;
const YEAR_MAX = 3000;

/** More problems than this are summarised in one final problem, so a wrong file cannot flood a terminal. */
const MAX_PROBLEMS = 1000;

const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;
const DECIMAL_COMMA_NUMBER = /^[+-]?(?:\d+,\d*|,\d+)(?:e[+-]?\d+)?$/i;
const NOT_FINITE = /^[+-]?(?:nan|inf|infinity)$/i;
const METADATA = /^#\s*([a-z][a-z0-9_-]*)\s*:\s*(.*)$/i;

/** Columns that name a gas in a unit warmcast does not take, with the conversion to say. */
const UNIT_HINTS: Readonly<Record<string, string>> = {
  co2_gtc: 'co2_gtco2 (Gt CO2 per year: multiply Gt C by 44/12 = 3.664)',
  co2_pgc: 'co2_gtco2 (Gt CO2 per year: multiply Pg C by 44/12 = 3.664)',
  n2o_tgn: 'n2o_mt (Mt N2O per year: multiply Tg N by 44/28 = 1.571)',
  n2o_mtn: 'n2o_mt (Mt N2O per year: multiply Mt N by 44/28 = 1.571)',
};

/** Column names as listed in messages: the halogenated gases as two patterns instead of 72 names. */
const LISTED_COLUMNS: readonly string[] = [
  ...PATHWAY_COLUMNS.filter((c) => !(HALOGEN_EMISSION_COLUMNS as readonly string[]).includes(c) && !(HALOGEN_CONCENTRATION_COLUMNS as readonly string[]).includes(c)),
  '<gas>_kt', '<gas>_ppt (halogenated gases)',
];

type CellRole =
  | { kind: 'time'; name: 'year' | 'date'; header: string }
  | { kind: 'data'; column: PathwayColumn; header: string }
  | { kind: 'skip' };

/**
 * Reads and validates the text of a pathway CSV file (no file system access: pass the text).
 *
 * Format: UTF-8 text (a leading byte-order mark is dropped), lines ended by LF, CRLF or CR. Lines
 * whose first non-blank character is `#` are comments; `# key: value` comments become metadata
 * (`# name: Swift transition`). Blank lines, and lines holding only delimiters (spreadsheets write
 * `,,,` rows), are skipped. Comment, blank and skipped lines all count in line numbers. The first
 * other line is the header. The delimiter is `,`; when the header has no comma outside quotes but a
 * `;` (or a tab), that is the delimiter and numbers may then use a decimal comma (`415,2`).
 * Cells may be quoted with `"` (`""` inside a quoted cell is one quote); a quoted cell cannot span
 * lines. Header names are trimmed and matched case-insensitively against `year` or `date` (exactly
 * one of them) and PATHWAY_COLUMNS. Numbers are plain decimals or exponent forms (`4.152e2`), without
 * units or thousands separators; NaN, Infinity and empty cells are refused; values must lie in
 * VALUE_BOUNDS. `year` values are whole or decimal years, `date` values ISO 8601 dates converted by
 * isoDateToYear; either must lie between 1000 and 3000 and increase strictly down the file (gaps are
 * fine: toAnnual interpolates).
 *
 * Every problem in the file is collected (up to 1000, then one summary problem), each with its
 * physical line, column, the offending text and the expected form.
 *
 * @param text - the whole file's contents
 * @param file - the path or name to report in messages (also the name when there is no `# name:`)
 * @returns the rows, in file order
 * @throws InputError listing every problem found
 * @example
 * const p = parsePathway('# name: Demo\nyear,co2_ppm\n2030,440\n2040,460\n', 'demo.csv');
 * p.name // 'Demo'
 * p.times // Float64Array [2030, 2040]
 * p.columns.co2_ppm // Float64Array [440, 460]
 * p.rowLines // Int32Array [3, 4]
 */
export function parsePathway(text: string, file: string): ParsedPathway {
  const problems: InputProblem[] = [];
  let dropped = 0;
  const report = (p: Omit<InputProblem, 'file'>) => {
    if (problems.length < MAX_PROBLEMS) problems.push({ file, ...p });
    else dropped++;
  };

  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  if (body.trim() === '') {
    throw new InputError([{
      file,
      code: 'input.empty',
      message: 'must not be empty',
      expected: 'a header row such as "year,co2_ppm" followed by one row per year',
    }]);
  }

  const lines = body.split(/\r\n|\r|\n/);
  const metadata: Record<string, string> = {};
  let headerLine = 0;
  let delimiter = ',';
  let roles: CellRole[] = [];
  let headerCells: string[] = [];
  let timeRole: Extract<CellRole, { kind: 'time' }> | undefined;

  const times: number[] = [];
  const dateTexts: string[] = [];
  const rowLines: number[] = [];
  const values = new Map<PathwayColumn, number[]>();
  const lineOfTime = new Map<number, number>();
  const textOfTime = new Map<number, string>();
  let latestTime = -Infinity;
  let latestTimeText = '';
  let latestTimeLine = 0;
  /** Decimal-comma files: whether any cell used a decimal comma, and cells such as 37.500 that then mean 37500. */
  let sawDecimalComma = false;
  const dottedCells: { line: number; column: string; value: string }[] = [];

  for (let i = 0; i < lines.length; i++) {
    const lineNumber = i + 1;
    const trimmed = lines[i].trim();
    if (trimmed === '') continue;
    if (trimmed.startsWith('#')) {
      const m = METADATA.exec(trimmed);
      if (m) metadata[m[1].toLowerCase()] = m[2].trim();
      continue;
    }

    if (headerLine === 0) {
      headerLine = lineNumber;
      delimiter = detectDelimiter(lines[i]);
      const cells = splitCells(lines[i], delimiter, lineNumber, report);
      if (cells === undefined) break;
      headerCells = cells;
      roles = readHeader(cells, lineNumber, report);
      const timeRoles = roles.filter((r): r is Extract<CellRole, { kind: 'time' }> => r.kind === 'time');
      if (timeRoles.length === 1) timeRole = timeRoles[0];
      for (const r of roles) if (r.kind === 'data') values.set(r.column, []);
      continue;
    }

    const cells = splitCells(lines[i], delimiter, lineNumber, report);
    if (cells === undefined) continue;
    if (cells.every((c) => c.trim() === '')) continue;
    if (rowLines.length === 0 && looksLikeUnitsRow(cells.map((c) => c.trim()), (c) => readNumber(c, delimiter).ok)) {
      report({
        code: 'input.units-row',
        line: lineNumber,
        message: `must hold numbers: this looks like a row of units under the header on line ${headerLine}; `
          + 'delete it or start it with # (units are in the column names: co2_ppm is ppm, co2_gtco2 Gt CO2 per year)',
        value: lines[i],
        expected: 'the first data row, such as "2030,440"',
      });
      continue;
    }
    if (cells.length !== headerCells.length) {
      report({
        code: 'input.cell-count',
        line: lineNumber,
        message: `must have ${headerCells.length} cells like the header on line ${headerLine}, found ${cells.length}`,
        value: lines[i],
        expected: `${headerCells.length} cells separated by "${delimiter === '\t' ? '\\t' : delimiter}"`,
      });
      continue;
    }

    rowLines.push(lineNumber);
    let time = NaN;
    for (let j = 0; j < cells.length; j++) {
      const role = roles[j];
      const cell = cells[j].trim();
      if (role.kind === 'time') {
        if (role !== timeRole) continue;
        time = readTime(cell, role, lineNumber, delimiter, report);
      } else if (role.kind === 'data') {
        values.get(role.column)!.push(readValue(cell, role, lineNumber, delimiter, report));
        if (delimiter !== ',') {
          if (DECIMAL_COMMA_NUMBER.test(cell)) sawDecimalComma = true;
          else if (ambiguousDecimalPoint(cell)) dottedCells.push({ line: lineNumber, column: role.header, value: cell });
        }
      }
    }
    times.push(time);
    if (timeRole) dateTexts.push(cells[roles.indexOf(timeRole)].trim());

    if (timeRole && Number.isFinite(time)) {
      const timeText = cells[roles.indexOf(timeRole)].trim();
      const earlier = lineOfTime.get(time);
      if (earlier !== undefined) {
        const sameText = textOfTime.get(time) === timeText;
        report({
          code: 'input.duplicate-time',
          line: lineNumber,
          column: timeRole.header,
          message: sameText || timeRole.name === 'year'
            ? `must not repeat a ${timeRole.name}: the same ${timeRole.name} is on line ${earlier}`
            : `must not repeat a year: ${textOfTime.get(time)} on line ${earlier} stands for the same year (1 and 2 July both mean the middle of their year)`,
          value: timeText,
          expected: `each ${timeRole.name} once, increasing down the file`,
        });
      } else {
        if (time < latestTime) {
          report({
            code: 'input.time-order',
            line: lineNumber,
            column: timeRole.header,
            message: `must increase down the file: this row comes after ${latestTimeText} on line ${latestTimeLine}`,
            value: timeText,
            expected: `${timeRole.name === 'year' ? 'years' : 'dates'} in increasing order`,
          });
        } else {
          latestTime = time;
          latestTimeText = timeText;
          latestTimeLine = lineNumber;
        }
        lineOfTime.set(time, lineNumber);
        textOfTime.set(time, timeText);
      }
    }
  }

  if (sawDecimalComma) {
    for (const at of dottedCells) {
      report({
        ...at,
        code: 'input.thousands-separator',
        message: `must be written with the file's decimal comma: in a file whose numbers use decimal commas, ${at.value} reads as `
          + `${at.value.replace(/\./g, '')} with a thousands separator`,
        expected: `${at.value.replace(/\./g, '')} without the separator, or ${at.value.replace('.', ',')} if a decimal was meant`,
      });
    }
  }

  if (headerLine === 0) {
    report({
      code: 'input.no-header',
      message: 'must have a header row (the file holds only comments and blank lines)',
      expected: 'a header row such as "year,co2_ppm" followed by one row per year',
    });
  } else if (rowLines.length === 0 && headerCells.length > 0) {
    report({
      code: 'input.no-rows',
      line: headerLine,
      message: 'must have at least one data row after the header',
      expected: 'one row per year, such as "2030,440"',
    });
  }

  // In file order (a problem found at the end, such as a thousands separator, goes back to its line).
  problems.sort((a, b) => (a.line ?? 0) - (b.line ?? 0));
  if (dropped > 0) {
    problems.push({
      file,
      code: 'input.too-many-problems',
      message: `${dropped} more problems not listed (the first ${MAX_PROBLEMS} are above)`,
    });
  }
  if (problems.length > 0) throw new InputError(problems);

  const columns: Partial<Record<PathwayColumn, Float64Array>> = {};
  for (const column of PATHWAY_COLUMNS) {
    const v = values.get(column);
    if (v) columns[column] = Float64Array.from(v);
  }
  // Dates all on one day of the year name calendar years (DESIGN.md conventions; README).
  const common = timeRole!.name === 'date' ? commonDayOfDates(dateTexts) : undefined;
  const sameDay = common && common.firstOther < 0 ? common : undefined;
  const mostly = common && !sameDay && common.count >= 2 && 2 * common.count >= dateTexts.length
    ? { monthDay: common.monthDay, count: common.count, otherLine: rowLines[common.firstOther] }
    : undefined;
  return {
    file,
    name: metadata.name || baseName(file),
    metadata,
    timeColumn: timeRole!.name,
    times: Float64Array.from(sameDay ? sameDay.years : times),
    ...(sameDay ? { datesOnDay: sameDay.monthDay } : {}),
    ...(mostly ? { datesMostlyOnDay: mostly } : {}),
    columns,
    rowLines: Int32Array.from(rowLines),
    headerLine,
  };
}

/** Collects a problem of the file being read (the file is added by the collector). */
export type Report = (p: Omit<InputProblem, 'file'>) => void;

/** `,` unless the header has no comma outside quotes and has a `;` (or else a tab). Shared with the scenario-table reader. */
export function detectDelimiter(headerLine: string): string {
  let inQuotes = false;
  const seen = new Set<string>();
  for (const ch of headerLine) {
    if (ch === '"') inQuotes = !inQuotes;
    else if (!inQuotes && (ch === ',' || ch === ';' || ch === '\t')) seen.add(ch);
  }
  if (seen.has(',')) return ',';
  if (seen.has(';')) return ';';
  if (seen.has('\t')) return '\t';
  return ',';
}

/** The cells of one physical line (papaparse does the quoting), or undefined after a quote problem. Shared with the scenario-table reader. */
export function splitCells(line: string, delimiter: string, lineNumber: number, report: Report): string[] | undefined {
  // Unquoted lines (nearly all) split directly: papaparse costs about 10 us a call, 20 s for a 64 MiB file.
  if (!line.includes('"')) return line.split(delimiter);
  const parsed = Papa.parse<string[]>(line, { delimiter, quoteChar: '"', escapeChar: '"', header: false });
  const quoteError = parsed.errors.find((e) => e.type === 'Quotes');
  if (quoteError) {
    report({
      code: 'input.bad-quotes',
      line: lineNumber,
      message: quoteError.code === 'MissingQuotes'
        ? 'must close every quoted cell on the same line'
        : 'must end a quoted cell right after its closing quote',
      value: line,
      expected: 'cells such as 415.2 or "415.2" (a quote inside a quoted cell written "")',
    });
    return undefined;
  }
  return parsed.data[0] ?? [];
}

/** Assigns each header cell its role and reports header problems. */
function readHeader(cells: string[], line: number, report: Report): CellRole[] {
  const roles: CellRole[] = [];
  const firstIndex = new Map<string, number>();
  const known: readonly string[] = ['year', 'date', ...PATHWAY_COLUMNS];
  let unknownCount = 0;

  cells.forEach((cell, j) => {
    const header = cell.trim();
    const key = header.toLowerCase();
    if (header === '') {
      report({
        code: 'input.empty-column-name',
        line,
        column: String(j + 1),
        message: `must name every column (header cell ${j + 1} is empty)`,
        expected: `one of year, date, ${LISTED_COLUMNS.join(', ')}`,
      });
      roles.push({ kind: 'skip' });
      return;
    }
    const earlier = firstIndex.get(key);
    if (earlier !== undefined) {
      report({
        code: 'input.duplicate-column',
        line,
        column: header,
        message: `must name each column once: header cells ${earlier + 1} and ${j + 1} are both "${key}"`,
        value: header,
        expected: 'each column once',
      });
      roles.push({ kind: 'skip' });
      return;
    }
    firstIndex.set(key, j);
    if (key === 'year' || key === 'date') {
      roles.push({ kind: 'time', name: key, header });
    } else if ((PATHWAY_COLUMNS as readonly string[]).includes(key)) {
      roles.push({ kind: 'data', column: key as PathwayColumn, header });
    } else {
      unknownCount++;
      const hintKey = key.replace(/[^a-z0-9]+/g, '_');
      const hint = Object.hasOwn(UNIT_HINTS, hintKey) ? UNIT_HINTS[hintKey] : undefined;
      const halogen = hint === undefined ? /^(.+?)[\s_]*(kt|ppt)$/.exec(key) : null;
      if (halogen) {
        const g = nearestHalogen(halogen[1]);
        report({
          code: 'input.unknown-gas',
          line,
          column: header,
          message: 'must name a halogenated gas warmcast models (from the IPCC AR6 WG1 Table 7.SM.7 species)'
            + (g ? `; did you mean "${g.column}_${halogen[2]}" (${g.label}, ${g.name})?` : ''),
          value: header,
          expected: `<gas>_${halogen[2]} with <gas> one of ${HALOGEN_COLUMNS.join(', ')}`,
        });
        roles.push({ kind: 'skip' });
        return;
      }
      const guess = hint === undefined ? columnSuggestion(key, known, (c) => COLUMN_UNITS[c as PathwayColumn]) : undefined;
      report({
        code: 'input.unknown-column',
        line,
        column: header,
        message: hint !== undefined
          ? `must be a known column name; give ${hint}`
          : guess !== undefined
            ? `must be a known column name; ${guess}`
            : 'must be a known column name',
        value: header,
        expected: `one of year, date, ${LISTED_COLUMNS.join(', ')}`,
      });
      roles.push({ kind: 'skip' });
    }
  });

  const timeRoles = roles.filter((r) => r.kind === 'time');
  if (timeRoles.length === 0) {
    report({
      code: 'input.no-time-column',
      line,
      message: 'must have a time column',
      expected: 'a column named "year" (whole or decimal years) or "date" (ISO 8601 dates such as 2030-07-01; 1 or 2 July means that whole year)',
    });
  } else if (timeRoles.length > 1) {
    report({
      code: 'input.two-time-columns',
      line,
      column: timeRoles[1].header,
      message: 'must have one time column, not both "year" and "date"',
      value: timeRoles[1].header,
      expected: 'either a "year" or a "date" column',
    });
  }

  const dataRoles = roles.filter((r): r is Extract<CellRole, { kind: 'data' }> => r.kind === 'data');
  // Each gas once: the three main gases and the halogenated ones, as a concentration or as emissions.
  const gasForms = [
    ...(Object.keys(GASES) as Gas[]).map((gas) => ({ name: gas.toUpperCase(), ...GASES[gas] })),
    ...HALOGEN_COLUMNS.map((gas) => ({ name: gas, concentration: `${gas}_ppt`, emission: `${gas}_kt` })),
  ];
  for (const { name, concentration, emission } of gasForms) {
    const conc = dataRoles.find((r) => r.column === concentration);
    const emis = dataRoles.find((r) => r.column === emission);
    if (conc && emis) {
      const later = roles.indexOf(conc) > roles.indexOf(emis) ? conc : emis;
      report({
        code: 'input.gas-twice',
        line,
        column: later.header,
        message: `must give ${name} either as a concentration (${concentration}) or as emissions (${emission}), not both`,
        value: later.header,
        expected: `one column per gas: ${concentration} or ${emission}`,
      });
    }
  }
  for (const lumped of LUMPED_FORCING_COLUMNS) {
    const whole = dataRoles.find((r) => r.column === lumped);
    const part = dataRoles.find((r) => (LUMPED_PARTS[lumped] as readonly string[]).includes(r.column));
    if (whole && part) {
      const later = roles.indexOf(whole) > roles.indexOf(part) ? whole : part;
      report({
        code: 'input.forcing-twice',
        line,
        column: later.header,
        message: `must give ${lumped} or its agent columns (${LUMPED_PARTS[lumped].join(', ')}), not both`,
        value: later.header,
        expected: `either ${lumped} alone or agent columns only`,
      });
    }
  }
  if (dataRoles.length === 0 && unknownCount === 0) {
    report({
      code: 'input.no-data-columns',
      line,
      message: 'must have at least one data column besides the time column',
      expected: `one or more of ${LISTED_COLUMNS.join(', ')}`,
    });
  }
  return roles;
}

export type NumberRead = { ok: true; value: number } | { ok: false; code: string; message: string; expected: string };

/** Reads one number cell; a decimal comma is accepted when the delimiter is not a comma. Shared with the scenario-table reader. */
export function readNumber(cell: string, delimiter: string): NumberRead {
  if (NUMBER.test(cell)) return { ok: true, value: Number(cell) };
  const decimalComma = delimiter !== ',';
  const example = decimalComma ? '415,2 or 415.2' : '415.2';
  if (cell === '') {
    return { ok: false, code: 'input.empty-cell', message: 'must not be empty', expected: `a number such as ${example} in every cell` };
  }
  if (NOT_FINITE.test(cell)) {
    return { ok: false, code: 'input.not-finite', message: 'must be a finite number', expected: `a number such as ${example}` };
  }
  if (decimalComma && DECIMAL_COMMA_NUMBER.test(cell)) return { ok: true, value: Number(cell.replace(',', '.')) };
  const plain = thousandsSeparated(cell, decimalComma);
  if (plain !== undefined) {
    return { ok: false, code: 'input.thousands-separator', message: `must be a number without thousands separators (write ${plain})`, expected: `a number such as ${example}` };
  }
  return {
    ok: false,
    code: 'input.bad-number',
    message: 'must be a number',
    expected: decimalComma
      ? `a number such as ${example}, without units or thousands separators`
      : `a number such as ${example}, with a decimal point and without units or thousands separators`,
  };
}

function readValue(
  cell: string,
  role: Extract<CellRole, { kind: 'data' }>,
  line: number,
  delimiter: string,
  report: Report,
): number {
  const read = readNumber(cell, delimiter);
  if (!read.ok) {
    report({ code: read.code, line, column: role.header, message: read.message, value: cell, expected: read.expected });
    return NaN;
  }
  const outside = outOfBounds(role.column, read.value);
  if (outside) report({ line, column: role.header, value: cell, ...outside });
  return read.value;
}

function readTime(
  cell: string,
  role: Extract<CellRole, { kind: 'time' }>,
  line: number,
  delimiter: string,
  report: Report,
): number {
  const at = { line, column: role.header, value: cell };
  if (role.name === 'year') {
    const read = readNumber(cell, delimiter);
    if (!read.ok) {
      const asDate = /^\d{4}-\d{2}-\d{2}/.test(cell) || dateHint(cell) !== undefined;
      const message = asDate ? `must be a year: ${cell} is a date; name the column "date" (ISO 8601 dates such as 2030-07-01) or give years` : read.message;
      report({ ...at, code: asDate ? 'input.date-in-year-column' : read.code, message, expected: 'a year such as 2030 or 2030.5' });
      return NaN;
    }
    if (!(read.value >= YEAR_MIN && read.value <= YEAR_MAX)) {
      report({ ...at, code: 'input.bad-year', message: `must be a year from ${YEAR_MIN} to ${YEAR_MAX}`, expected: 'a year such as 2030 or 2030.5' });
      return NaN;
    }
    return read.value;
  }
  if (cell === '') {
    report({ ...at, code: 'input.empty-cell', message: 'must not be empty', expected: 'an ISO 8601 date such as 2030-07-01 in every row' });
    return NaN;
  }
  const read = isoDateToYear(cell);
  if (!read.ok) {
    report({ ...at, code: 'input.bad-date', message: dateHint(cell) ?? `must be an ISO 8601 date: ${read.reason}`, expected: 'a full date such as 2030-07-01 (1 or 2 July means that whole year)' });
    return NaN;
  }
  if (!(read.year >= YEAR_MIN && read.year <= YEAR_MAX)) {
    report({ ...at, code: 'input.bad-year', message: `must be a date in the years ${YEAR_MIN} to ${YEAR_MAX}`, expected: 'a full date such as 2030-07-01 (1 or 2 July means that whole year)' });
    return NaN;
  }
  return read.year;
}

/** The last path segment without its extension (`pathways/swift.csv` -> `swift`). */
function baseName(file: string): string {
  const last = file.split(/[\\/]/).pop() ?? file;
  const dot = last.lastIndexOf('.');
  return dot > 0 ? last.slice(0, dot) : last;
}

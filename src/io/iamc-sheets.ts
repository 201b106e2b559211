import ExcelJS from 'exceljs';
import { InputError } from '../errors.js';
import { detectDelimiter, splitCells, type Report } from './parse-pathway.js';

/** A cell as read: text (CSV, or a text cell of a spreadsheet), a number, or empty. */
export type SheetCell = string | number | null;

/** One grid of cells: a CSV file or one worksheet of a workbook. */
export interface IamcSheet {
  /** Worksheet name (undefined for a CSV file). */
  sheet?: string;
  /** Non-blank rows in order, each with its 1-based line (CSV, comment lines counted) or row number (worksheet). */
  rows: { line: number; cells: SheetCell[] }[];
  /** Delimiter of a CSV file (`,`, `;` or tab); numbers may use a decimal comma when it is not `,`. */
  delimiter: string;
}

/**
 * The rows of a scenario table written as CSV text: blank lines and `#` comment lines skipped (and
 * counted in line numbers), the delimiter chosen from the first row as for pathway files (`,`, else
 * `;` or tab), quoted cells on one line. Cells stay text; the table reader reads the numbers.
 *
 * @param text the file's contents (a leading byte-order mark is dropped)
 * @param file the path, for messages
 * @throws InputError for unterminated quotes
 * @example csvSheet('Model,Scenario\nA,B\n', 't.csv').rows // [{ line: 1, cells: ['Model', 'Scenario'] }, { line: 2, cells: ['A', 'B'] }]
 */
export function csvSheet(text: string, file: string): IamcSheet {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const lines = body.split(/\r\n|\r|\n/);
  const problems: InputError['problems'] = [];
  const report: Report = (p) => problems.push({ file, ...p });
  const rows: IamcSheet['rows'] = [];
  let delimiter: string | undefined;
  for (let i = 0; i < lines.length; i++) {
    const trimmed = lines[i].trim();
    if (trimmed === '' || trimmed.startsWith('#')) continue;
    delimiter ??= detectDelimiter(lines[i]);
    const cells = splitCells(lines[i], delimiter, i + 1, report);
    if (cells === undefined || cells.every((c) => c.trim() === '')) continue;
    rows.push({ line: i + 1, cells });
  }
  if (problems.length > 0) throw new InputError(problems);
  return { rows, delimiter: delimiter ?? ',' };
}

/**
 * The worksheets of an .xlsx workbook (read with exceljs), each as rows of cells: numbers stay
 * numbers, text is text, a formula gives its cached result, rich text its plain text, a date its
 * ISO text; empty rows are skipped, row numbers are the sheet's own.
 *
 * @param bytes the file's contents
 * @param file the path, for messages
 * @throws InputError when the bytes are not an .xlsx workbook
 */
export async function xlsxSheets(bytes: Uint8Array, file: string): Promise<IamcSheet[]> {
  const workbook = new ExcelJS.Workbook();
  try {
    await workbook.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch (e) {
    throw new InputError([{
      file,
      code: 'input.not-xlsx',
      message: `must be an Excel workbook (.xlsx): ${(e as Error).message}`,
      expected: 'an .xlsx file saved by a spreadsheet program, or a CSV file',
    }]);
  }
  const sheets: IamcSheet[] = [];
  workbook.eachSheet((worksheet) => {
    const rows: IamcSheet['rows'] = [];
    worksheet.eachRow({ includeEmpty: false }, (row, rowNumber) => {
      const cells: SheetCell[] = [];
      // row.values is 1-based (index 0 unused).
      const values = row.values as unknown[];
      for (let j = 1; j < values.length; j++) cells.push(cellValue(values[j]));
      if (cells.some((c) => c !== null && c !== '')) rows.push({ line: rowNumber, cells });
    });
    sheets.push({ sheet: worksheet.name, rows, delimiter: ',' });
  });
  return sheets;
}

/** A spreadsheet cell's value as text or number. */
function cellValue(v: unknown): SheetCell {
  if (v === null || v === undefined) return null;
  if (typeof v === 'number' || typeof v === 'string') return v;
  if (typeof v === 'boolean') return String(v);
  if (v instanceof Date) return v.toISOString().slice(0, 10);
  if (typeof v === 'object') {
    const o = v as { result?: unknown; richText?: { text: string }[]; text?: unknown; error?: string };
    if ('result' in o) return cellValue(o.result);
    if (o.richText) return o.richText.map((r) => r.text).join('');
    if (o.error !== undefined) return String(o.error);
    if (o.text !== undefined) return cellValue(o.text);
  }
  return String(v);
}

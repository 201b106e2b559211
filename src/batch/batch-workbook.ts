import ExcelJS from 'exceljs';
import { tableColumns, type Table } from '../io/table.js';

/**
 * A batch summary as an .xlsx workbook (exceljs): sheet "summary" (numbers as numbers, missing
 * values as empty cells), sheet "errors" when there are any, and sheet "provenance" with one
 * key-value row per provenance member (objects as JSON text), so the file stands alone.
 *
 * @param summary the summary table (batchSummaryTable)
 * @param errors the errors table (batchErrorTable)
 * @param provenance the provenance record every output carries
 * @returns the workbook's bytes
 */
export async function batchWorkbook(summary: Table, errors: Table, provenance: object): Promise<Uint8Array> {
  const workbook = new ExcelJS.Workbook();
  addTable(workbook.addWorksheet('summary'), summary);
  if (tableColumns(errors).rows > 0) addTable(workbook.addWorksheet('errors'), errors);
  const info = workbook.addWorksheet('provenance');
  info.addRow(['key', 'value']);
  for (const [key, value] of Object.entries(provenance)) {
    if (Array.isArray(value) && value.every((v) => typeof v === 'string')) for (const v of value) info.addRow([key, v]);
    else info.addRow([key, typeof value === 'object' ? JSON.stringify(value) : value]);
  }
  return new Uint8Array(await workbook.xlsx.writeBuffer());
}

function addTable(sheet: ExcelJS.Worksheet, table: Table): void {
  const { rows, columns } = tableColumns(table);
  sheet.addRow(columns.map((c) => c.name));
  for (let r = 0; r < rows; r++) {
    sheet.addRow(columns.map((c) => {
      const v = c.values[r];
      return typeof v === 'number' ? (Number.isFinite(v) ? v : null) : v;
    }));
  }
  sheet.views = [{ state: 'frozen', ySplit: 1 }];
}

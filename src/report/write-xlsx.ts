import ExcelJS from 'exceljs';
import { headlineTable } from './headline-text.js';
import type { OutputDocument } from './output-document.js';
import { humanCell, humanLabel, isNumeric, rowCount, type OutputTable } from './output-table.js';
import { provenanceEntries } from './provenance-entries.js';

/**
 * A document as an Excel workbook (exceljs): a `headline` sheet, a `data` sheet with the yearly
 * table at full precision (numbers as numbers, column keys as headers, every year), one sheet per
 * human table, and a `notes` sheet with the notes, the full cautions and the provenance. Text that
 * a spreadsheet would run as a formula stays text: cells are written as values, never as formulas.
 *
 * @param doc the document
 * @param provenance where the numbers came from
 * @returns the .xlsx bytes
 */
export async function xlsxBytes(doc: OutputDocument, provenance: object & { created_utc?: string }): Promise<Uint8Array> {
  const wb = new ExcelJS.Workbook();
  wb.creator = 'warmcast';
  // The file's own dates are the run's, so the same run gives the same workbook metadata.
  const when = provenance.created_utc ? new Date(provenance.created_utc) : new Date(0);
  wb.created = when;
  wb.modified = when;
  if (doc.headline.length > 0) humanSheet(wb, headlineTable(doc.headline, doc.baseline));
  dataSheet(wb, doc.data);
  for (const t of doc.tables) humanSheet(wb, t);
  const notes = wb.addWorksheet('notes');
  notes.addRow([doc.title]).font = { bold: true };
  notes.addRow([doc.subtitle]);
  notes.addRow([]);
  notes.addRow(['Notes']).font = { bold: true };
  for (const n of doc.notes) notes.addRow([n]);
  notes.addRow([]);
  notes.addRow(['Cautions']).font = { bold: true };
  for (const c of doc.cautions) notes.addRow([c]);
  notes.addRow([]);
  notes.addRow(['Provenance']).font = { bold: true };
  for (const [k, v] of provenanceEntries(provenance)) if (k !== 'notes' && k !== 'caution') notes.addRow([k, v]);
  notes.getColumn(1).width = 60;
  return new Uint8Array(await wb.xlsx.writeBuffer());
}

/** A number as human tables show it, without units or ranges. */
const PLAIN_NUMBER = /^[+-]?\d+(\.\d+)?$/;

/** The yearly table: keys as headers, numbers at full precision, empty cells for NaN. */
function dataSheet(wb: ExcelJS.Workbook, t: OutputTable): void {
  const ws = wb.addWorksheet('data');
  ws.addRow(t.columns.map((c) => c.key)).font = { bold: true };
  const rows = rowCount(t);
  for (let r = 0; r < rows; r++) {
    ws.addRow(t.columns.map((c) => (isNumeric(c) ? (Number.isFinite(c.values[r]) ? c.values[r] : null) : (c.values as readonly string[])[r])));
  }
  ws.views = [{ state: 'frozen', ySplit: 1 }];
}

/** A human table as its own sheet: caption, headers, the cells as shown elsewhere, notes. */
function humanSheet(wb: ExcelJS.Workbook, t: OutputTable): void {
  const ws = wb.addWorksheet(sheetName(wb, t.name));
  if (t.caption) ws.addRow([t.caption]).font = { bold: true };
  ws.addRow(t.columns.map(humanLabel)).font = { bold: true };
  const rows = rowCount(t);
  // A cell that is a plain number as shown (1.51, +0.02) goes in as a number, so it can be charted.
  for (let r = 0; r < rows; r++) ws.addRow(t.columns.map((c) => (PLAIN_NUMBER.test(humanCell(c, r)) ? Number(humanCell(c, r)) : humanCell(c, r))));
  for (const n of t.notes ?? []) ws.addRow([n]);
  t.columns.forEach((c, j) => (ws.getColumn(j + 1).width = Math.min(40, Math.max(10, humanLabel(c).length + 2))));
}

/** A sheet name Excel accepts (at most 31 characters, none of []:*?/\) and not yet used. */
function sheetName(wb: ExcelJS.Workbook, name: string): string {
  const base = name.replace(/[[\]:*?/\\]/g, ' ').slice(0, 28) || 'table';
  let out = base;
  for (let k = 2; wb.getWorksheet(out); k++) out = `${base} ${k}`;
  return out;
}

import { humanCell, rowCount, type OutputTable } from '../../src/report/output-table.js';

/** A table's cells as human formats show them, row by row. */
export function rowsOf(t: OutputTable): string[][] {
  return Array.from({ length: rowCount(t) }, (_, r) => t.columns.map((c) => humanCell(c, r)));
}

/** A table's human headers. */
export function headersOf(t: OutputTable): string[] {
  return t.columns.map((c) => c.label ?? c.key);
}

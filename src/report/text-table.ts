/**
 * A table of formatted cells, ready for any writer (terminal, Markdown, HTML). Cells are final text:
 * the writer only lays them out and escapes them.
 */
export interface TextTable {
  /** One-line title of the table. */
  caption?: string;
  /** Column headings, in order. */
  columns: string[];
  /** Rows of cells, each as long as `columns`. */
  rows: string[][];
  /** Per column: true for numbers, which writers right-align. Default: all left-aligned. */
  numeric?: boolean[];
  /** Sentences printed under the table (how to read it, conventions used). */
  notes?: string[];
}

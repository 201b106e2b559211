import type { OutputDocument } from './output-document.js';
import { csvText } from './write-csv.js';
import { htmlText } from './write-html.js';
import { jsonSummary, jsonText } from './write-json.js';
import { markdownText } from './write-markdown.js';
import { svgText } from './write-svg.js';
import { xlsxBytes } from './write-xlsx.js';

/**
 * The output registry: every file format a command that projects can write, by extension, each
 * rendered from the same OutputDocument by one writer. To add a format, add a writer file in
 * report/ and one entry here; every command then writes it. To add a command, build an
 * OutputDocument (see run-document.ts, ensemble-document.ts, comparison-document.ts) and hand it
 * to the CLI's writeDocument.
 */
export const OUTPUT_FORMATS = {
  '.csv': { what: 'the yearly table, every year (+ .meta.json with the headline, notes and provenance)' },
  '.json': { what: 'headline, notes, provenance and the yearly table' },
  '.md': { what: 'headline and milestone tables to paste into documents, notes, cautions, provenance' },
  '.svg': { what: 'the charts' },
  '.html': { what: 'a self-contained page: headline, tables, charts, notes, cautions, provenance' },
  '.xlsx': { what: 'a workbook: headline, the yearly table at full precision, milestone tables, notes' },
} as const;

/** An extension of the registry. */
export type OutputFormat = keyof typeof OUTPUT_FORMATS;

/** One file of a rendered output: `suffix` is added to the target path with its extension removed (`.csv`, `.meta.json`). */
export interface RenderedFile {
  suffix: string;
  content: string | Uint8Array;
}

/**
 * The formats that fit a document: every format, except `.svg` for a document without charts (a
 * table of checks, say).
 * @example formatsOf(doc) // ['.csv', '.json', '.md', '.svg', '.html', '.xlsx']
 */
export function formatsOf(doc: Pick<OutputDocument, 'charts'>): OutputFormat[] {
  return (Object.keys(OUTPUT_FORMATS) as OutputFormat[]).filter((f) => f !== '.svg' || doc.charts.length > 0);
}

/**
 * Whether `ext` (lower case, with the dot) is a format of the registry.
 * @example isOutputFormat('.xlsx') // true
 */
export function isOutputFormat(ext: string): ext is OutputFormat {
  return Object.hasOwn(OUTPUT_FORMATS, ext);
}

/**
 * Renders a document in one format: the file, and for CSV its `.meta.json` sidecar (the headline,
 * notes, cautions and provenance a spreadsheet table cannot hold).
 *
 * @param doc the document
 * @param provenance where the numbers came from (the CLI builds it)
 * @param format the extension
 * @returns the files to write together
 */
export async function renderDocument(doc: OutputDocument, provenance: object, format: OutputFormat): Promise<RenderedFile[]> {
  switch (format) {
    case '.csv':
      return [
        { suffix: '.csv', content: csvText(doc.data) },
        // The provenance at the top level (as before the registry), then what the JSON form holds besides its rows.
        { suffix: '.meta.json', content: JSON.stringify({ ...provenance, ...jsonSummary(doc) }, null, 2) + '\n' },
      ];
    case '.json':
      return [{ suffix: '.json', content: jsonText(doc, provenance) }];
    case '.md':
      return [{ suffix: '.md', content: markdownText(doc, provenance) }];
    case '.svg':
      return [{ suffix: '.svg', content: svgText(doc) }];
    case '.html':
      return [{ suffix: '.html', content: htmlText(doc, provenance) }];
    case '.xlsx':
      return [{ suffix: '.xlsx', content: await xlsxBytes(doc, provenance) }];
  }
}

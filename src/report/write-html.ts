import { headlineTable } from './headline-text.js';
import { htmlReport } from './html-report.js';
import type { OutputDocument } from './output-document.js';
import { svgChart } from './svg-chart.js';

/**
 * A document as one self-contained HTML page (see htmlReport): the title, what was run, the
 * headline table (as in Markdown), the cautions, the human tables,
 * the charts inline as SVG, the notes, the provenance.
 *
 * @param doc the document
 * @param provenance where the numbers came from
 * @returns the HTML document text
 */
export function htmlText(doc: OutputDocument, provenance: object): string {
  return htmlReport({
    title: doc.title,
    summaryLines: [doc.subtitle, ...(doc.labelKey ?? [])],
    tables: [...(doc.headline.length > 0 ? [headlineTable(doc.headline, doc.baseline)] : []), ...doc.tables],
    charts: doc.charts.map(svgChart),
    assumptions: { baseline: `warming relative to the ${doc.baseline[0]}-${doc.baseline[1]} mean`, 'warming levels': 'reached in the middle year of the first 20-year period whose mean exceeds the level (IPCC AR6 WG1)' },
    provenance,
    cautions: doc.cautions,
    notes: doc.notes,
  });
}

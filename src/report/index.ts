/**
 * report/: the output registry. Every command that projects builds an OutputDocument (headline from
 * metrics, tables in the one table model, charts, notes, cautions) and hands it to one writer per
 * format; see README.md in this folder for how to add a format or a command.
 */
export { comparisonDocument } from './comparison-document.js';
export type { ComparisonDocumentOptions } from './comparison-document.js';
export { comparisonSummary } from './comparison-json.js';
export { comparisonLongTable } from './comparison-long-table.js';
export { comparisonTables } from './comparison-tables.js';
export type { ComparisonTableOptions } from './comparison-tables.js';
export { comparisonUncertainty } from './comparison-uncertainty.js';
export { ensembleDocument, ensembleWarming } from './ensemble-document.js';
export type { EnsembleDocumentOptions } from './ensemble-document.js';
export { escapeMarkup } from './escape-markup.js';
export { headlineLines, headlineTable } from './headline-text.js';
export { htmlReport } from './html-report.js';
export type { HtmlReportOptions } from './html-report.js';
export { OUTPUT_FORMATS, formatsOf, isOutputFormat, renderDocument } from './output-formats.js';
export type { OutputFormat, RenderedFile } from './output-formats.js';
export type { OutputDocument } from './output-document.js';
export { humanCell, humanDigits, humanLabel, isNumeric, rowCount, yearRows, yearSpan } from './output-table.js';
export type { OutputColumn, OutputTable } from './output-table.js';
export { projectionDocument } from './projection-document.js';
export type { ProjectionDocumentInput, RowChoice } from './projection-document.js';
export { provenanceEntries } from './provenance-entries.js';
export { runDocument } from './run-document.js';
export type { RunDocumentOptions } from './run-document.js';
export { scopedNotes } from './scoped-notes.js';
export type { ScopedNote } from './scoped-notes.js';
export { CALIBRATED_SET_CAUTION, shortCaution, standardCautions } from './standard-cautions.js';
export { svgChart } from './svg-chart.js';
export type { ChartBand, SvgChartOptions } from './svg-chart.js';
export { terminalChart } from './terminal-chart.js';
export type { ChartLine, TerminalChartOptions } from './terminal-chart.js';
export { plainTable, terminalText, wrap } from './terminal-text.js';
export type { TerminalTextOptions } from './terminal-text.js';
export { AR6_REFERENCE_PERIOD, isAr6Baseline, thresholdBaselineNote } from './threshold-baseline-note.js';
export { thresholdName } from './threshold-name.js';
export { warmingCharts } from './warming-charts.js';
export type { WarmingChartOptions } from './warming-charts.js';
export { csvText } from './write-csv.js';
export { htmlText } from './write-html.js';
export { jsonText } from './write-json.js';
export { markdownEscape, markdownTable, markdownText } from './write-markdown.js';
export { svgText } from './write-svg.js';
export { xlsxBytes } from './write-xlsx.js';
export { attributionDocument } from './attribution-document.js';
export type { AttributionDocumentOptions } from './attribution-document.js';
export { BUDGET_UNCERTAINTY, budgetDocument } from './budget-document.js';

import { escapeMarkup } from './escape-markup.js';
import { standardCautions } from './standard-cautions.js';
import { humanCell, humanLabel, isNumeric, rowCount, type OutputTable } from './output-table.js';

/** What {@link htmlReport} puts on the page. */
export interface HtmlReportOptions {
  title: string;
  /** Headline sentences shown under the title. */
  summaryLines?: readonly string[];
  /** Result tables, in order (the headline table first). */
  tables: readonly OutputTable[];
  /** Charts as SVG documents (e.g. from svgChart), inlined in order. */
  charts: readonly string[];
  /** Model and method choices: parameters, formula, baseline, history splice, ... (name -> text). */
  assumptions: Readonly<Record<string, string>>;
  /** Where the numbers came from (version, time, input hashes, parameters, seed), as the CLI built it. */
  provenance: object;
  /** The cautions, in full (default: standardCautions(uncertainty)). */
  cautions?: readonly string[];
  /** What uncertainty the report shows, when `cautions` is not given; see standardCautions. */
  uncertainty?: string;
  /** Notes on how the inputs were read and run. */
  notes?: readonly string[];
}

const CSS = `
:root { color-scheme: light; }
body { font-family: system-ui, -apple-system, 'Segoe UI', Roboto, Helvetica, Arial, sans-serif; color: #1a1a1a;
  background: #ffffff; max-width: 980px; overflow-wrap: anywhere; margin: 2rem auto; padding: 0 1rem; line-height: 1.45; }
h1 { font-size: 1.6rem; margin-bottom: 0.4rem; }
h2 { font-size: 1.2rem; margin-top: 2rem; border-bottom: 1px solid #d0d0d0; padding-bottom: 0.2rem; }
.summary { font-size: 1.02rem; }
.cautions { border-left: 4px solid #b45309; background: #fff8eb; padding: 0.6rem 1rem; }
.cautions h2 { margin-top: 0.2rem; border: none; }
table { border-collapse: collapse; margin: 0.8rem 0; width: 100%; font-size: 0.9rem; font-variant-numeric: tabular-nums; }
caption { text-align: left; font-weight: 600; padding-bottom: 0.3rem; }
th, td { border: 1px solid #cfcfcf; padding: 0.25rem 0.45rem; vertical-align: top; }
th { background: #f2f2f2; text-align: left; }
td.num, th.num { text-align: right; }
td.num { white-space: nowrap; }
.note { font-size: 0.9rem; color: #444444; margin: 0.2rem 0; }
.table-wrap { overflow-x: auto; max-width: 100%; }
figure { margin: 1rem 0; }
figure svg { max-width: 100%; height: auto; }
dl.kv { display: grid; grid-template-columns: max-content 1fr; gap: 0.2rem 1rem; }
dl.kv dt { font-weight: 600; }
dl.kv dd { margin: 0; overflow-wrap: anywhere; }
ul.plain { margin: 0; padding-left: 1.1rem; }
footer { margin-top: 2rem; font-size: 0.85rem; color: #555555; }
@media print { body { margin: 0; max-width: none; } section, figure, table { break-inside: avoid; } }
`;

/**
 * Builds a single self-contained HTML page: title, summary, cautions (the standard three, then any
 * extra), the tables, the charts inline as SVG, the assumptions and the provenance. CSS is inline;
 * there are no scripts, no external URLs, and a Content-Security-Policy that forbids loading
 * anything, so the page opens offline and prints cleanly. All text is escaped; chart SVG is
 * inserted as given (it must come from a trusted writer such as svgChart).
 *
 * @param options page content
 * @returns the HTML document text
 * @example
 * htmlReport({ title: 'Comparison', tables: [], charts: [], assumptions: { baseline: '1850-1900' }, provenance: { version: '0.1.0' } })
 * // '<!DOCTYPE html>\n<html lang="en">...'
 */
export function htmlReport(options: HtmlReportOptions): string {
  const e = escapeMarkup;
  const cautions = options.cautions ?? standardCautions(options.uncertainty);
  const parts: string[] = [];
  parts.push('<!DOCTYPE html>', '<html lang="en">', '<head>', '<meta charset="utf-8">');
  parts.push(`<meta http-equiv="Content-Security-Policy" content="default-src 'none'; style-src 'unsafe-inline'; img-src data:">`);
  parts.push('<meta name="viewport" content="width=device-width, initial-scale=1">');
  parts.push(`<title>${e(options.title)}</title>`, `<style>${CSS}</style>`, '</head>', '<body>');
  parts.push(`<h1>${e(options.title)}</h1>`);
  if (options.summaryLines && options.summaryLines.length > 0) {
    parts.push(`<section class="summary">${options.summaryLines.map((l) => `<p>${e(l)}</p>`).join('\n')}</section>`);
  }
  parts.push(`<section class="cautions"><h2>Read this first</h2><ul>${cautions.map((c) => `<li>${e(c)}</li>`).join('\n')}</ul></section>`);
  if (options.tables.length > 0) {
    parts.push('<section><h2>Results</h2>');
    for (const t of options.tables) parts.push(tableHtml(t));
    parts.push('</section>');
  }
  if (options.charts.length > 0) {
    parts.push('<section><h2>Charts</h2>');
    for (const svg of options.charts) parts.push(`<figure>${svg.replace(/^\s*<\?xml[^>]*\?>\s*/, '').trim()}</figure>`);
    parts.push('</section>');
  }
  if (options.notes && options.notes.length > 0) {
    parts.push(`<section><h2>Notes</h2><ul>${options.notes.map((n) => `<li>${e(n)}</li>`).join('\n')}</ul></section>`);
  }
  parts.push('<section><h2>Assumptions</h2>', keyValues(options.assumptions), '</section>');
  parts.push('<section><h2>Provenance</h2>', keyValues(options.provenance), '</section>');
  parts.push('<footer>Made with warmcast. This file is self-contained: it loads nothing from the network.</footer>');
  parts.push('</body>', '</html>');
  return parts.join('\n') + '\n';
}

function tableHtml(t: OutputTable): string {
  const e = escapeMarkup;
  // Numbers and ranges right-aligned: every column after the first (the year or the option).
  const cls = (j: number) => (j > 0 || isNumeric(t.columns[j]) ? ' class="num"' : '');
  const head = `<tr>${t.columns.map((c, j) => `<th scope="col"${cls(j)}>${e(humanLabel(c))}</th>`).join('')}</tr>`;
  const body = Array.from({ length: rowCount(t) }, (_, r) => `<tr>${t.columns.map((c, j) => `<td${cls(j)}>${e(humanCell(c, r))}</td>`).join('')}</tr>`).join('\n');
  const caption = t.caption ? `<caption>${e(t.caption)}</caption>` : '';
  const notes = (t.notes ?? []).map((n) => `<p class="note">${e(n)}</p>`).join('\n');
  // A table wider than the page scrolls inside its own box instead of widening the page.
  return `<div class="table-wrap"><table>${caption}<thead>${head}</thead><tbody>\n${body}\n</tbody></table></div>${notes ? '\n' + notes : ''}`;
}

/** An object as a definition list; nested objects nest, arrays become lists. */
function keyValues(value: object): string {
  const items = Object.entries(value).filter(([, v]) => v !== undefined);
  if (items.length === 0) return '<p class="note">none</p>';
  return `<dl class="kv">${items.map(([k, v]) => `<dt>${escapeMarkup(k)}</dt><dd>${valueHtml(v)}</dd>`).join('\n')}</dl>`;
}

function valueHtml(v: unknown): string {
  if (v === null || v === undefined) return 'none';
  if (Array.isArray(v)) return v.length === 0 ? 'none' : `<ul class="plain">${v.map((x) => `<li>${valueHtml(x)}</li>`).join('')}</ul>`;
  if (typeof v === 'object') return keyValues(v);
  return escapeMarkup(String(v));
}

import { headlineTable } from './headline-text.js';
import type { OutputDocument } from './output-document.js';
import { humanCell, humanLabel, isNumeric, rowCount, type OutputTable } from './output-table.js';
import { provenanceEntries } from './provenance-entries.js';

/**
 * Text as Markdown inline content, the one escaping rule of Markdown output: line breaks become
 * spaces; backslash, `|` (table cells), `<` (so `prob_above_<t>` is not read as an HTML tag), `*`
 * and `_` (so names such as `warming_p05_k` keep their underscores) are backslash-escaped.
 * @example markdownEscape('prob_above_<t> | a') // 'prob\\_above\\_\\<t> \\| a'
 */
export function markdownEscape(text: string): string {
  return text.replace(/\r\n|\r|\n/g, ' ').replace(/[\\|<*]/g, (c) => `\\${c}`);
}

/**
 * A table as a GitHub-flavoured Markdown pipe table with its caption in bold above and its notes
 * below. Columns after the first are right-aligned (numbers and ranges), the first left-aligned;
 * cells are padded so the source reads as a table too.
 *
 * @example markdownTable({ name: 't', columns: [{ key: 'year', values: Float64Array.of(2030) }] }) // '| year |\n| ---: |\n| 2030 |\n'
 */
export function markdownTable(t: OutputTable): string {
  const rows = rowCount(t);
  const right = t.columns.map((c, j) => isNumeric(c) || j > 0);
  const head = t.columns.map((c) => markdownEscape(humanLabel(c)));
  const body = Array.from({ length: rows }, (_, r) => t.columns.map((c) => markdownEscape(humanCell(c, r))));
  const widths = head.map((h, j) => Math.max(3, h.length, ...body.map((row) => row[j].length)));
  const pad = (s: string, j: number) => (right[j] ? s.padStart(widths[j]) : s.padEnd(widths[j]));
  const line = (cells: string[]) => `| ${cells.map(pad).join(' | ')} |`;
  const rule = `| ${widths.map((w, j) => (right[j] ? '-'.repeat(w - 1) + ':' : ':' + '-'.repeat(w - 1))).join(' | ')} |`;
  const out: string[] = [];
  if (t.caption) out.push(`**${markdownEscape(t.caption)}**`, '');
  out.push(line(head), rule, ...body.map(line));
  if (t.notes && t.notes.length > 0) out.push('', ...t.notes.map(markdownEscape));
  return out.join('\n') + '\n';
}

/**
 * A document as Markdown to paste into planning documents: title and what was run, the headline
 * table, the human tables (milestone years), then the notes, the full cautions and the provenance as
 * lists.
 *
 * @param doc the document
 * @param provenance where the numbers came from
 * @returns Markdown text ending in a newline
 */
export function markdownText(doc: OutputDocument, provenance: object): string {
  const list = (items: readonly string[]) => items.map((n) => `- ${markdownEscape(n)}`);
  const out = [
    `# ${markdownEscape(doc.title)}`,
    '',
    markdownEscape(doc.subtitle),
    '',
    ...(doc.headline.length > 0 ? [markdownTable(headlineTable(doc.headline, doc.baseline))] : []),
    ...(doc.labelKey ? [...list(doc.labelKey), ''] : []),
    ...doc.tables.map(markdownTable),
    '## Notes',
    '',
    ...(doc.notes.length > 0 ? list(doc.notes) : ['- none']),
    '',
    '## Cautions',
    '',
    ...list(doc.cautions),
    '',
    '## Provenance',
    '',
    ...provenanceEntries(provenance).filter(([k]) => k !== 'notes' && k !== 'caution').map(([k, v]) => `- ${markdownEscape(k)}: ${markdownEscape(v)}`),
  ];
  return out.join('\n') + '\n';
}

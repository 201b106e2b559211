import type { Comparison, PathwayComparison } from '../metrics/compare-pathways.js';
import type { Series } from '../metrics/series.js';
import { valueAtYear } from '../metrics/value-at-year.js';
import { comparisonLongTable } from './comparison-long-table.js';
import { comparisonTables } from './comparison-tables.js';
import { comparisonUncertainty } from './comparison-uncertainty.js';
import { kelvin, signedKelvin } from './format-numbers.js';
import type { OutputDocument } from './output-document.js';
import type { OutputColumn, OutputTable } from './output-table.js';
import { projectionDocument, type RowChoice } from './projection-document.js';
import { shortCaution, standardCautions } from './standard-cautions.js';
import { comparisonSummary } from './comparison-json.js';

/** What {@link comparisonDocument} needs besides the comparison. */
export interface ComparisonDocumentOptions {
  rows: RowChoice;
  baseline: readonly [number, number];
  /** What was run, one line (parameters or members, seed). */
  subtitle: string;
  observed?: Series & { label: string };
  notes: string[];
}

/**
 * The document of `warmcast compare`: one headline per option, the compact milestone table (each
 * option's warming and its difference from the reference, headed by the short labels; with members
 * the median and 5-95 % range, and for differences the range across paired members), the
 * per-option and crossing-odds tables, the long yearly table, the charts with each option's band in
 * its own colour and the difference chart.
 *
 * @param c the comparison, options labelled with short labels (their full names in `name`)
 * @param options rows, baseline, subtitle, observed record, notes
 */
export function comparisonDocument(c: Comparison, options: ComparisonDocumentOptions): OutputDocument {
  const [ref] = c.pathways;
  const allYears = unionYears(c.pathways);
  const columns: OutputColumn[] = [{ key: 'year', values: allYears }];
  for (const [j, p] of c.pathways.entries()) {
    columns.push({ key: `warming_k ${p.label}`, label: `${p.label} K`, values: Array.from(allYears, (y) => warmingCell(p, y)) });
    if (j > 0) columns.push({ key: `difference_k ${p.label}`, label: `${p.label} - ${ref.label}`, values: Array.from(allYears, (y) => differenceCell(p, y)) });
  }
  const ranged = c.pathways.some((p) => p.range);
  const compact: OutputTable = {
    name: 'milestones',
    caption: `Warming at milestone years, K relative to ${options.baseline[0]}-${options.baseline[1]}${ranged ? '; median [5-95 %]' : ''}`,
    columns,
    notes: [
      `Differences are each option minus the reference, ${ref.label}${c.pathways.some((p) => p.differenceRange) ? '; their ranges are across paired members (each member runs both options with the same parameters)' : ''}.`,
    ],
  };
  const tables = comparisonTables(c, { baseline: `${options.baseline[0]}-${options.baseline[1]}` });
  const uncertainty = comparisonUncertainty(c, 'text');
  const labelKey = c.pathways.filter((p) => p.name && p.name !== p.label).map((p) => `${p.label} = ${p.name}`);
  return projectionDocument({
    command: 'compare',
    title: `Comparison of ${c.pathways.length} option${c.pathways.length === 1 ? '' : 's'} against ${ref.label}`,
    subtitle: options.subtitle,
    baseline: options.baseline,
    comparison: c,
    data: comparisonLongTable(c),
    compact,
    more: [tables.summary, ...(tables.odds ? [tables.odds] : [])],
    rows: options.rows,
    ...(options.observed ? { observed: options.observed } : {}),
    notes: options.notes,
    terminalNotes: options.notes.filter((n) => /(^|: )warning/.test(n)),
    cautions: standardCautions(uncertainty),
    shortCaution: shortCaution('compare', ranged),
    ...(labelKey.length > 0 ? { labelKey: [labelKey.join('; ')] } : {}),
    json: { comparison: comparisonSummary(c) },
  });
}

function unionYears(ps: readonly PathwayComparison[]): Float64Array {
  const first = Math.min(...ps.map((p) => p.firstYear));
  const last = Math.max(...ps.map((p) => p.lastYear));
  return Float64Array.from({ length: last - first + 1 }, (_, i) => first + i);
}

/** `1.51`, or with members `1.51 [1.30-1.80]` (median [5-95 %]). */
function warmingCell(p: PathwayComparison, year: number): string {
  const v = valueAtYear(p.years, p.warmingK, year);
  if (!p.range || !Number.isFinite(v)) return kelvin(v);
  return `${kelvin(v)} [${kelvin(valueAtYear(p.years, p.range.p05, year))}-${kelvin(valueAtYear(p.years, p.range.p95, year))}]`;
}

/** `-0.22`, or with paired members `-0.22 [-0.35 to -0.10]` (median and 5-95 % of the paired differences). */
function differenceCell(p: PathwayComparison, year: number): string {
  const d = p.differenceRange;
  if (d) {
    const m = valueAtYear(p.years, d.p50, year);
    return Number.isFinite(m) ? `${signedKelvin(m)} [${signedKelvin(valueAtYear(p.years, d.p05, year))} to ${signedKelvin(valueAtYear(p.years, d.p95, year))}]` : 'n/a';
  }
  return signedKelvin(valueAtYear(p.differenceK.years, p.differenceK.values, year));
}

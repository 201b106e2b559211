import { crossedByColumn, ensembleTable } from '../ensemble/ensemble-table.js';
import type { EnsembleHeadlines } from '../ensemble/ensemble-headlines.js';
import type { EnsembleResult } from '../ensemble/summarize-ensemble.js';
import { comparePathways, type PathwayWarming } from '../metrics/compare-pathways.js';
import type { Series } from '../metrics/series.js';
import { kelvin, percent } from './format-numbers.js';
import type { OutputDocument } from './output-document.js';
import type { OutputColumn, OutputTable } from './output-table.js';
import { projectionDocument, type RowChoice } from './projection-document.js';
import { shortCaution, standardCautions } from './standard-cautions.js';

/** What {@link ensembleDocument} needs besides the result. */
export interface EnsembleDocumentOptions {
  /** The pathway's name (title). */
  name: string;
  rows: RowChoice;
  observed?: Series & { label: string };
  /** Every note (pathway, sampling, conventions). */
  notes: string[];
  /** The ensemble's own figures (sampled parameters, correlation), written as `ensemble` in JSON files. */
  summary: EnsembleHeadlines;
  /** The uncertainty sentence of the cautions. */
  uncertainty: string;
}

/**
 * The ensemble as a comparison of one: its median line, its ranges, its crossing odds (with the
 * per-year share crossed by, `crossed_by_<t>`) and the members' own peaks.
 *
 * @example ensembleWarming(result, 'swift').crossingOdds[0].crossedBy // share crossed 1.5 K by each year
 */
export function ensembleWarming(r: EnsembleResult, label: string): PathwayWarming {
  const pc = r.percentiles;
  return {
    label,
    years: r.years,
    warmingK: pc.p50,
    range: { p05: pc.p05, p17: pc.p17, p83: pc.p83, p95: pc.p95 },
    crossingOdds: r.crossings.map((x, j) => ({
      thresholdK: x.thresholdK,
      byYear: x.byMilestone,
      medianYear: x.medianYear,
      withinRun: x.probabilityWithinRun,
      lastWindowYear: x.byLastWindow.year,
      shareAbove: r.probAbove[j],
      crossedBy: r.crossedBy[j],
    })),
    membersPeak: { warmingK: r.peak.warmingK, year: r.peak.year, stillRising: r.peak.stillRising },
    memberCount: r.memberCount,
  };
}

/**
 * The document of `warmcast ensemble` (and `merge`): the headline from the members (median warming
 * with ranges at 2030/2050/2100, the members' own peak, median crossing years and the shares crossed
 * by the headline years, read from the same series as the `crossed_by_<t>` columns), the yearly
 * table (percentiles, `crossed_by_<t>`, `prob_above_<t>`), the compact table, the chart with bands.
 *
 * @param r the ensemble result
 * @param options name, rows, observed record, notes, summary, uncertainty text
 */
export function ensembleDocument(r: EnsembleResult, options: EnsembleDocumentOptions): OutputDocument {
  const c = r.config;
  const t = ensembleTable(r);
  const data: OutputTable = { name: 'data', columns: t.columns.map((key): OutputColumn => ({ key, values: t.values[key] })) };
  const pc = r.percentiles;
  const range = (lo: Float64Array, hi: Float64Array) => Array.from(r.years, (_, i) => `${kelvin(lo[i])}-${kelvin(hi[i])}`);
  const compact: OutputTable = {
    name: 'milestones',
    caption: `Milestone years: warming K relative to ${c.baseline[0]}-${c.baseline[1]} across ${r.memberCount} members; share of members crossed by the year`,
    columns: [
      { key: 'year', values: r.years },
      { key: 'warming_p50_k', label: 'median K', values: pc.p50 },
      { key: 'likely', label: 'likely 17-83 %', values: range(pc.p17, pc.p83) },
      { key: 'very_likely', label: 'very likely 5-95 %', values: range(pc.p05, pc.p95) },
      ...c.thresholds.map((th, j): OutputColumn => ({ key: crossedByColumn(th), label: `crossed ${th} K`, values: Array.from(r.crossedBy[j], (v) => (Number.isFinite(v) ? `${Math.round(100 * v)} %` : 'n/a')) })),
    ],
    notes: ['crossed: the share of members whose 20-year mean warming has exceeded the level by that year (the crossed_by_<t> column of the data); n/a where the 20-year window leaves the run.'],
  };
  const comparison = comparePathways([ensembleWarming(r, options.name)], { milestoneYears: [...options.rows.years], thresholdsK: c.thresholds });
  const s = options.summary.sampled;
  const subtitle =
    `${r.memberCount} members, seed ${c.seed}: ECS ${kelvin(s.ecs_k.p50)} K [${kelvin(s.ecs_k.p05)}-${kelvin(s.ecs_k.p95)}], TCR ${kelvin(s.tcr_k.p50)} K [${kelvin(s.tcr_k.p05)}-${kelvin(s.tcr_k.p95)}] ` +
    `(${membersOrigin(c.scheme)}); figures are medians [5-95 %] across members; warming relative to the ${c.baseline[0]}-${c.baseline[1]} mean`;
  return projectionDocument({
    command: 'ensemble',
    title: options.name,
    subtitle,
    baseline: c.baseline,
    comparison,
    data,
    compact,
    more: memberTables(options.summary),
    rows: options.rows,
    ...(options.observed ? { observed: options.observed } : {}),
    notes: options.notes,
    terminalNotes: options.notes.filter((n) => n.startsWith('warning')),
    cautions: standardCautions(options.uncertainty),
    shortCaution: shortCaution('ensemble', true),
    json: { ensemble: options.summary },
  });
}

/** Display names of the sampled quantities, with their units. */
const SAMPLED_NAMES: Record<string, string> = {
  ecs_k: 'ECS (K)',
  tcr_k: 'TCR (K)',
  irf100_scale: 'carbon-cycle multiplier on the pre-industrial iIRF100 r0',
};

/** The members' own peak and the sampled quantities, as percentile tables (Markdown, HTML, xlsx). */
function memberTables(h: EnsembleHeadlines): OutputTable[] {
  const P = ['p05', 'p17', 'p50', 'p83', 'p95'] as const;
  const heads = ['5 %', '17 %', '50 %', '83 %', '95 %'];
  const percentileColumns = (rows: { p05: number; p17: number; p50: number; p83: number; p95: number }[], digits: number): OutputColumn[] =>
    P.map((p, j) => ({ key: p, label: heads[j], values: Float64Array.from(rows, (r) => r[p]), digits }));
  const peak: OutputTable = {
    name: 'peak',
    caption: "Peak warming (members' own): each member's highest annual warming and its year, across members",
    columns: [{ key: 'quantity', label: '', values: ['peak warming (K)', 'peak year'] }, ...P.map((p, j): OutputColumn => ({ key: p, label: heads[j], values: [h.peak.warming_k[p].toFixed(2), String(Math.round(h.peak.year[p]))] }))],
    notes: [`${percentOf(h.peak.still_rising)} of members still rising in ${h.last_year} (their peak is the run's last year, so it is only the highest so far).`],
  };
  const sampledKeys = Object.keys(h.sampled);
  const sampled: OutputTable = {
    name: 'sampled',
    caption: 'Sampled quantities across members',
    columns: [{ key: 'sampled', values: sampledKeys.map((k) => SAMPLED_NAMES[k] ?? k) }, ...percentileColumns(sampledKeys.map((k) => h.sampled[k]), 2)],
    notes: [`ECS-TCR correlation across members: ${h.ecs_tcr_correlation === null ? 'n/a (fewer than 3 members)' : h.ecs_tcr_correlation.toFixed(2)}.`],
  };
  return [peak, sampled];
}

function percentOf(v: number): string {
  return percent(v);
}

/** Where an ensemble's members came from, in a few words, by its member source's scheme. */
function membersOrigin(scheme: string): string {
  if (scheme.startsWith('calibrated set')) return 'from the calibrated set, constrained by the observed record';
  if (scheme.startsWith('prior of calibrated set')) return 'from the prior, not constrained by the observed record';
  return 'sampled to the IPCC AR6 assessed ranges';
}

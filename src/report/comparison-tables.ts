import type { Comparison, CrossingOdds, MembersPeak, PathwayComparison } from '../metrics/compare-pathways.js';
import { lastCrossingYear } from '../metrics/crossing-year.js';
import { kelvin, MISSING, percent, signedKelvin } from './format-numbers.js';
import type { OutputTable } from './output-table.js';

/** Formatted cells, as the tables below are first laid out (then turned into OutputTables). */
interface TextTable {
  caption?: string;
  columns: string[];
  rows: string[][];
  numeric?: boolean[];
  notes?: string[];
}

/** A table of formatted cells as an OutputTable of text columns. */
function outputTable(name: string, t: TextTable): OutputTable {
  return {
    name,
    ...(t.caption ? { caption: t.caption } : {}),
    columns: t.columns.map((label, j) => ({ key: label, label, values: t.rows.map((r) => r[j] ?? '') })),
    ...(t.notes ? { notes: t.notes } : {}),
  };
}

/** Options of {@link comparisonTables}. */
export interface ComparisonTableOptions {
  /** Baseline period the warming is relative to, as printed (default `1850-1900`). */
  baseline?: string;
}

/**
 * The two tables of a comparison, as formatted cells:
 *
 * - `milestones`: one row per milestone year; per pathway its warming (K, 2 decimals; with an
 *   ensemble the median, its 17-83 % range in parentheses and its 5-95 % range in brackets) and, after the reference, its difference
 *   from the reference (K, signed).
 * - `summary`: one row per pathway: peak warming and its year (marked "still rising" when the peak
 *   is the last year), the crossing year of each threshold under the AR6 20-year-mean rule ("not
 *   crossed by END" when none), warming at the key years and, when any pathway is emission-driven,
 *   cumulative CO2 emissions to net zero (Gt CO2, whole numbers) and the net-zero year. For a
 *   pathway with an ensemble the peak is the members' own: the median of their peak warming with its
 *   5-95 % range in brackets, and the median of their peak years with the share still rising at the
 *   end; a crossing year is the year by which half of its members have crossed ("fewer than half by
 *   END" when they have not).
 * - `odds`, only when some pathway has an ensemble: one row per such pathway, the share of its
 *   members that have crossed each threshold by each of the ensemble's milestone years.
 *
 * A value a pathway does not cover is `n/a`.
 *
 * @param c the comparison (see comparePathways)
 * @param options baseline text
 * @example
 * comparisonTables(c).milestones.columns // ['Year', 'steady (K)', 'swift (K)', 'swift vs steady (K)']
 */
export function comparisonTables(c: Comparison, options: ComparisonTableOptions = {}): { milestones: OutputTable; summary: OutputTable; odds?: OutputTable } {
  const baseline = options.baseline ?? '1850-1900';
  const [ref, ...others] = c.pathways;
  const anyRange = c.pathways.some((p) => p.range);
  const withOdds = c.pathways.filter((p) => p.crossings.some((x) => x.odds));

  const columns = ['Year', `${ref.label} (K)`];
  for (const p of others) columns.push(`${p.label} (K)`, `${p.label} vs ${ref.label} (K)`);
  const rows = c.milestoneYears.map((year, m) => {
    const row = [String(year), warmingCell(ref, m)];
    for (const p of others) row.push(warmingCell(p, m), signedKelvin(p.milestones[m].differenceK));
    return row;
  });
  const milestoneNotes = [`Warming in K relative to ${baseline}. Differences are each pathway minus the reference, ${ref.label}.`];
  if (anyRange) {
    milestoneNotes.push('With an ensemble: the median, then in parentheses the 17-83 % (likely) range and in brackets the 5-95 % (very likely) range of its members.');
  }

  const netZero = c.pathways.some((p) => p.netZero);
  const sColumns = ['Pathway', 'Peak (K)', 'Peak year'];
  sColumns.push(...c.thresholdsK.map((t) => `Reaches ${+t.toPrecision(6)} K`));
  sColumns.push(...c.keyYears.map((y) => `${y} (K)`));
  if (netZero) sColumns.push('CO2 to net zero (Gt CO2)', 'Net-zero year');
  const sRows = c.pathways.map((p) => {
    const row = p.membersPeak ? [p.label, ...membersPeakCells(p.membersPeak)] : [p.label, kelvin(p.peak.value), Number.isFinite(p.peak.year) ? `${p.peak.year}${p.stillRising ? ' (still rising)' : ''}` : MISSING];
    for (const { period, odds } of p.crossings) {
      if (odds) row.push(odds.medianYear === null ? `fewer than half by ${odds.lastWindowYear}` : String(odds.medianYear));
      else row.push(period === undefined ? `not crossed by ${lastCrossingYear(p.lastYear, c.windowYears)}` : period.atStart ? `${period.year} or earlier` : String(period.year));
    }
    for (const k of p.keyYears) row.push(kelvin(k.warmingK));
    if (netZero) {
      const z = p.netZero;
      if (!z) row.push('n/a (concentration-driven)', MISSING);
      else if (z.year === undefined) row.push(`${Math.round(z.total)} (through ${z.toYear})`, `not reached by ${p.lastYear}`);
      else row.push(String(Math.round(z.total)), String(z.year));
    }
    return row;
  });
  const summaryNotes = [
    `Peak: highest annual warming (K relative to ${baseline}). Reaches: the middle year (the earlier of the two) of the first ${c.windowYears}-year ` +
      `period whose mean warming exceeds the level, ${baseline === '1850-1900' ? 'the IPCC AR6 WG1 convention for global warming levels' : `the IPCC AR6 WG1 20-year-mean rule applied to warming relative to ${baseline}, so these are not AR6 levels`}; ` +
      `"or earlier" when the first complete ${c.windowYears}-year period of the data is already above it; "not crossed by" names the last ` +
      `year whose ${c.windowYears}-year period the data cover, 10 years before they end.`,
  ];
  if (withOdds.length > 0) {
    summaryNotes.push(
      `With an ensemble (${withOdds.map((p) => p.label).join(', ')}): the peak is the members' own, not the median line's: Peak (K) is the median ` +
        'of each member\'s highest annual warming with the 5-95 % range of members in brackets, Peak year the median of their peak years, with the ' +
        'share of members still rising at the end (their peak is the run\'s last year, so only the highest so far); "Reaches" is the year by ' +
        'which half of the members have crossed the level by the same rule (the median crossing year); the table of probabilities gives the shares.',
    );
  }
  if (netZero) {
    const from = [...new Set(c.pathways.flatMap((p) => (p.netZero ? [p.netZero.fromYear] : [])))].join(', ');
    summaryNotes.push(`CO2 to net zero: net CO2 emissions summed from ${from} up to the year before they first reach zero or below.`);
  }
  return {
    ...(withOdds.length > 0 ? { odds: outputTable('crossing odds', oddsTable(c, withOdds)) } : {}),
    milestones: outputTable('milestones', {
      caption: `Warming at milestone years (K relative to ${baseline})`,
      columns,
      rows,
      numeric: columns.map(() => true),
      notes: milestoneNotes,
    }),
    summary: outputTable('per option', {
      caption: 'Per pathway',
      columns: sColumns,
      rows: sRows,
      numeric: sColumns.map((_, j) => j > 0),
      notes: summaryNotes,
    }),
  };
}

function warmingCell(p: PathwayComparison, m: number): string {
  const v = p.milestones[m];
  const central = kelvin(v.warmingK);
  if (!v.range || central === MISSING) return central;
  return `${central} (${kelvin(v.range.p17)} to ${kelvin(v.range.p83)}) [${kelvin(v.range.p05)} to ${kelvin(v.range.p95)}]`;
}

/**
 * The Peak (K) and Peak year cells of a pathway with an ensemble: the members' median peak with its
 * 5-95 % range, and their median peak year (whole year) with the share still rising in the last year.
 */
function membersPeakCells(peak: MembersPeak): [string, string] {
  const w = peak.warmingK;
  const year = Number.isFinite(peak.year.p50) ? String(Math.round(peak.year.p50)) : MISSING;
  const rising = peak.stillRising > 0 ? ` (${percent(peak.stillRising)} still rising)` : '';
  return [`${kelvin(w.p50)} [${kelvin(w.p05)} to ${kelvin(w.p95)}]`, `${year}${rising}`];
}

/** The chance of crossing each threshold by each milestone year, for the pathways with an ensemble. */
function oddsTable(c: Comparison, withOdds: PathwayComparison[]): TextTable {
  const years = [...new Set(withOdds.flatMap((p) => p.crossings.flatMap((x) => x.odds?.byYear.map((b) => b.year) ?? [])))].sort((a, b) => a - b);
  const columns = ['Pathway'];
  for (const t of c.thresholdsK) for (const y of years) columns.push(`${+t.toPrecision(6)} K by ${y}`);
  const rows = withOdds.map((p) => {
    const row = [p.label];
    for (const { odds } of p.crossings) {
      for (const y of years) row.push(oddsCell(odds, y));
    }
    return row;
  });
  return {
    caption: 'Probability of crossing each warming level (share of ensemble members)',
    columns,
    rows,
    numeric: columns.map((_, j) => j > 0),
    notes: [
      `The share of members whose ${c.windowYears}-year mean warming has exceeded the level by the given year (a member counts ` +
        `once it has crossed, even if it later falls back). n/a: the run does not cover the ${c.windowYears}-year window around that year; ` +
        'the share crossed by the last year it can see (its end less 10 years) is given instead.',
    ],
  };
}

/** The share crossed by `year`, or for a year the run cannot see, `n/a (by LAST: share)`. */
function oddsCell(odds: CrossingOdds | undefined, year: number): string {
  const p = odds?.byYear.find((b) => b.year === year)?.probability ?? null;
  if (p !== null || !odds) return percent(p);
  return `n/a (by ${odds.lastWindowYear}: ${percent(odds.withinRun)})`;
}

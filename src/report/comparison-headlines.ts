import type { Comparison, MembersPeak, PathwayComparison } from '../metrics/compare-pathways.js';
import { lastCrossingYear } from '../metrics/crossing-year.js';
import { kelvin, percent } from './format-numbers.js';
import { thresholdName } from './threshold-name.js';

/**
 * One plain sentence per pathway for the top of a report: its peak warming and year, when it
 * reaches each threshold (AR6 20-year-mean rule), and its warming in the last key year. For a
 * pathway with an ensemble the sentence gives the members' own peak (their median peak warming with
 * its 5-95 % range, their median peak year and the share still rising at the end) and, per
 * threshold, the share of members that have crossed it by each milestone year and the year by which
 * half have, then the median line's warming in the last key year.
 *
 * @param c the comparison
 * @param baseline the baseline period the warming is relative to, as printed (default `1850-1900`);
 *   on any other, levels are named with it (see thresholdName)
 * @returns sentences, reference first
 * @example
 * comparisonHeadlines(c)[0]
 * // 'steady: peak 2.70 K in 2100 (still rising); reaches 1.5 K in 2034 and 2 K in 2058; 2.70 K in 2100.'
 */
export function comparisonHeadlines(c: Comparison, baseline = '1850-1900'): string[] {
  const [from, to] = baseline.split('-').map(Number);
  const level = (thresholdK: number) => thresholdName(+thresholdK.toPrecision(6), [from, to]);
  return c.pathways.map((p) => `${p.label}: ${(p.crossings.some((x) => x.odds) ? ensembleParts(p, level) : singleParts(p, level, c.windowYears)).join('; ')}.`);
}

function singleParts(p: PathwayComparison, level: (thresholdK: number) => string, windowYears: number): string[] {
  const parts = [`peak ${kelvin(p.peak.value)} K in ${p.peak.year}${p.stillRising ? ' (still rising)' : ''}`];
  const reached = p.crossings.filter((x) => x.period).map((x) => `${level(x.thresholdK)} in ${x.period!.atStart ? `${x.period!.year} or earlier` : x.period!.year}`);
  const missed = p.crossings.filter((x) => !x.period).map((x) => level(x.thresholdK));
  if (reached.length > 0) parts.push(`reaches ${series(reached)}`);
  if (missed.length > 0) parts.push(`${series(missed)} not crossed by ${lastCrossingYear(p.lastYear, windowYears)}`);
  const last = p.keyYears.filter((k) => Number.isFinite(k.warmingK)).at(-1);
  if (last) parts.push(`${kelvin(last.warmingK)} K in ${last.year}`);
  return parts;
}

function ensembleParts(p: PathwayComparison, level: (thresholdK: number) => string): string[] {
  const parts = [p.membersPeak ? membersPeakText(p.membersPeak, p.lastYear) : `median peaks at ${kelvin(p.peak.value)} K in ${p.peak.year}${p.stillRising ? ' (still rising)' : ''}`];
  for (const { thresholdK, odds } of p.crossings) {
    if (!odds) continue;
    const by = odds.byYear
      .map((b) => (b.probability === null ? `by ${b.year} n/a (the run ends in ${p.lastYear}; by ${odds.lastWindowYear}, its last 20-year mean: ${percent(odds.withinRun)})` : `${percent(b.probability)} by ${b.year}`))
      .join(', ');
    const median = odds.medianYear === null ? `fewer than half of the members cross it by ${odds.lastWindowYear}` : `median crossing year ${odds.medianYear}`;
    parts.push(`${level(thresholdK)}: probability of crossing ${by}, ${median}`);
  }
  const last = p.keyYears.filter((k) => Number.isFinite(k.warmingK)).at(-1);
  if (last) parts.push(`median ${kelvin(last.warmingK)} K in ${last.year}`);
  return parts;
}

/** "members' median peak 1.98 K [1.45 to 2.70] in 2079 (31 % still rising in 2150)". */
function membersPeakText(peak: MembersPeak, lastYear: number): string {
  const w = peak.warmingK;
  const year = Number.isFinite(peak.year.p50) ? String(Math.round(peak.year.p50)) : 'n/a';
  const rising = peak.stillRising > 0 ? ` (${percent(peak.stillRising)} still rising in ${lastYear})` : '';
  return `members' median peak ${kelvin(w.p50)} K [${kelvin(w.p05)} to ${kelvin(w.p95)}] in ${year}${rising}`;
}

/** `a`, `a and b`, `a, b and c`. */
function series(items: string[]): string {
  return items.length < 2 ? items.join('') : `${items.slice(0, -1).join(', ')} and ${items[items.length - 1]}`;
}

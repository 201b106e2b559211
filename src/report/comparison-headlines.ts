import type { Comparison } from '../metrics/compare-pathways.js';
import { kelvin } from './format-numbers.js';

/**
 * One plain sentence per pathway for the top of a report: its peak warming and year, when it
 * reaches each threshold (AR6 20-year-mean rule), and its warming in the last key year.
 *
 * @param c the comparison
 * @returns sentences, reference first
 * @example
 * comparisonHeadlines(c)[0]
 * // 'steady: peak 2.70 K in 2100 (still rising); reaches 1.5 K in 2034 and 2 K in 2058; 2.70 K in 2100.'
 */
export function comparisonHeadlines(c: Comparison): string[] {
  return c.pathways.map((p) => {
    const parts = [`peak ${kelvin(p.peak.value)} K in ${p.peak.year}${p.stillRising ? ' (still rising)' : ''}`];
    const reached = p.crossings.filter((x) => x.period).map((x) => `${+x.thresholdK.toPrecision(6)} K in ${x.period!.atStart ? `${x.period!.year} or earlier` : x.period!.year}`);
    const missed = p.crossings.filter((x) => !x.period).map((x) => `${+x.thresholdK.toPrecision(6)} K`);
    if (reached.length > 0) parts.push(`reaches ${reached.join(' and ')}`);
    if (missed.length > 0) parts.push(`does not reach ${missed.join(' or ')} by ${p.lastYear}`);
    const last = p.keyYears.filter((k) => Number.isFinite(k.warmingK)).at(-1);
    if (last) parts.push(`${kelvin(last.warmingK)} K in ${last.year}`);
    return `${p.label}: ${parts.join('; ')}.`;
  });
}

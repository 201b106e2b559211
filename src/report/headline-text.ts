import type { Headline, HeadlineRange } from '../metrics/headline.js';
import { kelvin, percent } from './format-numbers.js';
import type { OutputTable } from './output-table.js';
import { isAr6Baseline } from './threshold-baseline-note.js';
import { thresholdName } from './threshold-name.js';

/** `1.51 K` or, with members, `1.51 K [1.20-1.90]` (median [5-95 %]; the range to `rangeDigits` decimals). */
function warmingText(v: number, range?: { p05: number; p95: number }, unit = ' K', rangeDigits = 2): string {
  return range ? `${kelvin(v)}${unit} [${kelvin(range.p05, rangeDigits)}-${kelvin(range.p95, rangeDigits)}]` : `${kelvin(v)}${unit}`;
}

/** The crossing of one level in words: `2048`, `2030 or earlier`, `not by 2140`. */
function crossingText(x: Headline['crossings'][number]): string {
  if (x.year === null) return `not by ${x.lastVisibleYear}`;
  return `${x.year}${x.orEarlier ? ' or earlier' : ''}`;
}

/** `81 % by 2050, 97 % by 2100`: shares of members crossed by the headline years. */
function crossedByText(x: Headline['crossings'][number]): string {
  const late = x.crossedByLastVisible !== undefined ? ` (by ${x.lastVisibleYear}, the run's last 20-year mean: ${percent(x.crossedByLastVisible)})` : '';
  return (x.crossedBy ?? []).map((b) => (b.share === null ? `n/a by ${b.year}${late}` : `${percent(b.share)} by ${b.year}`)).join(', ');
}

function peakText(h: Headline): string {
  const p = h.peak;
  if (h.members !== undefined) {
    const rising = p.shareStillRising ? `; ${percent(p.shareStillRising)} of members still rising at the end` : '';
    return `${warmingText(p.warmingK, p.range)} in ${p.year}${rising}`;
  }
  return `${kelvin(p.warmingK)} K in ${p.year}${p.stillRising ? ' (still rising at the end)' : ''}`;
}

/**
 * The headline block of one option as terminal lines (indented by two spaces): warming at the
 * headline years, the peak, and when each level is reached (with members: the median crossing year
 * and the shares crossed by the headline years).
 *
 * @example headlineLines(h, [1850, 1900])[0] // '  warming   2030: 1.51 K   2050: 2.06 K   2100: 2.76 K'
 */
export function headlineLines(h: Headline, baseline: readonly [number, number]): string[] {
  const ranged = h.members !== undefined;
  const lines = [
    `  warming   ${h.atYears.map((a) => `${a.year}: ${warmingText(a.warmingK, a.range)}`).join('   ')}`,
    `  peak      ${peakText(h)}`,
  ];
  const rule = isAr6Baseline(baseline) ? '20-year means, the IPCC AR6 rule' : '20-year means';
  const when = (x: Headline['crossings'][number]) => (x.year === null ? `not reached by ${x.lastVisibleYear}` : `in ${crossingText(x)}`);
  if (!ranged) {
    lines.push(`  reached   ${h.crossings.map((x) => `${thresholdName(x.thresholdK, baseline)} ${when(x)}`).join(', ')} (${rule})`);
    return lines;
  }
  h.crossings.forEach((x, j) => {
    const lead = j === 0 ? '  reached   ' : '            ';
    const median = x.year === null ? `fewer than half of the members by ${x.lastVisibleYear}` : `median ${crossingText(x)}`;
    lines.push(`${lead}${thresholdName(x.thresholdK, baseline)}: ${median}; members crossed: ${crossedByText(x)}${j === 0 ? ` (${rule})` : ''}`);
  });
  return lines;
}

/**
 * The headlines of several options as one table (text cells): per option its warming at the
 * headline years, its peak and year, and per level its crossing year (with members: median and
 * ranges, and the share crossed by the last headline year).
 *
 * `compact` (the terminal) gives ranges to one decimal, leaves "(rising)" to the files and puts the
 * share crossed by the last headline year in the header, so that three options with members fit
 * 120 columns.
 *
 * @example headlineTable(hs, [1850, 1900]).columns.map((c) => c.label) // ['option', '2030 K', '2050 K', '2100 K', 'peak K', 'peak year', '1.5 K reached', '2 K reached']
 */
export function headlineTable(hs: readonly Headline[], baseline: readonly [number, number], compact = false): OutputTable {
  const years = [...new Set(hs.flatMap((h) => h.atYears.map((a) => a.year)))].sort((a, b) => a - b);
  const ranged = hs.some((h) => h.members !== undefined);
  const levels = hs[0]?.crossings.map((x) => x.thresholdK) ?? [];
  const lastYear = years.at(-1);
  const rangeDigits = compact ? 1 : 2;
  const col = (key: string, label: string, cells: string[]) => ({ key, label, values: cells });
  const columns = [
    col('option', 'option', hs.map((h) => h.label)),
    ...years.map((y) =>
      col(`warming_${y}_k`, `${y} K`, hs.map((h) => {
        const a = h.atYears.find((x) => x.year === y);
        return a ? warmingText(a.warmingK, a.range as HeadlineRange | undefined, '', rangeDigits) : 'n/a';
      })),
    ),
    col('peak_k', 'peak K', hs.map((h) => warmingText(h.peak.warmingK, h.peak.range, '', rangeDigits))),
    col('peak_year', 'peak year', hs.map((h) => `${h.peak.year}${h.peak.stillRising && !(compact && ranged) ? ' (rising)' : ''}`)),
    ...levels.map((t, j) =>
      col(`reached_${t}_k`, `${+t.toPrecision(6)} K${compact && ranged ? ` (% by ${lastYear})` : ' reached'}`, hs.map((h) => {
        const x = h.crossings[j];
        const share = x.crossedBy?.find((b) => b.year === lastYear);
        if (!share || lastYear === undefined) return crossingText(x);
        const text = share.share === null ? `${percent(x.crossedByLastVisible ?? null)} by ${x.lastVisibleYear}` : compact ? percent(share.share) : `${percent(share.share)} by ${lastYear}`;
        return `${crossingText(x)} (${text})`;
      })),
    ),
  ];
  const notes = [
    `Warming in K relative to the ${baseline[0]}-${baseline[1]} mean. A level is reached in the middle year of the first 20-year period whose mean exceeds it (the IPCC AR6 WG1 rule); "not by" names the last year the run can show (its end less 10 years).`,
  ];
  if (ranged) {
    notes.push('With members: the median, the 5-95 % range in brackets; peaks are the members\' own; a crossing year is the first year by which half of the members have crossed, followed by the share crossed by the last headline year (the crossed_by_<t> column of the data).');
  }
  return { name: 'headline', caption: `Headline: warming relative to ${baseline[0]}-${baseline[1]}`, columns, notes };
}

import { probAboveColumn } from '../ensemble/ensemble-table.js';
import type { Comparison } from '../metrics/compare-pathways.js';

/**
 * A comparison as JSON with its provenance: the settings (reference, window, thresholds, milestone
 * and key years), then per pathway its summary (peak, crossings with their 20-year periods,
 * warming at key years, milestones with differences from the reference, cumulative CO2 to net zero
 * when emission-driven) and its annual series (`years`, `warming_k`, `difference_k`, and the
 * ensemble percentiles, `prob_above_<t>` and `co2_gtco2` when present). A pathway with an ensemble
 * says so in `central_estimate` ("ensemble median": its `peak` is that of the median line) and gives
 * the members' own peaks in `members_peak` (percentiles of their peak warming and peak years, and
 * the share still rising at the end); per
 * crossing its `year` is then the first year by which half of the members have crossed (as in the
 * tables), `odds` gives the share crossed by each milestone year and within the run, and
 * `median_line` the median line's own first 20-year period above the level.
 * Keys are snake_case like the CSV columns.
 * Numbers keep full precision; NaN and "not crossed" are `null`. Two-space indentation, with each
 * list of plain values on one line, so files diff cleanly.
 *
 * @param c the comparison
 * @param provenance the record the CLI built, written first as it is
 * @returns JSON text ending in a newline
 * @example
 * JSON.parse(comparisonJson(c, { version: '0.1.0' })).pathways[0].peak // { year: 2100, warming_k: 2.7, still_rising: true }
 */
export function comparisonJson(c: Comparison, provenance: object): string {
  const doc = { provenance, ...comparisonDocument(c, true) };
  // Put each list of plain values on one line. JSON strings never hold a raw line break, so only
  // the layout whitespace between items is touched.
  const text = JSON.stringify(doc, null, 2).replace(/\[([^\[\]{}]*)\]/g, (whole, inner: string) =>
    inner.includes('\n') ? `[${inner.trim().replace(/,\n\s*/g, ', ')}]` : whole,
  );
  return text + '\n';
}

/**
 * The figures of a comparison without its annual series, as {@link comparisonJson} writes them:
 * settings, then per pathway its peak (and the members' own peaks), crossings (with the members' odds), key years, milestones and
 * net zero. For the `.meta.json` beside a comparison's long CSV, which holds the annual series.
 *
 * @example comparisonSummary(c).pathways[0].peak // { year: 2100, warming_k: 2.7, still_rising: true }
 */
export function comparisonSummary(c: Comparison): object {
  return comparisonDocument(c, false);
}

function comparisonDocument(c: Comparison, annual: boolean) {
  const num = (v: number) => (Number.isFinite(v) ? v : null);
  const list = (a: ArrayLike<number>) => Array.from(a, num);
  return {
    reference: c.reference,
    window_years: c.windowYears,
    thresholds_k: c.thresholdsK,
    milestone_years: c.milestoneYears,
    key_years: c.keyYears,
    pathways: c.pathways.map((p) => ({
      pathway: p.label,
      first_year: p.firstYear,
      last_year: p.lastYear,
      central_estimate: p.crossingOdds ? 'ensemble median' : 'single run',
      peak: { year: num(p.peak.year), warming_k: num(p.peak.value), still_rising: p.stillRising },
      ...(p.membersPeak
        ? { members_peak: { warming_k: { ...p.membersPeak.warmingK }, year: { ...p.membersPeak.year }, still_rising: p.membersPeak.stillRising } }
        : {}),
      crossings: p.crossings.map(({ thresholdK, period, odds }) => {
        const first20 = {
          year: period ? period.year : null,
          period_first_year: period ? period.firstYear : null,
          period_last_year: period ? period.lastYear : null,
          period_mean_k: period ? period.mean : null,
          at_start: period ? period.atStart : null,
        };
        if (!odds) return { threshold_k: thresholdK, ...first20 };
        // With an ensemble the crossing year is the members' (as in the tables); the median line's own is kept apart.
        return {
          threshold_k: thresholdK,
          year: odds.medianYear,
          year_rule: 'first year by which half of the members have crossed',
          odds: {
            by_year: odds.byYear.map((b) => ({ year: b.year, probability: b.probability })),
            within_run: odds.withinRun,
            last_window_year: odds.lastWindowYear,
          },
          median_line: first20,
        };
      }),
      key_years: p.keyYears.map((k) => ({ year: k.year, warming_k: num(k.warmingK) })),
      milestones: p.milestones.map((m) => ({
        year: m.year,
        warming_k: num(m.warmingK),
        difference_k: num(m.differenceK),
        ...(m.range
          ? { warming_p05_k: num(m.range.p05), warming_p17_k: num(m.range.p17), warming_p83_k: num(m.range.p83), warming_p95_k: num(m.range.p95) }
          : {}),
      })),
      ...(p.netZero
        ? {
            net_zero: {
              year: p.netZero.year ?? null,
              cumulative_co2_gtco2: num(p.netZero.total),
              from_year: p.netZero.fromYear,
              to_year: p.netZero.toYear,
            },
          }
        : {}),
      ...(annual ? { annual: {
        years: list(p.years),
        warming_k: list(p.warmingK),
        difference_k: list(Array.from(p.years, (y) => {
          const i = p.differenceK.years.indexOf(y);
          return i < 0 ? NaN : p.differenceK.values[i];
        })),
        ...(p.range
          ? { warming_p05_k: list(p.range.p05), warming_p17_k: list(p.range.p17), warming_p83_k: list(p.range.p83), warming_p95_k: list(p.range.p95) }
          : {}),
        ...Object.fromEntries(p.crossings.flatMap(({ thresholdK, odds }) => (odds ? [[probAboveColumn(thresholdK), list(odds.shareAbove)]] : []))),
        ...(p.co2Gtco2 ? { co2_gtco2: list(p.co2Gtco2) } : {}),
      } } : {}),
    })),
  };
}

import type { Comparison } from '../metrics/compare-pathways.js';

/**
 * The figures of a comparison without its annual series (the yearly table holds those), for the
 * `comparison` member of its JSON and .meta.json files: settings, then per pathway its peak (and the members' own peaks), crossings (with the members' odds), key years, milestones and
 * net zero. For the `.meta.json` beside a comparison's long CSV, which holds the annual series.
 *
 * @example comparisonSummary(c).pathways[0].peak // { year: 2100, warming_k: 2.7, still_rising: true }
 */
export function comparisonSummary(c: Comparison): object {
  return comparisonDocument(c);
}

function comparisonDocument(c: Comparison) {
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
    })),
  };
}

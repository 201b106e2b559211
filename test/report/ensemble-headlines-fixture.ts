// Hand-made ensemble headlines for the writer tests: one level crossed, one with 30 % of members
// above it at the start, one above at the start for most members, one fewer than half cross; the
// members' own peaks with 31 % still rising at the end.
import type { EnsembleHeadlines } from '../../src/ensemble/index.js';

export function headlinesFixture(overrides: Partial<EnsembleHeadlines> = {}): EnsembleHeadlines {
  const q = (p50: number) => ({ p05: p50 - 1, p17: p50 - 0.5, p50, p83: p50 + 0.5, p95: p50 + 1 });
  return {
    members: 2000,
    seed: 7,
    baseline: '1850-1900',
    first_window: '1750-1769',
    last_year: 2150,
    last_window_year: 2140,
    thresholds: [
      { threshold_k: 1.5, probability_crossed_by: { 2050: 0.814, 2100: 0.97 }, median_crossing: 'crosses', median_crossing_year: 2031, probability_crossed_by_last_window: 0.99, above_at_start: 0 },
      { threshold_k: 0.05, probability_crossed_by: { 2050: 1, 2100: 1 }, median_crossing: 'crosses', median_crossing_year: 1915, probability_crossed_by_last_window: 1, above_at_start: 0.3 },
      { threshold_k: 0.001, probability_crossed_by: { 2050: 1, 2100: 1 }, median_crossing: 'already-above-at-start', median_crossing_year: null, probability_crossed_by_last_window: 1, above_at_start: 0.6 },
      { threshold_k: 3, probability_crossed_by: { 2050: 0.002, 2100: null }, median_crossing: 'fewer-than-half-cross', median_crossing_year: null, probability_crossed_by_last_window: 0.04, above_at_start: 0 },
    ],
    peak: { warming_k: { p05: 1.45, p17: 1.7, p50: 1.98, p83: 2.35, p95: 2.7 }, year: { p05: 2052.6, p17: 2065, p50: 2079.4, p83: 2150, p95: 2150 }, still_rising: 0.31 },
    sampled: { ecs_k: q(3), tcr_k: q(1.8) },
    ecs_tcr_correlation: 0.641,
    ...overrides,
  };
}

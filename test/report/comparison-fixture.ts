// A comparison of three synthetic pathways shared by the comparison writer tests: a steady rise,
// a slowing one with an ensemble range, and a levelling one that is emission-driven.
import { comparePathways, milestoneYears } from '../../src/metrics/index.js';

export const years = Float64Array.from({ length: 251 }, (_, i) => 1850 + i);
const steady = years.map((y) => (y < 1950 ? 0.002 * (y - 1850) : 0.2 + 0.022 * (y - 1950)));
const delayed = years.map((y) => (y < 2020 ? steady[y - 1850] : steady[170] + 0.02 * (y - 2020) - 0.00012 * (y - 2020) ** 2));
const swift = years.map((y) => (y < 2020 ? steady[y - 1850] : steady[170] + 0.6 * (1 - Math.exp(-(y - 2020) / 15))));
const emissions = years.map((y) => (y < 2020 ? 40 : Math.max(-5, 40 - 1.5 * (y - 2020))));

export const provenance = {
  tool: 'warmcast',
  version: '0.1.0',
  created_utc: '2025-01-01T00:00:00.000Z',
  inputs: [{ path: '/data/steady.csv', sha256: '0f'.repeat(32) }],
  parameters: { ecs_k: 3, tcr_k: 1.8, co2_formula: 'ar6' },
  seed: 42,
};

export function fixtureComparison() {
  return comparePathways(
    [
      { label: 'steady', years, warmingK: steady },
      {
        label: 'delayed',
        years,
        warmingK: delayed,
        range: { p05: delayed.map((v) => v * 0.7), p17: delayed.map((v) => v * 0.85), p83: delayed.map((v) => v * 1.15), p95: delayed.map((v) => v * 1.3) },
      },
      { label: 'swift', years, warmingK: swift, co2Gtco2: emissions },
    ],
    { milestoneYears: milestoneYears(2024, 2100), cumulativeFromYear: 2020 },
  );
}

/**
 * Two pathways over 2000-2100 for the writers' handling of ensemble crossing odds: `single`, one
 * run that crosses 1.5 K but not 2 K, and `ensemble`, a median line with hand-set odds (2 K: 30 %
 * of members by 2050, 45 % by 2100, fewer than half within the run) and hand-set members' own peaks
 * (median 1.95 K [1.52 to 2.61] in 2087.6, 40 % still rising in 2100).
 */
export function oddsComparison() {
  const y = Float64Array.from({ length: 101 }, (_, i) => 2000 + i);
  const line = y.map((v) => 1 + 0.0082 * (v - 2000));
  const shareAbove = (t: number) => y.map((v) => (v < 2009 || v > 2090 ? NaN : Math.min(1, Math.max(0, (1 + 0.008 * (v - 2000) - t) / 0.5 + 0.5))));
  return comparePathways(
    [
      { label: 'single', years: y, warmingK: line },
      {
        label: 'ensemble',
        years: y,
        warmingK: line,
        range: { p05: line.map((v) => v - 0.4), p17: line.map((v) => v - 0.2), p83: line.map((v) => v + 0.2), p95: line.map((v) => v + 0.4) },
        crossingOdds: [
          { thresholdK: 2, byYear: [{ year: 2050, probability: 0.3 }, { year: 2100, probability: null }], medianYear: null, withinRun: 0.45, lastWindowYear: 2090, shareAbove: shareAbove(2), crossedBy: runningMax(shareAbove(2)) },
          { thresholdK: 1.5, byYear: [{ year: 2050, probability: 0.62 }, { year: 2100, probability: null }], medianYear: 2046, withinRun: 0.97, lastWindowYear: 2090, shareAbove: shareAbove(1.5), crossedBy: runningMax(shareAbove(1.5)) },
        ],
        membersPeak: { warmingK: { p05: 1.52, p17: 1.7, p50: 1.95, p83: 2.3, p95: 2.61 }, year: { p05: 2061, p17: 2072.3, p50: 2087.6, p83: 2100, p95: 2100 }, stillRising: 0.4 },
      },
    ],
    { milestoneYears: [2050], keyYears: [2050] },
  );
}

/** The share crossed by each year from the share above in it: its running maximum (NaN kept). */
function runningMax(a: Float64Array): Float64Array {
  let m = -Infinity;
  return a.map((v) => (Number.isFinite(v) ? (m = Math.max(m, v)) : NaN));
}

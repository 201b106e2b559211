import { describe, expect, it } from 'vitest';
import { comparisonChartLines, comparisonCharts } from '../../src/report/comparison-charts.js';
import { fixtureComparison } from './comparison-fixture.js';
import { xmlProblems } from './xml-well-formed.js';

describe('comparisonCharts', () => {
  const c = fixtureComparison();

  it('comparisonCharts draws the warming chart with thresholds and shaded ranges, then the differences from the reference', () => {
    const [warming, diff] = comparisonCharts(c, { fromYear: 1950 });
    for (const svg of [warming, diff]) expect(xmlProblems(svg)).toEqual([]);
    expect([...warming.matchAll(/data-series="([^"]+)"/g)].map((m) => m[1])).toEqual(['steady', 'delayed', 'swift']);
    expect([...warming.matchAll(/data-band="([^"]+)"/g)].map((m) => m[1])).toEqual(['very likely range (5-95 %)', 'likely range (17-83 %)']);
    expect(warming).toContain('>1.5 K, 2 K levels</text>');
    expect([...diff.matchAll(/data-series="([^"]+)"/g)].map((m) => m[1])).toEqual(['delayed minus steady', 'swift minus steady']);
    // Each difference keeps its pathway's colour from the warming chart.
    const stroke = (svg: string, label: string) => new RegExp(`data-series="${label}" d="[^"]*" fill="none" stroke="([^"]+)"`).exec(svg)![1];
    expect(stroke(diff, 'swift minus steady')).toBe(stroke(warming, 'swift'));
  });

  it('comparisonChartLines starts every line at fromYear', () => {
    const lines = comparisonChartLines(c, 2000);
    expect(lines.map((l) => l.years[0])).toEqual([2000, 2000, 2000]);
    expect(lines[0].values[0]).toBe(c.pathways[0].warmingK[150]);
  });
});

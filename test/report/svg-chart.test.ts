import { describe, expect, it } from 'vitest';
import { svgChart } from '../../src/report/svg-chart.js';
import { expectWithin } from '../asserts.js';
import { xmlProblems } from './xml-well-formed.js';

const years = Float64Array.from({ length: 251 }, (_, i) => 1850 + i);
const steady = years.map((y) => (y < 1950 ? 0.002 * (y - 1850) : 0.2 + 0.022 * (y - 1950)));
const swift = years.map((y) => (y < 2020 ? steady[y - 1850] : steady[170] + 0.6 * (1 - Math.exp(-(y - 2020) / 15))));

function chart(extra: Partial<Parameters<typeof svgChart>[0]> = {}): string {
  return svgChart({
    title: 'Warming by pathway',
    xLabel: 'Year',
    yLabel: 'Warming relative to 1850-1900 (K)',
    series: [
      { label: 'steady', years, values: steady },
      { label: 'swift', years, values: swift },
    ],
    bands: [{ of: 'swift', label: '5-95 %', years, lower: swift.map((v) => v * 0.7), upper: swift.map((v) => v * 1.3) }],
    thresholds: [1.5, 2],
    ...extra,
  });
}

/** Reads a tick class back as [value, pixel] pairs from its text elements. */
function ticks(svg: string, cls: 'x-tick' | 'y-tick'): [number, number][] {
  const attr = cls === 'x-tick' ? 'x' : 'y';
  return [...svg.matchAll(new RegExp(`<text class="${cls}"[^>]*?\\b${attr}="([-0-9.]+)"[^>]*>([^<]*)</text>`, 'g'))].map((m) => [
    Number(m[2].replace('\u2212', '-')),
    Number(m[1]),
  ]);
}

/** The linear map through the first and last tick, from value to pixel. */
function axisMap(pairs: [number, number][]): (v: number) => number {
  const [[v0, p0], [v1, p1]] = [pairs[0], pairs[pairs.length - 1]];
  return (v) => p0 + ((v - v0) * (p1 - p0)) / (v1 - v0);
}

function pathPoints(svg: string, attr: string, label: string): [number, number][][] {
  const m = new RegExp(`<path ${attr}="${label}" d="([^"]+)"`).exec(svg);
  if (!m) throw new Error(`no path ${attr}=${label}`);
  return m[1]
    .split('M')
    .filter(Boolean)
    .map((sub) => sub.split(/[LZ]/).filter(Boolean).map((p) => p.split(',').map(Number) as [number, number]));
}

describe('svgChart', () => {
  it('svgChart output is well-formed XML with the SVG namespace (XML 1.0; SVG 1.1 section 5.1)', () => {
    const svg = chart();
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
  });

  it('svgChart plots every point within 1 px of where its axis ticks put the data', () => {
    const svg = chart();
    const x = axisMap(ticks(svg, 'x-tick'));
    const y = axisMap(ticks(svg, 'y-tick'));
    expect(ticks(svg, 'x-tick').length).toBeGreaterThanOrEqual(3);
    expect(ticks(svg, 'y-tick').length).toBeGreaterThanOrEqual(3);
    for (const [label, values] of [['steady', steady], ['swift', swift]] as const) {
      const [points] = pathPoints(svg, 'data-series', label);
      expect(points.length).toBe(years.length);
      let worst = 0;
      points.forEach(([px, py], i) => {
        worst = Math.max(worst, Math.abs(px - x(years[i])), Math.abs(py - y(values[i])));
      });
      console.info(`svgChart ${label}: worst pixel error ${worst.toFixed(3)} px`);
      // Tolerance: the task's 1 px; coordinates are rounded to 0.1 px, tick positions too.
      expectWithin(worst, 0, 1, `${label}: worst pixel error`);
    }
  });

  it('svgChart shades a band between its edges and draws each threshold at its value', () => {
    const svg = chart();
    const y = axisMap(ticks(svg, 'y-tick'));
    const [ring] = pathPoints(svg, 'data-band', '5-95 %');
    // d3 area: the upper edge forwards, then the lower edge backwards.
    expect(ring.length).toBe(2 * years.length);
    expect(Math.abs(ring[0][1] - y(swift[0] * 1.3))).toBeLessThanOrEqual(1);
    expect(Math.abs(ring[ring.length - 1][1] - y(swift[0] * 0.7))).toBeLessThanOrEqual(1);
    for (const t of [1.5, 2]) {
      const m = new RegExp(`<line [^>]*y1="([-0-9.]+)"[^>]*stroke-dasharray="5 4"/>\\s*<text[^>]*>${t} K</text>`).exec(svg);
      expect(m, `threshold ${t} K`).not.toBeNull();
      expect(Math.abs(Number(m![1]) - y(t))).toBeLessThanOrEqual(1);
    }
  });

  it('svgChart gives lines different dash patterns as well as colours, and names each in the legend', () => {
    const svg = chart();
    const styles = [...svg.matchAll(/<path data-series="[^"]*" d="[^"]*" fill="none" stroke="([^"]+)"[^>]*?(?:stroke-dasharray="([^"]+)")?\/>/g)].map((m) => [m[1], m[2] ?? 'solid']);
    expect(styles.length).toBe(2);
    expect(styles[0][0]).not.toBe(styles[1][0]);
    expect(styles[0][1]).not.toBe(styles[1][1]);
    for (const text of ['steady', 'swift', 'shading: 5-95 % range, darker 17-83 %', '1.5 K, 2 K levels', 'Year', 'Warming relative to 1850-1900 (K)', 'Warming by pathway']) {
      expect(svg).toContain(`>${text}</text>`);
    }
  });

  it('svgChart fills each band in the colour of its own line, and the legend swatch of that line shows the band in the same colour', () => {
    const svg = chart();
    const lineColour = /<path data-series="swift" d="[^"]*" fill="none" stroke="([^"]+)"/.exec(svg)![1];
    expect(/<path data-band="5-95 %" d="[^"]*" data-of="swift" fill="([^"]+)"/.exec(svg)![1]).toBe(lineColour);
    expect(/<rect class="legend-band" data-of="swift"[^>]* fill="([^"]+)"/.exec(svg)![1]).toBe(lineColour);
    expect(svg).not.toMatch(/<rect class="legend-band" data-of="steady"/);
  });

  it('svgChart draws an observed record as a thin dark line with its own legend entry', () => {
    const obsYears = Float64Array.from({ length: 174 }, (_, i) => 1850 + i);
    const svg = chart({ observed: { label: 'observed (HadCRUT5)', years: obsYears, values: obsYears.map((y) => 0.005 * (y - 1850)) } });
    expect(svg).toMatch(/<path data-observed="observed \(HadCRUT5\)" d="M[^"]+" fill="none" stroke="#111111" stroke-width="1"/);
    expect(svg).toContain('>observed (HadCRUT5)</text>');
  });

  it('svgChart breaks a line at NaN values and escapes labels', () => {
    const gappy = steady.map((v, i) => (i >= 100 && i < 110 ? NaN : v));
    const svg = chart({ series: [{ label: 'a<b & "c"', years, values: gappy }], bands: [] });
    expect(xmlProblems(svg)).toEqual([]);
    expect(svg).toContain('data-series="a&lt;b &amp; &quot;c&quot;"');
    const parts = pathPoints(svg, 'data-series', 'a&lt;b &amp; &quot;c&quot;');
    expect(parts.map((p) => p.length)).toEqual([100, 141]);
  });

  it('svgChart stays small and self-contained: no scripts, ids, links or external references; under 20 kB for 2 x 251 points and a band (measured about 15 kB)', () => {
    const svg = chart();
    console.info(`svgChart size: ${svg.length} characters`);
    expect(svg).not.toMatch(/<script|\bid=|href=|url\(|@import/i);
    expect(svg.length).toBeLessThan(20_000);
  });
});

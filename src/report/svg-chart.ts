import { scaleLinear } from 'd3-scale';
import { area, line } from 'd3-shape';
import { escapeMarkup } from './escape-markup.js';
import type { ChartLine } from './terminal-chart.js';

/** A shaded range under one line of a chart, e.g. an ensemble's 5-95 % range. */
export interface ChartBand {
  /** Label of the line it belongs to (takes that line's colour; grey when no line has it). */
  of: string;
  /** Legend text, e.g. `5-95 % range`; bands sharing a label share one legend entry. */
  label: string;
  years: ArrayLike<number>;
  /** Lower edge, one value per year; NaN leaves a gap. */
  lower: ArrayLike<number>;
  /** Upper edge, one value per year. */
  upper: ArrayLike<number>;
}

/** What {@link svgChart} draws. */
export interface SvgChartOptions {
  title: string;
  /** Horizontal axis title, with unit if any (e.g. `Year`). */
  xLabel: string;
  /** Vertical axis title with unit (e.g. `Warming relative to 1850-1900 (K)`). */
  yLabel: string;
  series: readonly ChartLine[];
  /**
   * Shaded ranges, drawn in order under the lines, each over the last at the same light opacity:
   * give the widest first (5-95 % before 17-83 %) so nested ranges darken towards the middle.
   */
  bands?: readonly ChartBand[];
  /** Levels drawn as dashed horizontal lines, labelled at the right end (e.g. 1.5 and 2 K). */
  thresholds?: readonly number[];
  /** An observed record drawn as a thin dark line over its years (e.g. HadCRUT5, rebased), with its legend text. */
  observed?: ChartLine;
  /** Legend text explaining the shading, shown when there are bands (default: 5-95 % light, 17-83 % darker). */
  bandNote?: string;
  /** Unit written after threshold labels (default `K`). */
  unit?: string;
  /** Width in px (default 720). */
  width?: number;
  /** Height in px, legend included (default 420). */
  height?: number;
}

/** Line colours, chosen to stay apart in print and for the common colour-vision deficiencies. */
const COLORS = ['#1f5fa8', '#c2410c', '#15803d', '#7e22ce', '#a16207', '#0e7490', '#be185d', '#4b5563'];
/** Dash patterns, so lines differ in more than colour. */
const DASHES = ['', '8 4', '2 3', '10 3 2 3', '5 2', '1 4', '12 4 2 4 2 4', '3 6'];
const FONT = "system-ui, -apple-system, 'Segoe UI', Roboto, Helvetica, Arial, sans-serif";
/** Opacity of one band layer: low, so the bands of several options stay apart where they overlap. */
const BAND_OPACITY = 0.12;
/** Colour of an observed record's line. */
const OBSERVED_COLOR = '#111111';
const FONT_PX = 12;
/** Width of a character of the 12 px sans-serif font, px, erring wide (common practice, no source). */
const CHAR_PX = 7;
const LEGEND_ROW_PX = 20;

/**
 * Renders a line chart as a small standalone SVG document for print and for inline use in HTML:
 * a title, axes with round ticks (d3-scale `nice` and `ticks`) and their titles, light grid lines,
 * shaded bands, dashed threshold lines labelled at the right, one path per series (d3-shape; colour
 * and dash pattern both differ, so the chart reads in black and white), and a legend below.
 * Text is escaped; no scripts, ids, fonts or links are used, so several charts can share a page.
 *
 * Coordinates are rounded to 0.1 px. The years axis spans the data exactly; the value axis is the
 * data, bands and thresholds, widened to round ticks. Paths carry `data-series="label"` and bands
 * `data-band="label"`; tick labels carry `class="x-tick"` / `class="y-tick"`, so tests and tools
 * can read the chart back.
 *
 * @param options title, axis titles, lines, bands, thresholds, size in px
 * @returns the SVG document text (no XML declaration; UTF-8)
 * @example
 * svgChart({ title: 'Warming', xLabel: 'Year', yLabel: 'Warming (K)', thresholds: [1.5, 2],
 *   series: [{ label: 'steady', years: [2020, 2100], values: [1.2, 2.7] }] })
 * // '<svg xmlns="http://www.w3.org/2000/svg" width="720" height="420" ...>...</svg>'
 */
export function svgChart(options: SvgChartOptions): string {
  const width = options.width ?? 720;
  const height = options.height ?? 420;
  const bands = options.bands ?? [];
  const thresholds = options.thresholds ?? [];
  const unit = options.unit ?? 'K';
  const series = options.series;

  let x0 = Infinity;
  let x1 = -Infinity;
  let lo = Infinity;
  let hi = -Infinity;
  const extend = (years: ArrayLike<number>, values: ArrayLike<number>) => {
    for (let i = 0; i < values.length; i++) {
      if (!Number.isFinite(values[i])) continue;
      x0 = Math.min(x0, years[i]);
      x1 = Math.max(x1, years[i]);
      lo = Math.min(lo, values[i]);
      hi = Math.max(hi, values[i]);
    }
  };
  for (const s of series) extend(s.years, s.values);
  if (options.observed) extend(options.observed.years, options.observed.values);
  for (const b of bands) {
    extend(b.years, b.lower);
    extend(b.years, b.upper);
  }
  if (!(x0 <= x1)) {
    x0 = 0;
    x1 = 1;
    lo = 0;
    hi = 1;
  }
  for (const t of thresholds) {
    lo = Math.min(lo, t);
    hi = Math.max(hi, t);
  }
  if (x0 === x1) {
    x0 -= 1;
    x1 += 1;
  }
  if (lo === hi) {
    lo -= 0.5;
    hi += 0.5;
  }

  // Legend items first: their rows take room from the plot.
  // One legend entry per line; a line with bands shows them in its swatch, in its own colour, so
  // each band is tied to its line.
  type Item = { kind: 'line'; index: number; text: string; banded: number } | { kind: 'observed'; text: string } | { kind: 'shade'; text: string } | { kind: 'level'; text: string };
  const items: Item[] = series.map((s, index) => ({ kind: 'line', index, text: s.label, banded: bands.filter((b) => b.of === s.label).length }));
  if (options.observed) items.push({ kind: 'observed', text: options.observed.label });
  if (bands.length > 0) items.push({ kind: 'shade', text: options.bandNote ?? 'shading: 5-95 % range, darker 17-83 %' });
  if (thresholds.length > 0) items.push({ kind: 'level', text: `${thresholds.map((t) => levelText(t, unit)).join(', ')} levels` });
  const margin = { top: 40, right: 58, bottom: 48, left: 62 };
  const placed: { item: Item; x: number; row: number }[] = [];
  let x = margin.left;
  let row = 0;
  // A label too long for a row of its own is cut short with an ellipsis (the path keeps it whole).
  const maxChars = Math.max(4, Math.floor((width - margin.left - 8 - 34) / CHAR_PX));
  for (const item of items) {
    if (item.text.length > maxChars) item.text = item.text.slice(0, maxChars - 1) + '…';
    const w = 34 + item.text.length * CHAR_PX + 18;
    if (x > margin.left && x + w > width - margin.right) {
      x = margin.left;
      row++;
    }
    placed.push({ item, x, row });
    x += w;
  }
  const legendRows = items.length > 0 ? row + 1 : 0;
  const plotBottom = height - margin.bottom - legendRows * LEGEND_ROW_PX;
  const plotRight = width - margin.right;

  const xs = scaleLinear().domain([x0, x1]).range([margin.left, plotRight]);
  const ys = scaleLinear().domain([lo, hi]).nice(8).range([plotBottom, margin.top]);
  const yTicks = ys.ticks(8);
  const yFormat = ys.tickFormat(8);
  const xTicks = xs.ticks(Math.max(2, Math.round((plotRight - margin.left) / 80))).filter(Number.isInteger);
  const styleOf = (i: number) => series[i].style ?? i;
  const colorOf = (label: string) => {
    const i = series.findIndex((s) => s.label === label);
    return i < 0 ? '#777777' : COLORS[styleOf(i) % COLORS.length];
  };

  const out: string[] = [];
  out.push(
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}" ` +
      `font-family="${FONT}" font-size="${FONT_PX}" role="img">`,
  );
  out.push(`<title>${escapeMarkup(options.title)}</title>`);
  out.push(`<rect width="${width}" height="${height}" fill="#ffffff"/>`);
  out.push(`<text x="${margin.left}" y="24" font-size="15" font-weight="bold" fill="#111111">${escapeMarkup(options.title)}</text>`);

  out.push(
    `<g stroke="#e4e4e4" stroke-width="1">${yTicks.map((t) => `<line x1="${margin.left}" x2="${plotRight}" y1="${px(ys(t))}" y2="${px(ys(t))}"/>`).join('')}</g>`,
  );
  for (const b of bands) {
    const idx = Array.from({ length: b.years.length }, (_, i) => i);
    const d = area<number>()
      .defined((i) => Number.isFinite(b.lower[i]) && Number.isFinite(b.upper[i]))
      .x((i) => xs(b.years[i]))
      .y0((i) => ys(b.lower[i]))
      .y1((i) => ys(b.upper[i]))
      .digits(1)(idx);
    if (d) out.push(`<path data-band="${escapeMarkup(b.label)}" d="${d}" data-of="${escapeMarkup(b.of)}" fill="${colorOf(b.of)}" fill-opacity="${BAND_OPACITY}" stroke="none"/>`);
  }
  for (const t of thresholds) {
    const y = px(ys(t));
    out.push(`<line x1="${margin.left}" x2="${plotRight}" y1="${y}" y2="${y}" stroke="#555555" stroke-width="1" stroke-dasharray="5 4"/>`);
    out.push(`<text x="${plotRight + 6}" y="${y}" dy="0.32em" fill="#333333">${escapeMarkup(levelText(t, unit))}</text>`);
  }
  series.forEach((s, i) => {
    const idx = Array.from({ length: s.years.length }, (_, k) => k);
    const d = line<number>()
      .defined((k) => Number.isFinite(s.values[k]))
      .x((k) => xs(s.years[k]))
      .y((k) => ys(s.values[k]))
      .digits(1)(idx);
    if (!d) return;
    const dash = DASHES[styleOf(i) % DASHES.length];
    out.push(
      `<path data-series="${escapeMarkup(s.label)}" d="${d}" fill="none" stroke="${COLORS[styleOf(i) % COLORS.length]}" stroke-width="2" ` +
        `stroke-linejoin="round"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`,
    );
  });

  if (options.observed) {
    const o = options.observed;
    const d = line<number>()
      .defined((k) => Number.isFinite(o.values[k]))
      .x((k) => xs(o.years[k]))
      .y((k) => ys(o.values[k]))
      .digits(1)(Array.from({ length: o.years.length }, (_, k) => k));
    if (d) out.push(`<path data-observed="${escapeMarkup(o.label)}" d="${d}" fill="none" stroke="${OBSERVED_COLOR}" stroke-width="1" stroke-linejoin="round"/>`);
  }
  out.push(`<path d="M${margin.left},${margin.top}V${px(plotBottom)}H${plotRight}" fill="none" stroke="#333333" stroke-width="1"/>`);
  out.push(
    `<g fill="#333333" text-anchor="end">${yTicks
      .map((t) => `<text class="y-tick" x="${margin.left - 6}" y="${px(ys(t))}" dy="0.32em">${escapeMarkup(yFormat(t))}</text>`)
      .join('')}</g>`,
  );
  out.push(
    `<g stroke="#333333">${xTicks.map((t) => `<line x1="${px(xs(t))}" x2="${px(xs(t))}" y1="${px(plotBottom)}" y2="${px(plotBottom + 5)}"/>`).join('')}</g>`,
  );
  out.push(
    `<g fill="#333333" text-anchor="middle">${xTicks
      .map((t) => `<text class="x-tick" x="${px(xs(t))}" y="${px(plotBottom + 18)}">${t}</text>`)
      .join('')}</g>`,
  );
  out.push(`<text x="${px((margin.left + plotRight) / 2)}" y="${px(plotBottom + 36)}" text-anchor="middle" fill="#111111">${escapeMarkup(options.xLabel)}</text>`);
  const midY = px((margin.top + plotBottom) / 2);
  out.push(`<text transform="translate(16,${midY}) rotate(-90)" text-anchor="middle" fill="#111111">${escapeMarkup(options.yLabel)}</text>`);

  const legendTop = plotBottom + margin.bottom;
  for (const { item, x: lx, row: r } of placed) {
    const y = legendTop + r * LEGEND_ROW_PX;
    if (item.kind === 'line') {
      const dash = DASHES[styleOf(item.index) % DASHES.length];
      const color = COLORS[styleOf(item.index) % COLORS.length];
      const label = escapeMarkup(series[item.index].label);
      // The swatch: the line's bands as stacked rectangles in its colour, its line across them.
      for (let k = 0; k < item.banded; k++) out.push(`<rect class="legend-band" data-of="${label}" x="${lx}" y="${y - 6}" width="28" height="12" fill="${color}" fill-opacity="${BAND_OPACITY}"/>`);
      out.push(
        `<line class="legend-line" data-series="${label}" x1="${lx}" x2="${lx + 28}" y1="${y}" y2="${y}" stroke="${color}" stroke-width="2"${dash ? ` stroke-dasharray="${dash}"` : ''}/>`,
      );
    } else if (item.kind === 'observed') {
      out.push(`<line class="legend-observed" x1="${lx}" x2="${lx + 28}" y1="${y}" y2="${y}" stroke="${OBSERVED_COLOR}" stroke-width="1"/>`);
    } else if (item.kind === 'shade') {
      for (let k = 0; k < 2; k++) out.push(`<rect x="${lx}" y="${y - 6 + 3 * k}" width="28" height="${12 - 6 * k}" fill="#777777" fill-opacity="${BAND_OPACITY}"/>`);
    } else {
      out.push(`<line x1="${lx}" x2="${lx + 28}" y1="${y}" y2="${y}" stroke="#555555" stroke-width="1" stroke-dasharray="5 4"/>`);
    }
    out.push(`<text x="${lx + 34}" y="${y}" dy="0.32em" fill="#111111">${escapeMarkup(item.text)}</text>`);
  }
  out.push('</svg>');
  return out.join('\n') + '\n';
}

/** A pixel coordinate rounded to 0.1 px, without a trailing `.0`. */
function px(v: number): string {
  return String(Math.round(v * 10) / 10);
}

function levelText(t: number, unit: string): string {
  return `${+t.toPrecision(6)}${unit ? ' ' + unit : ''}`;
}

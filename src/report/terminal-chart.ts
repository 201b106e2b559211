import * as asciichart from 'asciichart';
import { scaleLinear } from 'd3-scale';
import { valueAtYear } from '../metrics/value-at-year.js';

/** One line of a chart: a label and a value per year. */
export interface ChartLine {
  /** Name shown in the legend. */
  label: string;
  /** Years, ascending. */
  years: ArrayLike<number>;
  /** One value per year; NaN leaves a gap. */
  values: ArrayLike<number>;
  /**
   * Which colour, marker and dash pattern the line takes, as an index into the chart's palette
   * (default its position), so one pathway keeps its look across charts.
   */
  style?: number;
}

/** Options of {@link terminalChart}. */
export interface TerminalChartOptions {
  /** First line of the chart. */
  title?: string;
  /** Unit of the values, printed above the value axis and after threshold labels (e.g. `K`). */
  yLabel?: string;
  /** Total width in characters, labels included (default 80). */
  width?: number;
  /** Height of the plot in rows, roughly: rows stand for round values near (max - min) / height (default 12). */
  height?: number;
  /** ANSI colours (pass whether stdout is a TTY). Default false: the chart reads without them. */
  color?: boolean;
  /** Levels drawn as dashed horizontal lines and labelled at the right (e.g. 1.5 and 2 K). */
  thresholds?: readonly number[];
}

/** Marker characters, one per line, so lines are told apart without colour. */
const MARKERS = ['o', '+', 'x', '*', '#', '@', '%', '&'];
const COLORS = [asciichart.blue, asciichart.red, asciichart.green, asciichart.magenta, asciichart.cyan, asciichart.yellow];
/** Columns between two markers of the same line. */
const MARKER_SPACING = 8;
const THRESHOLD_CHAR = '┄';

/**
 * Draws several series as one line chart for a terminal. asciichart draws each line and the value
 * axis; over them come a marker character repeated along each line (`o`, `+`, `x`, ...), dashed
 * threshold lines labelled at the right, a year axis with tick labels at round years (ticks from
 * d3-scale), and a legend naming each line's marker, so the chart reads without colour. Colours
 * are added only when `color` is true.
 *
 * Series may cover different years: the year axis spans all of them, and each line is sampled at
 * every column by linear interpolation (a column per year when the span fits the width).
 * The first sample sits on the value axis, as asciichart draws it. Rows stand for round values
 * (steps of 1, 2 or 5 x 10^k from d3-scale), each labelled with the value drawn on it; a value, or
 * a threshold, is drawn on the row nearest it, so a 1.5 K line on a 0.2 K grid sits on 1.4 or 1.6.
 *
 * @param series the lines, drawn in order (later lines on top where they overlap)
 * @param options title, unit, size, colour, thresholds
 * @returns the chart as lines joined by `\n` (no trailing newline)
 * @example
 * terminalChart([{ label: 'steady', years: [2020, 2050, 2100], values: [1.2, 1.9, 2.7] }],
 *   { title: 'Warming', yLabel: 'K', thresholds: [1.5, 2] })
 * // 'Warming\n   K\n 2.7┤ ...': 16 rows from 2.7 down to 1.2 K in steps of 0.1 K, the year axis
 * // with 2020, 2040, ... 2100 under it, then the legend 'o─ steady   ┄┄ 1.5 K, 2 K'
 */
export function terminalChart(series: readonly ChartLine[], options: TerminalChartOptions = {}): string {
  const width = options.width ?? 80;
  const height = Math.max(2, options.height ?? 12);
  const color = options.color ?? false;
  const unit = options.yLabel ?? '';
  const thresholds = options.thresholds ?? [];
  const out: string[] = [];
  if (options.title) out.push(options.title);

  let x0 = Infinity;
  let x1 = -Infinity;
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) {
    for (let i = 0; i < s.values.length; i++) {
      if (!Number.isFinite(s.values[i])) continue;
      x0 = Math.min(x0, s.years[i]);
      x1 = Math.max(x1, s.years[i]);
      lo = Math.min(lo, s.values[i]);
      hi = Math.max(hi, s.values[i]);
    }
  }
  if (!(x0 <= x1)) {
    out.push('(no data to chart)');
    return out.join('\n');
  }
  for (const t of thresholds) {
    lo = Math.min(lo, t);
    hi = Math.max(hi, t);
  }
  if (lo === hi) {
    lo -= 0.5;
    hi += 0.5;
  }

  // Rows stand for round values: a step of 1, 2 or 5 x 10^k (d3-scale ticks) near (hi - lo) / height,
  // and the value range widened to whole steps, so each row's label is exactly the value drawn on it.
  const ticked = scaleLinear().domain([lo, hi]).nice(height).ticks(height);
  let step = ticked.length > 1 ? ticked[1] - ticked[0] : (hi - lo) / height;
  // A threshold between two rows would be drawn on the nearer one, under the wrong label (1.5 K on
  // the 1.6 row at 0.2 K steps): a step of 2 x 10^k becomes 2.5 x 10^k when that puts every
  // threshold on a row of its own.
  const onRow = (v: number, s: number) => Math.abs(v / s - Math.round(v / s)) < 1e-6;
  const power = 10 ** Math.floor(Math.log10(step) + 1e-9);
  if (Math.abs(step / power - 2) < 1e-9 && thresholds.some((t) => !onRow(t, step)) && thresholds.every((t) => onRow(t, 2.5 * power))) step = 2.5 * power;
  lo = Math.floor(lo / step + 1e-9) * step;
  hi = Math.ceil(hi / step - 1e-9) * step;
  const rowsWanted = Math.max(1, Math.round((hi - lo) / step));
  // Decimals that show every row's value exactly (0.25 needs two).
  let digits = 0;
  while (digits < 6 && !onRow(step, 10 ** -digits)) digits++;
  const fixed = (v: number) => {
    const s = v.toFixed(digits);
    return /^-0(\.0*)?$/.test(s) ? s.slice(1) : s;
  };
  // One leading space keeps labels at least two characters wide, which asciichart's layout needs.
  const labelWidth = 1 + Math.max(fixed(lo).length, fixed(hi).length, unit.length);
  const format = (v: number) => fixed(v).padStart(labelWidth);
  const axisCol = labelWidth;
  const levelText = (t: number) => `${+t.toPrecision(6)}${unit ? ' ' + unit : ''}`;
  const rightLabels = thresholds.map((t) => ` ${levelText(t)}`);
  const rightWidth = Math.max(0, ...rightLabels.map((s) => s.length));
  const span = Math.round(x1 - x0) + 1;
  const samples = Math.max(2, Math.min(span, width - axisCol - rightWidth));
  const sampleYear = (i: number) => x0 + (i * (x1 - x0)) / (samples - 1);

  // The row asciichart puts a value on, computed as asciichart 1.5 computes it.
  const ratio = rowsWanted / (hi - lo);
  const min2 = Math.round(lo * ratio);
  const rows = Math.round(hi * ratio) - min2;
  const rowOf = (v: number) => rows - (Math.round(v * ratio) - min2);
  // asciichart spaces its labels evenly from max to min; label each row with the value it is drawn
  // at instead (the same here, up to rounding).
  const max2 = min2 + rows;
  const config = { min: lo, max: hi, height: rowsWanted, offset: 2, format: (_: number, fromTop: number) => format((max2 - fromTop) / ratio) };

  const cols = axisCol + samples;
  const grid = Array.from({ length: rows + 1 }, () => new Array<string>(cols).fill(' '));
  // Who drew each cell: a series index, -1 for the axes, -2 for threshold lines.
  const owner = Array.from({ length: rows + 1 }, () => new Array<number>(cols).fill(-1));
  const axisLines = asciichart.plot([lo, hi], config).split('\n');
  axisLines.forEach((line, r) => {
    for (let c = 0; c <= axisCol; c++) grid[r][c] = line[c] ?? ' ';
    grid[r][axisCol] = Math.round(0 * ratio) - min2 === rows - r && lo < 0 ? '┼' : '┤';
  });

  thresholds.forEach((t) => {
    const r = rowOf(t);
    for (let c = axisCol + 1; c < cols; c++) {
      grid[r][c] = THRESHOLD_CHAR;
      owner[r][c] = -2;
    }
  });

  const styleOf = (j: number) => series[j].style ?? j;
  const sampled = series.map((s) => Float64Array.from({ length: samples }, (_, i) => valueAtYear(s.years, s.values, sampleYear(i))));
  sampled.forEach((v, j) => {
    for (let a = 0; a < samples; a++) {
      if (!Number.isFinite(v[a])) continue;
      let b = a;
      while (b + 1 < samples && Number.isFinite(v[b + 1])) b++;
      const r0 = rowOf(v[a]);
      if (a > 0) {
        grid[r0][axisCol + a] = '╶';
        owner[r0][axisCol + a] = j;
      }
      if (b > a) {
        // asciichart draws the step from sample i-1 to sample i in the column of sample i: a row of
        // its output is the label, the axis, then one cell per sample of which the last stays blank.
        const m = b - a + 1;
        const lines = asciichart.plot([Array.from(v.subarray(a, b + 1))], config).split('\n');
        lines.forEach((line, r) => {
          const plot = line.slice(line.length - m, line.length - 1);
          for (let k = 0; k < plot.length; k++) {
            if (plot[k] === ' ') continue;
            grid[r][axisCol + a + 1 + k] = plot[k];
            owner[r][axisCol + a + 1 + k] = j;
          }
        });
      }
      a = b;
    }
  });
  sampled.forEach((v, j) => {
    const phase = Math.floor((j * MARKER_SPACING) / Math.max(1, series.length));
    for (let i = 1; i < samples; i++) {
      if ((i - phase - 1) % MARKER_SPACING !== 0 || !Number.isFinite(v[i])) continue;
      const r = rowOf(v[i]);
      grid[r][axisCol + i] = MARKERS[styleOf(j) % MARKERS.length];
      owner[r][axisCol + i] = j;
    }
  });

  const paint = (text: string, who: number) => {
    if (!color || who === -1) return text;
    return asciichart.colored(text, who === -2 ? asciichart.darkgray : COLORS[styleOf(who) % COLORS.length]);
  };
  if (unit) out.push(unit.padStart(labelWidth));
  grid.forEach((cells, r) => {
    let line = '';
    // Paint runs of cells drawn by the same line at once, to keep the escape codes few.
    for (let c = 0; c < cols; ) {
      let e = c + 1;
      while (e < cols && owner[r][e] === owner[r][c]) e++;
      line += paint(cells.slice(c, e).join(''), owner[r][c]);
      c = e;
    }
    const t = thresholds.findIndex((x) => rowOf(x) === r);
    if (t >= 0) line += paint(rightLabels[t], -2);
    out.push(line.trimEnd());
  });

  // Year axis: a tick under each round year d3-scale picks, its label centred below it.
  const ticks = scaleLinear()
    .domain([x0, x1])
    .ticks(Math.max(2, Math.floor(samples / 12)))
    .filter(Number.isInteger);
  const axis = new Array<string>(cols).fill('─');
  for (let c = 0; c < axisCol; c++) axis[c] = ' ';
  axis[axisCol] = '└';
  let labels = '';
  for (const t of ticks) {
    const i = x1 === x0 ? 0 : Math.round(((t - x0) / (x1 - x0)) * (samples - 1));
    axis[axisCol + i] = i === 0 ? '└' : '┬';
    const text = String(t);
    // Centred under its tick, but never past the chart's width (the last tick sits at the right edge).
    const start = Math.max(0, Math.min(axisCol + i - Math.floor(text.length / 2), width - text.length));
    if (start > labels.length || labels.length === 0) labels = labels.padEnd(start) + text;
  }
  out.push(axis.join(''), labels);

  const items = series.map((s, j) => paint(`${MARKERS[styleOf(j) % MARKERS.length]}─`, j) + ` ${s.label}`);
  if (thresholds.length > 0) items.push(paint(THRESHOLD_CHAR.repeat(2), -2) + ` ${thresholds.map(levelText).join(', ')}`);
  out.push(...wrap(items, width));
  return out.join('\n');
}

/** Joins legend items with three spaces, breaking lines before `width` (ANSI codes not counted). */
function wrap(items: string[], width: number): string[] {
  const visible = (s: string) => s.replace(/\x1b\[[0-9;]*m/g, '').length;
  const lines: string[] = [];
  let line = '';
  for (const item of items) {
    if (line && visible(line) + 3 + visible(item) > width) {
      lines.push(line);
      line = '';
    }
    line += (line ? '   ' : '') + item;
  }
  if (line) lines.push(line);
  return lines;
}

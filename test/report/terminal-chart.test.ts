import { describe, expect, it } from 'vitest';
import { terminalChart } from '../../src/report/terminal-chart.js';

const ANSI = /\x1b\[[0-9;]*m/g;
const years = Float64Array.from({ length: 81 }, (_, i) => 2020 + i);
const rising = years.map((y) => 1.2 + 0.02 * (y - 2020));
const flat = years.map(() => 1.7);
const late = years.map((y) => (y < 2060 ? NaN : 1.0));

function render(color = false) {
  return terminalChart(
    [
      { label: 'rising', years, values: rising },
      { label: 'flat', years, values: flat },
      { label: 'late', years, values: late },
    ],
    { title: 'Warming test', yLabel: 'K', width: 72, height: 12, color, thresholds: [1.5, 2] },
  );
}

/** Splits the chart into its plot rows: value label, the column of the axis, the cells after it. */
function plotRows(chart: string) {
  return chart
    .split('\n')
    .map((line) => /^( *-?[0-9.]+)([┤┼])(.*)$/.exec(line))
    .filter((m): m is RegExpExecArray => m !== null)
    .map((m) => ({ value: Number(m[1]), axis: m[1].length, cells: m[3] }));
}

describe('terminalChart', () => {
  it('terminalChart without colour has no escape codes, and with colour differs only by them', () => {
    const plain = render(false);
    const colored = render(true);
    expect(plain).not.toMatch(ANSI);
    expect(colored).toMatch(ANSI);
    expect(colored.replace(ANSI, '')).toBe(plain);
  });

  it('terminalChart names every line with its own marker character in a text legend, and the thresholds', () => {
    const chart = render();
    const legend = chart.split('\n').at(-1)!;
    expect(legend).toBe('o─ rising   +─ flat   x─ late   ┄┄ 1.5 K, 2 K');
    expect(chart.split('\n')[0]).toBe('Warming test');
  });

  it('terminalChart puts each marker on the row whose value label is nearest the line\'s value at that column (within half a row step)', () => {
    const chart = render();
    const rows = plotRows(chart);
    // 1.0 to 3.0 K: d3-scale ticks for about 12 rows give 0.2 K, which would put the 1.5 K line
    // between rows, so the step is 0.25 K and every threshold has its own row: 9 rows.
    expect(rows.map((r) => r.value)).toEqual([3.0, 2.75, 2.5, 2.25, 2.0, 1.75, 1.5, 1.25, 1.0]);
    const step = (rows[0].value - rows[rows.length - 1].value) / (rows.length - 1);
    const samples = Math.max(...rows.map((r) => r.cells.replace(/ +\d.*K$/, '').length)) + 1;
    const yearAt = (i: number) => 2020 + (i * 80) / (samples - 1);
    let seen = 0;
    rows.forEach((r) => {
      [...r.cells].forEach((ch, k) => {
        const i = k + 1; // the first cell after the axis is sample 1
        const expected = ch === 'o' ? 1.2 + 0.02 * (yearAt(i) - 2020) : ch === '+' ? 1.7 : ch === 'x' ? 1.0 : undefined;
        if (expected === undefined) return;
        seen++;
        // Half a row step: each row's label is the value it is drawn at.
        expect(Math.abs(r.value - expected), `${ch} at column ${i}`).toBeLessThanOrEqual(step / 2 + 1e-9);
      });
    });
    expect(seen).toBeGreaterThan(10);
  });

  it('terminalChart draws each threshold line on the row labelled with its value', () => {
    const rows = plotRows(render());
    for (const t of [1.5, 2]) expect(rows.find((r) => r.value === t)!.cells).toMatch(/┄.*\s\d(\.\d)? K$/);
  });

  it('terminalChart draws nothing of a line before its first year', () => {
    const rows = plotRows(render());
    const samples = 72 - rows[0].axis - 6;
    const firstLate = Math.ceil(((2060 - 2020) / 80) * (samples - 1));
    for (const r of rows) {
      const x = r.cells.indexOf('x');
      if (x >= 0) expect(x + 1).toBeGreaterThanOrEqual(firstLate);
    }
    // 1.0 K lies below the other lines: its row holds only the late line.
    const lowest = rows[rows.length - 1];
    expect(lowest.cells.slice(0, firstLate - 2).trim()).toBe('');
  });

  it('terminalChart labels round years under tick marks, stays within the width, and labels each threshold row', () => {
    const lines = render().split('\n');
    const axis = lines.find((l) => l.includes('└'))!;
    const labels = lines[lines.indexOf(axis) + 1];
    const found = [...labels.matchAll(/\d{4}/g)];
    expect(found.map((m) => Number(m[0]))).toEqual([2020, 2040, 2060, 2080, 2100]);
    for (const m of found) expect('└┬').toContain(axis[m.index! + 2]);
    for (const l of lines) expect(l.length).toBeLessThanOrEqual(72);
    expect(lines.filter((l) => /┄ 1\.5 K$/.test(l))).toHaveLength(1);
    // Each threshold lies on the row whose value label is nearest it: within half a row step.
    const rows = plotRows(lines.join('\n'));
    const step = (rows[0].value - rows[rows.length - 1].value) / (rows.length - 1);
    for (const [t, re] of [[1.5, /┄ 1\.5 K$/], [2, /┄ 2 K$/]] as const) {
      const row = rows.find((r) => re.test(r.cells))!;
      expect(Math.abs(row.value - t)).toBeLessThanOrEqual(step / 2 + 1e-9);
    }
    expect(lines.filter((l) => /┄ 2 K$/.test(l))).toHaveLength(1);
  });

  it('terminalChart says so when there is nothing to chart', () => {
    expect(terminalChart([{ label: 'empty', years: [2020], values: [NaN] }], { title: 'T' })).toBe('T\n(no data to chart)');
  });
});

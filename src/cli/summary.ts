import { valueAtYear } from '../metrics/index.js';
import type { Projection } from '../projection/index.js';
import { plainTable, terminalChart } from '../report/index.js';
import { standardCautions } from '../report/standard-cautions.js';
import { notesAndCautions } from './notes-and-cautions.js';
import { runHeadlineLines, runHeadlines } from './run-headlines.js';

/** Columns of the short yearly table the summary prints. */
const TABLE_COLUMNS = [
  ['warming_k', 'warming K', 2],
  ['deep_ocean_k', 'deep ocean K', 2],
  ['forcing_wm2', 'ERF W m-2', 2],
  ['imbalance_wm2', 'imbalance W m-2', 2],
  ['co2_ppm', 'CO2 ppm', 1],
] as const;

/**
 * Prints what `warmcast run` shows on a terminal: a heading with the pathway and its splice, a short
 * table every 10 years over the future (or 25 over a long history) or, when the report was asked to
 * start at a year (`from`, the `--from` the projection was clipped to), from its first year, the
 * headline lines (warming in 2030, 2050, 2100, peak and its year), a chart, the notes and the caution.
 *
 * @param out where to write, whether in colour and with the chart, the `--from` year, the run's
 *   own notes (on its parameters or its baseline, say), printed after the pathway's, and `whole`,
 *   the projection before `--from`/`--to` clipped it: threshold crossings are a property of the
 *   whole run, so they are read from it and do not move with the reporting window
 */
export function printProjectionSummary(
  p: Projection,
  out: { write: (s: string) => void; color: boolean; chart: boolean; from?: number; notes?: readonly string[]; whole?: Projection; width?: number },
): void {
  const { years, columns } = p;
  const first = years[0];
  const last = years[years.length - 1];
  const w = columns.warming_k;
  const lines: string[] = [];
  lines.push(`${p.name} (${p.provenance.source})`);
  lines.push(
    `  ECS ${p.params.ecsK.toFixed(2)} K, TCR ${p.params.tcrK.toFixed(2)} K, CO2 forcing ${p.params.co2Formula}; ` +
      `warming relative to the ${p.baseline[0]}-${p.baseline[1]} mean`,
  );
  const { spliceYear, historyLastYear } = p.provenance;
  if (spliceYear !== undefined) {
    const bridge = historyLastYear !== undefined && historyLastYear < spliceYear - 1 ? historyLastYear : undefined;
    lines.push(
      bridge === undefined
        ? `  history spliced in: years before ${spliceYear} come from the bundled history`
        : `  history spliced in: years to ${bridge} come from the bundled history, ${bridge + 1 === spliceYear - 1 ? bridge + 1 : `${bridge + 1}-${spliceYear - 1}`} bridged to the file's first year, ${spliceYear}`,
    );
  }
  for (const assumption of p.provenance.assumptions ?? []) lines.push(`  assumption: ${assumption}`);
  lines.push('');

  const splice = p.provenance.spliceYear;
  // Without --from the table starts at the splice year, when that year is shown (`--to` may end the
  // report before it); with --from it starts where the user asked.
  const start = out.from === undefined && splice !== undefined && splice >= first && splice <= last ? splice : first;
  const step = last - start > 200 ? 25 : 10;
  const rows: number[] = [];
  for (let y = Math.ceil(start / step) * step; y <= last; y += step) rows.push(y);
  if (rows[0] !== start) rows.unshift(start);
  if (rows[rows.length - 1] !== last) rows.push(last);
  lines.push(
    plainTable({
      columns: ['year', ...TABLE_COLUMNS.map(([, label]) => label)],
      rows: rows.map((y) => [String(y), ...TABLE_COLUMNS.map(([col, , digits]) => valueAtYear(years, columns[col], y).toFixed(digits))]),
      numeric: [true, ...TABLE_COLUMNS.map(() => true)],
    }).trimEnd(),
  );
  lines.push('');

  const whole = out.whole ?? p;
  lines.push(...runHeadlineLines(runHeadlines(p, whole)));
  out.write(lines.join('\n') + '\n');

  if (out.chart) {
    const chartFrom = Math.max(first, Math.min(1850, last));
    const i0 = chartFrom - first;
    out.write(
      '\n' +
        terminalChart([{ label: p.name, years: years.subarray(i0), values: w.subarray(i0) }], {
          title: `Global surface warming, ${p.name} (K relative to ${p.baseline[0]}-${p.baseline[1]})`,
          yLabel: 'K',
          height: 12,
          color: out.color,
          thresholds: [1.5, 2],
        }) +
        '\n',
    );
  }
  out.write(notesAndCautions([...p.provenance.notes, ...p.notes, ...(out.notes ?? [])], standardCautions(), out.width));
}
